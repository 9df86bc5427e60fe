package org.sightwork.celestial.passage;

import java.time.Duration;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import org.hipparchus.distribution.continuous.ChiSquaredDistribution;
import org.sightwork.geo.earth.GeoPosition;
import org.sightwork.geo.earth.Sailings;
import org.sightwork.geo.track.DeadReckoning;
import org.sightwork.geo.track.DrLeg;
import org.sightwork.geo.track.DrLog;
import org.sightwork.geo.track.Track;

/**
 * Is the GPS telling the truth? Compares a GPS track with the reconciled celestial-and-DR estimate
 * at every sight session, and looks in the GPS track itself for named patterns.
 *
 * <p><b>Method.</b> At the end of each sight session the filter's causal estimate p̂ with covariance
 * P (from the DR and the sights up to then, never from the GPS) is compared with the GPS position g
 * at the same time (interpolated, gaps of at most {@link #MAX_GPS_GAP}). If the GPS is right, g − p̂
 * is normal with covariance P + σ_gps² I, and the normalised innovation squared
 * NIS = (g − p̂)ᵀ (P + σ_gps² I)⁻¹ (g − p̂) follows a chi-square law with 2 degrees of freedom
 * (Bar-Shalom, Li, Kirubarajan 2001, §5.4.2, the innovation-based consistency test). It is tested at
 * 95 % (5.99) and 99 % (9.21); the quantiles come from Hipparchus's chi-square distribution.
 *
 * <p>The verdict at a session weighs the test with what came before. Exceedances at two sessions in
 * a row count as "repeated" only when both sessions fix the position on their own (a lone Sun line
 * mostly repeats the last fix, carried by the DR, so its error is not new) and the two
 * discrepancies point the same way (within 45°), as a real offset does. <b>Inconsistent</b>: the 99 % level exceeded and something else agrees (a
 * pattern in the GPS track since the session before, a repeated 99 %, or a slow drift), or the NIS
 * beyond the one-in-a-million level (27.6). <b>Suspect</b>: the 99 % level exceeded alone, a
 * repeated 95 %, a slow drift, or a pattern in the GPS track. Otherwise <b>consistent</b>. With a
 * clean GPS the 99 % level alone is exceeded at 1 session in 100: that is the price of the test's
 * power, and why "suspect" asks for more sights rather than saying the GPS is wrong.
 *
 * <p>Patterns in the GPS track, against the DR log's speed: <b>impossible speed</b> (over a window
 * of at least 60 s the GPS moves further from the DR than the current and the log's errors can
 * explain: 5 kn plus 10 % of the log speed, plus four GPS sigmas); <b>step offset</b> (such a jump
 * that is not undone within 10 minutes); <b>frozen position</b> (the GPS position does not move by
 * 2 m for 2 minutes or more while the log gives at least 1 kn); <b>slow drift away</b> (at a
 * fixing session beyond the 99 % level, the discrepancy has grown since the fix before while the
 * GPS track shows no jump since the session before).
 *
 * <p><b>Accuracy.</b> Measured on 1,000 simulated passages with fixed seeds (tests): a 2 nm offset
 * appearing between sessions is flagged at the first session after it, and a clean GPS is never
 * called inconsistent; the figures are in docs/PASSAGE.md.
 *
 * <p><b>Limits.</b> Only as good as the sights: with one poor line of position the test has little
 * power. The GPS's own sigma is taken as given ({@link PassageNoise#gpsSigmaNm()}).
 */
public final class GpsIntegrity {

    /** The longest gap across which a GPS position is interpolated. */
    public static final Duration MAX_GPS_GAP = Duration.ofMinutes(5);
    /** 95 % quantile of chi-square with 2 degrees of freedom. */
    public static final double CHI2_2DOF_95 = new ChiSquaredDistribution(2).inverseCumulativeProbability(0.95);
    /** 99 % quantile of chi-square with 2 degrees of freedom. */
    public static final double CHI2_2DOF_99 = new ChiSquaredDistribution(2).inverseCumulativeProbability(0.99);
    /** 99.9 % quantile of chi-square with 2 degrees of freedom. */
    public static final double CHI2_2DOF_999 = new ChiSquaredDistribution(2).inverseCumulativeProbability(0.999);
    /** 1 − 10⁻⁶ quantile of chi-square with 2 degrees of freedom: beyond any reasonable chance. */
    public static final double CHI2_2DOF_1E6 = new ChiSquaredDistribution(2).inverseCumulativeProbability(1 - 1e-6);

