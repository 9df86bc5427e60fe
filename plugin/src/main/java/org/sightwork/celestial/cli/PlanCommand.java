package org.sightwork.celestial.cli;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.time.LocalDate;
import java.time.OffsetDateTime;
import java.time.ZoneOffset;
import java.time.format.DateTimeFormatter;
import java.time.format.DateTimeParseException;
import java.time.temporal.ChronoUnit;
import java.util.ArrayList;
import java.util.List;
import java.util.LinkedHashMap;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.Callable;
import org.sightwork.celestial.almanac.Almanac;
import org.sightwork.celestial.almanac.Body;
import org.sightwork.celestial.planning.DayEvents;
import org.sightwork.celestial.planning.DayPlanner;
import org.sightwork.celestial.planning.DayWindow;
import org.sightwork.celestial.planning.SelectionCriteria;
import org.sightwork.celestial.planning.ShipTrack;
import org.sightwork.celestial.planning.SightPlan;
import org.sightwork.celestial.planning.StarSelector;
import org.sightwork.celestial.planning.VisibleBody;
import org.sightwork.celestial.ui.SkyView;
import org.sightwork.geo.app.Caution;
import org.sightwork.geo.earth.Angles;
import org.sightwork.geo.earth.GeoPosition;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/**
 * {@code sightwork plan}: the day's times at a DR that moves with the ship, and the twilight star
 * plans (or a plan at a chosen time), as text or JSON, optionally with the sky plot as a PNG.
 */
@Command(name = "plan",
        description = {"The day's sunrise, sunset, twilight, meridian passage, moonrise and moonset at a DR"
            + " that moves with the ship, and the best stars for the morning and evening twilight fixes.",
            "Times are UTC. The day is the zone day at the DR (zone = lon / 15° rounded) unless --utc-day."},
        footer = {"", Caution.TEXT},
        mixinStandardHelpOptions = true)
public final class PlanCommand implements Callable<Integer> {

    /** Output formats. */
    enum Format { text, json }

    @Spec
    private CommandSpec spec;

    @Option(names = "--dr", required = true, paramLabel = "LAT,LON",
            description = "DR at the start, e.g. 38°32.1'N,028°37.9'W or 38.535,-28.632")
    private String dr;

    @Option(names = "--date", required = true, paramLabel = "YYYY-MM-DD", description = "the day (zone date, or UTC date with --utc-day)")
    private String date;

    @Option(names = "--dr-time", paramLabel = "TIME", description = "when the ship was at --dr (ISO 8601, e.g. 2026-06-21T06:00Z); default: the day's start")
    private String drTime;

    @Option(names = "--course", paramLabel = "DEG", defaultValue = "0", description = "course true (degrees), default ${DEFAULT-VALUE}")
    private double course;

    @Option(names = "--speed", paramLabel = "KN", defaultValue = "0", description = "speed (knots), default ${DEFAULT-VALUE}")
    private double speed;

    @Option(names = "--eye-height", paramLabel = "M", defaultValue = "0",
            description = "height of eye (metres) for the dip in rising and setting and the pre-set altitudes; default ${DEFAULT-VALUE}")
    private double eyeHeight;

    @Option(names = "--utc-day", description = "the UTC day 00:00-24:00 instead of the zone day at the DR")
    private boolean utcDay;

    @Option(names = "--at", paramLabel = "TIME", description = "plan the stars at this time instead of at the two twilights")
    private String at;

    @Option(names = "--set-size", paramLabel = "N", defaultValue = "3", description = "bodies in the proposed set: 3, 4 or 5; default ${DEFAULT-VALUE}")
    private int setSize;

    @Option(names = "--min-alt", paramLabel = "DEG", defaultValue = "15", description = "lowest altitude proposed; default ${DEFAULT-VALUE}°")
    private double minAlt;

    @Option(names = "--max-alt", paramLabel = "DEG", defaultValue = "70", description = "highest altitude proposed; default ${DEFAULT-VALUE}°")
    private double maxAlt;

    @Option(names = "--transit", paramLabel = "BODY", split = ",",
            description = "also the meridian passage (upper transit) of these bodies, e.g. --transit moon,jupiter,sirius")
    private List<String> transitBodies = new ArrayList<>();

    @Option(names = "--sky-png", paramLabel = "FILE", description = "also draw the sky (evening plan, or --at) to this PNG")
    private Path skyPng;

    @Option(names = "--format", paramLabel = "FMT", defaultValue = "text", description = "text or json; default ${DEFAULT-VALUE}")
    private Format format;

