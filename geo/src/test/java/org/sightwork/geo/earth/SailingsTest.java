package org.sightwork.geo.earth;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;
import net.sf.geographiclib.Geodesic;
import net.sf.geographiclib.GeodesicData;
import org.junit.jupiter.api.Test;

/**
 * Validation of the sailings against GeographicLib for Java 2.0 (Karney 2013, J. Geodesy 87, 43;
 * {@code Geodesic.WGS84}). GeographicLib-Java 2.0 has no rhumb-line class, so the rhumb line is
 * checked against an independent reckoning: the meridian arc from GeographicLib (a geodesic along a
 * meridian), the isometric latitude written out here (Snyder 1987, USGS PP 1395, eq. 7-7), and
 * plane sailing on the Mercator chart (tan C = Δλ / Δψ, distance = Δm / cos C).
 */
class SailingsTest {

    /** 1e-6 nm = 1.9 mm: both libraries are good to nanometres; SIS's series and the nm conversion allow mm. */
    private static final double TOL_GC_NM = 1e-6;
    /** 1e-6° = 0.11 m of arc at the Earth's surface. */
    private static final double TOL_COURSE_DEG = 1e-6;
    /** 1e-5 nm = 2 cm over ocean distances: the rhumb-line series of SIS and Snyder. */
    private static final double TOL_RHUMB_NM = 1e-5;
    /** Positions reached: 1e-8° = 1 mm. */
    private static final double TOL_POS_DEG = 1e-8;

    private static final Random RANDOM = new Random(20260621L);

    @Test
    void greatCircleMatchesGeographicLibOnRandomPairs() {
        for (int i = 0; i < 2000; i++) {
            double lat1 = RANDOM.nextDouble() * 170 - 85;
            double lon1 = RANDOM.nextDouble() * 360 - 180;
            double lat2 = RANDOM.nextDouble() * 170 - 85;
            double lon2 = RANDOM.nextDouble() * 360 - 180;
            GeodesicData g = Geodesic.WGS84.Inverse(lat1, lon1, lat2, lon2);
            if (g.s12 > 19_000_000) {
                continue; // near-antipodal: the initial course is ill-conditioned in both libraries
            }
            Sailings.GreatCircle s = Sailings.greatCircle(new GeoPosition(lat1, lon1), new GeoPosition(lat2, lon2));
            String what = "pair " + i + " " + lat1 + "," + lon1 + " -> " + lat2 + "," + lon2;
            assertEquals(g.s12 / 1852.0, s.distanceNm(), TOL_GC_NM, "distance, " + what);
            assertEquals(0.0, angleDiff(g.azi1, s.initialCourseDeg()), TOL_COURSE_DEG, "initial course, " + what);
            assertEquals(0.0, angleDiff(g.azi2, s.finalCourseDeg()), TOL_COURSE_DEG, "final course, " + what);
        }
    }

    @Test
    void greatCircleDestinationMatchesGeographicLibDirect() {
        for (int i = 0; i < 1000; i++) {
            double lat1 = RANDOM.nextDouble() * 170 - 85;
            double lon1 = RANDOM.nextDouble() * 360 - 180;
            double course = RANDOM.nextDouble() * 360;
            double distNm = RANDOM.nextDouble() * 5000;
            GeodesicData g = Geodesic.WGS84.Direct(lat1, lon1, course, distNm * 1852.0);
            GeoPosition p = Sailings.greatCircleDestination(new GeoPosition(lat1, lon1), course, distNm);
            assertEquals(g.lat2, p.latDeg(), TOL_POS_DEG, "latitude reached, case " + i);
            assertEquals(0.0, angleDiff(g.lon2, p.lonDeg()), TOL_POS_DEG, "longitude reached, case " + i);
        }
    }

