package org.sightwork.celestial.fix;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.Random;
import org.junit.jupiter.api.Test;
import org.sightwork.celestial.reduction.LineOfPosition;
import org.sightwork.celestial.reduction.SightReduction;
import org.sightwork.celestial.reduction.Sphere;
import org.sightwork.celestial.sight.AltitudeCorrector;
import org.sightwork.celestial.sight.BodyFigures;
import org.sightwork.celestial.sight.Sight;
import org.sightwork.geo.earth.GeoPosition;

/**
 * The least-squares fix. Truth positions are chosen, bodies are placed at a chosen altitude and
 * azimuth from them (their GP by a great-circle step, checked against GeographicLib in
 * SightReductionTest), and the fix must find the truth again; the statistical tests use fixed seeds.
 */
class FixSolverTest {

    private static final Instant T = Instant.parse("2025-01-15T05:30:00Z");
    /** The fix loop's own stopping rule is 0.01 nm. */
    private static final double FIX_TOL_NM = 0.01;

    /** A body seen from {@code truth} at altitude hc and azimuth zn: {gha, dec}. */
    static double[] bodyAt(GeoPosition truth, double hcDeg, double znDeg) {
        GeoPosition gp = Sphere.destination(truth, znDeg, (90.0 - hcDeg) * 60.0);
        return new double[] {Sphere.normalize360(-gp.lonDeg()), gp.latDeg()};
    }

    static LineOfPosition line(String name, Instant t, GeoPosition truth, GeoPosition ap, double hc, double zn,
            double errorArcmin, double sigmaNm) {
        double[] b = bodyAt(truth, hc, zn);
        double ho = SightReduction.reduce(truth, b[0], b[1]).hcDeg() + errorArcmin / 60.0;
        return LineOfPosition.reduce(name, t, ap, b[0], b[1], ho, sigmaNm);
    }

    @Test
    void exactSightsThroughReverseCorrectionsFixTheTruthAnywhere() {
        // Sights made from a known position, corrections applied in reverse (Hs from Ho), then
        // corrected again, reduced from a DR 20 nm off, fixed: back to the truth within 0.01 nm.
        GeoPosition[] places = {GeoPosition.of(89.99, 10.0), GeoPosition.of(90.0, 0.0), GeoPosition.of(-89.95, -120.0),
            GeoPosition.of(0.0, 179.999), GeoPosition.of(12.0, -179.99), GeoPosition.of(-45.0, 170.0),
            GeoPosition.of(51.5, -0.01), GeoPosition.of(-33.9, 18.4)};
        double[][] bodies = {{25.0, 10.0}, {48.0, 130.0}, {33.0, 250.0}, {62.0, 300.0}};
        for (GeoPosition truth : places) {
            GeoPosition dr = Sphere.destination(truth, 37.0, 20.0);
            List<LineOfPosition> lines = new ArrayList<>();
            for (int i = 0; i < bodies.length; i++) {
                double[] b = bodyAt(truth, bodies[i][0], bodies[i][1]);
                double ho = SightReduction.reduce(truth, b[0], b[1]).hcDeg();
                BodyFigures fig = i == 3 ? BodyFigures.of(57.0, 15.5) : BodyFigures.STAR;
                Sight cond = Sight.builder(i == 3 ? "Moon" : "star" + i, T, ho).eyeHeightM(3.0).build();
                double hs = AltitudeCorrector.hsFor(ho, cond, fig);
                Sight s = Sight.builder(cond.body(), T, hs).eyeHeightM(3.0).build();
                double hoBack = AltitudeCorrector.correct(s, fig).hoDeg();
                lines.add(LineOfPosition.reduce(s.body(), T, dr, b[0], b[1], hoBack, 1.0));
            }
            Fix fix = FixSolver.solve(lines, dr, FixOptions.DEFAULTS);
            assertEquals(0.0, Sphere.distanceNm(truth, fix.position()), FIX_TOL_NM, "fix at " + truth);
        }
    }