    @Override
    public Integer call() throws IOException {
        GeoPosition start = parseDr(spec, dr);
        LocalDate day = parseDate(spec, "--date", date);
        SelectionCriteria criteria;
        ShipTrack track;
        try {
            criteria = SelectionCriteria.DEFAULT.withSetSize(setSize).withAltitudeBand(minAlt, maxAlt)
                    .withEyeHeight(eyeHeight);
            Instant t0 = drTime != null ? parseInstant(spec, "--dr-time", drTime)
                    : utcDay ? DayWindow.utcDay(day).startUtc()
                    : DayWindow.zoneDay(day, ShipTrack.stationary(start)).startUtc();
            track = new ShipTrack(start, t0, course, speed);
        } catch (IllegalArgumentException e) {
            throw new CommandLine.ParameterException(spec.commandLine(), e.getMessage(), e);
        }
        if (skyPng != null) {
            checkWritable(spec, skyPng);
        }
        Optional<Instant> atTime = at == null ? Optional.empty() : Optional.of(parseInstant(spec, "--at", at));

        Almanac almanac = Almanac.standard();
        DayWindow window = utcDay ? DayWindow.utcDay(day) : DayWindow.zoneDay(day, track);
        DayPlanner planner = new DayPlanner(almanac);
        DayEvents ev = planner.dayEvents(track, window, eyeHeight);
        Map<String, Optional<Instant>> transits = new LinkedHashMap<>();
        for (String name : transitBodies) {
            Body b = body(spec, almanac, name.strip());
            transits.put(b.name(), planner.upperTransit(b, track, window));
        }
        StarSelector selector = new StarSelector(almanac);
        List<Labelled> plans = new ArrayList<>();
        if (atTime.isPresent()) {
            plans.add(new Labelled("at " + hm(atTime.get()), "atTime",
                    Optional.of(selector.plan(atTime.get(), track.positionAt(atTime.get()), criteria))));
        } else {
            plans.add(new Labelled("morning twilight (mid nautical twilight)", "morningStars",
                    ev.morningStarTime().map(t -> selector.plan(t, track.positionAt(t), criteria))));
            plans.add(new Labelled("evening twilight (mid nautical twilight)", "eveningStars",
                    ev.eveningStarTime().map(t -> selector.plan(t, track.positionAt(t), criteria))));
        }
        Optional<SightPlan> forPng = plans.get(plans.size() - 1).plan().or(() -> plans.get(0).plan());
        if (skyPng != null) {
            if (forPng.isEmpty()) {
                throw new IllegalArgumentException("no star plan this day (no nautical twilight): nothing to draw");
            }
            SkyView.writePng(forPng.get(), 720, skyPng);
        }

        PrintWriter out = spec.commandLine().getOut();
        if (format == Format.json) {
            out.println(json(track, ev, transits, plans));
        } else {
            text(out, track, ev, transits, plans);
        }
        out.flush();
        return 0;
    }

    /** A plan with its heading and JSON key. */
    private record Labelled(String heading, String key, Optional<SightPlan> plan) {
    }

    private void text(PrintWriter out, ShipTrack track, DayEvents ev, Map<String, Optional<Instant>> transits,
            List<Labelled> plans) {
        DayWindow w = ev.day();
        out.printf(Locale.ROOT, "Sight plan for %s (%s), times UTC%n", w.date(),
                w.zoneHours().isPresent() ? String.format(Locale.ROOT, "zone day, zone %+d: %s to %s",
                        w.zoneHours().getAsInt(), hm(w.startUtc()), hm(w.endUtc())) : "UTC day");
        out.printf(Locale.ROOT, "DR %s at %s, course %03.0f°, speed %.1f kn; height of eye %.1f m%n",
                track.start(), hm(track.startUtc()), track.courseDeg(), track.speedKn(), ev.eyeHeightM());
        out.println();
        row(out, track, "nautical dawn", ev.nauticalDawn());
        row(out, track, "civil dawn", ev.civilDawn());
        row(out, track, "sunrise", ev.sunrise());
        row(out, track, "meridian passage", ev.meridianPassage());
        row(out, track, "sunset", ev.sunset());
        row(out, track, "civil dusk", ev.civilDusk());
        row(out, track, "nautical dusk", ev.nauticalDusk());
        row(out, track, "moonrise", ev.moonrise());
        row(out, track, "moonset", ev.moonset());
        transits.forEach((name, t) -> row(out, track, "transit " + name, t));
        if (ev.sunDay() == DayEvents.SunDay.ALWAYS_UP) {
            out.println("  the Sun stays above the horizon all day");
        } else if (ev.sunDay() == DayEvents.SunDay.ALWAYS_DOWN) {
            out.println("  the Sun stays below the horizon all day");
        }
        for (Labelled l : plans) {
            out.println();
            if (l.plan().isEmpty()) {
                out.println("Stars, " + l.heading() + ": no nautical twilight this day, no plan");
                continue;
            }
            SightPlan p = l.plan().get();
            out.printf(Locale.ROOT, "Stars, %s: %s, DR %s, Sun %s%n", l.heading(), hm(p.timeUtc()), p.dr(),
                    Angles.formatDm(p.sunAltitudeDeg(), 2));
            for (String n : p.notes()) {
                out.println("  note: " + n);
            }
            if (!p.chosen().isEmpty()) {
                out.printf(Locale.ROOT, "  proposed set of %d: HDOP %.2f, smallest azimuth gap %.0f°%n",
                        p.chosen().size(), p.hdop(), p.smallestGapDeg());
            }
            out.printf(Locale.ROOT, "  %-1s %-16s %9s %5s %5s %10s  %s%n", "", "body", "Hc", "Zn", "mag", "pre-set Hs", "");
            for (VisibleBody b : p.visible()) {
                out.printf(Locale.ROOT, "  %-1s %-16s %9s %5s %5.1f %10s  %s%n", p.isChosen(b) ? "*" : "",
                        b.body().name(), Angles.formatDm(b.hcDeg(), 2), zn(b.znDeg()), Math.round(b.magnitude() * 10) / 10.0 + 0.0,
                        Angles.formatDm(b.presetHsDeg(), 2), b.excludedBecause().orElse(""));
            }
            out.println("  (* proposed)");
        }
        out.println();
        out.println("Pre-set Hs: Hc less parallax, plus mean refraction and dip; no index error.");
        out.println(Caution.TEXT);
    }

