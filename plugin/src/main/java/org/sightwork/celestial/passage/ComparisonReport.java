package org.sightwork.celestial.passage;

import java.time.Duration;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.sightwork.geo.earth.GeoPosition;
import org.sightwork.geo.track.DeadReckoning;
import org.sightwork.geo.track.DrLog;
import org.sightwork.geo.track.Track;

/**
 * The comparison as a self-contained HTML page: the verdict, the discrepancy table, the current,
 * and two inline SVG plots (the NIS against time with the 95 % and 99 % levels; the tracks on a
 * local plane). No script, no style sheet or font from elsewhere: it opens with no network.
 */
public final class ComparisonReport {

    private static final int W = 760;
    private static final int H = 300;
    private static final int PAD = 50;

    private ComparisonReport() {
    }

    /**
     * Writes the page.
     *
     * @param result the comparison
     * @param rec the reconciliation
     * @param dr the DR log
     * @param gps the GPS track
     * @param caution the safety caution to show
     * @return the HTML text
     */
    public static String html(GpsIntegrity.Result result, Reconciliation rec, DrLog dr, Track gps, String caution) {
        StringBuilder h = new StringBuilder();
        h.append("<!DOCTYPE html>\n<html lang=\"en\"><head><meta charset=\"utf-8\"><title>Passage comparison</title>\n")
                .append("<style>body{font-family:sans-serif;margin:2em;max-width:60em}table{border-collapse:collapse}"
                        + "td,th{border:1px solid #999;padding:2px 6px;font-size:90%}th{background:#eee}"
                        + ".inconsistent{color:#a00;font-weight:bold}.suspect{color:#a60;font-weight:bold}"
                        + ".consistent{color:#060}pre{white-space:pre-wrap}</style></head><body>\n");
        h.append("<h1>Passage comparison: celestial and DR against GPS</h1>\n");
        h.append("<p><b>GPS integrity: <span class=\"").append(result.verdict().word()).append("\">")
                .append(result.verdict().word().toUpperCase(Locale.ROOT)).append("</span></b>");
        result.firstFlagged().ifPresent(t -> h.append(" (first flagged at ").append(t).append(")"));
        h.append("</p>\n<pre>").append(esc(caution)).append("</pre>\n");
        h.append("<h2>Discrepancy at each sight session</h2>\n<table><tr><th>#</th><th>time (UTC)</th><th>sights</th>"
                + "<th>estimate</th><th>GPS</th><th>distance (nm)</th><th>bearing</th><th>NIS</th><th>test</th>"
                + "<th>verdict</th><th>evidence</th></tr>\n");
        for (GpsIntegrity.Discrepancy d : result.discrepancies()) {
            h.append("<tr><td>").append(d.session().index()).append("</td><td>").append(d.session().end())
                    .append("</td><td>").append(esc(String.join(", ", d.session().labels()))).append("</td><td>")
                    .append(esc(d.session().filtered().position().toString())).append("</td><td>")
                    .append(esc(d.gps().map(GeoPosition::toString).orElse("none"))).append("</td><td>")
                    .append(fmt(d.distanceNm(), 2)).append("</td><td>")
                    .append(Double.isNaN(d.bearingDeg()) ? "" : String.format(Locale.ROOT, "%03.0f°", d.bearingDeg()))
                    .append("</td><td>").append(fmt(d.nis(), 1)).append("</td><td>").append(d.level())
                    .append("</td><td class=\"").append(d.verdict().word()).append("\">").append(d.verdict().word())
                    .append("</td><td>").append(esc(d.evidence())).append("</td></tr>\n");
        }
        h.append("</table>\n");
        h.append("<h2>Discrepancy against time</h2>\n").append(nisPlot(result, dr));
        h.append("<h2>Tracks</h2>\n").append(trackPlot(result, rec, dr, gps));
        h.append("<h2>Patterns in the GPS track</h2>\n");
        if (result.patterns().isEmpty()) {
            h.append("<p>None found.</p>\n");
        } else {
            h.append("<ul>\n");
            for (GpsIntegrity.PatternFinding p : result.patterns()) {
                h.append("<li><b>").append(p.pattern().words()).append("</b> ").append(p.from()).append(" to ")
                        .append(p.to()).append(": ").append(esc(p.evidence())).append("</li>\n");
            }
            h.append("</ul>\n");
        }
        h.append("<h2>Current</h2>\n<ul>\n");
        for (GpsIntegrity.SetAndDrift s : result.setAndDrift()) {
            h.append("<li>").append(s.from()).append(" to ").append(s.to()).append(": set ")
                    .append(String.format(Locale.ROOT, "%03.0f° drift %.1f kn", s.current().setDeg(),
                            s.current().driftKn())).append("</li>\n");
        }
        h.append("<li>estimated at the end: ").append(String.format(Locale.ROOT, "set %03.0f° drift %.1f kn (± %.1f kn)",
                result.finalCurrent().setDeg(), result.finalCurrent().driftKn(), result.finalCurrentSigmaKn()))
                .append("</li>\n</ul>\n");
        h.append("<p>Method: docs/PASSAGE.md. NIS: normalised innovation squared, chi-square with 2 degrees of "
                + "freedom if the GPS is right (95% level ").append(fmt(GpsIntegrity.CHI2_2DOF_95, 2))
                .append(", 99% level ").append(fmt(GpsIntegrity.CHI2_2DOF_99, 2)).append(").</p>\n</body></html>\n");
        return h.toString();
    }

