package org.sightwork.celestial.planning;

import java.time.Instant;
import java.util.Objects;
import java.util.Optional;
import java.util.OptionalDouble;
import org.sightwork.celestial.almanac.Almanac;
import org.sightwork.celestial.almanac.Body;
import org.sightwork.celestial.almanac.BodyPosition;
import org.sightwork.celestial.time.AstroTime;
import org.sightwork.geo.earth.GeoPosition;

/**
 * The compass check: the true bearing of a body, by azimuth at any time or by amplitude at its
 * rising or setting, against the compass bearing observed.
 *
 * <p><b>Method:</b> the azimuth is the navigational triangle's ({@link Horizon#fromEquatorial}).
 * The amplitude is the bearing of the body when its centre is on the celestial horizon (true
 * altitude 0°), counted from east when rising and from west when setting, towards north or south;
 * the time is found by {@link DayPlanner#altitudeCrossing} at the moving DR, and the amplitude is
 * read from the azimuth then. At that moment the Sun's centre appears about 34′ above the
 * celestial horizon (refraction), i.e. its lower limb about half a diameter above the visible
 * horizon plus the dip (common practice, from memory). The handbook formula
 * {@code sin A = sin Dec / cos Lat} (from memory) is the same triangle at altitude 0 and is used to
 * check it. Compass error = true − compass, east when the true bearing is the larger (common
 * practice: "compass least, error east"); deviation = compass error − variation (east positive).
 *
 * <p><b>Accuracy:</b> the almanac's 0.1′ and the DR's error; the compass reading dominates.
 *
 * <p><b>Limits:</b> no amplitude where the body does not rise or set that day.
 *
 * <p><b>Thread safety:</b> immutable; safe to share if the almanac is.
 */
public final class CompassCheck {

    private final Almanac almanac;
    private final DayPlanner planner;

    /**
     * A compass check on an almanac.
     *
     * @param almanac the almanac
     */
    public CompassCheck(Almanac almanac) {
        this.almanac = Objects.requireNonNull(almanac, "almanac");
        this.planner = new DayPlanner(almanac);
    }

    /**
     * A compass bearing compared with the true one.
     *
     * @param bearingDeg the compass bearing observed (degrees compass)
     * @param compassErrorDeg true − compass (degrees, east positive, [-180°, 180°))
     * @param variationDeg the local variation given by the user (degrees, east positive), if any
     * @param deviationDeg compass error − variation (degrees, east positive), if variation is given
     */
    public record Reading(double bearingDeg, double compassErrorDeg, OptionalDouble variationDeg,
            OptionalDouble deviationDeg) {

        /**
         * Compares a compass bearing with the true one.
         *
         * @param trueDeg the true bearing (degrees)
         * @param compassDeg the compass bearing (degrees)
         * @param variationDeg the variation (degrees, east positive), if known
         * @return the reading
         */
        public static Reading of(double trueDeg, double compassDeg, OptionalDouble variationDeg) {
            if (!(compassDeg >= 0.0 && compassDeg <= 360.0)) {
                throw new IllegalArgumentException("compass bearing " + compassDeg + "° is outside [0°, 360°]");
            }
            double ce = Horizon.norm180(trueDeg - compassDeg);
            OptionalDouble dev = OptionalDouble.empty();
            if (variationDeg.isPresent()) {
                double v = variationDeg.getAsDouble();
                if (!(v >= -180.0 && v <= 180.0)) {
                    throw new IllegalArgumentException("variation " + v + "° is outside [-180°, 180°]");
                }
                dev = OptionalDouble.of(Horizon.norm180(ce - v));
            }
            return new Reading(compassDeg, ce, variationDeg, dev);
        }
    }

