package org.sightwork.geo.track;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.Reader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.OptionalDouble;
import org.sightwork.geo.earth.GeoPosition;
import org.sightwork.geo.files.CsvLine;

/**
 * A dead-reckoning log: a departure and the legs steered after it.
 *
 * <p>The CSV form (our own): a header naming the columns, then one line per leg, in time order:
 * <pre>
 * time_utc,heading_deg,stw_kn,leeway_deg,lat,lon,note
 * 2026-06-21T06:00:00Z,108,6.0,0,38°31.8'N,028°37.8'W,departure Horta
 * 2026-06-21T09:30:00Z,112,6.5,3,,,wind backing
 * </pre>
 * {@code leeway_deg} and {@code note} may be left out or empty; {@code lat} and {@code lon} (signed
 * degrees or d°m.m′ with N/S/E/W) are required on the first line, the departure, and not used
 * after it. A last line may give only a time and an empty heading: the end of the log.
 *
 * @param departure the position at the start of the first leg
 * @param legs the legs, in time order, at least one
 * @param end the end of the log, after the last leg's start (the last leg runs until then)
 */
public record DrLog(GeoPosition departure, List<DrLeg> legs, Instant end) {

    /** The header written in examples and expected in files (order free). */
    public static final String HEADER = "time_utc,heading_deg,stw_kn,leeway_deg,lat,lon,note";

    /** Checks order and copies the list. */
    public DrLog {
        Objects.requireNonNull(departure, "departure");
        Objects.requireNonNull(end, "end");
        legs = List.copyOf(legs);
        if (legs.isEmpty()) {
            throw new IllegalArgumentException("a DR log needs at least one leg");
        }
        for (int i = 1; i < legs.size(); i++) {
            if (!legs.get(i).start().isAfter(legs.get(i - 1).start())) {
                throw new IllegalArgumentException("DR leg " + (i + 1) + " does not start after leg " + i);
            }
        }
        if (!end.isAfter(legs.get(legs.size() - 1).start())) {
            throw new IllegalArgumentException("the DR log ends at " + end + ", before its last leg starts");
        }
    }

    /** @return the time of departure */
    public Instant start() {
        return legs.get(0).start();
    }

    /**
     * The leg in force at a time.
     *
     * @param t the time
     * @return the index of the leg, or -1 before departure
     */
    public int legAt(Instant t) {
        int k = -1;
        for (int i = 0; i < legs.size() && !legs.get(i).start().isAfter(t); i++) {
            k = i;
        }
        return k;
    }

    /**
     * Builds a DR log from a track's heading and speed through the water (NMEA HDT/HDG and VHW):
     * each point that has both starts a leg; the departure is the track's first position.
     *
     * @param track the track
     * @return the DR log, or empty when the track has no heading with speed through the water
     */
    public static java.util.Optional<DrLog> fromTrack(Track track) {
        List<DrLeg> legs = new ArrayList<>();
        GeoPosition dep = null;
        for (int i = 0; i < track.size(); i++) {
            OptionalDouble h = track.headingDeg(i);
            OptionalDouble s = track.stwKn(i);
            if (h.isPresent() && s.isPresent()) {
                if (dep == null) {
                    dep = new GeoPosition(track.latDeg(i), track.lonDeg(i));
                }
                double hd = h.getAsDouble() % 360.0;
                legs.add(new DrLeg(track.time(i), hd < 0 ? hd + 360 : hd, Math.max(0, s.getAsDouble()), 0.0));
            }
        }
        if (legs.isEmpty() || !track.end().get().isAfter(legs.get(legs.size() - 1).start())) {
            if (legs.size() < 2) {
                return java.util.Optional.empty();
            }
            Instant end = legs.get(legs.size() - 1).start();
            return java.util.Optional.of(new DrLog(dep, legs.subList(0, legs.size() - 1), end));
        }
        return java.util.Optional.of(new DrLog(dep, legs, track.end().get()));
    }

    /**
     * Reads a DR log in the CSV form above.
     *
     * @param file the file
     * @return the log (empty value when no departure or leg could be read) and the problems
     * @throws IOException if the file cannot be read
     */
    public static ImportResult<java.util.Optional<DrLog>> read(Path file) throws IOException {
        try (Reader r = Files.newBufferedReader(file, StandardCharsets.UTF_8)) {
            return read(r, file.toString());
        }
    }

    /**
     * Reads a DR log from a reader.
     *
     * @param reader the text
     * @param fileName the name for messages
     * @return the log and the problems
     * @throws IOException if it cannot be read
     */
    public static ImportResult<java.util.Optional<DrLog>> read(Reader reader, String fileName) throws IOException {
        Problems problems = new Problems(fileName);
        BufferedReader in = new BufferedReader(reader);
        Map<String, Integer> col = null;
        List<DrLeg> legs = new ArrayList<>();
        GeoPosition dep = null;
        Instant end = null;
        String s;
        long lineNo = 0;
        while ((s = in.readLine()) != null) {
            lineNo++;
            if (s.isBlank() || s.startsWith("#")) {
                continue;
            }
            CsvLine cells = CsvTrackIo.split(s, lineNo, problems);
            if (cells == null) {
                if (col == null) {
                    return problems.result(java.util.Optional.empty());
                }
                continue;
            }
            if (col == null) {
                col = cells.indexByName();
                for (String needed : new String[] {"time_utc", "heading_deg", "stw_kn"}) {
                    if (!col.containsKey(needed)) {
                        problems.add(lineNo, 0, "the header has no column '" + needed + "': expected " + HEADER);
                        return problems.result(java.util.Optional.empty());
                    }
                }
                continue;
            }
            CsvTrackIo.Cells c = new CsvTrackIo.Cells(cells, col, lineNo, problems);
            try {
                Instant t = c.time("time_utc");
                if (!legs.isEmpty() && !t.isAfter(legs.get(legs.size() - 1).start())) {
                    problems.add(lineNo, c.column("time_utc"), "time " + t + " is not after the leg before: left out");
                    continue;
                }
                if (c.raw("heading_deg").isEmpty() && c.raw("stw_kn").isEmpty()) {
                    end = t;
                    break;
                }
                if (dep == null) {
                    if (c.raw("lat").isEmpty() || c.raw("lon").isEmpty()) {
                        problems.add(lineNo, Math.max(1, c.column("lat")),
                                "the first leg needs the departure position in 'lat' and 'lon'");
                        continue;
                    }
                    dep = GeoPosition.of(c.latitude("lat"), c.longitude("lon"));
                }
                double h = c.number("heading_deg", "degrees true");
                double v = c.number("stw_kn", "knots");
                double lw = c.raw("leeway_deg").isEmpty() ? 0.0 : c.number("leeway_deg", "degrees");
                try {
                    legs.add(new DrLeg(t, h == 360 ? 0 : h, v, lw));
                } catch (IllegalArgumentException e) {
                    problems.add(lineNo, 0, e.getMessage());
                }
            } catch (IllegalArgumentException e) {
                // reported by Cells
            }
        }
        if (dep == null || legs.isEmpty()) {
            problems.add(0, 0, "no departure and leg could be read: expected the header " + HEADER);
            return problems.result(java.util.Optional.empty());
        }
        if (end == null) {
            problems.add(0, 0, "no end line (a time with empty heading and speed): the last leg is taken to run 24 h");
            end = legs.get(legs.size() - 1).start().plusSeconds(86_400);
        }
        return problems.result(java.util.Optional.of(new DrLog(dep, legs, end)));
    }
}
