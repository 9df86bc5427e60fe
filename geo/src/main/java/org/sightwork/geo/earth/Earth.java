package org.sightwork.geo.earth;

/** Constants of the Earth and of the trade, each with its value, unit and source. */
public final class Earth {

    /** The international nautical mile, 1852 m (International Hydrographic Conference, 1929). */
    public static final double NAUTICAL_MILE_M = 1852.0;

    /** WGS84 semi-major axis, 6 378 137 m (NIMA TR8350.2, 3rd ed., table 3.1). */
    public static final double WGS84_SEMI_MAJOR_AXIS_M = 6_378_137.0;

    /** WGS84 inverse flattening, 298.257223563 (NIMA TR8350.2, 3rd ed., table 3.1). */
    public static final double WGS84_INVERSE_FLATTENING = 298.257223563;

    /** Minutes of arc in one degree. */
    public static final double ARCMIN_PER_DEG = 60.0;

    private Earth() {
    }
}
