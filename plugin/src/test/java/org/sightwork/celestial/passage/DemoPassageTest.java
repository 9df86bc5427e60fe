package org.sightwork.celestial.passage;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.sightwork.geo.app.Main;

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
        DemoPassageGenerator.write(tmp);
        for (String f : new String[] {"demo-gps.nmea", "demo-dr.csv", "demo-observations.csv", "demo-true-track.csv"}) {
            assertEquals(Files.readString(DEMO.resolve(f)), Files.readString(tmp.resolve(f)),
                    f + " differs from the generator's output: rerun DemoPassageGenerator.main");
        }
    }

    @Test
    void compareFindsTheInventedSpoofing() throws IOException {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        Path report = tmp.resolve("report.html");
        int code = Main.run(new String[] {"compare", "--sights", DEMO.resolve("demo-observations.csv").toString(),
            "--dr", DEMO.resolve("demo-dr.csv").toString(), "--gps", DEMO.resolve("demo-gps.nmea").toString(),
            "--report", report.toString()}, new PrintWriter(out), new PrintWriter(err));
        assertEquals(0, code, err.toString());
        String text = out.toString();
        assertTrue(text.contains("CAUTION"), "the caution is shown");
        assertTrue(text.contains("GPS integrity: INCONSISTENT"), text);
        assertTrue(text.contains("step offset, 2026-06-21T06:59:00Z"), "the step at 07:00 is named: " + text);
        assertTrue(text.contains("slow drift away"), "the drift is named: " + text);
        String html = Files.readString(report);
        assertTrue(html.contains("<svg"), "inline SVG plots");
        assertTrue(!html.contains("<script") && !html.contains("src=") && !html.contains("href="), "nothing fetched");
        // DR from the log's HDT and VHW when --dr is left out.
        StringWriter out2 = new StringWriter();
        int code2 = Main.run(new String[] {"compare", "--sights", DEMO.resolve("demo-observations.csv").toString(),
            "--gps", DEMO.resolve("demo-gps.nmea").toString(), "--format", "json"}, new PrintWriter(out2),
                new PrintWriter(new StringWriter()));
        assertEquals(0, code2, "json run");
        assertTrue(out2.toString().contains("\"verdict\" : \"inconsistent\""), out2.toString());
    }

    @Test
    void badInputIsAUsageError() {
        StringWriter err = new StringWriter();
        int code = Main.run(new String[] {"compare", "--sights", tmp.resolve("missing.csv").toString(), "--gps",
            DEMO.resolve("demo-gps.nmea").toString()}, new PrintWriter(new StringWriter()), new PrintWriter(err));
        assertTrue(code != 0, "fails");
        assertTrue(err.toString().contains("missing.csv"), err.toString());
    }
}
