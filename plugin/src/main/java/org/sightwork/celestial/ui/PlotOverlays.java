package org.sightwork.celestial.ui;

import java.time.Duration;
import java.time.Instant;
import java.time.ZoneOffset;
import java.time.format.DateTimeFormatter;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.function.Supplier;
import org.sightwork.celestial.fix.Fix;
import org.sightwork.celestial.reduction.CircleOfEqualAltitude;
import org.sightwork.celestial.reduction.LineOfPosition;
import org.sightwork.celestial.reduction.ReducedSight;
import org.sightwork.celestial.reduction.SightReduction;
import org.sightwork.geo.earth.GeoPosition;
import org.sightwork.geo.earth.Sailings;
import org.sightwork.geo.spi.GeoPainter;
import org.sightwork.geo.spi.MarkerShape;
import org.sightwork.geo.spi.Stroke;
import org.sightwork.geo.track.Track;

/**
 * Paints a {@link Plot} through the shell's {@link GeoPainter}, one method per overlay layer.
 *
 * <p>Geometry: a line of position is drawn as the great-circle arc through its intercept point at
 * right angles to the azimuth, {@link #LOP_HALF_LENGTH_NM} each way (the tangent to the circle of
 * equal altitude; Bowditch 2019, ch. 19, from memory); a line carried for a running fix is the same
 * construction through its carried intercept point, dashed. A circle of equal altitude is drawn
 * exactly (the painter's small circle about the body's geographical position, radius = zenith
 * distance 90° - Ho in minutes of arc = nm), automatically above {@link #AUTO_CIRCLE_HO_DEG}.
 *
 * <p>Time: when the passage-time cursor is set, only the lines of the
 * {@link #LINE_VALID_HOURS} hours up to the cursor and the fixes up to it are drawn.
 *
 * <p><b>Thread:</b> JavaFX application thread (called from the overlays' painters).
 */
final class PlotOverlays {

    /** Half length of a drawn line of position (nautical miles): long enough to cross its neighbours. */
    static final double LOP_HALF_LENGTH_NM = 14.0;
    /**
     * Above this observed altitude (degrees) the circle of equal altitude is drawn with the line:
     * its radius is under 900 nm and the straight line departs from it by more than 0.1 nm within
     * 14 nm of the intercept point (offset = d² / 2R, from the geometry of the circle).
     */
    static final double AUTO_CIRCLE_HO_DEG = 75.0;
    /** A line is shown this long after its sight when the time cursor is set (common practice: a line run on for more than a few hours loses its worth). */
    static final double LINE_VALID_HOURS = 3.0;

    private static final DateTimeFormatter HHMM = DateTimeFormatter.ofPattern("HH:mm", Locale.ROOT).withZone(ZoneOffset.UTC);
    private static final DateTimeFormatter HH = DateTimeFormatter.ofPattern("HH", Locale.ROOT).withZone(ZoneOffset.UTC);

    private final Supplier<Plot> plot;
    private final Supplier<Integer> selectedRow;
    private final Supplier<Instant> cursor;
    private double lastPixelsPerNm = Double.NaN;

    PlotOverlays(Supplier<Plot> plot, Supplier<Integer> selectedRow, Supplier<Instant> cursor) {
        this.plot = plot;
        this.selectedRow = selectedRow;
        this.cursor = cursor;
    }

    /** @return pixels per nm at the last painted frame (NaN before the first), for picking lines */
    double lastPixelsPerNm() {
        return lastPixelsPerNm;
    }

    /**
     * The two ends of a line's drawn segment.
     *
     * @param intercept the intercept point
     * @param znDeg the body's azimuth (degrees true)
     * @return the two ends
     */
    static List<GeoPosition> lopEnds(GeoPosition intercept, double znDeg) {
        return List.of(Sailings.greatCircleDestination(intercept, (znDeg + 90.0) % 360.0, LOP_HALF_LENGTH_NM),
                Sailings.greatCircleDestination(intercept, (znDeg + 270.0) % 360.0, LOP_HALF_LENGTH_NM));
    }

