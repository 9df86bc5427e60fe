package org.sightwork.celestial.sight;

import org.sightwork.geo.earth.Earth;

/**
 * The altitude corrections as formulas: dip, refraction, parallax in altitude with the Moon's
 * semi-diameter augmentation, and the phase offset of Venus and Mars.
 *
 * <p><b>Method.</b> Each method names its source. Angles in degrees, corrections in minutes of arc,
 * each with the sign in which it is added to the altitude (dip and refraction negative).
 *
 * <p><b>Accuracy.</b> Dip: the almanac's formula, equal to its dip table to 0.1′ (checked against
 * the handbook values 2.4 m → 2.7′ and 10 m → 5.6′, from memory). Refraction: Bennett (1982) with
 * Meeus's extra term, 0.07′ claimed for 0°-90° in standard air (Meeus, <i>Astronomical
 * Algorithms</i>, 2nd ed., ch. 16); real low-altitude refraction varies by several minutes.
 * Parallax and augmentation: exact for a spherical or ellipsoidal Earth (vector geometry).
 *
 * <p><b>Limits.</b> Refraction is refused below -1° apparent altitude, where no formula is
 * trustworthy. Thread safety: stateless.
 */
public final class Corrections {

    /**
     * Dip coefficient of the almanac's dip formula, 1.76′ per √metre (from memory of the dip
     * table's formula, D′ = 1.76 √h, h in metres; = 0.97′ √feet).
     */
    public static final double DIP_ARCMIN_PER_SQRT_M = 1.76;

    /** Lowest apparent altitude at which refraction is worked out (degrees). */
    public static final double REFRACTION_FLOOR_DEG = -1.0;

    /** Apparent altitude below which a sight gets a low-altitude warning (degrees), common practice. */
    public static final double LOW_ALTITUDE_WARNING_DEG = 5.0;

    /** Feet to metres, exact (international foot, 1959). */
    public static final double METRES_PER_FOOT = 0.3048;

    private Corrections() {
    }

    /**
     * Dip of the sea horizon.
     *
     * @param eyeHeightM height of eye (metres, not negative)
     * @return the dip correction (minutes of arc, not positive): -1.76′ √h
     */
    public static double dipArcmin(double eyeHeightM) {
        checkEye(eyeHeightM);
        return -DIP_ARCMIN_PER_SQRT_M * Math.sqrt(eyeHeightM);
    }

    /**
     * Distance of the sea horizon for a height of eye, with the refraction of the dip formula:
     * the distance at which the dip-short formula equals the sea-horizon dip.
     *
     * @param eyeHeightM height of eye (metres)
     * @return distance (nautical miles)
     */
    public static double seaHorizonNm(double eyeHeightM) {
        checkEye(eyeHeightM);
        // Solve 60·atan(h/(1852 d) + d/8268)·(180/π) = 1.76 √h by bisection: monotone on d > dmin.
        double target = DIP_ARCMIN_PER_SQRT_M * Math.sqrt(eyeHeightM);
        if (target == 0.0) {
            return 0.0;
        }
        double lo = Math.sqrt(eyeHeightM / 1852.0 * 8268.0); // minimum of the dip-short curve
        double hi = 200.0;
        for (int i = 0; i < 80; i++) {
            double mid = 0.5 * (lo + hi);
            if (-dipShortArcminRaw(eyeHeightM, mid) < target) {
                lo = mid;
            } else {
                hi = mid;
            }
        }
        return 0.5 * (lo + hi);
    }

    /**
     * Dip of a shore horizon (the water line of a shore nearer than the sea horizon).
     *
     * <p>Method: Bowditch, <i>The American Practical Navigator</i> (Pub. No. 9, 2002 ed.), Table 22
     * "Dip of the sea short of the horizon", formula (from memory) D′ = 60·atan(h/(6076.1 d) +
     * d/8268) in degrees, h in feet and d in nautical miles; here h in metres (h/(1852 d)). When the
     * shore is at or beyond the sea horizon, the sea-horizon dip is returned.
     *
     * @param eyeHeightM height of eye (metres)
     * @param distanceNm distance to the shore horizon (nautical miles, positive)
     * @return the dip correction (minutes of arc, not positive)
     */
    public static double dipShortArcmin(double eyeHeightM, double distanceNm) {
        checkEye(eyeHeightM);
        if (!(distanceNm > 0.0)) {
            throw new SightException("distance to the shore horizon must be positive (nautical miles)");
        }
        double sea = dipArcmin(eyeHeightM);
        if (distanceNm >= seaHorizonNm(eyeHeightM)) {
            return sea;
        }
        return Math.min(dipShortArcminRaw(eyeHeightM, distanceNm), sea);
    }

