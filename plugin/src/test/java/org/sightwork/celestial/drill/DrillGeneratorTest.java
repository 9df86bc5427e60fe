package org.sightwork.celestial.drill;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.time.ZoneOffset;
import net.e175.klaus.solarpositioning.SPA;
import org.junit.jupiter.api.Test;
import org.sightwork.celestial.almanac.Almanac;
import org.sightwork.celestial.almanac.Body;
import org.sightwork.celestial.reduction.SightReduction;
import org.sightwork.celestial.time.AstroTime;
import org.sightwork.geo.earth.GeoPosition;

/**
 * The generator: sights physically right, reducing back to the truth; impossible sights refused.
 * Validation tests (an outside reference or a property of the method) unless marked otherwise.
 */
class DrillGeneratorTest {

    private static final Almanac ALMANAC = Almanac.standard();
    /** 0.01 nm: the brief's bound for a perfect observer (one hundredth of a minute of arc). */
    private static final double PERFECT_FIX_NM = 0.01;
    /** Half the sextant's 0.1′ step: the rounding of a written reading. */
    private static final double HALF_STEP_ARCMIN = 0.05;

    private static DrillPack make(String json, long seed) {
        return DrillGenerator.generate(ScenarioReader.parse(json, "test.json"), seed, ALMANAC);
    }

    @Test
    void perfectObserverSightsReduceBackToTheTruth() {
        DrillPack p = make(Scenarios.passage(Scenarios.PERFECT, "{\"setDeg\": 0, \"driftKn\": 0}",
                Scenarios.eveningStars("evening", "Vega", "Spica", "Regulus"), Scenarios.FINE_LOG), 1);
        for (AnswerKey.SightKey s : p.key().sights()) {
            // Each Ho, worked from the written Hs, equals the exact altitude at the true position.
            GeoPosition truth = GeoPosition.of(s.truePosition().latDeg(), s.truePosition().lonDeg());
            var pos = ALMANAC.position(ALMANAC.body(s.body()), AstroTime.ofUtc(s.trueUtc()));
            double hcTrue = SightReduction.reduce(truth, pos.ghaDeg(), pos.decDeg()).hcDeg();
            assertEquals(hcTrue, s.hoDeg(), 1e-6 / 60, "sight " + s.number() + ": Ho = Hc at the truth (1e-6′)");
        }
        AnswerKey.FixKey f = p.key().fixes().get(0);
        assertEquals(0.0, f.fixErrorNm(), PERFECT_FIX_NM, "three-star fix of a perfect observer vs the truth");
    }

    @Test
    void noisySightsCarryExactlyTheDrawnErrorAndTheFixStaysWithinAFewSigma() {
        String observer = "{\"sextantSigmaArcmin\": 0.7, \"indexErrorArcmin\": 2.0, \"eyeHeightM\": 2.5,"
                + " \"watchErrorS\": 12}";
        DrillPack p = make(Scenarios.passage(observer, "{\"setDeg\": 0, \"driftKn\": 0}",
                Scenarios.eveningStars("evening", "Vega", "Spica", "Regulus"), Scenarios.FINE_LOG), 99);
        for (AnswerKey.SightKey s : p.key().sights()) {
            GeoPosition truth = GeoPosition.of(s.truePosition().latDeg(), s.truePosition().lonDeg());
            var pos = ALMANAC.position(ALMANAC.body(s.body()), AstroTime.ofUtc(s.trueUtc()));
            double hcTrue = SightReduction.reduce(truth, pos.ghaDeg(), pos.decDeg()).hcDeg();
            // Ho - Hc(truth) is the observer's random error, up to the rounding of the reading.
            assertEquals(s.randomErrorArcmin(), (s.hoDeg() - hcTrue) * 60, HALF_STEP_ARCMIN + 1e-6,
                    "sight " + s.number() + ": the error in Ho is the drawn error");
            assertEquals(s.trueUtc(), s.utcAsWorked(), "the watch error, applied, gives the true time");
        }
        // 3 sigma of the radial error of a 3-star fix: HDOP <= 1.3 for these azimuths (67°, 193°, 260°),
        // 0.7′ per line: 3 x 1.3 x 0.7 = 2.7 nm.
        assertTrue(p.key().fixes().get(0).fixErrorNm() < 2.7, "fix within 3 sigma: " + p.key().fixes().get(0));
    }

