package org.sightwork.geo.app;

import java.io.IOException;
import java.nio.file.Path;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.ServiceConfigurationError;
import java.util.ServiceLoader;
import java.util.concurrent.CompletableFuture;
import java.util.function.Consumer;
import javafx.beans.property.ObjectProperty;
import javafx.scene.Node;
import org.sightwork.geo.earth.GeoPosition;
import org.sightwork.geo.spi.BackgroundTask;
import org.sightwork.geo.spi.ChartPlugin;
import org.sightwork.geo.spi.Overlay;
import org.sightwork.geo.spi.OverlayPainter;
import org.sightwork.geo.spi.PluginContext;
import org.sightwork.geo.spi.Severity;

/**
 * Finds the chart plugins with {@link ServiceLoader} and starts each with its own context. A plugin
 * that fails to load or start is reported and left out; the others go on.
 *
 * <p><b>Thread:</b> JavaFX application thread.
 */
final class PluginHost {

    private final Shell shell;
    private final List<ChartPlugin> started = new ArrayList<>();

    PluginHost(Shell shell) {
        this.shell = shell;
    }

    /** Loads and starts every plugin on the class path. */
    void startAll() {
        ServiceLoader<ChartPlugin> loader = ServiceLoader.load(ChartPlugin.class);
        var it = loader.iterator();
        while (true) {
            ChartPlugin p;
            try {
                if (!it.hasNext()) {
                    break;
                }
                p = it.next();
            } catch (ServiceConfigurationError e) {
                shell.notify(Severity.ERROR, "A plugin could not be loaded: " + e.getMessage());
                continue;
            }
            String name = safeName(p);
            try {
                p.start(new Context(name));
                started.add(p);
            } catch (RuntimeException | LinkageError e) {
                shell.notify(Severity.ERROR, "Plugin " + name + " failed to start and is left out: "
                        + (e.getMessage() == null ? e.getClass().getSimpleName() : e.getMessage()));
            }
        }
    }

    /**
     * The plugins running.
     *
     * @return their names
     */
    List<String> names() {
        return started.stream().map(PluginHost::safeName).toList();
    }

    /** Stops every plugin. */
    void stopAll() {
        for (ChartPlugin p : started) {
            try {
                p.stop();
            } catch (RuntimeException e) {
                System.err.println("sightwork: plugin " + safeName(p) + " failed to stop: " + e);
            }
        }
        started.clear();
    }

    private static String safeName(ChartPlugin p) {
        try {
            return p.name();
        } catch (RuntimeException e) {
            return p.getClass().getName();
        }
    }

    /** The context of one plugin. */
    private final class Context implements PluginContext {
        private final String pluginName;

        Context(String pluginName) {
            this.pluginName = pluginName;
        }

        @Override
        public Overlay addOverlay(String name, OverlayPainter painter) {
            return LayerEntry.addOverlay(shell.model().layers(), name, painter, shell::requestRepaint);
        }

        @Override
        public void addPanel(String title, Node content) {
            shell.addPanel(title, content);
        }

        @Override
        public void addCommand(String menu, String label, Runnable action) {
            shell.addCommand(menu, label, () -> {
                try {
                    action.run();
                } catch (RuntimeException e) {
                    notify(Severity.ERROR, label + " failed: " + e.getMessage());
                }
            });
        }

        @Override
        public void addChartClickListener(Consumer<GeoPosition> listener) {
            shell.model().clickListeners().add(listener);
        }

        @Override
        public ObjectProperty<Instant> passageTime() {
            return shell.model().passageTimeProperty();
        }

        @Override
        public <T> CompletableFuture<T> runInBackground(String title, BackgroundTask<T> task) {
            return shell.tasks().submit(title, task);
        }

        @Override
        public void notify(Severity severity, String message) {
            shell.notify(severity, message);
        }

        @Override
        public void requestRepaint() {
            shell.requestRepaint();
        }

        @Override
        public void showArea(double southDeg, double westDeg, double northDeg, double eastDeg) {
            shell.showArea(southDeg, westDeg, northDeg, eastDeg);
        }

        @Override
        public javafx.scene.image.WritableImage renderChart() {
            return shell.renderChart();
        }

        @Override
        public boolean isHeadless() {
            return shell.isHeadless();
        }

        @Override
        public Path userDirectory() {
            try {
                return shell.userFiles().directory();
            } catch (IOException e) {
                throw new IllegalStateException("the user directory cannot be made: " + e.getMessage(), e);
            }
        }

        @Override
        public String toString() {
            return "context of " + pluginName;
        }
    }
}
