package org.sightwork.geo.spi;

import java.util.List;
import javafx.scene.paint.Color;
import org.sightwork.geo.earth.GeoPosition;

/**
 * Paints on the chart in geographic coordinates (WGS84 latitude and longitude, degrees); the
 * painter projects onto the Mercator chart, culls what is out of view and repeats a figure across
 * the antimeridian where needed.
 *
 * <p>Colours are given for the day palette. At dusk and at night the painter dims them and at night
 * shifts them to red so that overlays keep the low glare of the chart; {@link #lighting()} tells a
 * plugin which palette is in use if it wants to choose itself.
 *
 * <p><b>Geometry:</b> distances are in nautical miles. Small circles and great circles are on the
 * sphere on which one nautical mile is one minute of arc (the navigator's sphere), which is how a
 * circle of equal altitude is defined. Straight segments on the chart are rhumb lines.
 *
 * <p><b>Thread safety:</b> use only inside {@link OverlayPainter#paint}, on its thread.
 */
public interface GeoPainter {

    /**
     * A polyline whose segments are rhumb lines (straight on the Mercator chart).
     *
     * @param points the vertices, at least two
     * @param stroke colour, width and dash
     */
    void polyline(List<GeoPosition> points, Stroke stroke);

    /**
     * A rhumb line (loxodrome) from one position to another, the short way in longitude.
     *
     * @param from start
     * @param to end
     * @param stroke colour, width and dash
     */
    void rhumbLine(GeoPosition from, GeoPosition to, Stroke stroke);

    /**
     * The shorter great-circle arc between two positions (on the sphere), densified so that it
     * stays within a quarter pixel of the true curve.
     *
     * @param from start
     * @param to end; not antipodal to the start
     * @param stroke colour, width and dash
     */
    void greatCircle(GeoPosition from, GeoPosition to, Stroke stroke);

    /**
     * A small circle on the sphere: every point at the given great-circle distance from the centre,
     * such as a circle of equal altitude (radius = zenith distance, 1 nm per minute of arc). Drawn
     * exactly: densified on the sphere, split at the antimeridian; a circle around a pole is drawn
     * as the open curve it is on a Mercator chart.
     *
     * @param centre the centre (e.g. the geographical position of a body)
     * @param radiusNm the radius (nautical miles, (0, 10 800))
     * @param stroke colour, width and dash
     */
    void smallCircle(GeoPosition centre, double radiusNm, Stroke stroke);

    /**
     * A polygon whose edges are rhumb lines.
     *
     * @param ring the vertices, at least three, not repeating the first at the end
     * @param stroke the outline, or null for none
     * @param fill the fill colour (may be translucent), or null for none
     */
    void polygon(List<GeoPosition> ring, Stroke stroke, Color fill);

    /**
     * An ellipse given in nautical miles about its centre, such as the error ellipse of a fix.
     * Computed in the plane tangent at the centre, which is exact to better than 0.1 % for
     * semi-axes under 60 nm away from the poles.
     *
     * @param centre the centre
     * @param semiMajorNm the semi-major axis (nautical miles, &gt; 0)
     * @param semiMinorNm the semi-minor axis (nautical miles, (0, semiMajorNm])
     * @param orientationDeg direction of the major axis (degrees true, clockwise from north)
     * @param stroke the outline, or null for none
     * @param fill the fill colour, or null for none
     */
    void ellipse(GeoPosition centre, double semiMajorNm, double semiMinorNm, double orientationDeg,
            Stroke stroke, Color fill);

    /**
     * A marker of fixed size on the screen.
     *
     * @param at where
     * @param shape the shape
     * @param sizePx the size across (pixels)
     * @param stroke the outline, or null for none
     * @param fill the fill, or null for none
     */
    void marker(GeoPosition at, MarkerShape shape, double sizePx, Stroke stroke, Color fill);

    /**
     * A text label whose top-left corner is offset from a position (on a box of the chart's
     * halo colour so that it reads on land and sea).
     *
     * @param at the position labelled
     * @param text the text (one line)
     * @param colour the text colour
     * @param dxPx offset to the right (pixels)
     * @param dyPx offset downwards (pixels)
     */
    void label(GeoPosition at, String text, Color colour, double dxPx, double dyPx);

    /**
     * The chart's scale at a latitude, to size things on the screen.
     *
     * @param latDeg latitude (degrees)
     * @return pixels per nautical mile there
     */
    double pixelsPerNm(double latDeg);

    /**
     * The palette in use.
     *
     * @return day, dusk or night
     */
    Lighting lighting();
}
