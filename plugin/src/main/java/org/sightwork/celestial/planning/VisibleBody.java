package org.sightwork.celestial.planning;

import java.util.Objects;
import java.util.Optional;
import org.sightwork.celestial.almanac.Body;

/**
 * A body above the horizon at the planned time, with what the navigator pre-sets.
 *
 * @param body the body
 * @param hcDeg computed altitude, geocentric, centre (degrees)
 * @param znDeg azimuth true (degrees, [0°, 360°))
 * @param magnitude visual magnitude (smaller is brighter)
 * @param presetHsDeg the sextant reading to pre-set: Hc less parallax, plus mean refraction and dip
 *     (degrees; no index error)
 * @param excludedBecause why the body is not proposed for the set, empty if it may be
 */
public record VisibleBody(Body body, double hcDeg, double znDeg, double magnitude, double presetHsDeg,
        Optional<String> excludedBecause) {

    /** Checks for nulls and ranges. */
    public VisibleBody {
        Objects.requireNonNull(body, "body");
        Objects.requireNonNull(excludedBecause, "excludedBecause");
        if (!(znDeg >= 0.0 && znDeg < 360.0)) {
            throw new IllegalArgumentException("azimuth " + znDeg + "° is outside [0°, 360°)");
        }
    }

    /** @return true if the body may be proposed for the set */
    public boolean eligible() {
        return excludedBecause.isEmpty();
    }
}
