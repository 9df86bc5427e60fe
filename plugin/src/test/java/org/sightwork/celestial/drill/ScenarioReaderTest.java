package org.sightwork.celestial.drill;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.sightwork.celestial.sight.Limb;

/** The scenario format: read, and every problem reported with file and field. */
class ScenarioReaderTest {

    @Test
    void theDemoReadsAndSaysItIsInvented() {
        Scenario s = Scenarios.demo();
        assertTrue(s.invented(), "the demo is marked invented");
        assertTrue(s.description().startsWith("INVENTED"), s.description());
        assertEquals(5, s.track().waypoints().size(), "waypoints");
        assertEquals(38 + 31.8 / 60, s.track().start().latDeg(), 1e-12, "departure latitude from d°m.m′");
        assertEquals(-(28 + 37.2 / 60), s.track().start().lonDeg(), 1e-12, "departure longitude, W negative");
        assertEquals(Limb.LOWER, s.schedule().sights().get(0).limb(), "limb");
        assertEquals(2, s.schedule().auto().orElseThrow().days().size(), "two auto days");
        assertTrue(s.gives(Scenario.Given.WATCH_ERROR), "watch error given");
        assertEquals(List.of("afternoon Sun"), s.fixes().stream().map(Scenario.FixRequest::session).toList(),
                "one explicit fix session by default");
    }

    @Test
    void everyProblemIsReportedTogetherWithItsField() {
        String json = Scenarios.demoJson()
                .replace("\"formatVersion\": 1", "\"formatVersion\": 2")
                .replace("\"lat\": \"38°27.0'N\"", "\"lat\": \"95N\"")
                .replace("\"lon\": \"028°24.0'W\", \"speedKn\": 5.5",
                        "\"lon\": \"028°24.0'W\", \"speedKn\": 5.5, \"utc\": \"2026-06-22T00:00:00Z\"")
                .replace("\"limb\": \"lower\"", "\"limb\": \"left\"")
                .replace("\"watchErrorS\": 12", "\"watchErrorS\": 12, \"colour\": \"red\"")
                .replace("\"departure\", \"indexError\"", "\"departure\", \"gps\", \"indexError\"");
        DrillException e = assertThrows(DrillException.class, () -> ScenarioReader.parse(json, "s.json"));
        List<String> p = e.problems();
        assertTrue(p.contains("s.json: field formatVersion: this program reads version 1, the file says 2"), p.toString());
        assertTrue(p.stream().anyMatch(x -> x.startsWith("s.json: field track.waypoints[0].lat: expected a latitude")),
                p.toString());
        assertTrue(p.contains("s.json: field track.waypoints[1]: expected either utc (arrival time) or speedKn (speed "
                + "over the ground on the leg), not both"), p.toString());
        assertTrue(p.contains("s.json: field sights[0].limb: expected lower, upper or centre, got 'left'"), p.toString());
        assertTrue(p.stream().anyMatch(x -> x.startsWith("s.json: field observer.colour: unknown field")), p.toString());
        assertTrue(p.contains("s.json: field given[2]: the GPS track is the answer and is always withheld from the student"),
                p.toString());
        assertEquals(7, p.size(), "both sights with the bad limb, and the rest: " + p);
    }

    @Test
    void brokenJsonIsReportedWithLineAndColumn() {
        DrillException e = assertThrows(DrillException.class,
                () -> ScenarioReader.parse("{\n  \"formatVersion\": 1,\n  \"title\": \"x\"\n  \"invented\": true\n}", "b.json"));
        assertTrue(e.getMessage().startsWith("b.json: line 4, column 3: not valid JSON"), e.getMessage());
    }

    @Test
    void aCurrentTooStrongForTheVesselIsRefused() {
        String json = Scenarios.passage(Scenarios.PERFECT, "{\"setDeg\": 300, \"driftKn\": 6.0}",
                Scenarios.eveningStars("a", "Vega", "Spica"), "{}");
        // Legs toward ~110° at 6 kn with 6 kn of current setting 300°: the vessel needs ~12 kn; but a
        // current setting along the leg at 6 kn needs 0 kn: refused.
        String along = Scenarios.passage(Scenarios.PERFECT, "{\"setDeg\": 110, \"driftKn\": 6.0}",
                Scenarios.eveningStars("a", "Vega", "Spica"), "{}");
        ScenarioReader.parse(json, "x.json");
        DrillException e = assertThrows(DrillException.class,
                () -> TrueTrack.of(ScenarioReader.parse(along, "y.json").track()));
        assertTrue(e.getMessage().contains("through the water"), e.getMessage());
    }
}
