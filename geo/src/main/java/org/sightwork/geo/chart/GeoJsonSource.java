package org.sightwork.geo.chart;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.json.simple.JSONArray;
import org.json.simple.JSONObject;
import org.json.simple.parser.JSONParser;
import org.locationtech.jts.geom.Geometry;
import org.locationtech.jts.io.geojson.GeoJsonReader;
import org.opengis.util.FactoryException;

/**
 * Reads a GeoJSON file (RFC 7946) into one chart layer named after the file. Each feature's
 * geometry is read by JTS's {@link GeoJsonReader}; a feature whose geometry cannot be read is left
 * out and named in a {@link ChartProblem}, the others go on. Coordinates are WGS84 longitude and
 * latitude (RFC 7946 §4); a legacy {@code crs} member (the 2008 GeoJSON draft) naming another CRS is
 * honoured through Apache SIS.
 *
 * <p><b>Thread safety:</b> stateless; call from a worker thread.
 */
public final class GeoJsonSource {

    private GeoJsonSource() {
    }

    /**
     * Reads a GeoJSON file.
     *
     * @param file the file
     * @return the layer (if any feature could be read) and the problems met
     */
    public static ChartData read(Path file) {
        List<ChartProblem> problems = new ArrayList<>();
        String text;
        try {
            text = Files.readString(file, StandardCharsets.UTF_8);
        } catch (IOException e) {
            problems.add(new ChartProblem(file, "", "cannot be read: " + e.getMessage()));
            return new ChartData(List.of(), problems);
        } catch (RuntimeException e) {
            problems.add(new ChartProblem(file, "", "is not UTF-8 text as GeoJSON must be (RFC 7946 §11)"));
            return new ChartData(List.of(), problems);
        }
        Object root;
        try {
            root = new JSONParser().parse(text);
        } catch (org.json.simple.parser.ParseException e) {
            int pos = Math.max(0, Math.min(text.length(), e.getPosition()));
            problems.add(new ChartProblem(file, lineColumn(text, pos), "not valid JSON here ("
                    + describe(e) + ")"));
            return new ChartData(List.of(), problems);
        }
        if (!(root instanceof JSONObject obj) || !(obj.get("type") instanceof String type)) {
            problems.add(new ChartProblem(file, "", "not GeoJSON: expected an object with a \"type\" member"));
            return new ChartData(List.of(), problems);
        }
        Reprojection reprojection;
        try {
            reprojection = reprojectionOf(obj);
        } catch (FactoryException | RuntimeException e) {
            problems.add(new ChartProblem(file, "\"crs\" member", "names a coordinate reference system that is "
                    + "not known (" + GeoPackageSource.rootMessage(e) + "); file left out"));
            return new ChartData(List.of(), problems);
        }
        List<Object> items = new ArrayList<>();
        if (type.equals("FeatureCollection")) {
            if (!(obj.get("features") instanceof JSONArray arr)) {
                problems.add(new ChartProblem(file, "", "a FeatureCollection needs a \"features\" array"));
                return new ChartData(List.of(), problems);
            }
            items.addAll(arr);
        } else {
            items.add(obj);
        }
        String name = file.getFileName().toString().replaceFirst("\\.(geo)?json$", "");
        FeatureClass cls = FeatureClass.ofLayerName(name);
        GeoJsonReader reader = new GeoJsonReader();
        List<Feature> features = new ArrayList<>();
        for (int i = 0; i < items.size(); i++) {
            String where = "feature " + (i + 1) + " of " + items.size();
            try {
                Object item = items.get(i);
                if (!(item instanceof JSONObject f)) {
                    throw new IllegalArgumentException("expected a JSON object");
                }
                Object geomJson = "Feature".equals(f.get("type")) ? f.get("geometry") : f;
                if (geomJson == null) {
                    continue; // a feature without geometry (RFC 7946 §3.2): nothing to draw
                }
                if (!(geomJson instanceof JSONObject g)) {
                    throw new IllegalArgumentException("\"geometry\" must be an object or null");
                }
                Geometry geometry = reader.read(g.toJSONString());
                if (!geometry.isValid() && geometry.getDimension() == 2) {
                    geometry = geometry.buffer(0);
                }
                if (reprojection.apply(geometry).isEmpty()) {
                    throw new IllegalArgumentException("a coordinate cannot be brought to WGS84");
                }
                Map<String, Object> attrs = new LinkedHashMap<>();
                if (f.get("properties") instanceof JSONObject props) {
                    for (Object k : props.keySet()) {
                        if (props.get(k) != null) {
                            attrs.put(String.valueOf(k), props.get(k));
                        }
                    }
                }
                features.add(new Feature(geometry, cls, attrs));
            } catch (org.locationtech.jts.io.ParseException | RuntimeException e) {
                problems.add(new ChartProblem(file, where, "geometry cannot be read ("
                        + GeoPackageSource.rootMessage(e) + "); feature left out"));
            }
        }
        if (features.isEmpty()) {
            if (problems.isEmpty()) {
                problems.add(new ChartProblem(file, "", "has no features; nothing to draw"));
            }
            return new ChartData(List.of(), problems);
        }
        return new ChartData(List.of(new ChartLayer(name, file, cls, features, ChartLayer.extentOf(features))),
                problems);
    }

    private static Reprojection reprojectionOf(JSONObject root) throws FactoryException {
        if (root.get("crs") instanceof JSONObject crs && crs.get("properties") instanceof JSONObject p
                && p.get("name") instanceof String code) {
            return Reprojection.fromCode(code);
        }
        return Reprojection.wgs84LonLat(); // RFC 7946 §4: WGS84 longitude, latitude
    }

    private static String describe(org.json.simple.parser.ParseException e) {
        return switch (e.getErrorType()) {
            case org.json.simple.parser.ParseException.ERROR_UNEXPECTED_CHAR -> "unexpected character";
            case org.json.simple.parser.ParseException.ERROR_UNEXPECTED_EXCEPTION -> "the text ends too early";
            default -> "unexpected " + (e.getUnexpectedObject() == null ? "end of text" : "'"
                    + e.getUnexpectedObject() + "'");
        };
    }

    /**
     * Line and column (from 1) of a character offset.
     *
     * @param text the text
     * @param pos the offset
     * @return e.g. "line 3, column 14"
     */
    static String lineColumn(String text, int pos) {
        int line = 1;
        int col = 1;
        for (int i = 0; i < pos && i < text.length(); i++) {
            if (text.charAt(i) == '\n') {
                line++;
                col = 1;
            } else {
                col++;
            }
        }
        return "line " + line + ", column " + col;
    }
}
