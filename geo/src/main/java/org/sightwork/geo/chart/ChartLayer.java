package org.sightwork.geo.chart;

import java.nio.file.Path;
import java.util.List;
import org.locationtech.jts.geom.Envelope;

/**
 * A layer of chart data as read from a file.
 *
 * @param name the layer's name (table name in a GeoPackage, file name for GeoJSON)
 * @param source the file it came from
 * @param featureClass the class of its features
 * @param features the features, in WGS84
 * @param extentDeg the extent of the features (x = longitude, y = latitude, degrees)
 */
public record ChartLayer(String name, Path source, FeatureClass featureClass, List<Feature> features,
        Envelope extentDeg) {

    /** Copies the list. */
    public ChartLayer {
        features = List.copyOf(features);
        extentDeg = new Envelope(extentDeg);
    }

    /**
     * The extent of some features.
     *
     * @param features the features
     * @return their envelope (null envelope if empty)
     */
    public static Envelope extentOf(List<Feature> features) {
        Envelope e = new Envelope();
        for (Feature f : features) {
            e.expandToInclude(f.geometry().getEnvelopeInternal());
        }
        return e;
    }

    @Override
    public Envelope extentDeg() {
        return new Envelope(extentDeg);
    }
}