    @Test
    void observerErrorsHaveTheStatedSpread() {
        // Property of the normal deviate: mean 0, standard deviation sigma. 20,000 draws: the mean's
        // standard error is 0.7/sqrt(20000) = 0.005′ (4 of them: 0.02′), the sd's 0.7/sqrt(40000) = 0.0035′.
        ObserverErrors e = new ObserverErrors(12345L, 0.7);
        double s = 0;
        double s2 = 0;
        int n = 20_000;
        for (int i = 0; i < n; i++) {
            double x = e.nextAltitudeErrorArcmin();
            s += x;
            s2 += x * x;
        }
        double mean = s / n;
        assertEquals(0.0, mean, 0.02, "mean of the errors (4 standard errors)");
        assertEquals(0.7, Math.sqrt(s2 / n - mean * mean), 0.014, "standard deviation (4 standard errors)");
    }

    @Test
    void theSunSightAgreesWithTheNrelSolarPositionAlgorithm() {
        // Outside reference: NREL SPA (Reda & Andreas 2004, +/-0.0003°) gives the Sun's topocentric
        // apparent (refracted) altitude of its centre at the true position. A perfect observer's Hs of
        // the lower limb is that, less the semi-diameter, plus the dip 1.76′ x sqrt(h) (from memory,
        // REFERENCES.md). Tolerance 0.2′: the almanac's Sun (0.1′) plus the difference of two refraction
        // formulas at 30°-50° altitude (under 0.05′) plus the SD's augmentation (under 0.01′).
        String sights = "[{\"utc\": \"2026-06-21T19:00:00Z\", \"body\": \"Sun\", \"limb\": \"lower\", \"session\": \"s\"}]";
        String observer = "{\"sextantSigmaArcmin\": 0, \"indexErrorArcmin\": 0, \"eyeHeightM\": 4.0,"
                + " \"watchErrorS\": 0, \"sextantResolutionArcmin\": 0, \"watchResolutionS\": 0,"
                + " \"temperatureC\": 18, \"pressureHpa\": 1015}";
        DrillPack p = make(Scenarios.passage(observer, "{\"setDeg\": 90, \"driftKn\": 0.5}", sights, "{}"), 5);
        LoggedSight s = p.sights().get(0);
        double apparentCentre = 90.0 - SPA.calculateSolarPosition(s.trueUtc().atZone(ZoneOffset.UTC),
                s.truePosition().latDeg(), s.truePosition().lonDeg(), 0.0, 69.0, 1015, 18).zenithAngle();
        double sd = ALMANAC.position(Body.SUN, AstroTime.ofUtc(s.trueUtc())).sdArcmin().getAsDouble();
        double expectedHs = apparentCentre - sd / 60.0 + 1.76 * Math.sqrt(4.0) / 60.0;
        assertEquals(expectedHs * 60, s.hsDeg() * 60, 0.2, "Hs of the Sun's lower limb (minutes)");
    }

    @Test
    void aStarInDaylightIsRefusedWithTheTwilightBand() {
        String sights = "[{\"utc\": \"2026-06-21T19:00:00Z\", \"body\": \"Jupiter\", \"session\": \"s\"}]";
        DrillException e = assertThrows(DrillException.class, () -> make(Scenarios.passage(Scenarios.PERFECT,
                "{\"setDeg\": 0, \"driftKn\": 0}", sights, "{}"), 1));
        assertTrue(e.getMessage().contains("sight 1 (Jupiter") && e.getMessage().contains("between -3° and -10°"),
                e.getMessage());
    }

    @Test
    void theSunAtNightAndAStarBelowTheHorizonAreRefused() {
        String sights = "[{\"utc\": \"2026-06-21T23:30:00Z\", \"body\": \"Sun\", \"session\": \"a\"},"
                + "{\"utc\": \"2026-06-21T22:00:00Z\", \"body\": \"Sirius\", \"session\": \"b\"}]";
        DrillException e = assertThrows(DrillException.class, () -> make(Scenarios.passage(Scenarios.PERFECT,
                "{\"setDeg\": 0, \"driftKn\": 0}", sights, "{}"), 1));
        assertEquals(2, e.problems().size(), e.getMessage());
        assertTrue(e.problems().stream().allMatch(m -> m.contains("below the horizon")), e.getMessage());
    }

