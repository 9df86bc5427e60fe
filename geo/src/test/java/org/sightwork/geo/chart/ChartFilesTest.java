package org.sightwork.geo.chart;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.Statement;
import java.util.List;
import java.util.Locale;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.locationtech.jts.geom.Coordinate;
import org.locationtech.jts.geom.Envelope;
import org.sightwork.geo.testing.TestCharts;

/**
 * Validation of the chart readers against GDAL: {@code test-charts/fixtures/EXPECTED.tsv} is what
 * {@code ogrinfo -al -so} (GDAL, Debian) says about each file (feature count, geometry type,
 * extent) and the first vertex in EPSG:4326 from {@code ogr2ogr -t_srs EPSG:4326}; and the bad
 * inputs each give a clear problem naming the file, while good data goes on.
 */
class ChartFilesTest {

    /** ogrinfo prints extents to 6 decimals: half a unit of the last place. */
    private static final double EXTENT_TOL_DEG = 0.5e-6;
    /** GDAL (PROJ) and SIS inverse Pseudo-Mercator: both exact formulas; 1e-8° is 1 mm. */
    private static final double VERTEX_TOL_DEG = 1e-8;

    private static ChartData read(String relative) {
        return ChartFiles.read(TestCharts.file(relative), f -> { });
    }

    @Test
    void agreesWithOgrinfo() throws IOException {
        List<String> rows = Files.readAllLines(TestCharts.file("fixtures/EXPECTED.tsv"), StandardCharsets.UTF_8);
        int checked = 0;
        for (String row : rows.subList(1, rows.size())) {
            String[] c = row.split("\t", -1);
            if (c[2].equals("None")) {
                continue; // an attribute table (provenance), not a chart layer
            }
            String where = c[0] + " layer " + c[1];
            ChartData d = read(c[0]);
            int count = Integer.parseInt(c[3]);
            if (count == 0) {
                assertTrue(d.layers().isEmpty(), where + ": an empty layer gives no chart layer");
                assertTrue(d.problems().stream().anyMatch(p -> p.where().contains(c[1]) && p.message().contains("empty")),
                        where + ": the empty layer is reported");
                checked++;
                continue;
            }
            ChartLayer layer = d.layers().stream().filter(l -> l.name().equals(c[1])).findFirst()
                    .orElseThrow(() -> new AssertionError(where + " not read: " + d.problems()));
            assertEquals(count, layer.features().size(), where + ": feature count");
            String type = layer.features().get(0).geometry().getGeometryType().toLowerCase(Locale.ROOT);
            assertTrue(type.contains(c[2].toLowerCase(Locale.ROOT).replace(" ", "")), where + ": geometry type "
                    + type + " for ogrinfo's " + c[2]);
            if (c[4].equals("EPSG:4326")) {
                Envelope e = layer.extentDeg();
                assertEquals(Double.parseDouble(c[5]), e.getMinX(), EXTENT_TOL_DEG, where + ": west");
                assertEquals(Double.parseDouble(c[6]), e.getMinY(), EXTENT_TOL_DEG, where + ": south");
                assertEquals(Double.parseDouble(c[7]), e.getMaxX(), EXTENT_TOL_DEG, where + ": east");
                assertEquals(Double.parseDouble(c[8]), e.getMaxY(), EXTENT_TOL_DEG, where + ": north");
            }
            Coordinate first = layer.features().get(0).geometry().getCoordinates()[0];
            assertEquals(Double.parseDouble(c[11]), first.x, VERTEX_TOL_DEG, where + ": first vertex longitude");
            assertEquals(Double.parseDouble(c[12]), first.y, VERTEX_TOL_DEG, where + ": first vertex latitude");
            checked++;
        }
        assertTrue(checked >= 5, "EXPECTED.tsv rows checked: " + checked);
    }

    @Test
    void notAGeoPackageIsReportedByName() {
        ChartData d = read("fixtures/not-a-gpkg.gpkg");
        assertTrue(d.layers().isEmpty(), "no layers");
        assertEquals(1, d.problems().size(), "one problem");
        String m = d.problems().get(0).toString();
        assertTrue(m.startsWith("not-a-gpkg.gpkg") && m.contains("not a GeoPackage"), m);
    }

