package org.sightwork.celestial.cli;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.Locale;
import java.util.concurrent.Callable;
import org.sightwork.celestial.io.LogProblem;
import org.sightwork.celestial.reduction.GhaDecSource;
import org.sightwork.celestial.reduction.LocalApparentNoon;
import org.sightwork.celestial.reduction.MeridianAltitude;
import org.sightwork.celestial.reduction.PolarisLatitude;
import org.sightwork.celestial.reduction.ReducedSight;
import org.sightwork.celestial.sight.Worksheet;
import org.sightwork.geo.app.Caution;
import org.sightwork.geo.earth.Angles;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/** {@code sightwork reduce LOG.csv}: each sight's worksheet, from Hs to the intercept. */
@Command(name = "reduce", mixinStandardHelpOptions = true,
        description = {"Works every sight of a sight log: each correction from Hs to Ho, then GHA, Dec,",
                "LHA, Hc, Zn and the intercept from the DR (or the AP given)."},
        footer = {"", Caution.TEXT})
public final class ReduceCommand implements Callable<Integer> {

    @Parameters(index = "0", paramLabel = "LOG.csv", description = "the sight log (see docs/SIGHT-LOG.md)")
    Path log;

    @Option(names = "--format", defaultValue = "text", description = "text, csv or json (default ${DEFAULT-VALUE})")
    OutputFormat format;

    @Option(names = "--ap", paramLabel = "LAT,LON", description = "reduce every sight from this assumed position instead of its DR")
    String ap;

    @Option(names = "--dut1", defaultValue = "0", paramLabel = "SECONDS", description = "DUT1 = UT1 - UTC (s, within ±0.9; default 0)")
    double dut1;

    @Option(names = "--noon", description = "also predict the next local apparent noon after the last sight, "
            + "from its DR, course and speed")
    boolean noon;

    @Spec
    CommandSpec spec;

    /** Latitude by Polaris, or by meridian altitude when the body is within 1 min of time of the meridian. */
    static java.util.Optional<String> latitudeLine(ReducedSight r) {
        double ho = r.worksheet().hoDeg();
        double lon = r.lop().ap().lonDeg();
        if (r.position().body().name().equalsIgnoreCase("Polaris")) {
            double lat = PolarisLatitude.latitudeDeg(ho, r.position().ghaDeg(), r.position().decDeg(), lon,
                    r.lop().ap().latDeg());
            return java.util.Optional.of("latitude by Polaris " + Angles.formatLatitude(lat));
        }
        double lha = r.computed().lhaDeg();
        double dec = r.position().decDeg();
        if (Math.min(lha, 360.0 - lha) < MERIDIAN_LHA_DEG) {
            double lat = MeridianAltitude.latitudeDeg(ho, dec, MeridianAltitude.Transit.UPPER,
                    MeridianAltitude.bearingFromDr(r.lop().ap().latDeg(), dec));
            return java.util.Optional.of("latitude by meridian altitude " + Angles.formatLatitude(lat));
        }
        if (Math.abs(lha - 180.0) < MERIDIAN_LHA_DEG && ho > 0.0
                && Math.signum(dec) == Math.signum(r.lop().ap().latDeg())) {
            double lat = MeridianAltitude.latitudeDeg(ho, dec, MeridianAltitude.Transit.LOWER,
                    dec >= 0 ? MeridianAltitude.Bearing.NORTH : MeridianAltitude.Bearing.SOUTH);
            return java.util.Optional.of("latitude by meridian altitude (lower transit) " + Angles.formatLatitude(lat));
        }
        return java.util.Optional.empty();
    }

    /**
     * Within this LHA of the meridian (degrees; 1 minute of time) a sight is worked as a meridian
     * altitude too: the ex-meridian error is then under 0.05′ below 80° altitude
     * (Δh ≈ cos φ cos δ (1 - cos t) / sin z).
     */
    static final double MERIDIAN_LHA_DEG = 0.25;

