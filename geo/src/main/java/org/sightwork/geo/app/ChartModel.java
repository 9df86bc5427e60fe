package org.sightwork.geo.app;

import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.CopyOnWriteArrayList;
import java.util.function.Consumer;
import javafx.beans.property.ObjectProperty;
import javafx.beans.property.SimpleObjectProperty;
import javafx.collections.FXCollections;
import javafx.collections.ObservableList;
import org.sightwork.geo.earth.GeoPosition;
import org.sightwork.geo.render.Palette;
import org.sightwork.geo.render.RenderLayer;

/**
 * What the window and the headless renderer share: the layer list (top of the list is painted
 * last, on top), the palette, the passage time and the chart-click listeners.
 *
 * <p><b>Thread:</b> JavaFX application thread, except the listener list (thread-safe).
 */
public final class ChartModel {

    private final ObservableList<LayerEntry> layers = FXCollections.observableArrayList();
    private final ObjectProperty<Palette> palette = new SimpleObjectProperty<>(Palette.DAY);
    private final ObjectProperty<Instant> passageTime = new SimpleObjectProperty<>();
    private final List<Consumer<GeoPosition>> clickListeners = new CopyOnWriteArrayList<>();

    /**
     * The layer list, top first.
     *
     * @return the list
     */
    public ObservableList<LayerEntry> layers() {
        return layers;
    }

    /**
     * The visible layers in painting order (bottom first).
     *
     * @return renderers
     */
    public List<RenderLayer> paintingOrder() {
        List<RenderLayer> out = new ArrayList<>();
        for (int i = layers.size() - 1; i >= 0; i--) {
            LayerEntry e = layers.get(i);
            if (e.visibleProperty().get()) {
                out.add(e.renderer());
            }
        }
        return out;
    }

    /**
     * Adds chart layers just above the other chart layers (below the graticule and overlays).
     *
     * @param entries the new layers, in painting order (bottom first)
     */
    public void addChartLayers(List<LayerEntry> entries) {
        int at = 0;
        while (at < layers.size() && layers.get(at).kind() != LayerEntry.Kind.CHART) {
            at++;
        }
        for (LayerEntry e : entries) {
            layers.add(at, e);
        }
    }

    /**
     * Adds chart layers below every other layer (a base chart that arrives after the detail).
     *
     * @param entries the new layers, in painting order (bottom first)
     */
    public void addBaseChartLayers(List<LayerEntry> entries) {
        for (LayerEntry e : entries) {
            layers.add(layers.size() - entries.indexOf(e), e);
        }
    }

    /**
     * The palette.
     *
     * @return the property
     */
    public ObjectProperty<Palette> paletteProperty() {
        return palette;
    }

    /**
     * The shared passage time.
     *
     * @return the property
     */
    public ObjectProperty<Instant> passageTimeProperty() {
        return passageTime;
    }

    /**
     * The chart-click listeners.
     *
     * @return the live list
     */
    public List<Consumer<GeoPosition>> clickListeners() {
        return clickListeners;
    }

    /**
     * Tells the listeners of a click.
     *
     * @param at where
     * @param onFailure told if a listener throws
     */
    public void fireClick(GeoPosition at, Consumer<RuntimeException> onFailure) {
        for (Consumer<GeoPosition> l : clickListeners) {
            try {
                l.accept(at);
            } catch (RuntimeException e) {
                onFailure.accept(e);
            }
        }
    }
}