    private static void row(PrintWriter out, ShipTrack track, String what, Optional<Instant> t) {
        if (t.isEmpty()) {
            out.printf(Locale.ROOT, "  %-20s %s%n", what, "—  (does not happen this day)");
        } else {
            out.printf(Locale.ROOT, "  %-20s %s   DR %s%n", what, hm(t.get()), track.positionAt(t.get()));
        }
    }

    private String json(ShipTrack track, DayEvents ev, Map<String, Optional<Instant>> transits, List<Labelled> plans) {
        ObjectMapper m = mapper();
        ObjectNode root = m.createObjectNode();
        DayWindow w = ev.day();
        root.put("date", w.date().toString());
        if (w.zoneHours().isPresent()) {
            root.put("zoneHours", w.zoneHours().getAsInt());
        } else {
            root.putNull("zoneHours");
        }
        root.put("dayStartUtc", iso(w.startUtc()));
        root.put("dayEndUtc", iso(w.endUtc()));
        ObjectNode drNode = root.putObject("dr");
        drNode.put("latDeg", track.start().latDeg());
        drNode.put("lonDeg", track.start().lonDeg());
        drNode.put("timeUtc", iso(track.startUtc()));
        drNode.put("courseDeg", track.courseDeg());
        drNode.put("speedKn", track.speedKn());
        root.put("eyeHeightM", ev.eyeHeightM());
        put(root, "sunrise", ev.sunrise());
        put(root, "sunset", ev.sunset());
        put(root, "civilDawn", ev.civilDawn());
        put(root, "civilDusk", ev.civilDusk());
        put(root, "nauticalDawn", ev.nauticalDawn());
        put(root, "nauticalDusk", ev.nauticalDusk());
        put(root, "meridianPassage", ev.meridianPassage());
        put(root, "moonrise", ev.moonrise());
        put(root, "moonset", ev.moonset());
        root.put("sunDay", ev.sunDay().name());
        ObjectNode tr = root.putObject("transits");
        transits.forEach((name, t) -> put(tr, name, t));
        for (Labelled l : plans) {
            if (l.plan().isEmpty()) {
                root.putNull(l.key());
            } else {
                root.set(l.key(), planJson(m, l.plan().get()));
            }
        }
        root.put("caution", Caution.TEXT.replace('\n', ' '));
        try {
            return m.writeValueAsString(root);
        } catch (IOException e) {
            throw new IllegalStateException(e);
        }
    }

    static ObjectNode planJson(ObjectMapper m, SightPlan p) {
        ObjectNode n = m.createObjectNode();
        n.put("timeUtc", iso(p.timeUtc()));
        n.put("latDeg", p.dr().latDeg());
        n.put("lonDeg", p.dr().lonDeg());
        n.put("sunAltitudeDeg", p.sunAltitudeDeg());
        if (Double.isFinite(p.hdop())) {
            n.put("hdop", p.hdop());
        } else {
            n.putNull("hdop");
        }
        n.put("smallestGapDeg", p.smallestGapDeg());
        ArrayNode chosen = n.putArray("chosen");
        p.chosen().forEach(b -> chosen.add(b.body().name()));
        ArrayNode vis = n.putArray("visible");
        for (VisibleBody b : p.visible()) {
            ObjectNode o = vis.addObject();
            o.put("body", b.body().name());
            o.put("hcDeg", b.hcDeg());
            o.put("znDeg", b.znDeg());
            o.put("magnitude", b.magnitude());
            o.put("presetHsDeg", b.presetHsDeg());
            o.put("chosen", p.isChosen(b));
            if (b.excludedBecause().isPresent()) {
                o.put("excludedBecause", b.excludedBecause().get());
            } else {
                o.putNull("excludedBecause");
            }
        }
        ArrayNode notes = n.putArray("notes");
        p.notes().forEach(notes::add);
        return n;
    }

