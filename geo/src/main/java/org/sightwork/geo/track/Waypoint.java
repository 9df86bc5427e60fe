package org.sightwork.geo.track;

import java.time.Instant;
import java.util.Objects;
import java.util.Optional;
import org.sightwork.geo.earth.GeoPosition;

/**
 * A named position, as in a GPX {@code wpt}.
 *
 * @param name the name (may be empty)
 * @param position the position
 * @param time the time, if the file gave one
 */
public record Waypoint(String name, GeoPosition position, Optional<Instant> time) {

    /** Checks that nothing is null. */
    public Waypoint {
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(position, "position");
        Objects.requireNonNull(time, "time");
    }
}
