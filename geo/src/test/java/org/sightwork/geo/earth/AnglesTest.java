package org.sightwork.geo.earth;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;

/**
 * Reading and writing d°m.m′. The expected values follow from the definition of the notation
 * (1° = 60′, 1′ = 60″): exact arithmetic, no outside source needed.
 */
class AnglesTest {

    /** Exactness of a decimal written to 4 places (well below 0.1′ = 1/600°). */
    private static final double TOL_DEG = 1e-9;

    @Test
    void readsTheCommonWrittenForms() {
        double expected = 34 + 12.4 / 60;
        assertEquals(expected, Angles.parse("34°12.4'"), TOL_DEG, "degree sign and apostrophe");
        assertEquals(expected, Angles.parse("34°12.4′"), TOL_DEG, "degree sign and prime");
        assertEquals(expected, Angles.parse("34 12.4"), TOL_DEG, "space");
        assertEquals(expected, Angles.parse("34-12.4"), TOL_DEG, "hyphen");
        assertEquals(expected, Angles.parse("34d12.4"), TOL_DEG, "letter d");
        assertEquals(34 + 12 / 60.0 + 24 / 3600.0, Angles.parse("34°12'24\""), TOL_DEG, "d m s");
        assertEquals(34.2067, Angles.parse("34.2067"), TOL_DEG, "decimal degrees");
        assertEquals(-(12.4 / 60), Angles.parse("-0°12.4'"), TOL_DEG, "negative under a degree");
    }

    @Test
    void readsHemispheres() {
        assertEquals(-(38 + 32.1 / 60), Angles.parseLatitude("38°32.1'S"), TOL_DEG, "S behind");
        assertEquals(38 + 32.1 / 60, Angles.parseLatitude("N 38 32.1"), TOL_DEG, "N in front");
        assertEquals(-(28 + 37.9 / 60), Angles.parseLongitude("028-37.9W"), TOL_DEG, "W behind");
        assertEquals(-28.5, Angles.parseLongitude("-28.5"), TOL_DEG, "signed");
    }

    @Test
    void refusesWhatIsNotAnAngle() {
        assertThrows(IllegalArgumentException.class, () -> Angles.parse("abc"));
        assertThrows(IllegalArgumentException.class, () -> Angles.parse("34 61.0"));
        assertThrows(IllegalArgumentException.class, () -> Angles.parseLatitude("91 00.0N"));
        assertThrows(IllegalArgumentException.class, () -> Angles.parseLatitude("-38 32.1 S"));
    }

    @Test
    void writesToATenthOfAMinuteAndCarries() {
        assertEquals("347°05.3′", Angles.formatDm(347 + 5.3 / 60, 3), "GHA style");
        assertEquals("35°00.0′", Angles.formatDm(34 + 59.97 / 60, 2), "59.97′ carries into the degree");
        assertEquals("38°32.1′N", Angles.formatLatitude(38 + 32.1 / 60), "latitude");
        assertEquals("028°37.9′W", Angles.formatLongitude(-(28 + 37.9 / 60)), "longitude");
    }

    @Test
    void normalisesLongitudeAcrossTheDateLine() {
        assertEquals(-179.0, GeoPosition.of(10, 181).lonDeg(), TOL_DEG, "181°E is 179°W");
        assertEquals(-180.0, GeoPosition.of(10, 180).lonDeg(), TOL_DEG, "180° is written -180°");
        assertEquals(0.0, GeoPosition.of(10, 720).lonDeg(), TOL_DEG, "whole turns");
    }
}
