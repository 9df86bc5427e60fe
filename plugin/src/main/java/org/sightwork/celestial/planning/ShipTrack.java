package org.sightwork.celestial.planning;

import java.time.Duration;
import java.time.Instant;
import java.util.Objects;
import org.sightwork.geo.earth.GeoPosition;

/**
 * A dead-reckoning track at constant course and speed: the ship's DR at any instant, by rhumb line
 * from a starting DR.
 *
 * <p><b>Method:</b> Mercator sailing on a sphere (Bowditch, <i>The American Practical Navigator</i>,
 * Pub. 9, 2019 ed., ch. 24 "Navigational calculations", Mercator sailing; from memory): the
 * difference of latitude is {@code d cos C}; the difference of longitude is
 * {@code d sin C / q} with {@code q = Δφ / Δψ}, where {@code Δψ} is the difference of the
 * spherical meridional parts {@code ln tan(π/4 + φ/2)}; on an east-west course {@code q = cos φ}.
 *
 * <p><b>Accuracy:</b> the sphere instead of the WGS84 ellipsoid moves a day's run (500 nm) by up to
 * about 0.5 % of its length in latitude, i.e. a few miles; that changes a sunrise by well under a
 * minute, which is the precision the planning times are given to.
 *
 * <p><b>Limits:</b> a rhumb line that would reach within {@value #MAX_ABS_LAT_DEG}° of a pole is
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

    private static final double NM_PER_DEG = 60.0;

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
        double hours = Duration.between(startUtc, t).toNanos() / 3.6e12;
        return step(start, courseDeg, speedKn * hours);
    }

    /**
     * The end of a rhumb line of given course and distance on the sphere (Mercator sailing, see the
     * class comment).
     *
     * @param from the starting position
     * @param courseDeg course true (degrees)
     * @param distanceNm distance (nautical miles; negative runs the course backwards)
     * @return the arrival position
     * @throws IllegalArgumentException if the rhumb line would reach a pole
     */
    public static GeoPosition step(GeoPosition from, double courseDeg, double distanceNm) {
        double c = Math.toRadians(courseDeg);
        double dLatDeg = distanceNm * Math.cos(c) / NM_PER_DEG;
        double lat2 = from.latDeg() + dLatDeg;
        if (Math.abs(lat2) > MAX_ABS_LAT_DEG) {
            throw new IllegalArgumentException(String.format(java.util.Locale.ROOT,
                    "the track reaches latitude %.1f°: within %.1f° of the pole, where a rhumb line is not"
                    + " usable", lat2, 90.0 - MAX_ABS_LAT_DEG));
        }
        double phi1 = Math.toRadians(from.latDeg());
        double phi2 = Math.toRadians(lat2);
        double dPsi = Math.log(Math.tan(Math.PI / 4 + phi2 / 2) / Math.tan(Math.PI / 4 + phi1 / 2));
        double dPhi = phi2 - phi1;
        // q = Δφ/Δψ, with its limit cos φ on (nearly) east-west courses where both vanish.
        double q = Math.abs(dPsi) > 1e-12 ? dPhi / dPsi : Math.cos(phi1);
        double dLonDeg = distanceNm * Math.sin(c) / NM_PER_DEG / q;
        return GeoPosition.of(lat2, from.lonDeg() + dLonDeg);
    }
}
