package org.sightwork.celestial.passage;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.sightwork.geo.testing.CliRun;

/**
 * The bundled demo passage (invented data). Non-regression: the committed files are what
 * {@link DemoPassageGenerator} writes. Then the command line on them: the invented spoofing episode
 * (a 3 nm step from 07:00 to 12:00 UTC, a 0.5 kn drift from 15:00) must be found and named.
 */
class DemoPassageTest {

    private static final Path DEMO = Path.of("src/main/resources/org/sightwork/celestial/demo");

    @TempDir
    Path tmp;

    @Test
    void committedDemoFilesAreWhatTheGeneratorWrites() throws IOException {
        if (Boolean.getBoolean("sightwork.makeDemo")) {
            DemoPassageGenerator.write(DEMO); // rewrite the committed files, then check them as usual
        }
        DemoPassageGenerator.write(tmp);
        for (String f : new String[] {"demo-gps.nmea", "demo-dr.csv", "demo-observations.csv", "demo-true-track.csv"}) {
            assertEquals(Files.readString(DEMO.resolve(f)), Files.readString(tmp.resolve(f)),
                    f + " differs from the generator's output: rerun DemoPassageGenerator.main");
        }
    }

    @Test
    void compareFindsTheInventedSpoofing() throws IOException {
        Path report = tmp.resolve("report.html");
        CliRun r = CliRun.run("compare", "--sights", DEMO.resolve("demo-observations.csv").toString(),
            "--dr", DEMO.resolve("demo-dr.csv").toString(), "--gps", DEMO.resolve("demo-gps.nmea").toString(),
            "--report", report.toString());
        assertEquals(0, r.code(), r.err());
        String text = r.out();
        assertTrue(text.contains("CAUTION"), "the caution is shown");
        assertTrue(text.contains("GPS integrity: INCONSISTENT"), text);
        assertTrue(text.contains("step offset, 2026-06-21T06:59:00Z"), "the step at 07:00 is named: " + text);
        assertTrue(text.contains("slow drift away"), "the drift is named: " + text);
        String html = Files.readString(report);
        assertTrue(html.contains("<svg"), "inline SVG plots");
        assertTrue(!html.contains("<script") && !html.contains("src=") && !html.contains("href="), "nothing fetched");
        // DR from the log's HDT and VHW when --dr is left out.
        CliRun json = CliRun.run("compare", "--sights", DEMO.resolve("demo-observations.csv").toString(),
            "--gps", DEMO.resolve("demo-gps.nmea").toString(), "--format", "json");
        assertEquals(0, json.code(), "json run");
        assertTrue(json.out().contains("\"verdict\" : \"inconsistent\""), json.out());
    }

    @Test
    void badInputIsAUsageError() {
        CliRun r = CliRun.run("compare", "--sights", tmp.resolve("missing.csv").toString(), "--gps",
            DEMO.resolve("demo-gps.nmea").toString());
        assertTrue(r.code() != 0, "fails");
        assertTrue(r.err().contains("missing.csv"), r.err());
    }
}
