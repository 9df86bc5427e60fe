package org.sightwork.celestial.fix;

/**
 * An error ellipse of a fix: the region holding the true position with the stated probability
 * when the error model holds.
 *
 * <p><b>Method.</b> Semi-axes √(χ² λ) from the eigenvalues λ of the 2 × 2 covariance, χ² the
 * quantile of the chi-square distribution with 2 degrees of freedom: for 95 %,
 * χ² = -2 ln 0.05 = 5.991 (the 2-D normal's radial distribution is exponential).
 *
 * @param majorNm semi-major axis (nautical miles)
 * @param minorNm semi-minor axis (nautical miles)
 * @param orientationDeg direction of the major axis (degrees true, [0°, 180°))
 */
public record ErrorEllipse(double majorNm, double minorNm, double orientationDeg) {

    /** The 95 % quantile of chi-square with 2 degrees of freedom, -2 ln 0.05. */
    public static final double CHI_SQUARE_2D_95 = -2.0 * Math.log(0.05);

    /** Checks the axes. */
    public ErrorEllipse {
        if (!(minorNm >= 0.0 && majorNm >= minorNm)) {
            throw new IllegalArgumentException("ellipse axes " + majorNm + ", " + minorNm + " nm are not major ≥ minor ≥ 0");
        }
        if (!(orientationDeg >= 0.0 && orientationDeg < 180.0)) {
            throw new IllegalArgumentException("orientation " + orientationDeg + "° is outside [0°, 180°)");
        }
    }

    /**
     * @param c covariance (nm²)
     * @param chiSquare the chi-square quantile for the wanted probability
     * @return the ellipse
     */
    public static ErrorEllipse of(PositionCovariance c, double chiSquare) {
        double a = c.eastEastNm2();
        double b = c.northNorthNm2();
        double h = c.eastNorthNm2();
        double mean = 0.5 * (a + b);
        double rad = Math.hypot(0.5 * (a - b), h);
        double l1 = mean + rad;
        double l2 = Math.max(0.0, mean - rad);
        // Angle of the major axis from east, counter-clockwise; as a bearing: 90° minus it.
        double thetaFromEast = 0.5 * Math.atan2(2.0 * h, a - b);
        double bearing = 90.0 - Math.toDegrees(thetaFromEast);
        bearing = ((bearing % 180.0) + 180.0) % 180.0;
        if (bearing >= 180.0) {
            bearing = 0.0;
        }
        return new ErrorEllipse(Math.sqrt(chiSquare * l1), Math.sqrt(chiSquare * l2), bearing);
    }

    /**
     * @param c covariance (nm²)
     * @return the 95 % ellipse
     */
    public static ErrorEllipse of95(PositionCovariance c) {
        return of(c, CHI_SQUARE_2D_95);
    }
}
