package org.sightwork.celestial.io;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.Reader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.time.Instant;
import java.time.LocalDateTime;
import java.time.OffsetDateTime;
import java.time.ZoneOffset;
import java.time.format.DateTimeParseException;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.Set;
import org.sightwork.celestial.reduction.Sphere;
import org.sightwork.celestial.sight.Corrections;
import org.sightwork.celestial.sight.IndexError;
import org.sightwork.celestial.sight.Limb;
import org.sightwork.celestial.sight.Sight;
import org.sightwork.geo.earth.Angles;
import org.sightwork.geo.earth.GeoPosition;
import org.sightwork.geo.files.CsvLine;

/**
 * Reads the sight log CSV (format in {@code docs/SIGHT-LOG.md}).
 *
 * <p>A header row names the columns, in any order, case and surrounding spaces ignored. Only
 * {@code utc}, {@code body} and {@code hs} are required in every row. A blank cell of
 * {@code index_error}, {@code eye_height_m}, {@code temperature_c}, {@code pressure_hpa},
 * {@code course_deg}, {@code speed_kn} and {@code sigma_arcmin} takes the value of the row above
 * (the sight book's habit of writing a value once); a blank DR is the row above's DR run on along
 * its course and speed to this row's time. With nothing above, the defaults of {@link Sight}.
 *
 * <p>Lines are split by {@link CsvLine} (RFC 4180 quoting: commas, double-quoted cells with "" for a
 * quote), by hand because the error report needs the column of every cell and the project carries
 * no CSV library. Lines starting with {@code #} and blank lines are skipped.
 *
 * <p>Thread safety: stateless.
 */
public final class SightLogReader {

    /** The columns known, in the documented order. */
    public static final List<String> COLUMNS = List.of("utc", "body", "limb", "hs", "index_error", "eye_height_m",
            "temperature_c", "pressure_hpa", "dr_lat", "dr_lon", "course_deg", "speed_kn", "sigma_arcmin",
            "watch_fast_s", "horizon", "shore_nm", "note");

    private static final Set<String> REQUIRED = Set.of("utc", "body", "hs");

    private SightLogReader() {
    }

    /**
     * @param path the file
     * @return the sights and the problems
     * @throws IOException if the file cannot be read at all
     */
    public static SightLog read(Path path) throws IOException {
        try (Reader r = Files.newBufferedReader(path, StandardCharsets.UTF_8)) {
            return read(r, path.getFileName().toString());
        }
    }

    /**
     * @param reader the text
     * @param fileName the name used in messages
     * @return the sights and the problems
     * @throws IOException on a read error
     */
    public static SightLog read(Reader reader, String fileName) throws IOException {
        BufferedReader in = new BufferedReader(reader);
        List<Sight> sights = new ArrayList<>();
        List<Integer> lines = new ArrayList<>();
        List<LogProblem> problems = new ArrayList<>();
        Map<String, Integer> col = new HashMap<>();
        List<String> header = null;
        String text;
        int lineNo = 0;
        Sight previous = null;
        while ((text = in.readLine()) != null) {
            lineNo++;
            if (lineNo == 1 && text.startsWith("\uFEFF")) {
                text = text.substring(1);
            }
            if (text.isBlank() || text.strip().startsWith("#")) {
                continue;
            }
            List<String> cells;
            try {
                cells = CsvLine.split(text).cells();
            } catch (IllegalArgumentException e) {
                problems.add(new LogProblem(fileName, lineNo, 0, "", e.getMessage()));
                continue;
            }
            if (header == null) {
                header = new ArrayList<>();
                for (int i = 0; i < cells.size(); i++) {
                    String name = cells.get(i).strip().toLowerCase(Locale.ROOT);
                    header.add(name);
                    if (!COLUMNS.contains(name)) {
                        problems.add(new LogProblem(fileName, lineNo, i + 1, name,
                                "unknown column '" + name + "' ignored; known columns: " + String.join(", ", COLUMNS)));
                    } else if (col.putIfAbsent(name, i) != null) {
                        problems.add(new LogProblem(fileName, lineNo, i + 1, name, "column '" + name
                                + "' appears twice; the first is used"));
                    }
                }
                for (String req : List.of("utc", "body", "hs")) {
                    if (!col.containsKey(req)) {
                        problems.add(new LogProblem(fileName, lineNo, 0, "", "the header has no '" + req
                                + "' column; utc, body and hs are required"));
                    }
                }
                if (!col.keySet().containsAll(REQUIRED)) {
                    return new SightLog(fileName, sights, lines, problems);
                }
                continue;
            }
            Row row = new Row(fileName, lineNo, cells, col, problems);
            Sight s = row.sight(previous);
            if (s != null) {
                sights.add(s);
                lines.add(lineNo);
                previous = s;
            }
        }
        if (header == null) {
            problems.add(new LogProblem(fileName, Math.max(lineNo, 1), 0, "", "the file is empty: expected a header row "
                    + "naming the columns (utc, body, hs, ...) and a row per sight"));
        }
        return new SightLog(fileName, sights, lines, problems);
    }

