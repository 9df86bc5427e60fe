package org.sightwork.celestial.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.sightwork.geo.testing.CliRun.run;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.sightwork.celestial.reduction.Sphere;
import org.sightwork.geo.earth.GeoPosition;
import org.sightwork.geo.testing.CliRun;

/**
 * End to end through the command line: sight logs made from a chosen true track (corrections in
 * reverse, {@link ExampleLog}) must fix back to it; bad input gets a navigator's message.
 */
class FixCommandTest {

    @TempDir
    Path dir;

    @Test
    void exactSightsFixBackToTheTruthAtHighLatitudeAndTheDateLine() throws Exception {
        // Exact sights (no error) made from the truth, written with Hs to 1e-8°; the log's DR is
        // 3 nm off; the fix must come back within 0.01 nm, the loop's stopping rule.
        Instant t = Instant.parse("2025-03-14T09:05:00Z");
        List<ExampleLog.Planned> plan = List.of(new ExampleLog.Planned("Sirius", "", t),
                new ExampleLog.Planned("Arcturus", "", t.plusSeconds(60)),
                new ExampleLog.Planned("Capella", "", t.plusSeconds(120)),
                new ExampleLog.Planned("Vega", "", t.plusSeconds(180)),
                new ExampleLog.Planned("Canopus", "", t.plusSeconds(200)),
                new ExampleLog.Planned("Polaris", "", t.plusSeconds(240)));
        for (GeoPosition truth : new GeoPosition[] {GeoPosition.of(38.5, -35.0), GeoPosition.of(12.0, 179.98), GeoPosition.of(80.0, 20.0),
            GeoPosition.of(-40.0, -179.99)}) {
            String csv = ExampleLog.csv(truth, t, 0.0, 0.0, 3.0, plan.stream()
                    .filter(p -> visible(p, truth)).toList(), 0.0, 1L);
            Path log = dir.resolve("exact.csv");
            Files.writeString(log, csv);
            CliRun r = run("fix", log.toString(), "--format", "json", "--window-min", "10");
            JsonNode fix = new ObjectMapper().readTree(r.out()).get("fixes").get(0);
            GeoPosition p = GeoPosition.of(fix.get("latDeg").asDouble(), fix.get("lonDeg").asDouble());
            assertEquals(0.0, Sphere.distanceNm(truth, p), 0.01, "fix at " + truth + "\n" + r.out() + r.err());
        }
    }

    private static boolean visible(ExampleLog.Planned p, GeoPosition truth) {
        var a = org.sightwork.celestial.almanac.Almanac.standard();
        var pos = a.position(a.body(p.body()), org.sightwork.celestial.time.AstroTime.ofUtc(p.utc()));
        double hc = org.sightwork.celestial.reduction.SightReduction.reduce(truth, pos.ghaDeg(), pos.decDeg()).hcDeg();
        return hc > 12.0 && hc < 75.0;
    }

    @Test
    void badInputGetsNavigatorsMessagesAndTheGoodRowsGoOn() throws Exception {
        Path log = dir.resolve("bad.csv");
        Files.writeString(log, String.join("\n",
                "utc,body,hs,index_error,eye_height_m,dr_lat,dr_lon",
                "2025-03-14T09:05:00Z,Sirius,95 10.0,,2.5,38 30N,35W",
                "2025-03-14T09:06:00Z,Sirius,20 10.0,12 on,2.5,38 30N,35W",
                "not a time,Vega,30,,2.5,38 30N,35W",
                "2025-03-14T09:07:00Z,Siriuss,30,,2.5,38 30N,35W",
                "2025-03-14T12:00:00Z,Sirius,30,,2.5,38 30N,35W",
                "2025-03-14T09:08:00Z,Arcturus,34 50.8,,2.5,38 30N,35W", ""));
        CliRun r = run("reduce", log.toString());
        assertTrue(r.err().contains("bad.csv:2: column 3 (hs):"), r.err());
        assertTrue(r.err().contains("outside -1° to 90°"), "Hs above 90°: " + r.err());
        assertTrue(r.err().contains("bad.csv:3:") && r.err().contains("larger than 10′"), "index error: " + r.err());
        assertTrue(r.err().contains("bad.csv:4: column 1 (utc)"), "bad time: " + r.err());
        assertTrue(r.err().contains("bad.csv:5:") && r.err().contains("Siriuss"), "unknown body: " + r.err());
        assertTrue(r.err().contains("bad.csv:6:") && r.err().contains("below the horizon"), "below horizon: " + r.err());
        assertTrue(r.out().contains("Arcturus"), "the good row goes on");
        assertFalse(r.err().contains("Exception"), "no stack trace: " + r.err());
        assertEquals(2, r.code(), "input problems: exit 2");
    }

