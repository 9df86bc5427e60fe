package org.sightwork.celestial.almanac;

/**
 * Visual magnitudes of the Sun, the Moon and the navigational planets.
 *
 * <p><b>Method:</b> planets: A. Mallama and J. L. Hilton (2018), "Computing apparent planetary
 * magnitudes for The Astronomical Almanac", Astronomy and Computing 25, 10-24, the V equations for
 * Venus (two phase-angle ranges), Mars (two ranges, without the small longitude-dependent term),
 * Jupiter (phase angle up to 12°) and Saturn with its rings (sub-Earth ring latitude), coefficients
 * written from memory. Moon: V = -12.73 + 0.026 |i| + 4e-9 i^4 (i in degrees), the formula of
 * Allen's Astrophysical Quantities (from memory), scaled from its mean distances with 5 log10 of the
 * distance ratios. Sun: V = -26.74 at 1 au (from memory), + 5 log10(distance).
 *
 * <p><b>Accuracy:</b> the almanac shows magnitudes to 0.1; the formulas are good to a few hundredths
 * for the planets (Mallama and Hilton), about 0.1 for the Moon away from new moon.
 */
final class Magnitudes {

    private Magnitudes() {
    }

    /**
     * Venus.
     *
     * @param r heliocentric distance (au)
     * @param delta geocentric distance (au)
     * @param phaseDeg phase angle (degrees)
     * @return V
     */
    static double venus(double r, double delta, double phaseDeg) {
        double a = phaseDeg;
        double d = 5.0 * Math.log10(r * delta);
        if (a <= 163.7) {
            return d - 4.384 + a * (-1.044e-3 + a * (3.687e-4 + a * (-2.814e-6 + a * 8.938e-9)));
        }
        return d + 236.05828 + a * (-2.81914 + a * 8.39034e-3);
    }

    /**
     * Mars.
     *
     * @param r heliocentric distance (au)
     * @param delta geocentric distance (au)
     * @param phaseDeg phase angle (degrees)
     * @return V
     */
    static double mars(double r, double delta, double phaseDeg) {
        double a = phaseDeg;
        double d = 5.0 * Math.log10(r * delta);
        if (a <= 50.0) {
            return d - 1.601 + a * (0.02267 - a * 0.0001302);
        }
        return d - 0.367 + a * (-0.02573 + a * 0.0003445);
    }

    /**
     * Jupiter.
     *
     * @param r heliocentric distance (au)
     * @param delta geocentric distance (au)
     * @param phaseDeg phase angle (degrees)
     * @return V
     */
    static double jupiter(double r, double delta, double phaseDeg) {
        double a = phaseDeg;
        return 5.0 * Math.log10(r * delta) - 9.395 + a * (-3.7e-4 + a * 6.16e-4);
    }

    /**
     * Saturn with its rings.
     *
     * @param r heliocentric distance (au)
     * @param delta geocentric distance (au)
     * @param phaseDeg phase angle (degrees)
     * @param ringLatitudeRad sub-Earth latitude on the ring plane (radians), sign ignored
     * @return V
     */
    static double saturn(double r, double delta, double phaseDeg, double ringLatitudeRad) {
        double sb = Math.sin(Math.abs(ringLatitudeRad));
        return 5.0 * Math.log10(r * delta) - 8.914 - 1.825 * sb + 0.026 * phaseDeg
                - 0.378 * sb * Math.exp(-2.25 * phaseDeg);
    }

    /**
     * The Moon.
     *
     * @param sunDistanceAu the Moon's distance from the Sun, about the Earth's (au)
     * @param distanceKm geocentric distance (km)
     * @param phaseDeg phase angle (degrees)
     * @return V
     */
    static double moon(double sunDistanceAu, double distanceKm, double phaseDeg) {
        double a = Math.abs(phaseDeg);
        return -12.73 + 0.026 * a + 4e-9 * a * a * a * a
                + 5.0 * Math.log10(sunDistanceAu * distanceKm / 384400.0);
    }

    /**
     * The Sun.
     *
     * @param distanceAu geocentric distance (au)
     * @return V
     */
    static double sun(double distanceAu) {
        return -26.74 + 5.0 * Math.log10(distanceAu);
    }
}
