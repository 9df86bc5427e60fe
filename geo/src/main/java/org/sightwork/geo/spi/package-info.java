/**
 * The plugin contract of the chart shell: what a plugin may add (commands, overlay layers, panels,
 * menu commands) and what it may listen to (chart clicks, the shared passage time). Plugins are
 * found with {@link java.util.ServiceLoader}: {@link org.sightwork.geo.spi.CommandProvider} for the
 * command line, {@link org.sightwork.geo.spi.ChartPlugin} for the chart. See {@code docs/PLUGINS.md}.
 *
 * <p>Units: positions in WGS84 degrees ({@link org.sightwork.geo.earth.GeoPosition}), distances in
 * nautical miles, directions in degrees true, sizes on the screen in pixels. Threads: JavaFX
 * application thread unless a method says otherwise.
 */
package org.sightwork.geo.spi;
