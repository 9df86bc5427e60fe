/**
 * The plugin contract of the chart shell: what a plugin may add (commands, overlay layers, panels)
 * and what it may listen to. Plugins are found with {@link java.util.ServiceLoader}. See
 * {@code docs/PLUGINS.md}.
 */
package org.sightwork.geo.spi;
