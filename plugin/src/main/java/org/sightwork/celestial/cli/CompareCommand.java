package org.sightwork.celestial.cli;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.time.Duration;
import java.time.LocalDate;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.concurrent.Callable;
import org.sightwork.celestial.passage.CelestialObservation;
import org.sightwork.celestial.passage.ComparisonReport;
import org.sightwork.celestial.passage.GpsIntegrity;
import org.sightwork.celestial.passage.ObservationCsv;
import org.sightwork.celestial.passage.PassageFilter;
import org.sightwork.celestial.passage.PassageNoise;
import org.sightwork.celestial.passage.Reconciliation;
import org.sightwork.geo.app.Caution;
import org.sightwork.geo.app.Main;
import org.sightwork.geo.track.AtomicFiles;
import org.sightwork.geo.track.CsvTrackIo;
import org.sightwork.geo.track.DrLog;
import org.sightwork.geo.track.GpxTrackIo;
import org.sightwork.geo.track.ImportProblem;
import org.sightwork.geo.track.ImportResult;
import org.sightwork.geo.track.NmeaTrackReader;
import org.sightwork.geo.track.Track;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/**
 * {@code sightwork compare}: reconciles the DR with the sights and tests the GPS against them.
 * A thin layer over {@link PassageFilter} and {@link GpsIntegrity}.
 */
@Command(name = "compare", mixinStandardHelpOptions = true,
        description = {"Compares a GPS track with the sights and the dead reckoning: the discrepancy at each",
            "sight session, a consistency test (chi-square, 95% and 99%), an integrity verdict",
            "(consistent / suspect / inconsistent) with its evidence, and the current found.",
            "Method: docs/PASSAGE.md."},
        footer = {"", Caution.TEXT})
public final class CompareCommand implements Callable<Integer> {

    /** Output formats. */
    public enum Format {
        /** Tables for a person. */
        TEXT,
        /** One JSON document. */
        JSON
    }

    @Spec
    CommandSpec spec;

    @Option(names = "--sights", required = true, paramLabel = "FILE",
            description = "celestial observations: CSV of lines of position and fixes (see docs/PASSAGE.md)")
    Path sights;

    @Option(names = "--dr", paramLabel = "FILE",
            description = "DR log (CSV of legs); without it, the DR comes from the GPS log's heading and speed through the water")
    Path dr;

    @Option(names = "--gps", required = true, paramLabel = "FILE", description = "GPS track: NMEA 0183 log, GPX or CSV")
    Path gps;

    @Option(names = "--gps-date", paramLabel = "YYYY-MM-DD",
            description = "UTC date of the first fix, for an NMEA log with no RMC or ZDA")
    LocalDate gpsDate;

    @Option(names = "--format", defaultValue = "text", paramLabel = "text|json", description = "output: ${COMPLETION-CANDIDATES}")
    Format format;

    @Option(names = "--report", paramLabel = "FILE.html", description = "also write an HTML report with plots")
    Path report;

    @Override
    public Integer call() throws IOException {
        PrintWriter out = spec.commandLine().getOut();
        PrintWriter err = spec.commandLine().getErr();
        ImportResult<List<CelestialObservation>> obs = ObservationCsv.read(sights);
        printProblems(err, obs);
        Track track = readGps(err);
        DrLog log;
        if (dr != null) {
            ImportResult<Optional<DrLog>> d = DrLog.read(dr);
            printProblems(err, d);
            if (d.value().isEmpty()) {
                err.println("sightwork compare: " + dr + ": no DR log could be read");
                return Main.EXIT_USAGE;
            }
            log = d.value().get();
        } else {
            Optional<DrLog> fromGps = DrLog.fromTrack(track);
            if (fromGps.isEmpty()) {
                err.println("sightwork compare: give --dr: the GPS log has no heading with speed through the water"
                        + " (HDT/HDG and VHW) to make the DR from");
                return Main.EXIT_USAGE;
            }
            log = fromGps.get();
        }
        if (obs.value().isEmpty()) {
            err.println("sightwork compare: " + sights + ": no observation could be read");
            return Main.EXIT_USAGE;
        }
        if (track.isEmpty()) {
            err.println("sightwork compare: " + gps + ": no GPS fix could be read");
            return Main.EXIT_USAGE;
        }
        PassageNoise noise = PassageNoise.DEFAULT;
        Reconciliation rec = PassageFilter.run(log, obs.value(), noise, Duration.ofMinutes(10));
        GpsIntegrity.Result result = GpsIntegrity.compare(rec, log, track, noise);
        if (format == Format.JSON) {
            out.println(json(result));
        } else {
            text(out, result);
        }
        out.flush();
        if (report != null) {
            String html = ComparisonReport.html(result, rec, log, track, Caution.TEXT);
            AtomicFiles.write(report, o -> o.write(html.getBytes(StandardCharsets.UTF_8)));
            err.println("report written to " + report);
        }
        out.flush();
        return 0;
    }

    private Track readGps(PrintWriter err) throws IOException {
        String name = gps.getFileName().toString().toLowerCase(Locale.ROOT);
        if (name.endsWith(".gpx")) {
            ImportResult<GpxTrackIo.GpxContent> r = GpxTrackIo.read(gps);
            printProblems(err, r);
            return r.value().track();
        }
        if (name.endsWith(".csv")) {
            ImportResult<Track> r = CsvTrackIo.read(gps);
            printProblems(err, r);
            return r.value();
        }
        ImportResult<Track> r = NmeaTrackReader.read(gps, new NmeaTrackReader.Options(true, Optional.ofNullable(gpsDate)));
        printProblems(err, r);
        return r.value();
    }

