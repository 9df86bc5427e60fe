package org.sightwork.celestial.reduction;

import java.time.Instant;

/**
 * A body's Greenwich hour angle and declination as functions of time (the almanac, or a table).
 * Implementations must be thread-safe if shared.
 */
@FunctionalInterface
public interface GhaDecSource {

    /**
     * @param utc the instant (UTC)
     * @return GHA and Dec at that instant
     */
    GhaDec at(Instant utc);

    /**
     * @param ghaDeg Greenwich hour angle (degrees, [0°, 360°))
     * @param decDeg declination (degrees)
     */
    record GhaDec(double ghaDeg, double decDeg) {
    }
}
