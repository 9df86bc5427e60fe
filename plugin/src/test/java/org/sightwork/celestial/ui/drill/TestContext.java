package org.sightwork.celestial.ui.drill;

import java.nio.file.Path;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.CompletableFuture;
import java.util.function.Consumer;
import javafx.beans.property.ObjectProperty;
import javafx.scene.Node;
import org.sightwork.geo.app.HeadlessChart;
import org.sightwork.geo.app.LayerEntry;
import org.sightwork.geo.earth.GeoPosition;
import org.sightwork.geo.spi.BackgroundTask;
import org.sightwork.geo.spi.Overlay;
import org.sightwork.geo.spi.OverlayPainter;
import org.sightwork.geo.spi.PluginContext;
import org.sightwork.geo.spi.Severity;

/**
 * A plugin context over a {@link HeadlessChart} started without plugins, so that a test holds the
 * drill mode it installs: overlays go into the chart's layer list (as the shell's own context puts
 * them) and are painted by the shell's renderer; background work runs on the chart's task runner;
 * notifications are kept. Headless: no panels, no menus.
 */
final class TestContext implements PluginContext {

    private final HeadlessChart chart;
    private final Path userDir;
    final List<String> notes = new ArrayList<>();

    TestContext(HeadlessChart chart, Path userDir) {
        this.chart = chart;
        this.userDir = userDir;
    }

    @Override
    public Overlay addOverlay(String name, OverlayPainter painter) {
        return LayerEntry.addOverlay(chart.model().layers(), name, painter, () -> {
            // each render paints afresh
        });
    }

    @Override
    public void addPanel(String title, Node content) {
    }

    @Override
    public void addCommand(String menu, String label, Runnable action) {
    }

    @Override
    public void addChartClickListener(Consumer<GeoPosition> listener) {
    }

    @Override
    public ObjectProperty<Instant> passageTime() {
        return chart.model().passageTimeProperty();
    }

    @Override
    public <T> CompletableFuture<T> runInBackground(String title, BackgroundTask<T> task) {
        return chart.tasks().submit(title, task);
    }

    @Override
    public synchronized void notify(Severity severity, String message) {
        notes.add(severity + ": " + message);
    }

    @Override
    public void requestRepaint() {
    }

    @Override
    public void showArea(double southDeg, double westDeg, double northDeg, double eastDeg) {
    }

    @Override
    public boolean isHeadless() {
        return true;
    }

    @Override
    public Path userDirectory() {
        return userDir;
    }

    /** The drill tests render through the chart itself; no test asks this context for the view. */
    @Override
    public javafx.scene.image.WritableImage renderChart() {
        throw new UnsupportedOperationException("the drill tests render through HeadlessChart directly");
    }
}
