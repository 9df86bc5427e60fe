package org.sightwork.celestial.planning;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.time.Duration;
import java.time.Instant;
import java.util.Random;
import net.sf.geographiclib.Geodesic;
import net.sf.geographiclib.GeodesicData;
import org.apache.sis.referencing.CommonCRS;
import org.apache.sis.referencing.GeodeticCalculator;
import org.junit.jupiter.api.Test;
import org.sightwork.geo.earth.GeoPosition;

/**
 * Validation of the constant-course DR (the shell's WGS84 rhumb line, run forwards and backwards)
 * against Apache SIS' rhumb-line solution on WGS84 and GeographicLib's meridian arc.
 */
class ShipTrackTest {

    /** 1e-5 nm = 2 cm: the tolerance of the shell's rhumb line against SIS (SailingsTest), per 1000 nm. */
    private static final double RHUMB_NM = 1e-5;

    /** 1e-6 degree of course, as in SailingsTest. */
    private static final double COURSE_DEG = 1e-6;

    /** 1e-8° of latitude or longitude, about 1 mm. */
    private static final double POSITION_DEG = 1e-8;

    private static final Instant T0 = Instant.parse("2024-03-01T00:00:00Z");

    private static Instant after(double hours) {
        return T0.plus(Duration.ofNanos(Math.round(hours * 3.6e12)));
    }

    @Test
    void rhumbLineAgreesWithApacheSisOnWgs84BothWays() {
        // Reference: Apache SIS GeodeticCalculator on WGS84 (rhumb line after Bennett 1996). Seeded
        // random courses and runs, after the start and before it (the run backwards).
        Random rnd = new Random(20260701L);
        GeodeticCalculator sis = GeodeticCalculator.create(CommonCRS.WGS84.geographic());
        int checked = 0;
        for (int i = 0; i < 300; i++) {
            GeoPosition from = GeoPosition.of(-70 + 140 * rnd.nextDouble(), -180 + 360 * rnd.nextDouble());
            double course = 360 * rnd.nextDouble();
            double speed = 5 + 25 * rnd.nextDouble();
            double hours = (rnd.nextBoolean() ? 1 : -1) * (0.1 + 24 * rnd.nextDouble());
            ShipTrack track = new ShipTrack(from, T0, course, speed);
            GeoPosition to;
            try {
                to = track.positionAt(after(hours));
            } catch (IllegalArgumentException poleward) {
                continue;
            }
            double runNm = speed * Math.abs(hours);
            sis.setStartGeographicPoint(from.latDeg(), from.lonDeg());
            sis.setEndGeographicPoint(to.latDeg(), to.lonDeg());
            double wantCourse = hours > 0 ? course : Horizon.norm360(course + 180.0);
            assertEquals(runNm, sis.getRhumblineLength() / 1852.0, RHUMB_NM * Math.max(1, runNm / 1000),
                    "rhumb length, case " + i);
            assertEquals(0.0, Horizon.norm180(wantCourse - sis.getConstantAzimuth()), COURSE_DEG,
                    "rhumb course, case " + i);
            checked++;
        }
        assertTrue(checked > 250, "most cases stay clear of the poles: " + checked);
    }

    @Test
    void eastboundAcrossTheDateLine() {
        // 20 kn east along 10°S from 179°E for 12 h: 240 nm along the parallel. SIS' rhumb line from
        // the start to the arrival must be 240 nm due east, and the longitude must come back west.
        GeoPosition start = new GeoPosition(-10.0, 179.0);
        ShipTrack t = new ShipTrack(start, T0, 90.0, 20.0);
        GeoPosition p = t.positionAt(after(12));
        assertEquals(-10.0, p.latDeg(), 1e-12, "latitude stays on the parallel");
        assertTrue(p.lonDeg() < 0, "crossed the date line: " + p.lonDeg());
        GeodeticCalculator sis = GeodeticCalculator.create(CommonCRS.WGS84.geographic());
        sis.setStartGeographicPoint(start.latDeg(), start.lonDeg());
        sis.setEndGeographicPoint(p.latDeg(), p.lonDeg());
        assertEquals(240.0, sis.getRhumblineLength() / 1852.0, RHUMB_NM, "run along the parallel");
        assertEquals(90.0, sis.getConstantAzimuth(), COURSE_DEG, "due east");
    }

    @Test
    void runsBackwardsBeforeTheStart() {
        // Due north at 10 kn: one hour before the start the ship was 10 nm further south along the
        // meridian, where the rhumb line is the geodesic: GeographicLib's Direct on WGS84.
        ShipTrack t = new ShipTrack(new GeoPosition(45.0, -30.0), T0, 0.0, 10.0);
        GeoPosition p = t.positionAt(after(-1));
        GeodesicData g = Geodesic.WGS84.Direct(45.0, -30.0, 180.0, 10 * 1852.0);
        assertEquals(g.lat2, p.latDeg(), POSITION_DEG, "latitude an hour earlier");
        assertEquals(-30.0, p.lonDeg(), 1e-12, "longitude on a meridian course");
    }

    @Test
    void refusesTheRhumbLineIntoThePole() {
        ShipTrack t = new ShipTrack(new GeoPosition(89.0, 0.0), Instant.EPOCH, 0.0, 20.0);
        assertThrows(IllegalArgumentException.class, () -> t.positionAt(Instant.EPOCH.plusSeconds(7200)));
    }

    @Test
    void refusesBadCourseAndSpeed() {
        GeoPosition p = new GeoPosition(0, 0);
        assertThrows(IllegalArgumentException.class, () -> new ShipTrack(p, Instant.EPOCH, 360.0, 5));
        assertThrows(IllegalArgumentException.class, () -> new ShipTrack(p, Instant.EPOCH, 10.0, -1));
        assertThrows(IllegalArgumentException.class, () -> new ShipTrack(p, Instant.EPOCH, 10.0, Double.NaN));
    }
}
