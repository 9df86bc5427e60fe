package org.sightwork.geo.track;

import java.io.BufferedReader;
import java.io.BufferedWriter;
import java.io.IOException;
import java.io.OutputStreamWriter;
import java.io.Reader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.time.format.DateTimeParseException;
import java.util.Locale;
import java.util.Map;
import java.util.OptionalDouble;
import org.sightwork.geo.files.CsvLine;
import org.sightwork.geo.files.SafeWrite;

/**
 * Our plain CSV track. The first line names the columns; the order is free, unknown columns are
 * passed over:
 * <pre>
 * time_utc,lat_deg,lon_deg[,cog_deg][,sog_kn][,heading_deg][,stw_kn]
 * 2026-06-21T06:00:00Z,38.5300,-28.6300,112.0,6.2,,
 * </pre>
 * {@code time_utc} is ISO 8601 with a zone ({@code Z}); latitude and longitude are signed decimal
 * degrees (north and east positive), or d°m.m′ with a hemisphere letter ({@code 38°31.8'N}).
 * Empty cells are absent values. Lines starting with {@code #} are comments.
 */
public final class CsvTrackIo {

    /** The header written by {@link #write}. */
    public static final String HEADER = "time_utc,lat_deg,lon_deg,cog_deg,sog_kn,heading_deg,stw_kn";

    private CsvTrackIo() {
    }

    /**
     * Reads a CSV track.
     *
     * @param file the file
     * @return the track and the problems with its lines
     * @throws IOException if the file cannot be read
     */
    public static ImportResult<Track> read(Path file) throws IOException {
        try (Reader r = Files.newBufferedReader(file, StandardCharsets.UTF_8)) {
            return read(r, file.toString());
        }
    }

    /**
     * Reads a CSV track from a reader.
     *
     * @param reader the text
     * @param fileName the name for messages
     * @return the track and the problems with its lines
     * @throws IOException if it cannot be read
     */
    public static ImportResult<Track> read(Reader reader, String fileName) throws IOException {
        Problems problems = new Problems(fileName);
        Track.Builder b = Track.builder();
        BufferedReader in = new BufferedReader(reader);
        Map<String, Integer> col = null;
        String s;
        long lineNo = 0;
        while ((s = in.readLine()) != null) {
            lineNo++;
            if (s.isBlank() || s.startsWith("#")) {
                continue;
            }
            CsvLine cells = split(s, lineNo, problems);
            if (cells == null) {
                if (col == null) {
                    return problems.result(b.build());
                }
                continue;
            }
            if (col == null) {
                col = cells.indexByName();
                for (String needed : new String[] {"time_utc", "lat_deg", "lon_deg"}) {
                    if (!col.containsKey(needed)) {
                        problems.add(lineNo, 0, "the header has no column '" + needed + "': expected " + HEADER);
                        return problems.result(b.build());
                    }
                }
                continue;
            }
            Cells c = new Cells(cells, col, lineNo, problems);
            try {
                Instant t = c.time("time_utc");
                double lat = c.latitude("lat_deg");
                double lon = c.longitude("lon_deg");
                if (t.toEpochMilli() <= b.lastTimeMs()) {
                    problems.add(lineNo, c.column("time_utc"), "time " + t + " is not after the line before: left out");
                    continue;
                }
                b.add(t.toEpochMilli(), lat, lon, c.optional("cog_deg"), c.optional("sog_kn"), c.optional("heading_deg"),
                        c.optional("stw_kn"));
            } catch (IllegalArgumentException e) {
                // reported by Cells
            }
        }
        if (col == null) {
            problems.add(0, 0, "the file is empty: expected the header " + HEADER);
        }
        return problems.result(b.build());
    }

    /**
     * Writes a track as CSV, atomically.
     *
     * @param file the file
     * @param track the track
     * @throws IOException if it cannot be written (the old file is then kept)
     */
    public static void write(Path file, Track track) throws IOException {
        SafeWrite.write(file, out -> {
            BufferedWriter w = new BufferedWriter(new OutputStreamWriter(out, StandardCharsets.UTF_8));
            w.write(HEADER);
            w.newLine();
            for (int i = 0; i < track.size(); i++) {
                w.write(track.time(i).toString());
                w.write(String.format(Locale.ROOT, ",%.7f,%.7f,%s,%s,%s,%s", track.latDeg(i), track.lonDeg(i),
                        cell(track.cogDeg(i)), cell(track.sogKn(i)), cell(track.headingDeg(i)), cell(track.stwKn(i))));
                w.newLine();
            }
            w.flush();
        });
    }

    private static String cell(OptionalDouble v) {
        return v.isPresent() ? String.format(Locale.ROOT, "%.2f", v.getAsDouble()) : "";
    }

    /**
     * Splits one CSV line, or reports why it cannot. Also used by the DR log.
     *
     * @return the cells, or null when a quoted cell is not closed (reported)
     */
    static CsvLine split(String s, long lineNo, Problems problems) {
        try {
            return CsvLine.split(s);
        } catch (IllegalArgumentException e) {
            problems.add(lineNo, 0, e.getMessage());
            return null;
        }
    }

    /** Reads the cells of one CSV line, reporting what it cannot read. Also used by the DR log. */
    static final class Cells {
        private final CsvLine cells;
        private final Map<String, Integer> col;
        private final long lineNo;
        private final Problems problems;

        Cells(CsvLine cells, Map<String, Integer> col, long lineNo, Problems problems) {
            this.cells = cells;
            this.col = col;
            this.lineNo = lineNo;
            this.problems = problems;
        }

        int column(String name) {
            Integer i = col.get(name);
            return i == null ? 0 : CsvLine.column(i);
        }

        String raw(String name) {
            Integer i = col.get(name);
            return i == null ? "" : cells.cell(i).strip();
        }

        private IllegalArgumentException fail(String name, String message) {
            problems.add(lineNo, column(name), message);
            return new IllegalArgumentException(message);
        }

        Instant time(String name) {
            String v = raw(name);
            try {
                return Instant.parse(v);
            } catch (DateTimeParseException e) {
                throw fail(name, name + " '" + v + "' is not a UTC time such as 2026-06-21T06:00:00Z");
            }
        }

        double latitude(String name) {
            String v = raw(name);
            try {
                return org.sightwork.geo.earth.Angles.parseLatitude(v);
            } catch (IllegalArgumentException e) {
                throw fail(name, name + ": " + e.getMessage());
            }
        }

        double longitude(String name) {
            String v = raw(name);
            try {
                double lon = org.sightwork.geo.earth.Angles.parseLongitude(v);
                return lon >= 180 ? lon - 360 : lon;
            } catch (IllegalArgumentException e) {
                throw fail(name, name + ": " + e.getMessage());
            }
        }

        double number(String name, String unit) {
            String v = raw(name);
            return CsvLine.finiteNumber(v)
                    .orElseThrow(() -> fail(name, name + " '" + v + "' is not a number (" + unit + ")"));
        }

        double optional(String name) {
            String v = raw(name);
            if (v.isEmpty()) {
                return Double.NaN;
            }
            return number(name, name.substring(name.lastIndexOf('_') + 1));
        }
    }
}
