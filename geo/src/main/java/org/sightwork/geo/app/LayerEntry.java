package org.sightwork.geo.app;

import javafx.beans.property.BooleanProperty;
import javafx.beans.property.SimpleBooleanProperty;
import org.sightwork.geo.render.RenderLayer;

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