    @Test
    void truncatedGeoPackageIsReportedByName() {
        ChartData d = read("fixtures/truncated.gpkg");
        assertFalse(d.problems().isEmpty(), "a problem");
        String m = d.problems().get(0).toString();
        assertTrue(m.startsWith("truncated.gpkg") && m.contains("damaged or truncated"), m);
    }

    @Test
    void brokenGeometryIsLeftOutAndTheRestKept() {
        ChartData d = read("fixtures/broken-geometry.geojson");
        assertEquals(1, d.layers().size(), "one layer");
        assertEquals(2, d.layers().get(0).features().size(), "the good polygon and the good point");
        assertEquals(1, d.problems().size(), "one problem");
        ChartProblem p = d.problems().get(0);
        assertEquals("feature 2 of 3", p.where(), "the broken feature is named");
        assertTrue(p.toString().startsWith("broken-geometry.geojson"), p.toString());
    }

    @Test
    void badJsonNamesLineAndColumn(@TempDir Path tmp) throws IOException {
        Path f = tmp.resolve("bad.geojson");
        Files.writeString(f, "{\n  \"type\": \"FeatureCollection\",\n  \"features\": [ { ] \n}");
        ChartData d = ChartFiles.read(f, x -> { });
        assertEquals(1, d.problems().size(), "one problem");
        assertTrue(d.problems().get(0).where().startsWith("line 3, column"), d.problems().get(0).toString());
    }

    @Test
    void unknownCrsIsReportedAndOtherLayersStay(@TempDir Path tmp) throws Exception {
        Path f = tmp.resolve("odd-crs.gpkg");
        Files.copy(TestCharts.file("demo-region.gpkg"), f);
        try (Connection c = DriverManager.getConnection("jdbc:sqlite:" + f);
                Statement s = c.createStatement()) {
            s.executeUpdate("INSERT INTO gpkg_spatial_ref_sys (srs_name, srs_id, organization, organization_coordsys_id,"
                    + " definition) VALUES ('invented', 990001, 'NONE', 990001, 'undefined')");
            s.executeUpdate("UPDATE gpkg_geometry_columns SET srs_id = 990001 WHERE table_name = 'coastline'");
            s.executeUpdate("UPDATE gpkg_contents SET srs_id = 990001 WHERE table_name = 'coastline'");
        }
        ChartData d = ChartFiles.read(f, x -> { });
        assertEquals(List.of("land"), d.layers().stream().map(ChartLayer::name).toList(), "land still read");
        assertEquals(1, d.problems().size(), "one problem: " + d.problems());
        String m = d.problems().get(0).toString();
        assertTrue(m.contains("odd-crs.gpkg") && m.contains("coastline") && m.contains("not known"), m);
    }

    @Test
    void reprojectsPseudoMercatorBack() {
        ChartData d = read("fixtures/lines-3857.gpkg");
        Envelope e = d.layers().get(0).extentDeg();
        // the lines are coastlines of Faial, Pico and Graciosa (test-charts/README.md): within the demo region
        assertTrue(e.getMinX() > -29.5 && e.getMaxX() < -27.5 && e.getMinY() > 38.3 && e.getMaxY() < 39.2, e.toString());
    }

    @Test
    void aMixOfGoodAndBadFilesKeepsTheGood() {
        ChartSet set = ChartSet.load(List.of(TestCharts.file("fixtures/not-a-gpkg.gpkg"),
                TestCharts.file("demo-region.gpkg"), TestCharts.file("fixtures/truncated.gpkg")), false, f -> { });
        assertEquals(2, set.layers().size(), "land and coastline of the demo region");
        assertTrue(set.problems().stream().anyMatch(p -> p.file().endsWith("not-a-gpkg.gpkg")), "first bad file named");
        assertTrue(set.problems().stream().anyMatch(p -> p.file().endsWith("truncated.gpkg")), "second bad file named");
    }

    @Test
    void missingFileAndUnknownKind(@TempDir Path tmp) {
        assertTrue(ChartFiles.read(tmp.resolve("none.gpkg"), f -> { }).problems().get(0).message()
                .contains("does not exist"), "missing file");
        assertTrue(ChartFiles.read(tmp.resolve("chart.txt"), f -> { }).problems().get(0).message()
                .contains("expected a GeoPackage"), "unknown kind");
    }
}
