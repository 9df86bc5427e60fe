package org.sightwork.celestial.cli;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SequenceWriter;
import com.fasterxml.jackson.databind.SerializationFeature;
import java.io.BufferedWriter;
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

    @Option(names = "--from", paramLabel = "START",
            description = "a table from this date (00h UTC) or instant, e.g. 2026-01-01 or 2026-01-01T06:00:00Z;"
                    + " with --days and --step")
    private String from;

    @Option(names = "--days", paramLabel = "N", description = "with --from: the table covers N days (default 1)")
    private Integer days;

    @Option(names = "--step", paramLabel = "STEP",
            description = "with --from: time between rows, a whole number of s, m, h or d, e.g. 10m, 1h (default 1h)")
    private String step;

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
        // The command's writer flushes at every line; a table of 50,000 lines goes through a buffer
        // (otherwise one write to the terminal or file per line).
        PrintWriter out = new PrintWriter(new BufferedWriter(spec.commandLine().getOut(), 1 << 16), false);
        Almanac almanac = Almanac.standard();
        List<Body> list = resolveBodies(almanac);
        Instants times = instants(); // every instant checked before anything is written
        switch (format) {
            case CSV:
                writeCsv(out, almanac, times, list);
                break;
            case JSON:
                writeJson(out, almanac, times, list);
                break;
            default:
                writeText(out, almanac, times, list);
                break;
        }
        out.flush();
        return 0;
    }

    /**
     * Evenly spaced instants: first + k step for k in [0, count).
     *
     * @param first the first instant (UTC)
     * @param stepSeconds seconds between instants
     * @param count number of instants
     * @param dut1Seconds DUT1 for all
     */
    record Instants(Instant first, long stepSeconds, long count, double dut1Seconds) {
        AstroTime get(long k) {
            return AstroTime.ofUtc(first.plusSeconds(k * stepSeconds), dut1Seconds);
        }
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

    /** Most instants in one table: a year at one-minute steps. */
    static final long MAX_INSTANTS = 527_040;

    private Instants instants() {
        int given = (at != null ? 1 : 0) + (day != null ? 1 : 0) + (from != null ? 1 : 0);
        if (given > 1) {
            throw new IllegalArgumentException("give one of --at, --day or --from");
        }
        if (from == null && (days != null || step != null)) {
            throw new IllegalArgumentException("--days and --step go with --from, e.g. --from 2026-01-01 --days 365 --step 1h");
        }
        Instants times;
        if (day != null) {
            times = new Instants(parseDate(day, "--day").atStartOfDay(ZoneOffset.UTC).toInstant(), 3600, 24, dut1);
        } else if (from != null) {
            String f = from.strip();
            Instant start = f.length() <= 10 ? parseDate(f, "--from").atStartOfDay(ZoneOffset.UTC).toInstant()
                    : parseInstant(f, "--from");
            int n = days == null ? 1 : days;
            if (n < 1 || n > 73_415) {
                throw new IllegalArgumentException("--days " + n + " is outside 1 to 73415 (the span " + AstroTime.SPAN_TEXT + ")");
            }
            long stepS = parseStep(step == null ? "1h" : step);
            long count = (n * 86_400L + stepS - 1) / stepS;
            if (count > MAX_INSTANTS) {
                throw new IllegalArgumentException("--days " + n + " at --step " + step + " makes " + count
                        + " instants; at most " + MAX_INSTANTS + " (a year at 1m) in one table");
            }
            times = new Instants(start, stepS, count, dut1);
        } else {
            Instant i = at == null ? Instant.now().truncatedTo(ChronoUnit.SECONDS) : parseInstant(at, "--at");
            times = new Instants(i, 0, 1, dut1);
        }
        times.get(0); // the span and DUT1 are checked here, before any output
        times.get(times.count() - 1);
        return times;
    }

    private static LocalDate parseDate(String text, String option) {
        try {
            return LocalDate.parse(text.strip());
        } catch (DateTimeParseException e) {
            throw new IllegalArgumentException(option + " '" + text + "' is not a date: expected YYYY-MM-DD such as 2026-03-20");
        }
    }

    /** "10m", "1h", "30s", "1d" to seconds. */
    static long parseStep(String text) {
        String t = text.strip().toLowerCase(Locale.ROOT);
        java.util.regex.Matcher m = java.util.regex.Pattern.compile("([0-9]{1,6})([smhd])").matcher(t);
        if (!m.matches() || Long.parseLong(m.group(1)) == 0) {
            throw new IllegalArgumentException("--step '" + text + "' is not a step: expected a whole number above 0 and"
                    + " s, m, h or d, such as 10m or 1h");
        }
        long unit = switch (m.group(2)) {
            case "s" -> 1L;
            case "m" -> 60L;
            case "h" -> 3600L;
            default -> 86_400L;
        };
        return Long.parseLong(m.group(1)) * unit;
    }

    static Instant parseInstant(String text) {
        return parseInstant(text, "--at");
    }

    static Instant parseInstant(String text, String option) {
        String t = text.strip();
        try {
            return Instant.parse(t);
        } catch (DateTimeParseException e) {
            try {
                return OffsetDateTime.parse(t).toInstant();
            } catch (DateTimeParseException e2) {
                throw new IllegalArgumentException(option + " '" + text + "' is not an instant: expected " + INSTANT_FORM);
            }
        }
    }

    private static void writeText(PrintWriter out, Almanac almanac, Instants times, List<Body> bodies) {
        AstroTime first = times.get(0);
        out.printf(Locale.ROOT, "Almanac, apparent geocentric places   DUT1 %+.1f s   TT - UT1 %.1f s%n",
                first.dut1Seconds(), first.deltaTSeconds());
        for (long k = 0; k < times.count(); k++) {
            AstroTime t = times.get(k);
            Almanac.Snapshot s = almanac.at(t);
            out.println();
            out.printf(Locale.ROOT, "%s   GHA Aries %s%n", t.utc(), Angles.formatDm(s.ghaAriesDeg(), 3));
            out.printf(Locale.ROOT, "%-16s %10s %10s %10s %6s %6s %5s%n", "body", "GHA", "Dec", "SHA", "HP", "SD", "mag");
            for (Body b : bodies) {
                BodyPosition p = s.position(b);
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

    private static void writeCsv(PrintWriter out, Almanac almanac, Instants times, List<Body> bodies) {
        out.println("body,utc,ghaDeg,decDeg,shaDeg,hpArcmin,sdArcmin,mag");
        StringBuilder line = new StringBuilder(96);
        for (long k = 0; k < times.count(); k++) {
            AstroTime t = times.get(k);
            Almanac.Snapshot s = almanac.at(t);
            String utc = t.utc().toString();
            for (Body b : bodies) {
                BodyPosition p = s.position(b);
                line.setLength(0);
                line.append(csvText(b.name())).append(',').append(utc).append(',');
                Decimals.append(line, p.ghaDeg(), 6).append(',');
                Decimals.append(line, p.decDeg(), 6).append(',');
                opt(line, p.shaDeg(), 6).append(',');
                opt(line, p.hpArcmin(), 4).append(',');
                opt(line, p.sdArcmin(), 4).append(',');
                opt(line, p.magnitude(), 2);
                out.println(line);
            }
        }
    }

    private static String csvText(String s) {
        return s.contains(",") || s.contains("\"") ? "\"" + s.replace("\"", "\"\"") + "\"" : s;
    }

    private static StringBuilder opt(StringBuilder sb, OptionalDouble v, int decimals) {
        return v.isPresent() ? Decimals.append(sb, v.getAsDouble(), decimals) : sb;
    }

    private static void writeJson(PrintWriter out, Almanac almanac, Instants times, List<Body> bodies) {
        try (SequenceWriter w = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT)
                .writerWithDefaultPrettyPrinter().writeValues(new NonClosing(out)).init(true)) {
            for (long k = 0; k < times.count(); k++) {
                Almanac.Snapshot s = almanac.at(times.get(k));
                for (Body b : bodies) {
                    BodyPosition p = s.position(b);
                    Map<String, Object> m = new LinkedHashMap<>();
                    m.put("body", p.body().name());
                    m.put("utc", p.time().utc().toString());
                    m.put("ghaDeg", p.ghaDeg());
                    m.put("decDeg", p.decDeg());
                    m.put("shaDeg", boxed(p.shaDeg()));
                    m.put("hpArcmin", boxed(p.hpArcmin()));
                    m.put("sdArcmin", boxed(p.sdArcmin()));
                    m.put("mag", boxed(p.magnitude()));
                    w.write(m);
                }
            }
        } catch (java.io.IOException e) {
            throw new IllegalStateException("cannot write JSON: " + e.getMessage(), e);
        }
        out.println();
    }

    /** The command's writer, left open when the JSON sequence closes. */
    private static final class NonClosing extends java.io.FilterWriter {
        NonClosing(java.io.Writer w) {
            super(w);
        }

        @Override
        public void close() {
            // the caller owns the stream
        }
    }

    private static Double boxed(OptionalDouble v) {
        return v.isPresent() ? v.getAsDouble() : null;
    }
}
