package org.sightwork.bench;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import javafx.scene.canvas.Canvas;
import javafx.scene.image.WritableImage;
import org.sightwork.geo.app.BundledChart;
import org.sightwork.geo.app.HeadlessChart;
import org.sightwork.geo.app.HeadlessPlatform;
import org.sightwork.geo.chart.ChartSet;
import org.sightwork.geo.chart.PreparedLayer;
import org.sightwork.geo.render.ChartRenderer;
import org.sightwork.geo.render.Graticule;
import org.sightwork.geo.render.Palette;
import org.sightwork.geo.render.RenderLayer;
import org.sightwork.geo.render.VectorLayerRenderer;
import org.sightwork.geo.render.Viewport;

/**
 * Frame time of the chart renderer, headless (Monocle, {@code prism.order=sw}), at 1920x1080 over
 * the bundled chart (world base under the full-resolution demo region) at zoom levels from the
 * whole world down to a harbour: a timed loop, not JMH, because each frame must run on the JavaFX
 * application thread and end in a canvas snapshot (which forces the software rasteriser to draw
 * it); JMH's own threads would only measure the queueing. Also times opening the bundled chart
 * (read + prepare) to the first frame.
 *
 * <p>Run: {@code java -cp "bench/target/classes:$(cat bench/target/bench-classpath.txt)"
 * -Dsightwork.home=. org.sightwork.bench.RenderBenchmark [frames per zoom] [WxH]}. Prints one line per
 * zoom (median, 95th percentile, vertices drawn) and the totals; with 0 frames, only the opening
 * (fresh JVM each run). See {@code docs/PERFORMANCE.md}.
 */
public final class RenderBenchmark {

    private RenderBenchmark() {
    }

    private static long cpuOf(java.lang.management.ThreadMXBean tm, long[] ids) {
        long sum = 0;
        for (long id : ids) {
            long t = tm.getThreadCpuTime(id);
            sum += Math.max(0, t);
        }
        return sum;
    }

