package org.sightwork.celestial.drill;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Locale;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.sightwork.celestial.almanac.Almanac;
import org.sightwork.geo.earth.Angles;

/**
 * The grader: a right answer earns full marks, and each common mistake, injected into an answer
 * by working the sight again with that mistake, is recognised. The key is the demo drill's (seed 7).
 * Non-regression of the rubric; validation of the recognition (each mistake is defined by the
 * trade's rule it breaks, named in {@link Mistake}).
 */
class DrillGraderTest {

    private static AnswerKey key;

    @BeforeAll
    static void makeKey() {
        key = DrillGenerator.generate(Scenarios.demo(), 7, Almanac.standard()).key();
    }

    /** An answer file: every fix from the key, every sight's Ho and intercept, each optionally replaced. */
    private static String answers(java.util.function.Function<AnswerKey.SightKey, String> sightRow,
            java.util.function.Function<AnswerKey.FixKey, String> fixRow) {
        StringBuilder b = new StringBuilder("# student: Test Student\n").append(StudentAnswers.HEADER).append('\n');
        key.fixes().forEach(f -> b.append(fixRow.apply(f)).append('\n'));
        key.sights().forEach(s -> b.append(sightRow.apply(s)).append('\n'));
        return b.toString();
    }

    private static String sight(AnswerKey.SightKey s, double hoDeg, double interceptNm) {
        return String.format(Locale.ROOT, "sight,%d,,,,%s,%+.1f", s.number(), Angles.formatDm(hoDeg, 2), interceptNm);
    }

    private static String fix(AnswerKey.FixKey f, double latDeg, double lonDeg) {
        return "fix," + f.session() + "," + f.utc() + "," + Angles.formatLatitude(latDeg) + ","
                + Angles.formatLongitude(lonDeg) + ",,";
    }

    private static StudentGrade grade(String csv) {
        return DrillGrader.grade(key, StudentAnswers.parse(csv, "answers.csv", "file-name"));
    }

    @Test
    void theKeyItselfEarnsFullMarks() {
        StudentGrade g = grade(answers(s -> sight(s, s.hoDeg(), s.interceptNm()),
                f -> fix(f, f.fix().latDeg(), f.fix().lonDeg())));
        assertEquals(100.0, g.score(), 1e-9, "score of the key's own answers");
        assertTrue(g.allMistakes().isEmpty(), "no mistakes: " + g.comments());
        assertEquals("Test Student", g.student(), "name from the '# student:' line");
        assertTrue(g.problems().isEmpty(), "no problems: " + g.problems());
    }

    @Test
    void eachAltitudeMistakeIsRecognisedFromHo() {
        for (Mistake m : List.of(Mistake.INDEX_ERROR_WRONG_SIGN, Mistake.DIP_FORGOTTEN, Mistake.DIP_WRONG_SIGN,
                Mistake.SEMI_DIAMETER_FORGOTTEN, Mistake.WRONG_LIMB)) {
            AnswerKey.SightKey target = key.sights().stream().filter(s -> s.with(m).isPresent()).findFirst().orElseThrow();
            AnswerKey.MistakeResult r = target.with(m).orElseThrow();
            // The student's number carries the rounding of a worked sight (0.1′ written) on top of the mistake.
            StudentGrade g = grade(answers(s -> s == target ? sight(s, r.hoDeg() + 0.1 / 60, r.interceptNm() + 0.1)
                    : sight(s, s.hoDeg(), s.interceptNm()), f -> fix(f, f.fix().latDeg(), f.fix().lonDeg())));
            StudentGrade.SightGrade sg = g.sights().get(target.number() - 1);
            assertTrue(sg.mistakes().contains(m), m + " on sight " + target.number() + ": " + g.comments());
            assertTrue(g.comments().stream().anyMatch(c -> c.contains(m.advice())), m + ": comment " + g.comments());
            assertTrue(g.score() < 100, m + ": points lost");
        }
    }