    @Override
    public Integer call() throws Exception {
        PrintWriter out = spec.commandLine().getOut();
        PrintWriter err = spec.commandLine().getErr();
        SightInput in = SightInput.load(log, SightInput.parseAp(ap), dut1);
        in.reportProblems(err);
        java.util.Optional<LocalApparentNoon.Noon> lan = noon ? predictNoon(in, err) : java.util.Optional.empty();
        switch (format) {
            case TEXT -> {
                lan.ifPresent(n -> out.printf(Locale.ROOT,
                        "Next local apparent noon %s at DR %s: Sun's centre on the meridian at %s (Dec %s)%n%n",
                        n.utc(), n.position(), Angles.formatDm(n.meridianAltitudeDeg(), 2),
                        Angles.formatDeclination(n.sunDecDeg())));
                text(in, out);
            }
            case CSV -> csv(in, out);
            case JSON -> json(in, out, lan);
        }
        out.flush();
        if (in.reduced.isEmpty()) {
            return 1;
        }
        return in.problems.isEmpty() ? 0 : 2;
    }

    private java.util.Optional<LocalApparentNoon.Noon> predictNoon(SightInput in, PrintWriter err) {
        if (in.reduced.isEmpty()) {
            return java.util.Optional.empty();
        }
        ReducedSight last = in.reduced.stream().max(java.util.Comparator.comparing(r -> r.lop().utc())).orElseThrow();
        var s = last.worksheet().sight();
        var almanac = org.sightwork.celestial.almanac.Almanac.standard();
        GhaDecSource sun = t -> {
            var p = almanac.position(org.sightwork.celestial.almanac.Body.SUN,
                    org.sightwork.celestial.time.AstroTime.ofUtc(t, dut1));
            return new GhaDecSource.GhaDec(p.ghaDeg(), p.decDeg());
        };
        if (s.courseDeg().isEmpty() || s.speedKn().isEmpty()) {
            err.println("noon: the last sight gives no course and speed; noon predicted for the DR hove-to");
        }
        return java.util.Optional.of(LocalApparentNoon.next(s.utc(), last.lop().ap(), s.courseDeg().orElse(0.0),
                s.speedKn().orElse(0.0), sun));
    }

    private static void text(SightInput in, PrintWriter out) {
        for (int i = 0; i < in.reduced.size(); i++) {
            ReducedSight r = in.reduced.get(i);
            Worksheet w = r.worksheet();
            out.printf(Locale.ROOT, "%s  (line %d)%n", r.lop().label(), in.lines.get(i));
            out.printf(Locale.ROOT, "  Hs            %s%n", Angles.formatDm(w.hsDeg(), 2));
            out.printf(Locale.ROOT, "  index error   %+6.1f′  %s%n", w.indexArcmin(), w.sight().indexError().describe());
            out.printf(Locale.ROOT, "  dip           %+6.1f′  (%s, eye %.1f m)%n", w.dipArcmin(),
                    w.horizon().name().toLowerCase(Locale.ROOT), w.sight().eyeHeightM());
            out.printf(Locale.ROOT, "  Ha            %s%n", Angles.formatDm(w.haDeg(), 2));
            out.printf(Locale.ROOT, "  refraction    %+6.1f′  (%.0f °C, %.0f hPa)%n", w.refractionArcmin(),
                    w.sight().temperatureC(), w.sight().pressureHpa());
            if (w.semiDiameterArcmin() != 0) {
                out.printf(Locale.ROOT, "  semi-diameter %+6.1f′  (%s limb, augmented)%n", w.semiDiameterArcmin(),
                        w.sight().limb().name().toLowerCase(Locale.ROOT));
            }
            if (w.phaseArcmin() != 0) {
                out.printf(Locale.ROOT, "  phase         %+6.1f′%n", w.phaseArcmin());
            }
            if (w.parallaxArcmin() != 0) {
                out.printf(Locale.ROOT, "  parallax      %+6.1f′%n", w.parallaxArcmin());
            }
            out.printf(Locale.ROOT, "  Ho            %s%n", Angles.formatDm(w.hoDeg(), 2));
            out.printf(Locale.ROOT, "  GHA %s  Dec %s  from %s%n", Angles.formatDm(r.position().ghaDeg(), 3),
                    Angles.formatDeclination(r.position().decDeg()), r.lop().ap());
            out.printf(Locale.ROOT, "  LHA %s  Hc %s  Zn %05.1f°%n", Angles.formatDm(r.computed().lhaDeg(), 3),
                    Angles.formatDm(r.computed().hcDeg(), 2), r.computed().znDeg());
            out.printf(Locale.ROOT, "  intercept %.1f nm %s%n", Math.abs(r.lop().interceptNm()),
                    r.lop().isToward() ? "toward" : "away");
            latitudeLine(r).ifPresent(l -> out.println("  " + l));
            for (String warning : r.warnings()) {
                out.println("  warning: " + warning);
            }
            out.println();
        }
        out.println(Caution.TEXT);
    }

