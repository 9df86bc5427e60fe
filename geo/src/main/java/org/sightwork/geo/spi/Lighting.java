package org.sightwork.geo.spi;

/** The light the chart is read in, which selects the palette. */
public enum Lighting {
    /** Daylight: full contrast. */
    DAY,
    /** Dusk and dawn: dimmer, lower contrast. */
    DUSK,
    /** Night: dark, red-shifted and dim, to keep the eyes' night adaptation. */
    NIGHT
}