    boolean lineShown(Instant utc) {
        Instant c = cursor.get();
        if (c == null) {
            return true;
        }
        double h = Duration.between(utc, c).toSeconds() / 3600.0;
        return h >= -1.0 / 60.0 && h <= LINE_VALID_HOURS;
    }

    boolean fixShown(Instant utc) {
        Instant c = cursor.get();
        return c == null || !utc.isAfter(c.plusSeconds(60));
    }

    void paintDr(GeoPainter p) {
        lastPixelsPerNm = p.pixelsPerNm(38.0);
        List<Plot.TimedPosition> dr = plot.get().drTrack();
        if (dr.size() < 2) {
            return;
        }
        p.polyline(dr.stream().map(Plot.TimedPosition::position).toList(), PlotStyle.DR_LINE);
        for (int i = 0; i < dr.size(); i++) {
            Plot.TimedPosition tp = dr.get(i);
            if (tp.utc().getEpochSecond() % 3600 == 0) {
                GeoPosition next = dr.get(Math.min(i + 1, dr.size() - 1)).position();
                GeoPosition prev = dr.get(Math.max(i - 1, 0)).position();
                double course = Sailings.rhumbLine(prev, next).courseDeg();
                double halfNm = 5.0 / p.pixelsPerNm(tp.position().latDeg());
                p.rhumbLine(Sailings.rhumbDestination(tp.position(), (course + 90) % 360, halfNm),
                        Sailings.rhumbDestination(tp.position(), (course + 270) % 360, halfNm), PlotStyle.DR_TICK);
                p.label(tp.position(), HH.format(tp.utc()), PlotStyle.DR, 5, 3);
            }
        }
        Instant c = cursor.get();
        if (c != null) {
            drAt(c).ifPresent(pos -> {
                p.marker(pos, MarkerShape.TRIANGLE, 14, Stroke.solid(PlotStyle.DR, 1.5), PlotStyle.DR);
                p.label(pos, "DR " + HHMM.format(c), PlotStyle.DR, 9, -18);
            });
        }
    }

    /**
     * The DR position at a time, interpolated along the sampled DR track.
     *
     * @param t the time
     * @return the position, when the track covers the time
     */
    Optional<GeoPosition> drAt(Instant t) {
        List<Plot.TimedPosition> dr = plot.get().drTrack();
        for (int i = 1; i < dr.size(); i++) {
            Plot.TimedPosition a = dr.get(i - 1);
            Plot.TimedPosition b = dr.get(i);
            if (!t.isBefore(a.utc()) && !t.isAfter(b.utc())) {
                double span = Duration.between(a.utc(), b.utc()).toMillis();
                double f = span == 0 ? 0 : Duration.between(a.utc(), t).toMillis() / span;
                Sailings.RhumbLine rl = Sailings.rhumbLine(a.position(), b.position());
                return Optional.of(Sailings.rhumbDestination(a.position(), rl.courseDeg(), rl.distanceNm() * f));
            }
        }
        return Optional.empty();
    }

    void paintGps(GeoPainter p) {
        Optional<Track> gps = plot.get().gps();
        if (gps.isEmpty() || gps.get().size() < 2) {
            return;
        }
        Track t = gps.get();
        List<GeoPosition> points = new ArrayList<>(t.size());
        for (int i = 0; i < t.size(); i++) {
            points.add(new GeoPosition(t.latDeg(i), t.lonDeg(i)));
        }
        p.polyline(points, PlotStyle.GPS_LINE);
        p.label(points.get(points.size() - 1), "GPS", PlotStyle.GPS, 6, 4);
    }

    void paintAps(GeoPainter p) {
        for (Plot.SightResult s : plot.get().sights()) {
            s.reduced().filter(r -> lineShown(r.lop().utc())).ifPresent(r -> {
                LineOfPosition l = r.lop();
                p.marker(l.ap(), MarkerShape.SQUARE, 7, Stroke.solid(PlotStyle.AP, 1.2), null);
                p.rhumbLine(l.ap(), l.interceptPoint(), PlotStyle.INTERCEPT);
            });
        }
    }

