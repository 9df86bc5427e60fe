package org.sightwork.geo.testing;

import javafx.scene.paint.Color;
import org.sightwork.geo.earth.GeoPosition;
import org.sightwork.geo.spi.ChartPlugin;
import org.sightwork.geo.spi.MarkerShape;
import org.sightwork.geo.spi.PluginContext;
import org.sightwork.geo.spi.Stroke;

/**
 * A tiny plugin that proves the contract: one overlay with a filled square marker and a small
 * circle. Registered in {@code src/test/resources/META-INF/services} (left out of the test jar, so
 * other modules' tests do not see it).
 */
public final class TestMarkPlugin implements ChartPlugin {

    /** Where the marker and the circle's centre are: open sea south of the demo islands. */
    public static final GeoPosition CENTRE = GeoPosition.of(37.25, -27.5);
    /** The circle's radius (nautical miles). */
    public static final double RADIUS_NM = 30;
    /** Marker size (pixels). */
    public static final double MARKER_PX = 12;
    /** The marker's fill. */
    public static final Color MARK = Color.rgb(200, 0, 160);
    /** The circle's colour. */
    public static final Color CIRCLE = Color.rgb(0, 140, 0);
    /** The overlay's name in the layer list. */
    public static final String OVERLAY = "Test marks";

    @Override
    public String name() {
        return "Test marks";
    }

    /** The last chart click heard (for tests). */
    public static volatile GeoPosition lastClick;
    /** The last passage time heard (for tests). */
    public static volatile java.time.Instant lastTime;
    /** How often the test command ran (for tests). */
    public static final java.util.concurrent.atomic.AtomicInteger COMMAND_RUNS =
            new java.util.concurrent.atomic.AtomicInteger();

    @Override
    public void start(PluginContext context) {
        context.addOverlay(OVERLAY, p -> {
            p.smallCircle(CENTRE, RADIUS_NM, Stroke.solid(CIRCLE, 3));
            p.marker(CENTRE, MarkerShape.SQUARE, MARKER_PX, null, MARK);
        });
        context.addChartClickListener(pos -> lastClick = pos);
        context.passageTime().addListener((o, a, t) -> lastTime = t);
        context.addPanel("Test panel", new javafx.scene.control.Label("test plugin panel"));
        context.addCommand("Test", "Count", COMMAND_RUNS::incrementAndGet);
    }
}