    @Test
    void aSightOutsideThePassageAndAnUnknownBodyAreRefused() {
        String sights = "[{\"utc\": \"2026-06-20T22:00:00Z\", \"body\": \"Vega\", \"session\": \"a\"},"
                + "{\"utc\": \"2026-06-21T22:00:00Z\", \"body\": \"Vegaa\", \"session\": \"b\"}]";
        DrillException e = assertThrows(DrillException.class, () -> make(Scenarios.passage(Scenarios.PERFECT,
                "{\"setDeg\": 0, \"driftKn\": 0}", sights, "{}"), 1));
        assertTrue(e.getMessage().contains("sights[1].body"), e.getMessage());
    }

    @Test
    void twoLinesFromTheSameStarGiveNoFixAndAreRefused() {
        String sights = "[{\"utc\": \"2026-06-21T22:00:00Z\", \"body\": \"Vega\", \"session\": \"a\"},"
                + "{\"utc\": \"2026-06-21T22:01:00Z\", \"body\": \"Vega\", \"session\": \"a\"}]";
        DrillException e = assertThrows(DrillException.class, () -> make(Scenarios.passage(Scenarios.PERFECT,
                "{\"setDeg\": 0, \"driftKn\": 0}", sights, "{}"), 1));
        assertTrue(e.getMessage().startsWith("fix 'a'"), e.getMessage());
    }

    @Test
    void theSkyRulesHoldAtTheirEdges() {
        // The band of the brief: Sun between -3° and -10° for stars and planets; altitudes 10°-80°.
        Body vega = ALMANAC.body("Vega");
        assertTrue(DrillGenerator.skyRule(vega, 30, -2.9).isPresent(), "star with the Sun at -2.9°");
        assertFalse(DrillGenerator.skyRule(vega, 30, -3.1).isPresent(), "star with the Sun at -3.1°");
        assertFalse(DrillGenerator.skyRule(vega, 30, -9.9).isPresent(), "star with the Sun at -9.9°");
        assertTrue(DrillGenerator.skyRule(vega, 30, -10.1).isPresent(), "star with the Sun at -10.1°");
        assertTrue(DrillGenerator.skyRule(Body.SUN, 9.9, 9.9).isPresent(), "Sun at 9.9°");
        assertFalse(DrillGenerator.skyRule(Body.SUN, 10.1, 10.1).isPresent(), "Sun at 10.1°");
        assertTrue(DrillGenerator.skyRule(Body.SUN, 80.1, 80.1).isPresent(), "Sun at 80.1°");
        assertTrue(DrillGenerator.skyRule(Body.MOON, 40, -10.5).isPresent(), "Moon with a dark horizon");
    }

    @Test
    void theDemoPlansTwilightStarsANoonSunAndAllItsFixes() {
        DrillPack p = DrillGenerator.generate(Scenarios.demo(), 7, ALMANAC);
        assertEquals(4, p.key().fixes().size(), "noon, afternoon Sun, evening stars, morning stars");
        for (LoggedSight s : p.sights()) {
            if (s.body().isStar() || s.body().isPlanet()) {
                assertTrue(s.sunAltitudeDeg() <= -3 && s.sunAltitudeDeg() >= -10, "twilight band: " + s);
            }
            assertTrue(s.trueHoDeg() >= 10 && s.trueHoDeg() <= 80, "altitude band: " + s);
        }
        // The observer's DR drifts from the truth with the current (0.6 kn toward 100°), as at sea.
        AnswerKey.FixKey last = p.key().fixes().get(p.key().fixes().size() - 1);
        double drOff = DrillGrader.distanceNm(GeoPosition.of(last.dr().latDeg(), last.dr().lonDeg()), last.truth());
        assertTrue(drOff > 5, "the DR is off the truth by the current's drift: " + drOff + " nm");
    }
}
