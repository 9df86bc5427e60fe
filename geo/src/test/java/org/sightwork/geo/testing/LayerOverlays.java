package org.sightwork.geo.testing;

import java.util.List;
import org.sightwork.geo.app.LayerEntry;
import org.sightwork.geo.spi.Overlay;
import org.sightwork.geo.spi.OverlayPainter;

/**
 * For test plugin contexts: an overlay put into a chart's layer list on top, as the shell's own
 * context puts it, and painted by whatever renders that list. Nothing is repainted on request
 * (a test renders afresh each time).
 */
public final class LayerOverlays {

    private LayerOverlays() {
    }

    /**
     * Adds an overlay on top of the layers.
     *
     * @param layers the chart's layer list (FX thread)
     * @param name the overlay's name
     * @param painter what it paints
     * @return the overlay; {@link Overlay#remove} takes it out of the list again
     */
    public static Overlay add(List<LayerEntry> layers, String name, OverlayPainter painter) {
        LayerEntry entry = new LayerEntry(name, LayerEntry.Kind.OVERLAY, frame -> painter.paint(frame.painter()));
        layers.add(0, entry);
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
                // each render paints afresh
            }

            @Override
            public void remove() {
                layers.remove(entry);
            }
        };
    }
}
