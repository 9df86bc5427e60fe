package org.sightwork.celestial.reduction;

import org.sightwork.geo.earth.GeoPosition;

/**
 * Great-circle and rhumb-line steps on the navigator's sphere (1 nm = 1′ of arc).
 *
 * <p><b>Method.</b> Unit vectors for the great circle (no singularity at the poles or the date
 * line); the rhumb line by the isometric latitude ψ = ln tan(π/4 + φ/2) with the east-west
 * case and the poles handled apart (Bowditch, <i>The American Practical Navigator</i>, 2002 ed.,
 * ch. 24, Mercator sailing, on the sphere).
 *
 * <p><b>Why by hand.</b> Sight reduction works on the sphere where a minute of arc is a mile;
 * the ellipsoidal geodesics of Apache SIS answer another question, and the fix loop calls these
 * for every line in every iteration (see {@code FixBenchmark}). GeographicLib (sphere, f = 0) checks them in the tests.
 *
 * <p><b>Accuracy.</b> Round-off only (1e-12 nm). Thread safety: stateless.
 */
public final class Sphere {

    /** Minutes of arc (nautical miles) in a radian. */
    public static final double NM_PER_RADIAN = 10800.0 / Math.PI;

    private Sphere() {
    }

    /**
     * The great-circle distance.
     *
     * @param a first position
     * @param b second position
     * @return distance (nautical miles)
     */
    public static double distanceNm(GeoPosition a, GeoPosition b) {
        double[] u = vector(a);
        double[] v = vector(b);
        double cx = u[1] * v[2] - u[2] * v[1];
        double cy = u[2] * v[0] - u[0] * v[2];
        double cz = u[0] * v[1] - u[1] * v[0];
        double dot = u[0] * v[0] + u[1] * v[1] + u[2] * v[2];
        return Math.atan2(Math.sqrt(cx * cx + cy * cy + cz * cz), dot) * NM_PER_RADIAN;
    }

    /**
     * The initial great-circle course from a to b.
     *
     * @param a from
     * @param b to
     * @return course (degrees true, [0°, 360°))
     */
    public static double initialCourseDeg(GeoPosition a, GeoPosition b) {
        double p1 = Math.toRadians(a.latDeg());
        double p2 = Math.toRadians(b.latDeg());
        double dl = Math.toRadians(b.lonDeg() - a.lonDeg());
        double y = Math.sin(dl) * Math.cos(p2);
        double x = Math.cos(p1) * Math.sin(p2) - Math.sin(p1) * Math.cos(p2) * Math.cos(dl);
        return normalize360(Math.toDegrees(Math.atan2(y, x)));
    }

    /**
     * Steps along a great circle. At a pole, "north" is taken along the meridian of the position's
     * longitude (the same convention as {@link SightReduction}'s azimuth).
     *
     * @param from start
     * @param courseDeg initial course (degrees true)
     * @param distanceNm distance (nautical miles, may be negative: backwards)
     * @return the end point
     */
    public static GeoPosition destination(GeoPosition from, double courseDeg, double distanceNm) {
        double c = Math.toRadians(courseDeg);
        return step(from, distanceNm * Math.sin(c), distanceNm * Math.cos(c));
    }

    /**
     * Steps by an east and a north component along the great circle they define.
     *
     * @param from start
     * @param eastNm east component (nautical miles)
     * @param northNm north component (nautical miles)
     * @return the end point
     */
    public static GeoPosition step(GeoPosition from, double eastNm, double northNm) {
        double d = Math.hypot(eastNm, northNm) / NM_PER_RADIAN;
        if (d == 0.0) {
            return from;
        }
        double phi = Math.toRadians(from.latDeg());
        double lam = Math.toRadians(from.lonDeg());
        double sp = Math.sin(phi);
        double cp = Math.cos(phi);
        double sl = Math.sin(lam);
        double cl = Math.cos(lam);
        // Local basis: east e, north n, up p.
        double[] p = {cp * cl, cp * sl, sp};
        double[] e = {-sl, cl, 0.0};
        double[] n = {-sp * cl, -sp * sl, cp};
        double ue = eastNm / NM_PER_RADIAN / d;
        double un = northNm / NM_PER_RADIAN / d;
        double cd = Math.cos(d);
        double sd = Math.sin(d);
        double x = cd * p[0] + sd * (ue * e[0] + un * n[0]);
        double y = cd * p[1] + sd * (ue * e[1] + un * n[1]);
        double z = cd * p[2] + sd * (ue * e[2] + un * n[2]);
        return fromVector(x, y, z, from.lonDeg());
    }

    /**
     * Steps along a rhumb line (constant course), as a DR is run.
     *
     * @param from start
     * @param courseDeg course (degrees true)
     * @param distanceNm distance (nautical miles; negative runs backwards)
     * @return the end point
     * @throws IllegalArgumentException if the rhumb line would pass a pole
     */
    public static GeoPosition rhumb(GeoPosition from, double courseDeg, double distanceNm) {
        double c = Math.toRadians(courseDeg);
        double phi1 = Math.toRadians(from.latDeg());
        double dphi = distanceNm * Math.cos(c) / NM_PER_RADIAN;
        double phi2 = phi1 + dphi;
        if (Math.abs(phi2) > Math.PI / 2 + 1e-12) {
            throw new IllegalArgumentException("the DR run of " + Math.round(distanceNm)
                    + " nm on course " + Math.round(courseDeg) + "° would pass over a pole");
        }
        phi2 = Math.max(-Math.PI / 2, Math.min(Math.PI / 2, phi2));
        double q;
        double dpsi = Math.log(Math.tan(Math.PI / 4 + phi2 / 2) / Math.tan(Math.PI / 4 + phi1 / 2));
        if (Math.abs(dphi) > 1e-12 && Double.isFinite(dpsi)) {
            q = dphi / dpsi;
        } else {
            q = Math.cos(phi1);
        }
        double dlam = Math.abs(q) < 1e-15 ? 0.0 : distanceNm * Math.sin(c) / NM_PER_RADIAN / q;
        if (Math.abs(Math.cos(phi2)) < 1e-15) {
            dlam = 0.0;
        }
        return GeoPosition.of(Math.toDegrees(phi2), from.lonDeg() + Math.toDegrees(dlam));
    }

    /**
     * @param p position
     * @return its unit vector (x toward 0°N 0°E, z toward the North Pole)
     */
    public static double[] vector(GeoPosition p) {
        double phi = Math.toRadians(p.latDeg());
        double lam = Math.toRadians(p.lonDeg());
        return new double[] {Math.cos(phi) * Math.cos(lam), Math.cos(phi) * Math.sin(lam), Math.sin(phi)};
    }

    /**
     * @param x vector x
     * @param y vector y
     * @param z vector z
     * @param lonAtPoleDeg longitude to give a pole (degrees)
     * @return the position of the vector's direction
     */
    public static GeoPosition fromVector(double x, double y, double z, double lonAtPoleDeg) {
        double h = Math.hypot(x, y);
        double lat = Math.toDegrees(Math.atan2(z, h));
        double lon = h < 1e-15 ? lonAtPoleDeg : Math.toDegrees(Math.atan2(y, x));
        return GeoPosition.of(lat, lon);
    }

    /**
     * @param deg an angle (degrees)
     * @return the same direction in [0°, 360°)
     */
    public static double normalize360(double deg) {
        double d = deg % 360.0;
        if (d < 0) {
            d += 360.0;
        }
        return d >= 360.0 ? 0.0 : d;
    }
}
