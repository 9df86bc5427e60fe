package org.sightwork.geo.earth;

/**
 * A position on the Earth (WGS84 geodetic latitude and longitude).
 *
 * @param latDeg latitude (degrees, north positive, [-90°, 90°])
 * @param lonDeg longitude (degrees, east positive, [-180°, 180°))
 */
public record GeoPosition(double latDeg, double lonDeg) {

    /** Checks the ranges; use {@link #of} to normalise a longitude first. */
    public GeoPosition {
        if (!(latDeg >= -90.0 && latDeg <= 90.0)) {
            throw new IllegalArgumentException("latitude " + latDeg + "° is outside [-90°, 90°]");
        }
        if (!(lonDeg >= -180.0 && lonDeg < 180.0)) {
            throw new IllegalArgumentException("longitude " + lonDeg + "° is outside [-180°, 180°)");
        }
    }

    /**
     * A position with its longitude brought into [-180°, 180°).
     *
     * @param latDeg latitude (degrees, [-90°, 90°])
     * @param lonDeg longitude (degrees, any value; finite)
     * @return the position
     */
    public static GeoPosition of(double latDeg, double lonDeg) {
        return new GeoPosition(latDeg, normalizeLongitude(lonDeg));
    }

    /**
     * Brings a longitude into [-180°, 180°).
     *
     * @param lonDeg longitude (degrees, finite)
     * @return the same meridian in [-180°, 180°)
     */
    public static double normalizeLongitude(double lonDeg) {
        if (!Double.isFinite(lonDeg)) {
            throw new IllegalArgumentException("longitude " + lonDeg + " is not a number");
        }
        double l = ((lonDeg + 180.0) % 360.0 + 360.0) % 360.0 - 180.0;
        return l >= 180.0 ? l - 360.0 : l;
    }

    /** Latitude and longitude in the navigator's notation, e.g. {@code 38°32.1′N 028°37.9′W}. */
    @Override
    public String toString() {
        return Angles.formatLatitude(latDeg) + " " + Angles.formatLongitude(lonDeg);
    }
}
