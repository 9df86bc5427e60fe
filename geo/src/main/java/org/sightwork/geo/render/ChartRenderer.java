package org.sightwork.geo.render;

import java.util.List;
import java.util.function.Consumer;
import javafx.scene.canvas.GraphicsContext;

/**
 * Paints a frame: the sea, then each visible layer bottom to top, then the scale bar. The window's
 * map view and the headless {@code sightwork chart} command both draw through this.
 *
 * <p><b>Thread:</b> that of the graphics context (the JavaFX application thread for a canvas in a
 * scene). One renderer per canvas: it keeps the painter's buffers between frames.
 */
public final class ChartRenderer {

    private final FxGeoPainter painter = new FxGeoPainter();

    /**
     * Paints a frame.
     *
     * @param gc the canvas's graphics context
     * @param viewport what to show; its size is the canvas's
     * @param palette the colours
     * @param layers the visible layers, bottom first
     * @param onLayerFailure told of a layer that threw while painting (it is skipped, the frame goes on)
     */
    public void render(GraphicsContext gc, Viewport viewport, Palette palette, List<? extends RenderLayer> layers,
            Consumer<RuntimeException> onLayerFailure) {
        gc.save();
        gc.setFill(palette.sea());
        gc.fillRect(0, 0, viewport.widthPx(), viewport.heightPx());
        painter.begin(gc, viewport, palette);
        Frame frame = new Frame(gc, viewport, palette, painter);
        for (RenderLayer layer : layers) {
            gc.save();
            try {
                layer.paint(frame);
            } catch (RuntimeException e) {
                onLayerFailure.accept(e);
            } finally {
                gc.restore();
            }
        }
        ScaleBar.paint(gc, viewport, palette);
        gc.restore();
    }
}
