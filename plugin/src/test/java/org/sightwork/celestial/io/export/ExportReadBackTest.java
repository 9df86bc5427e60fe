package org.sightwork.celestial.io.export;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import io.jenetics.jpx.GPX;
import io.jenetics.jpx.WayPoint;
import java.nio.file.Files;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.ResultSet;
import java.sql.Statement;
import java.time.Instant;
import java.util.List;
import java.util.Optional;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.text.PDFTextStripper;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.sightwork.geo.earth.GeoPosition;

/**
 * Exports read back by independent readers: GPX by JPX's reader (its XML parser, not our writer's
 * objects), GeoJSON by Jackson's tree parser, GeoPackage by plain SQL over the SQLite JDBC driver
 * (the OGC GeoPackage tables {@code gpkg_contents} and {@code gpkg_geometry_columns}, OGC 12-128r18
 * sections 1.1.3 and 2.1.5), the PDF by PDFBox's text extraction. GDAL reads the same files in
 * {@code reference/check-exports.sh}, which sets {@code sightwork.exportDir} to keep them.
 *
 * <p>The plot exported is a small invented example (not a check value: the checks compare what is
 * read back with what was written).
 */
class ExportReadBackTest {

    /** GPX coordinates are written with JPX's default of 8 decimals (GPX.Writer.DEFAULT_FRACTION_DIGITS), 1 mm. */
    private static final double GPX_COORD_TOL_DEG = 0.5e-8;
    /** GeoJSON and GeoPackage keep doubles exactly. */
    private static final double EXACT_DEG = 0.0;

    static PlotExport samplePlot() {
        Instant t1 = Instant.parse("2026-06-21T09:12:30Z");
        Instant t2 = Instant.parse("2026-06-21T20:31:00Z");
        return new PlotExport("Invented example plot",
                List.of(new PlotExport.Line("Sun LL 09:12", "LOP", t1, "intercept 3.2 nm toward 101°",
                                List.of(new GeoPosition(38.50, -28.40), new GeoPosition(38.70, -28.35))),
                        new PlotExport.Line("Sun LL 09:12 advanced", "running-fix LOP", t2, "run 41.0 nm",
                                List.of(new GeoPosition(38.30, -27.90), new GeoPosition(38.50, -27.85)))),
                List.of(new PlotExport.Point("Fix 20:31", "fix", t2, "3 lines", new GeoPosition(38.123456789, -27.6543210987),
                        Optional.of(new PlotExport.Ellipse(1.8, 0.9, 45.0))),
                        new PlotExport.Point("AP Sun", "AP", t1, "", new GeoPosition(38.0, -28.5), Optional.empty())),
                List.of(new PlotExport.Track("GPS", List.of(
                        new PlotExport.TimedPosition(t1, new GeoPosition(38.53, -28.62)),
                        new PlotExport.TimedPosition(t2, new GeoPosition(37.74, -25.67))))));
    }

    private static Path dir(Path tmp) throws Exception {
        String keep = System.getProperty("sightwork.exportDir");
        if (keep == null) {
            return tmp;
        }
        Path d = Path.of(keep);
        Files.createDirectories(d);
        return d;
    }

    @Test
    void gpxReadsBackWithJpx(@TempDir Path tmp) throws Exception {
        PlotExport plot = samplePlot();
        Path file = dir(tmp).resolve("plot.gpx");
        GpxExport.write(plot, file);
        GPX gpx = GPX.read(file);
        assertEquals(2, gpx.getWayPoints().size(), "waypoints: the fix and the AP");
        WayPoint fix = gpx.getWayPoints().get(0);
        assertEquals("Fix 20:31", fix.getName().orElseThrow(), "waypoint name");
        assertEquals("fix", fix.getType().orElseThrow(), "waypoint type");
        assertEquals(plot.points().get(0).utc(), fix.getTime().orElseThrow(), "waypoint time");
        assertEquals(38.123456789, fix.getLatitude().doubleValue(), GPX_COORD_TOL_DEG, "fix latitude");
        assertEquals(-27.6543210987, fix.getLongitude().doubleValue(), GPX_COORD_TOL_DEG, "fix longitude");
        assertEquals(2, gpx.getRoutes().size(), "routes: one per line of position");
        assertEquals("running-fix LOP", gpx.getRoutes().get(1).getType().orElseThrow(), "route type");
        assertEquals(2, gpx.getRoutes().get(0).getPoints().size(), "vertices of the first LOP");
        assertEquals(38.70, gpx.getRoutes().get(0).getPoints().get(1).getLatitude().doubleValue(), GPX_COORD_TOL_DEG,
                "LOP end latitude");
        assertEquals(1, gpx.getTracks().size(), "tracks");
        var seg = gpx.getTracks().get(0).getSegments().get(0);
        assertEquals(2, seg.getPoints().size(), "track points");
        assertEquals(Instant.parse("2026-06-21T20:31:00Z"), seg.getPoints().get(1).getTime().orElseThrow(),
                "track point time");
    }

