package org.sightwork.geo.chart;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.function.DoubleConsumer;
import mil.nga.geopackage.GeoPackage;
import mil.nga.geopackage.GeoPackageManager;
import mil.nga.geopackage.features.user.FeatureDao;
import mil.nga.geopackage.features.user.FeatureResultSet;
import mil.nga.geopackage.features.user.FeatureRow;
import mil.nga.geopackage.geom.GeoPackageGeometryData;
import mil.nga.geopackage.srs.SpatialReferenceSystem;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.geom.GeometryFactory;
import org.locationtech.jts.io.ParseException;
import org.locationtech.jts.io.WKBReader;
import org.opengis.util.FactoryException;

/**
 * Reads the vector (feature) layers of a GeoPackage (OGC 12-128r18, GeoPackage 1.3) with the NGA
 * GeoPackage library; geometries become JTS geometries in WGS84.
 *
 * <p>Problems are collected, never thrown: a file that is not a GeoPackage, a truncated database, a
 * layer in an unknown CRS, an empty layer, or features whose geometry cannot be read each give a
 * {@link ChartProblem}; the readable layers and features go on.
 *
 * <p><b>Thread safety:</b> stateless; call from a worker thread (reading is slow).
 */
public final class GeoPackageSource {

    /** The first 16 bytes of every SQLite 3 database (sqlite.org, Database File Format, §1.3). */
    private static final byte[] SQLITE_HEADER = "SQLite format 3\0".getBytes(StandardCharsets.US_ASCII);

    private GeoPackageSource() {
    }

    /**
     * Reads every feature layer of a GeoPackage.
     *
     * @param file the file
     * @param progress receives the fraction done, [0, 1]
     * @return the layers read and the problems met
     */
    public static ChartData read(Path file, DoubleConsumer progress) {
        List<ChartLayer> layers = new ArrayList<>();
        List<ChartProblem> problems = new ArrayList<>();
        if (!Files.isRegularFile(file)) {
            problems.add(new ChartProblem(file, "", "the file does not exist or is not a regular file"));
            return new ChartData(layers, problems);
        }
        try (InputStream in = Files.newInputStream(file)) {
            byte[] head = in.readNBytes(SQLITE_HEADER.length);
            if (!Arrays.equals(head, SQLITE_HEADER)) {
                problems.add(new ChartProblem(file, "", "not a GeoPackage: the file does not begin with the "
                        + "SQLite 3 header that every GeoPackage has"));
                return new ChartData(layers, problems);
            }
        } catch (IOException e) {
            problems.add(new ChartProblem(file, "", "cannot be read: " + e.getMessage()));
            return new ChartData(layers, problems);
        }
        GeoPackage gpkg;
        try {
            gpkg = GeoPackageManager.open(file.toFile(), false);
        } catch (RuntimeException e) {
            problems.add(new ChartProblem(file, "", "cannot be opened as a GeoPackage (damaged or truncated?): "
                    + rootMessage(e)));
            return new ChartData(layers, problems);
        }
        try {
            List<String> tables;
            try {
                tables = gpkg.getFeatureTables();
            } catch (RuntimeException e) {
                problems.add(new ChartProblem(file, "", "its list of layers cannot be read (damaged or truncated?): "
                        + rootMessage(e)));
                return new ChartData(layers, problems);
            }
            if (tables.isEmpty()) {
                problems.add(new ChartProblem(file, "", "has no vector layers (feature tables)"));
            }
            for (int i = 0; i < tables.size(); i++) {
                String table = tables.get(i);
                try {
                    readLayer(file, gpkg, table, layers, problems);
                } catch (RuntimeException e) {
                    problems.add(new ChartProblem(file, "layer '" + table + "'",
                            "cannot be read (damaged or truncated?): " + rootMessage(e) + "; layer left out"));
                }
                progress.accept((i + 1.0) / tables.size());
            }
        } finally {
            try {
                gpkg.close();
            } catch (RuntimeException ignored) {
                // closing a damaged database may fail; nothing was written to it
            }
        }
        return new ChartData(layers, problems);
    }

