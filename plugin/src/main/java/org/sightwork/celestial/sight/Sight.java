package org.sightwork.celestial.sight;

import java.time.Instant;
import java.util.Locale;
import java.util.Objects;
import java.util.Optional;
import java.util.OptionalDouble;
import org.sightwork.geo.earth.Angles;
import org.sightwork.geo.earth.GeoPosition;

/**
 * A sextant sight as observed and written in the sight book: nothing here is corrected yet.
 *
 * @param body the body's name as the almanac knows it ("Sun", "Moon", "Venus", "Sirius", ...)
 * @param limb the limb observed ({@link Limb#LOWER} by default for the Sun and Moon, else centre)
 * @param watchTime the time read from the watch (UTC as shown by it)
 * @param watchFastSeconds how much the watch is fast (seconds; negative when slow): UTC is
 *     {@code watchTime - watchFastSeconds}
 * @param hsDeg the sextant altitude (degrees; [-1°, 90°], or (0°, 180°) with an artificial
 *     horizon, where the reading is twice the altitude)
 * @param indexError the index error, as a correction
 * @param eyeHeightM the height of eye above the sea (metres, [0, 100])
 * @param temperatureC the air temperature (°C, [-50, 60]; 10 °C when not recorded)
 * @param pressureHpa the air pressure (hPa, [850, 1100]; 1010 hPa when not recorded)
 * @param dr the dead-reckoning position at the time of the sight, if known
 * @param courseDeg the course steered made good from this sight on (degrees true), if known
 * @param speedKn the speed from this sight on (knots), if known
 * @param sigmaArcmin the standard error of this sight (minutes of arc, (0, 60]; default
 *     {@value #DEFAULT_SIGMA_ARCMIN}′)
 * @param artificialHorizon true when taken with an artificial horizon (no dip, reading halved)
 * @param dipShortNm distance to a shore horizon nearer than the sea horizon (nautical miles), if any
 * @param note free text
 */
