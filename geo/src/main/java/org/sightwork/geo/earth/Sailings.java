package org.sightwork.geo.earth;

import org.apache.sis.referencing.CommonCRS;
import org.apache.sis.referencing.GeodeticCalculator;
import org.opengis.geometry.DirectPosition;

/**
 * The sailings on the WGS84 ellipsoid: rhumb line (constant course) and great circle (geodesic)
 * between two positions, and the position reached from a start on a given course and distance.
 *
 * <p><b>Method.</b> Great circle (strictly the ellipsoidal geodesic), both directions, and the rhumb
 * line between two positions: Apache SIS {@link GeodeticCalculator} on
 * {@code CommonCRS.WGS84.geographic()}, which follows Karney, "Algorithms for geodesics",
 * J. Geodesy 87 (2013) 43-55, doi:10.1007/s00190-012-0578-z, and for the rhumb line Bennett,
 * "Practical rhumb line calculations on the spheroid", J. Navigation 49 (1996) 112-119.
 * The rhumb line <em>destination</em> is not offered by SIS 1.6 (its end point is always the
 * geodesic one), so it is written here: the meridian arc by Snyder, <i>Map Projections: A Working
 * Manual</i>, USGS PP 1395 (1987), eq. 3-21, inverted by eq. 3-26, and the isometric latitude
 * ψ = atanh(sin φ) − e·atanh(e·sin φ) (Snyder eq. 7-7 written with atanh); then
 * Δλ = tan C · Δψ, or along a parallel Δλ = d·sin C / (N cos φ) with N the prime-vertical radius.
 *
 * <p><b>Accuracy.</b> Checked in {@code SailingsTest} against GeographicLib for Java 2.0
 * (Karney's geodesic, WGS84) on 2,000 random pairs with a fixed seed: great-circle distance and
 * course agree to 1e-6 nm and 1e-6°. The rhumb line is checked against an independent reckoning
 * (GeographicLib's meridian arc and the isometric latitude) to 1e-5 nm and 1e-6°.
 *
 * <p><b>Limits.</b> Longitudes are taken the short way round the date line (a rhumb line of more
 * than 180° of longitude is never asked for). At a pole the course is undefined: from a pole the
 * course is measured as SIS and GeographicLib do, as if along the meridian of the given longitude.
 * A rhumb line on a course with a north or south component reaches the pole after a finite
 * distance; a destination beyond it is refused. Distances are in nautical miles of 1852 m.
 *
 * <p><b>Thread safety.</b> Safe: each thread uses its own SIS calculator.
 */
public final class Sailings {

    private static final ThreadLocal<GeodeticCalculator> CALC =
            ThreadLocal.withInitial(() -> GeodeticCalculator.create(CommonCRS.WGS84.geographic()));

    private static final double A = Earth.WGS84_SEMI_MAJOR_AXIS_M;
    private static final double F = 1.0 / Earth.WGS84_INVERSE_FLATTENING;
    private static final double E2 = F * (2 - F);
    private static final double E = Math.sqrt(E2);
    /** Courses closer than this to east or west (radians) use the parallel formula. */
    private static final double ALONG_PARALLEL_RAD = 1e-12;
    /** A run that ends within 1 mm past a pole ends at the pole (the meridian-arc series is good to that). */
    private static final double POLE_SLACK_M = 1e-3;

    private Sailings() {
    }

    /**
     * A rhumb line between two positions.
     *
     * @param distanceNm length of the rhumb line (nautical miles, ≥ 0)
     * @param courseDeg the constant course (degrees true, [0°, 360°))
     */
    public record RhumbLine(double distanceNm, double courseDeg) {
    }

    /**
     * A great circle (geodesic) between two positions.
     *
     * @param distanceNm length of the geodesic (nautical miles, ≥ 0)
     * @param initialCourseDeg course at the start (degrees true, [0°, 360°))
     * @param finalCourseDeg course on arrival (degrees true, [0°, 360°))
     */
    public record GreatCircle(double distanceNm, double initialCourseDeg, double finalCourseDeg) {
    }

    /**
     * The rhumb line from one position to another.
     *
     * @param from start
     * @param to end
     * @return distance (nm) and constant course (degrees true); course 0 when the points coincide
     */
    public static RhumbLine rhumbLine(GeoPosition from, GeoPosition to) {
        if (from.equals(to)) {
            return new RhumbLine(0.0, 0.0);
        }
        GeodeticCalculator c = CALC.get();
        c.setStartGeographicPoint(from.latDeg(), from.lonDeg());
        c.setEndGeographicPoint(to.latDeg(), to.lonDeg());
        return new RhumbLine(c.getRhumblineLength() / Earth.NAUTICAL_MILE_M, toCourse(c.getConstantAzimuth()));
    }

