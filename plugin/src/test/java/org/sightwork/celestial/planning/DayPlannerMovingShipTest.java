package org.sightwork.celestial.planning;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.time.Duration;
import java.time.Instant;
import java.time.LocalDate;
import java.util.List;
import java.util.Optional;
import java.util.function.Function;
import org.junit.jupiter.api.Test;
import org.sightwork.celestial.almanac.Almanac;
import org.sightwork.geo.earth.GeoPosition;

/**
 * The ship's run, the date line and polar day and night.
 *
 * <p>For a moving ship the event is where the Sun's altitude at the DR of that very instant reaches
 * the threshold; so it is also the event of a ship lying still at that DR, which the PyEphem
 * validation covers. These tests check the iteration that way (a wrong iteration, e.g. the DR of
 * the day's start used throughout, fails by minutes) and its size against the rule of thumb of
 * 4 minutes of time per degree of longitude (common practice: 360° in 24 h).
 */
class DayPlannerMovingShipTest {

    /** Two root tolerances (the moving and the still solution), rounded up: 2 s. */
    private static final double SAME_EVENT_S = 2.0;

    private final DayPlanner planner = new DayPlanner(Almanac.standard());

    private static final List<Function<DayEvents, Optional<Instant>>> SUN_EVENTS = List.of(
            DayEvents::nauticalDawn, DayEvents::civilDawn, DayEvents::sunrise, DayEvents::meridianPassage,
            DayEvents::sunset, DayEvents::civilDusk, DayEvents::nauticalDusk, DayEvents::moonrise, DayEvents::moonset);

    @Test
    void eastboundAcrossTheDateLineEachEventIsThatOfItsOwnDr() {
        // An invented passage (demo scenario, not a check value): 25 kn due east along 17°S from
        // 178°E at the zone day's start; by the evening the ship is in west longitude.
        LocalDate date = LocalDate.of(2024, 3, 1);
        GeoPosition start = new GeoPosition(-17.0, 178.0);
        Instant t0 = DayWindow.zoneDay(date, ShipTrack.stationary(start)).startUtc();
        ShipTrack ship = new ShipTrack(start, t0, 90.0, 25.0);
        DayWindow day = DayWindow.zoneDay(date, ship);
        assertEquals(12, day.zoneHours().getAsInt(), "zone at the day's start (178°E)");
        DayEvents ev = planner.dayEvents(ship, day, 0.0);
        assertTrue(ship.positionAt(ev.sunset().orElseThrow()).lonDeg() < 0, "west of 180° by sunset");
        for (Function<DayEvents, Optional<Instant>> f : SUN_EVENTS) {
            Instant moving = f.apply(ev).orElseThrow();
            assertTrue(day.contains(moving), "event in the day");
            GeoPosition there = ship.positionAt(moving);
            ShipTrack still = ShipTrack.stationary(there);
            Instant fixed = f.apply(planner.dayEvents(still, day, 0.0)).orElseThrow();
            assertEquals(0.0, Duration.between(fixed, moving).toMillis() / 1000.0, SAME_EVENT_S,
                    "moving-ship event equals the still observer's at its DR " + there);
        }
    }

    @Test
    void runningEastBringsSunsetEarlierByFourMinutesADegree() {
        // 20 kn due east on the equator for the ~18 h from midnight to sunset: ~6° of longitude,
        // so sunset about 24 min earlier than for a ship lying still at the start (common practice:
        // 4 min of time per degree). Checked to 10 %, the day-to-day change of the equation of time
        // and declination being far smaller.
        LocalDate date = LocalDate.of(2024, 3, 20);
        GeoPosition start = new GeoPosition(0.0, 0.0);
        DayWindow day = DayWindow.zoneDay(date, ShipTrack.stationary(start));
        ShipTrack ship = new ShipTrack(start, day.startUtc(), 90.0, 20.0);
        Instant still = planner.dayEvents(ShipTrack.stationary(start), day, 0.0).sunset().orElseThrow();
        Instant moving = planner.dayEvents(ship, day, 0.0).sunset().orElseThrow();
        double dLon = ship.positionAt(moving).lonDeg();
        double earlierS = Duration.between(moving, still).toMillis() / 1000.0;
        assertEquals(240.0 * dLon, earlierS, 0.1 * 240.0 * dLon, "sunset earlier by 4 min per degree run east");
    }

