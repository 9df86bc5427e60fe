package org.sightwork.geo.app;

import javafx.scene.Node;
import javafx.scene.image.WritableImage;
import org.sightwork.geo.spi.Severity;

/**
 * What a plugin context needs from its host (the window or the headless renderer).
 *
 * <p><b>Thread:</b> JavaFX application thread, except {@link #notify} and {@link #requestRepaint}.
 */
interface Shell {

    ChartModel model();

    TaskRunner tasks();

    UserFiles userFiles();

    boolean isHeadless();

    void addPanel(String title, Node content);

    void addCommand(String menu, String label, Runnable action);

    void notify(Severity severity, String message);

    void requestRepaint();

    void showArea(double southDeg, double westDeg, double northDeg, double eastDeg);

    /** The chart view painted off-screen (see {@link org.sightwork.geo.spi.PluginContext#renderChart}). */
    WritableImage renderChart();
}
