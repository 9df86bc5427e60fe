package org.sightwork.geo.render;

import java.util.Locale;
import javafx.geometry.VPos;
import javafx.scene.canvas.GraphicsContext;
import javafx.scene.text.Font;
import javafx.scene.text.TextAlignment;

/**
 * A scale bar in nautical miles, true at the latitude of the centre of the screen (on a Mercator
 * chart the scale changes with latitude, by {@link org.sightwork.geo.earth.Mercator#scaleFactor}).
 * Its length is the largest of 1, 2 or 5 times a power of ten nautical miles that fits in
 * {@link #MAX_LENGTH_PX}; it is drawn in alternating halves with its length written above.
 *
 * <p><b>Thread:</b> that of the graphics context.
 */
public final class ScaleBar {

    /** Longest bar (pixels). */
    public static final double MAX_LENGTH_PX = 200;
    private static final Font FONT = Font.font("System", 11);

    private ScaleBar() {
    }

    /**
     * The bar's length for a viewport.
     *
     * @param v the viewport
     * @return length (nautical miles)
     */
    public static double lengthNm(Viewport v) {
        double pxPerNm = v.pixelsPerNm(v.centreLatDeg());
        double maxNm = MAX_LENGTH_PX / pxPerNm;
        double pow = Math.pow(10, Math.floor(Math.log10(maxNm)));
        for (double m : new double[] {5, 2, 1}) {
            if (m * pow <= maxNm) {
                return m * pow;
            }
        }
        return pow;
    }

    /**
     * Paints the bar at the bottom left.
     *
     * @param gc the graphics context
     * @param v the viewport
     * @param p the palette
     */
    public static void paint(GraphicsContext gc, Viewport v, Palette p) {
        double nm = lengthNm(v);
        double len = nm * v.pixelsPerNm(v.centreLatDeg());
        double x0 = 14;
        double y0 = v.heightPx() - 26;
        gc.setFill(p.halo());
        gc.fillRect(x0 - 6, y0 - 18, len + 12, 30);
        gc.setStroke(p.ink());
        gc.setFill(p.ink());
        gc.setLineWidth(1);
        gc.setLineDashes((double[]) null);
        gc.strokeRect(x0 + 0.5, y0 + 0.5, len, 5);
        gc.fillRect(x0 + 0.5, y0 + 0.5, len / 2, 5);
        gc.setFont(FONT);
        gc.setTextAlign(TextAlignment.LEFT);
        gc.setTextBaseline(VPos.BOTTOM);
        String label = (nm >= 1 ? String.format(Locale.ROOT, "%.0f", nm)
                : String.format(Locale.ROOT, "%s", stripZeros(nm))) + " nm";
        gc.fillText(label + String.format(Locale.ROOT, "  (at %s)",
                org.sightwork.geo.earth.Angles.formatLatitude(v.centreLatDeg())), x0, y0 - 2);
    }

    private static String stripZeros(double v) {
        return new java.math.BigDecimal(v).round(new java.math.MathContext(1)).stripTrailingZeros().toPlainString();
    }
}
