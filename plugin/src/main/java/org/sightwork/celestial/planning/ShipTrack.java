package org.sightwork.celestial.planning;

import java.time.Duration;
import java.time.Instant;
import java.util.Objects;
import org.sightwork.geo.earth.GeoPosition;
import org.sightwork.geo.earth.Sailings;

/**
 * A dead-reckoning track at constant course and speed: the ship's DR at any instant, by rhumb line
 * from a starting DR.
 *
 * <p><b>Method:</b> the rhumb line on the WGS84 ellipsoid of the shell's
 * {@link Sailings#rhumbDestination} (Snyder 1987 meridian arc and isometric latitude; see there),
 * run forwards from the start after it and backwards (on the reciprocal course) before it.
 *
 * <p><b>Accuracy:</b> that of {@link Sailings} (1e-5 nm against an independent reckoning); the
 * DR itself is only as good as the course and speed, which is the precision the planning times are
 * given to (a minute).
 *
 * <p><b>Limits:</b> a rhumb line that would reach within {@code 90° − MAX_ABS_LAT_DEG} of a pole is
 * refused (the loxodrome spirals into the pole); longitudes are brought back into [-180°, 180°),
 * so a track crosses the date line without a jump in the hour angles computed from it.
 *
 * @param start the DR at {@code startUtc}
 * @param startUtc the instant of the starting DR
 * @param courseDeg course true (degrees, [0°, 360°))
 * @param speedKn speed (knots, [0, 60])
 */
public record ShipTrack(GeoPosition start, Instant startUtc, double courseDeg, double speedKn) {

    /** The nearest approach to a pole a track may make (degrees of latitude from the pole). */
    public static final double MAX_ABS_LAT_DEG = 89.5;

    /** Fastest speed accepted (knots): beyond any ship's; guards against a unit mistake. */
    public static final double MAX_SPEED_KN = 60.0;

    /** Checks the arguments. */
    public ShipTrack {
        Objects.requireNonNull(start, "start");
        Objects.requireNonNull(startUtc, "startUtc");
        if (!(courseDeg >= 0.0 && courseDeg < 360.0)) {
            throw new IllegalArgumentException("course " + courseDeg + "° is outside [0°, 360°)");
        }
        if (!(speedKn >= 0.0 && speedKn <= MAX_SPEED_KN)) {
            throw new IllegalArgumentException("speed " + speedKn + " kn is outside [0, " + MAX_SPEED_KN + "] kn");
        }
    }

    /**
     * A ship lying still at one position.
     *
     * @param position the position
     * @return the track (course 000°, speed 0)
     */
    public static ShipTrack stationary(GeoPosition position) {
        return new ShipTrack(position, Instant.EPOCH, 0.0, 0.0);
    }

    /**
     * The DR at an instant, earlier or later than the start.
     *
     * @param t the instant
     * @return the DR position
     * @throws IllegalArgumentException if the rhumb line would reach a pole
     */
    public GeoPosition positionAt(Instant t) {
        if (speedKn == 0.0) {
            return start;
        }
        double runNm = speedKn * Duration.between(startUtc, t).toNanos() / 3.6e12;
        GeoPosition p = runNm >= 0.0
                ? Sailings.rhumbDestination(start, courseDeg, runNm)
                : Sailings.rhumbDestination(start, Horizon.norm360(courseDeg + 180.0), -runNm);
        if (Math.abs(p.latDeg()) > MAX_ABS_LAT_DEG) {
            throw new IllegalArgumentException(String.format(java.util.Locale.ROOT,
                    "the track reaches latitude %.1f°: within %.1f° of the pole, where a rhumb line is not"
                    + " usable", p.latDeg(), 90.0 - MAX_ABS_LAT_DEG));
        }
        return p;
    }
}
