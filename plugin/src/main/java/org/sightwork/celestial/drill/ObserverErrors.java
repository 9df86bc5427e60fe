package org.sightwork.celestial.drill;

import java.util.SplittableRandom;

/**
 * The observer's random sextant errors, drawn from a seed: the same seed gives the same errors on
 * every machine and Java version.
 *
 * <p><b>Method.</b> Normal deviates by the Box-Muller transform (Box and Muller, "A note on the
 * generation of random normal deviates", Ann. Math. Statist. 29 (1958) 610-611) from the uniform
 * deviates of {@link SplittableRandom} (whose sequence for a seed is specified by its Javadoc).
 * {@link StrictMath} keeps the same bits on every machine. Written here rather than using {@code RandomGenerator.nextGaussian()}, whose algorithm the Java
 * specification leaves to the implementation: a drill pack must be byte-identical for a seed.
 *
 * <p><b>Thread safety.</b> Not thread-safe: one instance per generation.
 */
public final class ObserverErrors {

    private final SplittableRandom random;
    private final double sigmaArcmin;

    /**
     * @param seed the drill's seed
     * @param sigmaArcmin standard deviation of one altitude (minutes of arc, ≥ 0)
     */
    public ObserverErrors(long seed, double sigmaArcmin) {
        this.random = new SplittableRandom(seed);
        this.sigmaArcmin = sigmaArcmin;
    }

    /**
     * The random error of the next sight. Two uniform deviates are drawn whatever the sigma, so
     * that the sequence does not depend on the profile.
     *
     * @return the error (minutes of arc)
     */
    public double nextAltitudeErrorArcmin() {
        double u1 = 1.0 - random.nextDouble(); // (0, 1]: log is finite
        double u2 = random.nextDouble();
        return sigmaArcmin * StrictMath.sqrt(-2.0 * StrictMath.log(u1)) * StrictMath.cos(2.0 * StrictMath.PI * u2);
    }
}
