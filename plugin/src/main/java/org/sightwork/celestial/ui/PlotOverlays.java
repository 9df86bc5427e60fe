package org.sightwork.celestial.ui;

import java.time.Duration;
import java.time.Instant;
import java.time.ZoneOffset;
import java.time.format.DateTimeFormatter;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Locale;
import java.util.Optional;
import java.util.function.Supplier;
import org.sightwork.celestial.fix.Fix;
import org.sightwork.celestial.reduction.CircleOfEqualAltitude;
import org.sightwork.celestial.reduction.LineOfPosition;
import org.sightwork.celestial.reduction.ReducedSight;
import org.sightwork.celestial.reduction.SightReduction;
import org.sightwork.geo.earth.Earth;
import org.sightwork.geo.earth.GeoPosition;
import org.sightwork.geo.earth.Sailings;
import org.sightwork.geo.spi.GeoPainter;
import org.sightwork.geo.spi.MarkerShape;
import org.sightwork.geo.spi.Stroke;
import javafx.scene.paint.Color;
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
 * <p>Labels: placed together by {@link LabelLayout} so that they do not cover each other or the
 * fix marks (worked out again when the plot, the cursor, the selection or the scale changes);
 * lines carried within one round of sights (a fix, not a running fix) are drawn unlabelled.
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
    private Plot layoutPlot;
    private List<Object> layoutKey;
    private Map<String, LabelLayout.Place> layout = Map.of();
    private final Map<String, String> layoutText = new HashMap<>();

    /**
     * A label as placed.
     *
     * @param place where
     * @param text what
     */
    record PlacedLabel(LabelLayout.Place place, String text) {
    }

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
                label(p, "drh:" + tp.utc().getEpochSecond(), HH.format(tp.utc()), PlotStyle.DR);
            }
        }
        Instant c = cursor.get();
        if (c != null) {
            drAt(c).ifPresent(pos -> {
                p.marker(pos, MarkerShape.TRIANGLE, 14, Stroke.solid(PlotStyle.DR, 1.5), PlotStyle.DR);
                label(p, "drcursor", drCursorLabel(c), PlotStyle.DR);
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
            label(p, "lop:" + s.row(), lopLabel(l), selected ? PlotStyle.SELECTED : PlotStyle.LOP);
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
                if (f.isRunning()) {
                    label(p, "adv:" + f.name() + ":" + a.row(), advancedLabel(plot.get(), a),
                            selected ? PlotStyle.SELECTED : PlotStyle.LOP);
                }
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
            label(p, "gp:" + s.row(), "GP " + r.lop().label(), PlotStyle.GP);
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
            label(p, "fix:" + f.name(), fixLabel(f, x), PlotStyle.FIX);
        }
    }

    void paintSetDrift(GeoPainter p) {
        List<Plot.SetDrift> all = plot.get().setDrifts();
        for (int i = 0; i < all.size(); i++) {
            Plot.SetDrift sd = all.get(i);
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
            label(p, "sd:" + i, setDriftLabel(sd), PlotStyle.SET_DRIFT);
        }
    }

    /** @return the labels placed at the last frame (for tests) */
    List<PlacedLabel> placedLabels() {
        List<PlacedLabel> out = new ArrayList<>();
        layout.forEach((k, v) -> out.add(new PlacedLabel(v, layoutText.get(k))));
        return out;
    }

    /** Paints a label at its place, if it has one. */
    private void label(GeoPainter p, String key, String text, Color colour) {
        double mpp = Earth.NAUTICAL_MILE_M / p.pixelsPerNm(0.0);
        List<Object> k = List.of(String.valueOf(cursor.get()), String.valueOf(selectedRow.get()), mpp);
        Plot now = plot.get();
        if (now != layoutPlot || !k.equals(layoutKey)) {
            layoutPlot = now;
            layoutKey = k;
            layoutText.clear();
            List<LabelLayout.Request> req = requests(now, p);
            req.forEach(r -> layoutText.put(r.key(), r.text()));
            layout = LabelLayout.place(req, obstacles(now), mpp);
        }
        LabelLayout.Place at = layout.get(key);
        if (at != null) {
            p.label(at.at(), text, colour, at.dxPx(), at.dyPx());
        }
    }

    private static List<LabelLayout.Place> around(GeoPosition at, double dx, double dy, double w) {
        return List.of(new LabelLayout.Place(at, dx, dy), new LabelLayout.Place(at, dx, -dy - 16),
                new LabelLayout.Place(at, -w - dx, dy), new LabelLayout.Place(at, -w - dx, -dy - 16));
    }

    /** Places along a drawn line, from the given end (its labelled end) inward, each with four offsets. */
    private static List<LabelLayout.Place> alongLine(GeoPosition intercept, double znDeg, boolean firstEnd, double w) {
        List<LabelLayout.Place> out = new ArrayList<>();
        double sign = firstEnd ? 1 : -1;
        for (double d : new double[] {LOP_HALF_LENGTH_NM, -LOP_HALF_LENGTH_NM, 10, -10, 6, -6}) {
            double along = sign * d; // nm toward the first end (Zn + 90°)
            GeoPosition at = along >= 0 ? Sailings.greatCircleDestination(intercept, (znDeg + 90.0) % 360.0, along)
                    : Sailings.greatCircleDestination(intercept, (znDeg + 270.0) % 360.0, -along);
            out.add(new LabelLayout.Place(at, 4, 2));
            out.add(new LabelLayout.Place(at, 4, -18));
            out.add(new LabelLayout.Place(at, -w - 4, 2));
            out.add(new LabelLayout.Place(at, -w - 4, -18));
        }
        return out;
    }

    private List<LabelLayout.Place> obstacles(Plot pl) {
        List<LabelLayout.Place> out = new ArrayList<>();
        for (Plot.FixResult f : pl.fixes()) {
            f.fix().filter(x -> fixShown(x.utc())).ifPresent(x -> out.add(new LabelLayout.Place(x.position(), 9, 0)));
        }
        Instant c = cursor.get();
        if (c != null) {
            drAt(c).ifPresent(pos -> out.add(new LabelLayout.Place(pos, 9, 0)));
        }
        return out;
    }

    private List<LabelLayout.Request> requests(Plot pl, GeoPainter p) {
        List<LabelLayout.Request> out = new ArrayList<>();
        Integer sel = selectedRow.get();
        for (Plot.FixResult f : pl.fixes()) {
            if (f.fix().isEmpty() || !fixShown(f.fix().get().utc())) {
                continue;
            }
            Fix x = f.fix().get();
            String t = fixLabel(f, x);
            out.add(new LabelLayout.Request("fix:" + f.name(), t, 0, around(x.position(), 10, 6, LabelLayout.widthPx(t))));
            if (f.isRunning()) {
                for (Plot.AdvancedLine a : f.advanced()) {
                    String at = advancedLabel(pl, a);
                    boolean selected = sel != null && sel == a.row();
                    out.add(new LabelLayout.Request("adv:" + f.name() + ":" + a.row(), at, selected ? 1.6 : 4,
                            alongLine(a.interceptPoint(), a.znDeg(), false, LabelLayout.widthPx(at))));
                }
            }
        }
        Instant c = cursor.get();
        if (c != null) {
            drAt(c).ifPresent(pos -> {
                String t = drCursorLabel(c);
                out.add(new LabelLayout.Request("drcursor", t, 1, List.of(new LabelLayout.Place(pos, 9, -18),
                        new LabelLayout.Place(pos, 9, 4), new LabelLayout.Place(pos, -LabelLayout.widthPx(t) - 9, -18),
                        new LabelLayout.Place(pos, -LabelLayout.widthPx(t) - 9, 4))));
            });
        }
        List<Plot.SetDrift> sds = pl.setDrifts();
        for (int i = 0; i < sds.size(); i++) {
            if (fixShown(sds.get(i).to())) {
                String t = setDriftLabel(sds.get(i));
                out.add(new LabelLayout.Request("sd:" + i, t, 2, around(sds.get(i).drAtTo(), 6, 6, LabelLayout.widthPx(t))));
            }
        }
        for (Plot.SightResult s : pl.sights()) {
            if (s.reduced().isEmpty() || !lineShown(s.reduced().get().lop().utc())) {
                continue;
            }
            LineOfPosition l = s.reduced().get().lop();
            String t = lopLabel(l);
            boolean selected = sel != null && sel == s.row();
            out.add(new LabelLayout.Request("lop:" + s.row(), t, selected ? 1.5 : 3,
                    alongLine(l.interceptPoint(), l.znDeg(), true, LabelLayout.widthPx(t))));
            String g = "GP " + l.label();
            GeoPosition gp = SightReduction.geographicalPosition(l.ghaDeg(), l.decDeg());
            out.add(new LabelLayout.Request("gp:" + s.row(), g, 5, around(gp, 8, 4, LabelLayout.widthPx(g))));
        }
        for (Plot.TimedPosition tp : pl.drTrack()) {
            if (tp.utc().getEpochSecond() % 3600 == 0) {
                String t = HH.format(tp.utc());
                out.add(new LabelLayout.Request("drh:" + tp.utc().getEpochSecond(), t, 6,
                        around(tp.position(), 5, 3, LabelLayout.widthPx(t))));
            }
        }
        return out;
    }

    private static String fixLabel(Plot.FixResult f, Fix x) {
        return (f.isRunning() ? "RFix " : "Fix ") + HHMM.format(x.utc()) + " " + f.name();
    }

    private static String advancedLabel(Plot pl, Plot.AdvancedLine a) {
        return String.format(Locale.ROOT, "%s run %.1f nm", pl.sights().get(a.row()).label(), a.runNm());
    }

    private static String drCursorLabel(Instant c) {
        return "DR " + HHMM.format(c);
    }

    private static String setDriftLabel(Plot.SetDrift sd) {
        return String.format(Locale.ROOT, "set %03.0f° drift %.1f kn", sd.setDeg(), sd.driftKn());
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
