package org.sightwork.celestial.planning;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * The fix geometry figure. Expected values are worked by hand from the normal matrix
 * {@code AᵀA} of rows {@code (sin Zn, cos Zn, 1)}: for n azimuths evenly spread it is
 * {@code diag(n/2, n/2, n)}, so {@code HDOP = √(4/n)}.
 */
class StarSelectorGeometryTest {

    private static final double EXACT = 1e-9;

    @Test
    void evenlySpreadSetsReachTheTheoreticalHdop() {
        assertEquals(Math.sqrt(4.0 / 3), StarSelector.hdop(List.of(10.0, 130.0, 250.0)), EXACT, "3 at 120°");
        assertEquals(1.0, StarSelector.hdop(List.of(45.0, 135.0, 225.0, 315.0)), EXACT, "4 at 90°");
        assertEquals(Math.sqrt(4.0 / 5), StarSelector.hdop(List.of(0.0, 72.0, 144.0, 216.0, 288.0)), EXACT, "5 at 72°");
    }

    @Test
    void halfTheHorizonIsWorseThanTheWholeOfIt() {
        // Common practice: three stars 60° apart (all on one side) leave a common altitude error
        // unresolved; 120° apart they cancel it.
        double oneSide = StarSelector.hdop(List.of(0.0, 60.0, 120.0));
        double round = StarSelector.hdop(List.of(0.0, 120.0, 240.0));
        assertTrue(oneSide > 1.5 * round, "one-sided spread " + oneSide + " vs round " + round);
    }

    @Test
    void parallelLinesCannotFix() {
        assertEquals(Double.POSITIVE_INFINITY, StarSelector.hdop(List.of(10.0, 10.0, 190.0)), "degenerate");
        assertEquals(Double.POSITIVE_INFINITY, StarSelector.hdop(List.of(10.0, 100.0)), "two lines");
    }

    @Test
    void smallestGapGoesRoundNorth() {
        assertEquals(20.0, StarSelector.smallestGapDeg(List.of(350.0, 10.0, 180.0)), EXACT, "gap across 000°");
        assertEquals(120.0, StarSelector.smallestGapDeg(List.of(0.0, 120.0, 240.0)), EXACT, "even spread");
    }
}
