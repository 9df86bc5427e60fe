package org.sightwork.celestial.sight;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.time.Instant;
import org.junit.jupiter.api.Test;

/** The order of corrections (validation against the almanac's procedure) and the inverse. */
class AltitudeCorrectorTest {

    private static final Instant T = Instant.parse("2024-06-21T12:00:00Z");
    /** 1e-6′: round-off of the fixed-point inversion. */
    private static final double ROUND_OFF_ARCMIN = 1e-6;

    @Test
    void indexErrorOnTheArcIsSubtractedOffTheArcAdded() {
        // common practice: ON the arc subtract, OFF the arc add
        assertEquals(-1.2, IndexError.onArc(1.2).correctionArcmin(), 0.0, "on the arc");
        assertEquals(0.8, IndexError.offArc(0.8).correctionArcmin(), 0.0, "off the arc");
        assertEquals(-1.2, IndexError.ofSignedReading(1.2).correctionArcmin(), 0.0, "+ reading is on the arc");
        assertThrows(SightException.class, () -> IndexError.onArc(12.0), "over 10' refused");
    }

    @Test
    void starSightSumsIndexDipAndRefraction() {
        Sight s = Sight.builder("Sirius", T, 30.0).indexError(IndexError.onArc(2.0)).eyeHeightM(4.0).build();
        Worksheet w = AltitudeCorrector.correct(s, BodyFigures.STAR);
        // Steps as the almanac orders them: Hs + IE + dip = Ha; Ha + R = Ho (no SD, no parallax)
        assertEquals(30.0 + (-2.0 - 1.76 * 2.0) / 60.0, w.haDeg(), 1e-12, "apparent altitude");
        assertEquals(w.haDeg() + w.refractionArcmin() / 60.0, w.hoDeg(), 1e-12, "Ho of a star");
        assertEquals(Limb.CENTRE, s.limb(), "stars default to centre");
    }

    @Test
    void sunLowerLimbAddsSemiDiameterAndUpperSubtracts() {
        Sight lower = Sight.builder("Sun", T, 40.0).eyeHeightM(2.4).build();
        Sight upper = lower.toBuilder().limb(Limb.UPPER).build();
        BodyFigures sun = BodyFigures.of(0.15, 15.8);
        Worksheet wl = AltitudeCorrector.correct(lower, sun);
        Worksheet wu = AltitudeCorrector.correct(upper, sun);
        assertEquals(Limb.LOWER, lower.limb(), "Sun defaults to lower limb");
        assertEquals(15.8, wl.semiDiameterArcmin(), 0.001, "lower limb: + SD");
        assertEquals(-15.8, wu.semiDiameterArcmin(), 0.001, "upper limb: - SD");
        // Non-regression: the steps add up to the total (the values of each step are validated in
        // CorrectionsTest against handbook values and SPA).
        assertEquals(wl.indexArcmin() + wl.dipArcmin() + wl.refractionArcmin() + wl.semiDiameterArcmin()
                + wl.parallaxArcmin(), wl.totalCorrectionArcmin(), 1e-9, "steps add up, Sun LL 40°");
    }

    @Test
    void artificialHorizonHalvesAfterIndexErrorWithNoDip() {
        Sight s = Sight.builder("Sun", T, 80.0).indexError(IndexError.offArc(2.0)).eyeHeightM(5.0)
                .artificialHorizon(true).build();
        Worksheet w = AltitudeCorrector.correct(s, BodyFigures.of(0.15, 16.0));
        assertEquals(0.0, w.dipArcmin(), 0.0, "no dip with an artificial horizon");
        assertEquals((80.0 + 2.0 / 60.0) / 2.0, w.haDeg(), 1e-12, "halved after the index correction");
        assertEquals(HorizonKind.ARTIFICIAL, w.horizon(), "horizon kind");
    }

    @Test
    void lowAltitudeWarnsAndBelowMinusOneIsRefused() {
        Sight low = Sight.builder("Sun", T, 3.0).eyeHeightM(3.0).build();
        assertFalse(AltitudeCorrector.correct(low, BodyFigures.of(0.15, 16.0)).warnings().isEmpty(), "warned");
        Sight tooLow = Sight.builder("Sun", T, -0.9).eyeHeightM(20.0).build();
        SightException e = assertThrows(SightException.class,
                () -> AltitudeCorrector.correct(tooLow, BodyFigures.of(0.15, 16.0)));
        assertTrue(e.getMessage().contains("below -1°"), e.getMessage());
        assertThrows(SightException.class, () -> Sight.of("Sun", T, 91.0), "Hs above 90° refused");
    }

    @Test
    void reverseCorrectionsReturnTheSextantAltitude() {
        BodyFigures moon = BodyFigures.of(58.0, 15.8).at(45.0, 120.0);
        for (double ho = 2.0; ho < 88.0; ho += 7.3) {
            Sight c = Sight.builder("Moon", T, ho).limb(Limb.UPPER).eyeHeightM(6.0).indexError(IndexError.onArc(1.5))
                    .temperatureC(25).pressureHpa(1000).build();
            double hs = AltitudeCorrector.hsFor(ho, c, moon);
            Sight back = c.toBuilder().build();
            Sight withHs = Sight.builder("Moon", T, hs).limb(Limb.UPPER).eyeHeightM(6.0)
                    .indexError(IndexError.onArc(1.5)).temperatureC(25).pressureHpa(1000).build();
            assertEquals(ho, AltitudeCorrector.correct(withHs, moon).hoDeg(), ROUND_OFF_ARCMIN / 60.0,
                    "Ho round trip at " + ho + "° (" + back.body() + ")");
        }
    }

    @Test
    void watchFastIsTakenOff() {
        Sight s = Sight.builder("Sun", T, 30.0).watchFastSeconds(12.5).build();
        assertEquals(Instant.parse("2024-06-21T11:59:47.500Z"), s.utc(), "UTC = watch - fast");
    }
}
