package org.sightwork.geo.chart;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Optional;
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

    /**
     * How far beyond the detailed data's extent a coarser layer is cut away (degrees): a coarse
     * outline may stand a few kilometres out from the detailed one (Natural Earth 1:10 m against
     * GSHHG full resolution: up to about 2 km at the demo islands), 0.25° is well beyond that and
     * still far inside the open sea around a detailed region.
     */
    public static final double MASK_MARGIN_DEG = 0.25;

    /** Copies. */
    public ChartSet {
        layers = List.copyOf(layers);
        problems = List.copyOf(problems);
        extentDeg = new Envelope(extentDeg);
        detailExtentDeg = new Envelope(detailExtentDeg);
    }

    /**
     * Reads and prepares chart files; a file that {@code PreparedCache} holds, unchanged, is read back
     * from it already generalised. Slow: call from a worker thread.
     *
     * @param files the files, least detailed first
     * @param maskByDetail cut each file back where a later file covers the ground
     * @param progress receives the fraction done, [0, 1]
     * @return the chart
     */
    public static ChartSet load(List<Path> files, boolean maskByDetail, DoubleConsumer progress) {
        int nf = files.size();
        // The most detailed file first: every coarser file's mask is the extent of the last file that
        // gave data.
        List<List<PreparedLayer>> byFile = new ArrayList<>();
        List<Envelope> extents = new ArrayList<>();
        List<ChartProblem> problems = new ArrayList<>();
        for (int i = 0; i < nf; i++) {
            byFile.add(List.of());
            extents.add(new Envelope());
        }
        Envelope finer = null;
        for (int i = nf - 1; i >= 0; i--) {
            Envelope mask = null;
            if (maskByDetail && finer != null) {
                mask = new Envelope(finer);
                mask.expandBy(MASK_MARGIN_DEG);
            }
            int k = nf - 1 - i;
            List<PreparedLayer> layers = readPrepared(files.get(i), mask, problems,
                    f -> progress.accept((k + f) / nf));
            byFile.set(i, layers);
            Envelope e = new Envelope();
            layers.forEach(l -> e.expandToInclude(l.layer().extentDeg()));
            extents.set(i, e);
            if (!e.isNull() && finer == null) {
                finer = e;
            }
        }
        List<PreparedLayer> prepared = new ArrayList<>();
        Envelope all = new Envelope();
        Envelope detail = new Envelope();
        for (int i = 0; i < nf; i++) {
            prepared.addAll(byFile.get(i));
            all.expandToInclude(extents.get(i));
            if (!extents.get(i).isNull()) {
                detail = extents.get(i);
            }
        }
        progress.accept(1.0);
        return new ChartSet(prepared, problems, all, detail);
    }

    /**
     * One file's layers, prepared: from {@code PreparedCache} when it holds them for the file as it
     * is, else read and prepared (full resolution only; {@link #generalise} does the rest).
     */
    private static List<PreparedLayer> readPrepared(Path file, Envelope maskDeg, List<ChartProblem> problems,
            DoubleConsumer progress) {
        Optional<List<PreparedLayer>> cached = PreparedCache.read(file, maskDeg);
        if (cached.isPresent()) {
            progress.accept(1.0);
            return cached.get();
        }
        ChartData d = ChartFiles.read(file, f -> progress.accept(0.7 * f));
        problems.addAll(d.problems());
        List<ChartLayer> layers = new ArrayList<>(d.layers());
        layers.sort(Comparator.comparingInt(l -> drawOrder(l.featureClass())));
        List<PreparedLayer> prepared = new ArrayList<>();
        for (ChartLayer l : layers) {
            prepared.add(PreparedLayer.prepare(l, maskDeg));
            progress.accept(0.7 + 0.3 * prepared.size() / layers.size());
        }
        return prepared;
    }

    /**
     * Reads and prepares chart files, cut back where a given area is covered by something more
     * detailed (the world base under the detailed region, read second so that the first frame need
     * not wait for it). Slow: call from a worker thread.
     *
     * @param files the files, least detailed first
     * @param detailDeg the extent of the detailed data (degrees), cut out of every layer with a margin
     *     of {@link #MASK_MARGIN_DEG}; or null
     * @param progress receives the fraction done, [0, 1]
     * @return the chart
     */
    public static ChartSet loadUnder(List<Path> files, Envelope detailDeg, DoubleConsumer progress) {
        Envelope maskDeg = null;
        if (detailDeg != null && !detailDeg.isNull()) {
            maskDeg = new Envelope(detailDeg);
            maskDeg.expandBy(MASK_MARGIN_DEG);
        }
        List<ChartProblem> problems = new ArrayList<>();
        List<PreparedLayer> prepared = new ArrayList<>();
        Envelope all = new Envelope();
        for (int i = 0; i < files.size(); i++) {
            int k = i;
            for (PreparedLayer l : readPrepared(files.get(i), maskDeg, problems,
                    f -> progress.accept((k + f) / files.size()))) {
                prepared.add(l);
                all.expandToInclude(l.layer().extentDeg());
            }
        }
        progress.accept(1.0);
        return new ChartSet(prepared, problems, all, all);
    }

    /**
     * Generalises every layer for the coarser zoom bands ({@link PreparedLayer#generalise()}). Slow:
     * call from a worker thread after the first frame; drawing goes on meanwhile. Then keeps each file
     * read without a problem in {@code PreparedCache} for the next opening.
     *
     * @param progress receives the fraction done, [0, 1]
     */
    public void generalise(DoubleConsumer progress) {
        for (int i = 0; i < layers.size(); i++) {
            layers.get(i).generalise();
            progress.accept((i + 1.0) / layers.size());
        }
        // Keep what was prepared here for the next opening (files read without a problem only).
        java.util.Map<Path, List<PreparedLayer>> byFile = new java.util.LinkedHashMap<>();
        for (PreparedLayer l : layers) {
            byFile.computeIfAbsent(l.layer().source(), f -> new ArrayList<>()).add(l);
        }
        for (var e : byFile.entrySet()) {
            boolean clean = problems.stream().noneMatch(p -> p.file().equals(e.getKey()));
            boolean fresh = e.getValue().stream().noneMatch(PreparedLayer::isRestored);
            if (clean && fresh) {
                PreparedCache.write(e.getKey(), e.getValue().get(0).maskDeg(), e.getValue());
            }
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
