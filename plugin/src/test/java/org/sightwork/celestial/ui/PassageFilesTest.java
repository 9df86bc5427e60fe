package org.sightwork.celestial.ui;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.sightwork.celestial.fix.FixOptions;
import org.sightwork.celestial.reduction.SightReducer;

/**
 * The passage file: a save, open and save again gives the same bytes (non-regression of our own
 * format); a damaged file opens read-only and is left as it was.
 */
class PassageFilesTest {

    private static Path demo(Path dir) throws Exception {
        for (String f : CelestialPlugin.DEMO_FILES) {
            try (InputStream in = CelestialPlugin.class.getResourceAsStream(CelestialPlugin.DEMO + f)) {
                Files.copy(in, dir.resolve(f), StandardCopyOption.REPLACE_EXISTING);
            }
        }
        return dir.resolve("demo-passage.json");
    }

    @Test
    void saveOpenSaveIsBitExact(@TempDir Path dir) throws Exception {
        PlotComputer pc = new PlotComputer(SightReducer.standard(), FixOptions.DEFAULTS);
        PassageFiles.Opened o = PassageFiles.open(demo(dir));
        assertTrue(o.passage().isPresent(), "the demo opens: " + o.message());
        Passage p = o.passage().get();
        assertEquals(7, p.rows().size(), "rows of the demo");
        Path a = dir.resolve("a.json");
        PassageFiles.save(p, pc.compute(p), a);
        Passage q = PassageFiles.open(a).passage().orElseThrow();
        Path b = dir.resolve("b.json");
        PassageFiles.save(q, pc.compute(q), b);
        assertArrayEquals(Files.readAllBytes(a), Files.readAllBytes(b), "save, open, save: same bytes");
        Plot plot = pc.compute(q);
        assertEquals(2, plot.fixes().size(), "the day's running fix and the twilight fix");
        assertTrue(plot.fixes().stream().allMatch(f -> f.fix().isPresent()), "both fixes worked");
    }

    @Test
    void aDamagedFileOpensReadOnlyAndIsKept(@TempDir Path dir) throws Exception {
        Path f = dir.resolve("broken.json");
        byte[] damaged = "{\"formatVersion\": 1, \"name\": \"half writ".getBytes(java.nio.charset.StandardCharsets.UTF_8);
        Files.write(f, damaged);
        PassageFiles.Opened o = PassageFiles.open(f);
        assertTrue(o.readOnly(), "read-only");
        assertTrue(o.message().contains("damaged"), "says so: " + o.message());
        assertArrayEquals(damaged, Files.readAllBytes(f), "the damaged file is left as it was");
    }

    @Test
    void aNewerFormatOpensReadOnly(@TempDir Path dir) throws Exception {
        Path f = demo(dir);
        Files.writeString(f, Files.readString(f).replaceFirst("\"formatVersion\" : 1", "\"formatVersion\" : 99"));
        PassageFiles.Opened o = PassageFiles.open(f);
        assertTrue(o.readOnly(), "read-only");
        assertTrue(o.message().contains("newer"), "says why: " + o.message());
    }

    @Test
    void aRowTypedBadlyIsKeptAndMarked(@TempDir Path dir) throws Exception {
        PlotComputer pc = new PlotComputer(SightReducer.standard(), FixOptions.DEFAULTS);
        Passage p = PassageFiles.open(demo(dir)).passage().orElseThrow();
        double before = pc.compute(p).sights().get(0).reduced().orElseThrow().lop().interceptNm();
        double hsDeg = org.sightwork.geo.earth.Angles.parse(p.rows().get(0).get(SightColumn.HS));
        p.rows().get(0).set(SightColumn.HS, "48 71.0");
        Plot bad = pc.compute(p);
        assertTrue(bad.sights().get(0).read().problems().containsKey(SightColumn.HS), "the Hs cell is marked");
        p.rows().get(0).set(SightColumn.HS, org.sightwork.geo.earth.Angles.formatDm(hsDeg + 1.0 / 60.0, 2));
        double after = pc.compute(p).sights().get(0).reduced().orElseThrow().lop().interceptNm();
        // Hs up 1.0': Ho rises by 1.0' (all corrections unchanged to 0.01'), so the intercept by 1.0 nm.
        assertEquals(before + 1.0, after, 0.02, "editing Hs moves the line by the change in minutes");
    }
}
