package org.sightwork.celestial.ui.drill;

import java.time.ZoneOffset;
import java.time.format.DateTimeFormatter;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.sightwork.celestial.drill.AnswerKey;
import org.sightwork.celestial.drill.StudentAnswers;
import org.sightwork.celestial.drill.StudentGrade;
import org.sightwork.geo.earth.GeoPosition;
import org.sightwork.geo.earth.Sailings;
import org.sightwork.geo.spi.GeoPainter;
import org.sightwork.geo.spi.MarkerShape;
import org.sightwork.geo.track.Track;

/**
 * Paints the drill mode's three layers through the shell's {@link GeoPainter}: the student's fixes
 * (shown as soon as answers are loaded: they are the student's own), the key's fixes and the
 * truth (only once revealed). While the truth is hidden, the truth layer writes "Drill: GPS
 * withheld" on the chart at the sight log's first DR, so that the class sees the mode.
 *
 * <p><b>Thread:</b> JavaFX application thread (called from the overlays' painters).
 */
final class DrillOverlays {

    /** The banner written on the chart while the truth is hidden. */
    static final String BANNER = "Drill: GPS withheld";

    /** Width of one character of the shell's label font (pixels), to set a label to the left of its mark. */
    private static final double LABEL_CHAR_PX = 7.4;

    private static final DateTimeFormatter HHMM = DateTimeFormatter.ofPattern("HH:mm", Locale.ROOT)
            .withZone(ZoneOffset.UTC);

    private final DrillState state;
    private int truthFiguresPainted;

    DrillOverlays(DrillState state) {
        this.state = state;
    }

    /**
     * What the truth layer drew at its last frame (the true track, true positions and error
     * lines): zero while the truth is hidden.
     *
     * @return the count of figures
     */
    int truthFiguresPainted() {
        return truthFiguresPainted;
    }

    static GeoPosition at(AnswerKey.Position p) {
        return GeoPosition.of(p.latDeg(), p.lonDeg());
    }

    void paintStudentFixes(GeoPainter p) {
        StudentGrade g = state.selectedGrade().orElse(null);
        if (g == null || !state.isOpen()) {
            return;
        }
        for (StudentGrade.FixGrade f : g.fixes()) {
            f.student().ifPresent(s -> {
                p.marker(at(s), MarkerShape.TRIANGLE, DrillStyle.STUDENT_SIZE_PX, DrillStyle.STUDENT_MARK, null);
                p.label(at(s), g.student() + " " + HHMM.format(f.utc()), DrillStyle.STUDENT, 9, -18);
            });
        }
        for (StudentAnswers.FixAnswer u : g.unmatchedFixes()) {
            p.marker(u.position(), MarkerShape.TRIANGLE, DrillStyle.STUDENT_SIZE_PX, DrillStyle.STUDENT_MARK, null);
            p.label(u.position(), g.student() + " " + HHMM.format(u.utc()) + " (matches no fix asked for)",
                    DrillStyle.STUDENT, 9, -14);
        }
    }

    void paintKeyFixes(GeoPainter p) {
        if (!state.truthShown()) {
            return;
        }
        for (AnswerKey.FixKey f : state.key().get().orElseThrow().fixes()) {
            p.marker(at(f.fix()), MarkerShape.SQUARE, DrillStyle.KEY_SIZE_PX, DrillStyle.KEY_MARK, null);
            String text = "key " + HHMM.format(f.utc());
            p.label(at(f.fix()), text, DrillStyle.KEY, -(LABEL_CHAR_PX * text.length() + 10), -8);
        }
    }

    void paintTruth(GeoPainter p) {
        truthFiguresPainted = 0;
        if (!state.isOpen()) {
            return;
        }
        if (!state.truthShown()) {
            state.bannerAt().get().ifPresent(b -> p.label(b, BANNER, DrillStyle.BANNER, 12, -26));
            return;
        }
        // The error lines first, then the track, then the true positions: the truth stays on top.
        state.selectedGrade().ifPresent(g -> {
            for (StudentGrade.FixGrade f : g.fixes()) {
                if (f.student().isPresent() && f.errorFromTruthNm().isPresent()) {
                    GeoPosition s = at(f.student().get());
                    GeoPosition tr = at(f.truth());
                    p.rhumbLine(s, tr, DrillStyle.ERROR_LINE);
                    Sailings.RhumbLine rl = Sailings.rhumbLine(s, tr);
                    GeoPosition mid = Sailings.rhumbDestination(s, rl.courseDeg(), rl.distanceNm() / 2);
                    p.label(mid, String.format(Locale.ROOT, "%.1f nm", f.errorFromTruthNm().getAsDouble()),
                            DrillStyle.ERROR, 6, -8);
                    truthFiguresPainted++;
                }
            }
        });
        Track t = state.trueTrack().get().orElseThrow();
        if (t.size() >= 2) {
            List<GeoPosition> pts = new ArrayList<>(t.size());
            for (int i = 0; i < t.size(); i++) {
                pts.add(GeoPosition.of(t.latDeg(i), t.lonDeg(i)));
            }
            p.polyline(pts, DrillStyle.TRUTH_TRACK);
            p.label(pts.get(pts.size() - 1), "true track", DrillStyle.TRUTH, 8, 4);
            truthFiguresPainted++;
        }
        for (AnswerKey.FixKey f : state.key().get().orElseThrow().fixes()) {
            p.marker(at(f.truth()), MarkerShape.DOT, DrillStyle.TRUTH_SIZE_PX, null, DrillStyle.TRUTH);
            p.marker(at(f.truth()), MarkerShape.CIRCLE, DrillStyle.TRUTH_SIZE_PX + 6, DrillStyle.TRUTH_MARK, null);
            p.label(at(f.truth()), "true " + HHMM.format(f.utc()), DrillStyle.TRUTH, 12, 4);
            truthFiguresPainted++;
        }
    }
}
