package org.sightwork.geo.app;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.function.Consumer;
import javafx.animation.AnimationTimer;
import javafx.scene.Cursor;
import javafx.scene.canvas.Canvas;
import javafx.scene.input.KeyEvent;
import javafx.scene.input.MouseButton;
import javafx.scene.input.MouseEvent;
import javafx.scene.input.ScrollEvent;
import javafx.scene.layout.Region;
import javafx.scene.paint.Color;
import org.sightwork.geo.earth.Angles;
import org.sightwork.geo.earth.GeoPosition;
import org.sightwork.geo.earth.RangeBearing;
import org.sightwork.geo.render.ChartRenderer;
import org.sightwork.geo.render.RenderLayer;
import org.sightwork.geo.render.Viewport;
import org.sightwork.geo.spi.MarkerShape;
import org.sightwork.geo.spi.Severity;
import org.sightwork.geo.spi.Stroke;

/**
 * The chart on the screen: a canvas that fills the region, repainted on the next pulse after any
 * change (requests are coalesced), with pan (drag, arrow keys), zoom about the cursor (wheel, + and
 * − keys), the cursor read-out and the range and bearing tool.
 *
 * <p><b>Threads:</b> everything here runs on the JavaFX application thread, and nothing slow does:
 * a frame only walks the prepared layers (see {@code docs/PERFORMANCE.md}).
 * {@link #requestRepaint()} may be called from any thread.
 */
final class MapView extends Region {

    private static final double KEY_ZOOM = 1.5;
    private static final double CLICK_SLOP_PX = 4;

    private final Canvas canvas = new Canvas(10, 10);
    private final ChartRenderer renderer = new ChartRenderer();
    private final ChartModel model;
    private final Consumer<String> cursorReadout;
    private final Consumer<String> rangeReadout;
    private final Shell shell;
    private volatile boolean dirty = true;
    private Viewport viewport = Viewport.fitting(-60, -180, 75, 180, 10, 10);
    private double pressX;
    private double pressY;
    private double lastX;
    private double lastY;
    private boolean dragging;
    private double mouseX = Double.NaN;
    private double mouseY = Double.NaN;
    private boolean rangeTool;
    private GeoPosition rangeFrom;
    private GeoPosition rangeTo;
    private boolean rangeFixed;
    private List<GeoPosition> rangePath = List.of();
    private Runnable firstFrame;
    private long framesPainted;

    MapView(ChartModel model, Shell shell, Consumer<String> cursorReadout, Consumer<String> rangeReadout) {
        this.model = model;
        this.shell = shell;
        this.cursorReadout = cursorReadout;
        this.rangeReadout = rangeReadout;
        getChildren().add(canvas);
        setFocusTraversable(true);
        setMinSize(200, 150);
        addEventHandler(MouseEvent.MOUSE_PRESSED, this::pressed);
        addEventHandler(MouseEvent.MOUSE_DRAGGED, this::dragged);
        addEventHandler(MouseEvent.MOUSE_RELEASED, this::released);
        addEventHandler(MouseEvent.MOUSE_MOVED, this::moved);
        addEventHandler(MouseEvent.MOUSE_EXITED, e -> {
            mouseX = Double.NaN;
            cursorReadout.accept("");
        });
        addEventHandler(ScrollEvent.SCROLL, this::scrolled);
        addEventHandler(KeyEvent.KEY_PRESSED, this::key);
        new AnimationTimer() {
            @Override
            public void handle(long now) {
                if (dirty) {
                    dirty = false;
                    paint();
                }
            }
        }.start();
    }

    /** Paints again on the next pulse (any thread). */
    void requestRepaint() {
        dirty = true;
    }

    /**
     * Runs once after the first frame that shows chart layers.
     *
     * @param r what to run
     */
    void onFirstChartFrame(Runnable r) {
        firstFrame = r;
    }

    Viewport viewport() {
        return viewport;
    }

    void setViewport(Viewport v) {
        viewport = v.resized(Math.max(1, (int) getWidth()), Math.max(1, (int) getHeight()));
        requestRepaint();
    }

