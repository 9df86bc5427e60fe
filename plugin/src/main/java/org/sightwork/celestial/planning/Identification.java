package org.sightwork.celestial.planning;

import java.time.Instant;
import java.util.Objects;
import java.util.Optional;
import org.sightwork.celestial.almanac.Body;
import org.sightwork.geo.earth.GeoPosition;

/**
 * What an unknown body probably was.
 *
 * @param timeUtc the time of the observation
 * @param dr the DR
 * @param observedAltDeg the observed altitude used, above the celestial horizon (degrees)
 * @param azimuthDeg the rough azimuth (degrees true)
 * @param decDeg the declination of the observed point (degrees)
 * @param ghaDeg its Greenwich hour angle (degrees, [0°, 360°))
 * @param shaDeg its sidereal hour angle, GHA less GHA Aries (degrees, [0°, 360°))
 * @param best the nearest body
 * @param runnerUp the next nearest, if there is one
 */
public record Identification(Instant timeUtc, GeoPosition dr, double observedAltDeg, double azimuthDeg,
        double decDeg, double ghaDeg, double shaDeg, Match best, Optional<Match> runnerUp) {

    /** Checks for nulls. */
    public Identification {
        Objects.requireNonNull(best, "best");
        Objects.requireNonNull(runnerUp, "runnerUp");
    }

    /**
     * A candidate body and how far it lies from the observed point.
     *
     * @param body the body
     * @param missDeg angular distance between the body and the observed point (degrees)
     * @param hcDeg the body's computed altitude at the DR (degrees)
     * @param znDeg its azimuth (degrees true)
     * @param magnitude its visual magnitude
     */
    public record Match(Body body, double missDeg, double hcDeg, double znDeg, double magnitude) {
    }
}
