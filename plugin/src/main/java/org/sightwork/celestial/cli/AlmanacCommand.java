package org.sightwork.celestial.cli;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import java.io.PrintWriter;
import java.time.Instant;
import java.time.LocalDate;
import java.time.OffsetDateTime;
import java.time.ZoneOffset;
import java.time.format.DateTimeParseException;
import java.time.temporal.ChronoUnit;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.OptionalDouble;
import java.util.concurrent.Callable;
import org.sightwork.celestial.almanac.Almanac;
import org.sightwork.celestial.almanac.Body;
import org.sightwork.celestial.almanac.BodyPosition;
import org.sightwork.celestial.time.AstroTime;
import org.sightwork.geo.app.Caution;
import org.sightwork.geo.earth.Angles;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/**
 * {@code sightwork almanac}: GHA, declination, SHA, HP, SD and magnitude of the navigational bodies
 * for one instant or for every hour of a day, as a text table, CSV or JSON.
 */
@Command(name = "almanac",
        mixinStandardHelpOptions = true,
        description = {"Apparent geocentric places of the Sun, Moon, planets, Aries and stars:",
                "GHA, declination, SHA, horizontal parallax, semi-diameter and magnitude."},
        footer = {"", "Text shows d°m.m′ to 0.1′; CSV and JSON decimal degrees (HP, SD in arcminutes).",
                "Span 1900-2100. Without DUT1 the GHA may be off by up to 0.225′.", "", Caution.TEXT})
public final class AlmanacCommand implements Callable<Integer> {

    /** The form an instant is written in, for messages. */
    static final String INSTANT_FORM = "an ISO 8601 UTC instant such as 2026-03-20T18:30:00Z";

    /** Output formats. */
    enum Format { TEXT, CSV, JSON }

    @Spec
    private CommandSpec spec;

    @Option(names = "--at", paramLabel = "INSTANT", description = "the instant (UTC), e.g. 2026-03-20T18:30:00Z; default now")
    private String at;

    @Option(names = "--day", paramLabel = "DATE", description = "every hour 00h-23h UTC of this day, e.g. 2026-03-20")
    private String day;

    @Option(names = "--bodies", paramLabel = "LIST", split = ",",
            description = "bodies by name, case-insensitive (sun, moon, venus, mars, jupiter, saturn, aries,"
                    + " a star name or 'HR n'); 'planets' = the four, 'stars' = the 58 navigational stars;"
                    + " default: sun, moon, planets, aries")
    private List<String> bodies;

    @Option(names = "--dut1", paramLabel = "SECONDS", description = "UT1 - UTC in seconds, within ±0.9 (default 0)")
    private double dut1;

    @Option(names = "--format", paramLabel = "FORMAT", description = "text, csv or json (default text)")
    private Format format = Format.TEXT;

    @Override
    public Integer call() {
        PrintWriter out = spec.commandLine().getOut();
        Almanac almanac = Almanac.standard();
        List<Body> list = resolveBodies(almanac);
        List<AstroTime> times = instants();
        List<BodyPosition> rows = new ArrayList<>();
        List<Double> ghaAries = new ArrayList<>();
        for (AstroTime t : times) {
            Almanac.Snapshot s = almanac.at(t);
            ghaAries.add(s.ghaAriesDeg());
            for (Body b : list) {
                rows.add(s.position(b));
            }
        }
        switch (format) {
            case CSV:
                writeCsv(out, rows);
                break;
            case JSON:
                writeJson(out, rows);
                break;
            default:
                writeText(out, times, ghaAries, list.size(), rows);
                break;
        }
        out.flush();
        return 0;
    }

    private List<Body> resolveBodies(Almanac almanac) {
        List<String> names = bodies == null || bodies.isEmpty() ? List.of("sun", "moon", "planets", "aries") : bodies;
        LinkedHashSet<Body> set = new LinkedHashSet<>();
        for (String raw : names) {
            String n = raw.strip();
            if (n.isEmpty()) {
                continue;
            }
            switch (n.toLowerCase(Locale.ROOT)) {
                case "planets":
                    set.addAll(List.of(Body.VENUS, Body.MARS, Body.JUPITER, Body.SATURN));
                    break;
                case "stars":
                    set.addAll(almanac.navigationalStars());
                    break;
                default:
                    set.add(almanac.body(n)); // UnknownBodyException lists the nearest names: exit 2
                    break;
            }
        }
        if (set.isEmpty()) {
            throw new IllegalArgumentException("--bodies names no body; give e.g. sun,moon,planets,aries,stars");
        }
        return new ArrayList<>(set);
    }