    private static void printProblems(PrintWriter err, ImportResult<?> r) {
        for (ImportProblem p : r.problems()) {
            err.println(p);
        }
        if (r.problemCount() > r.problems().size()) {
            err.println("... and " + (r.problemCount() - r.problems().size()) + " more problems");
        }
    }

    private static void text(PrintWriter out, GpsIntegrity.Result r) {
        out.println(Caution.TEXT);
        out.println();
        out.print("GPS integrity: " + r.verdict().word().toUpperCase(Locale.ROOT));
        r.firstFlagged().ifPresent(t -> out.print(" (first flagged at " + t + ")"));
        out.println();
        out.println();
        out.println(" #  time (UTC)            estimate               GPS                    dist nm  bearing   NIS    verdict");
        for (GpsIntegrity.Discrepancy d : r.discrepancies()) {
            out.printf(Locale.ROOT, "%2d  %-20s  %-21s  %-21s  %7s  %7s  %6s  %s%n", d.session().index(),
                    d.session().end(), d.session().filtered().position(),
                    d.gps().map(Object::toString).orElse("no GPS"),
                    Double.isNaN(d.distanceNm()) ? "" : String.format(Locale.ROOT, "%.2f", d.distanceNm()),
                    Double.isNaN(d.bearingDeg()) ? "" : String.format(Locale.ROOT, "%03.0f°", d.bearingDeg()),
                    Double.isNaN(d.nis()) ? "" : String.format(Locale.ROOT, "%.1f", d.nis()), d.verdict().word());
            out.println("    " + String.join(", ", d.session().labels()) + ": " + d.evidence());
        }
        out.printf(Locale.ROOT, "%nConsistency levels (chi-square, 2 degrees of freedom): 95%% %.2f, 99%% %.2f%n",
                GpsIntegrity.CHI2_2DOF_95, GpsIntegrity.CHI2_2DOF_99);
        out.println();
        out.println("Patterns in the GPS track:" + (r.patterns().isEmpty() ? " none" : ""));
        for (GpsIntegrity.PatternFinding p : r.patterns()) {
            out.println("  " + p.pattern().words() + ", " + p.from() + " to " + p.to() + ": " + p.evidence());
        }
        out.println();
        out.println("Set and drift between sight sessions:");
        for (GpsIntegrity.SetAndDrift s : r.setAndDrift()) {
            out.printf(Locale.ROOT, "  %s to %s: set %03.0f° drift %.1f kn%n", s.from(), s.to(), s.current().setDeg(),
                    s.current().driftKn());
        }
        out.printf(Locale.ROOT, "Current estimated at the end: set %03.0f° drift %.1f kn (± %.1f kn)%n",
                r.finalCurrent().setDeg(), r.finalCurrent().driftKn(), r.finalCurrentSigmaKn());
    }

    private static String json(GpsIntegrity.Result r) throws IOException {
        ObjectMapper m = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);
        ObjectNode root = m.createObjectNode();
        root.put("caution", Caution.TEXT.replace('\n', ' '));
        root.put("verdict", r.verdict().word());
        root.put("firstFlagged", r.firstFlagged().map(Object::toString).orElse(null));
        ArrayNode ds = root.putArray("discrepancies");
        for (GpsIntegrity.Discrepancy d : r.discrepancies()) {
            ObjectNode o = ds.addObject();
            o.put("session", d.session().index());
            o.put("timeUtc", d.session().end().toString());
            o.putPOJO("sights", d.session().labels());
            o.put("estimateLatDeg", d.session().filtered().position().latDeg());
            o.put("estimateLonDeg", d.session().filtered().position().lonDeg());
            o.put("estimateSemiMajorNm", d.session().filtered().positionCovariance().semiMajorNm());
            if (d.gps().isPresent()) {
                o.put("gpsLatDeg", d.gps().get().latDeg());
                o.put("gpsLonDeg", d.gps().get().lonDeg());
                o.put("distanceNm", d.distanceNm());
                o.put("bearingDeg", d.bearingDeg());
                o.put("nis", d.nis());
            }
            o.put("test", d.level().name());
            o.put("verdict", d.verdict().word());
            o.put("evidence", d.evidence());
        }
        ArrayNode ps = root.putArray("patterns");
        for (GpsIntegrity.PatternFinding p : r.patterns()) {
            ObjectNode o = ps.addObject();
            o.put("pattern", p.pattern().words());
            o.put("fromUtc", p.from().toString());
            o.put("toUtc", p.to().toString());
            o.put("evidence", p.evidence());
        }
        ArrayNode sd = root.putArray("setAndDrift");
        for (GpsIntegrity.SetAndDrift s : r.setAndDrift()) {
            ObjectNode o = sd.addObject();
            o.put("fromUtc", s.from().toString());
            o.put("toUtc", s.to().toString());
            o.put("setDeg", s.current().setDeg());
            o.put("driftKn", s.current().driftKn());
        }
        ObjectNode c = root.putObject("currentAtEnd");
        c.put("setDeg", r.finalCurrent().setDeg());
        c.put("driftKn", r.finalCurrent().driftKn());
        c.put("sigmaKn", r.finalCurrentSigmaKn());
        return m.writeValueAsString(root);
    }
}
