package org.sightwork.celestial.cli;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.io.PrintWriter;
import java.time.Instant;
import java.time.LocalDate;
import java.util.Locale;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.concurrent.Callable;
import org.sightwork.celestial.almanac.Almanac;
import org.sightwork.celestial.almanac.Body;
import org.sightwork.celestial.planning.CompassCheck;
import org.sightwork.celestial.planning.DayWindow;
import org.sightwork.celestial.planning.ShipTrack;
import org.sightwork.geo.app.Caution;
import org.sightwork.geo.earth.Angles;
import org.sightwork.geo.earth.GeoPosition;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/** {@code sightwork compass}: compass error and deviation by the azimuth or amplitude of a body. */
@Command(name = "compass",
        description = {"The true azimuth of a body at a time (--at), or its amplitude at rising or setting on"
            + " a day (--date with --amplitude), the compass error from the compass bearing observed, and"
            + " the deviation when the local variation is given."},
        footer = {"", Caution.TEXT},
        mixinStandardHelpOptions = true)
public final class CompassCommand implements Callable<Integer> {

    /** Rising or setting. */
    enum Event { rising, setting }

    @Spec
    private CommandSpec spec;

    @Option(names = "--at", paramLabel = "TIME", description = "time of the bearing (azimuth mode)")
    private String at;

    @Option(names = "--date", paramLabel = "YYYY-MM-DD", description = "the day (amplitude mode; zone day at the DR)")
    private String date;

    @Option(names = "--amplitude", paramLabel = "EVENT", description = "rising or setting: amplitude mode, with --date")
    private Event amplitude;

    @Option(names = "--dr", required = true, paramLabel = "LAT,LON", description = "DR (at --at, or at the day's start)")
    private String dr;

    @Option(names = "--course", paramLabel = "DEG", defaultValue = "0", description = "course true for the DR's run (amplitude mode)")
    private double course;

    @Option(names = "--speed", paramLabel = "KN", defaultValue = "0", description = "speed for the DR's run (amplitude mode)")
    private double speed;

    @Option(names = "--body", defaultValue = "sun", paramLabel = "NAME", description = "the body; default ${DEFAULT-VALUE}")
    private String bodyName;

    @Option(names = "--bearing", paramLabel = "DEG", description = "compass bearing observed (degrees)")
    private Double bearing;

    @Option(names = "--variation", paramLabel = "ANGLE", description = "local variation, e.g. 4.5W or 2°10'E (from the chart)")
    private String variation;

    @Option(names = "--format", paramLabel = "FMT", defaultValue = "text", description = "text or json; default ${DEFAULT-VALUE}")
    private PlanCommand.Format format;