    @Test
    void rhumbLineMatchesMeridianArcAndIsometricLatitude() {
        for (int i = 0; i < 2000; i++) {
            double lat1 = RANDOM.nextDouble() * 160 - 80;
            double lon1 = RANDOM.nextDouble() * 360 - 180;
            double lat2 = RANDOM.nextDouble() * 160 - 80;
            double lon2 = lon1 + RANDOM.nextDouble() * 60 - 30;
            GeoPosition from = new GeoPosition(lat1, lon1);
            GeoPosition to = GeoPosition.of(lat2, lon2);
            double[] expected = referenceRhumb(lat1, lon1, lat2, lon2);
            Sailings.RhumbLine r = Sailings.rhumbLine(from, to);
            String what = "pair " + i;
            assertEquals(expected[0], r.distanceNm(), TOL_RHUMB_NM * Math.max(1, expected[0] / 1000), "rhumb distance, " + what);
            assertEquals(0.0, angleDiff(expected[1], r.courseDeg()), TOL_COURSE_DEG, "rhumb course, " + what);
        }
    }

    @Test
    void rhumbDestinationReturnsToTheRhumbLine() {
        for (int i = 0; i < 2000; i++) {
            double lat1 = RANDOM.nextDouble() * 160 - 80;
            double lon1 = RANDOM.nextDouble() * 360 - 180;
            double course = RANDOM.nextDouble() * 360;
            double distNm = RANDOM.nextDouble() * 2000;
            GeoPosition from = new GeoPosition(lat1, lon1);
            GeoPosition p;
            try {
                p = Sailings.rhumbDestination(from, course, distNm);
            } catch (IllegalArgumentException poleReached) {
                continue;
            }
            double forwardDLonDeg = Math.toDegrees(Math.tan(Math.toRadians(course))
                    * (psi(Math.toRadians(p.latDeg())) - psi(Math.toRadians(lat1))));
            if (Math.abs(forwardDLonDeg) > 170 || Math.abs(p.latDeg() - lat1) < 1e-3) {
                continue; // more than half way round (asked the short way back), or along a parallel (below)
            }
            double[] back = referenceRhumb(lat1, lon1, p.latDeg(), unwrapNear(lon1, p.lonDeg()));
            assertEquals(distNm, back[0], TOL_RHUMB_NM * Math.max(1, distNm / 1000), "distance run, case " + i);
            if (distNm > 1) {
                assertEquals(0.0, angleDiff(course, back[1]), 1e-6, "course kept, case " + i);
            }
        }
    }

    @Test
    void crossesTheDateLineTheShortWay() {
        // 1° of longitude on the parallel 10°N is N cos φ Δλ: GeographicLib along the equator for scale.
        GeoPosition west = new GeoPosition(10, 179.5);
        GeoPosition east = new GeoPosition(10, -179.5);
        Sailings.RhumbLine r = Sailings.rhumbLine(west, east);
        double[] expected = referenceRhumb(10, 179.5, 10, 180.5);
        assertEquals(expected[0], r.distanceNm(), TOL_RHUMB_NM, "rhumb across the date line");
        assertEquals(90.0, r.courseDeg(), TOL_COURSE_DEG, "due east across the date line");
        Sailings.GreatCircle g = Sailings.greatCircle(west, east);
        GeodesicData ref = Geodesic.WGS84.Inverse(10, 179.5, 10, -179.5);
        assertEquals(ref.s12 / 1852, g.distanceNm(), TOL_GC_NM, "great circle across the date line");
        GeoPosition p = Sailings.rhumbDestination(west, 90, r.distanceNm());
        assertEquals(-179.5, p.lonDeg(), TOL_POS_DEG, "rhumb destination across the date line");
        assertEquals(10.0, p.latDeg(), TOL_POS_DEG, "stays on the parallel");
    }

