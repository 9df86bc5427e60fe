package org.sightwork.celestial.sight;

import java.util.List;

/**
 * The corrections of one sight from Hs to Ho, each step kept, each correction with the sign in
 * which it was added (minutes of arc).
 *
 * <p>Order: Hs, + index error, (artificial horizon: halve), + dip = Ha (apparent altitude),
 * + refraction, + semi-diameter (augmented; + lower limb, - upper limb), + phase (Venus, Mars),
 * + parallax in altitude = Ho.
 *
 * @param sight the sight as observed
 * @param horizon the horizon used
 * @param hsDeg sextant altitude (degrees; the reading, twice the altitude with an artificial horizon)
 * @param indexArcmin index correction (minutes)
 * @param dipArcmin dip (minutes, ≤ 0; 0 with an artificial horizon)
 * @param haDeg apparent altitude of the observed limb or centre (degrees)
 * @param refractionArcmin refraction (minutes, ≤ 0)
 * @param semiDiameterArcmin augmented semi-diameter as applied (minutes; + lower, - upper, 0 centre)
 * @param phaseArcmin phase correction of Venus or Mars (minutes; 0 otherwise)
 * @param parallaxArcmin parallax in altitude (minutes, ≥ 0)
 * @param hoDeg observed altitude Ho of the body's centre, geocentric, above the geodetic horizon (degrees)
 * @param warnings plain-language warnings (low altitude, ...)
 */
public record Worksheet(Sight sight, HorizonKind horizon, double hsDeg, double indexArcmin, double dipArcmin,
        double haDeg, double refractionArcmin, double semiDiameterArcmin, double phaseArcmin,
        double parallaxArcmin, double hoDeg, List<String> warnings) {

    /** Copies the warnings. */
    public Worksheet {
        warnings = List.copyOf(warnings);
    }

    /** @return the total correction Ho - Hs (minutes; for an artificial horizon Ho - Hs/2) */
    public double totalCorrectionArcmin() {
        double hs = horizon == HorizonKind.ARTIFICIAL ? hsDeg / 2.0 : hsDeg;
        return (hoDeg - hs) * 60.0;
    }
}
