package org.sightwork.celestial.drill;

/**
 * The observer and the instruments of a drill: what makes the sights in the log differ from the
 * exact altitudes and times.
 *
 * @param sextantSigmaArcmin standard deviation of the random error of one sextant altitude
 *     (minutes of arc, [0, 10]); 0.5′-1′ is a good sight at sea (common practice)
 * @param indexErrorArcmin index error (minutes of arc, [-10, 10]), positive <em>on</em> the arc
 *     (the sextant reads too high; the correction is then subtracted, common practice)
 * @param eyeHeightM height of eye above the sea (metres, (0, 50])
 * @param watchErrorS watch error (seconds, [-600, 600]), positive when the watch is fast on UTC
 * @param temperatureC air temperature for refraction (°C, [-40, 50])
 * @param pressureHpa air pressure for refraction (hPa, [900, 1100])
 * @param sextantResolutionArcmin the sextant's reading step (minutes of arc): 0.1 for a micrometer
 *     drum; 0 writes the altitude unrounded (only for checking the generator)
 * @param watchResolutionS the watch's reading step (seconds): 1; 0 writes times unrounded (checks)
 */
public record ObserverProfile(double sextantSigmaArcmin, double indexErrorArcmin, double eyeHeightM,
        double watchErrorS, double temperatureC, double pressureHpa, double sextantResolutionArcmin,
        double watchResolutionS) {

    /** Checks every range; the message names the field, its value and the range. */
    public ObserverProfile {
        check("sextantSigmaArcmin", sextantSigmaArcmin, 0, 10, "′");
        check("indexErrorArcmin", indexErrorArcmin, -10, 10, "′");
        if (!(eyeHeightM > 0 && eyeHeightM <= 50)) {
            throw new IllegalArgumentException("eyeHeightM " + eyeHeightM + " m is outside (0 m, 50 m]");
        }
        check("watchErrorS", watchErrorS, -600, 600, " s");
        check("temperatureC", temperatureC, -40, 50, " °C");
        check("pressureHpa", pressureHpa, 900, 1100, " hPa");
        check("sextantResolutionArcmin", sextantResolutionArcmin, 0, 1, "′");
        check("watchResolutionS", watchResolutionS, 0, 60, " s");
    }

    private static void check(String name, double v, double min, double max, String unit) {
        if (!(v >= min && v <= max)) {
            throw new IllegalArgumentException(name + " " + v + unit + " is outside [" + min + unit + ", "
                    + max + unit + "]");
        }
    }
}