public record Sight(String body, Limb limb, Instant watchTime, double watchFastSeconds, double hsDeg,
        IndexError indexError, double eyeHeightM, double temperatureC, double pressureHpa,
        Optional<GeoPosition> dr, OptionalDouble courseDeg, OptionalDouble speedKn,
        double sigmaArcmin, boolean artificialHorizon, OptionalDouble dipShortNm, String note) {

    /**
     * Default standard error of one sight (minutes of arc). A good sight at sea is good to about
     * 0.5′-1′ (common practice); we take the upper end so that an error ellipse drawn from the
     * default is not smaller than the truth warrants. Give your own from your record of sights.
     */
    public static final double DEFAULT_SIGMA_ARCMIN = 1.0;
    /** Temperature assumed when none is recorded (°C): the standard atmosphere of the refraction tables. */
    public static final double DEFAULT_TEMPERATURE_C = 10.0;
    /** Pressure assumed when none is recorded (hPa): the standard atmosphere of the refraction tables. */
    public static final double DEFAULT_PRESSURE_HPA = 1010.0;

    /** Checks every field; messages name the quantity, its value and unit, and the range. */
    public Sight {
        Objects.requireNonNull(body, "body");
        Objects.requireNonNull(watchTime, "watchTime");
        Objects.requireNonNull(indexError, "indexError");
        Objects.requireNonNull(dr, "dr");
        Objects.requireNonNull(courseDeg, "courseDeg");
        Objects.requireNonNull(speedKn, "speedKn");
        Objects.requireNonNull(dipShortNm, "dipShortNm");
        note = note == null ? "" : note;
        if (body.isBlank()) {
            throw new SightException("the body is missing");
        }
        if (limb == null) {
            limb = defaultLimb(body);
        }
        if (!Double.isFinite(hsDeg)) {
            throw new SightException("sextant altitude is not a number");
        }
        if (artificialHorizon) {
            if (hsDeg <= 0.0 || hsDeg >= 180.0) {
                throw new SightException("sextant reading " + Angles.formatDm(hsDeg, 2)
                        + " with an artificial horizon must be between 0° and 180° (it is twice the altitude)");
            }
        } else if (hsDeg < -1.0 || hsDeg > 90.0) {
            throw new SightException("sextant altitude " + Angles.formatDm(hsDeg, 2)
                    + " is outside -1° to 90°: check the reading (degrees and minutes)");
        }
        if (!(Math.abs(watchFastSeconds) <= 3600.0)) {
            throw new SightException(String.format(Locale.ROOT,
                    "watch error %.0f s is more than an hour: check the sign and the unit (seconds)", watchFastSeconds));
        }
        if (!(eyeHeightM >= 0.0 && eyeHeightM <= 100.0)) {
            throw new SightException(String.format(Locale.ROOT,
                    "height of eye %.1f m is outside 0 to 100 m (feet: write e.g. 9 ft)", eyeHeightM));
        }
        if (!(temperatureC >= -50.0 && temperatureC <= 60.0)) {
            throw new SightException(String.format(Locale.ROOT,
                    "air temperature %.1f °C is outside -50 to 60 °C", temperatureC));
        }
        if (!(pressureHpa >= 850.0 && pressureHpa <= 1100.0)) {
            throw new SightException(String.format(Locale.ROOT,
                    "air pressure %.1f hPa is outside 850 to 1100 hPa", pressureHpa));
        }
        if (!(sigmaArcmin > 0.0 && sigmaArcmin <= 60.0)) {
            throw new SightException(String.format(Locale.ROOT,
                    "sight standard error %.2f′ is outside (0′, 60′]", sigmaArcmin));
        }
        if (courseDeg.isPresent() && !(courseDeg.getAsDouble() >= 0.0 && courseDeg.getAsDouble() <= 360.0)) {
            throw new SightException(String.format(Locale.ROOT,
                    "course %.1f° is outside 000° to 360°", courseDeg.getAsDouble()));
        }
        if (speedKn.isPresent() && !(speedKn.getAsDouble() >= 0.0 && speedKn.getAsDouble() <= 60.0)) {
            throw new SightException(String.format(Locale.ROOT,
                    "speed %.1f kn is outside 0 to 60 kn", speedKn.getAsDouble()));
        }
        if (dipShortNm.isPresent() && !(dipShortNm.getAsDouble() > 0.0 && dipShortNm.getAsDouble() <= 50.0)) {
            throw new SightException(String.format(Locale.ROOT,
                    "distance to the shore horizon %.2f nm is outside (0, 50] nm", dipShortNm.getAsDouble()));
        }
        if (artificialHorizon && dipShortNm.isPresent()) {
            throw new SightException("a sight with an artificial horizon has no dip: drop the shore-horizon distance");
        }
    }

    /**
     * @param body the body's name
     * @return {@link Limb#LOWER} for the Sun and the Moon, {@link Limb#CENTRE} otherwise
     */
    public static Limb defaultLimb(String body) {
        String b = body.strip().toLowerCase(Locale.ROOT);
        return b.equals("sun") || b.equals("moon") ? Limb.LOWER : Limb.CENTRE;
    }

    /** @return the time of the sight in UTC, the watch error taken out */
    public Instant utc() {
        long nanos = Math.round(watchFastSeconds * 1e9);
        return watchTime.minusNanos(nanos);
    }

    /**
     * A sight with every optional field at its default; change fields with the {@code with}
     * methods or {@link Builder}.
     *
     * @param body the body
     * @param utc the time (UTC, the watch right)
     * @param hsDeg the sextant altitude (degrees)
     * @return the sight
     */
    public static Sight of(String body, Instant utc, double hsDeg) {
        return builder(body, utc, hsDeg).build();
    }

    /**
     * @param body the body
     * @param utc the time (UTC as read from the watch)
     * @param hsDeg the sextant altitude (degrees)
     * @return a builder with the defaults filled in
     */
    public static Builder builder(String body, Instant utc, double hsDeg) {
        return new Builder(body, utc, hsDeg);
    }

    /** @return a builder holding this sight's values */
    public Builder toBuilder() {
        Builder b = new Builder(body, watchTime, hsDeg);
        b.limb = limb;
        b.watchFastSeconds = watchFastSeconds;
        b.indexError = indexError;
        b.eyeHeightM = eyeHeightM;
        b.temperatureC = temperatureC;
        b.pressureHpa = pressureHpa;
        b.dr = dr;
        b.courseDeg = courseDeg;
        b.speedKn = speedKn;
        b.sigmaArcmin = sigmaArcmin;
        b.artificialHorizon = artificialHorizon;
        b.dipShortNm = dipShortNm;
        b.note = note;
        return b;
    }

    /** Builds a {@link Sight}; every setter returns this builder. Not thread-safe. */
    public static final class Builder {
        private final String body;
        private final Instant watchTime;
        private final double hsDeg;
        private Limb limb;
        private double watchFastSeconds;
        private IndexError indexError = IndexError.NONE;
        private double eyeHeightM;
        private double temperatureC = DEFAULT_TEMPERATURE_C;
        private double pressureHpa = DEFAULT_PRESSURE_HPA;
        private Optional<GeoPosition> dr = Optional.empty();
        private OptionalDouble courseDeg = OptionalDouble.empty();
        private OptionalDouble speedKn = OptionalDouble.empty();
        private double sigmaArcmin = DEFAULT_SIGMA_ARCMIN;
        private boolean artificialHorizon;
        private OptionalDouble dipShortNm = OptionalDouble.empty();
        private String note = "";

        private Builder(String body, Instant watchTime, double hsDeg) {
            this.body = body;
            this.watchTime = watchTime;
            this.hsDeg = hsDeg;
        }

        /** @param v limb @return this */
        public Builder limb(Limb v) { limb = v; return this; }
        /** @param v watch fast (seconds, negative slow) @return this */
        public Builder watchFastSeconds(double v) { watchFastSeconds = v; return this; }
        /** @param v index error @return this */
        public Builder indexError(IndexError v) { indexError = v; return this; }
        /** @param v height of eye (metres) @return this */
        public Builder eyeHeightM(double v) { eyeHeightM = v; return this; }
        /** @param v temperature (°C) @return this */
        public Builder temperatureC(double v) { temperatureC = v; return this; }
        /** @param v pressure (hPa) @return this */
        public Builder pressureHpa(double v) { pressureHpa = v; return this; }
        /** @param v DR position @return this */
        public Builder dr(GeoPosition v) { dr = Optional.ofNullable(v); return this; }
        /** @param v course (degrees true) @return this */
        public Builder courseDeg(double v) { courseDeg = OptionalDouble.of(v); return this; }
        /** @param v speed (knots) @return this */
        public Builder speedKn(double v) { speedKn = OptionalDouble.of(v); return this; }
        /** @param v standard error (minutes of arc) @return this */
        public Builder sigmaArcmin(double v) { sigmaArcmin = v; return this; }
        /** @param v artificial horizon @return this */
        public Builder artificialHorizon(boolean v) { artificialHorizon = v; return this; }
        /** @param v distance to a shore horizon (nm) @return this */
        public Builder dipShortNm(double v) { dipShortNm = OptionalDouble.of(v); return this; }
        /** @param v note @return this */
        public Builder note(String v) { note = v; return this; }

        /** @return the sight, checked */
        public Sight build() {
            return new Sight(body, limb, watchTime, watchFastSeconds, hsDeg, indexError, eyeHeightM,
                    temperatureC, pressureHpa, dr, courseDeg, speedKn, sigmaArcmin, artificialHorizon,
                    dipShortNm, note);
        }
    }
}
