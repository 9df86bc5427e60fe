package org.sightwork.geo.spi;

/**
 * Paints one overlay in geographic coordinates. Called for every frame in which the overlay is
 * visible, with a {@link GeoPainter} that projects for it.
 *
 * <p><b>Thread safety:</b> called on the JavaFX application thread (or the thread of the headless
 * renderer). It must be quick (well under a millisecond for a typical overlay): compute the
 * geometry beforehand, paint here.
 */
@FunctionalInterface
public interface OverlayPainter {

    /**
     * Paints the overlay.
     *
     * @param painter the painter for this frame; valid only during the call
     */
    void paint(GeoPainter painter);
}