    private static String nisPlot(GpsIntegrity.Result r, DrLog dr) {
        double t0 = dr.start().toEpochMilli();
        double t1 = dr.end().toEpochMilli();
        double maxNis = 100;
        for (GpsIntegrity.Discrepancy d : r.discrepancies()) {
            if (!Double.isNaN(d.nis())) {
                maxNis = Math.max(maxNis, d.nis() * 2);
            }
        }
        double lo = Math.log10(0.1);
        double hi = Math.log10(maxNis);
        StringBuilder s = svgStart();
        axes(s, "hours from " + dr.start(), "NIS (log scale)");
        for (double level : new double[] {GpsIntegrity.CHI2_2DOF_95, GpsIntegrity.CHI2_2DOF_99}) {
            double y = y(Math.log10(level), lo, hi);
            s.append(String.format(Locale.ROOT, "<line x1=\"%d\" y1=\"%.1f\" x2=\"%d\" y2=\"%.1f\" stroke=\"%s\" "
                    + "stroke-dasharray=\"6,4\"/><text x=\"%d\" y=\"%.1f\" font-size=\"11\">%s %% level</text>\n", PAD, y,
                    W - PAD, y, level < 7 ? "#c80" : "#c00", W - PAD - 80, y - 3, level < 7 ? "95" : "99"));
        }
        for (double v : new double[] {0.1, 1, 10, 100, 1000}) {
            if (v <= maxNis) {
                s.append(String.format(Locale.ROOT, "<text x=\"%d\" y=\"%.1f\" font-size=\"10\" text-anchor=\"end\">%s</text>\n",
                        PAD - 4, y(Math.log10(v), lo, hi) + 3, v < 1 ? "0.1" : String.valueOf((int) v)));
            }
        }
        double hours = (t1 - t0) / 3.6e6;
        for (int k = 0; k <= hours; k += Math.max(1, (int) Math.ceil(hours / 10))) {
            s.append(String.format(Locale.ROOT, "<text x=\"%.1f\" y=\"%d\" font-size=\"10\" text-anchor=\"middle\">%d</text>\n",
                    PAD + (W - 2 * PAD) * k / hours, H - PAD + 14, k));
        }
        for (GpsIntegrity.Discrepancy d : r.discrepancies()) {
            if (Double.isNaN(d.nis())) {
                continue;
            }
            double x = PAD + (W - 2 * PAD) * (d.session().end().toEpochMilli() - t0) / (t1 - t0);
            double y = y(Math.log10(Math.max(0.1, d.nis())), lo, hi);
            String colour = switch (d.verdict()) {
                case CONSISTENT -> "#080";
                case SUSPECT -> "#c80";
                case INCONSISTENT -> "#c00";
            };
            s.append(String.format(Locale.ROOT, "<circle cx=\"%.1f\" cy=\"%.1f\" r=\"5\" fill=\"%s\"><title>session %d: "
                    + "NIS %.1f, %.2f nm</title></circle>\n", x, y, colour, d.session().index(), d.nis(), d.distanceNm()));
        }
        return s.append("</svg>\n").toString();
    }

