package org.sightwork.geo.spi;

/** Shapes of a marker, drawn centred on its position. */
public enum MarkerShape {
    /** A filled dot. */
    DOT,
    /** A ring. */
    CIRCLE,
    /** A square, sides along the chart's edges. */
    SQUARE,
    /** A triangle, point up. */
    TRIANGLE,
    /** An upright cross (+). */
    CROSS
}
