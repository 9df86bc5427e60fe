package org.sightwork.geo.app;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.sightwork.geo.chart.PreparedLayer;
import org.sightwork.geo.render.Graticule;

/**
 * The chart that comes with Sightwork, in {@code ${sightwork.home}/test-charts/}: the world base
 * ({@code world-base.gpkg}) under the detailed region ({@code demo-region.gpkg}); and the layer
 * rows every chart gets.
 */
public final class BundledChart {

    /** The files, least detailed first. */
    public static final List<String> FILES = List.of("world-base.gpkg", "demo-region.gpkg");

    private BundledChart() {
    }

    /**
     * The directory of the bundled charts.
     *
     * @return {@code ${sightwork.home}/test-charts} (the working directory if the property is unset)
     */
    public static Path directory() {
        return Path.of(System.getProperty("sightwork.home", ".")).resolve("test-charts");
    }

    /**
     * The bundled chart files that exist.
     *
     * @return the files, least detailed first (empty if none is there)
     */
    public static List<Path> files() {
        List<Path> out = new ArrayList<>();
        for (String f : FILES) {
            Path p = directory().resolve(f);
            if (Files.isRegularFile(p)) {
                out.add(p);
            }
        }
        return out;
    }

    /**
     * The layer-list row of a prepared chart layer, named "layer (file)".
     *
     * @param layer the layer
     * @return the row
     */
    static LayerEntry entryOf(PreparedLayer layer) {
        String file = layer.layer().source().getFileName().toString();
        return new LayerEntry(layer.layer().name() + " (" + file + ")", LayerEntry.Kind.CHART,
                new org.sightwork.geo.render.VectorLayerRenderer(layer));
    }

    /**
     * The rows of a chart, bottom first.
     *
     * @param layers the prepared layers, bottom first
     * @return the rows, bottom first
     */
    static List<LayerEntry> entriesOf(List<PreparedLayer> layers) {
        return layers.stream().map(BundledChart::entryOf).toList();
    }

    /**
     * The place-names row: the names of every visible chart layer's areas, above all chart data.
     *
     * @param model the model whose chart layers are named
     * @return the row
     */
    static LayerEntry namesEntry(ChartModel model) {
        return new LayerEntry("Place names", LayerEntry.Kind.NAMES, frame -> {
            for (LayerEntry e : model.layers()) {
                if (e.kind() == LayerEntry.Kind.CHART && e.visibleProperty().get()
                        && e.renderer() instanceof org.sightwork.geo.render.VectorLayerRenderer r) {
                    r.paintNames(frame);
                }
            }
        });
    }

    /**
     * The graticule row.
     *
     * @return the row
     */
    static LayerEntry graticuleEntry() {
        return new LayerEntry("Graticule", LayerEntry.Kind.GRATICULE, new Graticule());
    }
}
