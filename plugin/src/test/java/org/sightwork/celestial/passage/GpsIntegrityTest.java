package org.sightwork.celestial.passage;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.time.Duration;
import java.time.Instant;
import org.junit.jupiter.api.Test;
import org.sightwork.geo.track.Track;

/**
 * How good the integrity test is, measured on simulated passages with fixed seeds
 * ({@link PassageSimulation}). The requirements are ours (docs/PASSAGE.md): a 2 nm GPS offset that
 * appears between the first two star sessions is flagged at the first star session after it in at
 * least 95 % of trials; a clean GPS is never called inconsistent, and suspect in at most 5 % of
 * trials. The chi-square quantiles are checked against the table value (Abramowitz and Stegun,
 * Handbook of Mathematical Functions, 1964, table 26.8; from memory: 5.991 and 9.210 for 2 degrees
 * of freedom; also −2 ln(1 − p) in closed form for 2 degrees of freedom).
 */
class GpsIntegrityTest {

    private static final int TRIALS = 1000;

    @Test
    void chiSquareQuantilesForTwoDegreesOfFreedom() {
        assertEquals(5.991, GpsIntegrity.CHI2_2DOF_95, 5e-4, "95% (table, from memory)");
        assertEquals(9.210, GpsIntegrity.CHI2_2DOF_99, 5e-4, "99% (table, from memory)");
        assertEquals(-2 * Math.log(0.05), GpsIntegrity.CHI2_2DOF_95, 1e-9, "closed form for 2 dof");
        assertEquals(-2 * Math.log(1e-6), GpsIntegrity.CHI2_2DOF_1E6, 1e-6, "closed form for 2 dof");
    }

    @Test
    void aTwoMileStepIsFlaggedAtTheFirstStarSessionAfterIt() {
        int flagged = 0;
        int inconsistent = 0;
        int bySightsAlone = 0;
        for (int i = 0; i < TRIALS; i++) {
            PassageSimulation.Passage p = PassageSimulation.simulate(1000 + i, PassageNoise.DEFAULT,
                    PassageSimulation.Fault.STEP, 2.0, 0);
            GpsIntegrity.Result r = run(p);
            GpsIntegrity.Discrepancy d = firstSessionAfter(r, p.faultStart());
            if (d.verdict() != GpsIntegrity.Verdict.CONSISTENT) {
                flagged++;
            }
            if (d.verdict() == GpsIntegrity.Verdict.INCONSISTENT) {
                inconsistent++;
            }
            if (d.level() == GpsIntegrity.TestLevel.EXCEEDS_99) {
                bySightsAlone++;
            }
        }
        System.out.printf("2 nm step: flagged at the first session after it in %d of %d trials (inconsistent %d;"
                + " beyond the 99%% level by the sights alone %d)%n", flagged, TRIALS, inconsistent, bySightsAlone);
        assertTrue(flagged >= 0.95 * TRIALS, "flagged in " + flagged + " of " + TRIALS);
    }

    @Test
    void aCleanGpsIsNeverInconsistentAndRarelySuspect() {
        int suspect = 0;
        int inconsistent = 0;
        double nisSum = 0;
        int nisCount = 0;
        for (int i = 0; i < TRIALS; i++) {
            PassageSimulation.Passage p = PassageSimulation.simulate(5000 + i, PassageNoise.DEFAULT,
                    PassageSimulation.Fault.NONE, 0, 0);
            GpsIntegrity.Result r = run(p);
            if (r.verdict() == GpsIntegrity.Verdict.SUSPECT) {
                suspect++;
            }
            if (r.verdict() == GpsIntegrity.Verdict.INCONSISTENT) {
                inconsistent++;
            }
            if (r.verdict() != GpsIntegrity.Verdict.CONSISTENT && System.getenv("SW_DIAG") != null) {
                r.discrepancies().stream().filter(d -> d.verdict() != GpsIntegrity.Verdict.CONSISTENT)
                        .forEach(d -> System.out.println("DIAG " + d.verdict() + " " + d.evidence()));
            }
            for (GpsIntegrity.Discrepancy d : r.discrepancies()) {
                nisSum += d.nis();
                nisCount++;
            }
        }
        double meanNis = nisSum / nisCount;
        System.out.printf("clean GPS: suspect %d, inconsistent %d of %d trials; mean NIS %.3f over %d sessions%n",
                suspect, inconsistent, TRIALS, meanNis, nisCount);
        assertEquals(0, inconsistent, "never inconsistent");
        assertTrue(suspect <= 0.05 * TRIALS, "suspect in " + suspect + " of " + TRIALS);
        // A consistent filter: the mean of chi-square with 2 dof is 2. Over 5,000 sessions (correlated
        // within a trial) its standard error is about 0.04; allow 0.15.
        assertEquals(2.0, meanNis, 0.15, "mean NIS of a clean GPS");
    }