    private static double dipShortArcminRaw(double eyeHeightM, double distanceNm) {
        double rad = Math.atan(eyeHeightM / (Earth.NAUTICAL_MILE_M * distanceNm) + distanceNm / 8268.0);
        return -Math.toDegrees(rad) * 60.0;
    }

    /**
     * Atmospheric refraction for an apparent altitude, in air of the given temperature and pressure.
     *
     * <p>Method: Bennett (1982), J. Navigation 35, 255, as given by Meeus, <i>Astronomical
     * Algorithms</i>, 2nd ed., ch. 16, eq. (16.4): R′ = cot(h + 7.31/(h + 4.4)), h in degrees;
     * with Meeus's refinement R′ - 0.06 sin(14.7 R′ + 13°) (same chapter); scaled by
     * (P/1010)·(283/(273 + T)) for pressure P (hPa) and temperature T (°C) (same chapter).
     * At 90° the formula gives -0.0013′, clamped to 0.
     *
     * @param apparentAltitudeDeg apparent altitude Ha (degrees, at least -1°)
     * @param temperatureC air temperature (°C)
     * @param pressureHpa air pressure (hPa)
     * @return the refraction correction (minutes of arc, not positive)
     * @throws SightException below -1°
     */
    public static double refractionArcmin(double apparentAltitudeDeg, double temperatureC, double pressureHpa) {
        if (!(apparentAltitudeDeg >= REFRACTION_FLOOR_DEG)) {
            throw new SightException(String.format(java.util.Locale.ROOT,
                    "apparent altitude %.1f° is below -1°: refraction there is unknowable; the sight cannot be used",
                    apparentAltitudeDeg));
        }
        double h = Math.min(apparentAltitudeDeg, 90.0);
        double r = 1.0 / Math.tan(Math.toRadians(h + 7.31 / (h + 4.4)));
        r -= 0.06 * Math.sin(Math.toRadians(14.7 * r + 13.0));
        r = Math.max(r, 0.0);
        double factor = (pressureHpa / 1010.0) * (283.0 / (273.0 + temperatureC));
        return -r * factor;
    }

    /**
     * Parallax in altitude and the augmented (topocentric) semi-diameter, by exact vector geometry.
     *
     * <p>Method: the body's topocentric direction (altitude {@code topoAltDeg}, azimuth
     * {@code znDeg}) is extended to the distance that puts it at its geocentric distance
     * Δ = a / sin(HP) from the Earth's centre, where the observer sits at ρ (in units of the
     * equatorial radius a) along the geocentric radius, which leans from the geodetic vertical by
     * φ - φ′ toward the equator (Meeus, <i>Astronomical Algorithms</i>, 2nd ed., ch. 11,
     * ρ sin φ′ and ρ cos φ′ on the WGS84 ellipsoid). The geocentric altitude is then measured from
     * the geodetic horizon, as the computed altitude Hc is. This is the exact form of "parallax =
     * HP·cos Ha" and of the reduction of the Moon's HP for latitude (HP·ρ, ρ ≈ 1 - f sin²φ),
     * including the small azimuth-dependent term of the oblate Earth. Without a latitude and
     * azimuth a spherical Earth of radius a is used (then sin p = sin HP · cos h exactly).
     *
     * @param topoAltDeg topocentric (refraction-free) altitude of the body's centre (degrees)
     * @param hpArcmin equatorial horizontal parallax (minutes of arc, ≥ 0)
     * @param sdArcmin geocentric semi-diameter (minutes of arc, ≥ 0)
     * @param latDeg observer's geodetic latitude (degrees), NaN for the spherical Earth
     * @param znDeg azimuth of the body (degrees true), NaN for the spherical Earth
     * @return parallax in altitude (added, minutes) and augmented semi-diameter (minutes)
     */
    public static Topocentric topocentric(double topoAltDeg, double hpArcmin, double sdArcmin, double latDeg,
            double znDeg) {
        if (hpArcmin == 0.0) {
            return new Topocentric(0.0, sdArcmin);
        }
        double h = Math.toRadians(topoAltDeg);
        double tx;
        double ty;
        double tz = Math.sin(h);
        double ox = 0.0;
        double oy;
        double oz;
        if (Double.isNaN(latDeg) || Double.isNaN(znDeg)) {
            tx = 0.0;
            ty = Math.cos(h);
            oy = 0.0;
            oz = 1.0;
        } else {
            double z = Math.toRadians(znDeg);
            tx = Math.cos(h) * Math.sin(z);
            ty = Math.cos(h) * Math.cos(z);
            double phi = Math.toRadians(latDeg);
            double f = 1.0 / Earth.WGS84_INVERSE_FLATTENING;
            double e2 = f * (2.0 - f);
            double n = 1.0 / Math.sqrt(1.0 - e2 * Math.sin(phi) * Math.sin(phi)); // units of a
            double px = n * Math.cos(phi);
            double pz = n * (1.0 - e2) * Math.sin(phi);
            double rho = Math.hypot(px, pz);
            double v = phi - Math.atan2(pz, px); // geodetic minus geocentric latitude
            oy = -rho * Math.sin(v);
            oz = rho * Math.cos(v);
        }
        double delta = 1.0 / Math.sin(Math.toRadians(hpArcmin / 60.0));
        double ot = ox * tx + oy * ty + oz * tz;
        double rho2 = ox * ox + oy * oy + oz * oz;
        double s = -ot + Math.sqrt(ot * ot - rho2 + delta * delta);
        double bz = oz + s * tz;
        double geoAlt = Math.toDegrees(Math.asin(Math.max(-1.0, Math.min(1.0, bz / delta))));
        double sdTopo = Math.toDegrees(Math.asin(Math.sin(Math.toRadians(sdArcmin / 60.0)) * delta / s)) * 60.0;
        return new Topocentric((geoAlt - topoAltDeg) * 60.0, sdTopo);
    }

