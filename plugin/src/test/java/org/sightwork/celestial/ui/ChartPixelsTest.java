package org.sightwork.celestial.ui;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.image.BufferedImage;
import java.nio.file.Path;
import java.time.Duration;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import javafx.event.ActionEvent;
import javafx.scene.Scene;
import javafx.scene.control.TableColumn;
import javafx.scene.control.TextField;
import javafx.scene.paint.Color;
import javafx.stage.Stage;
import net.sf.geographiclib.Geodesic;
import net.sf.geographiclib.GeodesicData;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.sightwork.celestial.fix.Fix;
import org.sightwork.celestial.reduction.LineOfPosition;
import org.sightwork.geo.earth.Earth;
import org.sightwork.geo.earth.GeoPosition;
import org.sightwork.geo.earth.Mercator;
import org.sightwork.geo.render.Viewport;
import org.sightwork.geo.testing.HeadlessFx;
import org.sightwork.geo.track.DeadReckoning;
import org.sightwork.geo.track.DrLog;

/**
 * The plugin on the chart, in pixels: the demo passage is opened as the window opens it, and each
 * line of position, each line carried for a running fix and each fix (mark and 95 % ellipse) is on
 * the pixels where the engine puts it; the passage-time slider moves the DR marker; an edit of a
 * sight's Hs in the sight log's cell moves its line by the change (1.0′ of altitude = 1.0 nm).
 *
 * <p>Expected pixels are worked out apart from the plugin's painting code: points on a line are the
 * great circle at right angles to Zn through the engine's intercept point, by GeographicLib's direct
 * problem on a sphere (f = 0: the navigator's sphere, one minute of arc per nautical mile; Karney
 * 2013), projected by the shell's Mercator and viewport, the way every layer is. What is checked is
 * the painting of the engine's results, not the engine (its own tests check it against references).
 *
 * <p>Tolerances: a colour is found within {@link #HIT_PX} pixels of the expected point (1 px of
 * rounding to the pixel grid plus 1 px of anti-aliasing spread of a 2 px stroke); "not elsewhere" is
 * checked {@link #OFF_PX} pixels to each side, where a 2 px line leaves no trace.
 */
class ChartPixelsTest {

    /** Scale of the test views (pixels per nautical mile): 1 nm = 20 px, so 0.1 nm = 2 px. */
    static final double PPN = 20.0;
    static final int SIZE_PX = 800;
    /** A painted point is found within this radius of the expected pixel (pixels). */
    static final int HIT_PX = 2;
    /** To each side of a line, this far away, the line's colour must be absent (pixels). */
    static final double OFF_PX = 6.0;
    /** Colour tolerance (RGB distance) for a hit, allowing for anti-aliased edges. */
    static final double HIT_TOL = 0.22;
    /** Colour tolerance for "absent": nothing this close to the colour. */
    static final double ABSENT_TOL = 0.30;

    private static final Geodesic SPHERE = new Geodesic(1.0, 0.0);

    @TempDir
    static Path home;
    private static PluginHarness h;

    @BeforeAll
    static void start() {
        h = PluginHarness.startWithDemo(home);
    }

    @AfterAll
    static void stop() {
        HeadlessFx.run(() -> h.close());
    }

    /** A view of SIZE_PX square centred on a position at PPN pixels per nm. */
    static Viewport viewAt(GeoPosition c) {
        double mpp = Earth.NAUTICAL_MILE_M * Mercator.scaleFactor(c.latDeg()) / PPN;
        return new Viewport(Mercator.eastingM(c.lonDeg()), Mercator.northingM(c.latDeg()), mpp, SIZE_PX, SIZE_PX);
    }

    /** The point a distance along a great circle from a start (GeographicLib, unit sphere). */
    static GeoPosition along(GeoPosition from, double azDeg, double nm) {
        GeodesicData d = SPHERE.Direct(from.latDeg(), from.lonDeg(), azDeg, Math.toRadians(nm / 60.0));
        return GeoPosition.of(d.lat2, d.lon2);
    }