    @Test
    void polarDayAndNightHaveNoSunriseOrSunset() {
        // PyEphem 4.1.4 (planning-pyephem.tsv, cases 301 and 302): at 70°N 20°E the Sun is always up
        // on 2024-06-21 and never up on 2024-12-21; it still transits both days.
        GeoPosition p = new GeoPosition(70.0, 20.0);
        ShipTrack still = ShipTrack.stationary(p);
        DayEvents summer = planner.dayEvents(still, DayWindow.zoneDay(LocalDate.of(2024, 6, 21), still), 0.0);
        assertEquals(DayEvents.SunDay.ALWAYS_UP, summer.sunDay(), "midnight sun");
        assertTrue(summer.sunrise().isEmpty() && summer.sunset().isEmpty(), "no sunrise or sunset");
        assertTrue(summer.nauticalDawn().isEmpty() && summer.civilDusk().isEmpty(), "no twilight");
        assertTrue(summer.meridianPassage().isPresent(), "still a noon");
        assertTrue(summer.morningStarTime().isEmpty(), "no star time");
        DayEvents winter = planner.dayEvents(still, DayWindow.zoneDay(LocalDate.of(2024, 12, 21), still), 0.0);
        assertEquals(DayEvents.SunDay.ALWAYS_DOWN, winter.sunDay(), "polar night");
        assertTrue(winter.sunrise().isEmpty() && winter.sunset().isEmpty(), "no sunrise or sunset");
        assertTrue(winter.civilDawn().isPresent() && winter.nauticalDusk().isPresent(), "twilight at noon");
    }

    @Test
    void aStarTransitsOneSiderealDayLaterEachDay() {
        // A sidereal day is 23 h 56 min 4.09 s = 86164.09 s of mean solar time (common knowledge of
        // the trade; from memory). Sirius' own motion and precession change it by well under 0.1 s.
        GeoPosition p = new GeoPosition(30.0, -45.0);
        ShipTrack still = ShipTrack.stationary(p);
        org.sightwork.celestial.almanac.Body sirius = Almanac.standard().body("Sirius");
        Instant d1 = planner.upperTransit(sirius, still, DayWindow.zoneDay(LocalDate.of(2026, 2, 10), still)).orElseThrow();
        Instant d2 = planner.upperTransit(sirius, still, DayWindow.zoneDay(LocalDate.of(2026, 2, 11), still)).orElseThrow();
        assertEquals(86164.09, Duration.between(d1, d2).toMillis() / 1000.0, 1.0, "one sidereal day (s)");
    }

    @Test
    void heightOfEyeMakesSunriseEarlier() {
        // Dip 1.76′ √h (from memory of the almanac's dip table): 25 m gives 8.8′ more depression;
        // on the equator at the equinox the Sun climbs 15′ a minute (vertically), so sunrise comes
        // 8.8/15 min = 35 s earlier. To 5 s.
        GeoPosition p = new GeoPosition(0.0, 0.0);
        ShipTrack still = ShipTrack.stationary(p);
        DayWindow day = DayWindow.zoneDay(LocalDate.of(2024, 3, 20), still);
        Instant sea = planner.dayEvents(still, day, 0.0).sunrise().orElseThrow();
        Instant high = planner.dayEvents(still, day, 25.0).sunrise().orElseThrow();
        assertEquals(8.8 / 15.0 * 60.0, Duration.between(high, sea).toMillis() / 1000.0, 5.0, "sunrise earlier (s)");
    }
}
