package org.sightwork.geo.chart;

import java.util.Map;
import org.locationtech.jts.geom.Geometry;

/**
 * One chart feature.
 *
 * @param geometry the geometry in WGS84, x = longitude, y = latitude (degrees)
 * @param featureClass what it is
 * @param attributes the source's attribute values by column name (unmodifiable)
 */
public record Feature(Geometry geometry, FeatureClass featureClass, Map<String, Object> attributes) {

    /** Checks and copies. */
    public Feature {
        if (geometry == null || featureClass == null) {
            throw new IllegalArgumentException("a feature needs a geometry and a class");
        }
        attributes = attributes == null ? Map.of() : java.util.Collections.unmodifiableMap(
                new java.util.LinkedHashMap<>(attributes));
    }
}