    /** A drawn line: its intercept point, its direction, its label's box. */
    record Drawn(GeoPosition intercept, double znDeg, String label, boolean labelAtFirstEnd, double labelDy) {
        GeoPosition at(double nm) {
            return along(intercept, (znDeg + 90) % 360, nm);
        }

        /** The label's halo box in a view: x0, y0, x1, y1 (as the painter sizes it, 7.4 px a letter). */
        double[] box(Viewport v) {
            GeoPosition end = at(labelAtFirstEnd ? PlotOverlays.LOP_HALF_LENGTH_NM : -PlotOverlays.LOP_HALF_LENGTH_NM);
            double x = PluginHarness.x(v, end) + 4;
            double y = PluginHarness.y(v, end) + labelDy;
            return new double[] {x - 4, y - 3, x + label.length() * 7.4 + 4, y + 17};
        }
    }

    /** Whether a screen point is under one of the labels placed at the last frame (their halos hide lines). */
    private static boolean inBoxes(double x, double y, List<Drawn> all, Viewport v) {
        List<PlotOverlays.PlacedLabel> labels = HeadlessFx.call(() -> h.plugin.painters().placedLabels());
        for (PlotOverlays.PlacedLabel l : labels) {
            double lx = PluginHarness.x(v, l.place().at()) + l.place().dxPx();
            double ly = PluginHarness.y(v, l.place().at()) + l.place().dyPx();
            if (x >= lx - 4 && x <= lx + l.text().length() * 7.4 + 4 && y >= ly - 3 && y <= ly + 17) {
                return true;
            }
        }
        return false;
    }

    /** Distance in pixels from a screen point to another drawn line (its segment), sampled every 0.1 nm. */
    private static double pxToLine(double x, double y, Drawn other, Viewport v) {
        double best = Double.POSITIVE_INFINITY;
        for (double s = -PlotOverlays.LOP_HALF_LENGTH_NM; s <= PlotOverlays.LOP_HALF_LENGTH_NM; s += 0.1) {
            GeoPosition p = other.at(s);
            best = Math.min(best, Math.hypot(PluginHarness.x(v, p) - x, PluginHarness.y(v, p) - y));
        }
        return best;
    }

    private static List<Drawn> shownLines(Plot plot) {
        List<Drawn> out = new ArrayList<>();
        for (Plot.SightResult s : plot.sights()) {
            LineOfPosition l = s.reduced().orElseThrow(() -> new AssertionError("demo row " + s.row() + " not worked")).lop();
            out.add(new Drawn(l.interceptPoint(), l.znDeg(), PlotOverlays.lopLabel(l), true, 2));
        }
        return out;
    }

    /**
     * Checks that a line is painted where expected: hits at points along it every nm, and nothing
     * of its colour to either side.
     *
     * @return the fraction of the points along it that were hit
     */
    private static double checkLine(BufferedImage img, Viewport v, Drawn d, List<Drawn> all, Color colour,
            String what, boolean dashed) {
        int tried = 0;
        int hit = 0;
        for (double s = -12; s <= 12; s += dashed ? 0.25 : 1.0) {
            GeoPosition p = d.at(s);
            double x = PluginHarness.x(v, p);
            double y = PluginHarness.y(v, p);
            if (x < 10 || y < 10 || x > SIZE_PX - 10 || y > SIZE_PX - 40 || inBoxes(x, y, all, v)) {
                continue;
            }
            boolean crossed = false;
            for (Drawn o : all) {
                crossed |= o != d && pxToLine(x, y, o, v) < OFF_PX + 4;
            }
            if (crossed) {
                continue;
            }
            tried++;
            if (PluginHarness.colourNear(img, x, y, HIT_PX, colour, HIT_TOL)) {
                hit++;
            } else if (!dashed) {
                throw new AssertionError(what + ": no line pixel within " + HIT_PX + " px of " + s + " nm along it, at ("
                        + Math.round(x) + ", " + Math.round(y) + ")");
            }
            // At right angles to the line, OFF_PX each side: nothing of its colour.
            double dirDeg = (d.znDeg() + 90) % 360;
            GeoPosition q = d.at(s + 0.01);
            double ux = PluginHarness.x(v, q) - x;
            double uy = PluginHarness.y(v, q) - y;
            double len = Math.hypot(ux, uy);
            for (int side : new int[] {-1, 1}) {
                double ox = x - side * uy / len * OFF_PX;
                double oy = y + side * ux / len * OFF_PX;
                if (inBoxes(ox, oy, all, v)) {
                    continue;
                }
                assertFalse(PluginHarness.colourNear(img, ox, oy, 1, colour, ABSENT_TOL),
                        what + ": line colour " + OFF_PX + " px to the side at " + s + " nm (direction " + dirDeg + "°)");
            }
        }
        assertTrue(tried >= (dashed ? 30 : 8), what + ": too few clear points to check (" + tried + ")");
        return hit / (double) tried;
    }

