package org.sightwork.celestial.ui.drill;

import java.time.Instant;
import java.time.ZoneOffset;
import java.time.format.DateTimeFormatter;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.stream.Collectors;
import org.sightwork.celestial.drill.AnswerKey;
import org.sightwork.celestial.drill.Mistake;
import org.sightwork.celestial.drill.StudentGrade;
import org.sightwork.geo.earth.Angles;

/**
 * One line of the drill panel's table: one fix of one student, as {@link
 * org.sightwork.celestial.drill.DrillGrader} graded it. The numbers are the grader's, unchanged;
 * only the text is made here (positions in d°m.m′, distances to 0.1 nm).
 *
 * @param session the fix's session
 * @param utc the fix's time
 * @param student the student's fix, if one was handed in and matched
 * @param keyFix the key's fix
 * @param truth the true position
 * @param errorFromKeyNm distance from the student's fix to the key's (nm)
 * @param errorFromTruthNm distance from the student's fix to the truth (nm)
 * @param points points earned
 * @param mistakes the mistakes recognised in the fix
 */
public record DrillRow(String session, Instant utc, Optional<AnswerKey.Position> student, AnswerKey.Position keyFix,
        AnswerKey.Position truth, OptionalDouble errorFromKeyNm, OptionalDouble errorFromTruthNm, double points,
        List<Mistake> mistakes) {

    private static final DateTimeFormatter HHMM = DateTimeFormatter.ofPattern("HH:mm", Locale.ROOT)
            .withZone(ZoneOffset.UTC);

    /** Copies the list. */
    public DrillRow {
        mistakes = List.copyOf(mistakes);
    }

    /**
     * The rows of one student's grade, one per fix asked for, in the key's order.
     *
     * @param g the grade
     * @return the rows
     */
    public static List<DrillRow> of(StudentGrade g) {
        return g.fixes().stream().map(f -> new DrillRow(f.session(), f.utc(), f.student(), f.keyFix(), f.truth(),
                f.errorFromKeyNm(), f.errorFromTruthNm(), f.points(), f.mistakes())).toList();
    }

    /** @return the session and the fix's time (UTC), e.g. "2026-06-22 morning stars, 05:34" */
    public String fixText() {
        return session + ", " + HHMM.format(utc);
    }

    /** @return the student's fix, or "not handed in" */
    public String studentText() {
        return student.map(DrillRow::position).orElse("not handed in");
    }

    /** @return the key's fix */
    public String keyText() {
        return position(keyFix);
    }

    /** @return the true position */
    public String truthText() {
        return position(truth);
    }

    /** @return the distance from the key's fix (nm), or a dash */
    public String errorFromKeyText() {
        return nm(errorFromKeyNm);
    }

    /** @return the distance from the truth (nm), or a dash */
    public String errorFromTruthText() {
        return nm(errorFromTruthNm);
    }

    /** @return the points, to 0.1 */
    public String pointsText() {
        return String.format(Locale.ROOT, "%.1f", points);
    }

    /** @return the mistakes recognised, in words, or a dash */
    public String mistakesText() {
        return mistakes.isEmpty() ? "–" : mistakes.stream().map(Mistake::advice).collect(Collectors.joining("; "));
    }

    static String position(AnswerKey.Position p) {
        return Angles.formatLatitude(p.latDeg()) + " " + Angles.formatLongitude(p.lonDeg());
    }

    private static String nm(OptionalDouble d) {
        return d.isPresent() ? String.format(Locale.ROOT, "%.1f", d.getAsDouble()) : "–";
    }
}
