package org.sightwork.celestial.planning;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.time.Duration;
import java.time.Instant;
import java.time.LocalDate;
import java.time.ZoneOffset;
import java.time.ZonedDateTime;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.Random;
import net.e175.klaus.solarpositioning.SPA;
import net.e175.klaus.solarpositioning.SunriseResult;
import org.junit.jupiter.api.Test;
import org.sightwork.celestial.almanac.Almanac;
import org.sightwork.celestial.time.AstroTime;
import org.sightwork.geo.earth.GeoPosition;

/**
 * Validation of the Sun's times against a second reference, the NREL Solar Position Algorithm
 * (Reda and Andreas 2004) in {@code net.e175.klaus:solarpositioning} 2.0.5: sunrise, transit and
 * sunset, and civil and nautical twilight. SPA's sunrise has the Sun's centre at −0.8333° (34′
 * refraction and a fixed 16′ semi-diameter, no parallax), ours the upper limb with the day's
 * semi-diameter and the parallax: up to 0.5′ apart in altitude, a few seconds of time away from the
 * poles. Random places within 60° of the equator, dates 2000-2040 (fixed seed).
 */
class DayPlannerSpaTest {

    /** The brief's tolerance: one minute of time. */
    private static final double ONE_MINUTE_S = 60.0;

    @Test
    void sunTimesAgreeWithNrelSpa() {
        Almanac almanac = Almanac.standard();
        DayPlanner planner = new DayPlanner(almanac);
        Random rnd = new Random(20041215L);
        double[] worst = new double[6];
        int compared = 0;
        for (int i = 0; i < 120; i++) {
            GeoPosition p = GeoPosition.of(-60 + 120 * rnd.nextDouble(), -180 + 360 * rnd.nextDouble());
            LocalDate date = LocalDate.of(2000, 1, 1).plusDays(rnd.nextInt(41 * 365));
            ShipTrack still = ShipTrack.stationary(p);
            DayWindow day = DayWindow.zoneDay(date, still);
            DayEvents ev = planner.dayEvents(still, day, 0.0);
            ZonedDateTime noon = date.atTime(12, 0).atZone(ZoneOffset.ofHours(day.zoneHours().getAsInt()));
            double deltaT = AstroTime.ofUtc(noon.toInstant()).deltaTSeconds();
            Map<SPA.Horizon, SunriseResult> spa = SPA.calculateSunriseTransitSet(noon, p.latDeg(), p.lonDeg(), deltaT,
                    SPA.Horizon.SUNRISE_SUNSET, SPA.Horizon.CIVIL_TWILIGHT, SPA.Horizon.NAUTICAL_TWILIGHT);
            SunriseResult rs = spa.get(SPA.Horizon.SUNRISE_SUNSET);
            compared += compare(worst, 0, "transit", ev.meridianPassage(), rs.transit(), day);
            if (rs instanceof SunriseResult.RegularDay r) {
                compared += compare(worst, 1, "sunrise", ev.sunrise(), r.sunrise(), day);
                compared += compare(worst, 2, "sunset", ev.sunset(), r.sunset(), day);
            }
            if (spa.get(SPA.Horizon.CIVIL_TWILIGHT) instanceof SunriseResult.RegularDay c) {
                compared += compare(worst, 3, "civil dawn", ev.civilDawn(), c.sunrise(), day);
                compared += compare(worst, 3, "civil dusk", ev.civilDusk(), c.sunset(), day);
            }
            if (spa.get(SPA.Horizon.NAUTICAL_TWILIGHT) instanceof SunriseResult.RegularDay nt) {
                compared += compare(worst, 4, "nautical dawn", ev.nauticalDawn(), nt.sunrise(), day);
                compared += compare(worst, 4, "nautical dusk", ev.nauticalDusk(), nt.sunset(), day);
            }
        }
        System.out.printf(Locale.ROOT, "NREL SPA: %d events; max |d| transit %.1f s, sunrise %.1f s, sunset %.1f s,"
                + " civil %.1f s, nautical %.1f s%n", compared, worst[0], worst[1], worst[2], worst[3], worst[4]);
        assertTrue(compared > 500, "compared " + compared + " events");
    }

    /** Compares when SPA's event falls in our day (SPA answers for its own notion of the date). */
    private static int compare(double[] worst, int k, String what, Optional<Instant> ours, ZonedDateTime spa, DayWindow day) {
        if (spa == null || !day.contains(spa.toInstant())) {
            return 0;
        }
        assertTrue(ours.isPresent(), what + " found by SPA at " + spa + " but not by us");
        double d = Duration.between(spa.toInstant(), ours.get()).toMillis() / 1000.0;
        assertEquals(0.0, d, ONE_MINUTE_S, what + " vs NREL SPA (s), day " + day);
        worst[k] = Math.max(worst[k], Math.abs(d));
        return 1;
    }
}