    // --- shared by the planning commands (identify, compass) ---

    /** An azimuth to the whole degree, 000°-359° (359.6° shows as 000°, never 360°). */
    static String zn(double deg) {
        long z = Math.round(deg) % 360;
        return String.format(Locale.ROOT, "%03d°", z);
    }

    static ObjectMapper mapper() {
        return new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);
    }

    static void put(ObjectNode n, String key, Optional<Instant> t) {
        if (t.isPresent()) {
            n.put(key, iso(t.get()));
        } else {
            n.putNull(key);
        }
    }

    /** ISO 8601 UTC to the second. */
    static String iso(Instant t) {
        return DateTimeFormatter.ISO_INSTANT.format(t.truncatedTo(ChronoUnit.SECONDS));
    }

    /** Date and time rounded to the minute, e.g. {@code 2026-06-21 05:12Z}. */
    static String hm(Instant t) {
        Instant r = t.plusSeconds(30).truncatedTo(ChronoUnit.MINUTES);
        return DateTimeFormatter.ofPattern("yyyy-MM-dd HH:mm'Z'", Locale.ROOT).withZone(ZoneOffset.UTC).format(r);
    }

    /**
     * Reads a DR written {@code LAT,LON} (or {@code LAT;LON}, or {@code LAT LON} with hemisphere
     * letters).
     */
    static GeoPosition parseDr(CommandSpec spec, String text) {
        String s = text.strip();
        String[] parts;
        if (s.contains(";")) {
            parts = s.split(";");
        } else if (s.chars().filter(c -> c == ',').count() == 1) {
            parts = s.split(",");
        } else {
            parts = s.split("(?<=[NSns])\\s+");
        }
        if (parts.length != 2) {
            throw new CommandLine.ParameterException(spec.commandLine(), "--dr '" + text
                    + "' is not LAT,LON: expected e.g. 38°32.1'N,028°37.9'W or 38.535,-28.632"
                    + " (use ';' between them if the numbers have decimal commas)");
        }
        try {
            return GeoPosition.of(Angles.parseLatitude(parts[0]), Angles.parseLongitude(parts[1]));
        } catch (IllegalArgumentException e) {
            throw new CommandLine.ParameterException(spec.commandLine(), "--dr: " + e.getMessage(), e);
        }
    }

    /** Reads an ISO 8601 instant with an offset or Z, seconds optional. */
    static Instant parseInstant(CommandSpec spec, String option, String text) {
        try {
            return OffsetDateTime.parse(text.strip()).toInstant();
        } catch (DateTimeParseException e) {
            throw new CommandLine.ParameterException(spec.commandLine(), option + " '" + text
                    + "' is not a time: expected ISO 8601 with a zone, e.g. 2026-06-21T05:30Z or 2026-06-21T05:30:00+02:00");
        }
    }

    /** Reads an ISO 8601 date. */
    static LocalDate parseDate(CommandSpec spec, String option, String text) {
        try {
            return LocalDate.parse(text.strip());
        } catch (DateTimeParseException e) {
            throw new CommandLine.ParameterException(spec.commandLine(), option + " '" + text
                    + "' is not a date: expected YYYY-MM-DD, e.g. 2026-06-21");
        }
    }

    /** The body named on the command line. */
    static Body body(CommandSpec spec, Almanac almanac, String name) {
        try {
            return almanac.body(name);
        } catch (IllegalArgumentException e) {
            throw new CommandLine.ParameterException(spec.commandLine(), "--body: " + e.getMessage(), e);
        }
    }

    /** Reads a signed angle or one with E/W (east positive), e.g. a variation. */
    static double parseEastWest(CommandSpec spec, String option, String text) {
        try {
            return Angles.parseLongitude(text);
        } catch (IllegalArgumentException e) {
            throw new CommandLine.ParameterException(spec.commandLine(), option + " '" + text
                    + "' is not an angle east or west: expected e.g. 4.5W, 4°30'W or -4.5");
        }
    }

    static void checkWritable(CommandSpec spec, Path p) {
        Path dir = p.toAbsolutePath().getParent();
        if (dir == null || !Files.isDirectory(dir)) {
            throw new CommandLine.ParameterException(spec.commandLine(), "--sky-png: folder " + dir + " does not exist");
        }
    }
}
