package org.sightwork.celestial.fix;

/**
 * The covariance of a fix in the plane tangent at it.
 *
 * @param eastEastNm2 variance east-west (nm²)
 * @param northNorthNm2 variance north-south (nm²)
 * @param eastNorthNm2 covariance (nm²)
 */
public record PositionCovariance(double eastEastNm2, double northNorthNm2, double eastNorthNm2) {

    /** Checks that the matrix is a covariance (symmetric positive semi-definite). */
    public PositionCovariance {
        if (!(eastEastNm2 >= 0.0 && northNorthNm2 >= 0.0)
                || eastNorthNm2 * eastNorthNm2 > eastEastNm2 * northNorthNm2 * (1.0 + 1e-9) + 1e-18) {
            throw new IllegalArgumentException("not a covariance: " + eastEastNm2 + ", " + northNorthNm2 + ", "
                    + eastNorthNm2);
        }
    }

    /**
     * @param factor multiplier of every element (e.g. an a-posteriori variance factor)
     * @return the scaled covariance
     */
    public PositionCovariance scaled(double factor) {
        return new PositionCovariance(eastEastNm2 * factor, northNorthNm2 * factor, eastNorthNm2 * factor);
    }

    /**
     * The squared Mahalanobis distance of an offset: inside the 95% ellipse when at most
     * {@link ErrorEllipse#CHI_SQUARE_2D_95}.
     *
     * @param eastNm offset east (nm)
     * @param northNm offset north (nm)
     * @return dᵀ C⁻¹ d
     */
    public double mahalanobis2(double eastNm, double northNm) {
        double det = eastEastNm2 * northNorthNm2 - eastNorthNm2 * eastNorthNm2;
        return (northNorthNm2 * eastNm * eastNm - 2 * eastNorthNm2 * eastNm * northNm + eastEastNm2 * northNm * northNm)
                / det;
    }
}
