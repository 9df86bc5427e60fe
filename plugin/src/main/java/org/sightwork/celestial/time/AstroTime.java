package org.sightwork.celestial.time;

import java.time.Instant;

/**
 * An instant on the time scales a sight needs: UTC as given, UT1 for the Earth's rotation and TT for
 * the ephemerides, as Julian dates.
 *
 * <p><b>Method:</b> from 1972: TAI = UTC + (TAI - UTC) from {@link LeapSeconds} (IERS Bulletin C);
 * TT = TAI + 32.184 s (IAU 1991 Resolution A4, the TT - TAI offset); UT1 = UTC + DUT1, DUT1 given by
 * the user (IERS Bulletin D / time signals; 0 if unknown, then UT1 is in error by up to 0.9 s, i.e.
 * up to 0.225' of GHA). Before 1972 the given time is taken as UT (UT1 = given + DUT1) and TT = UT1 +
 * Delta T from {@link DeltaT#espenakMeeusSeconds} (Espenak and Meeus 2006).
 *
 * <p><b>Accuracy:</b> Julian dates are one double each (resolution about 40 microseconds of time
 * near J2000, 0.0006" of GHA). Before 1972 Delta T is good to about 1 s (0.25' of GHA).
 *
 * <p><b>Limits:</b> 1900-01-01T00:00:00Z to 2100-12-31T23:59:59.999Z; a leap second (23:59:60)
 * cannot be given. {@link #plusSeconds} counts seconds of the UTC label, not of TAI.
 *
 * @param utc the instant (UTC)
 * @param dut1Seconds DUT1 = UT1 - UTC (seconds, [-0.9, 0.9])
 * @param jdUt1 Julian date of UT1 (days)
 * @param jdTt Julian date of TT (days)
 */
public record AstroTime(Instant utc, double dut1Seconds, double jdUt1, double jdTt) {

    /** First instant covered. */
    public static final Instant SPAN_START = Instant.parse("1900-01-01T00:00:00Z");
    /** First instant no longer covered (the span ends 2100-12-31 at midnight). */
    public static final Instant SPAN_END = Instant.parse("2101-01-01T00:00:00Z");
    /** The span in words, for messages. */
    public static final String SPAN_TEXT = "1900-01-01 to 2100-12-31 (UTC)";
    /** Largest |DUT1| allowed (seconds): the IERS keeps UTC within 0.9 s of UT1. */
    public static final double MAX_DUT1_S = 0.9;
    /** TT - TAI (seconds), IAU 1991 Resolution A4 (recommendation IV). */
    public static final double TT_MINUS_TAI_S = 32.184;
    /** Julian date of the Unix epoch 1970-01-01T00:00:00 (days). */
    public static final double JD_UNIX_EPOCH = 2440587.5;
    /** Julian date of J2000.0, 2000-01-01T12:00:00 TT (days). */
    public static final double JD_J2000 = 2451545.0;
    private static final double DAY_S = 86400.0;

    /**
     * Checks the values.
     *
     * @throws IllegalArgumentException if one is missing, not finite or out of range
     */
    public AstroTime {
        if (utc == null) {
            throw new IllegalArgumentException("the instant (UTC) is missing");
        }
        checkSpan(utc);
        checkDut1(dut1Seconds);
        if (!Double.isFinite(jdUt1) || !Double.isFinite(jdTt)) {
            throw new IllegalArgumentException("Julian dates must be finite: jdUt1 " + jdUt1 + ", jdTt " + jdTt);
        }
    }

    /**
     * The instant with DUT1 = 0.
     *
     * @param utc the instant (UTC)
     * @return the time scales
     * @throws OutOfSpanException outside {@link #SPAN_TEXT}
     */
    public static AstroTime ofUtc(Instant utc) {
        return ofUtc(utc, 0.0);
    }

    /**
     * The instant with the given DUT1.
     *
     * @param utc the instant (UTC)
     * @param dut1Seconds DUT1 = UT1 - UTC (seconds, [-0.9, 0.9])
     * @return the time scales
     * @throws OutOfSpanException outside {@link #SPAN_TEXT}
     * @throws IllegalArgumentException if |DUT1| is over 0.9 s
     */
    public static AstroTime ofUtc(Instant utc, double dut1Seconds) {
        if (utc == null) {
            throw new IllegalArgumentException("the instant (UTC) is missing");
        }
        checkSpan(utc);
        checkDut1(dut1Seconds);
        double jdUtc = JD_UNIX_EPOCH + (utc.getEpochSecond() + utc.getNano() * 1e-9) / DAY_S;
        double jdUt1 = jdUtc + dut1Seconds / DAY_S;
        double jdTt;
        if (utc.isBefore(LeapSeconds.START)) {
            jdTt = jdUt1 + DeltaT.espenakMeeusSeconds(decimalYear(jdUt1)) / DAY_S;
        } else {
            jdTt = jdUtc + (LeapSeconds.taiMinusUtcSeconds(utc) + TT_MINUS_TAI_S) / DAY_S;
        }
        return new AstroTime(utc, dut1Seconds, jdUt1, jdTt);
    }

    /**
     * Delta T = TT - UT1.
     *
     * @return Delta T (seconds)
     */
    public double deltaTSeconds() {
        return (jdTt - jdUt1) * DAY_S;
    }

    /**
     * The instant some seconds later (of the UTC label), same DUT1.
     *
     * @param s seconds to add (negative for earlier)
     * @return the later instant
     * @throws OutOfSpanException if the result leaves the span
     */
    public AstroTime plusSeconds(double s) {
        long nanos = Math.round(s * 1e9);
        return ofUtc(utc.plusNanos(nanos), dut1Seconds);
    }

    /**
     * Julian centuries of TT from J2000.0.
     *
     * @return T (Julian centuries)
     */
    public double centuriesTt() {
        return (jdTt - JD_J2000) / 36525.0;
    }

    private static double decimalYear(double jd) {
        return 2000.0 + (jd - JD_J2000) / 365.25;
    }

    private static void checkSpan(Instant utc) {
        if (utc.isBefore(SPAN_START) || !utc.isBefore(SPAN_END)) {
            throw new OutOfSpanException("the instant " + utc + " is outside the almanac's span " + SPAN_TEXT);
        }
    }

    private static void checkDut1(double dut1Seconds) {
        if (!(Math.abs(dut1Seconds) <= MAX_DUT1_S)) {
            throw new IllegalArgumentException("DUT1 (" + dut1Seconds + " s) is beyond the " + MAX_DUT1_S
                    + " s the IERS keeps UTC within UT1");
        }
    }
}
