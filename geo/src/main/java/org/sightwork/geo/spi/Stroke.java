package org.sightwork.geo.spi;

import java.util.Arrays;
import javafx.scene.paint.Color;

/**
 * How a line is drawn: colour, width and dash pattern.
 *
 * @param colour the colour (day palette; see {@link GeoPainter})
 * @param widthPx the width (pixels, &gt; 0)
 * @param dashPx lengths of dash and gap, alternating (pixels); empty for a solid line
 */
public record Stroke(Color colour, double widthPx, double[] dashPx) {

    /** Checks the values and keeps a copy of the dash pattern. */
    public Stroke {
        if (colour == null) {
            throw new IllegalArgumentException("a stroke needs a colour");
        }
        if (!(widthPx > 0 && widthPx <= 100)) {
            throw new IllegalArgumentException("stroke width " + widthPx + " px is outside (0, 100]");
        }
        dashPx = dashPx == null ? new double[0] : dashPx.clone();
        for (double d : dashPx) {
            if (!(d > 0)) {
                throw new IllegalArgumentException("dash lengths must be positive: " + Arrays.toString(dashPx));
            }
        }
    }

    /**
     * A solid line.
     *
     * @param colour the colour
     * @param widthPx the width (pixels)
     * @return the stroke
     */
    public static Stroke solid(Color colour, double widthPx) {
        return new Stroke(colour, widthPx, null);
    }

    /**
     * A dashed line.
     *
     * @param colour the colour
     * @param widthPx the width (pixels)
     * @param dashPx dash and gap lengths (pixels)
     * @return the stroke
     */
    public static Stroke dashed(Color colour, double widthPx, double... dashPx) {
        return new Stroke(colour, widthPx, dashPx);
    }

    /**
     * The dash pattern (a copy).
     *
     * @return dash and gap lengths (pixels)
     */
    @Override
    public double[] dashPx() {
        return dashPx.clone();
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof Stroke s && s.colour.equals(colour) && s.widthPx == widthPx
                && Arrays.equals(s.dashPx, dashPx);
    }

    @Override
    public int hashCode() {
        return colour.hashCode() * 31 + Double.hashCode(widthPx) * 7 + Arrays.hashCode(dashPx);
    }

    @Override
    public String toString() {
        return "Stroke[" + colour + ", " + widthPx + " px, dash " + Arrays.toString(dashPx) + "]";
    }
}