    private static final Duration JUMP_WINDOW = Duration.ofSeconds(60);
    private static final Duration RETURN_WINDOW = Duration.ofMinutes(10);
    private static final Duration FROZEN_MIN = Duration.ofMinutes(2);
    private static final double FROZEN_NM = 2.0 / 1852.0;

    private GpsIntegrity() {
    }

    /** The consistency test at one session. */
    public enum TestLevel {
        /** NIS within the 95 % level. */
        PASS,
        /** NIS beyond the 95 % level, within the 99 %. */
        EXCEEDS_95,
        /** NIS beyond the 99 % level. */
        EXCEEDS_99
    }

    /** The integrity verdict. */
    public enum Verdict {
        /** The GPS agrees with the sights and the DR. */
        CONSISTENT,
        /** Something is off: look again, take more sights. */
        SUSPECT,
        /** The GPS disagrees with the sights and the DR beyond reasonable chance: do not trust it. */
        INCONSISTENT;

        /** @return the verdict in lower case, as shown */
        public String word() {
            return name().toLowerCase(Locale.ROOT);
        }
    }

    /** Named patterns in a GPS track. */
    public enum Pattern {
        /** The GPS jumped and stayed. */
        STEP_OFFSET,
        /** The GPS moves away from the celestial estimate little by little. */
        SLOW_DRIFT,
        /** The GPS position stopped moving while the vessel moves. */
        FROZEN_POSITION,
        /** The GPS moved faster than the vessel can. */
        IMPOSSIBLE_SPEED;

        /** @return the pattern's name in words */
        public String words() {
            return switch (this) {
                case STEP_OFFSET -> "step offset";
                case SLOW_DRIFT -> "slow drift away";
                case FROZEN_POSITION -> "frozen position";
                case IMPOSSIBLE_SPEED -> "impossible speed";
            };
        }
    }

    /**
     * A pattern found, with its evidence.
     *
     * @param pattern which pattern
     * @param from when it began
     * @param to when it ended (or was last seen)
     * @param evidence what was seen, in words and numbers
     */
    public record PatternFinding(Pattern pattern, Instant from, Instant to, String evidence) {
    }

    /**
     * The comparison at one sight session.
     *
     * @param session the session (its causal estimate is the reference)
     * @param gps the GPS position at the session's time, if the GPS had one
     * @param distanceNm distance from the estimate to the GPS (nm; NaN without GPS)
     * @param bearingDeg bearing of the GPS position from the estimate (degrees true; NaN without GPS)
     * @param nis normalised innovation squared (2 degrees of freedom; NaN without GPS)
     * @param level the test result
     * @param verdict the verdict at this session
     * @param evidence why, in words
     */
    public record Discrepancy(Reconciliation.Session session, Optional<GeoPosition> gps, double distanceNm,
            double bearingDeg, double nis, TestLevel level, Verdict verdict, String evidence) {
    }

    /**
     * Set and drift found between two sessions: the estimated positions' difference minus the DR's,
     * over the time between them.
     *
     * @param from the earlier session's time
     * @param to the later session's time
     * @param current set and drift
     */
    public record SetAndDrift(Instant from, Instant to, DeadReckoning.Current current) {
    }

    /**
     * The whole comparison.
     *
     * @param verdict the worst verdict over the passage
     * @param firstFlagged the first session that was not consistent, if any
     * @param discrepancies one per sight session
     * @param patterns the patterns found in the GPS track
     * @param setAndDrift between consecutive sessions
     * @param finalCurrent the current at the end of the passage (smoothed)
     * @param finalCurrentSigmaKn its standard deviation (knots, each component)
     */
    public record Result(Verdict verdict, Optional<Instant> firstFlagged, List<Discrepancy> discrepancies,
            List<PatternFinding> patterns, List<SetAndDrift> setAndDrift, DeadReckoning.Current finalCurrent,
            double finalCurrentSigmaKn) {
        /** Copies the lists. */
        public Result {
            discrepancies = List.copyOf(discrepancies);
            patterns = List.copyOf(patterns);
            setAndDrift = List.copyOf(setAndDrift);
        }
    }

