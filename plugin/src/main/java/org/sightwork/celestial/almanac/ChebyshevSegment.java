package org.sightwork.celestial.almanac;

/**
 * A Chebyshev interpolant of several smooth functions of time over one span of days.
 *
 * <p><b>Method:</b> interpolation at the N + 1 Chebyshev nodes of the first kind,
 * x_j = cos(pi (j + 1/2) / (N + 1)), with coefficients from the discrete orthogonality of the
 * Chebyshev polynomials, c_k = 2/(N + 1) sum_j f(x_j) cos(pi k (j + 1/2) / (N + 1)) (c_0 halved):
 * W. H. Press et al., <i>Numerical Recipes</i>, 3rd ed. (2007), section 5.8, eq. 5.8.7. The
 * polynomial is evaluated with the three-term recurrence T_k+1 = 2x T_k - T_k-1 (eq. 5.8.2), one
 * pass for all channels.
 *
 * <p><b>Accuracy:</b> for a function analytic near the span the error falls geometrically with N
 * and is within a small factor of the best polynomial of that degree (section 5.8). The errors of
 * the spans and degrees used are measured, not assumed: see {@link Almanac} and
 * {@code AlmanacInterpolationTest}.
 *
 * <p><b>Thread safety:</b> immutable after construction.
 */
final class ChebyshevSegment {

    /** Values of all channels at one instant. */
    @FunctionalInterface
    interface Channels {
        /**
         * Computes the channels.
         *
         * @param days TT days from J2000.0
         * @param out receives one value per channel
         */
        void at(double days, double[] out);
    }

    /** Index of the span: it covers [index L, (index + 1) L) days from J2000.0 (TT). */
    final long index;
    private final double midDays;
    private final double invHalfDays;
    private final int channels;
    private final int degree;
    /** Coefficient of T_k for channel c at k * channels + c. */
    private final double[] coef;

    private ChebyshevSegment(long index, double midDays, double halfDays, int channels, int degree, double[] coef) {
        this.index = index;
        this.midDays = midDays;
        this.invHalfDays = 1.0 / halfDays;
        this.channels = channels;
        this.degree = degree;
        this.coef = coef;
    }

    /**
     * Fits span {@code index} of length {@code lengthDays}.
     *
     * @param index span index (start = index * lengthDays)
     * @param lengthDays span length (days)
     * @param degree N, the highest power
     * @param channels number of functions
     * @param f the functions
     * @return the interpolant
     */
    static ChebyshevSegment fit(long index, double lengthDays, int degree, int channels, Channels f) {
        int n = degree + 1;
        double half = 0.5 * lengthDays;
        double mid = index * lengthDays + half;
        double[] values = new double[n * channels];
        double[] row = new double[channels];
        for (int j = 0; j < n; j++) {
            f.at(mid + half * Math.cos(Math.PI * (j + 0.5) / n), row);
            System.arraycopy(row, 0, values, j * channels, channels);
        }
        double[] coef = new double[n * channels];
        for (int k = 0; k < n; k++) {
            double scale = (k == 0 ? 1.0 : 2.0) / n;
            for (int j = 0; j < n; j++) {
                double w = scale * Math.cos(Math.PI * k * (j + 0.5) / n);
                for (int c = 0; c < channels; c++) {
                    coef[k * channels + c] += w * values[j * channels + c];
                }
            }
        }
        return new ChebyshevSegment(index, mid, half, channels, degree, coef);
    }

    /**
     * Evaluates all channels.
     *
     * @param days TT days from J2000.0, inside the span (or just outside: the polynomial extends smoothly)
     * @param out receives one value per channel
     */
    void evaluate(double days, double[] out) {
        double x = (days - midDays) * invHalfDays;
        double[] a = coef;
        int m = channels;
        for (int c = 0; c < m; c++) {
            out[c] = a[c] + a[m + c] * x;
        }
        double x2 = 2.0 * x;
        double tPrev = 1.0;
        double t = x;
        for (int k = 2, base = 2 * m; k <= degree; k++, base += m) {
            double tNext = x2 * t - tPrev;
            tPrev = t;
            t = tNext;
            for (int c = 0; c < m; c++) {
                out[c] += a[base + c] * t;
            }
        }
    }
}
