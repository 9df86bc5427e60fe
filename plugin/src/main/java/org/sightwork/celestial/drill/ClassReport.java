package org.sightwork.celestial.drill;

import java.util.ArrayList;
import java.util.EnumMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

/**
 * The grades of a class: one line per student, and how often each common mistake was made, as
 * text (for the instructor's terminal) or CSV (for a spreadsheet). Students appear in the order
 * given; mistakes in the order of {@link Mistake}.
 *
 * @param title the drill's title
 * @param grades the students' grades
 */
public record ClassReport(String title, List<StudentGrade> grades) {

    /** The CSV header. */
    public static final String CSV_HEADER = "student,score,fixes_handed_in,fixes_asked,mean_fix_error_nm,"
            + "max_fix_error_nm,sights_worked,mistakes,problems";

    /** Copies the list. */
    public ClassReport {
        grades = List.copyOf(grades);
    }

    /** @return how many students made each mistake at least once (mistakes nobody made left out) */
    public Map<Mistake, Integer> mistakeCounts() {
        Map<Mistake, Integer> m = new EnumMap<>(Mistake.class);
        for (StudentGrade g : grades) {
            for (Mistake x : new java.util.TreeSet<>(g.allMistakes())) {
                m.merge(x, 1, Integer::sum);
            }
        }
        return m;
    }

    /** @return the report as text, LF line ends */
    public String text() {
        StringBuilder b = new StringBuilder();
        b.append("Drill: ").append(title).append('\n');
        b.append(String.format(Locale.ROOT, "%-24s %6s %6s %9s %9s  %s%n", "student", "score", "fixes", "mean nm",
                "max nm", "mistakes recognised").replace(System.lineSeparator(), "\n"));
        for (StudentGrade g : grades) {
            double[] e = fixErrors(g);
            b.append(String.format(Locale.ROOT, "%-24s %6.1f %6s %9s %9s  %s", clip(g.student(), 24), g.score(),
                    handedIn(g) + "/" + g.fixes().size(), e.length == 0 ? "-" : fmt(mean(e)),
                    e.length == 0 ? "-" : fmt(max(e)), mistakeList(g, ", "))).append('\n');
        }
        if (!grades.isEmpty()) {
            double total = 0;
            for (StudentGrade g : grades) {
                total += g.score();
            }
            b.append(String.format(Locale.ROOT, "class mean score %.1f of 100 (%d students)%n", total / grades.size(),
                    grades.size()).replace(System.lineSeparator(), "\n"));
        }
        Map<Mistake, Integer> counts = mistakeCounts();
        if (!counts.isEmpty()) {
            b.append("\nMistakes and how many students made them:\n");
            counts.forEach((m, n) -> b.append(String.format(Locale.ROOT, "  %2d  %s: %s%n", n, word(m), m.advice())
                    .replace(System.lineSeparator(), "\n")));
        }
        for (StudentGrade g : grades) {
            b.append("\n").append(g.student()).append(String.format(Locale.ROOT, " (%.1f of 100)%n", g.score())
                    .replace(System.lineSeparator(), "\n"));
            for (String c : g.comments()) {
                b.append("  - ").append(c).append('\n');
            }
            for (String p : g.problems()) {
                b.append("  ! ").append(p).append('\n');
            }
        }
        return b.toString();
    }

    /** @return the report as CSV (one row per student), LF line ends */
    public String csv() {
        StringBuilder b = new StringBuilder(CSV_HEADER).append('\n');
        for (StudentGrade g : grades) {
            double[] e = fixErrors(g);
            long worked = g.sights().stream().filter(s -> s.hoErrorArcmin().isPresent()
                    || s.interceptErrorNm().isPresent()).count();
            b.append(quote(g.student())).append(',')
                    .append(String.format(Locale.ROOT, "%.1f", g.score())).append(',')
                    .append(handedIn(g)).append(',').append(g.fixes().size()).append(',')
                    .append(e.length == 0 ? "" : fmt(mean(e))).append(',')
                    .append(e.length == 0 ? "" : fmt(max(e))).append(',')
                    .append(worked).append(',')
                    .append(quote(mistakeList(g, ";"))).append(',')
                    .append(g.problems().size()).append('\n');
        }
        return b.toString();
    }

    private static long handedIn(StudentGrade g) {
        return g.fixes().stream().filter(f -> f.student().isPresent()).count();
    }

    private static double[] fixErrors(StudentGrade g) {
        List<Double> l = new ArrayList<>();
        g.fixes().forEach(f -> f.errorFromKeyNm().ifPresent(l::add));
        return l.stream().mapToDouble(Double::doubleValue).toArray();
    }

    private static String mistakeList(StudentGrade g, String sep) {
        Map<Mistake, Integer> m = new EnumMap<>(Mistake.class);
        g.allMistakes().forEach(x -> m.merge(x, 1, Integer::sum));
        List<String> parts = new ArrayList<>();
        m.forEach((k, n) -> parts.add(word(k) + (n > 1 ? " x" + n : "")));
        return parts.isEmpty() ? "none" : String.join(sep, parts);
    }

    /**
     * @param m a mistake
     * @return its name in lower case with hyphens, as written in reports
     */
    public static String word(Mistake m) {
        return m.name().toLowerCase(Locale.ROOT).replace('_', '-');
    }

    private static double mean(double[] v) {
        double s = 0;
        for (double x : v) {
            s += x;
        }
        return s / v.length;
    }

    private static double max(double[] v) {
        double s = 0;
        for (double x : v) {
            s = Math.max(s, x);
        }
        return s;
    }

    private static String fmt(double v) {
        return String.format(Locale.ROOT, "%.2f", v);
    }

    private static String clip(String s, int n) {
        return s.length() <= n ? s : s.substring(0, n - 1) + "…";
    }

    private static String quote(String s) {
        return s.contains(",") || s.contains("\"") || s.contains(";") ? "\"" + s.replace("\"", "\"\"") + "\"" : s;
    }
}
