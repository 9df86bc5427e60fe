package org.sightwork.celestial.reduction;

import java.time.Duration;
import java.time.Instant;
import org.sightwork.geo.earth.GeoPosition;

/**
 * The predicted time of local apparent noon (the Sun on the moving ship's meridian) from a DR
 * position, course and speed.
 *
 * <p><b>Method.</b> Solve LHA(t) = GHA☉(t) + λ(t) = 0 (mod 360°) where λ(t) is the longitude of
 * the DR run along a rhumb line from the starting DR; first guess (360° - LHA)/15° per hour,
 * then Newton steps with a numerical derivative (about 15° per hour less the ship's rate of
 * change of longitude) to 0.01 s.
 *
 * <p><b>Accuracy.</b> That of the Sun's GHA (0.1′ ≈ 0.4 s) and of the DR: 1′ of DR longitude moves
 * noon by 4 s. <b>Limits.</b> A ship making westing faster than the Sun (impossible at sea below
 * 89° latitude) never sees noon. Thread safety: stateless.
 */
public final class LocalApparentNoon {

    /**
     * The predicted noon.
     *
     * @param utc time of local apparent noon
     * @param position DR position at that time
     * @param sunDecDeg Sun's declination then (degrees)
     * @param meridianAltitudeDeg the Sun's centre's altitude on the meridian (degrees, geocentric,
     *     90° - |φ - δ|)
     */
    public record Noon(Instant utc, GeoPosition position, double sunDecDeg, double meridianAltitudeDeg) {
    }

    private LocalApparentNoon() {
    }

    /**
     * @param from the time to search from (UTC): the first noon after it is returned
     * @param dr the DR position at {@code from}
     * @param courseDeg course (degrees true)
     * @param speedKn speed (knots, not negative)
     * @param sun the Sun's GHA and Dec
     * @return the noon
     */
    public static Noon next(Instant from, GeoPosition dr, double courseDeg, double speedKn, GhaDecSource sun) {
        double lha0 = lhaAt(0.0, from, dr, courseDeg, speedKn, sun);
        double hours = (360.0 - lha0) / 15.0;
        if (hours >= 24.0) {
            hours = 0.0;
        }
        for (int i = 0; i < 30; i++) {
            double f = signed(lhaAt(hours, from, dr, courseDeg, speedKn, sun));
            double h = 1.0 / 60.0;
            double rate = (signed(lhaAt(hours + h, from, dr, courseDeg, speedKn, sun)) - f) / h;
            if (rate < 1.0) {
                throw new IllegalArgumentException("the ship outruns the Sun westward: no local apparent noon");
            }
            double step = -f / rate;
            hours += step;
            if (Math.abs(step) < 0.01 / 3600.0) {
                break;
            }
        }
        Instant t = at(from, hours);
        GeoPosition p = run(dr, courseDeg, speedKn, hours);
        double dec = sun.at(t).decDeg();
        return new Noon(t, p, dec, 90.0 - Math.abs(p.latDeg() - dec));
    }

    private static double lhaAt(double hours, Instant from, GeoPosition dr, double c, double v, GhaDecSource sun) {
        GeoPosition p = run(dr, c, v, hours);
        return Sphere.normalize360(sun.at(at(from, hours)).ghaDeg() + p.lonDeg());
    }

    private static GeoPosition run(GeoPosition dr, double c, double v, double hours) {
        return Sphere.rhumb(dr, c, v * hours);
    }

    private static Instant at(Instant from, double hours) {
        return from.plus(Duration.ofNanos(Math.round(hours * 3600e9)));
    }

    private static double signed(double deg) {
        return deg > 180.0 ? deg - 360.0 : deg;
    }
}
