package org.sightwork.celestial.passage;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.time.Duration;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import net.sf.geographiclib.Geodesic;
import org.junit.jupiter.api.Test;
import org.sightwork.geo.earth.GeoPosition;
import org.sightwork.geo.track.DrLeg;
import org.sightwork.geo.track.DrLog;

/**
 * The reconciliation filter against closed forms (validation: textbook results, exact for a linear
 * Gaussian model):
 * <ul>
 * <li>a static position fixed n times with standard deviation σ: the estimate is the
 *     precision-weighted mean of the prior and the fixes, with variance 1 / (1/σ0² + n/σ²), i.e.
 *     σ²/n for a diffuse prior (Gelb, <i>Applied Optimal Estimation</i>, MIT Press 1974, §4.1,
 *     example "estimation of a constant");</li>
 * <li>a constant current and no other motion: with a diffuse prior the filter's final estimate is the
 *     least-squares straight line through the fixes, and the smoother's estimate at every fix lies on
 *     that line (Gauss-Markov theorem; the RTS smoother gives the batch solution, Rauch, Tung and
 *     Striebel 1965); slope variance σ² / Σ(tᵢ − t̄)²;</li>
 * <li>two lines of position at right angles cut at the intercept point of each (intercept method,
 *     Bowditch Pub. 9, 2019, ch. 19).</li>
 * </ul>
 * The local frame is checked against GeographicLib distances.
 */
class PassageFilterTest {

    private static final Instant T0 = Instant.parse("2026-06-21T06:00:00Z");
    private static final GeoPosition ORIGIN = new GeoPosition(38.5, -28.0);
    /** A diffuse prior: 1,000 nm and 100 kn. */
    private static final double DIFFUSE_NM = 1000;
    /** Negligible but non-zero prior sigmas, so that the covariance stays invertible for the smoother. */
    private static final double TINY = 1e-6;

    @Test
    void staticPositionGivesTheWeightedMeanAndSigmaSquaredOverN() {
        double sigma0 = 2.0;
        double sigma = 0.5;
        int n = 12;
        PassageNoise noise = new PassageNoise(0, TINY, 0, TINY, TINY, sigma0, 0.01);
        DrLog still = new DrLog(ORIGIN, List.of(new DrLeg(T0, 0, 0, 0)), T0.plus(Duration.ofHours(n + 1)));
        LocalFrame f = new LocalFrame(ORIGIN);
        Random rnd = new Random(3);
        List<CelestialObservation> obs = new ArrayList<>();
        double sumE = 0;
        double sumN = 0;
        for (int i = 1; i <= n; i++) {
            double e = 0.3 + rnd.nextGaussian() * sigma;
            double nn = -0.2 + rnd.nextGaussian() * sigma;
            sumE += e;
            sumN += nn;
            obs.add(new CelestialObservation.Position(T0.plus(Duration.ofHours(i)), "fix " + i, f.toGeo(e, nn), sigma,
                    sigma, 0));
        }
        Reconciliation r = PassageFilter.run(still, obs, noise, Duration.ofHours(1));
        double w0 = 1 / (sigma0 * sigma0);
        double w = 1 / (sigma * sigma);
        double expectedE = (sumE * w) / (w0 + n * w); // prior mean 0
        double expectedN = (sumN * w) / (w0 + n * w);
        double expectedVar = 1 / (w0 + n * w);
        TrackEstimate last = r.sessions().get(r.sessions().size() - 1).filtered();
        double[] got = f.toLocal(last.position());
        // East is weighted by the parallel's scale at each fix, which differs by ~1e-4 across fixes
        // a mile apart in latitude: 1e-4 of 0.3 nm.
        assertEquals(expectedE, got[0], 1e-4, "east: weighted mean");
        assertEquals(expectedN, got[1], 1e-6, "north: weighted mean");
        assertEquals(expectedVar, last.positionCovariance().eeNm2(), 1e-9, "variance 1/(1/σ0² + n/σ²)");
        assertEquals(sigma * sigma / n, last.positionCovariance().nnNm2(), 0.01 * sigma * sigma / n,
                "close to σ²/n with σ0 four times σ");
        // The smoother carries the final answer back to the start: the position never moved.
        double[] start = f.toLocal(r.smoothed().get(0).position());
        assertEquals(got[0], start[0], 1e-6, "smoothed at the start: the same mean");
        assertEquals(expectedVar, r.smoothed().get(0).positionCovariance().eeNm2(), 1e-8, "and the same variance");
    }

