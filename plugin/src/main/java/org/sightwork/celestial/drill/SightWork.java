package org.sightwork.celestial.drill;

import java.time.Instant;
import org.sightwork.celestial.almanac.Almanac;
import org.sightwork.celestial.almanac.Body;
import org.sightwork.celestial.almanac.BodyPosition;
import org.sightwork.celestial.reduction.ComputedAltitude;
import org.sightwork.celestial.reduction.SightReduction;
import org.sightwork.celestial.sight.BodyFigures;
import org.sightwork.celestial.sight.Corrections;
import org.sightwork.celestial.time.AstroTime;
import org.sightwork.geo.earth.GeoPosition;

/**
 * The almanac read for one body at one time and one place, as the drill needs it both ways: the
 * figures for the altitude corrections ({@link BodyFigures}: HP, SD, phase of Venus and Mars, the
 * observer's latitude and the azimuth for the Moon's oblate-Earth parallax) and the reduction
 * ({@link SightReduction}: LHA, Hc, Zn). The generator and the key use this one path, so that a
 * sight made by the one is worked by the other with the same numbers.
 *
 * <p>DUT1 is taken as 0 (UT1 = UTC): within 0.9 s, up to 0.23′ of GHA, the same for the generator
 * and the key, so it cancels in the drill; a student with a printed almanac makes the same choice.
 */
final class SightWork {

    /**
     * One body read from the almanac at a time and place.
     *
     * @param position the almanac's apparent place
     * @param computed LHA, Hc, Zn at the place
     * @param figures the correction figures at the place
     * @param sunAltitudeDeg the Sun's geocentric altitude at the place (degrees)
     */
    record Reading(BodyPosition position, ComputedAltitude computed, BodyFigures figures, double sunAltitudeDeg) {
    }

    private SightWork() {
    }

    /**
     * @param almanac the almanac
     * @param body the body
     * @param utc the time (UTC)
     * @param at the place
     * @return the reading
     */
    static Reading read(Almanac almanac, Body body, Instant utc, GeoPosition at) {
        Almanac.Snapshot snap = almanac.at(AstroTime.ofUtc(utc));
        BodyPosition p = snap.position(body);
        ComputedAltitude c = SightReduction.reduce(at, p.ghaDeg(), p.decDeg());
        BodyPosition sun = body.kind() == Body.Kind.SUN ? p : snap.position(Body.SUN);
        ComputedAltitude cs = body.kind() == Body.Kind.SUN ? c : SightReduction.reduce(at, sun.ghaDeg(), sun.decDeg());
        BodyFigures f = body.isStar() ? BodyFigures.STAR
                : BodyFigures.of(p.hpArcmin().orElse(0.0), p.sdArcmin().orElse(0.0)).at(at.latDeg(), c.znDeg());
        if ((body.equals(Body.VENUS) || body.equals(Body.MARS)) && p.illuminatedFraction().isPresent()
                && p.sdArcmin().isPresent()) {
            f = f.withPhase(p.illuminatedFraction().getAsDouble(),
                    Corrections.sunAngleFromVerticalDeg(c.hcDeg(), c.znDeg(), cs.hcDeg(), cs.znDeg()));
        }
        return new Reading(p, c, f, cs.hcDeg());
    }
}