    /**
     * The great circle (geodesic) from one position to another.
     *
     * @param from start
     * @param to end
     * @return distance (nm), initial and final course (degrees true)
     */
    public static GreatCircle greatCircle(GeoPosition from, GeoPosition to) {
        if (from.equals(to)) {
            return new GreatCircle(0.0, 0.0, 0.0);
        }
        GeodeticCalculator c = CALC.get();
        c.setStartGeographicPoint(from.latDeg(), from.lonDeg());
        c.setEndGeographicPoint(to.latDeg(), to.lonDeg());
        return new GreatCircle(c.getGeodesicDistance() / Earth.NAUTICAL_MILE_M,
                toCourse(c.getStartingAzimuth()), toCourse(c.getEndingAzimuth()));
    }

    /**
     * The position reached along a great circle (geodesic) from a start, on an initial course.
     *
     * @param from start
     * @param initialCourseDeg course at the start (degrees true, any finite value)
     * @param distanceNm distance (nautical miles, ≥ 0)
     * @return the end position
     */
    public static GeoPosition greatCircleDestination(GeoPosition from, double initialCourseDeg, double distanceNm) {
        checkDistance(distanceNm);
        checkCourse(initialCourseDeg);
        if (distanceNm == 0) {
            return from;
        }
        GeodeticCalculator c = CALC.get();
        c.setStartGeographicPoint(from.latDeg(), from.lonDeg());
        c.setStartingAzimuth(initialCourseDeg);
        c.setGeodesicDistance(distanceNm * Earth.NAUTICAL_MILE_M);
        DirectPosition p = c.getEndPoint();
        // WGS84.geographic() has (latitude, longitude) axis order.
        return GeoPosition.of(Math.max(-90.0, Math.min(90.0, p.getOrdinate(0))), p.getOrdinate(1));
    }

    /**
     * The position reached along a rhumb line from a start, on a constant course.
     *
     * @param from start
     * @param courseDeg the constant course (degrees true, any finite value)
     * @param distanceNm distance (nautical miles, ≥ 0)
     * @return the end position
     * @throws IllegalArgumentException if the rhumb line reaches a pole before the distance is run
     */
    public static GeoPosition rhumbDestination(GeoPosition from, double courseDeg, double distanceNm) {
        checkDistance(distanceNm);
        checkCourse(courseDeg);
        if (distanceNm == 0) {
            return from;
        }
        double c = Math.toRadians(courseDeg);
        double d = distanceNm * Earth.NAUTICAL_MILE_M;
        double phi1 = Math.toRadians(from.latDeg());
        double m2 = meridianArcM(phi1) + d * Math.cos(c);
        double quarter = meridianArcM(Math.PI / 2);
        if (Math.abs(m2) > quarter + POLE_SLACK_M) {
            double toPoleNm = (quarter - Math.signum(Math.cos(c)) * meridianArcM(phi1)) / Math.abs(Math.cos(c))
                    / Earth.NAUTICAL_MILE_M;
            throw new IllegalArgumentException(String.format(java.util.Locale.ROOT,
                    "a rhumb line on course %.1f° from %s reaches the pole after %.1f nm, short of %.1f nm",
                    courseDeg, from, toPoleNm, distanceNm));
        }
        double phi2 = latitudeOfMeridianArc(Math.max(-quarter, Math.min(quarter, m2)));
        double dLon;
        double cosC = Math.cos(c);
        if (Math.abs(cosC) < ALONG_PARALLEL_RAD || Math.abs(phi2 - phi1) < 1e-12) {
            // Along a parallel: the arc is d sin C on a circle of radius N cos φ.
            double n = A / Math.sqrt(1 - E2 * Math.sin(phi1) * Math.sin(phi1));
            double r = n * Math.cos(phi1);
            dLon = r < 1e-9 ? 0.0 : d * Math.sin(c) / r;
        } else if (Math.abs(Math.sin(c)) < ALONG_PARALLEL_RAD || Math.abs(phi2) >= Math.PI / 2 - 1e-15) {
            dLon = 0.0; // along the meridian, or into a pole where the isometric latitude is infinite
        } else {
            dLon = Math.tan(c) * (isometricLatitude(phi2) - isometricLatitude(phi1));
        }
        double latDeg = Math.toDegrees(phi2);
        return GeoPosition.of(Math.max(-90.0, Math.min(90.0, latDeg)), from.lonDeg() + Math.toDegrees(dLon));
    }

