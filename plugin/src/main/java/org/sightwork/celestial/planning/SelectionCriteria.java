package org.sightwork.celestial.planning;

import org.sightwork.celestial.sight.Corrections;

/**
 * What makes a body a good candidate for a twilight fix, and how many to propose.
 *
 * <p>The default thresholds are common practice (no source), our own choice of numbers: an altitude
 * band of 15°-70° (below 15° refraction is uncertain; above 70° the azimuth changes fast and the
 * sextant is awkward to swing), 15° clear of the Moon (its light washes out the stars near it and
 * brightens the horizon under it), and, while the Sun is less than 18° below the horizon, no body
 * within 30° of the Sun's azimuth below 25° altitude (the bright twilight sky there).
 *
 * @param setSize number of bodies to propose (3, 4 or 5)
 * @param minAltDeg lowest altitude proposed (degrees)
 * @param maxAltDeg highest altitude proposed (degrees)
 * @param moonClearanceDeg least angular distance from the Moon (degrees)
 * @param glareAzimuthDeg half-width in azimuth of the glare sector about the Sun (degrees)
 * @param glareAltitudeDeg altitude below which a body in the glare sector is avoided (degrees)
 * @param eyeHeightM height of eye, for the pre-set sextant altitudes (metres)
 */
public record SelectionCriteria(int setSize, double minAltDeg, double maxAltDeg, double moonClearanceDeg,
        double glareAzimuthDeg, double glareAltitudeDeg, double eyeHeightM) {

    /** The defaults: 3 bodies, 15°-70°, 15° from the Moon, glare 30° and 25°, eye at 0 m. */
    public static final SelectionCriteria DEFAULT = new SelectionCriteria(3, 15.0, 70.0, 15.0, 30.0, 25.0, 0.0);

    /** Checks the ranges. */
    public SelectionCriteria {
        if (setSize < 3 || setSize > 5) {
            throw new IllegalArgumentException("set size " + setSize + " is not 3, 4 or 5");
        }
        if (!(minAltDeg >= 0.0 && minAltDeg < maxAltDeg && maxAltDeg <= 90.0)) {
            throw new IllegalArgumentException("altitude band " + minAltDeg + "°-" + maxAltDeg
                    + "° is not within 0°-90° with the lower limit first");
        }
        if (!(moonClearanceDeg >= 0.0 && moonClearanceDeg <= 90.0)) {
            throw new IllegalArgumentException("Moon clearance " + moonClearanceDeg + "° is outside [0°, 90°]");
        }
        if (!(glareAzimuthDeg >= 0.0 && glareAzimuthDeg <= 180.0)) {
            throw new IllegalArgumentException("glare sector " + glareAzimuthDeg + "° is outside [0°, 180°]");
        }
        if (!(glareAltitudeDeg >= 0.0 && glareAltitudeDeg <= 90.0)) {
            throw new IllegalArgumentException("glare altitude " + glareAltitudeDeg + "° is outside [0°, 90°]");
        }
        Corrections.dipArcmin(eyeHeightM); // checks the height of eye
    }

    /**
     * The same criteria with another set size.
     *
     * @param n 3, 4 or 5
     * @return the criteria
     */
    public SelectionCriteria withSetSize(int n) {
        return new SelectionCriteria(n, minAltDeg, maxAltDeg, moonClearanceDeg, glareAzimuthDeg, glareAltitudeDeg,
                eyeHeightM);
    }

    /**
     * The same criteria with another altitude band.
     *
     * @param min lowest altitude (degrees)
     * @param max highest altitude (degrees)
     * @return the criteria
     */
    public SelectionCriteria withAltitudeBand(double min, double max) {
        return new SelectionCriteria(setSize, min, max, moonClearanceDeg, glareAzimuthDeg, glareAltitudeDeg,
                eyeHeightM);
    }

    /**
     * The same criteria with another height of eye.
     *
     * @param m height of eye (metres)
     * @return the criteria
     */
    public SelectionCriteria withEyeHeight(double m) {
        return new SelectionCriteria(setSize, minAltDeg, maxAltDeg, moonClearanceDeg, glareAzimuthDeg, glareAltitudeDeg,
                m);
    }
}
