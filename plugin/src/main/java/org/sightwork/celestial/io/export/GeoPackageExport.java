package org.sightwork.celestial.io.export;

import org.sightwork.geo.files.SafeWrite;
import java.io.IOException;
import java.nio.file.Path;
import java.sql.SQLException;
import java.util.ArrayList;
import java.util.Date;
import java.util.List;
import mil.nga.geopackage.BoundingBox;
import mil.nga.geopackage.GeoPackage;
import mil.nga.geopackage.GeoPackageManager;
import mil.nga.geopackage.db.GeoPackageDataType;
import mil.nga.geopackage.db.TableColumnKey;
import mil.nga.geopackage.features.columns.GeometryColumns;
import mil.nga.geopackage.features.user.FeatureColumn;
import mil.nga.geopackage.features.user.FeatureDao;
import mil.nga.geopackage.features.user.FeatureRow;
import mil.nga.geopackage.features.user.FeatureTableMetadata;
import mil.nga.geopackage.geom.GeoPackageGeometryData;
import mil.nga.geopackage.srs.SpatialReferenceSystem;
import mil.nga.sf.Geometry;
import mil.nga.sf.GeometryType;
import mil.nga.sf.LineString;
import mil.nga.sf.Point;
import mil.nga.sf.Polygon;
import org.sightwork.geo.earth.GeoPosition;

/**
 * Writes a plot as an OGC GeoPackage (EPSG:4326) with the NGA library: a feature table
 * {@code lines} (LINESTRING: lines of position), {@code points} (POINT: fixes and assumed
 * positions, with the 95 % ellipse's axes), {@code ellipses} (POLYGON: the 95 % ellipses) and
 * {@code tracks} (LINESTRING: DR and GPS tracks, start and end times). Every table has the columns
 * {@code name}, {@code kind}, {@code utc} (DATETIME) and {@code description}.
 *
 * <p><b>Thread safety:</b> stateless.
 */
public final class GeoPackageExport {

    private GeoPackageExport() {
    }

    /**
     * Writes the plot (through a temporary file and a rename).
     *
     * @param plot what to write
     * @param target the file; it should end in {@code .gpkg}
     * @throws IOException if the file cannot be written; the target is then unchanged
     */
    public static void write(PlotExport plot, Path target) throws IOException {
        SafeWrite.writeFile(target, SafeWrite.Previous.DISCARD, tmp -> {
            // The NGA manager insists on the .gpkg extension.
            Path gpkgTmp = tmp.resolveSibling(tmp.getFileName() + ".gpkg");
            try {
                writeTo(plot, gpkgTmp);
                java.nio.file.Files.move(gpkgTmp, tmp);
            } catch (SQLException | RuntimeException e) {
                throw new IOException("could not write the GeoPackage " + target + ": " + e.getMessage(), e);
            } finally {
                java.nio.file.Files.deleteIfExists(gpkgTmp);
            }
        });
    }