    void showArea(double s, double w, double n, double e) {
        setViewport(Viewport.fitting(s, w, n, e, Math.max(1, (int) getWidth()), Math.max(1, (int) getHeight())));
    }

    void setRangeTool(boolean on) {
        rangeTool = on;
        setCursor(on ? Cursor.CROSSHAIR : Cursor.DEFAULT);
        if (!on) {
            rangeFrom = null;
            rangeTo = null;
            rangePath = List.of();
            rangeReadout.accept("");
        } else {
            rangeReadout.accept("Range and bearing: click the start, then the end (Esc to clear)");
        }
        requestRepaint();
    }

    boolean isRangeTool() {
        return rangeTool;
    }

    @Override
    protected void layoutChildren() {
        int w = Math.max(1, (int) Math.floor(getWidth()));
        int h = Math.max(1, (int) Math.floor(getHeight()));
        if (canvas.getWidth() != w || canvas.getHeight() != h) {
            canvas.setWidth(w);
            canvas.setHeight(h);
            viewport = viewport.resized(w, h);
            requestRepaint();
        }
    }

    /**
     * The view painted on an off-screen canvas with a renderer of its own: the chart and the
     * visible layers, without the range tool (FX thread).
     *
     * @return the picture
     */
    javafx.scene.image.WritableImage renderToImage() {
        Canvas off = new Canvas(viewport.widthPx(), viewport.heightPx());
        new ChartRenderer().render(off.getGraphicsContext2D(), viewport, model.paletteProperty().get(),
                model.paintingOrder(), e -> shell.notify(Severity.ERROR, "A layer failed to paint: " + e.getMessage()));
        return off.snapshot(null, null);
    }

    private void paint() {
        List<RenderLayer> layers = new ArrayList<>(model.paintingOrder());
        layers.add(this::paintRangeTool);
        renderer.render(canvas.getGraphicsContext2D(), viewport, model.paletteProperty().get(), layers,
                e -> shell.notify(Severity.ERROR, "A layer failed to paint: " + e.getMessage()));
        framesPainted++;
        if (firstFrame != null && model.layers().stream().anyMatch(l -> l.kind() == LayerEntry.Kind.CHART)) {
            Runnable r = firstFrame;
            firstFrame = null;
            r.run();
        }
    }

    private void paintRangeTool(org.sightwork.geo.render.Frame f) {
        if (!rangeTool || rangeFrom == null) {
            return;
        }
        Color ink = Color.web("#b0006a");
        var p = f.painter();
        p.marker(rangeFrom, MarkerShape.CIRCLE, 9, Stroke.solid(ink, 2), null);
        if (rangeTo != null && !rangeTo.equals(rangeFrom)) {
            p.rhumbLine(rangeFrom, rangeTo, Stroke.solid(ink, 2));
            if (rangePath.size() > 1) {
                p.polyline(rangePath, Stroke.dashed(ink, 1.5, 7, 5));
            }
            p.marker(rangeTo, MarkerShape.CROSS, 12, Stroke.solid(ink, 2), null);
        }
    }

    private void updateRange(GeoPosition to) {
        rangeTo = to;
        if (rangeFrom == null || to == null || to.equals(rangeFrom)) {
            rangePath = List.of();
            return;
        }
        RangeBearing rb = RangeBearing.between(rangeFrom, to);
        int segs = (int) Math.max(2, Math.min(256, rb.greatCircleNm() / 5));
        rangePath = RangeBearing.geodesicPath(rangeFrom, to, segs);
        rangeReadout.accept(String.format(Locale.ROOT,
                "Rhumb line (solid) %s %s nm  ·  great circle (dashed) %s %s nm, arriving %s",
                course(rb.rhumbCourseDeg()), distance(rb.rhumbNm()), course(rb.initialCourseDeg()),
                distance(rb.greatCircleNm()), course(rb.finalCourseDeg())));
    }

