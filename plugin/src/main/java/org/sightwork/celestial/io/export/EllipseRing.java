package org.sightwork.celestial.io.export;

import java.util.ArrayList;
import java.util.List;
import org.sightwork.geo.earth.GeoPosition;

/**
 * The outline of an error ellipse as a ring of positions, for formats that have no ellipse.
 *
 * <p><b>Method:</b> the ellipse is laid out in the plane tangent at its centre (north and east in
 * nautical miles) and each point is carried back by plane sailing: Δlat = north / 60,
 * Δlon = east / (60 cos lat) (Bowditch, <i>American Practical Navigator</i>, 2019 ed., ch. 7,
 * "plane sailing", from memory).
 *
 * <p><b>Accuracy:</b> for semi-axes under 60 nm and latitudes under 70° the plane sailing departs
 * from the sphere by well under 1 % of the axis, below the ellipse's own uncertainty.
 *
 * <p><b>Limits:</b> not for the polar regions (cos lat small).
 */
final class EllipseRing {

    /** Vertices of the ring: 5° apart, smooth at any zoom a navigator uses. */
    static final int VERTICES = 72;

    private EllipseRing() {
    }

    /**
     * The ring, closed (the first vertex repeated at the end).
     *
     * @param centre the centre
     * @param e the ellipse
     * @return {@link #VERTICES} + 1 positions
     */
    static List<GeoPosition> ring(GeoPosition centre, PlotExport.Ellipse e) {
        double theta = Math.toRadians(e.orientationDeg());
        double cosLat = Math.cos(Math.toRadians(centre.latDeg()));
        List<GeoPosition> ring = new ArrayList<>(VERTICES + 1);
        for (int i = 0; i <= VERTICES; i++) {
            double t = 2 * Math.PI * (i % VERTICES) / VERTICES;
            double along = e.semiMajorNm() * Math.cos(t);
            double across = e.semiMinorNm() * Math.sin(t);
            // Major axis along the bearing theta (clockwise from north); minor axis 90° to its right.
            double northNm = along * Math.cos(theta) - across * Math.sin(theta);
            double eastNm = along * Math.sin(theta) + across * Math.cos(theta);
            ring.add(GeoPosition.of(centre.latDeg() + northNm / 60.0,
                    centre.lonDeg() + eastNm / (60.0 * cosLat)));
        }
        return ring;
    }
}