    @Test
    void ellipseHoldsTheTruthNinetyFivePercentOfTheTime() {
        // 2,000 simulated fixes with known Gaussian sight errors: the 95 % ellipse must hold the
        // truth in 93-97 % (binomial 2σ band for p = 0.95, n = 2000 is ±1 %; we allow ±2 %).
        Random random = new Random(1995L);
        int inside = 0;
        int trials = 2000;
        for (int trial = 0; trial < trials; trial++) {
            GeoPosition truth = GeoPosition.of(random.nextDouble() * 140.0 - 70.0, random.nextDouble() * 360.0 - 180.0);
            GeoPosition dr = Sphere.destination(truth, random.nextDouble() * 360.0, random.nextDouble() * 15.0);
            int count = 3 + random.nextInt(4);
            List<LineOfPosition> lines = new ArrayList<>();
            double zn0 = random.nextDouble() * 360.0;
            for (int i = 0; i < count; i++) {
                double sigma = 0.5 + 1.5 * random.nextDouble();
                double zn = Sphere.normalize360(zn0 + i * 360.0 / count + random.nextGaussian() * 15.0);
                lines.add(line("body" + i, T, truth, dr, 20.0 + random.nextDouble() * 50.0, zn,
                        sigma * random.nextGaussian(), sigma));
            }
            Fix fix = FixSolver.solve(lines, dr, FixOptions.DEFAULTS.withRejectOutliers(false));
            double d = Sphere.distanceNm(fix.position(), truth);
            double c = Math.toRadians(Sphere.initialCourseDeg(fix.position(), truth));
            if (fix.covariance().mahalanobis2(d * Math.sin(c), d * Math.cos(c)) <= ErrorEllipse.CHI_SQUARE_2D_95) {
                inside++;
            }
        }
        double coverage = inside / (double) trials;
        System.out.println("FixSolverTest: simultaneous-fix ellipse coverage " + coverage);
        assertTrue(coverage >= 0.93 && coverage <= 0.97, "coverage of the 95 % ellipse: " + coverage);
    }

    @Test
    void runningFixEllipseCarriesTheDrError() {
        // Lines 1-3 h before the fix, advanced along a DR whose true track drifts with an error of
        // k × distance run (the stated model): the ellipse must still hold the truth 93-97 %.
        Random random = new Random(31L);
        int inside = 0;
        int trials = 2000;
        double k = FixOptions.DEFAULT_DR_ERROR_FRACTION;
        for (int trial = 0; trial < trials; trial++) {
            GeoPosition truth = GeoPosition.of(random.nextDouble() * 120.0 - 60.0, random.nextDouble() * 360.0 - 180.0);
            DrTrack track = DrTrack.steady(T.minusSeconds(4 * 3600), random.nextDouble() * 360.0, 4.0 + 4 * random.nextDouble());
            double ue = random.nextGaussian();
            double un = random.nextGaussian();
            List<LineOfPosition> lines = new ArrayList<>();
            GeoPosition drAtFix = Sphere.destination(truth, random.nextDouble() * 360.0, 5.0);
            double zn0 = random.nextDouble() * 360.0;
            for (int i = 0; i < 3; i++) {
                Instant t = T.minusSeconds(i * 3600L + random.nextInt(1800));
                double d = track.distanceRunNm(t, T);
                GeoPosition trueThen = Sphere.step(track.move(truth, T, t), k * d * ue, k * d * un);
                GeoPosition apThen = track.move(drAtFix, T, t);
                double zn = Sphere.normalize360(zn0 + 120.0 * i + random.nextGaussian() * 10.0);
                lines.add(line("sun" + i, t, trueThen, apThen, 30.0, zn, random.nextGaussian(), 1.0));
            }
            Fix fix = FixSolver.solve(lines, T, drAtFix, Optional.of(track), FixOptions.DEFAULTS);
            double d = Sphere.distanceNm(fix.position(), truth);
            double c = Math.toRadians(Sphere.initialCourseDeg(fix.position(), truth));
            if (fix.covariance().mahalanobis2(d * Math.sin(c), d * Math.cos(c)) <= ErrorEllipse.CHI_SQUARE_2D_95) {
                inside++;
            }
        }
        double coverage = inside / (double) trials;
        System.out.println("FixSolverTest: running-fix ellipse coverage " + coverage);
        assertTrue(coverage >= 0.93 && coverage <= 0.97, "running-fix coverage: " + coverage);
    }

