package org.sightwork.geo.earth;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import java.util.Random;
import net.sf.geographiclib.Geodesic;
import net.sf.geographiclib.GeodesicData;
import org.junit.jupiter.api.Test;

/**
 * Validation of the range and bearing tool against GeographicLib for Java 2.0 (Karney 2013): the
 * geodesic directly, and the rhumb line rebuilt from GeographicLib's meridian arc and the isometric
 * latitude (course from the Mercator triangle, distance = meridian arc / cos course).
 */
class RangeBearingTest {

    /** 1 m, in nautical miles. */
    private static final double TOL_NM = 1.0 / Earth.NAUTICAL_MILE_M;
    /** 1e-6° of course: 2 cm of cross-track error over 1000 nm. */
    private static final double TOL_DEG = 1e-6;

    @Test
    void greatCircleAgreesWithGeographicLib() {
        Random r = new Random(42);
        for (int i = 0; i < 500; i++) {
            GeoPosition a = GeoPosition.of(-70 + 140 * r.nextDouble(), -180 + 360 * r.nextDouble());
            GeoPosition b = GeoPosition.of(-70 + 140 * r.nextDouble(), -180 + 360 * r.nextDouble());
            GeodesicData g = Geodesic.WGS84.Inverse(a.latDeg(), a.lonDeg(), b.latDeg(), b.lonDeg());
            RangeBearing rb = RangeBearing.between(a, b);
            assertEquals(g.s12 / Earth.NAUTICAL_MILE_M, rb.greatCircleNm(), TOL_NM, "distance " + a + " to " + b);
            assertEquals(0, angleDiff(g.azi1, rb.initialCourseDeg()), TOL_DEG, "initial course " + a + " to " + b);
            assertEquals(0, angleDiff(g.azi2, rb.finalCourseDeg()), TOL_DEG, "final course " + a + " to " + b);
        }
    }

    @Test
    void rhumbLineAgreesWithMeridianArcAndIsometricLatitude() {
        Random r = new Random(7);
        for (int i = 0; i < 300; i++) {
            GeoPosition a = GeoPosition.of(-70 + 140 * r.nextDouble(), -180 + 360 * r.nextDouble());
            GeoPosition b = GeoPosition.of(-70 + 140 * r.nextDouble(), a.lonDeg() - 60 + 120 * r.nextDouble());
            double dx = Mercator.eastingM(Math.IEEEremainder(b.lonDeg() - a.lonDeg(), 360));
            double dy = Mercator.northingM(b.latDeg()) - Mercator.northingM(a.latDeg());
            double course = Math.toDegrees(Math.atan2(dx, dy));
            double arc = Geodesic.WGS84.Inverse(a.latDeg(), 0, b.latDeg(), 0).s12;
            double cos = Math.cos(Math.toRadians(course));
            if (Math.abs(cos) < 0.05) {
                continue; // near east-west the distance is not arc / cos; covered by the parallel case below
            }
            RangeBearing rb = RangeBearing.between(a, b);
            assertEquals(0, angleDiff(course, rb.rhumbCourseDeg()), TOL_DEG, "rhumb course " + a + " to " + b);
            assertEquals(arc / Math.abs(cos) / Earth.NAUTICAL_MILE_M, rb.rhumbNm(), 1e-3, "rhumb distance " + a
                    + " to " + b);
        }
    }

    @Test
    void alongTheEquatorBothAreTheSame() {
        // 1° of longitude on the WGS84 equator is a·π/180 = 111 319.49 m (exact from the definition).
        RangeBearing rb = RangeBearing.between(GeoPosition.of(0, 10), GeoPosition.of(0, 11));
        double nm = Earth.WGS84_SEMI_MAJOR_AXIS_M * Math.PI / 180 / Earth.NAUTICAL_MILE_M;
        assertEquals(nm, rb.rhumbNm(), TOL_NM, "rhumb along the equator");
        assertEquals(nm, rb.greatCircleNm(), TOL_NM, "geodesic along the equator");
        assertEquals(90, rb.rhumbCourseDeg(), TOL_DEG, "course east");
    }

    @Test
    void drawnGeodesicLiesOnTheGeodesic() {
        GeoPosition a = GeoPosition.of(38.5, -28.6);
        GeoPosition b = GeoPosition.of(50.0, -5.0);
        List<GeoPosition> path = RangeBearing.geodesicPath(a, b, 10);
        GeodesicData g = Geodesic.WGS84.Inverse(a.latDeg(), a.lonDeg(), b.latDeg(), b.lonDeg());
        for (int i = 1; i < 10; i++) {
            GeodesicData d = Geodesic.WGS84.Direct(a.latDeg(), a.lonDeg(), g.azi1, g.s12 * i / 10);
            assertEquals(d.lat2, path.get(i).latDeg(), 1e-8, "latitude of point " + i);
            assertEquals(d.lon2, path.get(i).lonDeg(), 1e-8, "longitude of point " + i);
        }
    }

    private static double angleDiff(double a, double b) {
        return Math.IEEEremainder(a - b, 360);
    }
}
