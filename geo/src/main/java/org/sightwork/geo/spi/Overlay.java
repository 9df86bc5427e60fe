package org.sightwork.geo.spi;

/**
 * An overlay layer added by a plugin, as seen by that plugin.
 *
 * <p><b>Thread safety:</b> JavaFX application thread, except {@link #repaint()} (any thread).
 */
public interface Overlay {

    /**
     * The name shown in the layer list.
     *
     * @return the name
     */
    String name();

    /**
     * Whether the overlay is shown (the user may change it in the layer list).
     *
     * @return true when shown
     */
    boolean isVisible();

    /**
     * Shows or hides the overlay.
     *
     * @param visible true to show
     */
    void setVisible(boolean visible);

    /** Paints the chart again because what this overlay shows has changed. */
    void repaint();

    /** Removes the overlay from the chart and the layer list. */
    void remove();
}