    @Test
    void runningFixWithoutCourseAndSpeedIsRefusedInWords() throws Exception {
        Path log = dir.resolve("nodr.csv");
        Files.writeString(log, String.join("\n",
                "utc,body,hs,eye_height_m,dr_lat,dr_lon",
                "2025-03-14T12:40:00Z,Sun,41 45.0,2.5,38 25N,35 28W",
                "2025-03-14T15:55:00Z,Sun,45 03.9,2.5,38 18N,35 54W", ""));
        CliRun r = run("fix", log.toString(), "--running-fix-at", "2025-03-14T15:55:00Z");
        assertTrue(r.err().contains("course and speed"), r.err());
        assertEquals(1, r.code(), "no fix: exit 1");
        assertFalse(r.err().contains("Exception"), r.err());
    }

    @Test
    void shallowCrossingIsRefusedInWords() throws Exception {
        Path log = dir.resolve("shallow.csv");
        // Two Sun sights 2 minutes apart: their lines cross at well under a degree.
        Files.writeString(log, String.join("\n",
                "utc,body,hs,eye_height_m,dr_lat,dr_lon",
                "2025-03-14T12:40:00Z,Sun,41 45.0,2.5,38 25N,35 28W",
                "2025-03-14T12:40:30Z,Sun,41 46.0,2.5,38 25N,35 28W", ""));
        CliRun r = run("fix", log.toString());
        assertTrue(r.err().contains("too shallow"), r.err());
    }

    @Test
    void theExampleLogReadsCleanly() throws Exception {
        Path example = Path.of("..", "docs", "examples", "petrel-sights.csv");
        CliRun r = run("fix", example.toString(), "--format", "json", "--running-fix-at", "2025-03-14T15:55:00Z");
        assertEquals(0, r.code(), r.err());
        JsonNode fix = new ObjectMapper().readTree(r.out()).get("fixes").get(0);
        // The invented true track: 38°30'N 35°W at 09:00Z, 250° at 6.5 kn (see the file's header);
        // 0.7' errors and a 5 % DR error: within the 95 % ellipse's major axis.
        GeoPosition truth = Sphere.rhumb(GeoPosition.of(38.5, -35.0), 250.0, 6.5 * 6.9166667);
        GeoPosition p = GeoPosition.of(fix.get("latDeg").asDouble(), fix.get("lonDeg").asDouble());
        assertTrue(Sphere.distanceNm(truth, p) < fix.get("ellipse95").get("majorNm").asDouble(),
                "running fix near the invented truth: " + Sphere.distanceNm(truth, p));
    }

