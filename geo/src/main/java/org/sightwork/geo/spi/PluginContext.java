package org.sightwork.geo.spi;

import java.nio.file.Path;
import java.time.Instant;
import java.util.concurrent.CompletableFuture;
import java.util.function.Consumer;
import javafx.beans.property.ObjectProperty;
import javafx.scene.Node;
import javafx.scene.image.WritableImage;
import org.sightwork.geo.earth.GeoPosition;

/**
 * What the shell offers a plugin: overlays on the chart, panels, menu commands, chart clicks, the
 * shared passage time, background work with progress, and notifications.
 *
 * <p><b>Thread safety:</b> call every method on the JavaFX application thread, except
 * {@link #notify}, {@link #requestRepaint} and {@link #runInBackground}, which may be called from
 * any thread. Listeners and commands are called on the JavaFX application thread.
 *
 * <p><b>Headless use:</b> {@code sightwork chart} starts plugins too, so that their overlays appear
 * in the rendered image. There {@link #isHeadless()} is true; panels and commands are accepted and
 * ignored, and chart clicks never come.
 */
public interface PluginContext {

    /**
     * Adds an overlay layer on top of the chart. It appears in the layer list under the given name,
     * where the user can show, hide and reorder it.
     *
     * @param name the name in the layer list
     * @param painter paints the overlay on every frame in which it is visible
     * @return the overlay, to show, hide, repaint or remove it later
     */
    Overlay addOverlay(String name, OverlayPainter painter);

    /**
     * Adds a panel to the side dock of the window.
     *
     * @param title the panel's title
     * @param content the panel's content
     */
    void addPanel(String title, Node content);

    /**
     * Adds a command to a menu of the window's menu bar; a menu that does not exist yet is made.
     *
     * @param menu the menu's title, e.g. "Sights"
     * @param label the command's label
     * @param action what the command does (on the JavaFX application thread)
     */
    void addCommand(String menu, String label, Runnable action);

    /**
     * Listens to clicks on the chart (primary button, not a drag, range tool not active).
     *
     * @param listener receives the position clicked (WGS84)
     */
    void addChartClickListener(Consumer<GeoPosition> listener);

    /**
     * The passage time cursor shared by the shell and every plugin (UTC). Null until someone sets
     * it. Observe it to follow the time; set it to move every plugin's cursor.
     *
     * @return the property (JavaFX application thread only)
     */
    ObjectProperty<Instant> passageTime();

    /**
     * Runs slow work off the JavaFX application thread, with a progress bar in the status bar. A
     * failure is reported in a notification naming the task.
     *
     * @param <T> the result type
     * @param title what the work is, e.g. "Reducing 24 sights"
     * @param task the work
     * @return completes with the task's result; complete your UI with
     *     {@code thenAcceptAsync(..., Platform::runLater)}
     */
    <T> CompletableFuture<T> runInBackground(String title, BackgroundTask<T> task);

    /**
     * Shows a short notification that does not block the user (it fades after a while; errors stay
     * until dismissed). In headless use it is printed on standard error.
     *
     * @param severity how serious
     * @param message the message, in words a navigator understands
     */
    void notify(Severity severity, String message);

    /** Asks for the chart to be painted again (coalesced with other requests). */
    void requestRepaint();

    /**
     * Moves and zooms the chart so that the given area is all in view, centred.
     *
     * @param southDeg south edge (degrees)
     * @param westDeg west edge (degrees)
     * @param northDeg north edge (degrees)
     * @param eastDeg east edge (degrees; may be less than west across the antimeridian)
     */
    void showArea(double southDeg, double westDeg, double northDeg, double eastDeg);

    /**
     * Paints the chart view as it is now (chart layers, graticule, visible overlays and the scale
     * bar; not the panels, menus, notifications or the range tool) with the same renderer as the
     * screen and {@code sightwork chart}, on an off-screen canvas the size of the view, and returns
     * the picture: for a "chart as PNG" export. Headless, the view is the one last rendered, or the
     * area last asked for with {@link #showArea} at 1200 x 800 pixels.
     *
     * @return the picture (JavaFX application thread only)
     */
    WritableImage renderChart();

    /**
     * Whether the shell is rendering headless ({@code sightwork chart}).
     *
     * @return true when there is no window
     */
    boolean isHeadless();

    /**
     * The user's Sightwork directory ({@code ~/.sightwork}), where a plugin may keep its settings in
     * a sub-directory named after itself. It exists.
     *
     * @return the directory
     */
    Path userDirectory();
}
