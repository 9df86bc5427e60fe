package org.sightwork.geo.track;

import java.time.Instant;
import java.util.Objects;
import java.util.OptionalDouble;
import org.sightwork.geo.earth.GeoPosition;

/**
 * One point of a track.
 *
 * @param time the time (UTC)
 * @param position the position (WGS84)
 * @param cogDeg course over ground (degrees true), if the source gave it
 * @param sogKn speed over ground (knots), if the source gave it
 * @param headingDeg heading (degrees true), if the source gave it
 * @param stwKn speed through the water (knots), if the source gave it
 */
public record TrackPoint(Instant time, GeoPosition position, OptionalDouble cogDeg, OptionalDouble sogKn,
        OptionalDouble headingDeg, OptionalDouble stwKn) {

    /** Checks that nothing is null. */
    public TrackPoint {
        Objects.requireNonNull(time, "time");
        Objects.requireNonNull(position, "position");
        Objects.requireNonNull(cogDeg, "cogDeg");
        Objects.requireNonNull(sogKn, "sogKn");
        Objects.requireNonNull(headingDeg, "headingDeg");
        Objects.requireNonNull(stwKn, "stwKn");
    }

    /**
     * A point with a time and a position only.
     *
     * @param time the time (UTC)
     * @param position the position
     * @return the point
     */
    public static TrackPoint of(Instant time, GeoPosition position) {
        OptionalDouble none = OptionalDouble.empty();
        return new TrackPoint(time, position, none, none, none, none);
    }
}