    /** One data row: reads cells, records problems, builds the sight. */
    private static final class Row {
        private final String file;
        private final int line;
        private final List<String> cells;
        private final Map<String, Integer> col;
        private final List<LogProblem> problems;
        private boolean bad;

        Row(String file, int line, List<String> cells, Map<String, Integer> col, List<LogProblem> problems) {
            this.file = file;
            this.line = line;
            this.cells = cells;
            this.col = col;
            this.problems = problems;
        }

        Optional<String> cell(String name) {
            Integer i = col.get(name);
            if (i == null || i >= cells.size() || cells.get(i).isBlank()) {
                return Optional.empty();
            }
            return Optional.of(cells.get(i).strip());
        }

        void problem(String name, String message) {
            Integer i = col.get(name);
            problems.add(new LogProblem(file, line, i == null ? 0 : i + 1, name, message));
            bad = true;
        }

        String required(String name, String expected) {
            Optional<String> v = cell(name);
            if (v.isEmpty()) {
                problem(name, "the " + name + " is missing: expected " + expected);
                return null;
            }
            return v.get();
        }

        OptionalDouble number(String name, String unit) {
            Optional<String> v = cell(name);
            if (v.isEmpty()) {
                return OptionalDouble.empty();
            }
            try {
                return OptionalDouble.of(Double.parseDouble(v.get().replace(',', '.')));
            } catch (NumberFormatException e) {
                problem(name, "'" + v.get() + "' is not a number: expected " + unit);
                return OptionalDouble.empty();
            }
        }

