package org.sightwork.geo.chart;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.function.DoubleConsumer;
import org.locationtech.jts.geom.Envelope;

/**
 * A chart made of several files, each prepared for drawing, bottom first, with the problems met.
 *
 * <p>Files are given from the least to the most detailed. With {@code maskByDetail}, each file's
 * layers are cut back where a later (more detailed) file covers the ground (its extent), so that a
 * coarse world coastline does not show through beside a detailed one. Inside a file, areas are drawn
 * before lines: depth areas, land, lakes, then depth contours, coastlines and the rest.
 *
 * @param layers the prepared layers, bottom first
 * @param problems what could not be read
 * @param extentDeg the extent of all the data (x = longitude, y = latitude, degrees); null envelope
 *     if nothing was read
 * @param detailExtentDeg the extent of the last (most detailed) file that gave data
 */
public record ChartSet(List<PreparedLayer> layers, List<ChartProblem> problems, Envelope extentDeg,
        Envelope detailExtentDeg) {

    /** Copies. */
    public ChartSet {
        layers = List.copyOf(layers);
        problems = List.copyOf(problems);
        extentDeg = new Envelope(extentDeg);
        detailExtentDeg = new Envelope(detailExtentDeg);
    }

    /**
     * Reads and prepares chart files. Slow: call from a worker thread.
     *
     * @param files the files, least detailed first
     * @param maskByDetail cut each file back where a later file covers the ground
     * @param progress receives the fraction done, [0, 1]
     * @return the chart
     */
    public static ChartSet load(List<Path> files, boolean maskByDetail, DoubleConsumer progress) {
        int nf = files.size();
        List<ChartData> read = new ArrayList<>();
        List<ChartProblem> problems = new ArrayList<>();
        for (int i = 0; i < nf; i++) {
            int k = i;
            ChartData d = ChartFiles.read(files.get(i), f -> progress.accept(0.5 * (k + f) / nf));
            read.add(d);
            problems.addAll(d.problems());
        }
        List<Envelope> extents = new ArrayList<>();
        for (ChartData d : read) {
            Envelope e = new Envelope();
            d.layers().forEach(l -> e.expandToInclude(l.extentDeg()));
            extents.add(e);
        }
        List<PreparedLayer> prepared = new ArrayList<>();
        Envelope all = new Envelope();
        Envelope detail = new Envelope();
        int total = read.stream().mapToInt(d -> d.layers().size()).sum();
        int done = 0;
        for (int i = 0; i < nf; i++) {
            Envelope mask = null;
            if (maskByDetail) {
                for (int j = nf - 1; j > i; j--) {
                    if (!extents.get(j).isNull()) {
                        mask = extents.get(j);
                        break;
                    }
                }
            }
            List<ChartLayer> layers = new ArrayList<>(read.get(i).layers());
            layers.sort(Comparator.comparingInt(l -> drawOrder(l.featureClass())));
            for (ChartLayer l : layers) {
                prepared.add(PreparedLayer.prepare(l, mask));
                all.expandToInclude(l.extentDeg());
                done++;
                progress.accept(0.5 + 0.5 * done / Math.max(1, total));
            }
            if (!extents.get(i).isNull()) {
                detail = extents.get(i);
            }
        }
        progress.accept(1.0);
        return new ChartSet(prepared, problems, all, detail);
    }

    /**
     * Generalises every layer for the coarser zoom bands ({@link PreparedLayer#generalise()}). Slow:
     * call from a worker thread after the first frame; drawing goes on meanwhile.
     *
     * @param progress receives the fraction done, [0, 1]
     */
    public void generalise(DoubleConsumer progress) {
        for (int i = 0; i < layers.size(); i++) {
            layers.get(i).generalise();
            progress.accept((i + 1.0) / layers.size());
        }
    }

    private static int drawOrder(FeatureClass c) {
        return switch (c) {
            case DEPTH_AREA -> 0;
            case LAND -> 1;
            case LAKE -> 2;
            case DEPTH_CONTOUR -> 3;
            case COASTLINE -> 4;
            case OTHER -> 5;
        };
    }
}
