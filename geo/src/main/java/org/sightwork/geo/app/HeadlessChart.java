package org.sightwork.geo.app;

import java.awt.image.BufferedImage;
import java.util.List;
import javafx.embed.swing.SwingFXUtils;
import javafx.scene.Node;
import javafx.scene.canvas.Canvas;
import javafx.scene.image.WritableImage;
import org.sightwork.geo.chart.ChartSet;
import org.sightwork.geo.render.ChartRenderer;
import org.sightwork.geo.render.Palette;
import org.sightwork.geo.render.Viewport;
import org.sightwork.geo.spi.Severity;

/**
 * The chart without a window: the same layers, plugins' overlays and renderer as the window,
 * painted onto an off-screen canvas and read back as an image. Behind {@code sightwork chart} and
 * the pixel tests.
 *
 * <p><b>Thread:</b> make it and call {@link #render} on the JavaFX application thread
 * ({@link HeadlessPlatform#call}).
 */
public final class HeadlessChart extends ShellBase {

    private final ChartRenderer renderer = new ChartRenderer();
    private final PluginHost plugins = new PluginHost(this);
    private Viewport requestedArea;
    private double[] requestedBounds;
    private Viewport lastRendered;

    /**
     * A headless chart.
     *
     * @param chart the chart data
     * @param palette the palette
     * @param startPlugins whether to start the plugins on the class path
     */
    public HeadlessChart(ChartSet chart, Palette palette, boolean startPlugins) {
        model.layers().add(BundledChart.graticuleEntry());
        model.layers().add(0, BundledChart.namesEntry(model));
        model.addChartLayers(BundledChart.entriesOf(chart.layers()));
        model.paletteProperty().set(palette);
        if (startPlugins) {
            plugins.startAll();
        }
    }

    /**
     * Waits until the plugins' background work is done (off the FX thread).
     *
     * @param timeoutMs the longest wait (milliseconds)
     * @return true if done
     * @throws InterruptedException if interrupted
     */
    public boolean awaitIdle(long timeoutMs) throws InterruptedException {
        return tasks.awaitIdle(timeoutMs);
    }

    /**
     * Paints a viewport and reads it back.
     *
     * @param viewport what to show, and the image size
     * @return the image (ARGB)
     */
    public BufferedImage render(Viewport viewport) {
        return SwingFXUtils.fromFXImage(paint(viewport), null);
    }

    private WritableImage paint(Viewport viewport) {
        lastRendered = viewport;
        Canvas canvas = new Canvas(viewport.widthPx(), viewport.heightPx());
        renderer.render(canvas.getGraphicsContext2D(), viewport, model.paletteProperty().get(),
                model.paintingOrder(), e -> notify(Severity.ERROR, "A layer failed to paint: " + e.getMessage()));
        return canvas.snapshot(null, null);
    }

    /** Size of the picture of {@link #renderChart} before anything was rendered (pixels). */
    static final int DEFAULT_WIDTH_PX = 1200;
    static final int DEFAULT_HEIGHT_PX = 800;

    @Override
    public WritableImage renderChart() {
        Viewport v = lastRendered;
        if (v == null) {
            double[] b = requestedBounds != null ? requestedBounds : new double[] {-60, -180, 75, 180};
            v = Viewport.fitting(b[0], b[1], b[2], b[3], DEFAULT_WIDTH_PX, DEFAULT_HEIGHT_PX);
        }
        return paint(v);
    }

    /**
     * The area a plugin asked to show, if any.
     *
     * @return the viewport asked for, or null
     */
    public Viewport requestedArea() {
        return requestedArea;
    }

    /**
     * The plugins started.
     *
     * @return their names
     */
    public List<String> pluginNames() {
        return plugins.names();
    }

    /** Stops the plugins and the workers. */
    public void close() {
        plugins.stopAll();
        tasks.shutdown();
    }

    @Override
    public boolean isHeadless() {
        return true;
    }

    @Override
    public void addPanel(String title, Node content) {
        // no window: panels are not shown
    }

    @Override
    public void addCommand(String menu, String label, Runnable action) {
        // no window: no menus
    }

    @Override
    public void notify(Severity severity, String message) {
        System.err.println("sightwork chart: " + severity.name().toLowerCase(java.util.Locale.ROOT) + ": " + message);
    }

    @Override
    public void requestRepaint() {
        // each render paints afresh
    }

    @Override
    public void showArea(double southDeg, double westDeg, double northDeg, double eastDeg) {
        requestedArea = Viewport.fitting(southDeg, westDeg, northDeg, eastDeg, 100, 100);
        requestedBounds = new double[] {southDeg, westDeg, northDeg, eastDeg};
    }
}
