package org.sightwork.celestial.almanac;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Random;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import org.junit.jupiter.api.Test;
import org.sightwork.celestial.time.AstroTime;

/**
 * Non-regression of the Chebyshev interpolation: the standard almanac (interpolated, spans and
 * degrees {@link Almanac#STANDARD_SPANS}) against the same series evaluated directly at each
 * instant ({@link Almanac#direct()}, the chain that {@code AlmanacReferenceTest} and
 * {@code AlmanacVsSwetestTest} validate against SOFA and swetest). Random instants of 1900-2100,
 * fixed seed, every navigational body and Aries.
 *
 * <p>Bounds: the issue's goal is an interpolation error under 0.002' (0.12"), small beside the
 * series' own truncation (0.4", {@code AlmanacTruncationTest}). Measured with these spans: under
 * 1e-5" in place and GHA (see docs/METHOD-ALMANAC.md); the test holds the place to
 * {@link #PLACE_BOUND_ARCSEC}, ten times the measured maximum, so that a worse choice of span or
 * degree fails here long before it could matter at sea.
 */
class AlmanacInterpolationTest {

    /** Place (GHA cos Dec and Dec) bound (arcsec): 10x the measured maximum, 1/1000 of the 0.002' goal. */
    private static final double PLACE_BOUND_ARCSEC = 1e-4;
    /** HP and SD bound (arcmin): the same 1e-4" as arcminutes. */
    private static final double HP_SD_BOUND_ARCMIN = PLACE_BOUND_ARCSEC / 60.0;
    /** Distance, relative: 1e-4" of parallax at the Moon is 5e-10 of its distance; held at 1e-9. */
    private static final double DISTANCE_BOUND_REL = 1e-9;
    /** Magnitude and illuminated fraction: 1e-6 (the table prints magnitudes to 0.01). */
    private static final double MAG_BOUND = 1e-6;

    private static final Almanac STD = Almanac.standard();
    private static final Almanac DIRECT = Almanac.direct();