    private static void csv(SightInput in, PrintWriter out) {
        out.println("line,utc,body,limb,hsDeg,indexArcmin,dipArcmin,haDeg,refractionArcmin,semiDiameterArcmin,"
                + "phaseArcmin,parallaxArcmin,hoDeg,ghaDeg,decDeg,apLatDeg,apLonDeg,lhaDeg,hcDeg,znDeg,interceptNm");
        for (int i = 0; i < in.reduced.size(); i++) {
            ReducedSight r = in.reduced.get(i);
            Worksheet w = r.worksheet();
            out.printf(Locale.ROOT, "%d,%s,%s,%s,%.6f,%.2f,%.2f,%.6f,%.2f,%.2f,%.2f,%.2f,%.6f,%.6f,%.6f,%.6f,%.6f,%.6f,%.6f,%.3f,%.2f%n",
                    in.lines.get(i), w.sight().utc(), w.sight().body(), w.sight().limb(), w.hsDeg(), w.indexArcmin(),
                    w.dipArcmin(), w.haDeg(), w.refractionArcmin(), w.semiDiameterArcmin(), w.phaseArcmin(),
                    w.parallaxArcmin(), w.hoDeg(), r.position().ghaDeg(), r.position().decDeg(), r.lop().ap().latDeg(),
                    r.lop().ap().lonDeg(), r.computed().lhaDeg(), r.computed().hcDeg(), r.computed().znDeg(),
                    r.lop().interceptNm());
        }
    }

    static ObjectMapper mapper() {
        return new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);
    }

    private static void json(SightInput in, PrintWriter out, java.util.Optional<LocalApparentNoon.Noon> lan)
            throws Exception {
        ObjectMapper m = mapper();
        ObjectNode root = m.createObjectNode();
        ArrayNode sights = root.putArray("sights");
        for (int i = 0; i < in.reduced.size(); i++) {
            ReducedSight r = in.reduced.get(i);
            Worksheet w = r.worksheet();
            ObjectNode s = sights.addObject();
            s.put("line", in.lines.get(i));
            s.put("utc", w.sight().utc().toString());
            s.put("body", w.sight().body());
            s.put("limb", w.sight().limb().name());
            s.put("hsDeg", w.hsDeg());
            s.put("indexArcmin", w.indexArcmin());
            s.put("dipArcmin", w.dipArcmin());
            s.put("haDeg", w.haDeg());
            s.put("refractionArcmin", w.refractionArcmin());
            s.put("semiDiameterArcmin", w.semiDiameterArcmin());
            s.put("phaseArcmin", w.phaseArcmin());
            s.put("parallaxArcmin", w.parallaxArcmin());
            s.put("hoDeg", w.hoDeg());
            s.put("ghaDeg", r.position().ghaDeg());
            s.put("decDeg", r.position().decDeg());
            s.put("apLatDeg", r.lop().ap().latDeg());
            s.put("apLonDeg", r.lop().ap().lonDeg());
            s.put("lhaDeg", r.computed().lhaDeg());
            s.put("hcDeg", r.computed().hcDeg());
            s.put("znDeg", r.computed().znDeg());
            s.put("interceptNm", r.lop().interceptNm());
            latitudeLine(r).ifPresent(l -> s.put("latitude", l));
            ArrayNode warnings = s.putArray("warnings");
            r.warnings().forEach(warnings::add);
        }
        lan.ifPresent(n -> {
            ObjectNode o = root.putObject("noon");
            o.put("utc", n.utc().toString());
            o.put("latDeg", n.position().latDeg());
            o.put("lonDeg", n.position().lonDeg());
            o.put("meridianAltitudeDeg", n.meridianAltitudeDeg());
            o.put("sunDecDeg", n.sunDecDeg());
        });
        problems(root, in);
        out.println(m.writeValueAsString(root));
    }

    static void problems(ObjectNode root, SightInput in) {
        ArrayNode problems = root.putArray("problems");
        for (LogProblem p : in.problems) {
            ObjectNode o = problems.addObject();
            o.put("file", p.file());
            o.put("line", p.line());
            o.put("column", p.column());
            o.put("columnName", p.columnName());
            o.put("message", p.message());
        }
    }
}
