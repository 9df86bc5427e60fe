package org.sightwork.celestial.drill;

import java.util.ArrayList;
import java.util.EnumSet;
import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.Set;
import org.sightwork.geo.earth.GeoPosition;
import org.sightwork.geo.earth.Sailings;

/**
 * Grades a student's answers against a drill's key and recognises the common mistakes.
 *
 * <p><b>Method.</b> Each answer is compared with the key's correct value. When it is off by more
 * than the tolerance, it is compared with the key's value for each {@link Mistake} (the sight
 * recomputed with that one mistake); a mistake is recognised when the student's number lies within
 * the tolerance of it <em>and</em> the mistake moves the number by more than twice the tolerance
 * (otherwise it cannot be told from noise and is not claimed). Ho is matched against the altitude
 * mistakes; the student's Hc (Ho − intercept, when both are given) against the almanac mistakes;
 * an intercept alone against all of them. A number that fits two mistakes is reported as either.
 *
 * <p><b>Rubric</b> (docs/DRILLS.md): fixes {@value #FIX_POINTS} points, Ho {@value #HO_POINTS},
 * intercepts {@value #INTERCEPT_POINTS}, each shared equally among the key's fixes or sights. A
 * fix within {@code fixFullMarksNm} of the key's fix earns its share, within
 * {@code fixHalfMarksNm} half, within {@code fixQuarterMarksNm} a quarter. Ho within the tolerance
 * earns its share, within {@value #HO_HALF_MARKS_ARCMIN}′ half; an intercept within the tolerance its
 * share, within {@value #INTERCEPT_HALF_MARKS_NM} nm half. A student who hands in no per-sight
 * working is scored on the fixes alone, out of 100, and told so.
 *
 * <p><b>Limits.</b> Single mistakes only: two mistakes in one sight are reported as "no single
 * common mistake explains it". A mistake whose effect is within twice the tolerance (e.g. the
 * Sun's declination for the next day near a solstice) is never claimed.
 */
public final class DrillGrader {

    /** Points for the fixes when per-sight working is handed in. */
    public static final int FIX_POINTS = 50;
    /** Points for the Ho of all sights. */
    public static final int HO_POINTS = 25;
    /** Points for the intercepts of all sights. */
    public static final int INTERCEPT_POINTS = 25;
    /** Ho within this earns half marks (minutes of arc): about three tolerances. */
    public static final double HO_HALF_MARKS_ARCMIN = 1.0;
    /** An intercept within this earns half marks (nm): three tolerances. */
    public static final double INTERCEPT_HALF_MARKS_NM = 1.5;

    private DrillGrader() {
    }

    /**
     * Grades one student.
     *
     * @param key the answer key
     * @param answers the student's answers
     * @return the grade
     */
    public static StudentGrade grade(AnswerKey key, StudentAnswers answers) {
        AnswerKey.Tolerances tol = key.tolerances();
        List<String> comments = new ArrayList<>();
        List<String> problems = new ArrayList<>(answers.problems());
        boolean fixesOnly = answers.sights().isEmpty();
        double hoShare = key.sights().isEmpty() ? 0 : (double) HO_POINTS / key.sights().size();
        double inShare = key.sights().isEmpty() ? 0 : (double) INTERCEPT_POINTS / key.sights().size();
        Set<Integer> known = new HashSet<>();
        key.sights().forEach(s -> known.add(s.number()));
        for (StudentAnswers.SightAnswer a : answers.sights()) {
            if (!known.contains(a.number())) {
                problems.add(answers.file() + ": line " + a.line() + ": there is no sight " + a.number() + " in the log");
            }
        }
        List<StudentGrade.SightGrade> sightGrades = new ArrayList<>();
        double score = 0;
        for (AnswerKey.SightKey k : key.sights()) {
            Optional<StudentAnswers.SightAnswer> a = answers.sights().stream()
                    .filter(x -> x.number() == k.number()).findFirst();
            StudentGrade.SightGrade g = gradeSight(k, a, tol, hoShare, inShare, comments);
            sightGrades.add(g);
            score += g.hoPoints() + g.interceptPoints();
        }
        double fixShare = key.fixes().isEmpty() ? 0 : (fixesOnly ? 100.0 : FIX_POINTS) / key.fixes().size();
        List<StudentAnswers.FixAnswer> unused = new ArrayList<>(answers.fixes());
        List<StudentGrade.FixGrade> fixGrades = new ArrayList<>();
        for (AnswerKey.FixKey f : key.fixes()) {
            StudentGrade.FixGrade g = gradeFix(f, unused, tol, fixShare, comments);
            fixGrades.add(g);
            score += g.points();
        }
        if (fixesOnly) {
            comments.add("No per-sight working (Ho, intercepts) was handed in: scored on the fixes alone.");
        }
        for (StudentAnswers.FixAnswer u : unused) {
            comments.add("The fix at " + u.utc() + " (line " + u.line() + ") matches no fix asked for (none within "
                    + fmt0(tol.fixMatchMinutes()) + " min).");
        }
        score = Math.round(Math.min(100.0, score) * 10.0) / 10.0;
        return new StudentGrade(answers.student(), answers.file(), sightGrades, fixGrades, unused, score, fixesOnly,
                comments, problems);
    }