    void paintLines(GeoPainter p) {
        Integer sel = selectedRow.get();
        for (Plot.SightResult s : plot.get().sights()) {
            if (s.reduced().isEmpty() || !lineShown(s.reduced().get().lop().utc())) {
                continue;
            }
            LineOfPosition l = s.reduced().get().lop();
            boolean selected = sel != null && sel == s.row();
            List<GeoPosition> ends = lopEnds(l.interceptPoint(), l.znDeg());
            p.greatCircle(ends.get(0), ends.get(1), selected ? PlotStyle.LOP_SELECTED : PlotStyle.LOP_LINE);
            p.label(ends.get(0), lopLabel(l), selected ? PlotStyle.SELECTED : PlotStyle.LOP, 4, 2);
        }
    }

    void paintAdvancedLines(GeoPainter p) {
        Integer sel = selectedRow.get();
        for (Plot.FixResult f : plot.get().fixes()) {
            if (f.fix().isEmpty() || !fixShown(f.fix().get().utc())) {
                continue;
            }
            for (Plot.AdvancedLine a : f.advanced()) {
                boolean selected = sel != null && sel == a.row();
                List<GeoPosition> ends = lopEnds(a.interceptPoint(), a.znDeg());
                p.greatCircle(ends.get(0), ends.get(1), selected ? PlotStyle.ADVANCED_SELECTED : PlotStyle.ADVANCED_LINE);
                String what = plot.get().sights().get(a.row()).label();
                p.label(ends.get(1), String.format(Locale.ROOT, "%s run %.1f nm", what, a.runNm()),
                        selected ? PlotStyle.SELECTED : PlotStyle.LOP, 4, 16);
            }
        }
    }

    void paintCircles(GeoPainter p) {
        Integer sel = selectedRow.get();
        for (Plot.SightResult s : plot.get().sights()) {
            if (s.reduced().isEmpty()) {
                continue;
            }
            LineOfPosition l = s.reduced().get().lop();
            if ((s.circleWanted() || l.hoDeg() > AUTO_CIRCLE_HO_DEG) && lineShown(l.utc())) {
                CircleOfEqualAltitude c = l.circle();
                boolean selected = sel != null && sel == s.row();
                p.smallCircle(c.gp(), c.radiusNm(), selected ? PlotStyle.LOP_SELECTED : PlotStyle.CIRCLE_LINE);
            }
        }
    }

    void paintGeographicalPositions(GeoPainter p) {
        for (Plot.SightResult s : plot.get().sights()) {
            if (s.reduced().isEmpty()) {
                continue;
            }
            ReducedSight r = s.reduced().get();
            if (!lineShown(r.lop().utc())) {
                continue;
            }
            GeoPosition gp = SightReduction.geographicalPosition(r.lop().ghaDeg(), r.lop().decDeg());
            p.marker(gp, MarkerShape.CIRCLE, 11, Stroke.solid(PlotStyle.GP, 2), null);
            p.marker(gp, MarkerShape.DOT, 4, null, PlotStyle.GP);
            p.label(gp, "GP " + r.lop().label(), PlotStyle.GP, 8, 4);
        }
    }

    void paintCockedHats(GeoPainter p) {
        for (Plot.FixResult f : plot.get().fixes()) {
            f.fix().filter(x -> fixShown(x.utc())).flatMap(Fix::cockedHat)
                    .ifPresent(h -> p.polygon(h.vertices(), Stroke.solid(PlotStyle.COCKED_HAT, 1.2),
                            PlotStyle.COCKED_HAT_FILL));
        }
    }

