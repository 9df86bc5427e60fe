package org.sightwork.celestial.fix;

/**
 * Settings of the fix computation.
 *
 * @param drErrorFraction k: the DR error (one standard deviation, each direction) per mile run,
 *     as a fraction of the distance run (default {@value #DEFAULT_DR_ERROR_FRACTION}: 5 % of the
 *     distance run, common practice for a yacht's DR over a few hours)
 * @param convergenceNm stop iterating when the position moves less than this (nautical miles)
 * @param maxIterations most re-reductions
 * @param rejectOutliers whether to leave out a sight whose normalised residual exceeds the limit
 *     (only with four or more lines, one sight at a time)
 * @param outlierLimit the normalised-residual limit (default 3)
 * @param refuseCrossingDeg lines that all cross within this angle make no fix (degrees)
 * @param warnCrossingDeg lines that all cross within this angle get a weak-geometry warning (degrees)
 */
public record FixOptions(double drErrorFraction, double convergenceNm, int maxIterations, boolean rejectOutliers,
        double outlierLimit, double refuseCrossingDeg, double warnCrossingDeg) {

    /** Default DR error per mile run (fraction of the distance run). */
    public static final double DEFAULT_DR_ERROR_FRACTION = 0.05;

    /** The defaults: k = 5 %, 0.01 nm, 20 iterations, reject at 3, refuse under 15°, warn under 30°. */
    public static final FixOptions DEFAULTS = new FixOptions(DEFAULT_DR_ERROR_FRACTION, 0.01, 20, true, 3.0, 15.0, 30.0);

    /** Checks the ranges. */
    public FixOptions {
        if (!(drErrorFraction >= 0.0 && drErrorFraction <= 1.0)) {
            throw new IllegalArgumentException("DR error fraction " + drErrorFraction + " is outside [0, 1]");
        }
        if (!(convergenceNm > 0.0) || maxIterations < 1 || !(outlierLimit > 0.0)
                || !(refuseCrossingDeg >= 0.0 && warnCrossingDeg >= refuseCrossingDeg && warnCrossingDeg <= 90.0)) {
            throw new IllegalArgumentException("fix options out of range");
        }
    }

    /**
     * @param k DR error fraction
     * @return these options with another DR error fraction
     */
    public FixOptions withDrErrorFraction(double k) {
        return new FixOptions(k, convergenceNm, maxIterations, rejectOutliers, outlierLimit, refuseCrossingDeg,
                warnCrossingDeg);
    }

    /**
     * @param reject whether to reject outliers
     * @return these options with outlier rejection on or off
     */
    public FixOptions withRejectOutliers(boolean reject) {
        return new FixOptions(drErrorFraction, convergenceNm, maxIterations, reject, outlierLimit, refuseCrossingDeg,
                warnCrossingDeg);
    }
}