    private static StudentGrade.SightGrade gradeSight(AnswerKey.SightKey k, Optional<StudentAnswers.SightAnswer> a,
            AnswerKey.Tolerances tol, double hoShare, double inShare, List<String> comments) {
        String who = "Sight " + k.number() + " (" + k.body() + ")";
        if (a.isEmpty()) {
            return new StudentGrade.SightGrade(k.number(), k.body(), OptionalDouble.empty(), OptionalDouble.empty(),
                    0, 0, List.of(), false);
        }
        OptionalDouble sHo = a.get().hoDeg();
        OptionalDouble sIn = a.get().interceptNm();
        Set<Mistake> found = EnumSet.noneOf(Mistake.class);
        boolean ambiguous = false;
        double hoPts = 0;
        double inPts = 0;
        OptionalDouble hoErr = OptionalDouble.empty();
        OptionalDouble inErr = OptionalDouble.empty();
        if (sHo.isPresent()) {
            double d = (sHo.getAsDouble() - k.hoDeg()) * 60.0;
            hoErr = OptionalDouble.of(d);
            hoPts = Math.abs(d) <= tol.hoArcmin() ? hoShare : Math.abs(d) <= HO_HALF_MARKS_ARCMIN ? hoShare / 2 : 0;
            if (Math.abs(d) > tol.hoArcmin()) {
                List<Mistake> c = match(k, Mistake.Stage.ALTITUDE, sHo.getAsDouble() * 60.0, r -> r.hoDeg() * 60.0,
                        k.hoDeg() * 60.0, tol.hoArcmin());
                ambiguous |= c.size() > 1;
                found.addAll(c);
                comments.add(explain(who, "Ho", d, "′", c));
            }
        }
        if (sIn.isPresent()) {
            double d = sIn.getAsDouble() - k.interceptNm();
            inErr = OptionalDouble.of(d);
            inPts = Math.abs(d) <= tol.interceptNm() ? inShare
                    : Math.abs(d) <= INTERCEPT_HALF_MARKS_NM ? inShare / 2 : 0;
            if (Math.abs(d) > tol.interceptNm()) {
                List<Mistake> c;
                if (sHo.isPresent()) {
                    // Separate the Hc from the Ho: the student's own Hc is Ho - intercept.
                    double sHcArcmin = sHo.getAsDouble() * 60.0 - sIn.getAsDouble();
                    double ownIntercept = sHo.getAsDouble() * 60.0 - k.hcDeg() * 60.0;
                    if (Math.abs(sHcArcmin - k.hcDeg() * 60.0) <= tol.interceptNm()) {
                        c = List.of(); // Hc right: the intercept's error is the Ho's, already told
                    } else if (Math.abs(sIn.getAsDouble() + ownIntercept) <= tol.interceptNm()
                            && Math.abs(ownIntercept) > tol.interceptNm()) {
                        c = List.of(Mistake.TOWARD_AWAY_SWAPPED);
                        comments.add(explain(who, "intercept", d, " nm", c));
                    } else {
                        c = match(k, Mistake.Stage.ALMANAC, sHcArcmin, r -> r.hcDeg() * 60.0, k.hcDeg() * 60.0,
                                tol.interceptNm());
                        comments.add(explain(who, "Hc (Ho − intercept)", sHcArcmin - k.hcDeg() * 60.0, "′", c));
                    }
                } else {
                    c = match(k, null, sIn.getAsDouble(), AnswerKey.MistakeResult::interceptNm, k.interceptNm(),
                            tol.interceptNm());
                    comments.add(explain(who, "intercept", d, " nm", c));
                }
                ambiguous |= c.size() > 1;
                found.addAll(c);
            }
        }
        return new StudentGrade.SightGrade(k.number(), k.body(), hoErr, inErr, hoPts, inPts, new ArrayList<>(found),
                ambiguous);
    }