    @Test
    void everyLineOfPositionIsWhereTheEnginePutsIt() {
        HeadlessFx.run(() -> {
            h.passageTime().set(null);
            h.showOnly("lines of position");
        });
        Plot plot = HeadlessFx.call(() -> h.plugin.model().plot().get());
        List<Drawn> lines = shownLines(plot);
        assertEquals(7, lines.size(), "the demo's seven sights");
        for (int i = 0; i < lines.size(); i++) {
            Drawn d = lines.get(i);
            Viewport v = viewAt(d.intercept());
            BufferedImage img = HeadlessFx.call(() -> h.render(v));
            checkLine(img, v, d, lines, PlotStyle.LOP, "line of row " + (i + 1) + " (" + d.label() + ")", false);
        }
    }

    @Test
    void linesCarriedForTheRunningFixAreWhereTheEngineCarriesThem() {
        HeadlessFx.run(() -> {
            h.passageTime().set(null);
            h.showOnly("running-fix lines");
        });
        Plot plot = HeadlessFx.call(() -> h.plugin.model().plot().get());
        List<Drawn> carried = new ArrayList<>();
        for (Plot.FixResult f : plot.fixes()) {
            for (Plot.AdvancedLine a : f.advanced()) {
                String label = String.format(java.util.Locale.ROOT, "%s run %.1f nm", plot.sights().get(a.row()).label(),
                        a.runNm());
                carried.add(new Drawn(a.interceptPoint(), a.znDeg(), label, false, 16));
            }
        }
        // the forenoon and noon Sun lines carried to the afternoon sight, and the twilight lines to the last one
        assertTrue(carried.size() >= 2, "carried lines: " + carried.size());
        for (Drawn d : carried) {
            Viewport v = viewAt(d.intercept());
            BufferedImage img = HeadlessFx.call(() -> h.render(v));
            // Dashed 9 px on, 5 off: about 9/14 of the points along it fall on a dash (with 2 px of reach, more).
            double f = checkLine(img, v, d, carried, PlotStyle.LOP, d.label(), true);
            assertTrue(f > 0.5 && f < 0.97, d.label() + ": a dashed line, hit at " + f + " of the points");
        }
    }

