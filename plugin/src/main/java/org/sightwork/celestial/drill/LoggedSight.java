package org.sightwork.celestial.drill;

import java.time.Instant;
import org.sightwork.celestial.almanac.Body;
import org.sightwork.celestial.sight.Limb;
import org.sightwork.geo.earth.GeoPosition;

/**
 * One generated sight: the truth behind it and what the observer wrote in the sight log.
 *
 * @param number its number in the log (from 1)
 * @param session its session
 * @param body the body
 * @param limb the limb
 * @param trueUtc the true time of the sight
 * @param watchTime the watch time as written (the watch's error and reading step included)
 * @param hsDeg the sextant altitude as written (degrees; index error, random error and reading step included)
 * @param randomErrorArcmin the random error drawn for it (minutes of arc)
 * @param indexReadingArcmin the index error as the observer read it (minutes, + on the arc, to 0.1′)
 * @param truePosition where the vessel was
 * @param dr the DR position as written (to 0.1′)
 * @param courseDeg the logged heading in force (degrees true)
 * @param speedKn the logged speed in force (knots)
 * @param trueHoDeg the exact observed (geocentric) altitude at the true position and time (degrees)
 * @param trueZnDeg the true azimuth there (degrees)
 * @param sunAltitudeDeg the Sun's geocentric altitude there and then (degrees)
 * @param description what the sight is, in a navigator's words ({@code forenoon Sun},
 *     {@code noon Sun (meridian)}, {@code evening stars}; see {@link SightDescription})
 */
public record LoggedSight(int number, String session, Body body, Limb limb, Instant trueUtc, Instant watchTime,
        double hsDeg, double randomErrorArcmin, double indexReadingArcmin, GeoPosition truePosition, GeoPosition dr,
        double courseDeg, double speedKn, double trueHoDeg, double trueZnDeg, double sunAltitudeDeg,
        String description) {
}
