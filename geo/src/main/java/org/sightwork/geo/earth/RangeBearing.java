package org.sightwork.geo.earth;

import java.util.ArrayList;
import java.util.List;
import org.apache.sis.referencing.CommonCRS;
import org.apache.sis.referencing.GeodeticCalculator;
import org.opengis.geometry.DirectPosition;

/**
 * Range and bearing between two positions on the WGS84 ellipsoid, by the rhumb line and by the
 * great circle (the geodesic), as the chart's range tool shows them.
 *
 * <p><b>Method:</b> Apache SIS {@link GeodeticCalculator}: the geodesic by Karney's method
 * (Karney, C. F. F. (2013), Algorithms for geodesics, J. Geodesy 87, 43-55,
 * doi:10.1007/s00190-012-0578-z), the rhumb line on the ellipsoid through the isometric latitude.
 * To be replaced by the project's own sailings when they exist, with the same figures.
 *
 * <p><b>Accuracy:</b> checked against GeographicLib (geodesic) and against the rhumb line built
 * from GeographicLib's meridian arc and the isometric latitude: agreement better than 1 m and 1e-6°
 * ({@code RangeBearingTest}). <b>Limits:</b> the rhumb line is taken the short way in longitude;
 * between antipodes the geodesic's azimuth is not unique.
 *
 * @param greatCircleNm geodesic distance (nautical miles)
 * @param initialCourseDeg geodesic azimuth at the start (degrees true, [0°, 360°))
 * @param finalCourseDeg geodesic azimuth at the end (degrees true, [0°, 360°))
 * @param rhumbNm rhumb-line distance (nautical miles)
 * @param rhumbCourseDeg rhumb-line course (degrees true, [0°, 360°))
 */
public record RangeBearing(double greatCircleNm, double initialCourseDeg, double finalCourseDeg, double rhumbNm,
        double rhumbCourseDeg) {

    /**
     * Computes range and bearing from one position to another.
     *
     * @param from the start
     * @param to the end
     * @return the figures
     */
    public static RangeBearing between(GeoPosition from, GeoPosition to) {
        GeodeticCalculator c = GeodeticCalculator.create(CommonCRS.WGS84.geographic());
        c.setStartGeographicPoint(from.latDeg(), from.lonDeg());
        c.setEndGeographicPoint(to.latDeg(), to.lonDeg());
        double gc = c.getGeodesicDistance() / Earth.NAUTICAL_MILE_M;
        double az1 = course(c.getStartingAzimuth());
        double az2 = course(c.getEndingAzimuth());
        double rl = c.getRhumblineLength() / Earth.NAUTICAL_MILE_M;
        double rc = course(c.getConstantAzimuth());
        return new RangeBearing(gc, az1, az2, rl, rc);
    }

    /**
     * Points along the geodesic from one position to another, for drawing.
     *
     * @param from the start
     * @param to the end
     * @param segments number of segments (≥ 1)
     * @return segments + 1 positions, the ends included
     */
    public static List<GeoPosition> geodesicPath(GeoPosition from, GeoPosition to, int segments) {
        GeodeticCalculator c = GeodeticCalculator.create(CommonCRS.WGS84.geographic());
        c.setStartGeographicPoint(from.latDeg(), from.lonDeg());
        c.setEndGeographicPoint(to.latDeg(), to.lonDeg());
        double d = c.getGeodesicDistance();
        double az = c.getStartingAzimuth();
        List<GeoPosition> out = new ArrayList<>(segments + 1);
        out.add(from);
        for (int i = 1; i < segments; i++) {
            c.setStartGeographicPoint(from.latDeg(), from.lonDeg());
            c.setStartingAzimuth(az);
            c.setGeodesicDistance(d * i / segments);
            DirectPosition p = c.getEndPoint();
            out.add(GeoPosition.of(p.getOrdinate(0), p.getOrdinate(1)));
        }
        out.add(to);
        return out;
    }

    private static double course(double azDeg) {
        double a = azDeg % 360;
        return a < 0 ? a + 360 : a;
    }
}
