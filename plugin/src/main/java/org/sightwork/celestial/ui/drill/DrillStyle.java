package org.sightwork.celestial.ui.drill;

import javafx.scene.paint.Color;
import org.sightwork.geo.spi.Stroke;

/**
 * The drill mode's colours and strokes, our own, given for daylight (the shell's painter dims them
 * at dusk and turns them to reds at night). Chosen apart from the celestial plot's colours and the
 * chart's tints; the three kinds are also told apart by symbol (student ▲, key ■, truth ●) and
 * dash, so that they stay apart in the night palette.
 */
final class DrillStyle {

    /** The student's fixes: teal. */
    static final Color STUDENT = Color.web("#00838f");
    /** The key's fixes: near black. */
    static final Color KEY = Color.web("#202020");
    /** The truth (true track and true positions): vivid green, unlike the plot's GPS green. */
    static final Color TRUTH = Color.web("#19c23c");
    /** The line from a student's fix to the truth, and its label. */
    static final Color ERROR = Color.web("#8c1d8c");
    /** The "GPS withheld" banner on the chart. */
    static final Color BANNER = Color.web("#a04000");

    static final Stroke STUDENT_MARK = Stroke.solid(STUDENT, 2.0);
    static final Stroke KEY_MARK = Stroke.solid(KEY, 1.8);
    static final Stroke TRUTH_TRACK = Stroke.solid(TRUTH, 2.2);
    static final Stroke TRUTH_MARK = Stroke.solid(TRUTH, 2.0);
    static final Stroke ERROR_LINE = Stroke.dashed(ERROR, 1.6, 6, 3);

    /** Marker size of a student's fix (pixels). */
    static final double STUDENT_SIZE_PX = 14;
    /** Marker size of a key's fix (pixels). */
    static final double KEY_SIZE_PX = 11;
    /** Marker size of a true position (pixels). */
    static final double TRUTH_SIZE_PX = 9;

    private DrillStyle() {
    }
}
