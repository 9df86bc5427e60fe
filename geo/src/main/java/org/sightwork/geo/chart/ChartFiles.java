package org.sightwork.geo.chart;

import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.function.DoubleConsumer;

/**
 * Reads a chart file of any kind the shell knows, chosen by its name: GeoPackage ({@code .gpkg})
 * or GeoJSON ({@code .geojson}, {@code .json}).
 *
 * <p><b>Thread safety:</b> stateless; call from a worker thread.
 */
public final class ChartFiles {

    private ChartFiles() {
    }

    /**
     * Reads a chart file; never throws for bad content.
     *
     * @param file the file
     * @param progress receives the fraction done, [0, 1]
     * @return the layers and problems
     */
    public static ChartData read(Path file, DoubleConsumer progress) {
        String n = file.getFileName().toString().toLowerCase(Locale.ROOT);
        ChartData data;
        if (n.endsWith(".gpkg")) {
            data = GeoPackageSource.read(file, progress);
        } else if (n.endsWith(".geojson") || n.endsWith(".json")) {
            data = GeoJsonSource.read(file);
        } else {
            data = new ChartData(List.of(), List.of(new ChartProblem(file, "",
                    "is not a chart file this program reads: expected a GeoPackage (.gpkg) or GeoJSON (.geojson)")));
        }
        progress.accept(1.0);
        return data;
    }
}
