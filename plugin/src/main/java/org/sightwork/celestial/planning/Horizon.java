package org.sightwork.celestial.planning;

import java.util.OptionalDouble;
import org.sightwork.celestial.almanac.BodyPosition;
import org.sightwork.celestial.reduction.ComputedAltitude;
import org.sightwork.celestial.reduction.SightReduction;
import org.sightwork.celestial.reduction.Sphere;
import org.sightwork.geo.earth.Earth;
import org.sightwork.geo.earth.GeoPosition;

/**
 * The navigational triangle both ways (equator to horizon and back), and the topocentric place of
 * a body for an observer on the WGS84 ellipsoid.
 *
 * <p><b>Method:</b> equator to horizon (Hc, Zn) is the reduction package's
 * {@link SightReduction#reduce}, the navigational triangle a navigator works; horizon to equator is
 * the same rotation inverted, written with {@code atan2} so that every quadrant comes out right
 * (Meeus, <i>Astronomical Algorithms</i>, 2nd ed., eq. 13.5-13.6, with the azimuth counted from
 * north instead of south; from memory). The topocentric place subtracts the observer's geocentric vector
 * (Meeus ch. 11, ρ sin φ′ and ρ cos φ′ on WGS84) from the body's geocentric vector and projects the
 * difference onto the observer's geodetic east-north-up frame.
 *
 * <p><b>Accuracy:</b> exact geometry in double precision (well under 0.01″); the body's place is as
 * good as the almanac.
 *
 * <p><b>Limits:</b> at a pole the azimuth is undefined (returned as the GHA-based limit); polar
 * motion is ignored (under 0.5″).
 */
public final class Horizon {

    private Horizon() {
    }

    /**
     * Computed altitude and azimuth (Hc, Zn) of a geocentric place, as a navigator reduces a sight.
     *
     * @param ghaDeg Greenwich hour angle (degrees)
     * @param decDeg declination (degrees, north positive)
     * @param at the observer's position
     * @return Hc (degrees, geocentric) and Zn (degrees true)
     */
    public static HorizonPoint fromEquatorial(double ghaDeg, double decDeg, GeoPosition at) {
        ComputedAltitude c = SightReduction.reduce(at, ghaDeg, decDeg);
        return new HorizonPoint(c.hcDeg(), c.znDeg());
    }

    /**
     * The equatorial place (GHA, Dec) of a direction observed in the sky: the navigational triangle
     * solved the other way, from the altitude and azimuth.
     *
     * @param seen altitude (degrees, corrected to the celestial horizon) and azimuth true
     * @param at the observer's position
     * @return {ghaDeg [0°, 360°), decDeg [-90°, 90°]}
     */
    public static double[] toEquatorial(HorizonPoint seen, GeoPosition at) {
        double h = Math.toRadians(seen.altitudeDeg());
        double z = Math.toRadians(seen.azimuthDeg());
        double lat = Math.toRadians(at.latDeg());
        // Unit vector in (east, north, up), dotted with the pole, the meridian point on the equator
        // and the west point, gives sin δ, cos δ cos LHA and cos δ sin LHA.
        double sinDec = Math.sin(lat) * Math.sin(h) + Math.cos(lat) * Math.cos(h) * Math.cos(z);
        double cosDecCosLha = Math.cos(lat) * Math.sin(h) - Math.sin(lat) * Math.cos(h) * Math.cos(z);
        double cosDecSinLha = -Math.cos(h) * Math.sin(z);
        double lhaDeg = Math.toDegrees(Math.atan2(cosDecSinLha, cosDecCosLha));
        double decDeg = Math.toDegrees(Math.asin(clamp(sinDec)));
        return new double[] {norm360(lhaDeg - at.lonDeg()), decDeg};
    }

