package org.sightwork.celestial.drill;

import java.time.Instant;
import java.util.List;
import java.util.Locale;
import org.sightwork.celestial.sight.Limb;
import org.sightwork.geo.earth.Angles;

/**
 * The generated sight log as CSV, in the columns of the project's sight log format
 * ({@code utc, body, limb, hs, index_error, eye_height_m, temperature_c, pressure_hpa, dr_lat,
 * dr_lon, course_deg, speed_kn, sigma_arcmin, note}), as the observer would write it: the watch
 * time in the {@code utc} column (the exercise sheet states the watch error to apply), Hs in
 * d°m.m′ to 0.1′, the index error as read ("2.0 on", "1.5 off"), the DR from the deck log.
 */
public final class SightLogCsv {

    /** The header line. */
    public static final String HEADER = "utc,body,limb,hs,index_error,eye_height_m,temperature_c,pressure_hpa,"
            + "dr_lat,dr_lon,course_deg,speed_kn,sigma_arcmin,note";

    private SightLogCsv() {
    }

    /**
     * @param sights the sights in the log's order
     * @param profile the observer profile
     * @param indexErrorGiven whether the index error is written (else the column is empty)
     * @return the CSV text, LF line ends
     */
    public static String csv(List<LoggedSight> sights, ObserverProfile profile, boolean indexErrorGiven) {
        StringBuilder b = new StringBuilder(HEADER).append('\n');
        for (LoggedSight s : sights) {
            b.append(time(s.watchTime())).append(',')
                    .append(s.body().name()).append(',')
                    .append(s.limb() == Limb.CENTRE ? "" : s.limb().name().toLowerCase(Locale.ROOT)).append(',')
                    .append(altitude(s.hsDeg())).append(',')
                    .append(indexErrorGiven ? indexError(s.indexReadingArcmin()) : "").append(',')
                    .append(String.format(Locale.ROOT, "%.1f,%.1f,%.1f,", profile.eyeHeightM(), profile.temperatureC(),
                            profile.pressureHpa()))
                    .append(Angles.formatLatitude(s.dr().latDeg())).append(',')
                    .append(Angles.formatLongitude(s.dr().lonDeg())).append(',')
                    .append(String.format(Locale.ROOT, "%03.0f,%.1f,", s.courseDeg(), s.speedKn()))
                    .append(profile.sextantSigmaArcmin() > 0
                            ? String.format(Locale.ROOT, "%.1f", profile.sextantSigmaArcmin()) : "").append(',')
                    .append(quote("sight " + s.number() + "; " + s.description() + "; fix " + s.session())).append('\n');
        }
        return b.toString();
    }

    /**
     * @param t a time
     * @return ISO 8601 UTC, whole seconds when the time has no fraction
     */
    public static String time(Instant t) {
        return t.toString();
    }

    /**
     * An altitude as written: d°m.m′ to 0.1′ when it is a whole tenth, else to 1e-6′ (a perfect
     * observer's unrounded reading, for checks).
     *
     * @param deg the altitude (degrees)
     * @return the text
     */
    public static String altitude(double deg) {
        double tenths = deg * 600.0;
        if (Math.abs(tenths - Math.rint(tenths)) < 1e-6) {
            return Angles.formatDm(deg, 2);
        }
        double a = Math.abs(deg);
        long micro = Math.round(a * 60e6);
        long d = micro / 60_000_000L;
        double m = (micro % 60_000_000L) / 1e6;
        return String.format(Locale.ROOT, "%s%02d°%09.6f′", deg < 0 ? "-" : "", d, m);
    }

    /**
     * @param readingArcmin the index reading (minutes, + on the arc)
     * @return e.g. "2.0 on", "1.5 off", "0.0"
     */
    public static String indexError(double readingArcmin) {
        if (Math.round(readingArcmin * 10.0) == 0) {
            return "0.0";
        }
        return String.format(Locale.ROOT, "%.1f %s", Math.abs(readingArcmin), readingArcmin > 0 ? "on" : "off");
    }

    private static String quote(String s) {
        return s.contains(",") || s.contains("\"") ? "\"" + s.replace("\"", "\"\"") + "\"" : s;
    }
}