    private static void writeTo(PlotExport plot, Path file) throws SQLException {
        GeoPackageManager.create(file.toFile());
        GeoPackage gpkg = GeoPackageManager.open(file.toFile());
        try {
            SpatialReferenceSystem srs = gpkg.getSpatialReferenceSystemDao().getOrCreateCode("EPSG", 4326);
            gpkg.createGeometryColumnsTable();
            BoundingBox world = new BoundingBox(-180.0, -90.0, 180.0, 90.0);

            FeatureDao lines = table(gpkg, srs, world, "lines", GeometryType.LINESTRING, List.of());
            for (PlotExport.Line l : plot.lines()) {
                insert(lines, srs, lineString(l.vertices()), l.name(), l.kind(), l.utc(), l.description());
            }
            FeatureDao points = table(gpkg, srs, world, "points", GeometryType.POINT, List.of(
                    FeatureColumn.createColumn("ellipse95_semi_major_nm", GeoPackageDataType.DOUBLE),
                    FeatureColumn.createColumn("ellipse95_semi_minor_nm", GeoPackageDataType.DOUBLE),
                    FeatureColumn.createColumn("ellipse95_orientation_deg", GeoPackageDataType.DOUBLE)));
            FeatureDao ellipses = table(gpkg, srs, world, "ellipses", GeometryType.POLYGON, List.of());
            for (PlotExport.Point p : plot.points()) {
                FeatureRow row = row(points, srs, new Point(p.position().lonDeg(), p.position().latDeg()),
                        p.name(), p.kind(), p.utc(), p.description());
                p.ellipse95().ifPresent(e -> {
                    row.setValue("ellipse95_semi_major_nm", e.semiMajorNm());
                    row.setValue("ellipse95_semi_minor_nm", e.semiMinorNm());
                    row.setValue("ellipse95_orientation_deg", e.orientationDeg());
                });
                points.create(row);
                if (p.ellipse95().isPresent()) {
                    Polygon polygon = new Polygon();
                    polygon.addRing(lineString(EllipseRing.ring(p.position(), p.ellipse95().get())));
                    insert(ellipses, srs, polygon, p.name() + " 95% ellipse", p.kind() + " ellipse", p.utc(),
                            p.description());
                }
            }
            FeatureDao tracks = table(gpkg, srs, world, "tracks", GeometryType.LINESTRING,
                    List.of(FeatureColumn.createColumn("end_utc", GeoPackageDataType.DATETIME)));
            for (PlotExport.Track t : plot.tracks()) {
                FeatureRow row = row(tracks, srs,
                        lineString(t.points().stream().map(PlotExport.TimedPosition::position).toList()),
                        t.name(), "track", t.points().get(0).utc(), t.points().size() + " points");
                row.setValue("end_utc", Date.from(t.points().get(t.points().size() - 1).utc()));
                tracks.create(row);
            }
        } finally {
            gpkg.close();
        }
    }

    private static FeatureDao table(GeoPackage gpkg, SpatialReferenceSystem srs, BoundingBox box, String name,
            GeometryType type, List<FeatureColumn> extra) {
        GeometryColumns gc = new GeometryColumns();
        gc.setId(new TableColumnKey(name, "geom"));
        gc.setGeometryType(type);
        gc.setZ((byte) 0);
        gc.setM((byte) 0);
        gc.setSrs(srs);
        List<FeatureColumn> columns = new ArrayList<>();
        columns.add(FeatureColumn.createColumn("name", GeoPackageDataType.TEXT));
        columns.add(FeatureColumn.createColumn("kind", GeoPackageDataType.TEXT));
        columns.add(FeatureColumn.createColumn("utc", GeoPackageDataType.DATETIME));
        columns.add(FeatureColumn.createColumn("description", GeoPackageDataType.TEXT));
        columns.addAll(extra);
        gpkg.createFeatureTable(FeatureTableMetadata.create(gc, columns, box));
        return gpkg.getFeatureDao(name);
    }

    private static FeatureRow row(FeatureDao dao, SpatialReferenceSystem srs, Geometry g, String name, String kind,
            java.time.Instant utc, String description) {
        FeatureRow row = dao.newRow();
        GeoPackageGeometryData data = GeoPackageGeometryData.createAndBuildEnvelope(g);
        data.setSrsId((int) srs.getSrsId());
        row.setGeometry(data);
        row.setValue("name", name);
        row.setValue("kind", kind);
        row.setValue("utc", Date.from(utc));
        row.setValue("description", description);
        return row;
    }

    private static void insert(FeatureDao dao, SpatialReferenceSystem srs, Geometry g, String name, String kind,
            java.time.Instant utc, String description) {
        dao.create(row(dao, srs, g, name, kind, utc, description));
    }

    private static LineString lineString(List<GeoPosition> vertices) {
        LineString ls = new LineString();
        for (GeoPosition v : vertices) {
            ls.addPoint(new Point(v.lonDeg(), v.latDeg()));
        }
        return ls;
    }
}