    @Test
    void noonSightAndPolarisGiveTheLatitudeAndNoonIsPredicted() throws Exception {
        // Exact sights from a chosen position: the Sun at the local apparent noon predicted from
        // the almanac, Polaris at night; reduce prints both latitudes, equal to the truth to 0.1'.
        GeoPosition truth = GeoPosition.of(38.5, -35.0);
        var almanac = org.sightwork.celestial.almanac.Almanac.standard();
        org.sightwork.celestial.reduction.GhaDecSource sun = t -> {
            var p = almanac.position(org.sightwork.celestial.almanac.Body.SUN,
                    org.sightwork.celestial.time.AstroTime.ofUtc(t));
            return new org.sightwork.celestial.reduction.GhaDecSource.GhaDec(p.ghaDeg(), p.decDeg());
        };
        Instant noon = org.sightwork.celestial.reduction.LocalApparentNoon.next(Instant.parse("2025-03-14T06:00:00Z"),
                truth, 0.0, 0.0, sun).utc();
        List<ExampleLog.Planned> plan = List.of(new ExampleLog.Planned("Polaris", "", Instant.parse("2025-03-14T23:00:00Z")),
                new ExampleLog.Planned("Sun", "LOWER", noon));
        Path log = dir.resolve("lat.csv");
        Files.writeString(log, ExampleLog.csv(truth, noon, 0.0, 0.0, 0.0, plan, 0.0, 1L));
        CliRun r = run("reduce", log.toString(), "--format", "json", "--noon");
        JsonNode root = new ObjectMapper().readTree(r.out());
        String lat = org.sightwork.geo.earth.Angles.formatLatitude(truth.latDeg());
        assertEquals("latitude by Polaris " + lat, root.get("sights").get(0).get("latitude").asText(), r.out());
        assertEquals("latitude by meridian altitude " + lat, root.get("sights").get(1).get("latitude").asText(), r.out());
        // The next noon after the last sight (hove-to at the truth) is a day later, within 30 s.
        Instant next = Instant.parse(root.get("noon").get("utc").asText());
        assertEquals(86400.0, java.time.Duration.between(noon, next).toSeconds(), 30.0, "next day's noon");
    }

    @Test
    void severalShotsOfOneBodyAreFittedAndTheBadShotLeftOut() throws Exception {
        // Exact shots from a chosen position; one shot of Sirius made 6' high by hand. With
        // --average-min the five Sirius shots become one fitted sight, the bad one left out, and
        // the fix comes back to the truth (the remaining shots are exact: within 0.02 nm).
        GeoPosition truth = GeoPosition.of(20.0, 60.0);
        Instant t = Instant.parse("2025-03-14T15:00:00Z");
        List<ExampleLog.Planned> plan = new java.util.ArrayList<>();
        for (int i = 0; i < 5; i++) {
            plan.add(new ExampleLog.Planned("Sirius", "", t.plusSeconds(45L * i)));
        }
        plan.add(new ExampleLog.Planned("Canopus", "", t.plusSeconds(300)));
        plan.add(new ExampleLog.Planned("Rigel", "", t.plusSeconds(360)));
        plan.add(new ExampleLog.Planned("Procyon", "", t.plusSeconds(420)));
        plan = plan.stream().filter(p -> visible(p, truth)).toList();
        String[] rows = ExampleLog.csv(truth, t, 90.0, 5.0, 2.0, plan, 0.0, 1L).split("\n");
        String[] cells = rows[3].split(",");
        cells[3] = String.format(java.util.Locale.ROOT, "%.8f", Double.parseDouble(cells[3]) + 0.1);
        rows[3] = String.join(",", cells);
        Path log = dir.resolve("shots.csv");
        Files.writeString(log, String.join("\n", rows) + "\n");
        CliRun r = run("fix", log.toString(), "--format", "json", "--average-min", "5");
        JsonNode root = new ObjectMapper().readTree(r.out());
        assertTrue(root.get("averaged").get(0).asText().contains("left out"), r.out());
        JsonNode fix = root.get("fixes").get(0);
        assertEquals(plan.size() - 4, fix.get("sights").size(), "one line for the five Sirius shots");
        GeoPosition p = GeoPosition.of(fix.get("latDeg").asDouble(), fix.get("lonDeg").asDouble());
        GeoPosition truthAtFix = Sphere.rhumb(truth, 90.0, 5.0 * java.time.Duration.between(t,
                Instant.parse(fix.get("utc").asText())).toSeconds() / 3600.0);
        assertEquals(0.0, Sphere.distanceNm(truthAtFix, p), 0.02, r.out());
    }

