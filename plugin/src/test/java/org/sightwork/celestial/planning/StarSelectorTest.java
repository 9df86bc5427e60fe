package org.sightwork.celestial.planning;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.time.Instant;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.sightwork.celestial.almanac.Almanac;
import org.sightwork.celestial.almanac.Body;
import org.sightwork.celestial.almanac.BodyPosition;
import org.sightwork.celestial.time.AstroTime;
import org.sightwork.geo.earth.GeoPosition;

/** Star selection at real twilights: the rules hold and the set is the best the rules allow. */
class StarSelectorTest {

    private final Almanac almanac = Almanac.standard();
    private final StarSelector selector = new StarSelector(almanac);

    private SightPlan eveningPlan(GeoPosition p, LocalDate d, SelectionCriteria c) {
        ShipTrack still = ShipTrack.stationary(p);
        DayEvents ev = new DayPlanner(almanac).dayEvents(still, DayWindow.zoneDay(d, still), 0.0);
        Instant t = ev.eveningStarTime().orElseThrow();
        return selector.plan(t, p, c);
    }

    @Test
    void theSetKeepsTheRulesAndIsSpreadRoundTheHorizon() {
        for (int size = 3; size <= 5; size++) {
            SelectionCriteria c = SelectionCriteria.DEFAULT.withSetSize(size);
            SightPlan plan = eveningPlan(new GeoPosition(35.0, -40.0), LocalDate.of(2026, 9, 12), c);
            assertEquals(size, plan.chosen().size(), "set size");
            for (VisibleBody b : plan.chosen()) {
                assertTrue(b.eligible(), b.body().name() + " eligible");
                assertTrue(b.hcDeg() >= c.minAltDeg() && b.hcDeg() <= c.maxAltDeg(), "in the altitude band");
                assertFalse(b.body().equals(Body.SUN), "never the Sun");
            }
            // An even spread gives √(4/n) (StarSelectorGeometryTest); a real sky should come close.
            assertTrue(plan.hdop() < 1.15 * Math.sqrt(4.0 / size), "HDOP " + plan.hdop() + " for " + size);
            // Exhaustive check over every eligible set: none beats the chosen one by more than the
            // tie-break allowance.
            List<VisibleBody> el = plan.visible().stream().filter(VisibleBody::eligible).toList();
            double best = bestByBruteForce(el, size, 0, new ArrayList<>());
            assertTrue(plan.hdop() <= best * (1 + StarSelector.HDOP_TOLERANCE_PERCENT / 100) + 1e-12,
                    "chosen " + plan.hdop() + " vs best " + best);
        }
    }

    private static double bestByBruteForce(List<VisibleBody> el, int k, int from, List<Double> zns) {
        if (zns.size() == k) {
            return StarSelector.hdop(zns);
        }
        double best = Double.POSITIVE_INFINITY;
        for (int i = from; i < el.size(); i++) {
            zns.add(el.get(i).znDeg());
            best = Math.min(best, bestByBruteForce(el, k, i + 1, zns));
            zns.remove(zns.size() - 1);
        }
        return best;
    }

    @Test
    void bodiesNearTheMoonAndInTheGlareAreSetAside() {
        // Scan a month of evenings: wherever the Moon is up, nothing closer than the clearance is
        // proposed; wherever a low body lies near the Sun's azimuth, it is not proposed either.
        GeoPosition p = new GeoPosition(20.0, -60.0);
        int moonNights = 0;
        for (int day = 0; day < 30; day++) {
            SightPlan plan = eveningPlan(p, LocalDate.of(2026, 3, 1).plusDays(day), SelectionCriteria.DEFAULT);
            AstroTime at = AstroTime.ofUtc(plan.timeUtc());
            BodyPosition mp = almanac.position(Body.MOON, at);
            HorizonPoint moon = Horizon.fromEquatorial(mp.ghaDeg(), mp.decDeg(), p);
            BodyPosition sp = almanac.position(Body.SUN, at);
            HorizonPoint sun = Horizon.fromEquatorial(sp.ghaDeg(), sp.decDeg(), p);
            if (moon.altitudeDeg() > 0) {
                moonNights++;
            }
            for (VisibleBody b : plan.visible()) {
                HorizonPoint h = new HorizonPoint(b.hcDeg(), b.znDeg());
                if (!b.body().equals(Body.MOON) && moon.altitudeDeg() > 0 && h.separationDeg(moon) < 15.0) {
                    assertFalse(b.eligible(), b.body().name() + " near the Moon");
                }
                if (b.hcDeg() < 25.0 && Math.abs(Horizon.norm180(b.znDeg() - sun.azimuthDeg())) < 30.0) {
                    assertFalse(b.eligible(), b.body().name() + " in the glare");
                }
            }
        }
        assertTrue(moonNights > 5, "the Moon was up on some evenings");
    }

    @Test
    void daylightLeavesOnlyTheDaytimeBodies() {
        SightPlan noon = selector.plan(Instant.parse("2026-06-21T12:00:00Z"), new GeoPosition(45.0, 0.0),
                SelectionCriteria.DEFAULT);
        assertTrue(noon.sunAltitudeDeg() > 60, "the Sun is high");
        for (VisibleBody b : noon.visible()) {
            if (b.body().isStar()) {
                assertFalse(b.eligible(), "no star in daylight: " + b.body().name());
            }
        }
    }

    @Test
    void presetAltitudeAddsRefractionAndDip() {
        // Refraction at 20° about 2.6′ (Bennett's formula; from memory), dip at 9 m 5.3′ (from memory
        // of the dip table): a star at Hc 20° is pre-set about 7.9′ higher.
        assertEquals(20.0 + (2.6 + 5.3) / 60.0, SextantApprox.presetHsDeg(20.0, 0.0, 9.0), 0.15 / 60.0, "pre-set Hs");
        // And the approximate inverse brings a sextant reading back within 0.1′.
        double hs = SextantApprox.presetHsDeg(20.0, 0.0, 9.0);
        assertEquals(20.0, SextantApprox.approxObservedDeg(hs, 9.0), 0.1 / 60.0, "Hs back to Ho");
    }
}
