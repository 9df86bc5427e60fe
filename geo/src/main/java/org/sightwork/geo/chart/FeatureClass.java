package org.sightwork.geo.chart;

import java.util.Locale;

/** What a chart feature is, which selects its portrayal. */
public enum FeatureClass {
    /** Land area (polygons). */
    LAND,
    /** Coastline (lines). */
    COASTLINE,
    /** Lake or other inland water (polygons). */
    LAKE,
    /** Depth area (polygons). */
    DEPTH_AREA,
    /** Depth contour (lines). */
    DEPTH_CONTOUR,
    /** Anything else. */
    OTHER;

    /**
     * The class of a layer from its name (the common words in open data: land, coast, lake,
     * depth area, contour), OTHER when none fits.
     *
     * @param layerName the layer or file name
     * @return the class
     */
    public static FeatureClass ofLayerName(String layerName) {
        String n = layerName.toLowerCase(Locale.ROOT);
        if (n.contains("coast") || n.contains("shore")) {
            return COASTLINE;
        }
        if (n.contains("lake") || n.contains("inland")) {
            return LAKE;
        }
        if (n.contains("contour") || n.contains("depcnt") || n.contains("isobath")) {
            return DEPTH_CONTOUR;
        }
        if (n.contains("depth") || n.contains("depare") || n.contains("bathy")) {
            return DEPTH_AREA;
        }
        if (n.contains("land")) {
            return LAND;
        }
        return OTHER;
    }
}
