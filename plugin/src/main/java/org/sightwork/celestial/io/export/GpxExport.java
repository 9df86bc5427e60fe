package org.sightwork.celestial.io.export;

import org.sightwork.geo.files.SafeWrite;
import io.jenetics.jpx.GPX;
import io.jenetics.jpx.Route;
import io.jenetics.jpx.Track;
import io.jenetics.jpx.TrackSegment;
import io.jenetics.jpx.WayPoint;
import java.io.IOException;
import java.nio.file.Path;
import org.sightwork.geo.earth.GeoPosition;

/**
 * Writes a plot as GPX 1.1 with JPX: points (fixes, assumed positions) as waypoints with their time,
 * lines of position as routes (GPX has no other plain line; each vertex carries the line's time),
 * tracks as tracks of one segment. The {@code type} element carries the kind ("fix", "LOP",
 * "running-fix LOP", "track"); the {@code desc} element the one-line description.
 *
 * <p><b>Thread safety:</b> stateless.
 */
public final class GpxExport {

    private GpxExport() {
    }

    /**
     * Writes the plot (through a temporary file and a rename).
     *
     * @param plot what to write
     * @param target the file
     * @throws IOException if the file cannot be written; the target is then unchanged
     */
    public static void write(PlotExport plot, Path target) throws IOException {
        GPX gpx = toGpx(plot);
        SafeWrite.writeFile(target, SafeWrite.Previous.DISCARD, tmp -> GPX.Writer.DEFAULT.write(gpx, tmp));
    }

    /**
     * The plot as a JPX document.
     *
     * @param plot what to write
     * @return the GPX document
     */
    static GPX toGpx(PlotExport plot) {
        GPX.Builder gpx = GPX.builder("Sightwork").metadata(m -> m.name(plot.title()));
        for (PlotExport.Point p : plot.points()) {
            gpx.addWayPoint(WayPoint.builder().name(p.name()).type(p.kind()).desc(p.description())
                    .time(p.utc()).build(p.position().latDeg(), p.position().lonDeg()));
        }
        for (PlotExport.Line l : plot.lines()) {
            Route.Builder r = Route.builder().name(l.name()).type(l.kind()).desc(l.description());
            for (GeoPosition v : l.vertices()) {
                r.addPoint(WayPoint.builder().time(l.utc()).build(v.latDeg(), v.lonDeg()));
            }
            gpx.addRoute(r.build());
        }
        for (PlotExport.Track t : plot.tracks()) {
            TrackSegment.Builder s = TrackSegment.builder();
            for (PlotExport.TimedPosition p : t.points()) {
                s.addPoint(WayPoint.builder().time(p.utc()).build(p.position().latDeg(), p.position().lonDeg()));
            }
            gpx.addTrack(Track.builder().name(t.name()).type("track").addSegment(s.build()).build());
        }
        return gpx.build();
    }
}
