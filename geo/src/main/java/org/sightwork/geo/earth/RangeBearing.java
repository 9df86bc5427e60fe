package org.sightwork.geo.earth;

import java.util.ArrayList;
import java.util.List;

/**
 * Range and bearing between two positions on the WGS84 ellipsoid, by the rhumb line and by the
 * great circle (the geodesic), as the chart's range tool shows them.
 *
 * <p><b>Method:</b> the project's {@link Sailings} (Apache SIS {@code GeodeticCalculator}: the
 * geodesic by Karney (2013), J. Geodesy 87, 43-55, doi:10.1007/s00190-012-0578-z; the rhumb line
 * on the ellipsoid after Bennett (1996)); the drawn geodesic is densified by its direct problem.
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
        Sailings.GreatCircle gc = Sailings.greatCircle(from, to);
        Sailings.RhumbLine rl = Sailings.rhumbLine(from, to);
        return new RangeBearing(gc.distanceNm(), gc.initialCourseDeg(), gc.finalCourseDeg(), rl.distanceNm(),
                rl.courseDeg());
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
        Sailings.GreatCircle gc = Sailings.greatCircle(from, to);
        List<GeoPosition> out = new ArrayList<>(segments + 1);
        out.add(from);
        for (int i = 1; i < segments; i++) {
            out.add(Sailings.greatCircleDestination(from, gc.initialCourseDeg(), gc.distanceNm() * i / segments));
        }
        out.add(to);
        return out;
    }
}
