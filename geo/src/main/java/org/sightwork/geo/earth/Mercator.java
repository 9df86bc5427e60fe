package org.sightwork.geo.earth;

/**
 * The Mercator projection on the WGS84 ellipsoid, EPSG method "Mercator (variant A)" with scale 1
 * on the equator and no false origin: the projection of EPSG:3395 "WGS 84 / World Mercator".
 * Easting and northing in metres.
 *
 * <p><b>Method:</b> Snyder, J. P. (1987), Map Projections: A Working Manual, USGS Professional
 * Paper 1395, §7, eqs. (7-6) and (7-7) forward, (7-9) and (7-10) inverse by iteration, (7-8)
 * scale factor (equation numbers from memory). Northing divided by the semi-major axis and
 * expressed in minutes of arc is the navigator's meridional parts (Bowditch, The American Practical
 * Navigator, Table 6).
 *
 * <p><b>Why written out here rather than called through Apache SIS:</b> speed. The chart projects
 * every vertex once at load and the overlays project their densified curves on every frame; a
 * static method on primitives does that with no allocation per point. {@code MercatorTest}
 * checks it against SIS's own EPSG:3395 transform (agreement better than 1 mm over ±85°).
 *
 * <p><b>Accuracy:</b> forward exact to rounding (1e-9 m); inverse iterates to 1e-12 rad (under
 * 0.01 mm). <b>Limits:</b> the poles project to infinity; latitudes are clamped to
 * ±{@link #MAX_LAT_DEG}.
 *
 * <p><b>Thread safety:</b> stateless.
 */
public final class Mercator {

    /** Latitude limit of the chart (degrees): the square world of web charts, about ±85.05°. */
    public static final double MAX_LAT_DEG = 85.0511287798;

    private static final double A = Earth.WGS84_SEMI_MAJOR_AXIS_M;
    private static final double F = 1.0 / Earth.WGS84_INVERSE_FLATTENING;
    /** First eccentricity, e² = 2f − f² (NIMA TR8350.2, 3rd ed., table 3.3). */
    private static final double E2 = 2 * F - F * F;
    private static final double E = Math.sqrt(E2);

    private Mercator() {
    }

    /**
     * Easting of a longitude.
     *
     * @param lonDeg longitude (degrees, east positive; any value, not wrapped)
     * @return easting (metres)
     */
    public static double eastingM(double lonDeg) {
        return A * Math.toRadians(lonDeg);
    }

    /**
     * Northing of a latitude, Snyder (7-7).
     *
     * @param latDeg latitude (degrees), clamped to ±{@link #MAX_LAT_DEG}
     * @return northing (metres)
     */
    public static double northingM(double latDeg) {
        double phi = Math.toRadians(Math.max(-MAX_LAT_DEG, Math.min(MAX_LAT_DEG, latDeg)));
        double s = Math.sin(phi);
        // ln tan(π/4 + φ/2) − (e/2) ln((1 + e sin φ)/(1 − e sin φ)), written as atanh(sin φ) − e atanh(e sin φ),
        // the same function with no loss of precision near the equator
        return A * (atanh(s) - E * atanh(E * s));
    }

    private static double atanh(double x) {
        return 0.5 * Math.log1p(2 * x / (1 - x));
    }

    /**
     * Longitude of an easting.
     *
     * @param eastingM easting (metres)
     * @return longitude (degrees, not wrapped)
     */
    public static double longitudeDeg(double eastingM) {
        return Math.toDegrees(eastingM / A);
    }

    /**
     * Latitude of a northing, Snyder (7-9), (7-10), iterated.
     *
     * @param northingM northing (metres)
     * @return latitude (degrees)
     */
    public static double latitudeDeg(double northingM) {
        double t = Math.exp(-northingM / A);
        double phi = Math.PI / 2 - 2 * Math.atan(t);
        for (int i = 0; i < 15; i++) {
            double es = E * Math.sin(phi);
            double next = Math.PI / 2 - 2 * Math.atan(t * Math.pow((1 - es) / (1 + es), E / 2));
            if (Math.abs(next - phi) < 1e-12) {
                return Math.toDegrees(next);
            }
            phi = next;
        }
        return Math.toDegrees(phi);
    }

    /**
     * Scale factor of the projection at a latitude, Snyder (7-8): k = sec φ √(1 − e² sin² φ).
     *
     * @param latDeg latitude (degrees)
     * @return chart length per ground length (1 on the equator)
     */
    public static double scaleFactor(double latDeg) {
        double phi = Math.toRadians(latDeg);
        double s = Math.sin(phi);
        return Math.sqrt(1 - E2 * s * s) / Math.cos(phi);
    }

    /**
     * Meridional parts: the northing in minutes of arc of the equator (Bowditch, Table 6).
     *
     * @param latDeg latitude (degrees)
     * @return meridional parts (minutes of equatorial arc)
     */
    public static double meridionalParts(double latDeg) {
        return northingM(latDeg) / A * (180 * 60 / Math.PI);
    }
}
