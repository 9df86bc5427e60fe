package org.sightwork.celestial.ui;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Opening and saving a passage gives the same bytes in every run of the program, not only within
 * one: each run is a fresh JVM (whose hash seeds, and so the order of unordered maps, differ from
 * run to run), opening the demo passage and saving it. Non-regression of our own format.
 */
class RoundTripAcrossRunsTest {

    static final int RUNS = 3;

    @Test
    void everyRunWritesTheSameBytes(@TempDir Path dir) throws Exception {
        for (String f : CelestialPlugin.DEMO_FILES) {
            try (InputStream in = CelestialPlugin.class.getResourceAsStream(CelestialPlugin.DEMO + f)) {
                Files.copy(in, dir.resolve(f), StandardCopyOption.REPLACE_EXISTING);
            }
        }
        Path demo = dir.resolve("demo-passage.json");
        String java = Path.of(System.getProperty("java.home"), "bin", "java").toString();
        byte[] first = null;
        for (int run = 0; run < RUNS; run++) {
            Path out = dir.resolve("run" + run + ".json");
            // Each run opens the previous run's file (the first opens the demo): open, save, open, save...
            Path in = run == 0 ? demo : dir.resolve("run" + (run - 1) + ".json");
            Process p = new ProcessBuilder(java, "-Xmx512m", "-cp", System.getProperty("java.class.path"),
                    ResaveMain.class.getName(), in.toString(), out.toString()).inheritIO().start();
            if (!p.waitFor(120, TimeUnit.SECONDS)) {
                p.destroyForcibly();
                throw new AssertionError("run " + run + " did not finish in 120 s");
            }
            assertEquals(0, p.exitValue(), "run " + run + " exit code");
            byte[] bytes = Files.readAllBytes(out);
            if (first == null) {
                first = bytes;
            } else {
                assertArrayEquals(first, bytes, "run " + run + " wrote other bytes than run 0 (" + out + ")");
            }
        }
    }
}