    @Test
    void everyFixAndItsEllipseIsWhereTheEngineSolvedIt() {
        HeadlessFx.run(() -> {
            h.passageTime().set(null);
            h.showOnly("fixes");
        });
        Plot plot = HeadlessFx.call(() -> h.plugin.model().plot().get());
        assertEquals(2, plot.fixes().size(), "the running fix and the twilight fix");
        assertTrue(plot.fixes().get(0).isRunning(), "the day's Sun lines make a running fix");
        assertFalse(plot.fixes().get(1).isRunning(), "the twilight round (7.5 min) is a fix, not a running fix");
        for (Plot.FixResult fr : plot.fixes()) {
            Fix f = fr.fix().orElseThrow();
            Viewport v = viewAt(f.position());
            BufferedImage img = HeadlessFx.call(() -> h.render(v));
            double cx = PluginHarness.x(v, f.position());
            double cy = PluginHarness.y(v, f.position());
            assertTrue(PluginHarness.colourNear(img, cx, cy, 1, PlotStyle.FIX, HIT_TOL), fr.name() + ": the dot at the fix");
            // The ring of 13 px: radius 6.5 px, stroke 2 px.
            for (int az = 0; az < 360; az += 45) {
                double rx = cx + 6.5 * Math.sin(Math.toRadians(az));
                double ry = cy - 6.5 * Math.cos(Math.toRadians(az));
                assertTrue(PluginHarness.colourNear(img, rx, ry, 1, PlotStyle.FIX, HIT_TOL), fr.name() + ": ring at " + az + "°");
            }
            // The 95 % ellipse, in the tangent plane at the fix: points every 15° of the parameter.
            double a = f.ellipse95().majorNm();
            double b = f.ellipse95().minorNm();
            double th = Math.toRadians(f.ellipse95().orientationDeg());
            double[] label = {-1, -1, -1, -1};
            for (PlotOverlays.PlacedLabel l : HeadlessFx.call(() -> h.plugin.painters().placedLabels())) {
                if (l.text().endsWith(" " + fr.name()) && l.text().contains("Fix ")) {
                    double lx = PluginHarness.x(v, l.place().at()) + l.place().dxPx();
                    double ly = PluginHarness.y(v, l.place().at()) + l.place().dyPx();
                    label = new double[] {lx - 4, ly - 3, lx + l.text().length() * 7.4 + 4, ly + 17};
                }
            }
            int checked = 0;
            for (int k = 0; k < 24; k++) {
                double t = Math.toRadians(15 * k);
                double north = a * Math.cos(t) * Math.cos(th) - b * Math.sin(t) * Math.sin(th);
                double east = a * Math.cos(t) * Math.sin(th) + b * Math.sin(t) * Math.cos(th);
                GeoPosition p = along(f.position(), Math.toDegrees(Math.atan2(east, north)), Math.hypot(east, north));
                double x = PluginHarness.x(v, p);
                double y = PluginHarness.y(v, p);
                boolean underLabel = x >= label[0] && x <= label[2] && y >= label[1] && y <= label[3];
                if (underLabel || Math.hypot(x - cx, y - cy) < 12 || x < 0 || y < 0 || x >= SIZE_PX || y >= SIZE_PX) {
                    continue;
                }
                checked++;
                assertTrue(PluginHarness.colourNear(img, x, y, HIT_PX, PlotStyle.FIX, HIT_TOL),
                        fr.name() + ": ellipse outline at parameter " + 15 * k + "° (" + Math.round(x) + ", " + Math.round(y) + ")");
                // Inside the ellipse, half way to the centre: the fill, not the outline colour.
                double ix = (x + cx) / 2;
                double iy = (y + cy) / 2;
                if (Math.hypot(ix - cx, iy - cy) > 10 && !(ix >= label[0] && ix <= label[2] && iy >= label[1] && iy <= label[3])) {
                    assertFalse(PluginHarness.colourNear(img, ix, iy, 1, PlotStyle.FIX, ABSENT_TOL),
                            fr.name() + ": no outline half way in at parameter " + 15 * k + "°");
                }
            }
            assertTrue(checked >= 8, fr.name() + ": ellipse points clear of the mark and label: " + checked
                    + " (semi-axes " + a + ", " + b + " nm)");
        }
    }

