package org.sightwork.geo.render;

import org.locationtech.jts.geom.Envelope;
import org.sightwork.geo.earth.Earth;
import org.sightwork.geo.earth.GeoPosition;
import org.sightwork.geo.earth.Mercator;

/**
 * What part of the Mercator chart is on the screen: the chart point at the centre of the screen,
 * the scale, and the size of the screen. Immutable; every move makes a new one.
 *
 * @param centreXM easting at the centre of the screen (Mercator metres)
 * @param centreYM northing at the centre of the screen (Mercator metres)
 * @param metresPerPx chart metres per pixel (the scale on the equator; a ground length at latitude
 *     φ is {@link Mercator#scaleFactor} times longer on the chart)
 * @param widthPx screen width (pixels)
 * @param heightPx screen height (pixels)
 */
public record Viewport(double centreXM, double centreYM, double metresPerPx, int widthPx, int heightPx) {

    /** Finest scale allowed: 5 cm of chart per pixel. */
    public static final double MIN_METRES_PER_PX = 0.05;
    /** Coarsest scale allowed: the world about 400 pixels wide. */
    public static final double MAX_METRES_PER_PX = 100_000.0;
    private static final double MAX_NORTHING_M = Mercator.northingM(Mercator.MAX_LAT_DEG);

    /** Checks and clamps. */
    public Viewport {
        if (widthPx < 1 || heightPx < 1) {
            throw new IllegalArgumentException("viewport size " + widthPx + "x" + heightPx + " px is empty");
        }
        if (!(metresPerPx > 0) || !Double.isFinite(centreXM) || !Double.isFinite(centreYM)) {
            throw new IllegalArgumentException("viewport needs a finite centre and a positive scale");
        }
        metresPerPx = Math.max(MIN_METRES_PER_PX, Math.min(MAX_METRES_PER_PX, metresPerPx));
        centreYM = Math.max(-MAX_NORTHING_M, Math.min(MAX_NORTHING_M, centreYM));
        double halfWorld = Mercator.eastingM(180);
        centreXM = Math.max(-2 * halfWorld, Math.min(2 * halfWorld, centreXM));
    }

    /**
     * The viewport that shows an area whole, centred, at true Mercator aspect; the other axis is
     * widened to fill the screen.
     *
     * @param southDeg south edge (degrees)
     * @param westDeg west edge (degrees)
     * @param northDeg north edge (degrees)
     * @param eastDeg east edge (degrees); less than west means across the antimeridian
     * @param widthPx screen width (pixels)
     * @param heightPx screen height (pixels)
     * @return the viewport
     */
    public static Viewport fitting(double southDeg, double westDeg, double northDeg, double eastDeg,
            int widthPx, int heightPx) {
        if (!(northDeg > southDeg)) {
            throw new IllegalArgumentException("north edge " + northDeg + "° must be north of south edge "
                    + southDeg + "°");
        }
        double east = eastDeg <= westDeg ? eastDeg + 360 : eastDeg;
        double x0 = Mercator.eastingM(westDeg);
        double x1 = Mercator.eastingM(east);
        double y0 = Mercator.northingM(southDeg);
        double y1 = Mercator.northingM(northDeg);
        double mpp = Math.max((x1 - x0) / widthPx, (y1 - y0) / heightPx);
        return new Viewport((x0 + x1) / 2, (y0 + y1) / 2, mpp, widthPx, heightPx);
    }

    /**
     * Screen x of an easting.
     *
     * @param xM easting (metres)
     * @return x (pixels)
     */
    public double screenX(double xM) {
        return (xM - centreXM) / metresPerPx + widthPx * 0.5;
    }

    /**
     * Screen y of a northing.
     *
     * @param yM northing (metres)
     * @return y (pixels, down)
     */
    public double screenY(double yM) {
        return heightPx * 0.5 - (yM - centreYM) / metresPerPx;
    }

    /**
     * Easting at a screen x.
     *
     * @param sx x (pixels)
     * @return easting (metres)
     */
    public double xM(double sx) {
        return centreXM + (sx - widthPx * 0.5) * metresPerPx;
    }

    /**
     * Northing at a screen y.
     *
     * @param sy y (pixels, down)
     * @return northing (metres)
     */
    public double yM(double sy) {
        return centreYM - (sy - heightPx * 0.5) * metresPerPx;
    }

    /**
     * The position under a screen point.
     *
     * @param sx x (pixels)
     * @param sy y (pixels)
     * @return the position (longitude brought into [-180°, 180°))
     */
    public GeoPosition positionAt(double sx, double sy) {
        return GeoPosition.of(Mercator.latitudeDeg(yM(sy)), Mercator.longitudeDeg(xM(sx)));
    }

    /**
     * The chart area on the screen.
     *
     * @return the area (Mercator metres)
     */
    public Envelope areaM() {
        return new Envelope(xM(0), xM(widthPx), yM(heightPx), yM(0));
    }

    /**
     * Zooms keeping the chart point under a screen point where it is.
     *
     * @param sx x of the fixed point (pixels)
     * @param sy y of the fixed point (pixels)
     * @param factor &gt; 1 zooms in
     * @return the new viewport
     */
    public Viewport zoomedAbout(double sx, double sy, double factor) {
        double mpp = Math.max(MIN_METRES_PER_PX, Math.min(MAX_METRES_PER_PX, metresPerPx / factor));
        double px = xM(sx);
        double py = yM(sy);
        return new Viewport(px - (sx - widthPx * 0.5) * mpp, py + (sy - heightPx * 0.5) * mpp, mpp,
                widthPx, heightPx);
    }

    /**
     * Moves the chart with the pointer.
     *
     * @param dxPx pixels the chart moves right
     * @param dyPx pixels the chart moves down
     * @return the new viewport
     */
    public Viewport panned(double dxPx, double dyPx) {
        return new Viewport(centreXM - dxPx * metresPerPx, centreYM + dyPx * metresPerPx, metresPerPx,
                widthPx, heightPx);
    }

    /**
     * The same chart centre and scale on a screen of another size.
     *
     * @param w width (pixels)
     * @param h height (pixels)
     * @return the new viewport
     */
    public Viewport resized(int w, int h) {
        return new Viewport(centreXM, centreYM, metresPerPx, w, h);
    }

    /**
     * The scale at a latitude.
     *
     * @param latDeg latitude (degrees)
     * @return pixels per nautical mile
     */
    public double pixelsPerNm(double latDeg) {
        return Earth.NAUTICAL_MILE_M * Mercator.scaleFactor(latDeg) / metresPerPx;
    }

    /**
     * The latitude at the centre of the screen.
     *
     * @return latitude (degrees)
     */
    public double centreLatDeg() {
        return Mercator.latitudeDeg(centreYM);
    }
}
