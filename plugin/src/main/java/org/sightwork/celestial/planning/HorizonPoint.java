package org.sightwork.celestial.planning;

/**
 * A direction in the observer's sky.
 *
 * @param altitudeDeg altitude above the horizon plane (degrees, [-90°, 90°])
 * @param azimuthDeg azimuth true, clockwise from north (degrees, [0°, 360°))
 */
public record HorizonPoint(double altitudeDeg, double azimuthDeg) {

    /** Checks the ranges. */
    public HorizonPoint {
        if (!(altitudeDeg >= -90.0 && altitudeDeg <= 90.0)) {
            throw new IllegalArgumentException("altitude " + altitudeDeg + "° is outside [-90°, 90°]");
        }
        if (!(azimuthDeg >= 0.0 && azimuthDeg < 360.0)) {
            throw new IllegalArgumentException("azimuth " + azimuthDeg + "° is outside [0°, 360°)");
        }
    }

    /**
     * The angle between two directions in the sky.
     *
     * @param other the other direction
     * @return the great-circle separation (degrees, [0°, 180°])
     */
    public double separationDeg(HorizonPoint other) {
        return Horizon.separationDeg(altitudeDeg, azimuthDeg, other.altitudeDeg, other.azimuthDeg);
    }
}
