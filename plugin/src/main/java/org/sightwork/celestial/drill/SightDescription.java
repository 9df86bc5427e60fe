package org.sightwork.celestial.drill;

import org.sightwork.celestial.almanac.Body;

/**
 * What a sight is, in a navigator's words, for the note of a generated sight log: {@code forenoon
 * Sun}, {@code noon Sun (meridian)}, {@code afternoon Sun}, {@code morning stars}, {@code evening
 * stars}, {@code forenoon Moon}, {@code evening Moon}. It says what the observer took, not which fix
 * the drill groups the sight into (a forenoon Sun sight belongs to the noon running fix, and a note
 * naming the noon read wrong on a sight taken three hours before it).
 *
 * <p><b>Method:</b> from the Sun's local hour angle at the vessel (east of the meridian, LHA in
 * (180°, 360°): before local apparent noon) and its altitude (above the horizon: a day sight).
 * Stars and planets in twilight are "stars", as navigators call the twilight round; a planet or the
 * Moon by day is named. Deterministic: a function of the time and place only.
 */
final class SightDescription {

    /**
     * A Sun sight within this hour angle of the meridian is the meridian (noon) sight (degrees):
     * 0.25° = one minute of time, our own choice; the generator's noon sights are at the transit.
     */
    static final double MERIDIAN_LHA_DEG = 0.25;

    private SightDescription() {
    }

    /**
     * @param body the body observed
     * @param sunLhaDeg the Sun's local hour angle at the vessel (degrees, any range)
     * @param sunAltitudeDeg the Sun's altitude there (degrees)
     * @return the description
     */
    static String of(Body body, double sunLhaDeg, double sunAltitudeDeg) {
        double lha = ((sunLhaDeg % 360.0) + 360.0) % 360.0;
        boolean beforeNoon = lha > 180.0;
        if (body.kind() == Body.Kind.SUN) {
            if (Math.min(lha, 360.0 - lha) <= MERIDIAN_LHA_DEG) {
                return "noon Sun (meridian)";
            }
            return beforeNoon ? "forenoon Sun" : "afternoon Sun";
        }
        if (sunAltitudeDeg > 0.0) {
            return (beforeNoon ? "forenoon " : "afternoon ") + body.name();
        }
        String part = beforeNoon ? "morning " : "evening ";
        return part + (body.kind() == Body.Kind.MOON ? "Moon" : "stars");
    }
}