    private static void readLayer(Path file, GeoPackage gpkg, String table, List<ChartLayer> layers,
            List<ChartProblem> problems) {
        String where = "layer '" + table + "'";
        SpatialReferenceSystem srs = srsOf(gpkg, table);
        Reprojection reprojection;
        try {
            reprojection = reprojectionOf(srs);
        } catch (FactoryException | RuntimeException e) {
            String named = srs == null ? "none" : srs.getOrganization() + ":" + srs.getOrganizationCoordsysId()
                    + " (srs_id " + srs.getSrsId() + ", '" + srs.getSrsName() + "')";
            problems.add(new ChartProblem(file, where, "its coordinate reference system " + named
                    + " is not known (" + rootMessage(e) + "); layer left out"));
            return;
        }
        FeatureDao dao = gpkg.getFeatureDao(table);
        FeatureClass cls = FeatureClass.ofLayerName(table);
        WKBReader wkb = new WKBReader(new GeometryFactory());
        List<Feature> features = new ArrayList<>();
        int bad = 0;
        String firstBad = null;
        String geomColumn = dao.getGeometryColumnName();
        FeatureResultSet rs = dao.queryForAll();
        try {
            while (rs.moveToNext()) {
                FeatureRow row = rs.getRow();
                String fid = "fid " + row.getId();
                try {
                    GeoPackageGeometryData gd = row.getGeometry();
                    if (gd == null || gd.isEmpty()) {
                        continue;
                    }
                    Geometry g = wkb.read(gd.getWkb());
                    if (reprojection.apply(g).isEmpty()) {
                        throw new ParseException("a coordinate cannot be brought to WGS84");
                    }
                    Map<String, Object> attrs = new LinkedHashMap<>();
                    String[] names = row.getColumnNames();
                    for (int c = 0; c < names.length; c++) {
                        if (!names[c].equals(geomColumn)) {
                            Object v = row.getValue(c);
                            if (v != null) {
                                attrs.put(names[c], v);
                            }
                        }
                    }
                    features.add(new Feature(g, cls, attrs));
                } catch (ParseException | IOException | RuntimeException e) {
                    bad++;
                    if (firstBad == null) {
                        firstBad = fid + ": " + rootMessage(e);
                    }
                }
            }
        } finally {
            rs.close();
        }
        if (bad > 0) {
            problems.add(new ChartProblem(file, where, bad + " feature(s) with an unreadable geometry left out"
                    + " (first: " + firstBad + ")"));
        }
        if (features.isEmpty()) {
            if (bad == 0) {
                problems.add(new ChartProblem(file, where, "is empty (no features); nothing to draw"));
            }
            return;
        }
        layers.add(new ChartLayer(table, file, cls, features, ChartLayer.extentOf(features)));
    }

    private static SpatialReferenceSystem srsOf(GeoPackage gpkg, String table) {
        try {
            var gc = gpkg.getGeometryColumnsDao().queryForTableName(table);
            return gc == null ? null : gc.getSrs();
        } catch (java.sql.SQLException e) {
            throw new IllegalStateException(e.getMessage(), e);
        }
    }

    private static Reprojection reprojectionOf(SpatialReferenceSystem srs) throws FactoryException {
        if (srs == null) {
            throw new IllegalArgumentException("the layer names no spatial reference system");
        }
        long id = srs.getSrsId();
        if (id == 0 || id == 4326) {
            // srs_id 0 is "undefined geographic", which GeoPackage 1.3 §1.1.2.1.1 reads as WGS84
            // degrees; 4326 is WGS84 (GeoPackage 1.3 §1.1.2.1.1 requires that row), stored x = longitude
            return Reprojection.wgs84LonLat();
        }
        String org = srs.getOrganization();
        if (org != null && !org.isBlank() && !org.equalsIgnoreCase("NONE")) {
            try {
                return Reprojection.fromCode(org.toUpperCase(java.util.Locale.ROOT) + ":"
                        + srs.getOrganizationCoordsysId());
            } catch (FactoryException | RuntimeException e) {
                // fall through to the definition
            }
        }
        String def = srs.getDefinition();
        if (def == null || def.isBlank() || def.trim().equalsIgnoreCase("undefined")) {
            throw new IllegalArgumentException("no usable definition");
        }
        return Reprojection.fromWkt(def);
    }

    static String rootMessage(Throwable e) {
        Throwable t = e;
        while (t.getCause() != null && t.getCause() != t) {
            t = t.getCause();
        }
        String m = t.getMessage();
        return m == null ? t.getClass().getSimpleName() : m.strip();
    }
}