    @Override
    public Integer call() throws IOException {
        GeoPosition pos = PlanCommand.parseDr(spec, dr);
        if ((at == null) == (amplitude == null)) {
            throw new CommandLine.ParameterException(spec.commandLine(),
                    "give either --at TIME (azimuth) or --amplitude rising|setting with --date (amplitude)");
        }
        if (amplitude != null && date == null) {
            throw new CommandLine.ParameterException(spec.commandLine(), "--amplitude needs --date");
        }
        OptionalDouble b = bearing == null ? OptionalDouble.empty() : OptionalDouble.of(bearing);
        if (bearing != null && !(bearing >= 0.0 && bearing <= 360.0)) {
            throw new CommandLine.ParameterException(spec.commandLine(), "--bearing " + bearing + " is outside [0°, 360°]");
        }
        OptionalDouble v = variation == null ? OptionalDouble.empty()
                : OptionalDouble.of(PlanCommand.parseEastWest(spec, "--variation", variation));
        Almanac almanac = Almanac.standard();
        Body body = PlanCommand.body(spec, almanac, bodyName);
        CompassCheck check = new CompassCheck(almanac);
        PrintWriter out = spec.commandLine().getOut();
        ObjectMapper m = PlanCommand.mapper();
        ObjectNode n = m.createObjectNode();
        n.put("body", body.name());
        Optional<CompassCheck.Reading> reading;
        if (at != null) {
            Instant t = PlanCommand.parseInstant(spec, "--at", at);
            CompassCheck.AzimuthCheck a = check.byAzimuth(body, t, pos, b, v);
            reading = a.reading();
            n.put("mode", "azimuth");
            n.put("timeUtc", PlanCommand.iso(t));
            n.put("latDeg", pos.latDeg());
            n.put("lonDeg", pos.lonDeg());
            n.put("altitudeDeg", a.altitudeDeg());
            n.put("trueAzimuthDeg", a.trueAzimuthDeg());
            if (format == PlanCommand.Format.text) {
                out.printf(Locale.ROOT, "%s at %s from DR %s: altitude %s, true azimuth %05.1f°%n", body.name(),
                        PlanCommand.hm(t), pos, Angles.formatDm(a.altitudeDeg(), 2), a.trueAzimuthDeg());
                if (a.altitudeDeg() > 30) {
                    out.println("  note: above 30° a compass bearing is hard to take well");
                }
            }
        } else {
            LocalDate d = PlanCommand.parseDate(spec, "--date", date);
            ShipTrack track;
            DayWindow day;
            try {
                Instant t0 = DayWindow.zoneDay(d, ShipTrack.stationary(pos)).startUtc();
                track = new ShipTrack(pos, t0, course, speed);
                day = DayWindow.zoneDay(d, track);
            } catch (IllegalArgumentException e) {
                throw new CommandLine.ParameterException(spec.commandLine(), e.getMessage(), e);
            }
            boolean rising = amplitude == Event.rising;
            Optional<CompassCheck.AmplitudeCheck> a = check.byAmplitude(body, track, day, rising, b, v);
            if (a.isEmpty()) {
                throw new IllegalStateException("the " + body.name() + " does not " + (rising ? "rise" : "set")
                        + " on " + d + " at this DR: no amplitude");
            }
            CompassCheck.AmplitudeCheck x = a.get();
            reading = x.reading();
            n.put("mode", "amplitude");
            n.put("timeUtc", PlanCommand.iso(x.timeUtc()));
            n.put("latDeg", x.dr().latDeg());
            n.put("lonDeg", x.dr().lonDeg());
            n.put("decDeg", x.decDeg());
            n.put("amplitudeDeg", x.amplitudeDeg());
            n.put("amplitude", x.text());
            n.put("trueAzimuthDeg", x.trueAzimuthDeg());
            if (format == PlanCommand.Format.text) {
                out.printf(Locale.ROOT, "%s %s at %s (centre on the celestial horizon), DR %s%n", body.name(),
                        rising ? "rising" : "setting", PlanCommand.hm(x.timeUtc()), x.dr());
                out.printf(Locale.ROOT, "  Dec %s: amplitude %s, true bearing %05.1f°%n",
                        Angles.formatDeclination(x.decDeg()), x.text(), x.trueAzimuthDeg());
                out.println("  (take the bearing when the lower limb is about half a diameter above the horizon)");
            }
        }
        if (reading.isPresent()) {
            CompassCheck.Reading r = reading.get();
            n.put("compassBearingDeg", r.bearingDeg());
            n.put("compassErrorDeg", r.compassErrorDeg());
            if (r.variationDeg().isPresent()) {
                n.put("variationDeg", r.variationDeg().getAsDouble());
                n.put("deviationDeg", r.deviationDeg().getAsDouble());
            } else {
                n.putNull("variationDeg");
                n.putNull("deviationDeg");
            }
            if (format == PlanCommand.Format.text) {
                out.printf(Locale.ROOT, "  compass bearing %05.1f°: compass error %s%n", r.bearingDeg(), ew(r.compassErrorDeg()));
                if (r.variationDeg().isPresent()) {
                    out.printf(Locale.ROOT, "  variation %s: deviation %s%n", ew(r.variationDeg().getAsDouble()),
                            ew(r.deviationDeg().getAsDouble()));
                }
            }
        }
        if (format == PlanCommand.Format.json) {
            n.put("caution", Caution.TEXT.replace('\n', ' '));
            out.println(m.writeValueAsString(n));
        } else {
            out.println(Caution.TEXT);
        }
        out.flush();
        return 0;
    }

    private static String ew(double deg) {
        return String.format(Locale.ROOT, "%.1f° %s", Math.abs(deg), deg >= 0 ? "E" : "W");
    }
}
