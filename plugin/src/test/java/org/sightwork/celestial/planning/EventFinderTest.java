package org.sightwork.celestial.planning;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * The root finder on functions whose roots are known in closed form (test functions only: they
 * exercise the bracketing and refining, never stand in for the almanac).
 */
class EventFinderTest {

    private static final double DAY_S = 86400.0;

    @Test
    void findsBothCrossingsOfASinusoid() {
        // sin(2π t / day) − 0.5: up at t = day/12, down at t = 5 day/12 (sin 30° = 0.5, exact).
        List<EventFinder.Crossing> cs = EventFinder.crossings(
                t -> Math.sin(2 * Math.PI * t / DAY_S) - 0.5, DAY_S, DayPlanner.STEP_S);
        assertEquals(2, cs.size(), "two crossings");
        assertTrue(cs.get(0).upward(), "first one upward");
        assertEquals(DAY_S / 12, cs.get(0).tS(), EventFinder.ROOT_ABS_ACCURACY_S, "upward root");
        assertFalse(cs.get(1).upward(), "second one downward");
        assertEquals(5 * DAY_S / 12, cs.get(1).tS(), EventFinder.ROOT_ABS_ACCURACY_S, "downward root");
    }

    @Test
    void findsAGrazeBetweenTwoSamples() {
        // A parabola dipping 1e-4 below zero for about 2 minutes, centred between two samples: the
        // samples are all positive, the roots at c ± sqrt(1e-4 / 1e-9) s = c ± 316.2 s. Exact.
        double c = 10 * DayPlanner.STEP_S + 300.0;
        double k = 1e-9;
        double depth = 1e-4;
        List<EventFinder.Crossing> cs = EventFinder.crossings(
                t -> k * (t - c) * (t - c) - depth, DAY_S, DayPlanner.STEP_S * 2);
        assertEquals(2, cs.size(), "the two roots of the graze");
        double half = Math.sqrt(depth / k);
        assertEquals(c - half, cs.get(0).tS(), 1.0, "first root");
        assertEquals(c + half, cs.get(1).tS(), 1.0, "second root");
    }

    @Test
    void noCrossingGivesNothing() {
        assertTrue(EventFinder.crossings(t -> 1.0 + Math.sin(t / 1e4) * 0.5, DAY_S, DayPlanner.STEP_S).isEmpty(),
                "always positive");
    }

    @Test
    void transitIgnoresTheWrapAtLowerTransit() {
        // An hour angle growing 360° a day from −100°: one upper transit (0°) at 100/360 day, and
        // the wrap +180° → −180° at 280/360 day is not a transit.
        List<Double> ts = EventFinder.transitCrossings(
                t -> Horizon.norm180(-100.0 + 360.0 * t / DAY_S), DAY_S, DayPlanner.STEP_S);
        assertEquals(1, ts.size(), "one transit");
        assertEquals(100.0 / 360.0 * DAY_S, ts.get(0), EventFinder.ROOT_ABS_ACCURACY_S, "transit time");
    }
}
