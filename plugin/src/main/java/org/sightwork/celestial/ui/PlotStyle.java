package org.sightwork.celestial.ui;

import javafx.scene.paint.Color;
import org.sightwork.geo.spi.Stroke;

/**
 * The plugin's colours and strokes, our own: given for daylight; the shell's painter dims them at
 * dusk and turns them to dim reds at night. Chosen to stay apart from each other and from the
 * chart's sea and land tints, and to keep different line kinds apart by dash as well as colour
 * (so that they stay apart in the night palette, where every colour becomes a red).
 */
final class PlotStyle {

    static final Color DR = Color.web("#5a3d1e");
    static final Color GPS = Color.web("#0b7d5c");
    static final Color AP = Color.web("#4a4a4a");
    static final Color LOP = Color.web("#1d3fb8");
    static final Color SELECTED = Color.web("#d4147a");
    static final Color CIRCLE = Color.web("#7a35b0");
    static final Color GP = Color.web("#c76a00");
    static final Color COCKED_HAT = Color.web("#b07800");
    static final Color COCKED_HAT_FILL = Color.web("#e8b400", 0.22);
    static final Color FIX = Color.web("#b3121b");
    static final Color ELLIPSE_FILL = Color.web("#b3121b", 0.10);
    static final Color SET_DRIFT = Color.web("#006d9c");

    static final Stroke DR_LINE = Stroke.dashed(DR, 1.6, 10, 4);
    static final Stroke DR_TICK = Stroke.solid(DR, 1.6);
    // dotted: a GPS track must not read as a line of position when the night palette makes both red
    static final Stroke GPS_LINE = Stroke.dashed(GPS, 1.8, 2, 3);
    static final Stroke LOP_LINE = Stroke.solid(LOP, 2.0);
    static final Stroke LOP_SELECTED = Stroke.solid(SELECTED, 3.2);
    static final Stroke ADVANCED_LINE = Stroke.dashed(LOP, 2.0, 9, 5);
    static final Stroke ADVANCED_SELECTED = Stroke.dashed(SELECTED, 3.2, 9, 5);
    static final Stroke INTERCEPT = Stroke.dashed(AP, 1.0, 3, 3);
    static final Stroke CIRCLE_LINE = Stroke.dashed(CIRCLE, 1.6, 14, 4, 2, 4);
    static final Stroke FIX_LINE = Stroke.solid(FIX, 2.0);
    static final Stroke SET_DRIFT_LINE = Stroke.solid(SET_DRIFT, 2.2);

    private PlotStyle() {
    }
}
