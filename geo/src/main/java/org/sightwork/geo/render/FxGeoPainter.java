package org.sightwork.geo.render;

import java.util.List;
import javafx.geometry.VPos;
import javafx.scene.canvas.GraphicsContext;
import javafx.scene.paint.Color;
import javafx.scene.shape.FillRule;
import javafx.scene.shape.StrokeLineCap;
import javafx.scene.shape.StrokeLineJoin;
import javafx.scene.text.Font;
import javafx.scene.text.TextAlignment;
import org.sightwork.geo.earth.GeoPosition;
import org.sightwork.geo.earth.Mercator;
import org.sightwork.geo.spi.GeoPainter;
import org.sightwork.geo.spi.Lighting;
import org.sightwork.geo.spi.MarkerShape;
import org.sightwork.geo.spi.Stroke;

/**
 * The {@link GeoPainter} of the shell: projects with {@link Mercator}, densifies curves on the
 * sphere, and draws each figure at every whole turn of longitude where it meets the screen (so a
 * figure across the antimeridian is split there and shown on both sides).
 *
 * <p><b>Method:</b> points on a small circle and on a great circle come from the direct problem on
 * the sphere, φ₂ = asin(sin φ₁ cos δ + cos φ₁ sin δ cos θ), λ₂ = λ₁ + atan2(sin θ sin δ cos φ₁,
 * cos δ − sin φ₁ sin φ₂) (spherical trigonometry; e.g. Smart, Textbook on Spherical Astronomy, 6th
 * ed., ch. 1, from memory), and the great-circle arc by spherical linear interpolation of unit
 * vectors. Curves are densified so that a chord is at most {@link #MAX_CHORD_PX} long on the screen
 * (the chord's sagitta is then far below a pixel for any circle larger than a few pixels), with at
 * most {@link #MAX_POINTS} points.
 *
 * <p><b>Accuracy:</b> a point of a small circle is exact on the sphere to rounding (tested against
 * GeographicLib on a sphere with f = 0); what is drawn follows the curve within a quarter pixel.
 *
 * <p><b>Thread:</b> that of the graphics context; not shared between threads. Reuses its buffers.
 */
public final class FxGeoPainter implements GeoPainter {

    /** Longest chord of a densified curve on the screen (pixels). */
    static final double MAX_CHORD_PX = 3;
    /** Most points in one densified curve. */
    static final int MAX_POINTS = 20_000;
    private static final double NM_PER_RAD = 60 * 180 / Math.PI;
    private static final Font FONT = Font.font("System", 12);

    private GraphicsContext gc;
    private Viewport v;
    private Palette palette;
    private double[] lat = new double[256];
    private double[] lon = new double[256];
    private double[] xy = new double[512];
    private int n;

    /**
     * Points the painter at a frame.
     *
     * @param gc the graphics context
     * @param viewport the viewport
     * @param palette the palette
     */
    public void begin(GraphicsContext gc, Viewport viewport, Palette palette) {
        this.gc = gc;
        this.v = viewport;
        this.palette = palette;
    }

    @Override
    public double pixelsPerNm(double latDeg) {
        return v.pixelsPerNm(latDeg);
    }

    @Override
    public Lighting lighting() {
        return palette.lighting();
    }

    @Override
    public void polyline(List<GeoPosition> points, Stroke stroke) {
        if (points.size() < 2) {
            return;
        }
        n = 0;
        for (GeoPosition p : points) {
            add(p.latDeg(), p.lonDeg());
        }
        draw(false, stroke, null);
    }

    @Override
    public void rhumbLine(GeoPosition from, GeoPosition to, Stroke stroke) {
        n = 0;
        add(from.latDeg(), from.lonDeg());
        add(to.latDeg(), to.lonDeg());
        draw(false, stroke, null);
    }

    @Override
    public void greatCircle(GeoPosition from, GeoPosition to, Stroke stroke) {
        double[] a = unit(from.latDeg(), from.lonDeg());
        double[] b = unit(to.latDeg(), to.lonDeg());
        double dot = Math.max(-1, Math.min(1, a[0] * b[0] + a[1] * b[1] + a[2] * b[2]));
        double omega = Math.acos(dot);
        if (omega > Math.PI - 1e-9) {
            throw new IllegalArgumentException("no single great circle joins antipodal points " + from + " and " + to);
        }
        double lengthPx = omega * NM_PER_RAD * maxPxPerNm(from.latDeg(), to.latDeg());
        int k = segments(lengthPx);
        n = 0;
        double s = Math.sin(omega);
        for (int i = 0; i <= k; i++) {
            double t = (double) i / k;
            double wa = s < 1e-12 ? 1 - t : Math.sin((1 - t) * omega) / s;
            double wb = s < 1e-12 ? t : Math.sin(t * omega) / s;
            double x = wa * a[0] + wb * b[0];
            double y = wa * a[1] + wb * b[1];
            double z = wa * a[2] + wb * b[2];
            add(Math.toDegrees(Math.atan2(z, Math.hypot(x, y))), Math.toDegrees(Math.atan2(y, x)));
        }
        draw(false, stroke, null);
    }

