package org.sightwork.celestial.io.export;

import java.time.Instant;
import java.util.List;
import java.util.Objects;
import java.util.Optional;
import org.sightwork.geo.earth.GeoPosition;

/**
 * What a plot export holds: lines (lines of position, running-fix lines), points (fixes, assumed
 * positions) and tracks (DR, GPS), each with a name, a kind and a time.
 *
 * @param title the passage's title (written as the file's name or description)
 * @param lines lines, each at least two vertices
 * @param points points
 * @param tracks time-stamped tracks
 */
public record PlotExport(String title, List<Line> lines, List<Point> points, List<Track> tracks) {

    /** Copies the lists and checks that nothing is null. */
    public PlotExport {
        Objects.requireNonNull(title, "title");
        lines = List.copyOf(lines);
        points = List.copyOf(points);
        tracks = List.copyOf(tracks);
    }

    /**
     * A line such as a line of position.
     *
     * @param name the name, e.g. "Sun LL 09:12"
     * @param kind what it is, e.g. "LOP" or "running-fix LOP"
     * @param utc the time the line is valid for
     * @param description a one-line description (intercept, azimuth), may be empty
     * @param vertices the vertices (at least two), joined by rhumb lines
     */
    public record Line(String name, String kind, Instant utc, String description, List<GeoPosition> vertices) {
        /** Checks the values. */
        public Line {
            Objects.requireNonNull(name, "name");
            Objects.requireNonNull(kind, "kind");
            Objects.requireNonNull(utc, "utc");
            Objects.requireNonNull(description, "description");
            vertices = List.copyOf(vertices);
            if (vertices.size() < 2) {
                throw new IllegalArgumentException("line '" + name + "' has " + vertices.size()
                        + " vertices; at least two are needed");
            }
        }
    }

    /**
     * A point such as a fix.
     *
     * @param name the name, e.g. "Fix 20:31"
     * @param kind what it is, e.g. "fix", "running fix", "AP"
     * @param utc the time
     * @param description a one-line description (ellipse, residuals), may be empty
     * @param position the position
     * @param ellipse95 the 95 % error ellipse, if any
     */
    public record Point(String name, String kind, Instant utc, String description, GeoPosition position,
            Optional<Ellipse> ellipse95) {
        /** Checks the values. */
        public Point {
            Objects.requireNonNull(name, "name");
            Objects.requireNonNull(kind, "kind");
            Objects.requireNonNull(utc, "utc");
            Objects.requireNonNull(description, "description");
            Objects.requireNonNull(position, "position");
            Objects.requireNonNull(ellipse95, "ellipse95");
        }
    }

    /**
     * An error ellipse.
     *
     * @param semiMajorNm semi-major axis (nautical miles)
     * @param semiMinorNm semi-minor axis (nautical miles)
     * @param orientationDeg direction of the major axis (degrees true)
     */
    public record Ellipse(double semiMajorNm, double semiMinorNm, double orientationDeg) {
    }

    /**
     * A time-stamped track.
     *
     * @param name the name, e.g. "GPS" or "DR"
     * @param points the points in time order (at least two)
     */
    public record Track(String name, List<TimedPosition> points) {
        /** Checks the values. */
        public Track {
            Objects.requireNonNull(name, "name");
            points = List.copyOf(points);
            if (points.size() < 2) {
                throw new IllegalArgumentException("track '" + name + "' has " + points.size()
                        + " points; at least two are needed");
            }
        }
    }

    /**
     * A position at a time.
     *
     * @param utc the time
     * @param position the position
     */
    public record TimedPosition(Instant utc, GeoPosition position) {
        /** Checks the values. */
        public TimedPosition {
            Objects.requireNonNull(utc, "utc");
            Objects.requireNonNull(position, "position");
        }
    }
}