    @Test
    void movingThePassageSliderMovesTheDrMarker() {
        PassagePanel panel = (PassagePanel) h.panels.get("Passage");
        DrLog log = HeadlessFx.call(() -> h.plugin.model().passage().drLog().orElseThrow());
        HeadlessFx.run(() -> h.showOnly("DR track"));
        long spanS = Duration.between(log.start(), log.end()).toSeconds();
        double f1 = 0.40;
        double f2 = 0.45;
        Instant t1 = log.start().plusSeconds(Math.round(f1 * spanS));
        Instant t2 = log.start().plusSeconds(Math.round(f2 * spanS));
        GeoPosition p1 = DeadReckoning.dr(log, t1);
        GeoPosition p2 = DeadReckoning.dr(log, t2);
        GeoPosition mid = GeoPosition.of((p1.latDeg() + p2.latDeg()) / 2, (p1.lonDeg() + p2.lonDeg()) / 2);
        double ppn = Math.min(PPN, 500 / Math.max(1, org.sightwork.geo.earth.Sailings.rhumbLine(p1, p2).distanceNm()));
        double mpp = Earth.NAUTICAL_MILE_M * Mercator.scaleFactor(mid.latDeg()) / ppn;
        Viewport v = new Viewport(Mercator.eastingM(mid.lonDeg()), Mercator.northingM(mid.latDeg()), mpp, SIZE_PX, SIZE_PX);

        BufferedImage[] img = new BufferedImage[2];
        Instant[] set = new Instant[2];
        List<PlotOverlays.PlacedLabel> labels = new ArrayList<>();
        HeadlessFx.run(() -> {
            panel.slider().setValue(f1);
            set[0] = h.passageTime().get();
            img[0] = h.render(v);
            labels.addAll(h.plugin.painters().placedLabels());
            panel.slider().setValue(f2);
            set[1] = h.passageTime().get();
            img[1] = h.render(v);
            labels.addAll(h.plugin.painters().placedLabels());
        });
        assertEquals(t1, set[0], "the slider at " + f1 + " of the DR log's span sets the passage time");
        assertEquals(t2, set[1], "and at " + f2);
        double x1 = PluginHarness.x(v, p1);
        double y1 = PluginHarness.y(v, p1);
        double x2 = PluginHarness.x(v, p2);
        double y2 = PluginHarness.y(v, p2);
        assertTrue(Math.hypot(x2 - x1, y2 - y1) > 40, "the two DR positions are apart on the screen");
        // The marker: a filled triangle 14 px across centred on the DR position (a dashed 1.6 px track
        // line alone fills at most a dozen pixels of a 7 x 7 box).
        assertTrue(count(img[0], x1, y1, PlotStyle.DR) >= 25, "marker at the DR at " + t1);
        assertTrue(count(img[0], x2, y2, PlotStyle.DR) <= 12, "no marker yet at the DR at " + t2);
        assertTrue(count(img[1], x2, y2, PlotStyle.DR) >= 25, "marker moved to the DR at " + t2);
        assertTrue(count(img[1], x1, y1, PlotStyle.DR) <= 12, "marker gone from the DR at " + t1);
        // Every changed pixel is at one of the two markers or under a label of either frame (the
        // labels are placed afresh when the marker moves: an hour label may give way to "DR hh:mm").
        for (int y = 0; y < SIZE_PX; y++) {
            for (int x = 0; x < SIZE_PX; x++) {
                if (img[0].getRGB(x, y) != img[1].getRGB(x, y)) {
                    boolean explained = false;
                    for (double[] c : new double[][] {{x1, y1}, {x2, y2}}) {
                        // the label "DR hh:mm" at one of its four places (9 px right or left, 18 up or 4 down)
                        explained |= Math.hypot(x - c[0], y - c[1]) <= 10
                                || (Math.abs(x - c[0]) <= 9 + 8 * 7.4 + 8 && y >= c[1] - 18 - 3 && y <= c[1] + 4 + 17);
                    }
                    for (PlotOverlays.PlacedLabel l : labels) {
                        double lx = PluginHarness.x(v, l.place().at()) + l.place().dxPx();
                        double ly = PluginHarness.y(v, l.place().at()) + l.place().dyPx();
                        explained |= x >= lx - 3 && x <= lx + l.text().length() * 7.4 + 3 && y >= ly - 2 && y <= ly + 16;
                    }
                    assertTrue(explained, "pixel (" + x + ", " + y + ") changed away from the DR markers and labels");
                }
            }
        }
    }

    private static int count(BufferedImage img, double x, double y, Color c) {
        int n = 0;
        for (int dx = -3; dx <= 3; dx++) {
            for (int dy = -3; dy <= 3; dy++) {
                if (PluginHarness.distance(img.getRGB((int) Math.floor(x) + dx, (int) Math.floor(y) + dy), c) < HIT_TOL) {
                    n++;
                }
            }
        }
        return n;
    }

