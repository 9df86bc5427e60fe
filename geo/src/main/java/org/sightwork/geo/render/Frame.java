package org.sightwork.geo.render;

import javafx.scene.canvas.GraphicsContext;

/**
 * One frame being drawn: where (graphics context), what part of the chart (viewport), with which
 * colours (palette), and the painter that plugins' overlays draw through.
 *
 * @param gc the graphics context of the canvas
 * @param viewport the viewport
 * @param palette the palette
 * @param painter the geographic painter for overlays
 */
public record Frame(GraphicsContext gc, Viewport viewport, Palette palette, FxGeoPainter painter) {
}
