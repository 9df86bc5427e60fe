package org.sightwork.celestial.planning;

import java.time.Instant;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import java.util.Objects;
import java.util.Optional;
import org.hipparchus.linear.Array2DRowRealMatrix;
import org.hipparchus.linear.LUDecomposition;
import org.hipparchus.linear.RealMatrix;
import org.sightwork.celestial.almanac.Almanac;
import org.sightwork.celestial.almanac.Body;
import org.sightwork.celestial.almanac.BodyPosition;
import org.sightwork.celestial.time.AstroTime;
import org.sightwork.geo.earth.GeoPosition;

/**
 * The bodies above the horizon at a time and place, and the best-placed set of 3, 4 or 5 for a fix.
 *
 * <p><b>Method:</b> every navigational body (the planets, the Moon and the 58 stars; never the Sun)
 * is reduced to Hc and Zn at the DR ({@link Horizon#fromEquatorial}); those outside the altitude
 * band, near the Moon or low in the twilight glare are set aside with the reason
 * ({@link SelectionCriteria}). Among the rest, every set of the asked size (from the 25 brightest,
 * at most 53 130 sets of 5) is scored by the fix it would give: the lines of position of equal
 * weight, solved by least squares for the two coordinates of the position and one altitude error
 * common to all sights (a wrong dip, refraction or personal error; it is why navigators spread
 * three stars round the whole horizon, 120° apart, not over half of it). The design matrix has a
 * row {@code (sin Zn, cos Zn, 1)} per body; the score is the horizontal dilution of precision
 * {@code HDOP = √(Q₁₁ + Q₂₂)}, {@code Q = (AᵀA)⁻¹}: the root-sum-square of the error ellipse's
 * semi-axes for a 1′ altitude error, in miles (the least-squares formulation is that of any fix
 * adjustment, e.g. Bowditch Pub. 9, 2019 ed., ch. 20 on the fix from many lines; the common-error
 * column as in a GNSS clock term; from memory). Evenly spread sets reach the lowest value,
 * 2/√3 ≈ 1.155 for 3, 1 for 4, 2/√5 ≈ 0.894 for 5. Among sets within
 * {@value #HDOP_TOLERANCE_PERCENT} % of the best HDOP the brightest (least sum of magnitudes) is
 * chosen.
 *
 * <p><b>Accuracy:</b> Hc and Zn are the almanac's, to 0.1′; the pre-set altitudes carry mean
 * refraction (about 0.1′ above 15°).
 *
 * <p><b>Limits:</b> the visibility of a star to the eye (the sky's brightness against its
 * magnitude) is not modelled beyond the glare rule; with the Sun above −3° only the Moon, Venus and
 * Jupiter are proposed (common practice: the only bodies usually seen in daylight).
 *
 * <p><b>Thread safety:</b> immutable; safe to share if the almanac is.
 */
public final class StarSelector {

    /** Sets within this fraction of the best HDOP count as equally good (percent); our own choice. */
    public static final double HDOP_TOLERANCE_PERCENT = 3.0;

    /** The Sun's altitude above which the sky is too bright for stars (degrees); common practice. */
    public static final double DAYLIGHT_SUN_ALT_DEG = -3.0;

    /** The Sun's altitude below which the twilight glare is gone (degrees): astronomical twilight. */
    public static final double DARK_SUN_ALT_DEG = -18.0;

    /** The Sun's altitude below which the sea horizon is usually too dark (degrees): nautical twilight. */
    public static final double DARK_HORIZON_SUN_ALT_DEG = -12.0;

    /**
     * Brighter than this counts the same in the tie-break (magnitude): the Moon or Venus is no easier
     * to bring down to the horizon than Sirius; our own choice.
     */
    public static final double BRIGHT_ENOUGH_MAG = -1.5;

    /** The most candidates enumerated (the brightest); bounds the work at C(25, 5) sets. */
    static final int MAX_CANDIDATES = 25;

    private final Almanac almanac;

    /**
     * A selector on an almanac.
     *
     * @param almanac the almanac
     */
    public StarSelector(Almanac almanac) {
        this.almanac = Objects.requireNonNull(almanac, "almanac");
    }

