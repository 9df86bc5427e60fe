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

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() throws Exception {
        PrintWriter out = spec.commandLine().getOut();
        PrintWriter err = spec.commandLine().getErr();
        SightInput in = SightInput.load(log, SightInput.parseAp(ap), dut1);
        in.reportProblems(err);
        switch (format) {
            case TEXT -> text(in, out);
            case CSV -> csv(in, out);
            case JSON -> json(in, out);
        }
        out.flush();
        if (in.reduced.isEmpty()) {
            return 1;
        }
        return in.problems.isEmpty() ? 0 : 2;
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

    private static void json(SightInput in, PrintWriter out) throws Exception {
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
            ArrayNode warnings = s.putArray("warnings");
            r.warnings().forEach(warnings::add);
        }
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
