package org.sightwork.celestial.sight;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.time.ZoneOffset;
import java.time.ZonedDateTime;
import net.e175.klaus.solarpositioning.SPA;
import org.junit.jupiter.api.Test;

/** Validation of the altitude corrections against handbook values and the NREL SPA library. */
class CorrectionsTest {

    /** Half the last digit of a handbook value given to 0.1′. */
    private static final double HALF_TENTH_ARCMIN = 0.05;

    @Test
    void dipMatchesTheAlmanacDipTable() {
        // from memory of the almanac's dip table: 2.4 m -> 2.7', 10 m -> 5.6'
        assertEquals(-2.7, Corrections.dipArcmin(2.4), HALF_TENTH_ARCMIN, "dip at 2.4 m");
        assertEquals(-5.6, Corrections.dipArcmin(10.0), HALF_TENTH_ARCMIN, "dip at 10 m");
        assertEquals(0.0, Corrections.dipArcmin(0.0), 0.0, "no height, no dip");
    }

    @Test
    void dipShortOfTheHorizonIsLargerNearTheShoreAndJoinsTheSeaDip() {
        double eye = 3.0;
        double horizon = Corrections.seaHorizonNm(eye);
        assertEquals(Corrections.dipArcmin(eye), Corrections.dipShortArcmin(eye, horizon), 0.01,
                "dip short equals the sea dip at the sea horizon");
        assertTrue(Corrections.dipShortArcmin(eye, 0.5) < Corrections.dipArcmin(eye) - 5.0,
                "a shore 0.5 nm off is far below the sea horizon");
        // Bowditch (2002) Table 22, from memory of its formula: Ds = 0.4156 d + 0.56514 h/d (h feet)
        double hFt = eye / Corrections.METRES_PER_FOOT;
        assertEquals(-(0.4156 * 0.5 + 0.56514 * hFt / 0.5), Corrections.dipShortArcmin(eye, 0.5), 0.1,
                "dip short at 3 m and 0.5 nm");
    }

    @Test
    void bennettRefractionMatchesHandbookValues() {
        // from memory: Bennett (1982) gives about 34' at 0°, 5.3' at 10°, 1.0' at 45° in standard air
        assertEquals(-34.0, Corrections.refractionArcmin(0.0, 10.0, 1010.0), 1.0, "refraction at 0°");
        assertEquals(-5.3, Corrections.refractionArcmin(10.0, 10.0, 1010.0), HALF_TENTH_ARCMIN, "refraction at 10°");
        assertEquals(-1.0, Corrections.refractionArcmin(45.0, 10.0, 1010.0), HALF_TENTH_ARCMIN, "refraction at 45°");
        assertEquals(0.0, Corrections.refractionArcmin(90.0, 10.0, 1010.0), 0.01, "none at the zenith");
    }

    @Test
    void refractionWithTemperatureAndPressureAgreesWithSpa() {
        // NREL SPA (Reda & Andreas 2004, net.e175.klaus:solarpositioning): apparent minus true
        // elevation, its refraction model (Saemundsson with the same P/T factor); Bennett and
        // Saemundsson agree to about 0.1' above 5° (Meeus ch. 16).
        ZonedDateTime t = ZonedDateTime.of(2024, 3, 20, 0, 0, 0, 0, ZoneOffset.UTC);
        double[][] conditions = {{30.0, 1030.0}, {-10.0, 980.0}, {10.0, 1010.0}};
        for (double[] tp : conditions) {
            for (int minutes = 420; minutes <= 1080; minutes += 30) {
                ZonedDateTime at = t.plusMinutes(minutes);
                double trueEl = 90.0 - SPA.calculateSolarPosition(at, 20.0, 0.0, 0.0, 69.0).zenithAngle();
                double appEl = 90.0 - SPA.calculateSolarPosition(at, 20.0, 0.0, 0.0, 69.0, tp[1], tp[0]).zenithAngle();
                if (appEl < 5.0) {
                    continue;
                }
                double ours = -Corrections.refractionArcmin(appEl, tp[0], tp[1]);
                assertEquals((appEl - trueEl) * 60.0, ours, 0.15,
                        "refraction at " + appEl + "° T=" + tp[0] + " P=" + tp[1]);
            }
        }
    }

