package org.sightwork.geo.app;

import java.util.List;
import javafx.beans.property.BooleanProperty;
import javafx.beans.property.SimpleBooleanProperty;
import org.sightwork.geo.render.RenderLayer;
import org.sightwork.geo.spi.Overlay;
import org.sightwork.geo.spi.OverlayPainter;

/**
 * One row of the layer list: a name, whether it is shown, and what paints it.
 *
 * <p><b>Thread:</b> JavaFX application thread.
 */
public final class LayerEntry {

    /** What kind of layer. */
    public enum Kind {
        /** Chart data from a file. */
        CHART,
        /** The graticule. */
        GRATICULE,
        /** Names of places, from the chart data. */
        NAMES,
        /** A plugin's overlay. */
        OVERLAY
    }

    private final String name;
    private final Kind kind;
    private final RenderLayer renderer;
    private final BooleanProperty visible = new SimpleBooleanProperty(true);

    /**
     * A row.
     *
     * @param name the name shown
     * @param kind the kind
     * @param renderer what paints it
     */
    public LayerEntry(String name, Kind kind, RenderLayer renderer) {
        this.name = name;
        this.kind = kind;
        this.renderer = renderer;
    }

    /**
     * Puts a plugin's overlay on top of a layer list, as the shell's plugin context does: showing,
     * hiding, repainting and removing it each ask for a repaint.
     *
     * @param layers the layer list
     * @param name the overlay's name
     * @param painter what it paints
     * @param repaint asks for a repaint of the chart (test contexts that render afresh pass a no-op)
     * @return the overlay
     */
    public static Overlay addOverlay(List<LayerEntry> layers, String name, OverlayPainter painter, Runnable repaint) {
        LayerEntry entry = new LayerEntry(name, Kind.OVERLAY, frame -> painter.paint(frame.painter()));
        layers.add(0, entry);
        entry.visibleProperty().addListener((o, a, b) -> repaint.run());
        repaint.run();
        return new Overlay() {
            @Override
            public String name() {
                return name;
            }

            @Override
            public boolean isVisible() {
                return entry.visibleProperty().get();
            }

            @Override
            public void setVisible(boolean visible) {
                entry.visibleProperty().set(visible);
            }

            @Override
            public void repaint() {
                repaint.run();
            }

            @Override
            public void remove() {
                layers.remove(entry);
                repaint.run();
            }
        };
    }

    /**
     * The name.
     *
     * @return the name
     */
    public String name() {
        return name;
    }

    /**
     * The kind.
     *
     * @return the kind
     */
    public Kind kind() {
        return kind;
    }

    /**
     * The painter.
     *
     * @return the renderer
     */
    public RenderLayer renderer() {
        return renderer;
    }

    /**
     * Shown or not.
     *
     * @return the property
     */
    public BooleanProperty visibleProperty() {
        return visible;
    }

    @Override
    public String toString() {
        return name;
    }
}