    @Test
    void constantCurrentGivesTheLeastSquaresLine() {
        double sigma = 0.4;
        PassageNoise noise = new PassageNoise(0, 100, 0, TINY, TINY, DIFFUSE_NM, 0.01);
        DrLog still = new DrLog(ORIGIN, List.of(new DrLeg(T0, 0, 0, 0)), T0.plus(Duration.ofHours(20)));
        LocalFrame f = new LocalFrame(ORIGIN);
        Random rnd = new Random(5);
        double trueCn = 0.8;
        int n = 9;
        double[] t = new double[n];
        double[] z = new double[n];
        List<CelestialObservation> obs = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            t[i] = 1 + 2 * i;
            z[i] = 1.5 + trueCn * t[i] + rnd.nextGaussian() * sigma;
            obs.add(new CelestialObservation.Position(T0.plusSeconds((long) (t[i] * 3600)), "fix " + i,
                    f.toGeo(0, z[i]), sigma, sigma, 0));
        }
        double tm = 0;
        double zm = 0;
        for (int i = 0; i < n; i++) {
            tm += t[i] / n;
            zm += z[i] / n;
        }
        double sxx = 0;
        double sxz = 0;
        for (int i = 0; i < n; i++) {
            sxx += (t[i] - tm) * (t[i] - tm);
            sxz += (t[i] - tm) * (z[i] - zm);
        }
        double slope = sxz / sxx;
        double intercept = zm - slope * tm;
        Reconciliation r = PassageFilter.run(still, obs, noise, Duration.ofHours(1));
        TrackEstimate last = r.sessions().get(r.sessions().size() - 1).filtered();
        double cn = last.current().driftKn() * Math.cos(Math.toRadians(last.current().setDeg()));
        // Diffuse priors (1,000 nm, 100 kn) bias the answer by about (σ/σ0)²: below 1e-5 here.
        assertEquals(slope, cn, 1e-5, "current north: least-squares slope");
        assertEquals(sigma * sigma / sxx, last.currentSigmaKn() * last.currentSigmaKn(), 1e-6,
                "slope variance σ²/Sxx");
        assertEquals(intercept + slope * t[n - 1], f.toLocal(last.position())[1], 1e-5, "line at the last fix");
        for (TrackEstimate e : r.smoothed()) {
            double hours = Duration.between(T0, e.time()).toMillis() / 3.6e6;
            assertEquals(intercept + slope * hours, f.toLocal(e.position())[1], 1e-4,
                    "smoothed track on the least-squares line at " + e.time());
        }
    }

    @Test
    void twoLinesAtRightAnglesCutAtTheirIntercepts() {
        PassageNoise noise = new PassageNoise(0, TINY, 0, TINY, TINY, DIFFUSE_NM, 0.01);
        DrLog still = new DrLog(ORIGIN, List.of(new DrLeg(T0, 0, 0, 0)), T0.plus(Duration.ofHours(2)));
        GeoPosition ap = new GeoPosition(38.5, -28.0);
        Instant ts = T0.plus(Duration.ofHours(1));
        List<CelestialObservation> obs = List.of(
                new CelestialObservation.Line(ts, "north body", ap, 0, 3.0, 0.5),
                new CelestialObservation.Line(ts, "east body", ap, 90, -2.0, 0.5));
        Reconciliation r = PassageFilter.run(still, obs, noise, Duration.ofHours(1));
        GeoPosition fix = r.sessions().get(0).filtered().position();
        // 3 nm north and 2 nm west of the AP: check the distances with GeographicLib.
        double north = Geodesic.WGS84.Inverse(ap.latDeg(), ap.lonDeg(), fix.latDeg(), ap.lonDeg()).s12 / 1852;
        double west = Geodesic.WGS84.Inverse(fix.latDeg(), ap.lonDeg(), fix.latDeg(), fix.lonDeg()).s12 / 1852;
        assertEquals(3.0, north, 1e-3, "north intercept");
        assertEquals(2.0, west, 0.005, "west intercept (the parallel's scale at the AP, 0.2% over 3′ of latitude)");
        assertEquals(true, r.sessions().get(0).fixOnItsOwn(), "two crossing lines fix the position");
    }

    @Test
    void localFrameDistancesMatchGeographicLib() {
        LocalFrame f = new LocalFrame(ORIGIN);
        Random rnd = new Random(11);
        for (int i = 0; i < 200; i++) {
            GeoPosition a = new GeoPosition(ORIGIN.latDeg() + rnd.nextGaussian(), ORIGIN.lonDeg() + rnd.nextGaussian());
            GeoPosition b = new GeoPosition(a.latDeg() + rnd.nextGaussian() * 0.3, a.lonDeg() + rnd.nextGaussian() * 0.3);
            double[] pa = f.toLocal(a);
            double[] pb = f.toLocal(b);
            double m = f.eastScale((a.latDeg() + b.latDeg()) / 2);
            double d = Math.hypot((pb[0] - pa[0]) * m, pb[1] - pa[1]);
            double ref = Geodesic.WGS84.Inverse(a.latDeg(), a.lonDeg(), b.latDeg(), b.lonDeg()).s12 / 1852;
            // Plane with mid-latitude scale: error grows as distance² · tan φ / R, about 0.01 nm at 30 nm.
            assertEquals(ref, d, 0.01 + 1e-4 * ref * ref / 30, "distance " + i);
            GeoPosition back = f.toGeo(pa[0], pa[1]);
            assertEquals(a.latDeg(), back.latDeg(), 1e-9, "round trip latitude");
            assertEquals(a.lonDeg(), back.lonDeg(), 1e-9, "round trip longitude");
        }
    }
}
