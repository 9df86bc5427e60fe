package org.sightwork.celestial.drill;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.time.format.DateTimeParseException;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.OptionalDouble;
import org.sightwork.geo.earth.Angles;
import org.sightwork.geo.earth.GeoPosition;

/**
 * A student's answers: the documented CSV of {@code docs/DRILLS.md}.
 *
 * <pre>
 * # student: A. Student
 * kind,ref,utc,lat,lon,ho,intercept_nm
 * fix,morning,2026-06-21T05:40:00Z,38°25.1′N,028°01.9′W,,
 * sight,1,,,,41°12.4′,+2.3
 * </pre>
 *
 * <p>A {@code fix} row needs utc, lat and lon ({@code ref} may name the session). A {@code sight}
 * row names the sight's number in {@code ref} and gives Ho (d°m.m′ or degrees) and/or the intercept
 * (nm, + or T toward, − or A away). Lines starting with {@code #} are comments; {@code # student:}
 * names the student (else the file name does). Bad cells are reported with line and column and the
 * rest of the file goes on.
 *
 * @param student the student's name
 * @param file the file read (for messages)
 * @param fixes the fixes given
 * @param sights the per-sight answers given
 * @param problems what could not be read, with line and column
 */
public record StudentAnswers(String student, String file, List<FixAnswer> fixes, List<SightAnswer> sights,
        List<String> problems) {

    /** The header line of the format. */
    public static final String HEADER = "kind,ref,utc,lat,lon,ho,intercept_nm";

    /** Copies the lists. */
    public StudentAnswers {
        fixes = List.copyOf(fixes);
        sights = List.copyOf(sights);
        problems = List.copyOf(problems);
    }

    /**
     * A fix as the student worked it.
     *
     * @param line the line in the file
     * @param ref the label given (may be empty)
     * @param utc its time
     * @param position the position
     */
    public record FixAnswer(int line, String ref, Instant utc, GeoPosition position) {
    }

    /**
     * A sight as the student worked it.
     *
     * @param line the line in the file
     * @param number the sight's number in the log
     * @param hoDeg Ho (degrees), if given
     * @param interceptNm intercept (nm, + toward), if given
     */
    public record SightAnswer(int line, int number, OptionalDouble hoDeg, OptionalDouble interceptNm) {
    }

    /**
     * Reads an answer file.
     *
     * @param path the file
     * @return the answers, with the problems found
     * @throws IOException if it cannot be read
     */
    public static StudentAnswers read(Path path) throws IOException {
        String name = path.getFileName().toString().replaceFirst("\\.[^.]*$", "");
        return parse(Files.readString(path, StandardCharsets.UTF_8), path.toString(), name);
    }

    /**
     * Reads answers from text.
     *
     * @param text the CSV
     * @param file the file name for messages
     * @param defaultStudent the student's name when the file does not give one
     * @return the answers
     */
    public static StudentAnswers parse(String text, String file, String defaultStudent) {
        List<FixAnswer> fixes = new ArrayList<>();
        List<SightAnswer> sights = new ArrayList<>();
        List<String> problems = new ArrayList<>();
        String student = defaultStudent;
        String[] lines = text.split("\r?\n", -1);
        boolean headerSeen = false;
        for (int i = 0; i < lines.length; i++) {
            int ln = i + 1;
            String raw = lines[i].strip();
            if (raw.isEmpty()) {
                continue;
            }
            if (raw.startsWith("#")) {
                String c = raw.substring(1).strip();
                if (c.toLowerCase(Locale.ROOT).startsWith("student:")) {
                    student = c.substring("student:".length()).strip();
                }
                continue;
            }
            if (!headerSeen) {
                headerSeen = true;
                if (raw.replace(" ", "").equalsIgnoreCase(HEADER)) {
                    continue;
                }
                problems.add(file + ": line " + ln + ": expected the header '" + HEADER + "'; reading on as data");
            }
            String[] f = (raw + ",,,,,,,").split(",", -1);
            String kind = f[0].strip().toLowerCase(Locale.ROOT);
            try {
                if (kind.equals("fix")) {
                    if (f[3].isBlank() && f[4].isBlank()) {
                        continue; // a template line not filled in
                    }
                    Instant t = time(f[2], file, ln);
                    double lat = cell(file, ln, 4, "lat", f[3], "a latitude such as 38°25.1′N", true);
                    double lon = cell(file, ln, 5, "lon", f[4], "a longitude such as 028°01.9′W", false);
                    fixes.add(new FixAnswer(ln, f[1].strip(), t, GeoPosition.of(lat, lon)));
                } else if (kind.equals("sight")) {
                    int n;
                    try {
                        n = Integer.parseInt(f[1].strip());
                    } catch (NumberFormatException e) {
                        throw new IllegalArgumentException(file + ": line " + ln + ", column 2 (ref): expected the sight's "
                                + "number in the log, got '" + f[1].strip() + "'");
                    }
                    OptionalDouble ho = OptionalDouble.empty();
                    if (!f[5].isBlank()) {
                        try {
                            ho = OptionalDouble.of(Angles.parse(f[5]));
                        } catch (IllegalArgumentException e) {
                            throw new IllegalArgumentException(file + ": line " + ln + ", column 6 (ho): expected "
                                    + Angles.ACCEPTED_FORMS + ", got '" + f[5].strip() + "'");
                        }
                    }
                    OptionalDouble in = f[6].isBlank() ? OptionalDouble.empty()
                            : OptionalDouble.of(intercept(f[6], file, ln));
                    if (ho.isEmpty() && in.isEmpty()) {
                        continue; // a template line not filled in
                    }
                    sights.add(new SightAnswer(ln, n, ho, in));
                } else {
                    problems.add(file + ": line " + ln + ", column 1 (kind): expected fix or sight, got '" + f[0].strip() + "'");
                }
            } catch (IllegalArgumentException e) {
                problems.add(e.getMessage());
            }
        }
        return new StudentAnswers(student, file, fixes, sights, problems);
    }

    private static Instant time(String s, String file, int ln) {
        try {
            return Instant.parse(s.strip());
        } catch (DateTimeParseException e) {
            throw new IllegalArgumentException(file + ": line " + ln + ", column 3 (utc): expected a UTC time such as "
                    + "2026-06-21T05:40:00Z, got '" + s.strip() + "'");
        }
    }

    private static double cell(String file, int ln, int col, String name, String s, String expected, boolean lat) {
        try {
            return lat ? Angles.parseLatitude(s) : Angles.parseLongitude(s);
        } catch (IllegalArgumentException e) {
            throw new IllegalArgumentException(file + ": line " + ln + ", column " + col + " (" + name + "): expected "
                    + expected + ", got '" + s.strip() + "'");
        }
    }

    private static double intercept(String s, String file, int ln) {
        String t = s.strip().toUpperCase(Locale.ROOT).replace(" ", "");
        double sign = 1;
        if (t.endsWith("TOWARD") || t.endsWith("T")) {
            t = t.substring(0, t.length() - (t.endsWith("TOWARD") ? 6 : 1));
        } else if (t.endsWith("AWAY") || t.endsWith("A")) {
            t = t.substring(0, t.length() - (t.endsWith("AWAY") ? 4 : 1));
            sign = -1;
        }
        try {
            double v = Double.parseDouble(t);
            if (sign < 0 && v < 0) {
                throw new NumberFormatException("both");
            }
            return sign * v;
        } catch (NumberFormatException e) {
            throw new IllegalArgumentException(file + ": line " + ln + ", column 7 (intercept_nm): expected nautical "
                    + "miles, + or T toward, - or A away (e.g. +2.3, 2.3T, -1.1, 1.1A), got '" + s.strip() + "'");
        }
    }
}
