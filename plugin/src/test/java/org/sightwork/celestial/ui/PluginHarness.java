package org.sightwork.celestial.ui;

import java.awt.image.BufferedImage;
import java.nio.file.Path;
import java.time.Instant;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.TimeUnit;
import java.util.function.BooleanSupplier;
import java.util.function.Consumer;
import javafx.beans.property.ObjectProperty;
import javafx.embed.swing.SwingFXUtils;
import javafx.scene.Node;
import javafx.scene.canvas.Canvas;
import javafx.scene.image.WritableImage;
import javafx.scene.paint.Color;
import org.sightwork.geo.app.ChartModel;
import org.sightwork.geo.app.LayerEntry;
import org.sightwork.geo.earth.GeoPosition;
import org.sightwork.geo.earth.Mercator;
import org.sightwork.geo.render.ChartRenderer;
import org.sightwork.geo.render.Palette;
import org.sightwork.geo.render.Viewport;
import org.sightwork.geo.spi.BackgroundTask;
import org.sightwork.geo.spi.Overlay;
import org.sightwork.geo.spi.OverlayPainter;
import org.sightwork.geo.spi.PluginContext;
import org.sightwork.geo.spi.Progress;
import org.sightwork.geo.spi.Severity;
import org.sightwork.geo.testing.HeadlessFx;

/**
 * For tests: the celestial plugin started as the window starts it (panels and commands made, not
 * headless), in a context of our own that paints its overlays with the shell's own
 * {@link ChartRenderer} on an off-screen canvas (no chart layers: sea only), and that keeps the
 * panels and the notifications for the test to look at. Background work runs on one worker thread
 * and is handed back through {@code Platform.runLater}, as in the window.
 *
 * <p><b>Thread:</b> make it and call its methods on the JavaFX application thread, except
 * {@link #await}, which waits on the test thread.
 */
final class PluginHarness implements PluginContext {

    final CelestialPlugin plugin = new CelestialPlugin();
    final ChartModel chart = new ChartModel();
    final Map<String, Node> panels = new LinkedHashMap<>();
    final Map<String, Runnable> commands = new LinkedHashMap<>();
    final List<String> notes = new java.util.concurrent.CopyOnWriteArrayList<>();
    private final List<Consumer<GeoPosition>> clicks = new ArrayList<>();
    private final ExecutorService worker = Executors.newSingleThreadExecutor(r -> {
        Thread t = new Thread(r, "harness worker");
        t.setDaemon(true);
        return t;
    });
    private final ChartRenderer renderer = new ChartRenderer();
    private final Path userDir;
    private Viewport shown = Viewport.fitting(37, -29, 39, -25, 1200, 800);

    /**
     * Starts the plugin (FX thread).
     *
     * @param userDir the user directory to use instead of {@code ~/.sightwork}
     */
    PluginHarness(Path userDir) {
        this.userDir = userDir;
        chart.paletteProperty().set(Palette.DAY);
        plugin.start(this);
    }

    /**
     * Starts the plugin on the FX thread and waits until the demo passage is worked out.
     *
     * @param userDir the user directory
     * @return the harness
     */
    static PluginHarness startWithDemo(Path userDir) {
        HeadlessFx.start();
        PluginHarness h = HeadlessFx.call(() -> new PluginHarness(userDir));
        await(() -> HeadlessFx.call(() -> h.plugin.model().ready() && h.plugin.model().plot().get().sights().size() > 0),
                "the demo passage worked out");
        return h;
    }

    /**
     * Waits on the test thread until a condition holds (checked every 50 ms, up to 60 s).
     *
     * @param done the condition
     * @param what what is waited for, for the failure message
     */
    static void await(BooleanSupplier done, String what) {
        long end = System.nanoTime() + TimeUnit.SECONDS.toNanos(60);
        while (!done.getAsBoolean()) {
            if (System.nanoTime() > end) {
                throw new AssertionError("timed out waiting for " + what);
            }
            try {
                Thread.sleep(50);
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
                throw new AssertionError("interrupted waiting for " + what, e);
            }
        }
    }

    /** Shows only the overlays whose names end with one of these (FX thread). */
    void showOnly(String... suffixes) {
        for (LayerEntry e : chart.layers()) {
            boolean on = false;
            for (String s : suffixes) {
                on |= e.name().endsWith(s);
            }
            e.visibleProperty().set(on);
        }
    }

    /**
     * Paints the visible overlays with the shell's renderer and reads the picture back (FX thread).
     *
     * @param v the viewport
     * @return the picture
     */
    BufferedImage render(Viewport v) {
        lastRendered = v;
        Canvas canvas = new Canvas(v.widthPx(), v.heightPx());
        renderer.render(canvas.getGraphicsContext2D(), v, chart.paletteProperty().get(), chart.paintingOrder(),
                e -> {
                    throw e;
                });
        WritableImage img = canvas.snapshot(null, null);
        return SwingFXUtils.fromFXImage(img, null);
    }

