package org.sightwork.celestial.cli;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.io.PrintWriter;
import java.time.Instant;
import java.util.Locale;
import java.util.concurrent.Callable;
import org.sightwork.celestial.almanac.Almanac;
import org.sightwork.celestial.planning.Identification;
import org.sightwork.celestial.planning.SextantApprox;
import org.sightwork.celestial.planning.StarIdentifier;
import org.sightwork.geo.app.Caution;
import org.sightwork.geo.earth.Angles;
import org.sightwork.geo.earth.GeoPosition;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/** {@code sightwork identify}: which star or planet was that, from its altitude and rough azimuth. */
@Command(name = "identify",
        description = {"Identifies an unknown star or planet from its sextant altitude and rough azimuth,"
            + " the time and the DR: the declination and hour angle of the point observed, the nearest"
            + " navigational star, planet or catalogue star brighter than 3.5, and the runner-up."},
        footer = {"", Caution.TEXT},
        mixinStandardHelpOptions = true)
public final class IdentifyCommand implements Callable<Integer> {

    @Spec
    private CommandSpec spec;

    @Option(names = "--at", required = true, paramLabel = "TIME", description = "time of the sight (ISO 8601, e.g. 2026-06-21T04:55:10Z)")
    private String at;

    @Option(names = "--dr", required = true, paramLabel = "LAT,LON", description = "DR at the time of the sight")
    private String dr;

    @Option(names = "--alt", required = true, paramLabel = "ANGLE", description = "sextant altitude (d°m.m' or degrees)")
    private String alt;

    @Option(names = "--az", required = true, paramLabel = "DEG", description = "rough azimuth (degrees true, from the compass)")
    private double az;

    @Option(names = "--eye-height", paramLabel = "M", defaultValue = "0", description = "height of eye (metres) for the dip; default ${DEFAULT-VALUE}")
    private double eyeHeight;

    @Option(names = "--format", paramLabel = "FMT", defaultValue = "text", description = "text or json; default ${DEFAULT-VALUE}")
    private PlanCommand.Format format;

    @Override
    public Integer call() throws IOException {
        Instant t = PlanCommand.parseInstant(spec, "--at", at);
        GeoPosition pos = PlanCommand.parseDr(spec, dr);
        double hs;
        double ho;
        try {
            hs = Angles.parse(alt);
            if (!(hs > 0.0 && hs <= 90.0)) {
                throw new IllegalArgumentException("altitude " + alt + " is outside (0°, 90°]");
            }
            if (!(az >= 0.0 && az <= 360.0)) {
                throw new IllegalArgumentException("azimuth " + az + "° is outside [0°, 360°]");
            }
            ho = SextantApprox.approxObservedDeg(hs, eyeHeight);
        } catch (IllegalArgumentException e) {
            throw new CommandLine.ParameterException(spec.commandLine(), e.getMessage(), e);
        }
        Identification id = new StarIdentifier(Almanac.standard()).identify(t, pos, Math.max(ho, 0.0), az);
        PrintWriter out = spec.commandLine().getOut();
        if (format == PlanCommand.Format.json) {
            ObjectMapper m = PlanCommand.mapper();
            ObjectNode n = m.createObjectNode();
            n.put("timeUtc", PlanCommand.iso(t));
            n.put("latDeg", pos.latDeg());
            n.put("lonDeg", pos.lonDeg());
            n.put("hsDeg", hs);
            n.put("observedAltDeg", id.observedAltDeg());
            n.put("azimuthDeg", id.azimuthDeg());
            n.put("decDeg", id.decDeg());
            n.put("ghaDeg", id.ghaDeg());
            n.put("shaDeg", id.shaDeg());
            match(n.putObject("best"), id.best());
            n.put("convincing", id.best().missDeg() <= StarIdentifier.CONVINCING_MISS_DEG);
            if (id.runnerUp().isPresent()) {
                match(n.putObject("runnerUp"), id.runnerUp().get());
            } else {
                n.putNull("runnerUp");
            }
            n.put("caution", Caution.TEXT.replace('\n', ' '));
            out.println(m.writeValueAsString(n));
        } else {
            out.printf(Locale.ROOT, "Observed at %s from DR %s: Hs %s, azimuth %s%n", PlanCommand.iso(t), pos,
                    Angles.formatDm(hs, 2), PlanCommand.zn(id.azimuthDeg()));
            out.printf(Locale.ROOT, "  altitude used (less dip %.1f′ and refraction): %s%n",
                    SextantApprox.dipArcmin(eyeHeight), Angles.formatDm(id.observedAltDeg(), 2));
            out.printf(Locale.ROOT, "  the point observed: Dec %s, GHA %s, SHA %s%n", Angles.formatDeclination(id.decDeg()),
                    Angles.formatDm(id.ghaDeg(), 3), Angles.formatDm(id.shaDeg(), 3));
            line(out, "best match", id.best());
            if (id.best().missDeg() > StarIdentifier.CONVINCING_MISS_DEG) {
                out.printf(Locale.ROOT, "  note: no candidate lies within %.0f° of that point: check the time, altitude"
                        + " and azimuth%n", StarIdentifier.CONVINCING_MISS_DEG);
            }
            id.runnerUp().ifPresent(r -> line(out, "runner-up", r));
            out.println(Caution.TEXT);
        }
        out.flush();
        return 0;
    }

    private static void line(PrintWriter out, String what, Identification.Match m) {
        out.printf(Locale.ROOT, "  %-10s %-16s miss %5.2f°   Hc %s Zn %s mag %.1f%n", what, m.body().name(),
                m.missDeg(), Angles.formatDm(m.hcDeg(), 2), PlanCommand.zn(m.znDeg()), Math.round(m.magnitude() * 10) / 10.0 + 0.0);
    }

    private static void match(ObjectNode n, Identification.Match m) {
        n.put("body", m.body().name());
        n.put("missDeg", m.missDeg());
        n.put("hcDeg", m.hcDeg());
        n.put("znDeg", m.znDeg());
        n.put("magnitude", m.magnitude());
    }
}
