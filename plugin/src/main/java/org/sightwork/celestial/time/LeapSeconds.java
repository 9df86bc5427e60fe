package org.sightwork.celestial.time;

import java.time.Instant;
import java.time.LocalDate;
import java.time.ZoneOffset;

/**
 * TAI - UTC since 1972, whole seconds, from the leap-second table of the IERS.
 *
 * <p><b>Method:</b> table look-up. Source: IERS Earth Orientation Centre, Bulletin C (the
 * "Leap_Second.dat" history): TAI - UTC = 10 s from 1972-01-01, then one second more at each date
 * below, 37 s since 2017-01-01. No future leap second is assumed: after the last entry the last
 * value holds (Bulletin C 70, July 2025, announced none for the end of 2025; a later bulletin may
 * add one, and then this table must be extended).
 *
 * <p><b>Limits:</b> before 1972 UTC had fractional "rubber" seconds; they are not modelled, the
 * time is then taken as UT (see {@link AstroTime}). An instant inside a leap second (23:59:60) has no
 * {@link Instant}; 23:59:59 is the last second before the step.
 *
 * <p><b>Thread safety:</b> immutable.
 */
public final class LeapSeconds {

    /** First day of the leap-second era, 1972-01-01T00:00:00Z. */
    public static final Instant START = Instant.parse("1972-01-01T00:00:00Z");

    /** The dates from which TAI - UTC took the next whole second (10 s at the first). */
    private static final String[] STEPS = {
        "1972-01-01", "1972-07-01", "1973-01-01", "1974-01-01", "1975-01-01", "1976-01-01",
        "1977-01-01", "1978-01-01", "1979-01-01", "1980-01-01", "1981-07-01", "1982-07-01",
        "1983-07-01", "1985-07-01", "1988-01-01", "1990-01-01", "1991-01-01", "1992-07-01",
        "1993-07-01", "1994-07-01", "1996-01-01", "1997-07-01", "1999-01-01", "2006-01-01",
        "2009-01-01", "2012-07-01", "2015-07-01", "2017-01-01",
    };
    private static final int FIRST_VALUE_S = 10;
    private static final long[] STEP_EPOCH_S = new long[STEPS.length];

    static {
        for (int i = 0; i < STEPS.length; i++) {
            STEP_EPOCH_S[i] = LocalDate.parse(STEPS[i]).atStartOfDay(ZoneOffset.UTC).toEpochSecond();
        }
    }

    private LeapSeconds() {
    }

    /**
     * TAI - UTC at an instant of 1972 or later.
     *
     * @param utc the instant (UTC), not before {@link #START}
     * @return TAI - UTC (seconds, whole)
     * @throws IllegalArgumentException before 1972
     */
    public static int taiMinusUtcSeconds(Instant utc) {
        long s = utc.getEpochSecond();
        if (s < STEP_EPOCH_S[0]) {
            throw new IllegalArgumentException("TAI - UTC is tabulated from 1972-01-01 only, not for " + utc);
        }
        int lo = 0;
        int hi = STEP_EPOCH_S.length - 1;
        while (lo < hi) {
            int mid = (lo + hi + 1) >>> 1;
            if (STEP_EPOCH_S[mid] <= s) {
                lo = mid;
            } else {
                hi = mid - 1;
            }
        }
        return FIRST_VALUE_S + lo;
    }

    /**
     * The number of leap-second steps in the table (28 from 1972 to 2017, the first being the
     * initial 10 s offset).
     *
     * @return number of entries
     */
    public static int entries() {
        return STEPS.length;
    }
}
