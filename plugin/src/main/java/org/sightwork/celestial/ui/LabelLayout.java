package org.sightwork.celestial.ui;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.sightwork.geo.earth.GeoPosition;
import org.sightwork.geo.earth.Mercator;

/**
 * Places the chart's labels so that they do not cover each other or the fix marks: each label has
 * candidate places (an anchor on the chart and an offset on the screen), tried in order; labels are
 * placed by priority (fixes first, then the DR marker, set and drift, lines of position, lines carried
 * for a running fix, body GPs, the DR's hour ticks), each at its first candidate that overlaps
 * nothing placed before it; a label with no free place is left out (its line or mark stays, and
 * the sight log names it).
 *
 * <p><b>Method:</b> greedy placement over candidate positions, the simplest of the point-feature
 * label placement methods (Christensen, Marks and Shieber, "An empirical study of algorithms for
 * point-feature label placement", ACM Transactions on Graphics 14(3), 1995, from memory). Screen
 * positions are Mercator metres divided by the view's metres per pixel, which is the chart's own
 * projection up to a shift that does not change overlaps.
 *
 * <p><b>Thread:</b> JavaFX application thread (used by {@link PlotOverlays}).
 */
final class LabelLayout {

    /** Width of one character of the chart's 12 px label font (pixels), as the painter sizes its halo. */
    static final double CHAR_PX = 7.4;
    /** Height of a label's halo (pixels). */
    static final double HEIGHT_PX = 16;
    /** Clear space kept round a label (pixels). */
    static final double GAP_PX = 2;

    /**
     * A place for a label.
     *
     * @param at the position the label belongs to
     * @param dxPx offset of its top-left corner to the right (pixels)
     * @param dyPx offset downwards (pixels)
     */
    record Place(GeoPosition at, double dxPx, double dyPx) {
    }

    /**
     * A label to place.
     *
     * @param key its key, to look the place up when painting
     * @param text the text
     * @param priority lower is placed first
     * @param places the candidates, best first
     */
    record Request(String key, String text, double priority, List<Place> places) {
    }

    private LabelLayout() {
    }

    /**
     * Places labels.
     *
     * @param requests the labels
     * @param obstacles screen areas to keep clear: {centre position, half size in pixels} as places
     *     whose dxPx is the half size
     * @param metresPerPx the view's scale (Mercator metres per pixel)
     * @return the place chosen for each label placed, by key
     */
    static Map<String, Place> place(List<Request> requests, List<Place> obstacles, double metresPerPx) {
        List<double[]> taken = new ArrayList<>();
        for (Place o : obstacles) {
            double x = x(o.at(), metresPerPx);
            double y = y(o.at(), metresPerPx);
            taken.add(new double[] {x - o.dxPx(), y - o.dxPx(), x + o.dxPx(), y + o.dxPx()});
        }
        List<Request> order = new ArrayList<>(requests);
        order.sort(Comparator.comparingDouble(Request::priority));
        Map<String, Place> out = new HashMap<>();
        for (Request r : order) {
            for (Place c : r.places()) {
                double[] box = box(c, r.text(), metresPerPx);
                boolean free = true;
                for (double[] t : taken) {
                    if (box[0] < t[2] && t[0] < box[2] && box[1] < t[3] && t[1] < box[3]) {
                        free = false;
                        break;
                    }
                }
                if (free) {
                    taken.add(box);
                    out.put(r.key(), c);
                    break;
                }
            }
        }
        return out;
    }

    /** The halo box of a label at a place (screen pixels up to a shift), with the clear space. */
    static double[] box(Place c, String text, double metresPerPx) {
        double x = x(c.at(), metresPerPx) + c.dxPx();
        double y = y(c.at(), metresPerPx) + c.dyPx();
        return new double[] {x - 2 - GAP_PX, y - 1 - GAP_PX, x + text.length() * CHAR_PX + 2 + GAP_PX,
            y + HEIGHT_PX - 1 + GAP_PX};
    }

    /** Width of a label (pixels). */
    static double widthPx(String text) {
        return text.length() * CHAR_PX + 4;
    }

    private static double x(GeoPosition p, double mpp) {
        return Mercator.eastingM(p.lonDeg()) / mpp;
    }

    private static double y(GeoPosition p, double mpp) {
        return -Mercator.northingM(p.latDeg()) / mpp;
    }
}