    /**
     * Compares a GPS track with a reconciliation.
     *
     * @param rec the reconciliation of the DR with the sights
     * @param dr the DR log it was made from
     * @param gps the GPS track
     * @param noise the noise model (the GPS sigma is used here)
     * @return the comparison
     */
    public static Result compare(Reconciliation rec, DrLog dr, Track gps, PassageNoise noise) {
        List<PatternFinding> patterns = new ArrayList<>(trackPatterns(gps, dr, noise));
        List<Discrepancy> out = new ArrayList<>();
        LocalFrame frame = rec.frame();
        double gpsVar = noise.gpsSigmaNm() * noise.gpsSigmaNm();
        TestLevel prevLevel = TestLevel.PASS;
        double[] prevVector = null; // east, north of the previous session's discrepancy
        double prevDistance = Double.NaN;
        Instant prevFixEnd = dr.start();
        Instant prevEnd = dr.start();
        Verdict worst = Verdict.CONSISTENT;
        Optional<Instant> firstFlagged = Optional.empty();
        for (Reconciliation.Session s : rec.sessions()) {
            TrackEstimate est = s.filtered();
            Optional<GeoPosition> g = gps.positionAt(s.end(), MAX_GPS_GAP);
            final Instant from = prevEnd;
            List<PatternFinding> recent = patterns.stream()
                    .filter(p -> p.pattern() != Pattern.SLOW_DRIFT && !p.to().isBefore(from) && !p.from().isAfter(s.end()))
                    .toList();
            if (g.isEmpty()) {
                Verdict v = recent.isEmpty() ? Verdict.CONSISTENT : Verdict.SUSPECT;
                out.add(new Discrepancy(s, g, Double.NaN, Double.NaN, Double.NaN, TestLevel.PASS, v,
                        "no GPS position within " + MAX_GPS_GAP.toMinutes() + " min of the session"
                                + patternWords(recent)));
                if (v.compareTo(worst) > 0) {
                    worst = v;
                }
                if (v != Verdict.CONSISTENT && firstFlagged.isEmpty()) {
                    firstFlagged = Optional.of(s.end());
                }
                prevEnd = s.end();
                prevLevel = TestLevel.PASS;
                prevVector = null;
                prevDistance = Double.NaN;
                continue;
            }
            double[] a = frame.toLocal(est.position());
            double[] b = frame.toLocal(g.get());
            double m = frame.eastScale((est.position().latDeg() + g.get().latDeg()) / 2);
            double de = (b[0] - a[0]) * m;
            double dn = b[1] - a[1];
            Covariance2 c = est.positionCovariance().plus(new Covariance2(gpsVar, gpsVar, 0));
            double nis = c.mahalanobis2(de, dn);
            Sailings.GreatCircle gc = Sailings.greatCircle(est.position(), g.get());
            TestLevel level = nis > CHI2_2DOF_99 ? TestLevel.EXCEEDS_99
                    : nis > CHI2_2DOF_95 ? TestLevel.EXCEEDS_95 : TestLevel.PASS;
            // Only a session that fixes the position by itself is new evidence against the one before;
            // a lone line mostly repeats what the last fix said, carried by the DR.
            // Repeated exceedances count only when they point the same way (within 45°): a real offset
            // does; chance exceedances point anywhere (1 in 4 within ±45°).
            boolean sameWay = prevVector != null
                    && (de * prevVector[0] + dn * prevVector[1]) > Math.cos(Math.toRadians(45))
                    * Math.hypot(de, dn) * Math.hypot(prevVector[0], prevVector[1]);
            boolean repeated = s.fixOnItsOwn() && level != TestLevel.PASS && prevLevel != TestLevel.PASS && sameWay;
            final Instant sinceFix = prevEnd.isBefore(s.start()) ? prevEnd : s.start();
            boolean jumpSinceFix = patterns.stream().anyMatch(p -> (p.pattern() == Pattern.STEP_OFFSET
                    || p.pattern() == Pattern.IMPOSSIBLE_SPEED) && !p.to().isBefore(sinceFix)
                    && !p.from().isAfter(s.end()));
            boolean drift = s.fixOnItsOwn() && level == TestLevel.EXCEEDS_99 && !jumpSinceFix
                    && !Double.isNaN(prevDistance) && gc.distanceNm() > prevDistance;
            if (drift) {
                patterns.add(new PatternFinding(Pattern.SLOW_DRIFT, prevFixEnd, s.end(), String.format(Locale.ROOT,
                        "GPS minus sights grew from %.1f nm at the fix before to %.1f nm with no jump in the GPS track",
                        prevDistance, gc.distanceNm())));
            }
            boolean strong = !recent.isEmpty();
            Verdict v;
            StringBuilder why = new StringBuilder(String.format(Locale.ROOT, "NIS %.1f (95%% %.2f, 99%% %.2f)", nis,
                    CHI2_2DOF_95, CHI2_2DOF_99));
            if (nis > CHI2_2DOF_1E6 || (level == TestLevel.EXCEEDS_99
                    && (strong || (repeated && prevLevel == TestLevel.EXCEEDS_99)))) {
                v = Verdict.INCONSISTENT;
            } else if (strong || (s.fixOnItsOwn() && (level == TestLevel.EXCEEDS_99 || repeated))
                    || (!s.fixOnItsOwn() && nis > CHI2_2DOF_999)) {
                v = Verdict.SUSPECT;
            } else {
                v = Verdict.CONSISTENT;
            }
            if (!s.fixOnItsOwn()) {
                why.append("; a lone line: suspect only beyond the 99.9% level (")
                        .append(String.format(Locale.ROOT, "%.2f", CHI2_2DOF_999)).append(")");
            }
            if (repeated) {
                why.append("; the session before also exceeded the 95% level, the same way");
            }
            if (drift) {
                why.append("; the discrepancy grew since the fix before, with no jump: a slow drift away");
            }
            if (nis > CHI2_2DOF_1E6) {
                why.append("; beyond the one-in-a-million level");
            }
            why.append(patternWords(recent));
            out.add(new Discrepancy(s, g, gc.distanceNm(), gc.distanceNm() > 0 ? gc.initialCourseDeg() : 0.0, nis, level,
                    v, why.toString()));
            if (v.compareTo(worst) > 0) {
                worst = v;
            }
            if (v != Verdict.CONSISTENT && firstFlagged.isEmpty()) {
                firstFlagged = Optional.of(s.end());
            }
            if (s.fixOnItsOwn()) {
                prevLevel = level;
                prevVector = new double[] {de, dn};
                prevDistance = gc.distanceNm();
                prevFixEnd = s.end();
            }
            prevEnd = s.end();
        }
        if (rec.sessions().isEmpty() && !patterns.isEmpty()) {
            worst = Verdict.SUSPECT;
            firstFlagged = Optional.of(patterns.get(0).from());
        }
        List<SetAndDrift> sd = setAndDrift(rec, dr);
        TrackEstimate last = rec.smoothed().get(rec.smoothed().size() - 1);
        return new Result(worst, firstFlagged, out, patterns, sd, last.current(), last.currentSigmaKn());
    }