    /**
     * The topocentric place (no refraction) of a body for an observer at a height above the WGS84
     * ellipsoid: the geocentric place shifted by the observer's offset from the Earth's centre. For
     * a star (no distance) it is the geocentric place.
     *
     * @param p the body's geocentric apparent place
     * @param at the observer's geodetic position
     * @param heightM the observer's height above the ellipsoid (metres)
     * @return topocentric altitude above the geodetic horizon plane and azimuth true (degrees)
     */
    public static HorizonPoint topocentric(BodyPosition p, GeoPosition at, double heightM) {
        OptionalDouble dist = p.distanceKm();
        if (dist.isEmpty()) {
            return fromEquatorial(p.ghaDeg(), p.decDeg(), at);
        }
        double rM = dist.getAsDouble() * 1000.0;
        // Earth-fixed frame: x to (0°, 0°), y to (0°, 90°E), z to the north pole; a body at GHA g lies
        // over longitude −g.
        double dec = Math.toRadians(p.decDeg());
        double lonB = Math.toRadians(-p.ghaDeg());
        double bx = rM * Math.cos(dec) * Math.cos(lonB);
        double by = rM * Math.cos(dec) * Math.sin(lonB);
        double bz = rM * Math.sin(dec);
        double[] o = observerEcef(at, heightM);
        double dx = bx - o[0];
        double dy = by - o[1];
        double dz = bz - o[2];
        double lat = Math.toRadians(at.latDeg());
        double lon = Math.toRadians(at.lonDeg());
        double e = -Math.sin(lon) * dx + Math.cos(lon) * dy;
        double n = -Math.sin(lat) * Math.cos(lon) * dx - Math.sin(lat) * Math.sin(lon) * dy + Math.cos(lat) * dz;
        double u = Math.cos(lat) * Math.cos(lon) * dx + Math.cos(lat) * Math.sin(lon) * dy + Math.sin(lat) * dz;
        double alt = Math.toDegrees(Math.atan2(u, Math.hypot(e, n)));
        return new HorizonPoint(alt, norm360(Math.toDegrees(Math.atan2(e, n))));
    }

    /** Earth-centred Earth-fixed coordinates of a geodetic position (metres), WGS84. */
    static double[] observerEcef(GeoPosition at, double heightM) {
        double a = Earth.WGS84_SEMI_MAJOR_AXIS_M;
        double f = 1.0 / Earth.WGS84_INVERSE_FLATTENING;
        double e2 = f * (2 - f);
        double lat = Math.toRadians(at.latDeg());
        double lon = Math.toRadians(at.lonDeg());
        double nRad = a / Math.sqrt(1 - e2 * Math.sin(lat) * Math.sin(lat));
        return new double[] {
            (nRad + heightM) * Math.cos(lat) * Math.cos(lon),
            (nRad + heightM) * Math.cos(lat) * Math.sin(lon),
            (nRad * (1 - e2) + heightM) * Math.sin(lat)};
    }

    /**
     * The great-circle angle between two directions given as (altitude, azimuth) or, equally, as
     * (declination, hour angle with the sign of an azimuth).
     *
     * @param alt1Deg first latitude-like angle (degrees)
     * @param az1Deg first longitude-like angle (degrees)
     * @param alt2Deg second latitude-like angle (degrees)
     * @param az2Deg second longitude-like angle (degrees)
     * @return the separation (degrees, [0°, 180°])
     */
    public static double separationDeg(double alt1Deg, double az1Deg, double alt2Deg, double az2Deg) {
        // Vincenty's form of the great-circle angle: well-conditioned at every separation.
        double p1 = Math.toRadians(alt1Deg);
        double p2 = Math.toRadians(alt2Deg);
        double dl = Math.toRadians(az2Deg - az1Deg);
        double y = Math.hypot(Math.cos(p2) * Math.sin(dl),
                Math.cos(p1) * Math.sin(p2) - Math.sin(p1) * Math.cos(p2) * Math.cos(dl));
        double x = Math.sin(p1) * Math.sin(p2) + Math.cos(p1) * Math.cos(p2) * Math.cos(dl);
        return Math.toDegrees(Math.atan2(y, x));
    }

    /**
     * An angle brought into [0°, 360°).
     *
     * @param deg any finite angle (degrees)
     * @return the same direction in [0°, 360°)
     */
    public static double norm360(double deg) {
        return Sphere.normalize360(deg);
    }

    /**
     * An angle brought into [-180°, 180°).
     *
     * @param deg any finite angle (degrees)
     * @return the same direction in [-180°, 180°)
     */
    public static double norm180(double deg) {
        return norm360(deg + 180.0) - 180.0;
    }

    private static double clamp(double v) {
        return Math.max(-1.0, Math.min(1.0, v));
    }
}
