package org.sightwork.celestial.almanac;

import java.util.OptionalDouble;
import org.sightwork.celestial.time.AstroTime;

/**
 * Apparent geocentric place of date of a body, as a navigator uses it.
 *
 * @param body the body
 * @param time the instant
 * @param ghaDeg Greenwich hour angle (degrees, [0°, 360°))
 * @param decDeg declination (degrees, [-90°, 90°], north positive)
 * @param raDeg apparent right ascension of date (degrees, [0°, 360°))
 * @param shaDeg sidereal hour angle, 360° - RA (degrees, [0°, 360°)): stars and planets
 * @param distanceKm geocentric distance (km): Sun, Moon, planets
 * @param hpArcmin equatorial horizontal parallax (arcminutes): Sun, Moon, planets
 * @param sdArcmin semi-diameter (arcminutes): Sun, Moon, planets
 * @param magnitude visual magnitude: all but Aries
 * @param illuminatedFraction illuminated fraction of the disc, [0, 1]: Moon and planets
 */
public record BodyPosition(Body body, AstroTime time,
        double ghaDeg,
        double decDeg,
        double raDeg,
        OptionalDouble shaDeg,
        OptionalDouble distanceKm,
        OptionalDouble hpArcmin,
        OptionalDouble sdArcmin,
        OptionalDouble magnitude,
        OptionalDouble illuminatedFraction) {

    /**
     * Checks the values.
     *
     * @throws IllegalArgumentException if a value is missing or out of its range
     */
    public BodyPosition {
        if (body == null || time == null || shaDeg == null || distanceKm == null || hpArcmin == null
                || sdArcmin == null || magnitude == null || illuminatedFraction == null) {
            throw new IllegalArgumentException("a body position needs every field (use OptionalDouble.empty())");
        }
        if (!(ghaDeg >= 0.0 && ghaDeg < 360.0)) {
            throw new IllegalArgumentException("GHA " + ghaDeg + "° of " + body.name() + " is outside [0°, 360°)");
        }
        if (!(decDeg >= -90.0 && decDeg <= 90.0)) {
            throw new IllegalArgumentException("declination " + decDeg + "° of " + body.name() + " is outside [-90°, 90°]");
        }
        if (!(raDeg >= 0.0 && raDeg < 360.0)) {
            throw new IllegalArgumentException("RA " + raDeg + "° of " + body.name() + " is outside [0°, 360°)");
        }
    }
}
