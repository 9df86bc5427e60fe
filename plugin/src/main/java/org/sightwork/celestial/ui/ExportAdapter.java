package org.sightwork.celestial.ui;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import org.sightwork.celestial.fix.Fix;
import org.sightwork.celestial.io.export.PlotExport;
import org.sightwork.celestial.io.export.WorksheetReport;
import org.sightwork.celestial.reduction.LineOfPosition;
import org.sightwork.geo.app.Caution;
import org.sightwork.geo.earth.GeoPosition;
import org.sightwork.geo.track.Track;

/**
 * Fills the exporters' neutral model from the plot: lines of position (as drawn on the chart),
 * running-fix lines, fixes with their ellipses, assumed positions, the DR and GPS tracks; and the
 * printed worksheet of every sight and fix.
 *
 * <p><b>Thread:</b> JavaFX application thread (reads the model).
 */
final class ExportAdapter {

    private ExportAdapter() {
    }

    static PlotExport plot(PassageModel model) {
        Plot p = model.plot().get();
        List<PlotExport.Line> lines = new ArrayList<>();
        List<PlotExport.Point> points = new ArrayList<>();
        for (Plot.SightResult s : p.sights()) {
            s.reduced().ifPresent(r -> {
                LineOfPosition l = r.lop();
                lines.add(new PlotExport.Line(l.label(), "LOP", l.utc(), PlotOverlays.lopLabel(l)
                        + String.format(Locale.ROOT, ", Zn %05.1f", l.znDeg()),
                        PlotOverlays.lopEnds(l.interceptPoint(), l.znDeg())));
                points.add(new PlotExport.Point("AP " + l.label(), "AP", l.utc(), "", l.ap(), Optional.empty()));
            });
        }
        for (Plot.FixResult f : p.fixes()) {
            if (f.fix().isEmpty()) {
                continue;
            }
            Fix x = f.fix().get();
            for (Plot.AdvancedLine a : f.advanced()) {
                lines.add(new PlotExport.Line(p.sights().get(a.row()).label() + " advanced", "running-fix LOP", a.to(),
                        String.format(Locale.ROOT, "run %.1f nm", a.runNm()), PlotOverlays.lopEnds(a.interceptPoint(), a.znDeg())));
            }
            points.add(new PlotExport.Point(WorksheetText.heading(f), f.isRunning() ? "running fix" : "fix", x.utc(),
                    String.format(Locale.ROOT, "%d lines", x.usedLines().size()), x.position(),
                    Optional.of(new PlotExport.Ellipse(x.ellipse95().majorNm(), x.ellipse95().minorNm(),
                            x.ellipse95().orientationDeg()))));
        }
        List<PlotExport.Track> tracks = new ArrayList<>();
        if (p.drTrack().size() >= 2) {
            tracks.add(new PlotExport.Track("DR", p.drTrack().stream()
                    .map(t -> new PlotExport.TimedPosition(t.utc(), t.position())).toList()));
        }
        p.gps().filter(t -> t.size() >= 2).ifPresent(t -> tracks.add(new PlotExport.Track("GPS", gpsPoints(t))));
        return new PlotExport(model.passage().title(), lines, points, tracks);
    }

    private static List<PlotExport.TimedPosition> gpsPoints(Track t) {
        List<PlotExport.TimedPosition> out = new ArrayList<>(t.size());
        for (int i = 0; i < t.size(); i++) {
            out.add(new PlotExport.TimedPosition(t.time(i), new GeoPosition(t.latDeg(i), t.lonDeg(i))));
        }
        return out;
    }

    static WorksheetReport worksheet(PassageModel model) {
        Plot p = model.plot().get();
        List<WorksheetReport.Section> sections = new ArrayList<>();
        for (Plot.SightResult s : p.sights()) {
            sections.add(new WorksheetReport.Section(WorksheetText.heading(s), WorksheetText.sight(s)));
        }
        for (Plot.FixResult f : p.fixes()) {
            sections.add(new WorksheetReport.Section(WorksheetText.heading(f), WorksheetText.fix(f, p.sights())));
        }
        return new WorksheetReport("Sights and fixes of " + model.passage().day(), model.passage().title(), sections,
                Caution.TEXT);
    }
}
