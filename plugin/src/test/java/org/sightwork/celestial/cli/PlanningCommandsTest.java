package org.sightwork.celestial.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.time.Instant;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.sightwork.geo.app.Main;

/**
 * The planning commands end to end, through the launcher's command line: JSON keys and values,
 * text, PNG output and the usage errors (exit 2 with a message naming the option).
 */
class PlanningCommandsTest {

    private record Run(int code, String out, String err) {
    }

    private static Run run(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int code = Main.run(args, new PrintWriter(out, true), new PrintWriter(err, true));
        return new Run(code, out.toString(), err.toString());
    }

    @Test
    void planJsonHasTheDaysTimesUnderTheirKeys() throws Exception {
        // Greenwich 51.4769°N 0°, 2000-01-01: PyEphem 4.1.4 (planning-pyephem.tsv, case 317) has
        // sunrise 08:05:35Z, sunset 16:01:10Z, transit 12:03:17Z, moonrise 02:40:18Z.
        Run r = run("plan", "--dr", "51.4769,0", "--date", "2000-01-01", "--transit", "sun,Jupiter", "--format", "json");
        assertEquals(0, r.code(), r.err());
        JsonNode j = new ObjectMapper().readTree(r.out());
        for (String k : List.of("sunrise", "sunset", "civilDawn", "civilDusk", "nauticalDawn", "nauticalDusk",
                "meridianPassage", "moonrise", "moonset")) {
            assertTrue(j.has(k), "key " + k);
        }
        assertEquals(0.0, secondsBetween("2000-01-01T08:05:35Z", j.get("sunrise").asText()), 60, "sunrise");
        assertEquals(0.0, secondsBetween("2000-01-01T16:01:10Z", j.get("sunset").asText()), 60, "sunset");
        assertEquals(0.0, secondsBetween("2000-01-01T12:03:17Z", j.get("meridianPassage").asText()), 60, "transit");
        assertEquals(0.0, secondsBetween("2000-01-01T02:40:18Z", j.get("moonrise").asText()), 60, "moonrise");
        assertEquals(3, j.get("eveningStars").get("chosen").size(), "three stars proposed");
        // The Sun's transit asked for by name is the meridian passage itself.
        assertEquals(j.get("meridianPassage").asText(), j.get("transits").get("Sun").asText(), "Sun transit");
        assertTrue(j.get("transits").get("Jupiter").isTextual(), "Jupiter transits that day");
        assertTrue(j.get("caution").asText().startsWith("CAUTION"), "caution");
    }

    @Test
    void polarDayGivesNulls() throws Exception {
        // PyEphem (planning-pyephem.tsv, case 301): 70°N 20°E on 2024-06-21, Sun always up.
        Run r = run("plan", "--dr", "70N,20E", "--date", "2024-06-21", "--format", "json");
        assertEquals(0, r.code(), r.err());
        JsonNode j = new ObjectMapper().readTree(r.out());
        assertTrue(j.get("sunrise").isNull() && j.get("sunset").isNull(), "no sunrise or sunset");
        assertTrue(j.get("nauticalDawn").isNull(), "no twilight");
        assertTrue(j.get("morningStars").isNull(), "no star plan");
        assertEquals("ALWAYS_UP", j.get("sunDay").asText(), "midnight sun");
        assertTrue(j.get("meridianPassage").isTextual(), "noon still");
    }

    @Test
    void planTextWithShipRunAndSkyPng(@TempDir Path dir) throws Exception {
        Path png = dir.resolve("sky.png");
        Run r = run("plan", "--dr", "17°00'S,178°00'E", "--date", "2024-03-01", "--course", "090", "--speed", "25",
                "--sky-png", png.toString());
        assertEquals(0, r.code(), r.err());
        assertTrue(r.out().contains("sunrise") && r.out().contains("meridian passage"), r.out());
        assertTrue(r.out().contains("W"), "the DR runs into west longitude");
        assertTrue(r.out().contains("CAUTION"), "caution");
        assertTrue(Files.size(png) > 10_000, "PNG written");
    }

    @Test
    void utcDayStartsAtMidnightUtc() throws Exception {
        Run r = run("plan", "--dr", "10,150", "--date", "2026-06-01", "--utc-day", "--format", "json");
        assertEquals(0, r.code(), r.err());
        JsonNode j = new ObjectMapper().readTree(r.out());
        assertEquals("2026-06-01T00:00:00Z", j.get("dayStartUtc").asText(), "UTC day");
        assertTrue(j.get("zoneHours").isNull(), "no zone");
    }

