package org.sightwork.geo.render;

/**
 * Something the renderer paints as one layer: chart data, the graticule, or a plugin's overlay.
 * Visibility and order are the caller's (the layer list); a layer only paints.
 */
@FunctionalInterface
public interface RenderLayer {

    /**
     * Paints this layer into a frame.
     *
     * @param frame the frame being drawn
     */
    void paint(Frame frame);
}