    @Test
    void geoJsonReadsBackAsRfc7946(@TempDir Path tmp) throws Exception {
        Path file = dir(tmp).resolve("plot.geojson");
        GeoJsonExport.write(samplePlot(), file);
        JsonNode root = new ObjectMapper().readTree(file.toFile());
        assertEquals("FeatureCollection", root.get("type").asText(), "type");
        JsonNode features = root.get("features");
        // 2 lines + 2 points + 1 ellipse + 1 track
        assertEquals(6, features.size(), "features");
        JsonNode fix = features.get(2);
        assertEquals("Point", fix.get("geometry").get("type").asText(), "fix geometry");
        // RFC 7946 section 3.1.1: longitude first.
        assertEquals(-27.6543210987, fix.get("geometry").get("coordinates").get(0).asDouble(), EXACT_DEG, "lon first");
        assertEquals(38.123456789, fix.get("geometry").get("coordinates").get(1).asDouble(), EXACT_DEG, "lat second");
        assertEquals("2026-06-21T20:31:00Z", fix.get("properties").get("utc").asText(), "fix time");
        JsonNode ellipse = features.get(3);
        JsonNode ring = ellipse.get("geometry").get("coordinates").get(0);
        // RFC 7946 section 3.1.6: a closed ring.
        assertEquals(ring.get(0).get(0).asDouble(), ring.get(ring.size() - 1).get(0).asDouble(), EXACT_DEG, "closed");
        assertEquals(EllipseRing.VERTICES + 1, ring.size(), "ring vertices");
    }

    @Test
    void geoPackageHasTheOgcTables(@TempDir Path tmp) throws Exception {
        Path file = dir(tmp).resolve("plot.gpkg");
        GeoPackageExport.write(samplePlot(), file);
        try (Connection c = DriverManager.getConnection("jdbc:sqlite:" + file);
                Statement s = c.createStatement()) {
            try (ResultSet r = s.executeQuery("SELECT count(*) FROM gpkg_contents WHERE data_type = 'features'")) {
                assertEquals(4, r.getInt(1), "feature tables: lines, points, ellipses, tracks");
            }
            try (ResultSet r = s.executeQuery(
                    "SELECT geometry_type_name, srs_id FROM gpkg_geometry_columns WHERE table_name = 'points'")) {
                assertEquals("POINT", r.getString(1), "points geometry type");
                assertEquals(4326, r.getInt(2), "points SRS");
            }
            try (ResultSet r = s.executeQuery("SELECT name, kind FROM lines ORDER BY id")) {
                assertTrue(r.next(), "a first line");
                assertEquals("Sun LL 09:12", r.getString(1), "line name");
                assertTrue(r.next(), "a second line");
                assertEquals("running-fix LOP", r.getString(2), "line kind");
            }
            try (ResultSet r = s.executeQuery("SELECT ellipse95_semi_major_nm FROM points WHERE kind = 'fix'")) {
                assertEquals(1.8, r.getDouble(1), EXACT_DEG, "ellipse semi-major axis");
            }
        }
        // PRAGMA application_id: 'GPKG' = 0x47504B47 (OGC 12-128r18, requirement 2).
        byte[] header = Files.readAllBytes(file);
        assertEquals(0x47504B47, ((header[68] & 0xff) << 24) | ((header[69] & 0xff) << 16)
                | ((header[70] & 0xff) << 8) | (header[71] & 0xff), "application id");
    }

    @Test
    void pdfWorksheetPrintsEverySection(@TempDir Path tmp) throws Exception {
        WorksheetReport report = new WorksheetReport("Sights of 2026-06-21", "Invented example",
                List.of(new WorksheetReport.Section("Sun LL 09:12:30 UTC",
                        List.of(new WorksheetReport.Row("Hs", "45°12.3′"), new WorksheetReport.Row("Dip (2.4 m)", "−2.7′"))),
                        new WorksheetReport.Section("Fix 20:31", List.of(new WorksheetReport.Row("Position", "38°07.4′N 027°39.3′W")))),
                "CAUTION: an aid to navigation,\nnot a replacement for it.");
        Path file = dir(tmp).resolve("worksheet.pdf");
        PdfWorksheetExport.write(report, file);
        try (PDDocument doc = Loader.loadPDF(file.toFile())) {
            String text = new PDFTextStripper().getText(doc);
            assertTrue(text.contains("Sun LL 09:12:30 UTC"), "first heading: " + text);
            assertTrue(text.contains("45°12.3'"), "prime printed as apostrophe: " + text);
            assertTrue(text.contains("-2.7'"), "minus printed as hyphen: " + text);
            assertTrue(text.contains("an aid to navigation, not a replacement"), "footer joined: " + text);
        }
    }

    @Test
    void aFailedExportLeavesTheOldFile(@TempDir Path tmp) throws Exception {
        Path file = tmp.resolve("plot.gpx");
        Files.writeString(file, "old");
        try {
            org.sightwork.geo.files.SafeWrite.writeFile(file, org.sightwork.geo.files.SafeWrite.Previous.DISCARD, t -> {
                Files.writeString(t, "half");
                throw new java.io.IOException("disk full (injected)");
            });
        } catch (java.io.IOException expected) {
            // the failure is reported to the caller
        }
        assertEquals("old", Files.readString(file), "the target is unchanged");
        try (var list = Files.list(tmp)) {
            assertEquals(1, list.count(), "no temporary file left behind");
        }
    }
}
