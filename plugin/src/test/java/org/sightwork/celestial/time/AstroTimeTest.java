package org.sightwork.celestial.time;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.time.Instant;
import java.time.LocalDate;
import java.time.ZoneOffset;
import org.jastronomy.jsofa.JSOFA;
import org.junit.jupiter.api.Test;

/** Validation of the time scales against IERS facts, SOFA (jsofa) and the observed Delta T table. */
class AstroTimeTest {

    /** 1 microsecond: Julian dates are doubles with a resolution of about 40 us near J2000. */
    private static final double JD_TOL_S = 1e-4;

    @Test
    void ttMinusUtcIs69point184SecondsSince2017() {
        // Fact of the trade (REFERENCES.md): TAI - UTC = 37 s since 2017-01-01 (IERS Bulletin C),
        // TT = TAI + 32.184 s.
        AstroTime t = AstroTime.ofUtc(Instant.parse("2026-03-20T18:30:00Z"));
        assertEquals(69.184, t.deltaTSeconds(), JD_TOL_S, "TT - UT1 with DUT1 = 0");
        assertEquals(37, LeapSeconds.taiMinusUtcSeconds(t.utc()), "TAI - UTC");
    }

    @Test
    void leapSecondAtTheEndOf2016() {
        // IERS Bulletin C 52: a positive leap second at the end of 2016 December; TAI - UTC 36 s -> 37 s.
        AstroTime before = AstroTime.ofUtc(Instant.parse("2016-12-31T23:59:59Z"));
        AstroTime after = AstroTime.ofUtc(Instant.parse("2017-01-01T00:00:00Z"));
        assertEquals(36, LeapSeconds.taiMinusUtcSeconds(before.utc()), "TAI - UTC before");
        assertEquals(37, LeapSeconds.taiMinusUtcSeconds(after.utc()), "TAI - UTC after");
        // One second of UTC label, two seconds of TT: 23:59:60 lies between.
        assertEquals(2.0, (after.jdTt() - before.jdTt()) * 86400.0, JD_TOL_S, "TT elapsed across the leap second");
        assertEquals(1.0, (after.jdUt1() - before.jdUt1()) * 86400.0, JD_TOL_S, "UT1 elapsed (DUT1 = 0)");
    }

    @Test
    void leapSecondTableAgreesWithSofaEveryDay() {
        // Reference: SOFA iauDat (jsofa 20210512), which carries the same IERS table.
        LocalDate d = LocalDate.of(1972, 1, 1);
        while (d.isBefore(LocalDate.of(2021, 1, 1))) {
            Instant noon = d.atStartOfDay(ZoneOffset.UTC).toInstant().plusSeconds(43200);
            double sofa = callDat(d);
            assertEquals(sofa, LeapSeconds.taiMinusUtcSeconds(noon), 0.0, "TAI - UTC on " + d);
            d = d.plusDays(1);
        }
        assertEquals(28, LeapSeconds.entries(), "entries 1972-2017 (10 s, then 27 leap seconds)");
    }

    private static double callDat(LocalDate d) {
        try {
            return JSOFA.jauDat(d.getYear(), d.getMonthValue(), d.getDayOfMonth(), 0.5);
        } catch (Exception e) {
            throw new AssertionError("jauDat failed on " + d, e);
        }
    }