    private static List<AstroTime> randomInstants(long seed, int n) {
        Random r = new Random(seed);
        long t0 = Instant.parse("1900-01-01T00:00:00Z").getEpochSecond();
        long span = Instant.parse("2100-12-31T00:00:00Z").getEpochSecond() - t0;
        List<AstroTime> out = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            out.add(AstroTime.ofUtc(Instant.ofEpochSecond(t0 + (long) (r.nextDouble() * span))));
        }
        return out;
    }

    @Test
    void interpolatedPlacesMatchTheDirectSeries() {
        List<Body> bodies = new ArrayList<>(STD.navigationalBodies());
        bodies.add(Body.ARIES);
        double[] maxPlace = new double[bodies.size()];
        double maxHpSd = 0;
        double maxDist = 0;
        double maxMag = 0;
        for (AstroTime t : randomInstants(11L, 1000)) {
            Almanac.Snapshot a = STD.at(t);
            Almanac.Snapshot b = DIRECT.at(t);
            for (int k = 0; k < bodies.size(); k++) {
                BodyPosition p = a.position(bodies.get(k));
                BodyPosition q = b.position(bodies.get(k));
                double dg = p.ghaDeg() - q.ghaDeg();
                dg -= 360.0 * Math.rint(dg / 360.0);
                double e = Math.max(Math.abs(dg * Math.cos(Math.toRadians(q.decDeg()))),
                        Math.abs(p.decDeg() - q.decDeg())) * 3600.0;
                maxPlace[k] = Math.max(maxPlace[k], e);
                if (q.hpArcmin().isPresent()) {
                    maxHpSd = Math.max(maxHpSd, Math.abs(p.hpArcmin().getAsDouble() - q.hpArcmin().getAsDouble()));
                    maxHpSd = Math.max(maxHpSd, Math.abs(p.sdArcmin().getAsDouble() - q.sdArcmin().getAsDouble()));
                    double qd = q.distanceKm().getAsDouble();
                    maxDist = Math.max(maxDist, Math.abs(p.distanceKm().getAsDouble() - qd) / qd);
                }
                if (q.magnitude().isPresent()) {
                    maxMag = Math.max(maxMag, Math.abs(p.magnitude().getAsDouble() - q.magnitude().getAsDouble()));
                }
                if (q.illuminatedFraction().isPresent()) {
                    maxMag = Math.max(maxMag, Math.abs(p.illuminatedFraction().getAsDouble()
                            - q.illuminatedFraction().getAsDouble()));
                }
            }
        }
        StringBuilder report = new StringBuilder("interpolation max error (arcsec):");
        for (int k = 0; k < bodies.size(); k++) {
            if (k < 6 || k == bodies.size() - 1) {
                report.append(String.format(Locale.ROOT, " %s %.1e", bodies.get(k).name(), maxPlace[k]));
            }
        }
        double stars = 0;
        for (int k = 6; k < bodies.size() - 1; k++) {
            stars = Math.max(stars, maxPlace[k]);
        }
        report.append(String.format(Locale.ROOT, " stars %.1e; HP/SD %.1e'; distance %.1e; mag/fraction %.1e",
                stars, maxHpSd, maxDist, maxMag));
        System.out.println(report);
        for (int k = 0; k < bodies.size(); k++) {
            assertTrue(maxPlace[k] < PLACE_BOUND_ARCSEC, bodies.get(k).name() + " " + report);
        }
        assertTrue(maxHpSd < HP_SD_BOUND_ARCMIN, "HP, SD " + report);
        assertTrue(maxDist < DISTANCE_BOUND_REL, "distance " + report);
        assertTrue(maxMag < MAG_BOUND, "magnitude " + report);
    }

    /**
     * Spans are anchored at J2000, so a result does not depend on which instants were asked
     * before, nor on threads racing for the same cache slot: four threads asking instants that share
     * slots in scrambled orders get bit-for-bit what another almanac gives when asked in order.
     */
    @Test
    void resultsDoNotDependOnCacheStateOrThreads() throws Exception {
        List<AstroTime> times = randomInstants(5L, 40);
        // Instants 64 spans apart fall into the same slot of every cache: force evictions.
        AstroTime base = AstroTime.ofUtc(Instant.parse("2026-03-20T18:30:00Z"));
        for (int i = 1; i <= 8; i++) {
            times.add(base.plusSeconds(i * 64.0 * 64.0 * 86400.0 / 8.0));
            times.add(base.plusSeconds(i * 3600.0));
        }
        List<Body> bodies = STD.navigationalBodies();
        Almanac sequential = Almanac.interpolated(Almanac.STANDARD_SPANS);
        List<double[]> expected = new ArrayList<>();
        for (AstroTime t : times) {
            expected.add(values(sequential.at(t), bodies));
        }
        Almanac shared = Almanac.interpolated(Almanac.STANDARD_SPANS);
        ExecutorService pool = Executors.newFixedThreadPool(4);
        try {
            List<Future<?>> jobs = new ArrayList<>();
            for (int th = 0; th < 4; th++) {
                int offset = th;
                jobs.add(pool.submit(() -> {
                    for (int rep = 0; rep < 3; rep++) {
                        for (int i = 0; i < times.size(); i++) {
                            int j = (i * 7 + offset * 13 + rep) % times.size();
                            double[] got = values(shared.at(times.get(j)), bodies);
                            double[] want = expected.get(j);
                            for (int c = 0; c < want.length; c++) {
                                assertEquals(want[c], got[c], 0.0, "value " + c + " at " + times.get(j).utc());
                            }
                        }
                    }
                    return null;
                }));
            }
            for (Future<?> f : jobs) {
                f.get();
            }
        } finally {
            pool.shutdownNow();
        }
    }

    private static double[] values(Almanac.Snapshot s, List<Body> bodies) {
        double[] v = new double[bodies.size() * 3 + 1];
        v[0] = s.ghaAriesDeg();
        for (int k = 0; k < bodies.size(); k++) {
            BodyPosition p = s.position(bodies.get(k));
            v[3 * k + 1] = p.ghaDeg();
            v[3 * k + 2] = p.decDeg();
            v[3 * k + 3] = p.magnitude().orElse(0.0);
        }
        return v;
    }
}
