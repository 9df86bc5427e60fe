package org.sightwork.celestial.drill;

import org.sightwork.celestial.sight.Limb;
import java.time.Instant;
import java.util.List;
import java.util.Optional;

/**
 * The answer key of a drill: what a careful navigator gets from the student pack, and the truth.
 * Written as JSON ({@link AnswerKeyIo}) beside the student pack; the grader needs nothing else.
 *
 * @param formatVersion the key's format version ({@value #FORMAT_VERSION})
 * @param title the drill's title
 * @param invented whether the scenario is invented
 * @param seed the seed the pack was made with
 * @param tolerances the grading tolerances used to tell a mistake from noise
 * @param sights every sight, in the order of the sight log
 * @param fixes every fix asked for
 */
public record AnswerKey(int formatVersion, String title, boolean invented, long seed, Tolerances tolerances,
        List<SightKey> sights, List<FixKey> fixes) {

    /** The key's format version. */
    public static final int FORMAT_VERSION = 1;

    /** Copies the lists. */
    public AnswerKey {
        sights = List.copyOf(sights);
        fixes = List.copyOf(fixes);
    }

    /**
     * A position in a key.
     *
     * @param latDeg latitude (degrees, north positive)
     * @param lonDeg longitude (degrees, east positive)
     */
    public record Position(double latDeg, double lonDeg) {
    }

    /**
     * The corrections from Hs to Ho of one sight, as a careful navigator applies them (minutes of
     * arc, signed as applied: Ho = Hs + sum).
     *
     * @param indexArcmin index correction
     * @param dipArcmin dip (negative)
     * @param refractionArcmin refraction (negative)
     * @param semiDiameterArcmin semi-diameter (+ lower limb, − upper limb, 0 stars)
     * @param parallaxArcmin parallax in altitude (positive)
     * @param phaseArcmin phase correction of Venus or Mars (0 otherwise)
     */
    public record Corrections(double indexArcmin, double dipArcmin, double refractionArcmin,
            double semiDiameterArcmin, double parallaxArcmin, double phaseArcmin) {
    }

    /**
     * The result of working a sight with one mistake.
     *
     * @param mistake the mistake
     * @param hoDeg the Ho it gives (degrees)
     * @param hcDeg the Hc it gives (degrees)
     * @param znDeg the Zn it gives (degrees)
     * @param interceptNm the intercept it gives (nm, + toward)
     */
    public record MistakeResult(Mistake mistake, double hoDeg, double hcDeg, double znDeg, double interceptNm) {
    }

    /**
     * One sight: as written in the log, as worked correctly, the truth, and as worked with each
     * common mistake.
     *
     * @param number the sight's number in the log (from 1)
     * @param session its session
     * @param body the body's name
     * @param limb the limb
     * @param trueUtc the true time of the sight
     * @param loggedTime the time written in the log (watch time)
     * @param utcAsWorked the UTC a careful student works with (watch time less the given watch error)
     * @param hsText the sextant altitude as written
     * @param hsDeg the sextant altitude (degrees)
     * @param randomErrorArcmin the observer's random error drawn for it (minutes of arc)
     * @param truePosition where the vessel truly was
     * @param drPosition the DR position written in the log (the student's assumed position)
     * @param trueHoDeg the exact observed altitude at the true position and time (degrees)
     * @param corrections the corrections as applied
     * @param hoDeg the correct Ho (degrees)
     * @param ghaDeg GHA at the time as worked (degrees)
     * @param decDeg declination (degrees)
     * @param lhaDeg LHA from the DR (degrees)
     * @param hcDeg Hc at the DR (degrees)
     * @param znDeg Zn at the DR (degrees true)
     * @param interceptNm Ho − Hc (nm, + toward)
     * @param mistakes the sight worked with each common mistake that applies to it
     */
    public record SightKey(int number, String session, String body, Limb limb, Instant trueUtc, String loggedTime,
            Instant utcAsWorked, String hsText, double hsDeg, double randomErrorArcmin, Position truePosition,
            Position drPosition, double trueHoDeg, Corrections corrections, double hoDeg, double ghaDeg,
            double decDeg, double lhaDeg, double hcDeg, double znDeg, double interceptNm,
            List<MistakeResult> mistakes) {
        /** Copies the list. */
        public SightKey {
            mistakes = List.copyOf(mistakes);
        }

        /**
         * @param m a mistake
         * @return the sight worked with it, if it applies
         */
        public Optional<MistakeResult> with(Mistake m) {
            return mistakes.stream().filter(r -> r.mistake() == m).findFirst();
        }
    }

    /**
     * One fix: from the correct sights, and the truth.
     *
     * @param session the session
     * @param utc the time of the fix
     * @param sightNumbers the sights it is made from
     * @param fix the fix from the correctly worked sights (the best the student can do)
     * @param truth the true position at that time
     * @param dr the DR position at that time
     * @param fixErrorNm distance from the key's fix to the truth (nm): the drill's own noise
     * @param method how the key's fix was made (e.g. "least squares, 3 LOPs, advanced to the fix time")
     */
    public record FixKey(String session, Instant utc, List<Integer> sightNumbers, Position fix, Position truth,
            Position dr, double fixErrorNm, String method) {
        /** Copies the list. */
        public FixKey {
            sightNumbers = List.copyOf(sightNumbers);
        }
    }

    /**
     * The tolerances that tell a right answer, or a recognised mistake, from noise.
     *
     * @param hoArcmin a student's Ho within this of a value counts as that value (minutes of arc)
     * @param interceptNm a student's intercept within this of a value counts as that value (nm)
     * @param fixFullMarksNm a fix within this of the key's fix earns full marks (nm)
     * @param fixHalfMarksNm ... half marks (nm)
     * @param fixQuarterMarksNm ... a quarter (nm)
     * @param fixMatchMinutes a student's fix is matched to the key's fix of the nearest time within this
     */
    public record Tolerances(double hoArcmin, double interceptNm, double fixFullMarksNm, double fixHalfMarksNm,
            double fixQuarterMarksNm, double fixMatchMinutes) {

        /**
         * The documented defaults (docs/DRILLS.md): Ho 0.3′ — a student with a printed almanac and
         * correction tables, each read to 0.1′, and a rounding at each of up to five steps, can be
         * 0.25′ off the exact value (common practice); intercept 0.5 nm — the Hc from tables adds
         * up to 0.2′ (common practice); fix marks at 1, 3 and 5 nm; fixes matched within 30 min.
         */
        public static final Tolerances STANDARD = new Tolerances(0.3, 0.5, 1.0, 3.0, 5.0, 30.0);
    }
}
