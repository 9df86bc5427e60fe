package org.sightwork.celestial.ui;

import java.time.ZoneOffset;
import java.time.format.DateTimeFormatter;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.sightwork.celestial.fix.Fix;
import org.sightwork.celestial.fix.FixLineResult;
import org.sightwork.celestial.io.export.WorksheetReport.Row;
import org.sightwork.celestial.reduction.LineOfPosition;
import org.sightwork.celestial.reduction.ReducedSight;
import org.sightwork.celestial.sight.Worksheet;
import org.sightwork.geo.earth.Angles;

/**
 * The worksheet of a sight and of a fix as labelled lines of text, shared by the worksheet and fix
 * views and the printed PDF, so that screen and paper say the same.
 *
 * <p><b>Thread safety:</b> stateless.
 */
final class WorksheetText {

    static final DateTimeFormatter UTC = DateTimeFormatter.ofPattern("yyyy-MM-dd HH:mm:ss 'UTC'", Locale.ROOT)
            .withZone(ZoneOffset.UTC);

    private WorksheetText() {
    }

    static String minutes(double arcmin) {
        return String.format(Locale.ROOT, "%+.1f′", arcmin).replace('-', '−');
    }

    static String heading(Plot.SightResult s) {
        return s.reduced().map(r -> r.lop().label() + "  " + UTC.format(r.lop().utc()))
                .orElse("Row " + (s.row() + 1));
    }

    static List<Row> sight(Plot.SightResult s) {
        List<Row> rows = new ArrayList<>();
        if (s.reduced().isEmpty()) {
            rows.add(new Row("Not worked", s.problem().orElse("")));
            return rows;
        }
        ReducedSight r = s.reduced().get();
        Worksheet w = r.worksheet();
        LineOfPosition l = r.lop();
        rows.add(new Row("Body, limb", w.sight().body() + ", " + w.sight().limb().name().toLowerCase(Locale.ROOT)));
        rows.add(new Row("Time of sight (watch error out)", UTC.format(w.sight().utc())));
        rows.add(new Row("Hs, sextant altitude", Angles.formatDm(w.hsDeg(), 2)));
        rows.add(new Row("Index correction", minutes(w.indexArcmin())));
        rows.add(new Row(String.format(Locale.ROOT, "Dip (height of eye %.1f m, %s horizon)", w.sight().eyeHeightM(),
                w.horizon().name().toLowerCase(Locale.ROOT)), minutes(w.dipArcmin())));
        rows.add(new Row("Ha, apparent altitude", Angles.formatDm(w.haDeg(), 2)));
        rows.add(new Row(String.format(Locale.ROOT, "Refraction (%.0f °C, %.0f hPa)", w.sight().temperatureC(),
                w.sight().pressureHpa()), minutes(w.refractionArcmin())));
        rows.add(new Row("Semi-diameter", minutes(w.semiDiameterArcmin())));
        if (w.phaseArcmin() != 0.0) {
            rows.add(new Row("Phase", minutes(w.phaseArcmin())));
        }
        rows.add(new Row("Parallax in altitude", minutes(w.parallaxArcmin())));
        rows.add(new Row("Total correction", minutes(w.totalCorrectionArcmin())));
        rows.add(new Row("Ho, observed altitude", Angles.formatDm(w.hoDeg(), 2)));
        rows.add(new Row("GHA", Angles.formatDm(l.ghaDeg(), 3)));
        rows.add(new Row("Dec", Angles.formatDeclination(l.decDeg())));
        rows.add(new Row("AP (assumed position)", SightRowReader.formatPosition(l.ap())));
        rows.add(new Row("LHA", Angles.formatDm(r.computed().lhaDeg(), 3)));
        rows.add(new Row("Hc, computed altitude", Angles.formatDm(l.hcDeg(), 2)));
        rows.add(new Row("Zn, azimuth", String.format(Locale.ROOT, "%05.1f°", l.znDeg())));
        rows.add(new Row("Intercept (Ho − Hc)", String.format(Locale.ROOT, "%.1f nm %s", Math.abs(l.interceptNm()),
                l.isToward() ? "toward" : "away")));
        for (String warning : r.warnings()) {
            rows.add(new Row("Note", warning));
        }
        return rows;
    }

    static String heading(Plot.FixResult f) {
        return (f.isRunning() ? "Running fix " : "Fix ") + "'" + f.name() + "'"
                + f.fix().map(x -> "  " + UTC.format(x.utc())).orElse("");
    }

    static List<Row> fix(Plot.FixResult f, List<Plot.SightResult> sights) {
        List<Row> rows = new ArrayList<>();
        if (f.fix().isEmpty()) {
            rows.add(new Row("No fix", f.problem().orElse("")));
            return rows;
        }
        Fix x = f.fix().get();
        rows.add(new Row("Position", SightRowReader.formatPosition(x.position())));
        rows.add(new Row("95 % ellipse (semi-axes, major axis)", String.format(Locale.ROOT, "%.1f × %.1f nm, %03.0f°",
                x.ellipse95().majorNm(), x.ellipse95().minorNm(), x.ellipse95().orientationDeg())));
        x.cockedHat().ifPresent(h -> rows.add(new Row("Cocked hat, longest side",
                String.format(Locale.ROOT, "%.1f nm", h.largestSideNm()))));
        for (int i = 0; i < x.lines().size(); i++) {
            FixLineResult lr = x.lines().get(i);
            String what = lr.original().label();
            String value = String.format(Locale.ROOT, "residual %+.1f nm%s%s", lr.residualNm(),
                    Double.isNaN(lr.normalisedResidual()) ? "" : String.format(Locale.ROOT, " (%.1f σ)",
                            Math.abs(lr.normalisedResidual())),
                    lr.distanceRunNm() == 0.0 ? "" : String.format(Locale.ROOT, ", run %.1f nm", lr.distanceRunNm()));
            if (lr.rejected()) {
                value = "REJECTED: " + lr.rejectionReason().orElse("") + " (" + value + ")";
            }
            rows.add(new Row(what, value));
        }
        for (String w : x.warnings()) {
            rows.add(new Row("Warning", w));
        }
        return rows;
    }
}
