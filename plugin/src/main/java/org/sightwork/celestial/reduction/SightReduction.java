package org.sightwork.celestial.reduction;

import org.sightwork.geo.earth.GeoPosition;

/**
 * Computed altitude and azimuth of a body from an assumed position (the navigational triangle).
 *
 * <p><b>Method.</b> sin Hc = sin φ sin δ + cos φ cos δ cos LHA, and
 * Zn = atan2(-cos δ sin LHA, cos φ sin δ - sin φ cos δ cos LHA), the cosine and the four-part
 * formulas of the triangle pole-zenith-body (Smart, <i>Textbook on Spherical Astronomy</i>, 6th
 * ed., ch. II §§ 9-10); Hc by atan2 of sin and the horizontal component, well conditioned near the
 * zenith. LHA = GHA + longitude (east positive).
 *
 * <p><b>Accuracy.</b> Round-off (1e-10°); checked against GeographicLib's geodesic on the unit
 * sphere (zenith distance and azimuth from the AP to the geographical position) in
 * {@code SightReductionTest}.
 *
 * <p><b>Limits.</b> At a pole Zn is referred to the meridian of the AP's longitude (every direction
 * is south there); at the zenith Zn is undefined and atan2(0, 0) = 0 is returned. Thread safety:
 * stateless.
 */
public final class SightReduction {

    private SightReduction() {
    }

    /**
     * @param ap the assumed (or DR) position
     * @param ghaDeg Greenwich hour angle of the body (degrees)
     * @param decDeg declination (degrees)
     * @return LHA, Hc and Zn
     */
    public static ComputedAltitude reduce(GeoPosition ap, double ghaDeg, double decDeg) {
        double lha = Sphere.normalize360(ghaDeg + ap.lonDeg());
        double phi = Math.toRadians(ap.latDeg());
        double dec = Math.toRadians(decDeg);
        double t = Math.toRadians(lha);
        double sp = Math.sin(phi);
        double cp = Math.cos(phi);
        double sd = Math.sin(dec);
        double cd = Math.cos(dec);
        double ct = Math.cos(t);
        double east = -cd * Math.sin(t);
        double north = cp * sd - sp * cd * ct;
        double up = sp * sd + cp * cd * ct;
        double hc = Math.toDegrees(Math.atan2(up, Math.hypot(east, north)));
        double zn = Sphere.normalize360(Math.toDegrees(Math.atan2(east, north)));
        return new ComputedAltitude(lha, hc, zn);
    }

    /**
     * The geographical position of a body: where it stands in the zenith.
     *
     * @param ghaDeg Greenwich hour angle (degrees)
     * @param decDeg declination (degrees)
     * @return latitude = Dec, longitude = -GHA
     */
    public static GeoPosition geographicalPosition(double ghaDeg, double decDeg) {
        return GeoPosition.of(decDeg, -ghaDeg);
    }
}
