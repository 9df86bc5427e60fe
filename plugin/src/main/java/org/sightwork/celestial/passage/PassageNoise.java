package org.sightwork.celestial.passage;

/**
 * The noise model of the reconciliation: how far the dead reckoning and the current are trusted.
 * The defaults are common practice for a small vessel with a log and a steering compass (no
 * source): they are the values the simulation tests use, and a user with a better or worse log can
 * say so.
 *
 * @param drVelocityNoiseKn white noise on the DR velocity, as the standard deviation of the mean
 *        velocity error over one hour (knots): position uncertainty grows as this times √hours
 * @param currentSigmaKn standard deviation of the current (each component) before any fix (knots)
 * @param currentChangeKnPerSqrtHour random walk of the current (knots per √hour)
 * @param speedScaleSigma standard deviation of the log's scale error before any fix (fraction, 0.03 = 3 %)
 * @param compassBiasSigmaDeg standard deviation of the compass error before any fix (degrees)
 * @param departureSigmaNm standard deviation of the departure position (each component, nm)
 * @param gpsSigmaNm standard deviation of a GPS fix (each component, nm) in the comparison
 */
public record PassageNoise(double drVelocityNoiseKn, double currentSigmaKn, double currentChangeKnPerSqrtHour,
        double speedScaleSigma, double compassBiasSigmaDeg, double departureSigmaNm, double gpsSigmaNm) {

    /** Common practice for a yacht on passage (see the class comment). */
    public static final PassageNoise DEFAULT = new PassageNoise(0.25, 0.5, 0.05, 0.03, 2.0, 0.2, 0.01);

    /** Checks that every value is a positive number (or zero where zero makes sense). */
    public PassageNoise {
        double[] v = {drVelocityNoiseKn, currentSigmaKn, currentChangeKnPerSqrtHour, speedScaleSigma,
            compassBiasSigmaDeg, departureSigmaNm, gpsSigmaNm};
        for (double x : v) {
            if (!(x >= 0) || Double.isInfinite(x)) {
                throw new IllegalArgumentException("noise values must be finite and ≥ 0: " + java.util.Arrays.toString(v));
            }
        }
        if (departureSigmaNm <= 0) {
            throw new IllegalArgumentException("departure sigma must be > 0 nm");
        }
    }
}