        Sight sight(Sight previous) {
            Instant utc = null;
            String u = required("utc", "an ISO 8601 time such as 2025-03-14T05:42:10Z");
            if (u != null) {
                utc = parseTime(u);
                if (utc == null) {
                    problem("utc", "'" + u + "' is not a time: expected ISO 8601 such as 2025-03-14T05:42:10Z "
                            + "(UTC; a local time needs its offset, e.g. 2025-03-14T02:42:10-03:00)");
                }
            }
            String body = required("body", "a body's name such as Sun, Moon, Venus, Sirius");
            double hs = Double.NaN;
            String h = required("hs", "the sextant altitude, e.g. 34°12.4' or 34 12.4 or 34.2067");
            if (h != null) {
                try {
                    hs = Angles.parse(h);
                } catch (IllegalArgumentException e) {
                    problem("hs", e.getMessage());
                }
            }
            Limb limb = null;
            Optional<String> l = cell("limb");
            if (l.isPresent()) {
                limb = switch (l.get().toLowerCase(Locale.ROOT)) {
                    case "lower", "ll", "l" -> Limb.LOWER;
                    case "upper", "ul", "u" -> Limb.UPPER;
                    case "centre", "center", "c" -> Limb.CENTRE;
                    default -> {
                        problem("limb", "'" + l.get() + "' is not a limb: expected lower, upper or centre");
                        yield null;
                    }
                };
            }
            IndexError ie = previous == null ? IndexError.NONE : previous.indexError();
            Optional<String> ieCell = cell("index_error");
            if (ieCell.isPresent()) {
                try {
                    ie = parseIndexError(ieCell.get());
                } catch (IllegalArgumentException e) {
                    problem("index_error", e.getMessage());
                }
            }
            double eye = previous == null ? 0.0 : previous.eyeHeightM();
            Optional<String> eyeCell = cell("eye_height_m");
            if (eyeCell.isPresent()) {
                try {
                    eye = parseEyeHeight(eyeCell.get());
                } catch (IllegalArgumentException e) {
                    problem("eye_height_m", e.getMessage());
                }
            }
            double temp = number("temperature_c", "degrees Celsius, e.g. 18.5")
                    .orElse(previous == null ? Sight.DEFAULT_TEMPERATURE_C : previous.temperatureC());
            double press = number("pressure_hpa", "hectopascals, e.g. 1013")
                    .orElse(previous == null ? Sight.DEFAULT_PRESSURE_HPA : previous.pressureHpa());
            double sigma = number("sigma_arcmin", "minutes of arc, e.g. 1.0")
                    .orElse(previous == null ? Sight.DEFAULT_SIGMA_ARCMIN : previous.sigmaArcmin());
            double fast = number("watch_fast_s", "seconds, + when the watch is fast").orElse(
                    previous == null ? 0.0 : previous.watchFastSeconds());
            OptionalDouble course = number("course_deg", "degrees true, e.g. 245");
            if (course.isEmpty() && previous != null) {
                course = previous.courseDeg();
            }
            OptionalDouble speed = number("speed_kn", "knots, e.g. 6.5");
            if (speed.isEmpty() && previous != null) {
                speed = previous.speedKn();
            }
            OptionalDouble shore = number("shore_nm", "nautical miles to a shore horizon, e.g. 1.5");
            boolean artificial = false;
            Optional<String> hz = cell("horizon");
            if (hz.isPresent()) {
                switch (hz.get().toLowerCase(Locale.ROOT)) {
                    case "sea" -> artificial = false;
                    case "artificial", "art" -> artificial = true;
                    default -> problem("horizon", "'" + hz.get() + "' is not a horizon: expected sea or artificial");
                }
            }
            if (!Double.isNaN(hs) && !artificial && (hs < -1.0 || hs > 90.0)) {
                problem("hs", "sextant altitude " + Angles.formatDm(hs, 2)
                        + " is outside -1° to 90°: check the reading (degrees and minutes)");
            }
            Optional<GeoPosition> dr = dr(previous, utc);
            if (bad) {
                return null;
            }
            try {
                Sight.Builder b = Sight.builder(body, utc, hs).limb(limb).indexError(ie).eyeHeightM(eye)
                        .temperatureC(temp).pressureHpa(press).sigmaArcmin(sigma).watchFastSeconds(fast)
                        .artificialHorizon(artificial).note(cell("note").orElse(""));
                dr.ifPresent(b::dr);
                course.ifPresent(b::courseDeg);
                speed.ifPresent(b::speedKn);
                shore.ifPresent(b::dipShortNm);
                return b.build();
            } catch (IllegalArgumentException e) {
                problems.add(new LogProblem(file, line, 0, "", e.getMessage()));
                return null;
            }
        }

