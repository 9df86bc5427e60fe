package org.sightwork.celestial.time;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.OptionalDouble;

/**
 * Delta T = TT - UT1, for the years before UTC had whole leap seconds (1900-1971) and as observed.
 *
 * <p><b>Method:</b> for 1900-2150 the polynomials of F. Espenak and J. Meeus, <i>Five Millennium
 * Canon of Solar Eclipses: -1999 to +3000</i>, NASA/TP-2006-214141 (2006), section 2.6 ("Polynomial
 * expressions for Delta T"), with the decimal year y = year + (month - 0.5) / 12. Observed monthly
 * values 1973-2023 (IERS / USNO, as shipped in the data of the npm package astronomia 4.2.0) are in
 * the resource {@code deltat-monthly.tsv}.
 *
 * <p><b>Accuracy:</b> the Canon states its expressions follow the observed values to about 1 s
 * over the 20th century; our test compares them with the observed table (1973-2004) and with TT - UTC
 * at 1972-01-01.
 *
 * <p><b>Limits:</b> for the almanac only 1900-1971 uses these values (from 1972 TT comes from UTC
 * and the leap seconds, UT1 from DUT1). A Delta T error of 1 s moves GHA by 0.25'.
 */
public final class DeltaT {

    private static final String TABLE = "/org/sightwork/celestial/almanac/deltat-monthly.tsv";
    private static final int FIRST_YEAR = 1973;
    private static final double[] OBSERVED = loadObserved(); // index (year - 1973) * 12 + month - 1

    private DeltaT() {
    }

    /**
     * Delta T from the Espenak-Meeus polynomials.
     *
     * @param decimalYear year with fraction, 1900 to 2150
     * @return Delta T (seconds)
     * @throws OutOfSpanException outside 1900-2150
     */
    public static double espenakMeeusSeconds(double decimalYear) {
        double y = decimalYear;
        if (!(y >= 1900.0 && y <= 2150.0)) {
            throw new OutOfSpanException("Delta T is modelled for 1900-2150 only, not for the year " + y);
        }
        double t;
        // NASA/TP-2006-214141, section 2.6, the expression for each interval.
        if (y < 1920) {
            t = y - 1900;
            return -2.79 + t * (1.494119 + t * (-0.0598939 + t * (0.0061966 + t * -0.000197)));
        } else if (y < 1941) {
            t = y - 1920;
            return 21.20 + t * (0.84493 + t * (-0.076100 + t * 0.0020936));
        } else if (y < 1961) {
            t = y - 1950;
            return 29.07 + 0.407 * t - t * t / 233.0 + t * t * t / 2547.0;
        } else if (y < 1986) {
            t = y - 1975;
            return 45.45 + 1.067 * t - t * t / 260.0 - t * t * t / 718.0;
        } else if (y < 2005) {
            t = y - 2000;
            return 63.86 + t * (0.3345 + t * (-0.060374 + t * (0.0017275 + t * (0.000651814 + t * 0.00002373599))));
        } else if (y < 2050) {
            t = y - 2000;
            return 62.92 + 0.32217 * t + 0.005589 * t * t;
        } else {
            double u = (y - 1820) / 100.0;
            return -20 + 32 * u * u - 0.5628 * (2150 - y);
        }
    }

    /**
     * The observed monthly value of Delta T, where the table has one (1973-02 to 2023-05).
     *
     * @param year the year
     * @param month the month, 1-12
     * @return Delta T (seconds), or empty outside the table
     */
    public static OptionalDouble observedSeconds(int year, int month) {
        int i = (year - FIRST_YEAR) * 12 + month - 1;
        if (month < 1 || month > 12 || i < 0 || i >= OBSERVED.length || Double.isNaN(OBSERVED[i])) {
            return OptionalDouble.empty();
        }
        return OptionalDouble.of(OBSERVED[i]);
    }

    private static double[] loadObserved() {
        double[] v = new double[(2030 - FIRST_YEAR) * 12];
        java.util.Arrays.fill(v, Double.NaN);
        try (InputStream in = DeltaT.class.getResourceAsStream(TABLE)) {
            if (in == null) {
                throw new IllegalStateException("resource " + TABLE + " is missing from the build");
            }
            BufferedReader r = new BufferedReader(new InputStreamReader(in, StandardCharsets.UTF_8));
            String line;
            int n = 0;
            while ((line = r.readLine()) != null) {
                n++;
                if (line.isBlank() || line.startsWith("#")) {
                    continue;
                }
                String[] f = line.trim().split("\\s+");
                if (f.length < 3) {
                    throw new IllegalStateException(TABLE + " line " + n + ": expected year, month, seconds");
                }
                int i = (Integer.parseInt(f[0]) - FIRST_YEAR) * 12 + Integer.parseInt(f[1]) - 1;
                v[i] = Double.parseDouble(f[2]);
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return v;
    }
}