    /**
     * The sky and the proposed set at a time and place: what the drill generator and the planner
     * ask for.
     *
     * @param t the time
     * @param dr the observer's position
     * @param criteria the selection rules
     * @return the plan (the set is empty, with a note, when too few bodies qualify)
     */
    public SightPlan plan(Instant t, GeoPosition dr, SelectionCriteria criteria) {
        Almanac.Snapshot snap = almanac.at(AstroTime.ofUtc(t));
        BodyPosition sunP = snap.position(Body.SUN);
        HorizonPoint sun = Horizon.fromEquatorial(sunP.ghaDeg(), sunP.decDeg(), dr);
        BodyPosition moonP = snap.position(Body.MOON);
        HorizonPoint moon = Horizon.fromEquatorial(moonP.ghaDeg(), moonP.decDeg(), dr);

        List<VisibleBody> visible = new ArrayList<>();
        for (Body b : almanac.navigationalBodies()) {
            if (b.kind() == Body.Kind.ARIES) {
                continue;
            }
            BodyPosition p = b.equals(Body.SUN) ? sunP : b.equals(Body.MOON) ? moonP : snap.position(b);
            HorizonPoint h = Horizon.fromEquatorial(p.ghaDeg(), p.decDeg(), dr);
            if (h.altitudeDeg() <= 0.0) {
                continue;
            }
            double hp = p.hpArcmin().orElse(0.0);
            double preset = SextantApprox.presetHsDeg(h.altitudeDeg(), hp, criteria.eyeHeightM());
            double mag = p.magnitude().orElseThrow(
                    () -> new IllegalStateException("the almanac gave no magnitude for " + b.name()));
            Optional<String> why = exclusion(b, h, sun, moon, criteria);
            visible.add(new VisibleBody(b, h.altitudeDeg(), h.azimuthDeg(), mag, preset, why));
        }
        visible.sort(Comparator.comparingDouble(VisibleBody::znDeg));

        List<String> notes = new ArrayList<>();
        if (sun.altitudeDeg() < DARK_HORIZON_SUN_ALT_DEG) {
            notes.add(String.format(Locale.ROOT,
                    "the Sun is %.1f° below the horizon: the sea horizon may be too dark for sights",
                    -sun.altitudeDeg()));
        }
        List<VisibleBody> eligible = visible.stream().filter(VisibleBody::eligible).toList();
        Optional<List<VisibleBody>> set = bestSet(eligible, criteria.setSize());
        if (set.isEmpty()) {
            notes.add("only " + eligible.size() + " bodies qualify: too few for a set of " + criteria.setSize());
            return new SightPlan(t, dr, sun.altitudeDeg(), visible, List.of(), Double.POSITIVE_INFINITY, 0.0, notes);
        }
        List<VisibleBody> chosen = new ArrayList<>(set.get());
        chosen.sort(Comparator.comparingDouble(VisibleBody::znDeg));
        List<Double> zns = chosen.stream().map(VisibleBody::znDeg).toList();
        return new SightPlan(t, dr, sun.altitudeDeg(), visible, chosen, hdop(zns), smallestGapDeg(zns), notes);
    }

    /**
     * The well-placed bodies for a fix at a time and place, best set first: the short form of
     * {@link #plan} for the drill generator.
     *
     * @param t the time
     * @param dr the observer's position
     * @param count 3, 4 or 5
     * @return the proposed bodies by azimuth; empty if too few qualify
     */
    public List<VisibleBody> wellPlacedBodies(Instant t, GeoPosition dr, int count) {
        return plan(t, dr, SelectionCriteria.DEFAULT.withSetSize(count)).chosen();
    }

    private static Optional<String> exclusion(Body b, HorizonPoint h, HorizonPoint sun, HorizonPoint moon,
            SelectionCriteria c) {
        if (b.equals(Body.SUN)) {
            return Optional.of("the Sun");
        }
        if (sun.altitudeDeg() > DAYLIGHT_SUN_ALT_DEG
                && !(b.equals(Body.MOON) || b.equals(Body.VENUS) || b.equals(Body.JUPITER))) {
            return Optional.of(String.format(Locale.ROOT, "daylight (Sun at %.1f°)", sun.altitudeDeg()));
        }
        if (h.altitudeDeg() < c.minAltDeg()) {
            return Optional.of(String.format(Locale.ROOT, "below %.0f°", c.minAltDeg()));
        }
        if (h.altitudeDeg() > c.maxAltDeg()) {
            return Optional.of(String.format(Locale.ROOT, "above %.0f°", c.maxAltDeg()));
        }
        if (!b.equals(Body.MOON) && moon.altitudeDeg() > -1.0) {
            double sep = h.separationDeg(moon);
            if (sep < c.moonClearanceDeg()) {
                return Optional.of(String.format(Locale.ROOT, "%.0f° from the Moon", sep));
            }
        }
        if (sun.altitudeDeg() > DARK_SUN_ALT_DEG && h.altitudeDeg() < c.glareAltitudeDeg()
                && Math.abs(Horizon.norm180(h.azimuthDeg() - sun.azimuthDeg())) < c.glareAzimuthDeg()) {
            return Optional.of("in the twilight glare");
        }
        return Optional.empty();
    }