    @Test
    void aBlunderIsRejectedAndNamed() {
        GeoPosition truth = GeoPosition.of(35.0, -40.0);
        GeoPosition dr = Sphere.destination(truth, 200.0, 8.0);
        List<LineOfPosition> lines = List.of(
                line("Vega", T, truth, dr, 40.0, 30.0, 0.3, 1.0),
                line("Arcturus", T, truth, dr, 35.0, 100.0, -0.4, 1.0),
                line("Antares", T, truth, dr, 25.0, 170.0, 10.0, 1.0), // a 10' blunder
                line("Deneb", T, truth, dr, 55.0, 250.0, 0.2, 1.0),
                line("Capella", T, truth, dr, 20.0, 320.0, -0.5, 1.0));
        Fix fix = FixSolver.solve(lines, dr, FixOptions.DEFAULTS);
        FixLineResult antares = fix.lines().get(2);
        assertTrue(antares.rejected(), "the blunder is rejected");
        assertTrue(antares.rejectionReason().orElseThrow().contains("left out"), antares.rejectionReason().orElseThrow());
        assertTrue(fix.warnings().stream().anyMatch(w -> w.startsWith("Antares")), "the warning names it");
        assertEquals(1, fix.lines().stream().filter(FixLineResult::rejected).count(), "only one rejected");
        assertTrue(Sphere.distanceNm(truth, fix.position()) < 1.0, "fix near the truth without it");
    }

    @Test
    void twoLinesOfNearlyTheSameAzimuthAreRefused() {
        GeoPosition truth = GeoPosition.of(10.0, 60.0);
        List<LineOfPosition> lines = List.of(line("Sun", T, truth, truth, 40.0, 100.0, 0, 1.0),
                line("Venus", T, truth, truth, 30.0, 108.0, 0, 1.0));
        FixGeometryException e = assertThrows(FixGeometryException.class,
                () -> FixSolver.solve(lines, truth, FixOptions.DEFAULTS));
        assertTrue(e.getMessage().contains("too shallow"), e.getMessage());
        // A body and one opposite it give parallel lines too.
        List<LineOfPosition> opposite = List.of(line("Sun", T, truth, truth, 40.0, 90.0, 0, 1.0),
                line("Moon", T, truth, truth, 30.0, 275.0, 0, 1.0));
        assertThrows(FixGeometryException.class, () -> FixSolver.solve(opposite, truth, FixOptions.DEFAULTS));
    }

    @Test
    void weakGeometryWarns() {
        GeoPosition truth = GeoPosition.of(-20.0, 10.0);
        List<LineOfPosition> lines = List.of(line("a", T, truth, truth, 40.0, 100.0, 0, 1.0),
                line("b", T, truth, truth, 30.0, 112.0, 0, 1.0), line("c", T, truth, truth, 30.0, 122.0, 0, 1.0));
        Fix fix = FixSolver.solve(lines, truth, FixOptions.DEFAULTS);
        assertTrue(fix.warnings().stream().anyMatch(w -> w.startsWith("weak geometry")), fix.warnings().toString());
    }

    @Test
    void cockedHatVerticesLieOnTwoLinesEachAndHoldTheFix() {
        GeoPosition truth = GeoPosition.of(48.0, -5.0);
        List<LineOfPosition> lines = List.of(line("a", T, truth, truth, 40.0, 20.0, 2.0, 1.0),
                line("b", T, truth, truth, 30.0, 140.0, -1.0, 1.0), line("c", T, truth, truth, 30.0, 260.0, 1.5, 1.0));
        Fix fix = FixSolver.solve(lines, truth, FixOptions.DEFAULTS);
        CockedHat hat = fix.cockedHat().orElseThrow();
        for (int j = 0; j < 3; j++) {
            GeoPosition v = hat.vertices().get(j);
            // The straight LOPs and the circles differ by d²/(2 R tan z) ≈ 0.001 nm at 3 nm
            assertEquals(0.0, lines.get(j).residualNm(v), 0.01, "vertex " + j + " on line " + j);
            assertEquals(0.0, lines.get((j + 1) % 3).residualNm(v), 0.01, "vertex " + j + " on the next line");
        }
        assertTrue(hat.largestSideNm() > 1.0, "a hat of a few miles");
        assertFalse(Double.isNaN(fix.varianceFactor()), "three lines have a variance factor");
    }

    @Test
    void simultaneousLinesNeedNoTrackButRunningLinesDo() {
        GeoPosition truth = GeoPosition.of(0.0, 0.0);
        List<LineOfPosition> lines = List.of(line("Sun", T, truth, truth, 40.0, 100.0, 0, 1.0),
                line("Sun", T.plusSeconds(3 * 3600), truth, truth, 30.0, 200.0, 0, 1.0));
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> FixSolver.solve(lines, T, truth, Optional.empty(), FixOptions.DEFAULTS));
        assertTrue(e.getMessage().contains("course and speed"), e.getMessage());
    }
}
