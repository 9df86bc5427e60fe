package org.sightwork.celestial.almanac;

import java.util.ArrayList;
import java.util.List;

/**
 * The Moon's geocentric position from the ELP/MPP02 lunar solution (fit to DE405).
 *
 * <p><b>Method:</b> J. Chapront and G. Francou (2003), "The lunar theory ELP revisited. Introduction
 * of new planetary perturbations", Astron. Astrophys. 404, 735. Longitude = W1(T) + sum_n T^n sum_i
 * A_i sin(t0 + t1 T + t2 T^2 + t3 T^3 + t4 T^4) (arcsec), the same form for latitude (arcsec) and
 * distance (km), T in Julian centuries of TDB from J2000.0. The series are as truncated in the data
 * of the npm package astronomia 4.2.0. They refer to the mean ecliptic of date and the departure
 * point of J2000 (the theory's inertial frame); Laskar's P and Q (the same paper, and J. Laskar 1986)
 * turn them into the mean ecliptic and equinox of J2000, which is how Chapront and Francou's own
 * program gives rectangular J2000 coordinates.
 *
 * <p><b>Truncation:</b> a term is dropped when A T_max^n is below the threshold, T_max = 1.01
 * centuries; the thresholds and measured errors are in {@link Almanac}.
 *
 * <p><b>Thread safety:</b> immutable after construction.
 */
final class ElpMpp02 {

    /** Largest |T| of the span (Julian centuries). */
    static final double T_MAX_CENTURIES = 1.01;
    private static final double ARCSEC = Math.PI / (180.0 * 3600.0);

    private final double[] w1 = new double[5];
    private final double[][] amp = new double[3][];
    private final double[][][] arg = new double[3][][]; // [var][k][0..4]
    private final int[][] start = new int[3][];
    private final int terms;

    /**
     * Loads the series.
     *
     * @param angleThresholdArcsec drop L and B terms below this (arcsec); 0 keeps all
     * @param distanceThresholdKm drop R terms below this (km); 0 keeps all
     */
    ElpMpp02(double angleThresholdArcsec, double distanceThresholdKm) {
        List<List<List<double[]>>> byVar = new ArrayList<>();
        for (int v = 0; v < 3; v++) {
            List<List<double[]>> powers = new ArrayList<>();
            for (int p = 0; p < 4; p++) {
                powers.add(new ArrayList<>());
            }
            byVar.add(powers);
        }
        for (String[] f : SeriesFiles.rows("elpmpp02-de405.tsv")) {
            if (f[0].equals("W1")) {
                for (int i = 0; i < 5; i++) {
                    w1[i] = Double.parseDouble(f[i + 1]);
                }
                continue;
            }
            int v = "LBR".indexOf(f[0]);
            int p = Integer.parseInt(f[1]);
            if (v < 0 || p > 3 || f.length < 8) {
                throw new IllegalStateException("elpmpp02-de405.tsv: unexpected row " + String.join(" ", f));
            }
            double a = Double.parseDouble(f[2]);
            double threshold = v == 2 ? distanceThresholdKm : angleThresholdArcsec;
            if (Math.abs(a) * Math.pow(T_MAX_CENTURIES, p) < threshold) {
                continue;
            }
            double[] row = new double[6];
            row[0] = a;
            for (int i = 0; i < 5; i++) {
                row[i + 1] = Double.parseDouble(f[i + 3]);
            }
            byVar.get(v).get(p).add(row);
        }
        int n = 0;
        for (int v = 0; v < 3; v++) {
            List<List<double[]>> powers = byVar.get(v);
            int count = powers.stream().mapToInt(List::size).sum();
            amp[v] = new double[count];
            arg[v] = new double[count][5];
            start[v] = new int[5];
            int k = 0;
            for (int p = 0; p < 4; p++) {
                start[v][p] = k;
                for (double[] t : powers.get(p)) {
                    amp[v][k] = t[0];
                    System.arraycopy(t, 1, arg[v][k], 0, 5);
                    k++;
                }
            }
            start[v][4] = k;
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
     * Longitude, latitude and distance in the theory's frame (mean ecliptic of date, departure point
     * of J2000).
     *
     * @param tc Julian centuries of TT from J2000.0
     * @param out receives L (rad), B (rad), R (km)
     */
    void lbr(double tc, double[] out) {
        double t2 = tc * tc;
        double t3 = t2 * tc;
        double t4 = t3 * tc;
        for (int v = 0; v < 3; v++) {
            double[] av = amp[v];
            double[][] gv = arg[v];
            int[] sv = start[v];
            double sum = 0;
            double tn = 1;
            for (int p = 0; p < 4; p++) {
                double s = 0;
                for (int i = sv[p], e = sv[p + 1]; i < e; i++) {
                    double[] g = gv[i];
                    s += av[i] * Math.sin(g[0] + g[1] * tc + g[2] * t2 + g[3] * t3 + g[4] * t4);
                }
                sum += s * tn;
                tn *= tc;
            }
            out[v] = sum;
        }
        out[0] = w1[0] + w1[1] * tc + w1[2] * t2 + w1[3] * t3 + w1[4] * t4 + out[0] * ARCSEC;
        out[1] = out[1] * ARCSEC;
    }

    /**
     * Geocentric rectangular coordinates referred to the mean ecliptic and equinox of J2000.
     *
     * @param tc Julian centuries of TT from J2000.0
     * @param xyz receives x, y, z (km)
     */
    void eclipticJ2000(double tc, double[] xyz) {
        double[] lbr = new double[3];
        lbr(tc, lbr);
        double cb = Math.cos(lbr[1]);
        double x1 = lbr[2] * cb * Math.cos(lbr[0]);
        double x2 = lbr[2] * cb * Math.sin(lbr[0]);
        double x3 = lbr[2] * Math.sin(lbr[1]);
        // Laskar's P, Q (Chapront and Francou 2003; the ELP/MPP02 program's rotation to J2000).
        double pw = (1.0180391e-5 + (4.7020439e-7 + (-5.417367e-10 + (-2.507948e-12 + 4.63486e-15 * tc) * tc) * tc) * tc) * tc;
        double qw = (-1.13469002e-4 + (1.2372674e-7 + (1.265417e-9 + (-1.371808e-12 - 3.20334e-15 * tc) * tc) * tc) * tc) * tc;
        double ra = 2.0 * Math.sqrt(1.0 - pw * pw - qw * qw);
        double pwqw = 2.0 * pw * qw;
        double pw2 = 1.0 - 2.0 * pw * pw;
        double qw2 = 1.0 - 2.0 * qw * qw;
        pw *= ra;
        qw *= ra;
        xyz[0] = pw2 * x1 + pwqw * x2 + pw * x3;
        xyz[1] = pwqw * x1 + qw2 * x2 - qw * x3;
        xyz[2] = -pw * x1 + qw * x2 + (pw2 + qw2 - 1.0) * x3;
    }
}
