package org.sightwork.celestial.planning;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.time.Duration;
import java.time.Instant;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.function.Function;
import org.junit.jupiter.api.Test;
import org.sightwork.celestial.almanac.Almanac;
import org.sightwork.geo.earth.GeoPosition;

/**
 * Validation of the times at a moving DR against PyEphem 4.1.4 iterated for the ship's run:
 * {@code planning-moving-pyephem.tsv}, written by {@code reference/planning_moving_pyephem.py}
 * (40 random passages at 5-30 kn and 4 invented ones, two across the date line). PyEphem finds each
 * event for an observer fixed at the DR of its previous estimate until two estimates agree; we find
 * it in one root search on the moving DR. Same conventions as {@link DayPlannerPyEphemTest}.
 */
class DayPlannerMovingPyEphemTest {

    /** The brief's tolerance: one minute of time. */
    private static final double ONE_MINUTE_S = 60.0;

    @Test
    void movingShipTimesAgreeWithIteratedPyEphem() {
        Map<String, Function<DayEvents, Optional<Instant>>> events = new LinkedHashMap<>();
        events.put("sunrise", DayEvents::sunrise);
        events.put("sunset", DayEvents::sunset);
        events.put("civil_dawn", DayEvents::civilDawn);
        events.put("civil_dusk", DayEvents::civilDusk);
        events.put("nautical_dawn", DayEvents::nauticalDawn);
        events.put("nautical_dusk", DayEvents::nauticalDusk);
        events.put("sun_transit", DayEvents::meridianPassage);
        events.put("moonrise", DayEvents::moonrise);
        events.put("moonset", DayEvents::moonset);
        DayPlanner planner = new DayPlanner(Almanac.standard());
        List<String> presence = new ArrayList<>();
        double worst = 0;
        int n = 0;
        for (Map<String, String> row : ReferenceTables.read("/reference/planning-moving-pyephem.tsv")) {
            GeoPosition start = GeoPosition.of(Double.parseDouble(row.get("lat_deg")), Double.parseDouble(row.get("lon_deg")));
            ShipTrack ship = new ShipTrack(start, Instant.parse(row.get("day_start_utc")),
                    Double.parseDouble(row.get("course_deg")), Double.parseDouble(row.get("speed_kn")));
            DayWindow day = DayWindow.zoneDay(LocalDate.parse(row.get("date")), ship);
            assertEquals(Instant.parse(row.get("day_start_utc")), day.startUtc(), "day start, case " + row.get("case"));
            DayEvents ev = planner.dayEvents(ship, day, 0.0);
            for (Map.Entry<String, Function<DayEvents, Optional<Instant>>> e : events.entrySet()) {
                String ref = row.get(e.getKey());
                Optional<Instant> ours = e.getValue().apply(ev);
                if (ref.isEmpty() != ours.isEmpty()) {
                    presence.add("case " + row.get("case") + " " + e.getKey() + ": PyEphem '" + ref + "', ours " + ours);
                    continue;
                }
                if (ours.isPresent()) {
                    double d = Duration.between(Instant.parse(ref), ours.get()).toMillis() / 1000.0;
                    assertEquals(0.0, d, ONE_MINUTE_S, e.getKey() + " vs iterated PyEphem (s), case " + row.get("case")
                            + " " + row.get("label"));
                    worst = Math.max(worst, Math.abs(d));
                    n++;
                }
            }
        }
        System.out.printf(Locale.ROOT, "moving ship vs iterated PyEphem: %d events, max |d| %.1f s%n", n, worst);
        assertEquals(List.of(), presence, "events present in one and missing in the other");
    }
}