    @Test
    void aSlowDriftIsNamed() {
        int named = 0;
        int trials = 200;
        for (int i = 0; i < trials; i++) {
            PassageSimulation.Passage p = PassageSimulation.simulate(9000 + i, PassageNoise.DEFAULT,
                    PassageSimulation.Fault.DRIFT, 0, 0.3);
            GpsIntegrity.Result r = run(p);
            if (r.patterns().stream().anyMatch(f -> f.pattern() == GpsIntegrity.Pattern.SLOW_DRIFT)
                    && r.verdict() != GpsIntegrity.Verdict.CONSISTENT) {
                named++;
            }
            assertTrue(r.patterns().stream().noneMatch(f -> f.pattern() == GpsIntegrity.Pattern.STEP_OFFSET),
                    "a slow drift has no step, trial " + i);
        }
        System.out.printf("0.3 kn drift: named a slow drift in %d of %d trials%n", named, trials);
        assertTrue(named >= 0.8 * trials, "named in " + named + " of " + trials);
    }

    @Test
    void stepFrozenAndImpossibleSpeedAreNamedInTheTrack() {
        PassageSimulation.Passage p = PassageSimulation.simulate(42, PassageNoise.DEFAULT,
                PassageSimulation.Fault.STEP, 2.0, 0);
        var found = GpsIntegrity.trackPatterns(p.gps(), p.dr(), PassageNoise.DEFAULT);
        assertTrue(found.stream().anyMatch(f -> f.pattern() == GpsIntegrity.Pattern.STEP_OFFSET
                && Math.abs(Duration.between(f.from(), p.faultStart()).toMinutes()) <= 2), found.toString());
        assertTrue(found.stream().anyMatch(f -> f.pattern() == GpsIntegrity.Pattern.IMPOSSIBLE_SPEED), found.toString());
        // A frozen receiver: the clean track with 20 minutes held at one position.
        PassageSimulation.Passage c = PassageSimulation.simulate(43, PassageNoise.DEFAULT,
                PassageSimulation.Fault.NONE, 0, 0);
        Track g = c.gps();
        Track.Builder b = Track.builder();
        int from = 600;
        for (int i = 0; i < g.size(); i++) {
            int k = i >= from && i < from + 20 ? from : i;
            b.add(g.timeMs(i), g.latDeg(k), g.lonDeg(k), Double.NaN, Double.NaN, Double.NaN, Double.NaN);
        }
        var frozen = GpsIntegrity.trackPatterns(b.build(), c.dr(), PassageNoise.DEFAULT);
        assertTrue(frozen.stream().anyMatch(f -> f.pattern() == GpsIntegrity.Pattern.FROZEN_POSITION
                && f.from().equals(g.time(from))), frozen.toString());
        var clean = GpsIntegrity.trackPatterns(g, c.dr(), PassageNoise.DEFAULT);
        assertTrue(clean.isEmpty(), "a clean track has no pattern: " + clean);
    }

    private static GpsIntegrity.Result run(PassageSimulation.Passage p) {
        Reconciliation rec = PassageFilter.run(p.dr(), p.observations(), PassageNoise.DEFAULT, Duration.ofMinutes(30));
        return GpsIntegrity.compare(rec, p.dr(), p.gps(), PassageNoise.DEFAULT);
    }

    private static GpsIntegrity.Discrepancy firstSessionAfter(GpsIntegrity.Result r, Instant t) {
        return r.discrepancies().stream().filter(d -> d.session().end().isAfter(t)).findFirst().orElseThrow();
    }
}