    @Test
    void editingTheHsCellMovesTheLineByTheInterceptChange() throws Exception {
        SightLogPanel log = (SightLogPanel) h.panels.get("Sight log");
        HeadlessFx.run(() -> {
            h.passageTime().set(null);
            h.showOnly("lines of position");
        });
        Plot before = HeadlessFx.call(() -> h.plugin.model().plot().get());
        LineOfPosition l0 = before.sights().get(0).reduced().orElseThrow().lop();
        String hs0 = HeadlessFx.call(() -> h.plugin.model().passage().rows().get(0).get(SightColumn.HS));
        double hsDeg = org.sightwork.geo.earth.Angles.parse(hs0);
        String hs1 = org.sightwork.geo.earth.Angles.formatDm(hsDeg + 1.0 / 60.0, 2);
        Stage[] stage = new Stage[1];
        try {
            HeadlessFx.run(() -> {
                stage[0] = new Stage();
                stage[0].setScene(new Scene(log, 1400, 500));
                stage[0].show();
                log.applyCss();
                log.layout();
                @SuppressWarnings("unchecked")
                TableColumn<SightRow, ?> hsCol = log.table().getColumns().stream()
                        .filter(c -> c.getUserData() == SightColumn.HS).findFirst().orElseThrow();
                log.table().edit(0, (TableColumn<SightRow, Object>) hsCol);
                log.layout();
                TextField field = (TextField) log.table().lookupAll(".text-field").stream()
                        .filter(n -> n instanceof TextField).findFirst()
                        .orElseThrow(() -> new AssertionError("the Hs cell's editor"));
                field.setText(hs1);
                field.fireEvent(new ActionEvent(field, field));
            });
            Plot after = HeadlessFx.call(() -> h.plugin.model().plot().get());
            assertEquals(hs1, HeadlessFx.call(() -> h.plugin.model().passage().rows().get(0).get(SightColumn.HS)),
                    "the cell's text is in the passage");
            LineOfPosition l1 = after.sights().get(0).reduced().orElseThrow().lop();
            // Hs up 1.0′: Ho up 1.0′ (the corrections change by under 0.01′ for 1′ of altitude at 48°:
            // refraction's slope there, Bennett's formula), so the intercept grows by 1.0 nm toward the body.
            assertEquals(l0.interceptNm() + 1.0, l1.interceptNm(), 0.02, "intercept after the edit (nm)");
            assertEquals(l0.znDeg(), l1.znDeg(), 1e-9, "Zn unchanged");

            // The new line: the old one moved 1.0 nm along Zn, from the same AP.
            Drawn old = new Drawn(l0.interceptPoint(), l0.znDeg(), PlotOverlays.lopLabel(l0), true, 2);
            Drawn moved = new Drawn(along(l0.ap(), l0.znDeg(), l0.interceptNm() + 1.0), l0.znDeg(),
                    PlotOverlays.lopLabel(l1), true, 2);
            List<Drawn> others = new ArrayList<>(shownLines(after));
            others.remove(0);
            Viewport v = viewAt(old.intercept());
            BufferedImage img = HeadlessFx.call(() -> h.render(v));
            List<Drawn> all = new ArrayList<>(others);
            all.add(moved);
            checkLine(img, v, moved, all, PlotStyle.LOP, "row 1 after the edit", false);
            // and where it was, 1 nm = 20 px back, it is gone
            int gone = 0;
            for (double s = -10; s <= 10; s += 2) {
                GeoPosition p = old.at(s);
                double x = PluginHarness.x(v, p);
                double y = PluginHarness.y(v, p);
                boolean nearOther = false;
                for (Drawn o : all) {
                    nearOther |= o != moved && pxToLine(x, y, o, v) < 10;
                }
                if (!nearOther && !inBoxes(x, y, all, v)) {
                    assertFalse(PluginHarness.colourNear(img, x, y, 1, PlotStyle.LOP, ABSENT_TOL),
                            "the line has left its old place at " + s + " nm");
                    gone++;
                }
            }
            assertTrue(gone >= 5, "old places checked: " + gone);
        } finally {
            HeadlessFx.run(() -> {
                stage[0].close();
                h.plugin.sightLog().setCell(0, SightColumn.HS, hs0);
            });
        }
    }
}