    @Test
    void identifyFindsVega() throws Exception {
        // Hc/Zn of Vega from our own almanac (validated against swetest), given back as a sextant
        // reading at sea level (refraction added back by the same mean formula).
        Run plan = run("plan", "--dr", "35,-40", "--date", "2026-09-12", "--format", "json");
        JsonNode vis = new ObjectMapper().readTree(plan.out()).get("eveningStars");
        JsonNode vega = null;
        for (JsonNode b : vis.get("visible")) {
            if (b.get("body").asText().equals("Vega")) {
                vega = b;
            }
        }
        assertTrue(vega != null, "Vega is up");
        Run r = run("identify", "--at", vis.get("timeUtc").asText(), "--dr", "35,-40",
                "--alt", String.valueOf(vega.get("presetHsDeg").asDouble()), "--az",
                String.valueOf(Math.round(vega.get("znDeg").asDouble())), "--format", "json");
        assertEquals(0, r.code(), r.err());
        JsonNode j = new ObjectMapper().readTree(r.out());
        assertEquals("Vega", j.get("best").get("body").asText(), "identified");
        assertTrue(j.get("best").get("missDeg").asDouble() < 0.5, "miss under half a degree");
        assertTrue(j.has("runnerUp"), "runner-up");
    }

    @Test
    void compassByAmplitudeAndAzimuth() throws Exception {
        Run a = run("compass", "--date", "2026-03-20", "--dr", "0,0", "--amplitude", "rising", "--bearing", "92",
                "--variation", "3W", "--format", "json");
        assertEquals(0, a.code(), a.err());
        JsonNode j = new ObjectMapper().readTree(a.out());
        // At the equinox on the equator the Sun rises nearly due east: amplitude under 0.5°
        // (sin A = sin Dec / cos Lat with |Dec| < 0.5° that day; from memory).
        assertTrue(Math.abs(j.get("amplitudeDeg").asDouble()) < 0.5, "amplitude near zero");
        double ce = j.get("compassErrorDeg").asDouble();
        assertEquals(j.get("trueAzimuthDeg").asDouble() - 92.0, ce, 1e-9, "compass error = true − compass");
        assertEquals(ce + 3.0, j.get("deviationDeg").asDouble(), 1e-9, "deviation = error − variation (3°W = −3°)");
        Run z = run("compass", "--at", "2026-06-21T08:00Z", "--dr", "45N,10W", "--body", "sun", "--bearing", "100");
        assertEquals(0, z.code(), z.err());
        assertTrue(z.out().contains("compass error"), z.out());
    }

    @Test
    void badInputIsAUsageErrorNamingTheOption() {
        Run r = run("plan", "--dr", "95N,10W", "--date", "2026-01-01");
        assertEquals(2, r.code(), "exit code");
        assertTrue(r.err().contains("--dr") && r.err().contains("beyond 90"), r.err());
        r = run("plan", "--dr", "10,10", "--date", "2026-13-01");
        assertEquals(2, r.code(), "exit code");
        assertTrue(r.err().contains("--date") && r.err().contains("YYYY-MM-DD"), r.err());
        r = run("plan", "--dr", "10,10", "--date", "2026-01-01", "--set-size", "7");
        assertEquals(2, r.code(), "exit code");
        assertTrue(r.err().contains("set size 7"), r.err());
        r = run("identify", "--at", "yesterday", "--dr", "10,10", "--alt", "30", "--az", "100");
        assertEquals(2, r.code(), "exit code");
        assertTrue(r.err().contains("--at") && r.err().contains("ISO 8601"), r.err());
        r = run("compass", "--at", "2026-01-01T00:00Z", "--dr", "10,10", "--body", "Sirrius");
        assertEquals(2, r.code(), "exit code");
        assertTrue(r.err().contains("Sirius"), "suggests the nearest name: " + r.err());
        r = run("compass", "--dr", "10,10");
        assertEquals(2, r.code(), "exit code");
        assertTrue(r.err().contains("--amplitude"), r.err());
    }

    private static double secondsBetween(String a, String b) {
        return Duration.between(Instant.parse(a), Instant.parse(b)).toMillis() / 1000.0;
    }
}