    /** Stops the plugin and the worker (FX thread). */
    void close() {
        plugin.stop();
        worker.shutdownNow();
    }

    /** @return the area the plugin last asked to show */
    Viewport shownArea() {
        return shown;
    }

    // ---- pixels, for the tests ----

    /** Screen x of a position in a viewport, by the shell's projection (pixels). */
    static double x(Viewport v, GeoPosition p) {
        return v.screenX(Mercator.eastingM(p.lonDeg()));
    }

    /** Screen y of a position in a viewport, by the shell's projection (pixels). */
    static double y(Viewport v, GeoPosition p) {
        return v.screenY(Mercator.northingM(p.latDeg()));
    }

    /** Distance in RGB (0..sqrt 3) between a pixel and a colour. */
    static double distance(int argb, Color c) {
        double r = ((argb >> 16) & 255) / 255.0 - c.getRed();
        double g = ((argb >> 8) & 255) / 255.0 - c.getGreen();
        double b = (argb & 255) / 255.0 - c.getBlue();
        return Math.sqrt(r * r + g * g + b * b);
    }

    /**
     * Whether a pixel of the colour (within the tolerance) is within a radius of a point.
     *
     * @param img the picture
     * @param x x (pixels)
     * @param y y (pixels)
     * @param radiusPx the radius (pixels)
     * @param c the colour
     * @param tol the colour tolerance (RGB distance)
     * @return true if found
     */
    static boolean colourNear(BufferedImage img, double x, double y, int radiusPx, Color c, double tol) {
        int cx = (int) Math.floor(x);
        int cy = (int) Math.floor(y);
        for (int dx = -radiusPx; dx <= radiusPx; dx++) {
            for (int dy = -radiusPx; dy <= radiusPx; dy++) {
                int px = cx + dx;
                int py = cy + dy;
                if (dx * dx + dy * dy <= radiusPx * radiusPx + 1 && px >= 0 && py >= 0 && px < img.getWidth()
                        && py < img.getHeight() && distance(img.getRGB(px, py), c) < tol) {
                    return true;
                }
            }
        }
        return false;
    }

    // ---- PluginContext ----

    @Override
    public Overlay addOverlay(String name, OverlayPainter painter) {
        return LayerEntry.addOverlay(chart.layers(), name, painter, () -> {
            // each render paints afresh
        });
    }

    @Override
    public void addPanel(String title, Node content) {
        panels.put(title, content);
    }

    @Override
    public void addCommand(String menu, String label, Runnable action) {
        commands.put(menu + "/" + label, action);
    }

    @Override
    public void addChartClickListener(Consumer<GeoPosition> listener) {
        clicks.add(listener);
    }

    /** A click on the chart (FX thread). */
    void click(GeoPosition at) {
        clicks.forEach(c -> c.accept(at));
    }

    @Override
    public ObjectProperty<Instant> passageTime() {
        return chart.passageTimeProperty();
    }

    @Override
    public <T> CompletableFuture<T> runInBackground(String title, BackgroundTask<T> task) {
        return CompletableFuture.supplyAsync(() -> {
            try {
                return task.run(new Progress() {
                    @Override
                    public void update(double fraction, String message) {
                        // not shown
                    }

                    @Override
                    public boolean isCancelled() {
                        return false;
                    }
                });
            } catch (Exception e) {
                notes.add("ERROR: " + title + " failed: " + e);
                throw new java.util.concurrent.CompletionException(e);
            }
        }, worker);
    }

    @Override
    public void notify(Severity severity, String message) {
        notes.add(severity + ": " + message);
    }

    @Override
    public void requestRepaint() {
        // each render paints afresh
    }

    @Override
    public void showArea(double southDeg, double westDeg, double northDeg, double eastDeg) {
        shown = Viewport.fitting(southDeg, westDeg, northDeg, eastDeg, 1200, 800);
    }

    /** The view of the last {@link #render}, for {@link #renderChart}. */
    private Viewport lastRendered;

    @Override
    public WritableImage renderChart() {
        Viewport v = lastRendered != null ? lastRendered : shown;
        Canvas canvas = new Canvas(v.widthPx(), v.heightPx());
        renderer.render(canvas.getGraphicsContext2D(), v, chart.paletteProperty().get(), chart.paintingOrder(), e -> {
            throw e;
        });
        return canvas.snapshot(null, null);
    }

    @Override
    public boolean isHeadless() {
        return false;
    }

    @Override
    public Path userDirectory() {
        return userDir;
    }
}