    @Override
    public void smallCircle(GeoPosition centre, double radiusNm, Stroke stroke) {
        if (!(radiusNm > 0 && radiusNm < 10_800)) {
            throw new IllegalArgumentException("circle radius " + radiusNm + " nm is outside (0, 10800)");
        }
        double delta = radiusNm / NM_PER_RAD;
        double phi1 = Math.toRadians(centre.latDeg());
        double circumferencePx = 2 * Math.PI * Math.sin(delta) * NM_PER_RAD
                * maxPxPerNm(centre.latDeg() - Math.toDegrees(delta), centre.latDeg() + Math.toDegrees(delta));
        int k = Math.max(72, segments(circumferencePx));
        double sinPhi1 = Math.sin(phi1);
        double cosPhi1 = Math.cos(phi1);
        double sinD = Math.sin(delta);
        double cosD = Math.cos(delta);
        n = 0;
        for (int i = 0; i <= k; i++) {
            double theta = 2 * Math.PI * i / k;
            double sinPhi2 = sinPhi1 * cosD + cosPhi1 * sinD * Math.cos(theta);
            double phi2 = Math.asin(Math.max(-1, Math.min(1, sinPhi2)));
            double dl = Math.atan2(Math.sin(theta) * sinD * cosPhi1, cosD - sinPhi1 * sinPhi2);
            add(Math.toDegrees(phi2), centre.lonDeg() + Math.toDegrees(dl));
        }
        // A circle around a pole does not close on the chart: it runs through every meridian.
        boolean aroundPole = Math.abs(lon[n - 1] - lon[0]) > 180;
        draw(!aroundPole, stroke, null);
    }

    @Override
    public void polygon(List<GeoPosition> ring, Stroke stroke, Color fill) {
        if (ring.size() < 3) {
            return;
        }
        n = 0;
        for (GeoPosition p : ring) {
            add(p.latDeg(), p.lonDeg());
        }
        draw(true, stroke, fill);
    }

    @Override
    public void ellipse(GeoPosition centre, double semiMajorNm, double semiMinorNm, double orientationDeg,
            Stroke stroke, Color fill) {
        if (!(semiMajorNm > 0 && semiMinorNm > 0 && semiMinorNm <= semiMajorNm)) {
            throw new IllegalArgumentException("ellipse semi-axes " + semiMajorNm + " nm and " + semiMinorNm
                    + " nm: need 0 < minor <= major");
        }
        double th = Math.toRadians(orientationDeg);
        double cosLat = Math.cos(Math.toRadians(centre.latDeg()));
        double lengthPx = 2 * Math.PI * semiMajorNm * v.pixelsPerNm(centre.latDeg());
        int k = Math.max(48, segments(lengthPx));
        n = 0;
        for (int i = 0; i <= k; i++) {
            double t = 2 * Math.PI * i / k;
            double along = semiMajorNm * Math.cos(t);
            double across = semiMinorNm * Math.sin(t);
            double northNm = along * Math.cos(th) - across * Math.sin(th);
            double eastNm = along * Math.sin(th) + across * Math.cos(th);
            add(centre.latDeg() + northNm / 60, centre.lonDeg() + eastNm / (60 * cosLat));
        }
        draw(true, stroke, fill);
    }

    @Override
    public void marker(GeoPosition at, MarkerShape shape, double sizePx, Stroke stroke, Color fill) {
        double sy = v.screenY(Mercator.northingM(at.latDeg()));
        double r = sizePx / 2;
        for (double off : offsets(at.lonDeg(), at.lonDeg(), r)) {
            double sx = v.screenX(Mercator.eastingM(at.lonDeg() + off));
            gc.beginPath();
            switch (shape) {
                case DOT, CIRCLE -> gc.arc(sx, sy, r, r, 0, 360);
                case SQUARE -> gc.rect(sx - r, sy - r, sizePx, sizePx);
                case TRIANGLE -> {
                    gc.moveTo(sx, sy - r);
                    gc.lineTo(sx + r * 0.866, sy + r * 0.5);
                    gc.lineTo(sx - r * 0.866, sy + r * 0.5);
                    gc.closePath();
                }
                case CROSS -> {
                    gc.moveTo(sx - r, sy);
                    gc.lineTo(sx + r, sy);
                    gc.moveTo(sx, sy - r);
                    gc.lineTo(sx, sy + r);
                }
            }
            Color f = fill != null ? fill : shape == MarkerShape.DOT && stroke != null ? stroke.colour() : null;
            if (f != null && shape != MarkerShape.CROSS) {
                gc.setFill(palette.adapt(f));
                gc.setFillRule(FillRule.NON_ZERO);
                gc.fill();
            }
            if (stroke != null) {
                applyStroke(stroke);
                gc.stroke();
            }
        }
    }

