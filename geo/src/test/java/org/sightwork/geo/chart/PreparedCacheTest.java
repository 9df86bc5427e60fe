package org.sightwork.geo.chart;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.sightwork.geo.testing.TestCharts;

/**
 * Non-regression tests of the prepared-chart cache: what is read back is exactly what was prepared
 * (every band, every part, bit for bit); a chart file that changed, or a damaged cache entry, is
 * read afresh from the chart file. The prepared data itself is validated by the pixel tests
 * ({@code ChartPixelTest}, against GSHHG and GMT) with the cache off.
 */
class PreparedCacheTest {

    @TempDir
    Path cache;
    private String before;

    @BeforeEach
    void useTemporaryCache() {
        before = System.getProperty(PreparedCache.DIRECTORY_PROPERTY);
        System.setProperty(PreparedCache.DIRECTORY_PROPERTY, cache.toString());
    }

    @AfterEach
    void restore() {
        if (before == null) {
            System.clearProperty(PreparedCache.DIRECTORY_PROPERTY);
        } else {
            System.setProperty(PreparedCache.DIRECTORY_PROPERTY, before);
        }
    }

    private List<Path> entries() throws IOException {
        try (Stream<Path> s = Files.list(cache)) {
            return s.filter(p -> p.toString().endsWith(".prepared")).toList();
        }
    }

    @Test
    void readsBackExactlyWhatWasPrepared() throws IOException {
        Path demo = TestCharts.file("demo-region.gpkg");
        ChartSet fresh = ChartSet.load(List.of(demo), false, f -> { });
        assertTrue(fresh.layers().stream().noneMatch(PreparedLayer::isRestored), "first opening reads the file");
        fresh.generalise(f -> { });
        assertEquals(1, entries().size(), "one cache entry for the one file");

        ChartSet again = ChartSet.load(List.of(demo), false, f -> { });
        assertEquals(fresh.layers().size(), again.layers().size(), "layers");
        assertTrue(again.problems().isEmpty(), "no problems");
        assertEquals(fresh.extentDeg(), again.extentDeg(), "extent");
        for (int l = 0; l < fresh.layers().size(); l++) {
            PreparedLayer a = fresh.layers().get(l);
            PreparedLayer b = again.layers().get(l);
            assertTrue(b.isRestored() && b.isGeneralised(), "second opening from the cache, every band ready");
            assertEquals(a.layer().name(), b.layer().name(), "layer name");
            assertEquals(a.layer().featureClass(), b.layer().featureClass(), "class");
            assertEquals(a.labels(), b.labels(), "labels");
            for (int band = 0; band < PreparedLayer.bandCount(); band++) {
                List<PreparedLayer.Part> pa = a.parts(band);
                List<PreparedLayer.Part> pb = b.parts(band);
                assertEquals(pa.size(), pb.size(), a.layer().name() + " band " + band + ": parts");
                assertEquals(a.vertexCount(band), b.vertexCount(band), a.layer().name() + " band " + band);
                for (int k = 0; k < pa.size(); k++) {
                    assertEquals(pa.get(k).n(), pb.get(k).n(), "points");
                    assertEquals(pa.get(k).closed(), pb.get(k).closed(), "closed");
                    assertEquals(pa.get(k).featureIndex(), pb.get(k).featureIndex(), "feature");
                    assertArrayEquals(pa.get(k).xy(), pb.get(k).xy(), "coordinates, exactly");
                }
            }
        }
    }

    @Test
    void aChangedChartFileIsReadAfresh(@TempDir Path tmp) throws IOException {
        Path f = tmp.resolve("points.geojson");
        Files.copy(TestCharts.file("fixtures/points.geojson"), f);
        ChartSet first = ChartSet.load(List.of(f), false, x -> { });
        first.generalise(x -> { });
        assertEquals(1, entries().size(), "cached");
        int points = first.layers().get(0).vertexCount(PreparedLayer.bandCount() - 1);
        assertEquals(26, points, "the 26 probe points");

        // the same file with its first feature left out: the cache must not answer for it
        String json = Files.readString(f, StandardCharsets.UTF_8);
        int a = json.indexOf("{ \"type\": \"Feature\"");
        int b = json.indexOf("{ \"type\": \"Feature\"", a + 1);
        assertTrue(a > 0 && b > a, "the fixture lists its features one by one");
        Files.writeString(f, json.substring(0, a) + json.substring(b), StandardCharsets.UTF_8);
        ChartSet changed = ChartSet.load(List.of(f), false, x -> { });
        assertFalse(changed.layers().get(0).isRestored(), "read from the file");
        assertEquals(25, changed.layers().get(0).vertexCount(PreparedLayer.bandCount() - 1), "one point fewer");
    }

    @Test
    void aDamagedEntryIsReadAfresh() throws IOException {
        Path demo = TestCharts.file("demo-region.gpkg");
        ChartSet.load(List.of(demo), false, f -> { }).generalise(f -> { });
        Path entry = entries().get(0);
        byte[] bytes = Files.readAllBytes(entry);
        Files.write(entry, java.util.Arrays.copyOf(bytes, bytes.length / 2)); // truncated
        ChartSet again = ChartSet.load(List.of(demo), false, f -> { });
        assertTrue(again.problems().isEmpty(), "no problem reported: the cache is only an aid");
        assertFalse(again.layers().get(0).isRestored(), "read from the file");
        again.generalise(f -> { });
        assertEquals(bytes.length, Files.size(entry), "rewritten whole");
    }
}