    @Test
    void morningNoonAndAfternoonSunGiveTwoRunningFixes() throws Exception {
        // Exact Sun sights (no error) from a chosen track, 250° at 6.5 kn, about 3 h apart, the
        // log's DR 3 nm off: each lone line is advanced along the DR to the next (common practice,
        // "Sun-run-Sun"), the noon line serving in both running fixes. The log's DR runs on the
        // track's own course and speed, so each running fix comes back to the truth within the
        // loop's stopping rule (0.01 nm).
        GeoPosition start = GeoPosition.of(38.5, -35.0);
        Instant t0 = Instant.parse("2025-03-14T09:00:00Z");
        List<ExampleLog.Planned> plan = List.of(new ExampleLog.Planned("Sun", "LOWER", Instant.parse("2025-03-14T11:10:00Z")),
                new ExampleLog.Planned("Sun", "LOWER", Instant.parse("2025-03-14T14:20:00Z")),
                new ExampleLog.Planned("Sun", "LOWER", Instant.parse("2025-03-14T17:20:00Z")));
        Path log = dir.resolve("suns.csv");
        Files.writeString(log, ExampleLog.csv(start, t0, 250.0, 6.5, 3.0, plan, 0.0, 1L));
        CliRun r = run("fix", log.toString(), "--format", "json");
        assertEquals(0, r.code(), r.err());
        assertEquals("", r.err(), "nothing to complain about");
        JsonNode fixes = new ObjectMapper().readTree(r.out()).get("fixes");
        assertEquals(2, fixes.size(), r.out());
        for (int i = 0; i < 2; i++) {
            JsonNode f = fixes.get(i);
            Instant at = Instant.parse(f.get("utc").asText());
            assertEquals(plan.get(i + 1).utc(), at, "running fix at the later sight");
            assertTrue(f.get("running").asBoolean(), "marked as a running fix");
            GeoPosition truth = Sphere.rhumb(start, 250.0, 6.5 * java.time.Duration.between(t0, at).toSeconds() / 3600.0);
            GeoPosition p = GeoPosition.of(f.get("latDeg").asDouble(), f.get("lonDeg").asDouble());
            assertEquals(0.0, Sphere.distanceNm(truth, p), 0.01, "running fix " + i + "\n" + r.out());
        }
    }

    @Test
    void aLoneLineIsReportedOnceOnStandardErrorNamingTheRunningFixOption() throws Exception {
        // The invented example's two Sun lines are 3.3 h apart: with --advance-max-h 2 neither is
        // advanced, and each is reported once, on standard error only.
        Path example = Path.of("..", "docs", "examples", "petrel-sights.csv");
        CliRun r = run("fix", example.toString(), "--advance-max-h", "2");
        assertEquals(2, r.code(), "a fix, and lines that gave none: exit 2");
        String[] lines = r.err().strip().split("\n");
        assertEquals(2, lines.length, r.err());
        for (String l : lines) {
            assertTrue(l.contains("one line of position") && l.contains("--running-fix-at TIME"), l);
        }
        assertFalse(r.out().contains("one line of position"), "not repeated on standard output: " + r.out());
        assertTrue(r.out().startsWith("Fix 2025-03-14T09:10:15Z"), r.out());
    }

    @Test
    void perSightCsvListsEverySightsResidual() throws Exception {
        // The same fixes as the JSON output, one CSV row per sight: same residuals to the CSV's 0.001 nm.
        Path example = Path.of("..", "docs", "examples", "petrel-sights.csv");
        CliRun csv = run("fix", example.toString(), "--format", "csv", "--per-sight");
        CliRun json = run("fix", example.toString(), "--format", "json");
        assertEquals(0, csv.code(), csv.err());
        String[] rows = csv.out().strip().split("\n");
        assertEquals(FixCommand.PER_SIGHT_HEADER, rows[0], "header");
        List<Double> residuals = new java.util.ArrayList<>();
        for (JsonNode f : new ObjectMapper().readTree(json.out()).get("fixes")) {
            for (JsonNode s : f.get("sights")) {
                residuals.add(s.get("residualNm").asDouble());
            }
        }
        assertEquals(residuals.size(), rows.length - 1, "one row per sight of every fix");
        for (int i = 1; i < rows.length; i++) {
            String[] c = rows[i].split(",");
            assertEquals(residuals.get(i - 1), Double.parseDouble(c[8]), 0.0005, "residual, row " + i);
        }
        CliRun wrong = run("fix", example.toString(), "--per-sight");
        assertEquals(2, wrong.code(), "--per-sight without csv is a usage error");
        assertTrue(wrong.err().contains("--per-sight goes with --format csv"), wrong.err());
    }
}