    /** The mistakes (of a stage, or any when null) whose value lies within tol of the student's. */
    private static List<Mistake> match(AnswerKey.SightKey k, Mistake.Stage stage, double student,
            java.util.function.ToDoubleFunction<AnswerKey.MistakeResult> value, double correct, double tol) {
        List<Mistake> out = new ArrayList<>();
        for (AnswerKey.MistakeResult r : k.mistakes()) {
            if (stage != null && r.mistake().stage() != stage) {
                continue;
            }
            double v = value.applyAsDouble(r);
            if (Math.abs(student - v) <= tol && Math.abs(v - correct) > 2 * tol) {
                out.add(r.mistake());
            }
        }
        return out;
    }

    private static String explain(String who, String what, double err, String unit, List<Mistake> c) {
        String off = String.format(Locale.ROOT, "%s: %s is %.1f%s %s.", who, what, Math.abs(err), unit,
                err > 0 ? "too high" : "too low");
        if (what.equals("intercept")) {
            off = String.format(Locale.ROOT, "%s: the intercept is %.1f nm off (%+.1f nm).", who, Math.abs(err), err);
        }
        if (c.isEmpty()) {
            return off + " No single common mistake explains it: check each step of the working.";
        }
        if (c.size() == 1) {
            return off + " It looks as if " + c.get(0).advice() + ".";
        }
        StringBuilder b = new StringBuilder(off).append(" It fits more than one mistake: ");
        for (int i = 0; i < c.size(); i++) {
            b.append(i == 0 ? "" : "; or ").append(c.get(i).advice());
        }
        return b.append('.').toString();
    }

    private static StudentGrade.FixGrade gradeFix(AnswerKey.FixKey f, List<StudentAnswers.FixAnswer> unused,
            AnswerKey.Tolerances tol, double share, List<String> comments) {
        StudentAnswers.FixAnswer best = null;
        for (StudentAnswers.FixAnswer a : unused) {
            if (!a.ref().isEmpty() && a.ref().equalsIgnoreCase(f.session())) {
                best = a;
                break;
            }
        }
        if (best == null) {
            long bestGap = Long.MAX_VALUE;
            for (StudentAnswers.FixAnswer a : unused) {
                long gap = Math.abs(java.time.Duration.between(a.utc(), f.utc()).getSeconds());
                if (gap <= tol.fixMatchMinutes() * 60 && gap < bestGap) {
                    bestGap = gap;
                    best = a;
                }
            }
        }
        if (best == null) {
            comments.add("Fix '" + f.session() + "' at " + f.utc() + ": not handed in.");
            return new StudentGrade.FixGrade(f.session(), f.utc(), Optional.empty(), f.fix(), f.truth(),
                    OptionalDouble.empty(), OptionalDouble.empty(), 0, List.of());
        }
        unused.remove(best);
        GeoPosition s = best.position();
        double dKey = distanceNm(s, f.fix());
        double dTrue = distanceNm(s, f.truth());
        double pts = dKey <= tol.fixFullMarksNm() ? share : dKey <= tol.fixHalfMarksNm() ? share / 2
                : dKey <= tol.fixQuarterMarksNm() ? share / 4 : 0;
        List<Mistake> m = new ArrayList<>();
        String msg = String.format(Locale.ROOT, "Fix '%s' at %s: %.1f nm from the best fix these sights give"
                + " (%.1f nm from the true position).", f.session(), f.utc(), dKey, dTrue);
        if (dKey > tol.fixQuarterMarksNm()) {
            AnswerKey.Position mirror = new AnswerKey.Position(f.fix().latDeg(), -f.fix().lonDeg());
            if (distanceNm(s, mirror) <= tol.fixQuarterMarksNm()) {
                m.add(Mistake.FIX_LONGITUDE_SIGN);
                msg += " It looks as if " + Mistake.FIX_LONGITUDE_SIGN.advice() + ".";
            }
        }
        if (dKey > tol.fixFullMarksNm()) {
            comments.add(msg);
        }
        return new StudentGrade.FixGrade(f.session(), f.utc(),
                Optional.of(new AnswerKey.Position(s.latDeg(), s.lonDeg())), f.fix(), f.truth(),
                OptionalDouble.of(dKey), OptionalDouble.of(dTrue), pts, m);
    }

    /**
     * Great-circle distance between a position and a key position (nm).
     *
     * @param a a position
     * @param b a key position
     * @return the distance (nm)
     */
    static double distanceNm(GeoPosition a, AnswerKey.Position b) {
        return Sailings.greatCircle(a, GeoPosition.of(b.latDeg(), b.lonDeg())).distanceNm();
    }

    private static String fmt0(double v) {
        return String.format(Locale.ROOT, "%.0f", v);
    }
}