    @Test
    void polesAreHandled() {
        GeodesicData meridian = Geodesic.WGS84.Inverse(80, 10, 90, 10);
        // Along a meridian the rhumb line and the great circle coincide: GeographicLib's meridian arc.
        Sailings.RhumbLine r = Sailings.rhumbLine(new GeoPosition(80, 10), new GeoPosition(90, 10));
        assertEquals(meridian.s12 / 1852, r.distanceNm(), TOL_RHUMB_NM, "rhumb to the North Pole");
        assertEquals(0.0, angleDiff(0.0, r.courseDeg()), TOL_COURSE_DEG, "due north to the pole");
        Sailings.GreatCircle g = Sailings.greatCircle(new GeoPosition(80, 10), new GeoPosition(90, 10));
        assertEquals(meridian.s12 / 1852, g.distanceNm(), TOL_GC_NM, "great circle to the North Pole");
        GeoPosition pole = Sailings.rhumbDestination(new GeoPosition(80, 10), 0, meridian.s12 / 1852);
        assertEquals(90.0, pole.latDeg(), 1e-7, "rhumb destination at the pole");
        GeodesicData south = Geodesic.WGS84.Inverse(-85, 30, -90, 30);
        GeoPosition southPole = Sailings.rhumbDestination(new GeoPosition(-85, 30), 180, south.s12 / 1852);
        assertEquals(-90.0, southPole.latDeg(), 1e-7, "rhumb destination at the South Pole");
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> Sailings.rhumbDestination(new GeoPosition(80, 10), 45, 1000));
        assertTrue(e.getMessage().contains("reaches the pole"), e.getMessage());
        GeoPosition over = Sailings.greatCircleDestination(new GeoPosition(89, 0), 0, 120);
        GeodesicData ref = Geodesic.WGS84.Direct(89, 0, 0, 120 * 1852);
        assertEquals(ref.lat2, over.latDeg(), TOL_POS_DEG, "great circle over the pole, latitude");
        assertEquals(0.0, angleDiff(ref.lon2, over.lonDeg()), TOL_POS_DEG, "great circle over the pole, longitude");
    }

    @Test
    void samePointAndBadArguments() {
        GeoPosition p = new GeoPosition(38.53, -28.63);
        assertEquals(0.0, Sailings.rhumbLine(p, p).distanceNm(), 0.0, "no distance");
        assertEquals(0.0, Sailings.greatCircle(p, p).distanceNm(), 0.0, "no distance");
        assertThrows(IllegalArgumentException.class, () -> Sailings.rhumbDestination(p, 10, -1));
        assertThrows(IllegalArgumentException.class, () -> Sailings.greatCircleDestination(p, Double.NaN, 1));
    }

    /** Independent rhumb line: {distance nm, course deg}. */
    private static double[] referenceRhumb(double lat1, double lon1, double lat2, double lon2) {
        double dLon = Math.toRadians(lon2 - lon1);
        double dPsi = psi(Math.toRadians(lat2)) - psi(Math.toRadians(lat1));
        double dM = Geodesic.WGS84.Inverse(lat1, 0, lat2, 0).s12 * Math.signum(lat2 - lat1);
        if (Math.abs(lat2 - lat1) < 1e-10) {
            double a = Geodesic.WGS84.EquatorialRadius();
            double f = Geodesic.WGS84.Flattening();
            double e2 = f * (2 - f);
            double phi = Math.toRadians(lat1);
            double n = a / Math.sqrt(1 - e2 * Math.sin(phi) * Math.sin(phi));
            double d = Math.abs(n * Math.cos(phi) * dLon);
            return new double[] {d / 1852, dLon >= 0 ? 90 : 270};
        }
        double c = Math.atan2(dLon, dPsi);
        double course = (Math.toDegrees(c) + 360) % 360;
        return new double[] {Math.abs(dM / Math.cos(c)) / 1852, course};
    }

    private static double psi(double phi) {
        double f = Geodesic.WGS84.Flattening();
        double e = Math.sqrt(f * (2 - f));
        double s = Math.sin(phi);
        return 0.5 * Math.log((1 + s) / (1 - s)) - e * 0.5 * Math.log((1 + e * s) / (1 - e * s));
    }

    private static double unwrapNear(double ref, double lon) {
        while (lon - ref > 180) {
            lon -= 360;
        }
        while (lon - ref < -180) {
            lon += 360;
        }
        return lon;
    }

    private static double angleDiff(double a, double b) {
        double d = (b - a) % 360;
        if (d > 180) {
            d -= 360;
        }
        if (d < -180) {
            d += 360;
        }
        return d;
    }
}
