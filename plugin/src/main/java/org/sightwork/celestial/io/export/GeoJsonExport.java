package org.sightwork.celestial.io.export;

import org.sightwork.geo.files.SafeWrite;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import org.sightwork.geo.earth.GeoPosition;

/**
 * Writes a plot as a GeoJSON FeatureCollection (RFC 7946): lines as LineString features, points as
 * Point features (with their 95 % ellipse as a separate Polygon feature), tracks as LineString
 * features with the times of their vertices in a {@code times} property.
 *
 * <p>Coordinates are [longitude, latitude] in WGS84 degrees, as RFC 7946 section 3.1.1 requires;
 * times are ISO 8601 UTC strings. Every feature has the properties {@code name}, {@code kind},
 * {@code utc} and {@code description}.
 *
 * <p><b>Thread safety:</b> stateless.
 */
public final class GeoJsonExport {

    private static final ObjectMapper JSON = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);

    private GeoJsonExport() {
    }

    /**
     * Writes the plot (through a temporary file and a rename).
     *
     * @param plot what to write
     * @param target the file
     * @throws IOException if the file cannot be written; the target is then unchanged
     */
    public static void write(PlotExport plot, Path target) throws IOException {
        ObjectNode root = toJson(plot);
        SafeWrite.writeFile(target, SafeWrite.Previous.DISCARD, tmp -> JSON.writeValue(tmp.toFile(), root));
    }

    /**
     * The FeatureCollection as a JSON tree.
     *
     * @param plot what to write
     * @return the tree
     */
    static ObjectNode toJson(PlotExport plot) {
        ObjectNode root = JSON.createObjectNode();
        root.put("type", "FeatureCollection");
        root.put("name", plot.title());
        ArrayNode features = root.putArray("features");
        for (PlotExport.Line l : plot.lines()) {
            ObjectNode f = feature(features, l.name(), l.kind(), l.utc().toString(), l.description());
            ObjectNode g = f.putObject("geometry");
            g.put("type", "LineString");
            coordinates(g.putArray("coordinates"), l.vertices());
        }
        for (PlotExport.Point p : plot.points()) {
            ObjectNode f = feature(features, p.name(), p.kind(), p.utc().toString(), p.description());
            ObjectNode g = f.putObject("geometry");
            g.put("type", "Point");
            position(g.putArray("coordinates"), p.position());
            p.ellipse95().ifPresent(e -> {
                ObjectNode props = (ObjectNode) f.get("properties");
                props.put("ellipse95_semi_major_nm", e.semiMajorNm());
                props.put("ellipse95_semi_minor_nm", e.semiMinorNm());
                props.put("ellipse95_orientation_deg", e.orientationDeg());
                ObjectNode ef = feature(features, p.name() + " 95% ellipse", p.kind() + " ellipse",
                        p.utc().toString(), p.description());
                ObjectNode eg = ef.putObject("geometry");
                eg.put("type", "Polygon");
                coordinates(eg.putArray("coordinates").addArray(), EllipseRing.ring(p.position(), e));
            });
        }
        for (PlotExport.Track t : plot.tracks()) {
            ObjectNode f = feature(features, t.name(), "track", t.points().get(0).utc().toString(), "");
            ArrayNode times = ((ObjectNode) f.get("properties")).putArray("times");
            t.points().forEach(p -> times.add(p.utc().toString()));
            ObjectNode g = f.putObject("geometry");
            g.put("type", "LineString");
            coordinates(g.putArray("coordinates"), t.points().stream().map(PlotExport.TimedPosition::position).toList());
        }
        return root;
    }

    private static ObjectNode feature(ArrayNode features, String name, String kind, String utc, String description) {
        ObjectNode f = features.addObject();
        f.put("type", "Feature");
        ObjectNode props = f.putObject("properties");
        props.put("name", name);
        props.put("kind", kind);
        props.put("utc", utc);
        props.put("description", description);
        return f;
    }

    private static void coordinates(ArrayNode array, List<GeoPosition> vertices) {
        for (GeoPosition p : vertices) {
            position(array.addArray(), p);
        }
    }

    private static void position(ArrayNode array, GeoPosition p) {
        array.add(p.lonDeg());
        array.add(p.latDeg());
    }
}
