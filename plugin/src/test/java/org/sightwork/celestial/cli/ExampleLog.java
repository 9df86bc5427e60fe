package org.sightwork.celestial.cli;

import java.time.Duration;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Random;
import org.sightwork.celestial.almanac.Almanac;
import org.sightwork.celestial.almanac.BodyPosition;
import org.sightwork.celestial.reduction.SightReducer;
import org.sightwork.celestial.reduction.SightReduction;
import org.sightwork.celestial.reduction.Sphere;
import org.sightwork.celestial.sight.AltitudeCorrector;
import org.sightwork.celestial.sight.Sight;
import org.sightwork.celestial.time.AstroTime;
import org.sightwork.geo.earth.Angles;
import org.sightwork.geo.earth.GeoPosition;

/**
 * Writes sight logs of an INVENTED passage (the yacht "Petrel", invented): sextant altitudes made
 * from a chosen true track with the corrections applied in reverse, optionally with Gaussian
 * errors. Used by the command-line tests and to write {@code docs/examples/petrel-sights.csv}
 * ({@code main}). Never a check value by itself: the tests compare against the chosen track.
 */
public final class ExampleLog {

    /** One planned sight. */
    record Planned(String body, String limb, Instant utc) {
    }

    private ExampleLog() {
    }

    /**
     * @param start true position at {@code t0}
     * @param t0 start time
     * @param courseDeg true course
     * @param speedKn true speed
     * @param drOffsetNm DR error (north, nm) written into the log
     * @param plan the sights
     * @param errorSigmaArcmin Gaussian error of each Hs (0 for exact sights)
     * @param seed random seed
     * @return the CSV text
     */
    static String csv(GeoPosition start, Instant t0, double courseDeg, double speedKn, double drOffsetNm,
            List<Planned> plan, double errorSigmaArcmin, long seed) {
        Almanac almanac = Almanac.standard();
        SightReducer reducer = new SightReducer(almanac, 0.0);
        Random random = new Random(seed);
        StringBuilder sb = new StringBuilder(
                "utc,body,limb,hs,index_error,eye_height_m,temperature_c,pressure_hpa,dr_lat,dr_lon,course_deg,speed_kn,note\n");
        for (Planned p : plan) {
            double hours = Duration.between(t0, p.utc()).toNanos() / 3.6e12;
            GeoPosition truth = Sphere.rhumb(start, courseDeg, speedKn * hours);
            GeoPosition dr = Sphere.destination(truth, 0.0, drOffsetNm);
            BodyPosition pos = almanac.position(almanac.body(p.body()), AstroTime.ofUtc(p.utc()));
            double hc = SightReduction.reduce(truth, pos.ghaDeg(), pos.decDeg()).hcDeg();
            Sight cond = Sight.builder(p.body(), p.utc(), Math.max(hc, 0.0))
                    .limb(p.limb().isEmpty() ? null : org.sightwork.celestial.sight.Limb.valueOf(p.limb()))
                    .indexError(org.sightwork.celestial.sight.IndexError.onArc(1.2)).eyeHeightM(2.5)
                    .temperatureC(18.0).pressureHpa(1016.0).dr(truth).build();
            // The figures as the reducer would build them at the true position.
            var figures = reducer.reduce(cond, java.util.Optional.of(truth));
            double hs = AltitudeCorrector.hsFor(hc, cond, figuresOf(reducer, cond, truth));
            hs += errorSigmaArcmin * random.nextGaussian() / 60.0;
            sb.append(String.format(Locale.ROOT, "%s,%s,%s,%s,1.2 on,2.5,18,1016,%s,%s,%.0f,%.1f,%s%n", p.utc(), p.body(),
                    p.limb().toLowerCase(Locale.ROOT), errorSigmaArcmin == 0.0 ? String.format(Locale.ROOT, "%.8f", hs)
                            : Angles.formatDm(hs, 2).replace("′", "'"),
                    errorSigmaArcmin == 0.0 ? String.format(Locale.ROOT, "%.6f", dr.latDeg())
                            : Angles.formatLatitude(dr.latDeg()).replace("′", "'"),
                    errorSigmaArcmin == 0.0 ? String.format(Locale.ROOT, "%.6f", dr.lonDeg())
                            : Angles.formatLongitude(dr.lonDeg()).replace("′", "'"),
                    courseDeg, speedKn, "invented example" + (figures.warnings().isEmpty() ? "" : " (low)")));
        }
        return sb.toString();
    }

    /** The body figures the reducer uses, got by reducing a trial sight from the truth. */
    private static org.sightwork.celestial.sight.BodyFigures figuresOf(SightReducer reducer, Sight cond, GeoPosition truth) {
        var r = reducer.reduce(cond, java.util.Optional.of(truth));
        var pos = r.position();
        var f = new org.sightwork.celestial.sight.BodyFigures(pos.hpArcmin().orElse(0.0), pos.sdArcmin().orElse(0.0),
                java.util.OptionalDouble.empty(), java.util.OptionalDouble.empty(), java.util.OptionalDouble.empty(),
                java.util.OptionalDouble.empty()).at(truth.latDeg(), r.computed().znDeg());
        // No phase correction: the plans here hold no Venus or Mars sights.
        return f;
    }

    /** The invented morning twilight of the "Petrel": four stars, then the Sun through the morning. */
    static List<Planned> petrelPlan() {
        Instant twilight = Instant.parse("2025-03-14T09:05:00Z");
        List<Planned> plan = new ArrayList<>();
        plan.add(new Planned("Altair", "", twilight));
        plan.add(new Planned("Arcturus", "", twilight.plusSeconds(240)));
        plan.add(new Planned("Antares", "", twilight.plusSeconds(420)));
        plan.add(new Planned("Deneb", "", twilight.plusSeconds(600)));
        plan.add(new Planned("Sun", "LOWER", Instant.parse("2025-03-14T12:40:00Z")));
        plan.add(new Planned("Sun", "LOWER", Instant.parse("2025-03-14T15:55:00Z")));
        return plan;
    }

    /**
     * Prints the invented example log of the "Petrel".
     *
     * @param args none
     */
    public static void main(String[] args) {
        System.out.print("# INVENTED example: the yacht Petrel (invented), an invented passage west of the Azores.\n"
                + "# Made by plugin/src/test/java/org/sightwork/celestial/cli/ExampleLog.java from an invented true\n"
                + "# track (start 38°30'N 035°00'W, 250° at 6.5 kn from 09:00Z) with 0.7' random errors; DR 3 nm north.\n"
                + csv(GeoPosition.of(38.5, -35.0), Instant.parse("2025-03-14T09:00:00Z"), 250.0, 6.5, 3.0, petrelPlan(),
                        0.7, 14L));
    }
}