    private List<AstroTime> instants() {
        if (at != null && day != null) {
            throw new IllegalArgumentException("give --at or --day, not both");
        }
        List<AstroTime> times = new ArrayList<>();
        if (day != null) {
            LocalDate d;
            try {
                d = LocalDate.parse(day.strip());
            } catch (DateTimeParseException e) {
                throw new IllegalArgumentException("--day '" + day + "' is not a date: expected YYYY-MM-DD such as 2026-03-20");
            }
            Instant start = d.atStartOfDay(ZoneOffset.UTC).toInstant();
            for (int h = 0; h < 24; h++) {
                times.add(AstroTime.ofUtc(start.plus(h, ChronoUnit.HOURS), dut1));
            }
            return times;
        }
        Instant i = at == null ? Instant.now().truncatedTo(ChronoUnit.SECONDS) : parseInstant(at);
        times.add(AstroTime.ofUtc(i, dut1));
        return times;
    }

    static Instant parseInstant(String text) {
        String t = text.strip();
        try {
            return Instant.parse(t);
        } catch (DateTimeParseException e) {
            try {
                return OffsetDateTime.parse(t).toInstant();
            } catch (DateTimeParseException e2) {
                throw new IllegalArgumentException("--at '" + text + "' is not an instant: expected " + INSTANT_FORM);
            }
        }
    }

    private static void writeText(PrintWriter out, List<AstroTime> times, List<Double> ghaAries, int perTime,
            List<BodyPosition> rows) {
        AstroTime first = times.get(0);
        out.printf(Locale.ROOT, "Almanac, apparent geocentric places   DUT1 %+.1f s   TT - UT1 %.1f s%n",
                first.dut1Seconds(), first.deltaTSeconds());
        for (int k = 0; k < times.size(); k++) {
            AstroTime t = times.get(k);
            out.println();
            out.printf(Locale.ROOT, "%s   GHA Aries %s%n", t.utc(), Angles.formatDm(ghaAries.get(k), 3));
            out.printf(Locale.ROOT, "%-16s %10s %10s %10s %6s %6s %5s%n", "body", "GHA", "Dec", "SHA", "HP", "SD", "mag");
            for (int j = 0; j < perTime; j++) {
                BodyPosition p = rows.get(k * perTime + j);
                out.printf(Locale.ROOT, "%-16s %10s %10s %10s %6s %6s %5s%n", p.body().name(),
                        Angles.formatDm(p.ghaDeg(), 3),
                        p.body().equals(Body.ARIES) ? "" : Angles.formatDeclination(p.decDeg()),
                        p.shaDeg().isPresent() ? Angles.formatDm(p.shaDeg().getAsDouble(), 3) : "",
                        arcmin(p.hpArcmin()), arcmin(p.sdArcmin()), mag(p.magnitude()));
            }
        }
        out.println();
        out.println("HP, SD in arcminutes. A computed almanac: check it against the official one (see --help).");
    }

    private static String arcmin(OptionalDouble v) {
        return v.isPresent() ? String.format(Locale.ROOT, "%.1f′", v.getAsDouble()) : "";
    }

    private static String mag(OptionalDouble v) {
        return v.isPresent() ? String.format(Locale.ROOT, "%+.1f", v.getAsDouble()) : "";
    }

    private static void writeCsv(PrintWriter out, List<BodyPosition> rows) {
        out.println("body,utc,ghaDeg,decDeg,shaDeg,hpArcmin,sdArcmin,mag");
        for (BodyPosition p : rows) {
            out.println(String.join(",", csvText(p.body().name()), p.time().utc().toString(),
                    num(p.ghaDeg(), 6), num(p.decDeg(), 6), opt(p.shaDeg(), 6), opt(p.hpArcmin(), 4),
                    opt(p.sdArcmin(), 4), opt(p.magnitude(), 2)));
        }
    }

    private static String csvText(String s) {
        return s.contains(",") || s.contains("\"") ? "\"" + s.replace("\"", "\"\"") + "\"" : s;
    }

    private static String num(double v, int decimals) {
        return String.format(Locale.ROOT, "%." + decimals + "f", v);
    }

    private static String opt(OptionalDouble v, int decimals) {
        return v.isPresent() ? num(v.getAsDouble(), decimals) : "";
    }

    private static void writeJson(PrintWriter out, List<BodyPosition> rows) {
        List<Map<String, Object>> list = new ArrayList<>();
        for (BodyPosition p : rows) {
            Map<String, Object> m = new LinkedHashMap<>();
            m.put("body", p.body().name());
            m.put("utc", p.time().utc().toString());
            m.put("ghaDeg", p.ghaDeg());
            m.put("decDeg", p.decDeg());
            m.put("shaDeg", boxed(p.shaDeg()));
            m.put("hpArcmin", boxed(p.hpArcmin()));
            m.put("sdArcmin", boxed(p.sdArcmin()));
            m.put("mag", boxed(p.magnitude()));
            list.add(m);
        }
        try {
            out.println(new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT).writeValueAsString(list));
        } catch (com.fasterxml.jackson.core.JsonProcessingException e) {
            throw new IllegalStateException("cannot write JSON: " + e.getMessage(), e);
        }
    }

    private static Double boxed(OptionalDouble v) {
        return v.isPresent() ? v.getAsDouble() : null;
    }
}
