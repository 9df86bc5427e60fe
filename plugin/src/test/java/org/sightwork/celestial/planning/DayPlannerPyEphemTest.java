package org.sightwork.celestial.planning;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

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
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.sightwork.celestial.almanac.Almanac;
import org.sightwork.geo.earth.GeoPosition;

/**
 * Validation of the day's times against PyEphem 4.1.4: {@code planning-pyephem.tsv}, written by
 * {@code reference/planning_pyephem.py} (300 random places and dates 2000-2040 within 65° of the
 * equator, and 17 named cases: polar day and night, the date line, the equator). The table's
 * conventions match ours: upper limb 34′ below the geometric horizon for the Sun and the Moon (the
 * Moon topocentric), centre at −6° and −12° for twilight, eye at sea level, the local zone day
 * with zone = round(lon / 15°).
 */
class DayPlannerPyEphemTest {

    /** The brief's tolerance: one minute of time, the precision the times are given to. */
    private static final double ONE_MINUTE_S = 60.0;

    private static final List<Map<String, String>> ROWS = ReferenceTables.read("/reference/planning-pyephem.tsv");
    private static final Map<String, Function<DayEvents, Optional<Instant>>> EVENTS = new LinkedHashMap<>();
    private static final Map<String, List<Double>> ERRORS_S = new LinkedHashMap<>();
    private static final List<String> PRESENCE_MISMATCH = new ArrayList<>();

    static {
        EVENTS.put("sunrise", DayEvents::sunrise);
        EVENTS.put("sunset", DayEvents::sunset);
        EVENTS.put("civil_dawn", DayEvents::civilDawn);
        EVENTS.put("civil_dusk", DayEvents::civilDusk);
        EVENTS.put("nautical_dawn", DayEvents::nauticalDawn);
        EVENTS.put("nautical_dusk", DayEvents::nauticalDusk);
        EVENTS.put("sun_transit", DayEvents::meridianPassage);
        EVENTS.put("moonrise", DayEvents::moonrise);
        EVENTS.put("moonset", DayEvents::moonset);
    }

    @BeforeAll
    static void computeAll() {
        DayPlanner planner = new DayPlanner(Almanac.standard());
        for (Map<String, String> row : ROWS) {
            double lon = Double.parseDouble(row.get("lon_deg"));
            GeoPosition p = GeoPosition.of(Double.parseDouble(row.get("lat_deg")), lon);
            ShipTrack still = ShipTrack.stationary(p);
            LocalDate date = LocalDate.parse(row.get("date"));
            // 180°E itself: our longitudes run [-180°, 180°), so the zone +12 side of the date line
            // is asked for by its zone, as a navigator keeping that zone's clocks would.
            DayWindow day = lon == 180.0 ? DayWindow.ofZone(date, 12) : DayWindow.zoneDay(date, still);
            // The day itself: same zone and span as the table's (its header states the convention).
            assertEquals(Integer.parseInt(row.get("zone_h")), day.zoneHours().getAsInt(), "zone, case " + row.get("case"));
            assertEquals(Instant.parse(row.get("day_start_utc")), day.startUtc(), "day start, case " + row.get("case"));
            DayEvents ev = planner.dayEvents(still, day, 0.0);
            for (Map.Entry<String, Function<DayEvents, Optional<Instant>>> e : EVENTS.entrySet()) {
                String ref = row.get(e.getKey());
                Optional<Instant> ours = e.getValue().apply(ev);
                if (ref.isEmpty() != ours.isEmpty()) {
                    PRESENCE_MISMATCH.add("case " + row.get("case") + " (" + row.get("label") + ") " + e.getKey()
                            + ": PyEphem '" + ref + "', ours " + ours.map(Instant::toString).orElse("none"));
                    continue;
                }
                if (ours.isPresent()) {
                    double d = Duration.between(Instant.parse(ref), ours.get()).toMillis() / 1000.0;
                    ERRORS_S.computeIfAbsent(e.getKey(), k -> new ArrayList<>()).add(d);
                    if (Math.abs(d) > 5) {
                        System.out.printf(Locale.ROOT, "PyEphem large: case %s %s %s lat %s %+.1f s%n", row.get("case"),
                                row.get("label"), e.getKey(), row.get("lat_deg"), d);
                    }
                }
            }
        }
        for (Map.Entry<String, List<Double>> e : ERRORS_S.entrySet()) {
            List<Double> v = e.getValue();
            double max = v.stream().mapToDouble(Math::abs).max().orElse(0);
            double rms = Math.sqrt(v.stream().mapToDouble(x -> x * x).average().orElse(0));
            System.out.printf(Locale.ROOT, "PyEphem %-14s n=%3d  max |d| %6.1f s  rms %5.1f s%n", e.getKey(), v.size(), max, rms);
        }
        PRESENCE_MISMATCH.forEach(m -> System.out.println("PyEphem presence differs: " + m));
    }

    @Test
    void everyEventWithinAMinuteOfPyEphem() {
        for (Map.Entry<String, List<Double>> e : ERRORS_S.entrySet()) {
            for (double d : e.getValue()) {
                assertEquals(0.0, d, ONE_MINUTE_S, e.getKey() + " vs PyEphem (s)");
            }
        }
        assertTrue(ERRORS_S.get("moonrise").size() > 250, "most days have a moonrise");
    }

    @Test
    void theSameEventsHappen() {
        assertEquals(List.of(), PRESENCE_MISMATCH, "events present in one and missing in the other");
    }
}
