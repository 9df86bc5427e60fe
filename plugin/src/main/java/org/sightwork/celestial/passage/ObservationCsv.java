package org.sightwork.celestial.passage;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.Reader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.time.format.DateTimeParseException;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.sightwork.geo.earth.Angles;
import org.sightwork.geo.files.CsvLine;
import org.sightwork.geo.earth.GeoPosition;
import org.sightwork.geo.track.ImportProblem;
import org.sightwork.geo.track.ImportResult;

/**
 * Celestial observations from our own CSV: one line per line of position or per fix.
 * <pre>
 * time_utc,kind,lat,lon,azimuth_deg,intercept_nm,sigma_nm,sigma_east_nm,sigma_north_nm,correlation,label
 * 2026-06-21T05:12:00Z,lop,38°20.0'N,028°10.0'W,62.4,-3.2,0.7,,,,Vega
 * 2026-06-21T12:40:00Z,fix,38°11.3'N,027°31.0'W,,,0.8,,,,noon fix
 * </pre>
 * For {@code lop}, {@code lat}/{@code lon} are the assumed position, {@code azimuth_deg} the body's
 * azimuth Zn, {@code intercept_nm} positive towards, {@code sigma_nm} the line's standard error.
 * For {@code fix}, {@code lat}/{@code lon} are the fix, with either {@code sigma_nm} (round) or
 * {@code sigma_east_nm}, {@code sigma_north_nm} and {@code correlation}. Column order is free;
 * lines starting with {@code #} are comments.
 */
public final class ObservationCsv {

    /** The header of the format. */
    public static final String HEADER =
            "time_utc,kind,lat,lon,azimuth_deg,intercept_nm,sigma_nm,sigma_east_nm,sigma_north_nm,correlation,label";

    private ObservationCsv() {
    }

    /**
     * Reads observations.
     *
     * @param file the file
     * @return the observations and the problems with the lines left out
     * @throws IOException if the file cannot be read
     */
    public static ImportResult<List<CelestialObservation>> read(Path file) throws IOException {
        try (Reader r = Files.newBufferedReader(file, StandardCharsets.UTF_8)) {
            return read(r, file.toString());
        }
    }

    /**
     * Reads observations from a reader.
     *
     * @param reader the text
     * @param name the file name for messages
     * @return the observations and the problems
     * @throws IOException if it cannot be read
     */
    public static ImportResult<List<CelestialObservation>> read(Reader reader, String name) throws IOException {
        List<ImportProblem> problems = new ArrayList<>();
        List<CelestialObservation> out = new ArrayList<>();
        BufferedReader in = new BufferedReader(reader);
        Map<String, Integer> col = null;
        String s;
        long line = 0;
        while ((s = in.readLine()) != null) {
            line++;
            if (s.isBlank() || s.startsWith("#")) {
                continue;
            }
            CsvLine c;
            try {
                c = CsvLine.split(s);
            } catch (IllegalArgumentException e) {
                problems.add(new ImportProblem(name, line, 0, e.getMessage()));
                if (col == null) {
                    return new ImportResult<>(out, problems, problems.size());
                }
                continue;
            }
            if (col == null) {
                col = c.indexByName();
                for (String need : new String[] {"time_utc", "kind", "lat", "lon"}) {
                    if (!col.containsKey(need)) {
                        problems.add(new ImportProblem(name, line, 0, "the header has no column '" + need
                                + "': expected " + HEADER));
                        return new ImportResult<>(out, problems, problems.size());
                    }
                }
                continue;
            }
            Row r = new Row(c, col, name, line);
            try {
                Instant t = r.time();
                String kind = r.raw("kind").toLowerCase(Locale.ROOT);
                GeoPosition p = GeoPosition.of(r.angle("lat", true), r.angle("lon", false));
                String label = r.raw("label").isEmpty() ? kind + " " + line : r.raw("label");
                if (kind.equals("lop")) {
                    double z = r.number("azimuth_deg", "degrees");
                    out.add(new CelestialObservation.Line(t, label, p, z == 360 ? 0 : z, r.number("intercept_nm", "nm"),
                            r.number("sigma_nm", "nm")));
                } else if (kind.equals("fix")) {
                    if (!r.raw("sigma_east_nm").isEmpty()) {
                        double rho = r.raw("correlation").isEmpty() ? 0 : r.number("correlation", "-1 to 1");
                        out.add(new CelestialObservation.Position(t, label, p, r.number("sigma_east_nm", "nm"),
                                r.number("sigma_north_nm", "nm"), rho));
                    } else {
                        double sg = r.number("sigma_nm", "nm");
                        out.add(new CelestialObservation.Position(t, label, p, sg, sg, 0));
                    }
                } else {
                    throw r.fail("kind", "kind '" + r.raw("kind") + "' should be lop or fix");
                }
            } catch (IllegalArgumentException e) {
                problems.add(new ImportProblem(name, line, r.lastColumn, e.getMessage()));
            }
        }
        if (col == null) {
            problems.add(new ImportProblem(name, 0, 0, "the file is empty: expected the header " + HEADER));
        }
        return new ImportResult<>(out, problems, problems.size());
    }

    private static final class Row {
        final CsvLine c;
        final Map<String, Integer> col;
        int lastColumn;

        Row(CsvLine c, Map<String, Integer> col, String name, long line) {
            this.c = c;
            this.col = col;
        }

        String raw(String k) {
            Integer i = col.get(k);
            lastColumn = i == null ? 0 : CsvLine.column(i);
            return i == null ? "" : c.cell(i).strip();
        }

        IllegalArgumentException fail(String k, String msg) {
            raw(k);
            return new IllegalArgumentException(msg);
        }

        Instant time() {
            String v = raw("time_utc");
            try {
                return Instant.parse(v);
            } catch (DateTimeParseException e) {
                throw new IllegalArgumentException("time_utc '" + v + "' is not a UTC time such as 2026-06-21T05:12:00Z");
            }
        }

        double angle(String k, boolean lat) {
            String v = raw(k);
            return lat ? Angles.parseLatitude(v) : Angles.parseLongitude(v);
        }

        double number(String k, String unit) {
            String v = raw(k);
            return CsvLine.finiteNumber(v)
                    .orElseThrow(() -> new IllegalArgumentException(k + " '" + v + "' is not a number (" + unit + ")"));
        }
    }
}
