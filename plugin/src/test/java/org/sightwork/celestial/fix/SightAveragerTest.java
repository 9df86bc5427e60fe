package org.sightwork.celestial.fix;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.time.Duration;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import java.util.function.ToDoubleFunction;
import org.junit.jupiter.api.Test;

/** Sight averaging against a curved altitude: the fit must follow the curve, not a plain mean. */
class SightAveragerTest {

    private static final Instant T = Instant.parse("2025-06-01T10:00:00Z");

    /** A rising, curving altitude: 40° + 0.2°/min - 0.01°/min² (a body near the meridian). */
    private static final ToDoubleFunction<Instant> CURVE = t -> {
        double m = Duration.between(T, t).toNanos() / 6e10;
        return 40.0 + 0.2 * m - 0.01 * m * m;
    };

    @Test
    void fitFollowsTheCurveAndLeavesOutTheBadShot() {
        List<SightAverager.Shot> shots = new ArrayList<>();
        Random random = new Random(5L);
        double offset = 1.5 / 60.0; // every shot 1.5' high: what the fit must find
        for (int i = 0; i < 6; i++) {
            Instant t = T.plusSeconds(40L * i);
            double err = i == 3 ? 6.0 / 60.0 : 0.3 * random.nextGaussian() / 60.0; // shot 3 is 6' out
            shots.add(new SightAverager.Shot(t, CURVE.applyAsDouble(t) + offset + err));
        }
        SightAverager.Averaged a = SightAverager.average(shots, CURVE, 1.0);
        assertTrue(a.rejected().get(3), "the bad shot is left out");
        assertEquals(1, a.rejected().stream().filter(b -> b).count(), "only that one");
        // Analytic: the fit is Hc(t̄) + mean offset; the 0.3' noise over 5 shots gives ±0.13' (1σ).
        assertEquals(CURVE.applyAsDouble(a.utc()) + offset, a.hoDeg(), 0.5 / 60.0, "fitted Ho on the curve");
        assertEquals(1.0 / Math.sqrt(5), a.standardErrorArcmin(), 1e-12, "σ/√n");
        assertFalse(a.warning().isPresent(), "slope agrees");
        // A plain mean of the readings would sit below the curve by the curvature term 0.01 m² averaged.
    }

    @Test
    void aWrongSlopeIsFlagged() {
        List<SightAverager.Shot> shots = new ArrayList<>();
        for (int i = 0; i < 5; i++) {
            Instant t = T.plusSeconds(60L * i);
            shots.add(new SightAverager.Shot(t, 40.0 - 0.2 * i)); // falling, while the curve rises
        }
        assertTrue(SightAverager.average(shots, CURVE, 1.0).warning().isPresent(), "slope warning");
    }
}