    @Test
    void eachAlmanacMistakeIsRecognisedFromHcWithHoRight() {
        for (Mistake m : List.of(Mistake.HOUR_LATE, Mistake.HOUR_EARLY, Mistake.DAY_LATE, Mistake.DAY_EARLY,
                Mistake.LONGITUDE_SIGN, Mistake.WATCH_ERROR_NOT_APPLIED, Mistake.WATCH_ERROR_WRONG_SIGN)) {
            // A star sight: the day mistake moves a star's GHA by ~59′, a clear signal.
            AnswerKey.SightKey target = key.sights().stream().filter(s -> !s.body().equals("Sun"))
                    .filter(s -> s.with(m).isPresent()).findFirst().orElseThrow();
            AnswerKey.MistakeResult r = target.with(m).orElseThrow();
            StudentGrade g = grade(answers(s -> s == target ? sight(s, s.hoDeg(), r.interceptNm())
                    : sight(s, s.hoDeg(), s.interceptNm()), f -> fix(f, f.fix().latDeg(), f.fix().lonDeg())));
            StudentGrade.SightGrade sg = g.sights().get(target.number() - 1);
            assertTrue(sg.mistakes().contains(m), m + " on sight " + target.number() + ": " + g.comments());
        }
    }

    @Test
    void anInterceptAloneIsMatchedAgainstEveryMistake() {
        AnswerKey.SightKey target = key.sights().get(0);
        AnswerKey.MistakeResult r = target.with(Mistake.DIP_WRONG_SIGN).orElseThrow();
        StudentGrade g = grade(StudentAnswers.HEADER + "\n" + String.format(Locale.ROOT, "sight,%d,,,,,%.1fT",
                target.number(), r.interceptNm()));
        assertTrue(g.sights().get(0).mistakes().contains(Mistake.DIP_WRONG_SIGN), g.comments().toString());
    }

    @Test
    void towardAndAwaySwappedIsRecognised() {
        AnswerKey.SightKey target = key.sights().stream().filter(s -> Math.abs(s.interceptNm()) > 2).findFirst()
                .orElseThrow();
        StudentGrade g = grade(answers(s -> s == target ? sight(s, s.hoDeg(), -s.interceptNm())
                : sight(s, s.hoDeg(), s.interceptNm()), f -> fix(f, f.fix().latDeg(), f.fix().lonDeg())));
        assertEquals(List.of(Mistake.TOWARD_AWAY_SWAPPED), g.sights().get(target.number() - 1).mistakes(),
                g.comments().toString());
    }

    @Test
    void aFixWithEastAndWestSwappedIsRecognised() {
        AnswerKey.FixKey target = key.fixes().get(0);
        StudentGrade g = grade(answers(s -> sight(s, s.hoDeg(), s.interceptNm()),
                f -> f == target ? fix(f, f.fix().latDeg(), -f.fix().lonDeg()) : fix(f, f.fix().latDeg(), f.fix().lonDeg())));
        assertEquals(List.of(Mistake.FIX_LONGITUDE_SIGN), g.fixes().get(0).mistakes(), g.comments().toString());
        assertEquals(0.0, g.fixes().get(0).points(), 1e-9, "no points for a fix in the wrong hemisphere");
    }

    @Test
    void noiseWithinTheToleranceIsNotAMistake() {
        // 0.2′ off every Ho and 0.4 nm off every intercept: within 0.3′ and 0.5 nm.
        StudentGrade g = grade(answers(s -> sight(s, s.hoDeg() + 0.2 / 60, s.interceptNm() + 0.4),
                f -> fix(f, f.fix().latDeg() + 0.5 / 60, f.fix().lonDeg())));
        assertTrue(g.allMistakes().isEmpty(), g.comments().toString());
        assertEquals(100.0, g.score(), 1e-9, "within tolerance: full marks");
    }

