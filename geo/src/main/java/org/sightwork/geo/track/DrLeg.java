package org.sightwork.geo.track;

import java.time.Instant;
import java.util.Objects;

/**
 * One leg of dead reckoning: from its start time until the next leg starts, the vessel steers a
 * heading at a speed through the water, and makes leeway.
 *
 * @param start when the leg begins (UTC)
 * @param headingDeg heading steered (degrees true, [0°, 360°))
 * @param stwKn speed through the water by log (knots, ≥ 0)
 * @param leewayDeg leeway (degrees, positive when the wind sets the vessel to starboard of her
 *        heading, i.e. wind on the port side; the water track is heading + leeway)
 */
public record DrLeg(Instant start, double headingDeg, double stwKn, double leewayDeg) {

    /** Checks the ranges. */
    public DrLeg {
        Objects.requireNonNull(start, "start");
        if (!(headingDeg >= 0 && headingDeg < 360)) {
            throw new IllegalArgumentException("heading " + headingDeg + "° is outside [0°, 360°)");
        }
        if (!(stwKn >= 0 && stwKn < 100)) {
            throw new IllegalArgumentException("speed " + stwKn + " kn is outside [0, 100) kn");
        }
        if (!(Math.abs(leewayDeg) <= 45)) {
            throw new IllegalArgumentException("leeway " + leewayDeg + "° is outside [-45°, 45°]");
        }
    }

    /** @return the course through the water, heading + leeway (degrees true, [0°, 360°)) */
    public double waterTrackDeg() {
        double c = (headingDeg + leewayDeg) % 360.0;
        return c < 0 ? c + 360.0 : c;
    }
}
