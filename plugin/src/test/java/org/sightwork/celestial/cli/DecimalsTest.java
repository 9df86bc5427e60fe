package org.sightwork.celestial.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.Locale;
import java.util.Random;
import org.junit.jupiter.api.Test;

/** {@link Decimals} against the JDK's {@code String.format("%.nf")} (the reference it replaces). */
class DecimalsTest {

    private static String fast(double v, int d) {
        return Decimals.append(new StringBuilder(), v, d).toString();
    }

    @Test
    void sameTextAsStringFormatOnRandomValuesAndTies() {
        Random r = new Random(42L);
        for (int i = 0; i < 200_000; i++) {
            int d = r.nextInt(9);
            double v;
            switch (i % 4) {
                case 0 -> v = (r.nextDouble() - 0.5) * 720.0;
                case 1 -> v = (r.nextDouble() - 0.5) * 2e-5;
                case 2 -> v = Math.rint((r.nextDouble() - 0.5) * 1e6) / 1e6 + 0.5 / Math.pow(10, d); // near ties
                default -> v = (r.nextDouble() - 0.5) * Math.pow(10, r.nextInt(12));
            }
            assertEquals(String.format(Locale.ROOT, "%." + d + "f", v), fast(v, d), "v = " + v + ", " + d + " decimals");
        }
    }

    @Test
    void edgeCases() {
        double[] vs = {0.0, -0.0, 0.5, -0.5, 1.5, 2.5, 0.125, 359.9999995, -1e-9, 1e17, -1e17, 0.045, 1.005};
        for (double v : vs) {
            for (int d = 0; d <= 8; d++) {
                assertEquals(String.format(Locale.ROOT, "%." + d + "f", v), fast(v, d), "v = " + v + ", " + d + " decimals");
            }
        }
    }
}
