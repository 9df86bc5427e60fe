package org.sightwork.celestial.reduction;

import java.util.ArrayList;
import java.util.List;
import org.sightwork.geo.earth.GeoPosition;

/**
 * The exact position circle of a sight: every place from which the body stands at the observed
 * altitude, a small circle about the body's geographical position (GP) of radius 90° - Ho.
 *
 * @param gp the geographical position (latitude = Dec, longitude = -GHA)
 * @param radiusNm radius (nautical miles, [0, 10800]): 60 × (90° - Ho)
 */
public record CircleOfEqualAltitude(GeoPosition gp, double radiusNm) {

    /** Checks the radius. */
    public CircleOfEqualAltitude {
        if (!(radiusNm >= 0.0 && radiusNm <= 10800.0)) {
            throw new IllegalArgumentException("radius " + radiusNm + " nm is outside [0, 10800] nm");
        }
    }

    /**
     * @param ghaDeg the body's GHA (degrees)
     * @param decDeg its declination (degrees)
     * @param hoDeg the observed altitude (degrees, [-90°, 90°])
     * @return the circle
     */
    public static CircleOfEqualAltitude of(double ghaDeg, double decDeg, double hoDeg) {
        return new CircleOfEqualAltitude(SightReduction.geographicalPosition(ghaDeg, decDeg), (90.0 - hoDeg) * 60.0);
    }

    /**
     * Points around the circle, for drawing (great-circle steps from the GP).
     *
     * @param count number of points (at least 3); the first is due north of the GP
     * @return the points, clockwise
     */
    public List<GeoPosition> points(int count) {
        if (count < 3) {
            throw new IllegalArgumentException("at least 3 points are needed, not " + count);
        }
        List<GeoPosition> pts = new ArrayList<>(count);
        for (int i = 0; i < count; i++) {
            pts.add(Sphere.destination(gp, 360.0 * i / count, radiusNm));
        }
        return pts;
    }

    /**
     * @param p a position
     * @return how far p lies outside the circle (nautical miles, negative inside)
     */
    public double offsetNm(GeoPosition p) {
        return Sphere.distanceNm(gp, p) - radiusNm;
    }
}
