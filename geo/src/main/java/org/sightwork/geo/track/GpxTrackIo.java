package org.sightwork.geo.track;

import io.jenetics.jpx.GPX;
import io.jenetics.jpx.WayPoint;
import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Optional;
import org.sightwork.geo.earth.GeoPosition;
import org.sightwork.geo.files.SafeWrite;

/**
 * GPX 1.1 tracks and waypoints, read and written with JPX ({@code io.jenetics:jpx}). Document type
 * declarations and external entities are refused ({@link SafeXmlProvider}).
 *
 * <p>All track points of all tracks and segments become one time-ordered {@link Track}; a point
 * without a time, or repeating a time, is reported by its track, segment and point number and left
 * out. Speed and course come from the GPX 1.0 elements where JPX gives them.
 */
public final class GpxTrackIo {

    /**
     * The content of a GPX file.
     *
     * @param track all timed track points, in time order
     * @param waypoints the waypoints
     */
    public record GpxContent(Track track, List<Waypoint> waypoints) {
        /** Copies the list. */
        public GpxContent {
            waypoints = List.copyOf(waypoints);
        }
    }

    private GpxTrackIo() {
    }

    /**
     * Reads a GPX file.
     *
     * @param file the file
     * @return track and waypoints, with the problems found
     * @throws IOException if the file cannot be read or is not well-formed GPX; the message says why
     */
    public static ImportResult<GpxContent> read(Path file) throws IOException {
        try (InputStream in = Files.newInputStream(file)) {
            return read(in, file.toString());
        }
    }

    /**
     * Reads GPX from a stream.
     *
     * @param in the stream
     * @param fileName the name for messages
     * @return track and waypoints, with the problems found
     * @throws IOException if it is not well-formed GPX or declares a document type
     */
    public static ImportResult<GpxContent> read(InputStream in, String fileName) throws IOException {
        GPX gpx;
        try {
            gpx = GPX.Reader.of(GPX.Reader.Mode.LENIENT).read(in);
        } catch (IOException | RuntimeException e) {
            String why = rootMessage(e);
            if (why.contains("DOCTYPE") || why.contains("DTD") || why.contains("entity")) {
                throw new IOException(fileName + ": refused: the file declares a document type or an entity (DTD),"
                        + " which GPX does not need and which could make the program read other files", e);
            }
            throw new IOException(fileName + ": not a readable GPX 1.1 file: " + why, e);
        }
        Problems problems = new Problems(fileName);
        record P(Instant t, WayPoint w, String where) {
        }
        List<P> points = new ArrayList<>();
        int ti = 0;
        for (var trk : gpx.getTracks()) {
            ti++;
            int si = 0;
            for (var seg : trk.getSegments()) {
                si++;
                int pi = 0;
                for (WayPoint w : seg.getPoints()) {
                    pi++;
                    String where = "track " + ti + ", segment " + si + ", point " + pi;
                    if (w.getTime().isEmpty()) {
                        problems.add(0, 0, where + ": no time: left out");
                    } else {
                        points.add(new P(w.getTime().get(), w, where));
                    }
                }
            }
        }
        points.sort(Comparator.comparing(P::t));
        Track.Builder b = Track.builder();
        for (P p : points) {
            if (p.t().toEpochMilli() <= b.lastTimeMs()) {
                problems.add(0, 0, p.where() + ": time " + p.t() + " repeats an earlier point: left out");
                continue;
            }
            WayPoint w = p.w();
            b.add(p.t().toEpochMilli(), w.getLatitude().doubleValue(), w.getLongitude().doubleValue(),
                    w.getCourse().map(c -> c.doubleValue()).orElse(Double.NaN),
                    w.getSpeed().map(s -> s.doubleValue() * 3600.0 / 1852.0).orElse(Double.NaN), Double.NaN, Double.NaN);
        }
        List<Waypoint> wpts = new ArrayList<>();
        for (WayPoint w : gpx.getWayPoints()) {
            wpts.add(new Waypoint(w.getName().orElse(""),
                    GeoPosition.of(w.getLatitude().doubleValue(), w.getLongitude().doubleValue()), w.getTime()));
        }
        return problems.result(new GpxContent(b.build(), wpts));
    }

    /**
     * Writes a track (and waypoints) as GPX 1.1, atomically.
     *
     * @param file the file
     * @param name the track's name
     * @param track the track
     * @param waypoints waypoints to write too
     * @throws IOException if it cannot be written (the old file is then kept)
     */
    public static void write(Path file, String name, Track track, List<Waypoint> waypoints) throws IOException {
        GPX.Builder gb = GPX.builder().creator("Sightwork");
        for (Waypoint w : waypoints) {
            gb.addWayPoint(wp -> {
                wp.lat(w.position().latDeg()).lon(w.position().lonDeg()).name(w.name());
                w.time().ifPresent(wp::time);
            });
        }
        gb.addTrack(t -> t.name(name).addSegment(s -> {
            for (int i = 0; i < track.size(); i++) {
                final int k = i;
                s.addPoint(p -> p.lat(track.latDeg(k)).lon(track.lonDeg(k)).time(track.time(k)));
            }
        }));
        GPX gpx = gb.build();
        SafeWrite.write(file, out -> GPX.Writer.of(GPX.Writer.Indent.NULL, 9).write(gpx, out));
    }

    private static String rootMessage(Throwable e) {
        Throwable t = e;
        while (t.getCause() != null && t.getCause() != t) {
            t = t.getCause();
        }
        String m = t.getMessage();
        if (e instanceof UncheckedIOException && m == null) {
            m = e.getMessage();
        }
        return Optional.ofNullable(m).orElse(t.getClass().getSimpleName());
    }
}
