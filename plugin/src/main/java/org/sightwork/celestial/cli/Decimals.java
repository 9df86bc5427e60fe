package org.sightwork.celestial.cli;

import java.math.BigDecimal;
import java.math.RoundingMode;

/**
 * Fixed-decimal numbers for the tables, the same text as {@code String.format(Locale.ROOT, "%.nf", v)}
 * (which rounds the decimal digits of {@link Double#toString} half-up, and writes a minus sign for
 * negative values and -0.0) at a fraction of the cost: a long-integer path, and the JDK's own digits
 * through {@link BigDecimal} where the scaled value is within 1e-4 of a rounding tie (the integer
 * path's rounding errors are below 3e-6 there) or too large for the integer path.
 *
 * <p>Measured reason: a year's hourly table of the Sun, Moon and four planets writes about 300,000
 * numbers; {@code String.format} took 0.3 s (JIT warm) to 1.5 s (cold) of CPU for 315,360 of them,
 * this 10 to 33 ms (thread CPU time; docs/PERFORMANCE.md).
 */
final class Decimals {

    private static final long[] POW10 = {1L, 10L, 100L, 1_000L, 10_000L, 100_000L, 1_000_000L, 10_000_000L,
        100_000_000L};
    private static final double FAST_LIMIT = 1e10;
    private static final double TIE_MARGIN = 1e-4;

    private Decimals() {
    }

    /**
     * Appends v with the given number of decimals.
     *
     * @param sb where to append
     * @param v the value (finite)
     * @param decimals 0 to 8
     * @return sb
     */
    static StringBuilder append(StringBuilder sb, double v, int decimals) {
        if (!Double.isFinite(v) || decimals < 0 || decimals >= POW10.length) {
            return sb.append(String.format(java.util.Locale.ROOT, "%." + decimals + "f", v));
        }
        boolean negative = Double.compare(v, 0.0) < 0;
        double a = Math.abs(v);
        long p = POW10[decimals];
        double scaled = a * p;
        double frac = scaled - Math.floor(scaled);
        if (scaled >= FAST_LIMIT || Math.abs(frac - 0.5) < TIE_MARGIN) {
            if (negative) {
                sb.append('-');
            }
            return sb.append(new BigDecimal(Double.toString(a)).setScale(decimals, RoundingMode.HALF_UP).toPlainString());
        }
        long n = (long) Math.floor(scaled + 0.5);
        if (negative) {
            sb.append('-');
        }
        sb.append(n / p);
        if (decimals > 0) {
            sb.append('.');
            String f = Long.toString(n % p);
            for (int i = f.length(); i < decimals; i++) {
                sb.append('0');
            }
            sb.append(f);
        }
        return sb;
    }
}