    /**
     * Parallax and semi-diameter as seen by the observer.
     *
     * @param parallaxArcmin parallax in altitude, added to the topocentric altitude (minutes)
     * @param augmentedSdArcmin semi-diameter as seen from the observer (minutes)
     */
    public record Topocentric(double parallaxArcmin, double augmentedSdArcmin) {
    }

    /**
     * Offset of the centre of light of a gibbous or crescent planet from its centre, which a
     * navigator brings to the horizon when observing Venus or Mars.
     *
     * <p>Method: the centroid of a uniformly bright disc of radius r lit between the limb and an
     * elliptical terminator lies 8 r (1 - k) / (3π) from the centre toward the Sun, k the
     * illuminated fraction (derived in {@code docs/METHOD.md}: area k π r², first moment
     * (2/3) r³ sin² i with sin² i = 4k(1 - k)). Its component in altitude is that offset times
     * cos θ, θ the angle at the planet between the direction to the zenith and the direction to
     * the Sun. No limb darkening.
     *
     * @param sdArcmin the planet's semi-diameter (minutes)
     * @param illuminatedFraction k in [0, 1]
     * @param sunAngleFromVerticalDeg θ (degrees): 0 when the Sun is straight above the planet
     * @return the correction added to the altitude of the centre of light (minutes)
     */
    public static double phaseArcmin(double sdArcmin, double illuminatedFraction, double sunAngleFromVerticalDeg) {
        if (!(illuminatedFraction >= 0.0 && illuminatedFraction <= 1.0)) {
            throw new IllegalArgumentException("illuminated fraction " + illuminatedFraction + " is outside [0, 1]");
        }
        double offset = 8.0 * sdArcmin * (1.0 - illuminatedFraction) / (3.0 * Math.PI);
        return -offset * Math.cos(Math.toRadians(sunAngleFromVerticalDeg));
    }

    /**
     * The angle θ at a body between the direction to the zenith and the direction to the Sun, from
     * both bodies' altitude and azimuth (spherical triangle zenith-planet-Sun).
     *
     * @param altDeg the planet's altitude (degrees)
     * @param znDeg the planet's azimuth (degrees)
     * @param sunAltDeg the Sun's altitude (degrees)
     * @param sunZnDeg the Sun's azimuth (degrees)
     * @return θ (degrees, [0°, 180°])
     */
    public static double sunAngleFromVerticalDeg(double altDeg, double znDeg, double sunAltDeg, double sunZnDeg) {
        double h = Math.toRadians(altDeg);
        double hs = Math.toRadians(sunAltDeg);
        double dz = Math.toRadians(sunZnDeg - znDeg);
        // Bearing from the planet to the Sun on the sphere of (altitude, azimuth), measured from the
        // direction of increasing altitude: the initial-course formula of spherical trigonometry.
        double y = Math.sin(dz) * Math.cos(hs);
        double x = Math.cos(h) * Math.sin(hs) - Math.sin(h) * Math.cos(hs) * Math.cos(dz);
        return Math.toDegrees(Math.abs(Math.atan2(y, x)));
    }

    private static void checkEye(double eyeHeightM) {
        if (!(eyeHeightM >= 0.0)) {
            throw new SightException("height of eye " + eyeHeightM + " m must not be negative");
        }
    }
}
