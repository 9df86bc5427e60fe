package org.sightwork.celestial.almanac;

import java.util.ArrayList;
import java.util.List;

/**
 * One planet's VSOP87D series: heliocentric ecliptic spherical coordinates referred to the mean
 * ecliptic and equinox of date.
 *
 * <p><b>Method:</b> P. Bretagnon and G. Francou (1988), "Planetary theories in rectangular and
 * spherical variables: VSOP87 solutions", Astron. Astrophys. 202, 309; version D. value =
 * sum_n t^n sum_i A_i cos(B_i + C_i t), t in Julian millennia of TDB (here TT; TDB - TT is under
 * 2 ms) from J2000.0. Coefficients from the data of the npm package astronomia 4.2.0.
 *
 * <p><b>Truncation:</b> a term is dropped when A t_max^n is below the threshold, with
 * t_max = 0.101 millennia (the span 1900-2100). The thresholds used and the error they cause,
 * measured against the full series over 1950-2050, are in {@link Almanac} and
 * {@code docs/METHOD-ALMANAC.md}.
 *
 * <p><b>Thread safety:</b> immutable after construction.
 */
final class Vsop87 {

    /** Largest |t| of the span (Julian millennia). */
    static final double T_MAX_MILLENNIA = 0.101;

    /** Per variable (L, B, R): flattened A, B, C and the first index of each power. */
    private final double[][] a = new double[3][];
    private final double[][] b = new double[3][];
    private final double[][] c = new double[3][];
    private final int[][] start = new int[3][];
    private final int terms;

    /**
     * Loads a series.
     *
     * @param planet resource name part ("earth", "venus" ...)
     * @param angleThresholdRad drop L and B terms below this (radians); 0 keeps all
     * @param radiusThresholdAu drop R terms below this (au); 0 keeps all
     */
    Vsop87(String planet, double angleThresholdRad, double radiusThresholdAu) {
        List<List<List<double[]>>> byVar = new ArrayList<>();
        for (int v = 0; v < 3; v++) {
            List<List<double[]>> powers = new ArrayList<>();
            for (int p = 0; p < 6; p++) {
                powers.add(new ArrayList<>());
            }
            byVar.add(powers);
        }
        for (String[] f : SeriesFiles.rows("vsop87d-" + planet + ".tsv")) {
            int v = "LBR".indexOf(f[0]);
            int p = Integer.parseInt(f[1]);
            double amp = Double.parseDouble(f[2]);
            double threshold = v == 2 ? radiusThresholdAu : angleThresholdRad;
            if (v < 0 || p > 5) {
                throw new IllegalStateException("vsop87d-" + planet + ".tsv: unexpected row " + String.join(" ", f));
            }
            if (Math.abs(amp) * Math.pow(T_MAX_MILLENNIA, p) < threshold) {
                continue;
            }
            byVar.get(v).get(p).add(new double[] {amp, Double.parseDouble(f[3]), Double.parseDouble(f[4])});
        }
        int n = 0;
        for (int v = 0; v < 3; v++) {
            List<List<double[]>> powers = byVar.get(v);
            int count = powers.stream().mapToInt(List::size).sum();
            a[v] = new double[count];
            b[v] = new double[count];
            c[v] = new double[count];
            start[v] = new int[7];
            int k = 0;
            for (int p = 0; p < 6; p++) {
                start[v][p] = k;
                for (double[] t : powers.get(p)) {
                    a[v][k] = t[0];
                    b[v][k] = t[1];
                    c[v][k] = t[2];
                    k++;
                }
            }
            start[v][6] = k;
            n += count;
        }
        terms = n;
    }

    /**
     * Number of terms kept.
     *
     * @return terms
     */
    int terms() {
        return terms;
    }

    /**
     * Evaluates L, B, R.
     *
     * @param t Julian millennia of TT from J2000.0
     * @param out receives L (rad), B (rad), R (au) at 0, 1, 2
     */
    void lbr(double t, double[] out) {
        for (int v = 0; v < 3; v++) {
            double[] av = a[v];
            double[] bv = b[v];
            double[] cv = c[v];
            int[] sv = start[v];
            double sum = 0;
            double tn = 1;
            for (int p = 0; p < 6; p++) {
                double s = 0;
                for (int i = sv[p], e = sv[p + 1]; i < e; i++) {
                    s += av[i] * Math.cos(bv[i] + cv[i] * t);
                }
                sum += s * tn;
                tn *= t;
            }
            out[v] = sum;
        }
    }

    /**
     * Evaluates L, B, R and their rates.
     *
     * @param t Julian millennia of TT from J2000.0
     * @param out receives L, B (rad), R (au) at 0..2 and their rates per Julian millennium at 3..5
     */
    void lbrWithRates(double t, double[] out) {
        for (int v = 0; v < 3; v++) {
            double[] av = a[v];
            double[] bv = b[v];
            double[] cv = c[v];
            int[] sv = start[v];
            double sum = 0;
            double rate = 0;
            double tn = 1;
            double tnm1 = 0; // t^(p-1), 0 for p = 0
            for (int p = 0; p < 6; p++) {
                double s = 0;
                double ds = 0;
                for (int i = sv[p], e = sv[p + 1]; i < e; i++) {
                    double arg = bv[i] + cv[i] * t;
                    s += av[i] * Math.cos(arg);
                    ds -= av[i] * cv[i] * Math.sin(arg);
                }
                sum += s * tn;
                rate += ds * tn + p * s * tnm1;
                tnm1 = tn;
                tn *= t;
            }
            out[v] = sum;
            out[v + 3] = rate;
        }
    }
}