        private Optional<GeoPosition> dr(Sight previous, Instant utc) {
            Optional<String> lat = cell("dr_lat");
            Optional<String> lon = cell("dr_lon");
            if (lat.isPresent() != lon.isPresent()) {
                problem(lat.isPresent() ? "dr_lon" : "dr_lat", "a DR needs both dr_lat and dr_lon");
                return Optional.empty();
            }
            if (lat.isPresent()) {
                double la = Double.NaN;
                double lo = Double.NaN;
                try {
                    la = Angles.parseLatitude(lat.get());
                } catch (IllegalArgumentException e) {
                    problem("dr_lat", e.getMessage());
                }
                try {
                    lo = Angles.parseLongitude(lon.get());
                } catch (IllegalArgumentException e) {
                    problem("dr_lon", e.getMessage());
                }
                return Double.isNaN(la) || Double.isNaN(lo) ? Optional.empty() : Optional.of(GeoPosition.of(la, lo));
            }
            if (previous == null || previous.dr().isEmpty() || utc == null) {
                return Optional.empty();
            }
            GeoPosition p = previous.dr().get();
            if (previous.courseDeg().isPresent() && previous.speedKn().isPresent()) {
                double hours = Duration.between(previous.utc(), utc).toNanos() / 3.6e12;
                try {
                    p = Sphere.rhumb(p, previous.courseDeg().getAsDouble(), previous.speedKn().getAsDouble() * hours);
                } catch (IllegalArgumentException e) {
                    problem("dr_lat", e.getMessage());
                    return Optional.empty();
                }
            }
            return Optional.of(p);
        }
    }

    /**
     * Reads an index error: {@code 1.2 on}, {@code 0.8 off} (minutes, the sense in words), or a
     * signed number of minutes with + meaning on the arc.
     *
     * @param text the cell
     * @return the index error
     */
    public static IndexError parseIndexError(String text) {
        String t = text.strip().toLowerCase(Locale.ROOT).replace("′", "").replace("'", "");
        String expected = "minutes with the sense, e.g. '1.2 on' or '0.8 off', or signed (+ on the arc)";
        try {
            if (t.endsWith("on") || t.endsWith("off")) {
                boolean on = t.endsWith("on");
                double v = Double.parseDouble(t.substring(0, t.length() - (on ? 2 : 3)).strip().replace(',', '.'));
                if (v < 0) {
                    throw new IllegalArgumentException("index error '" + text + "': a sense in words takes no sign");
                }
                return on ? IndexError.onArc(v) : IndexError.offArc(v);
            }
            return IndexError.ofSignedReading(Double.parseDouble(t.replace(',', '.')));
        } catch (NumberFormatException e) {
            throw new IllegalArgumentException("'" + text + "' is not an index error: expected " + expected);
        }
    }

    /**
     * Reads a height of eye in metres, or in feet when followed by {@code ft} (or {@code '}).
     *
     * @param text the cell
     * @return height (metres)
     */
    public static double parseEyeHeight(String text) {
        String t = text.strip().toLowerCase(Locale.ROOT);
        double factor = 1.0;
        if (t.endsWith("ft") || t.endsWith("feet")) {
            factor = Corrections.METRES_PER_FOOT;
            t = t.replace("feet", "").replace("ft", "").strip();
        } else if (t.endsWith("m")) {
            t = t.substring(0, t.length() - 1).strip();
        }
        try {
            return Double.parseDouble(t.replace(',', '.')) * factor;
        } catch (NumberFormatException e) {
            throw new IllegalArgumentException("'" + text + "' is not a height of eye: expected metres (e.g. 2.5) "
                    + "or feet with ft (e.g. 8 ft)");
        }
    }

    /**
     * Reads an ISO 8601 time: with Z or an offset; without one it is taken as UTC.
     *
     * @param text the cell
     * @return the instant, or null if unreadable
     */
    static Instant parseTime(String text) {
        try {
            return OffsetDateTime.parse(text).toInstant();
        } catch (DateTimeParseException e) {
            try {
                return LocalDateTime.parse(text.replace(' ', 'T')).toInstant(ZoneOffset.UTC);
            } catch (DateTimeParseException e2) {
                return null;
            }
        }
    }
}