    void paintFixes(GeoPainter p) {
        for (Plot.FixResult f : plot.get().fixes()) {
            if (f.fix().isEmpty() || !fixShown(f.fix().get().utc())) {
                continue;
            }
            Fix x = f.fix().get();
            p.ellipse(x.position(), x.ellipse95().majorNm(), x.ellipse95().minorNm(), x.ellipse95().orientationDeg(),
                    Stroke.solid(PlotStyle.FIX, 1.4), PlotStyle.ELLIPSE_FILL);
            p.marker(x.position(), MarkerShape.CIRCLE, 13, PlotStyle.FIX_LINE, null);
            p.marker(x.position(), MarkerShape.DOT, 4, null, PlotStyle.FIX);
            p.label(x.position(), (f.isRunning() ? "RFix " : "Fix ") + HHMM.format(x.utc()) + " " + f.name(),
                    PlotStyle.FIX, 10, 6);
        }
    }

    void paintSetDrift(GeoPainter p) {
        for (Plot.SetDrift sd : plot.get().setDrifts()) {
            if (!fixShown(sd.to())) {
                continue;
            }
            p.rhumbLine(sd.drAtTo(), sd.fixAtTo(), PlotStyle.SET_DRIFT_LINE);
            // Arrow head: two strokes 8 px long at ±25° about the reversed set.
            double ppn = p.pixelsPerNm(sd.fixAtTo().latDeg());
            double headNm = 8.0 / ppn;
            for (double side : new double[] {-25, 25}) {
                p.rhumbLine(sd.fixAtTo(), Sailings.rhumbDestination(sd.fixAtTo(), (sd.setDeg() + 180 + side + 360) % 360,
                        headNm), PlotStyle.SET_DRIFT_LINE);
            }
            p.marker(sd.drAtTo(), MarkerShape.CROSS, 9, Stroke.solid(PlotStyle.SET_DRIFT, 1.5), null);
            p.label(sd.drAtTo(), String.format(Locale.ROOT, "set %03.0f° drift %.1f kn", sd.setDeg(), sd.driftKn()),
                    PlotStyle.SET_DRIFT, 6, 6);
        }
    }

    static String lopLabel(LineOfPosition l) {
        return String.format(Locale.ROOT, "%s %.1f nm %s", l.label(), Math.abs(l.interceptNm()),
                l.isToward() ? "T" : "A");
    }

    /**
     * The row of the line nearest a chart position, if one is within the pick distance.
     *
     * @param at the position clicked
     * @param pickPx the pick distance (pixels)
     * @return the row
     */
    Optional<Integer> lineNear(GeoPosition at, double pickPx) {
        double ppn = Double.isNaN(lastPixelsPerNm) ? 10 : lastPixelsPerNm;
        double best = pickPx / ppn;
        Integer row = null;
        for (Plot.SightResult s : plot.get().sights()) {
            if (s.reduced().isEmpty() || !lineShown(s.reduced().get().lop().utc())) {
                continue;
            }
            LineOfPosition l = s.reduced().get().lop();
            double d = distanceToLineNm(at, l.interceptPoint(), l.znDeg());
            if (d < best) {
                best = d;
                row = s.row();
            }
        }
        for (Plot.FixResult f : plot.get().fixes()) {
            for (Plot.AdvancedLine a : f.advanced()) {
                double d = distanceToLineNm(at, a.interceptPoint(), a.znDeg());
                if (d < best) {
                    best = d;
                    row = a.row();
                }
            }
        }
        return Optional.ofNullable(row);
    }

    /** Distance from a point to a drawn line (nm), in the plane of the intercept point: fine for picking. */
    private static double distanceToLineNm(GeoPosition at, GeoPosition intercept, double znDeg) {
        Sailings.RhumbLine rl = Sailings.rhumbLine(intercept, at);
        double rel = Math.toRadians(rl.courseDeg() - znDeg);
        double across = Math.abs(rl.distanceNm() * Math.cos(rel));
        double along = Math.abs(rl.distanceNm() * Math.sin(rel));
        return along > LOP_HALF_LENGTH_NM ? Double.POSITIVE_INFINITY : across;
    }
}
