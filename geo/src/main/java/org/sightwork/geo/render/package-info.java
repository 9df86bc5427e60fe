/**
 * Portrayal and drawing: the viewport (Mercator metres to pixels), the day, dusk and night palettes,
 * the styles of each feature class, the graticule, the scale bar, and the renderer that paints a
 * viewport onto a JavaFX {@code GraphicsContext}; the same code draws the window and the headless
 * PNG.
 *
 * <p>Units: chart coordinates in Mercator (EPSG:3395) metres, screen coordinates in pixels with y
 * down, positions in WGS84 degrees. <b>Threads:</b> painting a {@code Canvas} that is in a scene
 * happens on the JavaFX application thread; everything here is quick enough for that (the slow work,
 * reading and generalising, is done beforehand in {@code org.sightwork.geo.chart}).
 */
package org.sightwork.geo.render;