    /**
     * Distance along the meridian from the equator to a latitude on WGS84 (Snyder 1987, eq. 3-21).
     *
     * @param latDeg latitude (degrees, [-90°, 90°])
     * @return the meridian arc (nautical miles, negative south)
     */
    public static double meridianArcNm(double latDeg) {
        return meridianArcM(Math.toRadians(latDeg)) / Earth.NAUTICAL_MILE_M;
    }

    /**
     * The latitude at a distance along the meridian from the equator (inverse of {@link #meridianArcNm}).
     *
     * @param arcNm meridian arc (nautical miles)
     * @return latitude (degrees, clamped to [-90°, 90°])
     */
    public static double latitudeOfMeridianArcNm(double arcNm) {
        return Math.toDegrees(latitudeOfMeridianArc(arcNm * Earth.NAUTICAL_MILE_M));
    }

    /**
     * Isometric latitude ψ of a geodetic latitude on WGS84 (Snyder 1987, eq. 7-7).
     *
     * @param phiRad geodetic latitude (radians)
     * @return ψ (radians; infinite at the poles)
     */
    static double isometricLatitude(double phiRad) {
        double s = Math.sin(phiRad);
        return atanh(s) - E * atanh(E * s);
    }

    /**
     * Distance along the meridian from the equator (Snyder 1987, eq. 3-21; series good to well under
     * a millimetre on WGS84).
     *
     * @param phiRad geodetic latitude (radians)
     * @return meridian arc (metres, signed)
     */
    static double meridianArcM(double phiRad) {
        double e4 = E2 * E2;
        double e6 = e4 * E2;
        return A * ((1 - E2 / 4 - 3 * e4 / 64 - 5 * e6 / 256) * phiRad
                - (3 * E2 / 8 + 3 * e4 / 32 + 45 * e6 / 1024) * Math.sin(2 * phiRad)
                + (15 * e4 / 256 + 45 * e6 / 1024) * Math.sin(4 * phiRad)
                - (35 * e6 / 3072) * Math.sin(6 * phiRad));
    }

    /** Inverse of {@link #meridianArcM}: the footpoint latitude (Snyder 1987, eq. 3-24 to 3-26). */
    static double latitudeOfMeridianArc(double mM) {
        double e4 = E2 * E2;
        double e6 = e4 * E2;
        double mu = mM / (A * (1 - E2 / 4 - 3 * e4 / 64 - 5 * e6 / 256));
        double sq = Math.sqrt(1 - E2);
        double e1 = (1 - sq) / (1 + sq);
        double phi = mu + (3 * e1 / 2 - 27 * Math.pow(e1, 3) / 32) * Math.sin(2 * mu)
                + (21 * e1 * e1 / 16 - 55 * Math.pow(e1, 4) / 32) * Math.sin(4 * mu)
                + (151 * Math.pow(e1, 3) / 96) * Math.sin(6 * mu)
                + (1097 * Math.pow(e1, 4) / 512) * Math.sin(8 * mu);
        // One Newton step on the exact series removes the truncation of eq. 3-26.
        double n = A / Math.sqrt(1 - E2 * Math.sin(phi) * Math.sin(phi));
        double rho = n * (1 - E2) / (1 - E2 * Math.sin(phi) * Math.sin(phi));
        phi += (mM - meridianArcM(phi)) / rho;
        return Math.max(-Math.PI / 2, Math.min(Math.PI / 2, phi));
    }

    private static double atanh(double x) {
        return 0.5 * Math.log((1 + x) / (1 - x));
    }

    private static double toCourse(double azimuthDeg) {
        double c = azimuthDeg % 360.0;
        if (c < 0) {
            c += 360.0;
        }
        return c >= 360.0 ? 0.0 : c;
    }

    private static void checkDistance(double distanceNm) {
        if (!(distanceNm >= 0) || Double.isInfinite(distanceNm)) {
            throw new IllegalArgumentException("distance " + distanceNm + " nm must be a finite number ≥ 0");
        }
    }

    private static void checkCourse(double courseDeg) {
        if (!Double.isFinite(courseDeg)) {
            throw new IllegalArgumentException("course " + courseDeg + "° is not a number");
        }
    }
}
