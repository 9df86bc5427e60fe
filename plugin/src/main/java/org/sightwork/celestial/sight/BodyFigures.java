package org.sightwork.celestial.sight;

import java.util.OptionalDouble;

/**
 * The almanac's figures for a body at the time of a sight that the corrections need, plus the
 * observer's latitude and the body's azimuth (for the oblate-Earth parallax of the Moon).
 *
 * @param hpArcmin equatorial horizontal parallax (minutes of arc; 0 for stars)
 * @param sdArcmin geocentric semi-diameter (minutes of arc; 0 when not needed)
 * @param illuminatedFraction Venus and Mars: the illuminated fraction, for the phase correction
 * @param sunAngleFromVerticalDeg Venus and Mars: the angle at the planet between the zenith and
 *     the Sun (degrees, see {@link Corrections#sunAngleFromVerticalDeg})
 * @param latDeg the observer's latitude (degrees), when known: used with {@code znDeg}
 * @param znDeg the body's azimuth from the observer (degrees true), when known
 */
public record BodyFigures(double hpArcmin, double sdArcmin, OptionalDouble illuminatedFraction,
        OptionalDouble sunAngleFromVerticalDeg, OptionalDouble latDeg, OptionalDouble znDeg) {

    /** A star: no parallax, no semi-diameter. */
    public static final BodyFigures STAR = new BodyFigures(0.0, 0.0, OptionalDouble.empty(),
            OptionalDouble.empty(), OptionalDouble.empty(), OptionalDouble.empty());

    /** Checks the ranges. */
    public BodyFigures {
        if (!(hpArcmin >= 0.0 && hpArcmin < 120.0)) {
            throw new IllegalArgumentException("horizontal parallax " + hpArcmin + "′ is outside [0′, 120′)");
        }
        if (!(sdArcmin >= 0.0 && sdArcmin < 60.0)) {
            throw new IllegalArgumentException("semi-diameter " + sdArcmin + "′ is outside [0′, 60′)");
        }
    }

    /**
     * @param hpArcmin horizontal parallax (minutes)
     * @param sdArcmin semi-diameter (minutes)
     * @return figures for a spherical-Earth parallax, no phase
     */
    public static BodyFigures of(double hpArcmin, double sdArcmin) {
        return new BodyFigures(hpArcmin, sdArcmin, OptionalDouble.empty(), OptionalDouble.empty(),
                OptionalDouble.empty(), OptionalDouble.empty());
    }

    /**
     * @param latDeg observer's latitude (degrees)
     * @param znDeg body's azimuth (degrees true)
     * @return these figures with the observer's latitude and the azimuth (oblate Earth)
     */
    public BodyFigures at(double latDeg, double znDeg) {
        return new BodyFigures(hpArcmin, sdArcmin, illuminatedFraction, sunAngleFromVerticalDeg,
                OptionalDouble.of(latDeg), OptionalDouble.of(znDeg));
    }

    /**
     * @param fraction illuminated fraction [0, 1]
     * @param sunAngleDeg angle at the planet between zenith and Sun (degrees)
     * @return these figures with a phase correction
     */
    public BodyFigures withPhase(double fraction, double sunAngleDeg) {
        return new BodyFigures(hpArcmin, sdArcmin, OptionalDouble.of(fraction), OptionalDouble.of(sunAngleDeg),
                latDeg, znDeg);
    }
}