    /**
     * The best set of {@code k} among the eligible bodies (see the class comment).
     *
     * @param eligible the candidates
     * @param k the set size
     * @return the set, empty if there are fewer than {@code k} candidates
     */
    static Optional<List<VisibleBody>> bestSet(List<VisibleBody> eligible, int k) {
        if (eligible.size() < k) {
            return Optional.empty();
        }
        List<VisibleBody> cands = eligible.stream().sorted(Comparator.comparingDouble(VisibleBody::magnitude))
                .limit(MAX_CANDIDATES).toList();
        int n = cands.size();
        List<int[]> sets = new ArrayList<>();
        List<Double> scores = new ArrayList<>();
        int[] idx = new int[k];
        for (int i = 0; i < k; i++) {
            idx[i] = i;
        }
        double best = Double.POSITIVE_INFINITY;
        while (true) {
            double[] zn = new double[k];
            for (int i = 0; i < k; i++) {
                zn[i] = cands.get(idx[i]).znDeg();
            }
            double s = hdop(zn);
            best = Math.min(best, s);
            sets.add(idx.clone());
            scores.add(s);
            int i = k - 1;
            while (i >= 0 && idx[i] == n - k + i) {
                i--;
            }
            if (i < 0) {
                break;
            }
            idx[i]++;
            for (int j = i + 1; j < k; j++) {
                idx[j] = idx[j - 1] + 1;
            }
        }
        if (!Double.isFinite(best)) {
            return Optional.empty();
        }
        double limit = best * (1.0 + HDOP_TOLERANCE_PERCENT / 100.0);
        int[] pick = null;
        double pickMag = Double.POSITIVE_INFINITY;
        for (int s = 0; s < sets.size(); s++) {
            if (scores.get(s) > limit) {
                continue;
            }
            double mag = 0;
            for (int i : sets.get(s)) {
                mag += Math.max(cands.get(i).magnitude(), BRIGHT_ENOUGH_MAG);
            }
            if (mag < pickMag) {
                pickMag = mag;
                pick = sets.get(s);
            }
        }
        List<VisibleBody> out = new ArrayList<>();
        for (int i : pick) {
            out.add(cands.get(i));
        }
        return Optional.of(out);
    }

    /**
     * The horizontal dilution of precision of a fix from lines of position of equal weight at the
     * given azimuths, solving for position and a common altitude error (see the class comment).
     *
     * @param znDeg the azimuths (degrees)
     * @return HDOP (miles of radial error per arcminute of altitude error); infinite if the geometry
     *     cannot fix a position (fewer than 3 lines, or all azimuths too alike)
     */
    public static double hdop(List<Double> znDeg) {
        double[] a = new double[znDeg.size()];
        for (int i = 0; i < a.length; i++) {
            a[i] = znDeg.get(i);
        }
        return hdop(a);
    }

    private static double hdop(double[] znDeg) {
        if (znDeg.length < 3) {
            return Double.POSITIVE_INFINITY;
        }
        double[][] rows = new double[znDeg.length][];
        for (int i = 0; i < znDeg.length; i++) {
            double z = Math.toRadians(znDeg[i]);
            rows[i] = new double[] {Math.sin(z), Math.cos(z), 1.0};
        }
        RealMatrix a = new Array2DRowRealMatrix(rows, false);
        RealMatrix n = a.transpose().multiply(a);
        LUDecomposition lu = new LUDecomposition(n, 1e-9);
        if (!lu.getSolver().isNonSingular()) {
            return Double.POSITIVE_INFINITY;
        }
        RealMatrix q = lu.getSolver().getInverse();
        return Math.sqrt(q.getEntry(0, 0) + q.getEntry(1, 1));
    }

    /**
     * The smallest gap between azimuth neighbours round the horizon.
     *
     * @param znDeg the azimuths (degrees)
     * @return the smallest gap (degrees, [0°, 360°])
     */
    public static double smallestGapDeg(List<Double> znDeg) {
        List<Double> z = znDeg.stream().map(Horizon::norm360).sorted().toList();
        if (z.size() < 2) {
            return 360.0;
        }
        double min = 360.0 - z.get(z.size() - 1) + z.get(0);
        for (int i = 1; i < z.size(); i++) {
            min = Math.min(min, z.get(i) - z.get(i - 1));
        }
        return min;
    }
}