    @Test
    void aMistakeTooSmallToTellFromNoiseIsNeverClaimed() {
        // A hand-made key sight whose 'day late' moves Hc by 0.4′ (< 2 x 0.5′): an intercept 0.7 nm off
        // that happens to match it must not be called that mistake.
        AnswerKey.SightKey k = key.sights().get(0);
        AnswerKey.SightKey small = new AnswerKey.SightKey(k.number(), k.session(), k.body(), k.limb(), k.trueUtc(),
                k.loggedTime(), k.utcAsWorked(), k.hsText(), k.hsDeg(), k.randomErrorArcmin(), k.truePosition(),
                k.drPosition(), k.trueHoDeg(), k.corrections(), k.hoDeg(), k.ghaDeg(), k.decDeg(), k.lhaDeg(), k.hcDeg(),
                k.znDeg(), k.interceptNm(), List.of(new AnswerKey.MistakeResult(Mistake.DAY_LATE, k.hoDeg(),
                        k.hcDeg() - 0.4 / 60, k.znDeg(), k.interceptNm() + 0.4)));
        AnswerKey tiny = new AnswerKey(1, "t", true, 1, AnswerKey.Tolerances.STANDARD, List.of(small), List.of());
        StudentGrade g = DrillGrader.grade(tiny, StudentAnswers.parse(StudentAnswers.HEADER + "\n"
                + String.format(Locale.ROOT, "sight,%d,,,,,%+.2f", k.number(), k.interceptNm() + 0.6), "a.csv", "a"));
        assertTrue(g.allMistakes().isEmpty(), g.comments().toString());
        assertTrue(g.comments().get(0).contains("No single common mistake"), g.comments().toString());
    }

    @Test
    void theRubricSteps() {
        // Fixes only: 100 points over 4 fixes, 25 each; 2 nm off earns half (1-3 nm), 4 nm a quarter, 6 nm none.
        double[] offNm = {0.5, 2, 4, 6};
        StringBuilder b = new StringBuilder(StudentAnswers.HEADER).append('\n');
        for (int i = 0; i < key.fixes().size(); i++) {
            AnswerKey.FixKey f = key.fixes().get(i);
            b.append(fix(f, f.fix().latDeg() + offNm[i] / 60, f.fix().lonDeg())).append('\n');
        }
        StudentGrade g = grade(b.toString());
        assertTrue(g.fixesOnly(), "no per-sight working");
        assertEquals(25 + 12.5 + 6.25 + 0, g.score(), 0.051, "steps of the rubric (rounded to 0.1)");
    }

    @Test
    void badCellsAreReportedWithLineAndColumnAndTheRestIsGraded() {
        StudentAnswers a = StudentAnswers.parse(StudentAnswers.HEADER + "\nfix,x,2026-06-21T22:07:00Z,91N,027W,,\n"
                + "sight,2,,,,abc,\nsight,3,,,,,2.3Q\n" + sight(key.sights().get(0), key.sights().get(0).hoDeg(),
                key.sights().get(0).interceptNm()) + "\n", "a.csv", "a");
        assertEquals(3, a.problems().size(), a.problems().toString());
        assertTrue(a.problems().get(0).startsWith("a.csv: line 2, column 4 (lat)"), a.problems().get(0));
        assertTrue(a.problems().get(1).startsWith("a.csv: line 3, column 6 (ho)"), a.problems().get(1));
        assertTrue(a.problems().get(2).startsWith("a.csv: line 4, column 7 (intercept_nm)"), a.problems().get(2));
        assertEquals(1, a.sights().size(), "the good row goes on");
    }

    @Test
    void theClassReportCountsMistakesPerStudent() {
        AnswerKey.SightKey t = key.sights().get(0);
        StudentGrade good = grade(answers(s -> sight(s, s.hoDeg(), s.interceptNm()),
                f -> fix(f, f.fix().latDeg(), f.fix().lonDeg())));
        AnswerKey.MistakeResult r = t.with(Mistake.DIP_WRONG_SIGN).orElseThrow();
        StudentGrade bad = grade(answers(s -> s == t ? sight(s, r.hoDeg(), r.interceptNm())
                : sight(s, s.hoDeg(), s.interceptNm()), f -> fix(f, f.fix().latDeg(), f.fix().lonDeg())));
        ClassReport rep = new ClassReport(key.title(), List.of(good, bad));
        assertEquals(1, rep.mistakeCounts().get(Mistake.DIP_WRONG_SIGN), "one student added the dip");
        String csv = rep.csv();
        assertTrue(csv.startsWith(ClassReport.CSV_HEADER + "\n"), csv);
        assertEquals(3, csv.split("\n").length, "header and two students");
        assertTrue(rep.text().contains("dip-wrong-sign"), rep.text());
        assertFalse(rep.text().contains("\r"), "LF line ends");
    }
}
