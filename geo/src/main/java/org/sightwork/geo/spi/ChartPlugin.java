package org.sightwork.geo.spi;

/**
 * A plugin of the chart shell. Found with {@link java.util.ServiceLoader}: list the implementing
 * class in {@code META-INF/services/org.sightwork.geo.spi.ChartPlugin}. It needs a public
 * no-argument constructor.
 *
 * <p>The shell calls {@link #start} once, after the chart window (or the headless renderer of
 * {@code sightwork chart}) exists and before the first frame. A plugin that throws from
 * {@code start} is reported in a notification and left out; the other plugins go on.
 *
 * <p><b>Thread safety:</b> {@link #start} and {@link #stop} run on the JavaFX application thread.
 * They must return quickly: anything slow goes through {@link PluginContext#runInBackground}.
 */
public interface ChartPlugin {

    /**
     * The plugin's name, shown in notifications and in Help &gt; About.
     *
     * @return a short name such as "Celestial", never null
     */
    String name();

    /**
     * Starts the plugin: add overlays, panels and commands, register listeners.
     *
     * @param context what the shell offers; valid until {@link #stop}
     */
    void start(PluginContext context);

    /** Called when the shell closes; release what the plugin holds. Does nothing by default. */
    default void stop() {
    }
}