    private static String course(double deg) {
        long tenths = Math.round(deg * 10) % 3600;
        return String.format(Locale.ROOT, "%05.1f°T", tenths / 10.0);
    }

    private static String distance(double nm) {
        return nm < 10 ? String.format(Locale.ROOT, "%.2f", nm) : String.format(Locale.ROOT, "%.1f", nm);
    }

    private void pressed(MouseEvent e) {
        requestFocus();
        pressX = lastX = e.getX();
        pressY = lastY = e.getY();
        dragging = false;
    }

    private void dragged(MouseEvent e) {
        if (e.getButton() != MouseButton.PRIMARY && e.getButton() != MouseButton.MIDDLE) {
            return;
        }
        if (!dragging && Math.hypot(e.getX() - pressX, e.getY() - pressY) >= CLICK_SLOP_PX) {
            dragging = true;
            setCursor(Cursor.MOVE);
        }
        if (dragging) {
            viewport = viewport.panned(e.getX() - lastX, e.getY() - lastY);
            requestRepaint();
        }
        lastX = e.getX();
        lastY = e.getY();
        moved(e);
    }

    private void released(MouseEvent e) {
        if (dragging) {
            dragging = false;
            setCursor(rangeTool ? Cursor.CROSSHAIR : Cursor.DEFAULT);
            return;
        }
        if (e.getButton() != MouseButton.PRIMARY) {
            return;
        }
        GeoPosition at = viewport.positionAt(e.getX(), e.getY());
        if (rangeTool) {
            if (rangeFrom == null || rangeFixed) {
                rangeFrom = at;
                rangeFixed = false;
                updateRange(null);
                rangeReadout.accept("Range from " + at + ": click the end");
            } else {
                updateRange(at);
                rangeFixed = true;
            }
            requestRepaint();
        } else {
            model.fireClick(at, ex -> shell.notify(Severity.ERROR, "A chart-click listener failed: " + ex.getMessage()));
        }
    }

    private void moved(MouseEvent e) {
        mouseX = e.getX();
        mouseY = e.getY();
        GeoPosition at = viewport.positionAt(mouseX, mouseY);
        cursorReadout.accept(Angles.formatLatitude(at.latDeg()) + "  " + Angles.formatLongitude(at.lonDeg()));
        if (rangeTool && rangeFrom != null && !rangeFixed) {
            updateRange(at);
            requestRepaint();
        }
    }

    private void scrolled(ScrollEvent e) {
        if (e.getDeltaY() == 0) {
            return;
        }
        double factor = Math.pow(1.0025, e.getDeltaY());
        viewport = viewport.zoomedAbout(e.getX(), e.getY(), factor);
        requestRepaint();
        e.consume();
    }

    private void key(KeyEvent e) {
        double stepX = viewport.widthPx() / 8.0;
        double stepY = viewport.heightPx() / 8.0;
        double zx = Double.isNaN(mouseX) ? viewport.widthPx() / 2.0 : mouseX;
        double zy = Double.isNaN(mouseX) ? viewport.heightPx() / 2.0 : mouseY;
        switch (e.getCode()) {
            case LEFT -> viewport = viewport.panned(stepX, 0);
            case RIGHT -> viewport = viewport.panned(-stepX, 0);
            case UP -> viewport = viewport.panned(0, stepY);
            case DOWN -> viewport = viewport.panned(0, -stepY);
            case PLUS, ADD, EQUALS -> viewport = viewport.zoomedAbout(zx, zy, KEY_ZOOM);
            case MINUS, SUBTRACT -> viewport = viewport.zoomedAbout(zx, zy, 1 / KEY_ZOOM);
            case ESCAPE -> {
                if (rangeTool) {
                    rangeFrom = null;
                    rangeTo = null;
                    rangePath = List.of();
                    rangeReadout.accept("Range and bearing: click the start, then the end (Esc to clear)");
                }
            }
            default -> {
                return;
            }
        }
        requestRepaint();
        e.consume();
    }

    long framesPainted() {
        return framesPainted;
    }
}
