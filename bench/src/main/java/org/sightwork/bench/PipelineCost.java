package org.sightwork.bench;

import java.lang.management.ManagementFactory;
import java.lang.management.ThreadMXBean;
import java.util.Arrays;
import java.util.Locale;
import javafx.scene.canvas.Canvas;
import javafx.scene.canvas.GraphicsContext;
import javafx.scene.image.WritableImage;
import javafx.scene.paint.Color;
import javafx.scene.shape.FillRule;
import javafx.scene.shape.StrokeLineJoin;
import org.sightwork.geo.app.HeadlessPlatform;

/**
 * What the JavaFX software pipeline ({@code prism.order=sw}, headless Monocle) costs per frame, per
 * vertex and per kind of drawing at 1920x1080: the figures behind the renderer's choices (see
 * {@code docs/PERFORMANCE.md}, "Chart rendering"). Each case is a frame (sea fill, the drawing,
 * a canvas snapshot that makes the rasteriser run) timed by the CPU time of the JavaFX application
 * and renderer threads; 15 warm-up frames, median of 30.
 *
 * <p>Cases: an empty frame; a closed ring of n vertices with edges about 1.5 px long (a coastline
 * simplified to the overview tolerance) filled, stroked 1.2 px with round (or bevel) joins, or both; 18
 * full-height or full-width lines stroked 1 px, against the same as 1 px rectangles; 18 labels.
 *
 * <p>Run: {@code java -cp "bench/target/classes:$(cat bench/target/bench-classpath.txt)"
 * org.sightwork.bench.PipelineCost} with the Monocle and {@code prism.order=sw} options.
 */
public final class PipelineCost {

    private static final int W = 1920;
    private static final int H = 1080;

    private PipelineCost() {
    }

    private interface Drawing {
        void draw(GraphicsContext g, int frame);
    }

    /**
     * Runs the cases.
     *
     * @param args none
     * @throws Exception if it fails
     */
    public static void main(String[] args) throws Exception {
        HeadlessPlatform.start();
        Canvas canvas = HeadlessPlatform.call(() -> new Canvas(W, H));
        WritableImage img = new WritableImage(W, H);
        HeadlessPlatform.call(() -> canvas.snapshot(null, img));
        ThreadMXBean tm = ManagementFactory.getThreadMXBean();
        long[] ids = Thread.getAllStackTraces().keySet().stream()
                .filter(t -> t.getName().startsWith("QuantumRenderer") || t.getName().startsWith("JavaFX Application"))
                .mapToLong(Thread::getId).toArray();
        double empty = time(canvas, img, tm, ids, (g, k) -> { });
        System.out.printf(Locale.ROOT, "empty frame (sea fill + snapshot): %.2f ms%n", empty);
        for (int n : new int[] {2_000, 8_000, 16_000}) {
            for (String mode : new String[] {"fill", "stroke", "stroke bevel", "fill+stroke"}) {
                double t = time(canvas, img, tm, ids, (g, k) -> ring(g, n, k, mode));
                System.out.printf(Locale.ROOT, "ring of %6d vertices, %-11s: %6.2f ms, %.2f µs per vertex over the empty frame%n",
                        n, mode, t, (t - empty) * 1000 / n);
            }
        }
        double lines = time(canvas, img, tm, ids, (g, k) -> {
            g.setStroke(Color.GRAY);
            g.setLineWidth(1);
            g.beginPath();
            for (int i = 0; i < 12; i++) {
                g.moveTo(i * 160 + 0.5, 0);
                g.lineTo(i * 160 + 0.5, H);
            }
            for (int i = 0; i < 6; i++) {
                g.moveTo(0, i * 180 + 0.5);
                g.lineTo(W, i * 180 + 0.5);
            }
            g.stroke();
        });
        double rects = time(canvas, img, tm, ids, (g, k) -> {
            g.setFill(Color.GRAY);
            for (int i = 0; i < 12; i++) {
                g.fillRect(i * 160, 0, 1, H);
            }
            for (int i = 0; i < 6; i++) {
                g.fillRect(0, i * 180, W, 1);
            }
        });
        double text = time(canvas, img, tm, ids, (g, k) -> {
            g.setFill(Color.BLACK);
            g.setFont(javafx.scene.text.Font.font("System", 11));
            for (int i = 0; i < 18; i++) {
                g.fillText("030°00′W", i * 100 + 5, 500);
            }
        });
        System.out.printf(Locale.ROOT, "18 screen-long lines stroked 1 px: %.2f ms; as 1 px rectangles: %.2f ms;"
                + " 18 labels: %.2f ms (each over the empty frame)%n", lines - empty, rects - empty, text - empty);
        System.exit(0);
    }

    /** A closed wavy ring about 1.5 px per edge, centred, drawn as one path. */
    private static void ring(GraphicsContext g, int n, int frame, String mode) {
        double perimeterPx = 1.5 * n;
        double r = perimeterPx / (2 * Math.PI);
        double scale = Math.min(1, 500 / r); // more than one turn when the ring would not fit
        g.beginPath();
        for (int j = 0; j < n; j++) {
            double turns = scale < 1 ? 1 / scale : 1;
            double a = 2 * Math.PI * turns * j / n;
            double rr = Math.min(r, 500) * (1 + 0.04 * Math.sin(j * 0.9 + frame)) - 3 * Math.floor(turns * j / n);
            double x = W / 2.0 + rr * Math.cos(a);
            double y = H / 2.0 + rr * Math.sin(a) * 0.9;
            if (j == 0) {
                g.moveTo(x, y);
            } else {
                g.lineTo(x, y);
            }
        }
        g.closePath();
        g.setFillRule(FillRule.EVEN_ODD);
        g.setLineJoin(mode.endsWith("bevel") ? StrokeLineJoin.BEVEL : StrokeLineJoin.ROUND);
        if (mode.startsWith("fill")) {
            g.setFill(Color.WHEAT);
            g.fill();
        }
        if (mode.contains("stroke")) {
            g.setStroke(Color.BLACK);
            g.setLineWidth(1.2);
            g.stroke();
        }
    }

    private static double time(Canvas canvas, WritableImage img, ThreadMXBean tm, long[] ids, Drawing d)
            throws Exception {
        double[] t = new double[30];
        for (int i = -15; i < t.length; i++) {
            int k = i;
            long c0 = cpu(tm, ids);
            HeadlessPlatform.call(() -> {
                GraphicsContext g = canvas.getGraphicsContext2D();
                g.setFill(Color.LIGHTBLUE);
                g.fillRect(0, 0, W, H);
                d.draw(g, k);
                canvas.snapshot(null, img);
                return null;
            });
            if (i >= 0) {
                t[i] = (cpu(tm, ids) - c0) / 1e6;
            }
        }
        Arrays.sort(t);
        return t[t.length / 2];
    }

    private static long cpu(ThreadMXBean tm, long[] ids) {
        long s = 0;
        for (long id : ids) {
            s += Math.max(0, tm.getThreadCpuTime(id));
        }
        return s;
    }
}