    private static String trackPlot(GpsIntegrity.Result r, Reconciliation rec, DrLog dr, Track gps) {
        LocalFrame f = rec.frame();
        List<double[]> gpsPts = new ArrayList<>();
        int stride = Math.max(1, gps.size() / 2000);
        for (int i = 0; i < gps.size(); i += stride) {
            if (!gps.time(i).isBefore(dr.start()) && !gps.time(i).isAfter(dr.end())) {
                gpsPts.add(f.toLocal(new GeoPosition(gps.latDeg(i), gps.lonDeg(i))));
            }
        }
        List<double[]> best = new ArrayList<>();
        for (TrackEstimate e : rec.smoothed()) {
            best.add(f.toLocal(e.position()));
        }
        List<double[]> drPts = new ArrayList<>();
        long step = Math.max(60_000, Duration.between(dr.start(), dr.end()).toMillis() / 300);
        for (Instant t = dr.start(); !t.isAfter(dr.end()); t = t.plusMillis(step)) {
            drPts.add(f.toLocal(DeadReckoning.dr(dr, t)));
        }
        double minX = Double.MAX_VALUE;
        double maxX = -Double.MAX_VALUE;
        double minY = Double.MAX_VALUE;
        double maxY = -Double.MAX_VALUE;
        for (List<double[]> l : List.of(gpsPts, best, drPts)) {
            for (double[] p : l) {
                minX = Math.min(minX, p[0]);
                maxX = Math.max(maxX, p[0]);
                minY = Math.min(minY, p[1]);
                maxY = Math.max(maxY, p[1]);
            }
        }
        double span = Math.max(1, Math.max(maxX - minX, (maxY - minY) * (W - 2.0 * PAD) / (H - 2.0 * PAD)));
        double scale = (W - 2 * PAD) / span;
        final double x0 = minX;
        final double y0 = minY;
        StringBuilder s = svgStart();
        axes(s, String.format(Locale.ROOT, "east (nm); 10 nm = %.0f px", 10 * scale), "north");
        poly(s, gpsPts, x0, y0, scale, "#36c", "GPS");
        poly(s, drPts, x0, y0, scale, "#999", "DR");
        poly(s, best, x0, y0, scale, "#080", "best track (sights and DR, smoothed)");
        for (GpsIntegrity.Discrepancy d : r.discrepancies()) {
            double[] p = f.toLocal(d.session().filtered().position());
            s.append(String.format(Locale.ROOT, "<circle cx=\"%.1f\" cy=\"%.1f\" r=\"4\" fill=\"none\" stroke=\"#000\">"
                    + "<title>session %d</title></circle>\n", PAD + (p[0] - x0) * scale, H - PAD - (p[1] - y0) * scale,
                    d.session().index()));
        }
        s.append("<text x=\"60\" y=\"16\" font-size=\"11\" fill=\"#36c\">GPS</text><text x=\"100\" y=\"16\" "
                + "font-size=\"11\" fill=\"#999\">DR</text><text x=\"130\" y=\"16\" font-size=\"11\" fill=\"#080\">best "
                + "track from sights and DR</text><text x=\"330\" y=\"16\" font-size=\"11\">○ sight sessions</text>\n");
        return s.append("</svg>\n").toString();
    }

    private static void poly(StringBuilder s, List<double[]> pts, double x0, double y0, double scale, String colour,
            String title) {
        s.append("<polyline fill=\"none\" stroke=\"").append(colour).append("\" stroke-width=\"1.5\" points=\"");
        for (double[] p : pts) {
            s.append(String.format(Locale.ROOT, "%.1f,%.1f ", PAD + (p[0] - x0) * scale, H - PAD - (p[1] - y0) * scale));
        }
        s.append("\"><title>").append(title).append("</title></polyline>\n");
    }

    private static StringBuilder svgStart() {
        return new StringBuilder(String.format(Locale.ROOT,
                "<svg xmlns=\"http://www.w3.org/2000/svg\" width=\"%d\" height=\"%d\" viewBox=\"0 0 %d %d\">\n", W, H, W, H));
    }

    private static void axes(StringBuilder s, String xLabel, String yLabel) {
        s.append(String.format(Locale.ROOT, "<rect x=\"%d\" y=\"%d\" width=\"%d\" height=\"%d\" fill=\"none\" "
                + "stroke=\"#333\"/>\n<text x=\"%d\" y=\"%d\" font-size=\"11\" text-anchor=\"middle\">%s</text>\n"
                + "<text x=\"12\" y=\"%d\" font-size=\"11\" transform=\"rotate(-90 12 %d)\" text-anchor=\"middle\">%s</text>\n",
                PAD, PAD - 20, W - 2 * PAD, H - 2 * PAD + 20, W / 2, H - 8, esc(xLabel), H / 2, H / 2, esc(yLabel)));
    }

    private static double y(double v, double lo, double hi) {
        return H - PAD - (H - 2 * PAD) * (v - lo) / (hi - lo);
    }

    private static String fmt(double v, int decimals) {
        return Double.isNaN(v) ? "" : String.format(Locale.ROOT, "%." + decimals + "f", v);
    }

    static String esc(String s) {
        return s.replace("&", "&amp;").replace("<", "&lt;").replace(">", "&gt;").replace("\"", "&quot;");
    }
}
