package org.sightwork.celestial.fix;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.junit.jupiter.api.Test;
import org.sightwork.celestial.almanac.Almanac;
import org.sightwork.celestial.almanac.Body;
import org.sightwork.celestial.almanac.BodyPosition;
import org.sightwork.celestial.reduction.LineOfPosition;
import org.sightwork.celestial.reduction.ReducedSight;
import org.sightwork.celestial.reduction.SightReducer;
import org.sightwork.celestial.reduction.SightReduction;
import org.sightwork.celestial.reduction.Sphere;
import org.sightwork.celestial.sight.AltitudeCorrector;
import org.sightwork.celestial.sight.BodyFigures;
import org.sightwork.celestial.sight.Sight;
import org.sightwork.celestial.time.AstroTime;
import org.sightwork.geo.earth.GeoPosition;

/**
 * The whole chain with the almanac: sights made from a known position (Hc there, the corrections
 * applied in reverse to get Hs), then worked forward from a DR 5 nm off and fixed, must come back
 * to the position within 0.01 nm (the fix loop's stopping rule), at both poles, on the date line
 * and elsewhere, with the Moon's oblate-Earth parallax and the Sun's semi-diameter in play.
 */
class SightToFixTest {

    private static final Almanac ALMANAC = Almanac.standard();
    private static final double FIX_TOL_NM = 0.01;

    @Test
    void exactSightsFixBackAnywhere() {
        GeoPosition[] places = {GeoPosition.of(90.0, 0.0), GeoPosition.of(-90.0, 0.0), GeoPosition.of(89.9, 135.0),
            GeoPosition.of(0.0, -180.0), GeoPosition.of(-15.0, 179.999), GeoPosition.of(45.0, -179.999),
            GeoPosition.of(-60.0, 20.0), GeoPosition.of(10.0, 0.0)};
        Instant[] times = {Instant.parse("2025-01-10T03:00:00Z"), Instant.parse("2025-06-20T18:30:00Z")};
        SightReducer reducer = SightReducer.standard();
        int fixes = 0;
        for (GeoPosition truth : places) {
            for (Instant t : times) {
                GeoPosition dr = Sphere.destination(truth, truth.latDeg() >= 89.9 ? 180.0 : 30.0, 5.0);
                List<LineOfPosition> lines = new ArrayList<>();
                List<Double> azimuths = new ArrayList<>();
                for (Body body : ALMANAC.navigationalBodies()) {
                    BodyPosition pos = ALMANAC.position(body, AstroTime.ofUtc(t));
                    var c = SightReduction.reduce(truth, pos.ghaDeg(), pos.decDeg());
                    if (c.hcDeg() < 15.0 || c.hcDeg() > 75.0 || lines.size() >= 6
                            || azimuths.stream().anyMatch(z -> Math.abs(((z - c.znDeg()) % 360 + 540) % 360 - 180) < 40)) {
                        continue;
                    }
                    Sight cond = Sight.builder(body.name(), t, c.hcDeg()).eyeHeightM(3.0).dr(dr).build();
                    BodyFigures fig = new BodyFigures(pos.hpArcmin().orElse(0.0), pos.sdArcmin().orElse(0.0),
                            java.util.OptionalDouble.empty(), java.util.OptionalDouble.empty(),
                            java.util.OptionalDouble.empty(), java.util.OptionalDouble.empty()).at(truth.latDeg(), c.znDeg());
                    if (body.equals(Body.VENUS) || body.equals(Body.MARS)) {
                        continue; // the phase correction needs the Sun's place: covered in CorrectionsTest
                    }
                    double hs = AltitudeCorrector.hsFor(c.hcDeg(), cond, fig);
                    Sight s = Sight.builder(body.name(), t, hs).eyeHeightM(3.0).dr(dr).build();
                    ReducedSight r = reducer.reduce(s, Optional.empty());
                    lines.add(r.lop());
                    azimuths.add(c.znDeg());
                }
                assertTrue(lines.size() >= 3, "at least three bodies at " + truth + " " + t);
                Fix fix = FixSolver.solve(lines, dr, FixOptions.DEFAULTS);
                assertEquals(0.0, Sphere.distanceNm(truth, fix.position()), FIX_TOL_NM,
                        "fix at " + truth + " " + t + " from " + lines.size() + " bodies");
                fixes++;
            }
        }
        assertEquals(places.length * times.length, fixes, "every case fixed");
    }
}