    @Test
    void refractionIsRefusedBelowMinusOneDegree() {
        assertThrows(SightException.class, () -> Corrections.refractionArcmin(-1.5, 10.0, 1010.0));
    }

    @Test
    void parallaxIsHpTimesCosineToFirstOrder() {
        // from memory (REFERENCES.md): parallax in altitude = HP × cos(Ha) to first order; the
        // second-order term is of order HP² sin(2h)/2 ≈ 0.2' for the Moon.
        double hp = 57.0;
        for (double h = 0.0; h <= 90.0; h += 15.0) {
            double p = Corrections.topocentric(h, hp, 0.0, Double.NaN, Double.NaN).parallaxArcmin();
            assertEquals(hp * Math.cos(Math.toRadians(h)), p, 0.25, "Moon parallax at " + h + "°");
        }
        // Sun: HP about 0.15' (REFERENCES.md, from memory)
        assertEquals(0.15, Corrections.topocentric(0.0, 0.15, 16.0, Double.NaN, Double.NaN).parallaxArcmin(), 1e-4,
                "Sun's parallax at the horizon");
    }

    @Test
    void moonSemiDiameterIsAugmentedUpToAboutAThirdOfAMinute() {
        // from memory (REFERENCES.md): SD ≈ 0.2724 HP, augmented with altitude by up to about 0.3'
        double hp = 61.0;
        double sd = 0.2724 * hp;
        double atZenith = Corrections.topocentric(90.0, hp, sd, Double.NaN, Double.NaN).augmentedSdArcmin() - sd;
        double atHorizon = Corrections.topocentric(0.0, hp, sd, Double.NaN, Double.NaN).augmentedSdArcmin() - sd;
        assertEquals(0.3, atZenith, 0.05, "augmentation at the zenith");
        assertEquals(0.0, atHorizon, 0.01, "no augmentation at the horizon");
    }

    @Test
    void oblateEarthChangesTheMoonParallaxByTheLatitudeReduction() {
        // from memory: the Moon's HP is reduced for latitude by about HP·f·sin²φ (0.2' at 60°)
        double hp = 60.0;
        double sphere = Corrections.topocentric(0.0, hp, 0.0, Double.NaN, Double.NaN).parallaxArcmin();
        double east = Corrections.topocentric(0.0, hp, 0.0, 60.0, 90.0).parallaxArcmin();
        double f = 1.0 / 298.257;
        assertEquals(-hp * f * 0.75, east - sphere, 0.03, "HP reduction for latitude 60°, body due east");
    }

    @Test
    void phaseOffsetIsZeroAtFullAndGrowsForACrescent() {
        // Derived centroid 8 r (1 - k) / (3π): 0 at full; half-phase 0.42 r (checked by numerical
        // integration in CentreOfLightTest).
        assertEquals(0.0, Corrections.phaseArcmin(0.5, 1.0, 0.0), 0.0, "full disc");
        assertEquals(-8.0 * 0.5 * 0.5 / (3 * Math.PI), Corrections.phaseArcmin(0.5, 0.5, 0.0), 1e-12,
                "half phase, Sun above");
    }

    @Test
    void centreOfLightFormulaMatchesNumericalIntegration() {
        // Independent check of the closed form by integrating the lit area of a unit disc.
        for (double k : new double[] {0.1, 0.3, 0.5, 0.8}) {
            double cosI = 2 * k - 1;
            int steps = 4000;
            double area = 0;
            double moment = 0;
            for (int i = 0; i < steps; i++) {
                double y = -1 + (i + 0.5) * 2.0 / steps;
                double w = Math.sqrt(1 - y * y);
                double x0 = -cosI * w;
                area += (w - x0) * 2.0 / steps;
                moment += 0.5 * (w * w - x0 * x0) * 2.0 / steps;
            }
            double formula = -Corrections.phaseArcmin(1.0, k, 0.0);
            assertEquals(moment / area, formula, 1e-5, "centroid offset for k = " + k);
        }
    }
}