    private static String patternWords(List<PatternFinding> recent) {
        StringBuilder sb = new StringBuilder();
        for (PatternFinding p : recent) {
            sb.append("; ").append(p.pattern().words()).append(" in the GPS track at ").append(p.from())
                    .append(": ").append(p.evidence());
        }
        return sb.toString();
    }

    private static List<SetAndDrift> setAndDrift(Reconciliation rec, DrLog dr) {
        List<SetAndDrift> out = new ArrayList<>();
        LocalFrame f = rec.frame();
        List<Reconciliation.Session> ss = rec.sessions();
        for (int i = 1; i < ss.size(); i++) {
            Reconciliation.Session a = ss.get(i - 1);
            Reconciliation.Session b = ss.get(i);
            double hours = Duration.between(a.end(), b.end()).toMillis() / 3_600_000.0;
            if (hours < 0.5) {
                continue;
            }
            double[] pa = f.toLocal(a.filtered().position());
            double[] pb = f.toLocal(b.filtered().position());
            double[] da = f.toLocal(DeadReckoning.dr(dr, a.end()));
            double[] db = f.toLocal(DeadReckoning.dr(dr, b.end()));
            double m = f.eastScale((a.filtered().position().latDeg() + b.filtered().position().latDeg()) / 2);
            double ve = ((pb[0] - pa[0]) - (db[0] - da[0])) * m / hours;
            double vn = ((pb[1] - pa[1]) - (db[1] - da[1])) / hours;
            out.add(new SetAndDrift(a.end(), b.end(), DeadReckoning.Current.ofComponents(ve, vn)));
        }
        return out;
    }