    /**
     * The check by azimuth.
     *
     * @param body the body observed
     * @param timeUtc time of the bearing
     * @param dr the DR
     * @param altitudeDeg the body's computed altitude (degrees)
     * @param trueAzimuthDeg its true azimuth (degrees)
     * @param reading the compass comparison, when a bearing was given
     */
    public record AzimuthCheck(Body body, Instant timeUtc, GeoPosition dr, double altitudeDeg, double trueAzimuthDeg,
            Optional<Reading> reading) {
    }

    /**
     * The check by amplitude.
     *
     * @param body the body observed
     * @param timeUtc when its centre is on the celestial horizon
     * @param dr the DR then
     * @param decDeg its declination then (degrees)
     * @param amplitudeDeg the amplitude, north positive (degrees, [-90°, 90°])
     * @param rising true for the rising amplitude (counted from east), false for setting (from west)
     * @param trueAzimuthDeg the true bearing then (degrees)
     * @param reading the compass comparison, when a bearing was given
     */
    public record AmplitudeCheck(Body body, Instant timeUtc, GeoPosition dr, double decDeg, double amplitudeDeg,
            boolean rising, double trueAzimuthDeg, Optional<Reading> reading) {

        /** @return the amplitude as a navigator writes it, e.g. {@code E 12.3° N} */
        public String text() {
            String from = rising ? "E" : "W";
            String to = amplitudeDeg >= 0 ? "N" : "S";
            return String.format(java.util.Locale.ROOT, "%s %.1f° %s", from, Math.abs(amplitudeDeg), to);
        }
    }

    /**
     * The true azimuth of a body, and the compass error if a bearing is given.
     *
     * @param body the body
     * @param t the time of the bearing
     * @param dr the DR
     * @param compassBearingDeg the compass bearing, if taken (degrees)
     * @param variationDeg the local variation, if known (degrees, east positive)
     * @return the check
     */
    public AzimuthCheck byAzimuth(Body body, Instant t, GeoPosition dr, OptionalDouble compassBearingDeg,
            OptionalDouble variationDeg) {
        BodyPosition p = almanac.position(body, AstroTime.ofUtc(t));
        HorizonPoint h = Horizon.fromEquatorial(p.ghaDeg(), p.decDeg(), dr);
        Optional<Reading> r = compassBearingDeg.isPresent()
                ? Optional.of(Reading.of(h.azimuthDeg(), compassBearingDeg.getAsDouble(), variationDeg))
                : Optional.empty();
        return new AzimuthCheck(body, t, dr, h.altitudeDeg(), h.azimuthDeg(), r);
    }

    /**
     * The amplitude of a body at its rising or setting in a day, and the compass error if a bearing
     * is given.
     *
     * @param body the body
     * @param track the ship's track
     * @param day the day
     * @param rising true for the rising, false for the setting
     * @param compassBearingDeg the compass bearing, if taken (degrees)
     * @param variationDeg the local variation, if known (degrees, east positive)
     * @return the check, empty if the body does not rise (or set) in the day
     */
    public Optional<AmplitudeCheck> byAmplitude(Body body, ShipTrack track, DayWindow day, boolean rising,
            OptionalDouble compassBearingDeg, OptionalDouble variationDeg) {
        Optional<Instant> when = planner.altitudeCrossing(body, track, day, 0.0, rising);
        if (when.isEmpty()) {
            return Optional.empty();
        }
        Instant t = when.get();
        GeoPosition dr = track.positionAt(t);
        BodyPosition p = almanac.position(body, AstroTime.ofUtc(t));
        HorizonPoint h = Horizon.fromEquatorial(p.ghaDeg(), p.decDeg(), dr);
        double amp = rising ? 90.0 - h.azimuthDeg() : h.azimuthDeg() - 270.0;
        Optional<Reading> r = compassBearingDeg.isPresent()
                ? Optional.of(Reading.of(h.azimuthDeg(), compassBearingDeg.getAsDouble(), variationDeg))
                : Optional.empty();
        return Optional.of(new AmplitudeCheck(body, t, dr, p.decDeg(), Horizon.norm180(amp), rising, h.azimuthDeg(), r));
    }
}