    /**
     * Runs the benchmark.
     *
     * @param args frames per zoom (default 40), size (default 1920x1080)
     * @throws Exception if it fails
     */
    public static void main(String[] args) throws Exception {
        int frames = args.length > 0 ? Integer.parseInt(args[0]) : 40;
        String[] wh = (args.length > 1 ? args[1] : "1920x1080").split("x");
        int w = Integer.parseInt(wh[0]);
        int h = Integer.parseInt(wh[1]);
        List<Path> files = BundledChart.files();
        if (files.size() < 2) {
            throw new IllegalStateException("the bundled chart is not in " + BundledChart.directory());
        }
        HeadlessPlatform.start();
        HeadlessPlatform.call(() -> new Canvas(8, 8).snapshot(null, null)); // start the renderer once

        // Opening the bundled chart to the first frame, as the window does it: the detailed region is
        // read and prepared on a worker, the first frame drawn on the FX thread; then the world base
        // is read under it and the coarser bands are generalised, in the background.
        java.lang.management.ThreadMXBean tmx = java.lang.management.ManagementFactory.getThreadMXBean();
        long cpu0 = tmx.getCurrentThreadCpuTime();
        long t0 = System.nanoTime();
        ChartSet detail = ChartSet.load(List.of(files.get(files.size() - 1)), false, f -> { });
        long cpu1 = tmx.getCurrentThreadCpuTime();
        long t1 = System.nanoTime();
        Viewport first = Viewport.fitting(36.8, -29.0, 39.2, -24.6, w, h);
        long[] openFx = new long[2];
        long[] raster = Thread.getAllStackTraces().keySet().stream()
                .filter(t -> t.getName().startsWith("QuantumRenderer")).mapToLong(Thread::getId).toArray();
        long r0 = cpuOf(tmx, raster);
        HeadlessPlatform.call(() -> {
            // as the window's first frame: the chart's layers (names and graticule too) painted onto
            // a canvas of the window's size and rasterised (the snapshot forces it); no image export
            openFx[0] = tmx.getCurrentThreadCpuTime();
            HeadlessChart hc = new HeadlessChart(detail, Palette.DAY, false);
            Canvas c = new Canvas(w, h);
            new ChartRenderer().render(c.getGraphicsContext2D(), first, Palette.DAY, hc.model().paintingOrder(),
                    e -> { });
            c.snapshot(null, null);
            openFx[1] = tmx.getCurrentThreadCpuTime();
            hc.close();
            return null;
        });
        long t2 = System.nanoTime();
        long r1 = cpuOf(tmx, raster);
        System.out.printf(Locale.ROOT, "open bundled chart to first frame: read+prepare detail %.0f ms (cpu %.0f ms),"
                + " first frame %.0f ms (cpu: FX thread %.0f ms, renderer thread %.0f ms), total %.0f ms (cpu %.0f ms)%n",
                (t1 - t0) / 1e6, (cpu1 - cpu0) / 1e6, (t2 - t1) / 1e6, (openFx[1] - openFx[0]) / 1e6, (r1 - r0) / 1e6,
                (t2 - t0) / 1e6, (cpu1 - cpu0 + openFx[1] - openFx[0] + r1 - r0) / 1e6);
        if (frames == 0) {
            System.exit(0); // opening only (run it in fresh JVMs to see the spread)
        }
        long c3 = tmx.getCurrentThreadCpuTime();
        long t3 = System.nanoTime();
        ChartSet world = ChartSet.loadUnder(files.subList(0, files.size() - 1), detail.detailExtentDeg(), f -> { });
        long t4 = System.nanoTime();
        long c4 = tmx.getCurrentThreadCpuTime();
        System.out.printf(Locale.ROOT, "then the world base under it: %.0f ms (cpu %.0f ms)%n", (t4 - t3) / 1e6,
                (c4 - c3) / 1e6);
        List<org.sightwork.geo.chart.PreparedLayer> both = new ArrayList<>(world.layers());
        both.addAll(detail.layers());
        ChartSet chart = new ChartSet(both, List.of(), world.extentDeg(), detail.detailExtentDeg());
        long c5 = tmx.getCurrentThreadCpuTime();
        long t5 = System.nanoTime();
        chart.generalise(f -> { });
        System.out.printf(Locale.ROOT, "generalise all bands (background, after the first frame): %.0f ms (cpu %.0f ms)%n",
                (System.nanoTime() - t5) / 1e6, (tmx.getCurrentThreadCpuTime() - c5) / 1e6);
        int verts = 0;
        for (PreparedLayer l : chart.layers()) {
            verts += l.vertexCount(PreparedLayer.bandCount() - 1);
        }
        System.out.printf(Locale.ROOT, "layers %d, vertices at full resolution %d%n", chart.layers().size(), verts);

        List<RenderLayer> layers = new ArrayList<>();
        List<VectorLayerRenderer> vectors = new ArrayList<>();
        for (PreparedLayer l : chart.layers()) {
            VectorLayerRenderer r = new VectorLayerRenderer(l);
            vectors.add(r);
            layers.add(r);
        }
        layers.add(new Graticule());
        Object[][] zooms = {
            {"world", Viewport.fitting(-70, -180, 80, 180, w, h)},
            {"north atlantic", Viewport.fitting(20, -60, 55, 0, w, h)},
            {"demo region", first},
            {"faial-pico channel", Viewport.fitting(38.40, -28.80, 38.60, -28.40, w, h)},
            {"harbour, Faial (~1.4 m/px)", null},
        };
        // harbour: centre on Faial's east coast
        zooms[4][1] = Viewport.fitting(38.52, -28.64, 38.545, -28.61, w, h);
        List<Double> all = new ArrayList<>();
        List<Double> allCpu = new ArrayList<>();
        java.lang.management.ThreadMXBean tm = java.lang.management.ManagementFactory.getThreadMXBean();
        long[] fxThread = Thread.getAllStackTraces().keySet().stream()
                .filter(t -> t.getName().startsWith("JavaFX Application"))
                .mapToLong(Thread::getId).toArray();
        long[] rasterThread = Thread.getAllStackTraces().keySet().stream()
                .filter(t -> t.getName().startsWith("QuantumRenderer"))
                .mapToLong(Thread::getId).toArray();
        long[] renderThreads = java.util.stream.LongStream.concat(Arrays.stream(fxThread), Arrays.stream(rasterThread))
                .toArray();
        com.sun.management.OperatingSystemMXBean os = (com.sun.management.OperatingSystemMXBean)
                java.lang.management.ManagementFactory.getOperatingSystemMXBean();
        ChartRenderer renderer = new ChartRenderer();
        Canvas canvas = HeadlessPlatform.call(() -> new Canvas(w, h));
        WritableImage img = new WritableImage(w, h);
        // Warm up over every zoom first (the JIT compiles the rasteriser's and the path code's hot
        // loops in the first few dozen frames); the figures below are the steady state.
        for (int i = 0; i < 20; i++) {
            for (Object[] z : zooms) {
                Viewport v = ((Viewport) z[1]).panned(5.0 * i, 2.0 * i);
                HeadlessPlatform.call(() -> {
                    renderer.render(canvas.getGraphicsContext2D(), v, Palette.DAY, layers, e -> { });
                    canvas.snapshot(null, img);
                    return null;
                });
            }
        }
        for (Object[] z : zooms) {
            Viewport base = (Viewport) z[1];
            double[] ms = new double[frames];
            double[] cpu = new double[frames];
            double[] fxCpu = new double[frames];
            double[] procCpu = new double[frames];
            long[] drawn = {0};
            for (int i = -5; i < frames; i++) {
                // pan a little each frame (as when dragging), so nothing is reused from the frame before
                Viewport v = base.panned(7.0 * (i % 10), 3.0 * (i % 7));
                long c0 = cpuOf(tm, renderThreads);
                long f0 = cpuOf(tm, fxThread);
                long p0 = os.getProcessCpuTime();
                long s = System.nanoTime();
                HeadlessPlatform.call(() -> {
                    renderer.render(canvas.getGraphicsContext2D(), v, Palette.DAY, layers, e -> { });
                    canvas.snapshot(null, img);
                    return null;
                });
                long e = System.nanoTime();
                long c1 = cpuOf(tm, renderThreads);
                long f1 = cpuOf(tm, fxThread);
                long p1 = os.getProcessCpuTime();
                if (i >= 0) {
                    ms[i] = (e - s) / 1e6;
                    cpu[i] = (c1 - c0) / 1e6;
                    fxCpu[i] = (f1 - f0) / 1e6;
                    procCpu[i] = (p1 - p0) / 1e6;
                    all.add(ms[i]);
                    allCpu.add(cpu[i]);
                    drawn[0] += vectors.stream().mapToInt(VectorLayerRenderer::lastVertices).sum();
                }
            }
            Arrays.sort(ms);
            Arrays.sort(cpu);
            Arrays.sort(fxCpu);
            Arrays.sort(procCpu);
            int p95 = (int) Math.ceil(frames * 0.95) - 1;
            System.out.printf(Locale.ROOT, "%-26s band %d  wall median %6.2f p95 %6.2f ms | cpu median %6.2f p95 %6.2f ms"
                    + " (FX thread median %5.2f) | process cpu mean %6.2f | vertices drawn %d%n", z[0],
                    PreparedLayer.bandFor(base.metresPerPx()), ms[frames / 2], ms[p95], cpu[frames / 2], cpu[p95],
                    fxCpu[frames / 2], Arrays.stream(procCpu).sum() / frames, drawn[0] / frames);
        }
        double[] a = all.stream().mapToDouble(Double::doubleValue).sorted().toArray();
        double[] c = allCpu.stream().mapToDouble(Double::doubleValue).sorted().toArray();
        System.out.printf(Locale.ROOT, "all zooms (%d frames, %dx%d): wall median %.2f ms, p95 %.2f ms; "
                + "cpu (FX + renderer threads) median %.2f ms, p95 %.2f ms%n", a.length, w, h,
                a[a.length / 2], a[(int) Math.ceil(a.length * 0.95) - 1], c[c.length / 2],
                c[(int) Math.ceil(c.length * 0.95) - 1]);
        System.out.printf(Locale.ROOT, "load average during the run: %.1f on %d cores%n",
                java.lang.management.ManagementFactory.getOperatingSystemMXBean().getSystemLoadAverage(),
                Runtime.getRuntime().availableProcessors());
        System.exit(0);
    }
}