    /**
     * The patterns found in a GPS track alone, against the DR log's speed. Linear in the track's length.
     *
     * @param gps the GPS track
     * @param dr the DR log (speed and heading)
     * @param noise the GPS sigma
     * @return impossible speeds, step offsets and frozen positions, in time order
     */
    public static List<PatternFinding> trackPatterns(Track gps, DrLog dr, PassageNoise noise) {
        List<PatternFinding> out = new ArrayList<>();
        int n = gps.size();
        // jumps
        List<double[]> jumps = new ArrayList<>(); // {iStart, iEnd, de, dn, speedKn}
        int j = 0;
        double[] open = null;
        for (int i = 0; i < n; i++) {
            if (j < i) {
                j = i;
            }
            while (j < n && gps.timeMs(j) - gps.timeMs(i) < JUMP_WINDOW.toMillis()) {
                j++;
            }
            if (j >= n) {
                break;
            }
            double hours = (gps.timeMs(j) - gps.timeMs(i)) / 3_600_000.0;
            Instant ti = gps.time(i);
            if (ti.isBefore(dr.start()) || !ti.isBefore(dr.end())) {
                continue;
            }
            DrLeg leg = dr.legs().get(Math.max(0, dr.legAt(ti)));
            double w = Math.toRadians(leg.waterTrackDeg());
            double lat = gps.latDeg(i);
            double dLon = gps.lonDeg(j) - gps.lonDeg(i);
            dLon = dLon > 180 ? dLon - 360 : dLon < -180 ? dLon + 360 : dLon;
            double ge = dLon * 60 * Math.cos(Math.toRadians(lat));
            double gn = (gps.latDeg(j) - lat) * 60;
            double re = ge - leg.stwKn() * Math.sin(w) * hours;
            double rn = gn - leg.stwKn() * Math.cos(w) * hours;
            double allowed = (5 + 0.1 * leg.stwKn()) * hours + 4 * Math.sqrt(2) * noise.gpsSigmaNm();
            double r = Math.hypot(re, rn);
            if (r > allowed) {
                if (open == null || i > open[1]) {
                    open = new double[] {i, j, re, rn, Math.hypot(ge, gn) / hours};
                    jumps.add(open);
                } else {
                    open[1] = j;
                    if (r > Math.hypot(open[2], open[3])) {
                        open[2] = re;
                        open[3] = rn;
                        open[4] = Math.max(open[4], Math.hypot(ge, gn) / hours);
                    }
                }
            }
        }
        for (int k = 0; k < jumps.size(); k++) {
            double[] jp = jumps.get(k);
            Instant a = gps.time((int) jp[0]);
            Instant b = gps.time((int) jp[1]);
            double size = Math.hypot(jp[2], jp[3]);
            double dir = (Math.toDegrees(Math.atan2(jp[2], jp[3])) + 360) % 360;
            boolean undone = false;
            if (k + 1 < jumps.size()) {
                double[] nx = jumps.get(k + 1);
                Instant c = gps.time((int) nx[0]);
                double back = Math.hypot(jp[2] + nx[2], jp[3] + nx[3]);
                undone = Duration.between(b, c).compareTo(RETURN_WINDOW) <= 0 && back < 0.3 * size;
            }
            out.add(new PatternFinding(Pattern.IMPOSSIBLE_SPEED, a, b, String.format(Locale.ROOT,
                    "the GPS moved at %.0f kn against a log speed of %.1f kn", jp[4],
                    dr.legs().get(Math.max(0, dr.legAt(a))).stwKn())));
            if (!undone) {
                out.add(new PatternFinding(Pattern.STEP_OFFSET, a, b, String.format(Locale.ROOT,
                        "the GPS jumped %.2f nm towards %03.0f° and stayed", size, dir)));
            } else {
                k++; // the return jump belongs to this glitch
            }
        }
        // frozen
        int start = 0;
        for (int i = 1; i <= n; i++) {
            boolean same = i < n && Math.abs(gps.latDeg(i) - gps.latDeg(start)) * 60 < FROZEN_NM
                    && Math.abs(gps.lonDeg(i) - gps.lonDeg(start)) * 60 * Math.cos(Math.toRadians(gps.latDeg(start)))
                    < FROZEN_NM;
            if (!same) {
                if (i - 1 > start && gps.timeMs(i - 1) - gps.timeMs(start) >= FROZEN_MIN.toMillis()) {
                    Instant a = gps.time(start);
                    int leg = dr.legAt(a);
                    if (leg >= 0 && a.isBefore(dr.end()) && dr.legs().get(leg).stwKn() >= 1.0) {
                        out.add(new PatternFinding(Pattern.FROZEN_POSITION, a, gps.time(i - 1), String.format(Locale.ROOT,
                                "the GPS stayed at %s for %d min while the log gave %.1f kn",
                                new GeoPosition(gps.latDeg(start), gps.lonDeg(start)),
                                (gps.timeMs(i - 1) - gps.timeMs(start)) / 60_000, dr.legs().get(leg).stwKn())));
                    }
                }
                start = i;
            }
        }
        out.sort((x, y) -> x.from().compareTo(y.from()));
        return out;
    }
}