    @Test
    void dut1IsAddedToUt1AndRefusedBeyond0point9Seconds() {
        Instant i = Instant.parse("2024-06-01T00:00:00Z");
        AstroTime t = AstroTime.ofUtc(i, 0.3);
        assertEquals(0.3, (t.jdUt1() - AstroTime.ofUtc(i).jdUt1()) * 86400.0, JD_TOL_S, "UT1 - UTC");
        assertEquals(69.184 - 0.3, t.deltaTSeconds(), JD_TOL_S, "TT - UT1");
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> AstroTime.ofUtc(i, 0.95));
        assertTrue(e.getMessage().contains("0.9"), e.getMessage());
        assertThrows(IllegalArgumentException.class, () -> AstroTime.ofUtc(i, Double.NaN));
        assertEquals(-0.9, AstroTime.ofUtc(i, -0.9).dut1Seconds(), 0.0, "the limit itself is allowed");
    }

    @Test
    void outsideTheSpanNamesTheSpan() {
        OutOfSpanException e = assertThrows(OutOfSpanException.class,
                () -> AstroTime.ofUtc(Instant.parse("1899-12-31T23:59:59Z")));
        assertTrue(e.getMessage().contains("1900-01-01 to 2100-12-31"), e.getMessage());
        assertThrows(OutOfSpanException.class, () -> AstroTime.ofUtc(Instant.parse("2101-01-01T00:00:00Z")));
        AstroTime.ofUtc(Instant.parse("2100-12-31T23:59:59Z"));
        AstroTime.ofUtc(Instant.parse("1900-01-01T00:00:00Z"));
    }

    @Test
    void observedDeltaTAgreesWithTheLeapSecondsWithinDut1() {
        // Reference: observed Delta T (IERS/USNO monthly values). Since 1972 the IERS keeps
        // |UT1 - UTC| < 0.9 s, so Delta T_obs - (32.184 s + TAI - UTC) must stay within 0.9 s.
        int n = 0;
        for (int y = 1973; y <= 2023; y++) {
            for (int m = 1; m <= 12; m++) {
                var obs = DeltaT.observedSeconds(y, m);
                if (obs.isEmpty()) {
                    continue;
                }
                Instant i = LocalDate.of(y, m, 1).atStartOfDay(ZoneOffset.UTC).toInstant().plusSeconds(86400);
                double ttMinusUtc = 32.184 + LeapSeconds.taiMinusUtcSeconds(i);
                assertEquals(ttMinusUtc, obs.getAsDouble(), 0.9 + 0.05, "Delta T vs TT - UTC, " + y + "-" + m);
                n++;
            }
        }
        assertTrue(n > 600, "months compared: " + n);
    }

    @Test
    void espenakMeeusPolynomialsFollowTheObservedValues() {
        // Reference: observed Delta T 1973-2004 (IERS/USNO); the Canon's expressions were fitted to
        // such values; allow 1 s (the Canon's own stated spread for the 20th century).
        for (int y = 1973; y <= 2004; y++) {
            for (int m = 1; m <= 12; m += 3) {
                var obs = DeltaT.observedSeconds(y, m);
                if (obs.isPresent()) {
                    assertEquals(obs.getAsDouble(), DeltaT.espenakMeeusSeconds(y + (m - 0.5) / 12.0), 1.0,
                            "Delta T " + y + "-" + m);
                }
            }
        }
    }

    @Test
    void before1972TheTimeIsUtPlusDeltaTAndJoinsTheLeapSeconds() {
        // At 1972-01-01 TT - UTC = 42.184 s (IERS: TAI - UTC = 10 s); the polynomial for the day
        // before must agree within DUT1 (0.9 s).
        AstroTime before = AstroTime.ofUtc(Instant.parse("1971-12-31T23:59:59Z"));
        AstroTime after = AstroTime.ofUtc(Instant.parse("1972-01-01T00:00:00Z"));
        assertEquals(42.184, after.deltaTSeconds(), JD_TOL_S, "TT - UTC at 1972-01-01");
        assertEquals(42.184, before.deltaTSeconds(), 0.9, "Delta T from the polynomial, end of 1971");
        // Espenak and Meeus (2006), the 1941-1961 expression at 1950.0: 29.07 s (its constant term).
        assertEquals(29.07, DeltaT.espenakMeeusSeconds(1950.0), 1e-9, "Delta T 1950.0");
    }

    @Test
    void plusSecondsMovesTheUtcLabel() {
        AstroTime t = AstroTime.ofUtc(Instant.parse("2024-06-01T00:00:00Z"), 0.2);
        AstroTime u = t.plusSeconds(3600.5);
        assertEquals(Instant.parse("2024-06-01T01:00:00.500Z"), u.utc(), "UTC");
        assertEquals(0.2, u.dut1Seconds(), 0.0, "DUT1 kept");
    }
}