    @Override
    public void label(GeoPosition at, String text, Color colour, double dxPx, double dyPx) {
        double sy = v.screenY(Mercator.northingM(at.latDeg())) + dyPx;
        gc.setFont(FONT);
        gc.setTextAlign(TextAlignment.LEFT);
        gc.setTextBaseline(VPos.TOP);
        gc.setLineDashes((double[]) null);
        for (double off : offsets(at.lonDeg(), at.lonDeg(), 8 * text.length() + Math.abs(dxPx))) {
            double sx = v.screenX(Mercator.eastingM(at.lonDeg() + off)) + dxPx;
            gc.setFill(palette.halo());
            gc.fillRect(sx - 2, sy - 1, text.length() * 7.4 + 4, 16);
            gc.setFill(palette.adapt(colour));
            gc.fillText(text, sx, sy);
        }
    }

    private void add(double latDeg, double lonDeg) {
        if (n == lat.length) {
            lat = java.util.Arrays.copyOf(lat, 2 * n);
            lon = java.util.Arrays.copyOf(lon, 2 * n);
        }
        // keep longitude continuous: each point within half a turn of the one before
        double l = lonDeg;
        if (n > 0) {
            double prev = lon[n - 1];
            l = prev + Math.IEEEremainder(lonDeg - prev, 360);
        }
        lat[n] = latDeg;
        lon[n] = l;
        n++;
    }

    private void draw(boolean closed, Stroke stroke, Color fill) {
        if (n < 2) {
            return;
        }
        if (xy.length < 2 * n) {
            xy = new double[2 * Math.max(n, xy.length)];
        }
        double minLon = Double.POSITIVE_INFINITY;
        double maxLon = Double.NEGATIVE_INFINITY;
        for (int i = 0; i < n; i++) {
            xy[2 * i] = Mercator.eastingM(lon[i]);
            xy[2 * i + 1] = Mercator.northingM(lat[i]);
            minLon = Math.min(minLon, lon[i]);
            maxLon = Math.max(maxLon, lon[i]);
        }
        double marginPx = stroke == null ? 0 : stroke.widthPx();
        for (double off : offsets(minLon, maxLon, marginPx)) {
            gc.beginPath();
            PathBuilder.append(gc, v, xy, n, closed, Mercator.eastingM(off));
            if (fill != null) {
                gc.setFill(palette.adapt(fill));
                gc.setFillRule(FillRule.NON_ZERO);
                gc.fill();
            }
            if (stroke != null) {
                applyStroke(stroke);
                gc.stroke();
            }
        }
    }

    private void applyStroke(Stroke s) {
        gc.setStroke(palette.adapt(s.colour()));
        gc.setLineWidth(s.widthPx());
        double[] d = s.dashPx();
        gc.setLineDashes(d.length == 0 ? null : d);
        gc.setLineCap(StrokeLineCap.BUTT);
        gc.setLineJoin(StrokeLineJoin.ROUND);
    }

    /** Whole turns of longitude (degrees) at which a figure spanning [minLon, maxLon] meets the screen. */
    private double[] offsets(double minLon, double maxLon, double marginPx) {
        double west = Mercator.longitudeDeg(v.xM(-marginPx - 2));
        double east = Mercator.longitudeDeg(v.xM(v.widthPx() + marginPx + 2));
        int kMin = (int) Math.ceil((west - maxLon) / 360);
        int kMax = (int) Math.floor((east - minLon) / 360);
        if (kMax < kMin) {
            return new double[0];
        }
        int count = Math.min(kMax - kMin + 1, 4);
        double[] out = new double[count];
        for (int i = 0; i < count; i++) {
            out[i] = 360.0 * (kMin + i);
        }
        return out;
    }

    private double maxPxPerNm(double latA, double latB) {
        double m = Math.max(Math.abs(latA), Math.abs(latB));
        return v.pixelsPerNm(Math.min(m, Mercator.MAX_LAT_DEG));
    }

    private static int segments(double lengthPx) {
        if (!(lengthPx > 0)) {
            return 8;
        }
        return (int) Math.max(8, Math.min(MAX_POINTS, Math.ceil(lengthPx / MAX_CHORD_PX)));
    }

    private static double[] unit(double latDeg, double lonDeg) {
        double p = Math.toRadians(latDeg);
        double l = Math.toRadians(lonDeg);
        return new double[] {Math.cos(p) * Math.cos(l), Math.cos(p) * Math.sin(l), Math.sin(p)};
    }
}
