package org.sightwork.celestial.passage;

/**
 * A 2×2 covariance of an east/north position error (true nautical miles squared).
 *
 * @param eeNm2 variance east (nm²)
 * @param nnNm2 variance north (nm²)
 * @param enNm2 covariance east-north (nm²)
 */
public record Covariance2(double eeNm2, double nnNm2, double enNm2) {

    /** Checks that it is a covariance (positive semi-definite). */
    public Covariance2 {
        if (!(eeNm2 >= 0) || !(nnNm2 >= 0) || eeNm2 * nnNm2 - enNm2 * enNm2 < -1e-12 * (eeNm2 * nnNm2 + 1e-30)) {
            throw new IllegalArgumentException("not a covariance: " + eeNm2 + ", " + nnNm2 + ", " + enNm2);
        }
    }

    /**
     * @param other another covariance
     * @return the sum
     */
    public Covariance2 plus(Covariance2 other) {
        return new Covariance2(eeNm2 + other.eeNm2, nnNm2 + other.nnNm2, enNm2 + other.enNm2);
    }

    /**
     * The squared Mahalanobis distance d' C⁻¹ d of an east/north difference.
     *
     * @param eastNm east difference (nm)
     * @param northNm north difference (nm)
     * @return d' C⁻¹ d (dimensionless)
     */
    public double mahalanobis2(double eastNm, double northNm) {
        double det = eeNm2 * nnNm2 - enNm2 * enNm2;
        return (nnNm2 * eastNm * eastNm - 2 * enNm2 * eastNm * northNm + eeNm2 * northNm * northNm) / det;
    }

    /** @return the semi-major axis of the one-sigma ellipse (nm) */
    public double semiMajorNm() {
        double tr = (eeNm2 + nnNm2) / 2;
        double d = Math.sqrt(Math.max(0, (eeNm2 - nnNm2) * (eeNm2 - nnNm2) / 4 + enNm2 * enNm2));
        return Math.sqrt(tr + d);
    }

    /** @return the semi-minor axis of the one-sigma ellipse (nm) */
    public double semiMinorNm() {
        double tr = (eeNm2 + nnNm2) / 2;
        double d = Math.sqrt(Math.max(0, (eeNm2 - nnNm2) * (eeNm2 - nnNm2) / 4 + enNm2 * enNm2));
        return Math.sqrt(Math.max(0, tr - d));
    }
}
