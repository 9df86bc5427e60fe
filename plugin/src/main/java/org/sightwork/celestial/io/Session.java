package org.sightwork.celestial.io;

import java.util.List;
import java.util.Map;

/**
 * A passage's session: what the navigator has entered and worked, saved as JSON by
 * {@link SessionFile} (format in {@code docs/SESSION-FORMAT.md}). Plain values only (strings for
 * times in ISO 8601 UTC, decimal degrees, nautical miles, knots), so the file is readable by any
 * JSON tool.
 *
 * @param formatVersion the format's version ({@link SessionFile#FORMAT_VERSION} when written)
 * @param name the passage's name
 * @param sights the sights, as in the sight log
 * @param drLegs the DR log: legs of course and speed
 * @param gpsTrack path of a GPS track file (GPX or NMEA 0183), relative to the session file, or null
 * @param fixes the fixes worked
 * @param settings free settings (e.g. "windowMin" → "30", "drErrorFraction" → "0.05")
 */
public record Session(int formatVersion, String name, List<SessionSight> sights, List<DrLeg> drLegs, String gpsTrack,
        List<SessionFix> fixes, Map<String, String> settings) {

    /** Copies the lists and the settings (sorted by key), empty for null. */
    public Session {
        sights = sights == null ? List.of() : List.copyOf(sights);
        drLegs = drLegs == null ? List.of() : List.copyOf(drLegs);
        fixes = fixes == null ? List.of() : List.copyOf(fixes);
        // Sorted by key, so that a file is written in the same order in every run (Map.copyOf's
        // iteration order changes from one JVM run to the next); copyOf still rejects nulls.
        settings = settings == null ? Map.of()
                : java.util.Collections.unmodifiableSortedMap(new java.util.TreeMap<>(Map.copyOf(settings)));
        name = name == null ? "" : name;
    }

    /**
     * A sight as entered.
     *
     * @param utc time (ISO 8601 UTC)
     * @param body body
     * @param limb LOWER, UPPER or CENTRE
     * @param hsDeg sextant altitude (degrees)
     * @param indexErrorArcmin index correction (minutes, as added to Hs: on the arc negative)
     * @param eyeHeightM height of eye (metres)
     * @param temperatureC temperature (°C)
     * @param pressureHpa pressure (hPa)
     * @param drLatDeg DR latitude (degrees) or null
     * @param drLonDeg DR longitude (degrees) or null
     * @param sigmaArcmin standard error (minutes)
     * @param note note
     */
    public record SessionSight(String utc, String body, String limb, double hsDeg, double indexErrorArcmin,
            double eyeHeightM, double temperatureC, double pressureHpa, Double drLatDeg, Double drLonDeg,
            double sigmaArcmin, String note) {

        /**
         * @param s a sight (its UTC with the watch error taken out; course, speed, horizon and
         *     shore distance are not kept here: the DR log and the settings hold them)
         * @return the sight as stored
         */
        public static SessionSight of(org.sightwork.celestial.sight.Sight s) {
            return new SessionSight(s.utc().toString(), s.body(), s.limb().name(), s.hsDeg(),
                    s.indexError().correctionArcmin(), s.eyeHeightM(), s.temperatureC(), s.pressureHpa(),
                    s.dr().map(p -> p.latDeg()).orElse(null), s.dr().map(p -> p.lonDeg()).orElse(null),
                    s.sigmaArcmin(), s.note());
        }

        /**
         * @return the sight, checked as any sight is
         * @throws IllegalArgumentException if a value is out of range
         */
        public org.sightwork.celestial.sight.Sight toSight() {
            var b = org.sightwork.celestial.sight.Sight.builder(body, java.time.Instant.parse(utc), hsDeg)
                    .limb(limb == null ? null : org.sightwork.celestial.sight.Limb.valueOf(limb))
                    .indexError(new org.sightwork.celestial.sight.IndexError(indexErrorArcmin)).eyeHeightM(eyeHeightM)
                    .temperatureC(temperatureC).pressureHpa(pressureHpa).sigmaArcmin(sigmaArcmin).note(note);
            if (drLatDeg != null && drLonDeg != null) {
                b.dr(org.sightwork.geo.earth.GeoPosition.of(drLatDeg, drLonDeg));
            }
            return b.build();
        }
    }

    /**
     * A DR leg.
     *
     * @param start start (ISO 8601 UTC)
     * @param courseDeg course (degrees true)
     * @param speedKn speed (knots)
     */
    public record DrLeg(String start, double courseDeg, double speedKn) {
    }

    /**
     * A fix as worked.
     *
     * @param utc time (ISO 8601 UTC)
     * @param latDeg latitude (degrees)
     * @param lonDeg longitude (degrees)
     * @param majorNm 95 % ellipse semi-major axis (nm)
     * @param minorNm semi-minor axis (nm)
     * @param orientationDeg major axis direction (degrees true)
     * @param bodies the bodies used
     */
    public record SessionFix(String utc, double latDeg, double lonDeg, double majorNm, double minorNm,
            double orientationDeg, List<String> bodies) {
    }
}
