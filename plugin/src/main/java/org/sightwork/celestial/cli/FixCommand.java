package org.sightwork.celestial.cli;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.time.Duration;
import java.time.Instant;
import java.time.format.DateTimeParseException;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.concurrent.Callable;
import org.sightwork.celestial.almanac.Almanac;
import org.sightwork.celestial.almanac.BodyPosition;
import org.sightwork.celestial.fix.DrTrack;
import org.sightwork.celestial.fix.Fix;
import org.sightwork.celestial.fix.FixLineResult;
import org.sightwork.celestial.fix.FixOptions;
import org.sightwork.celestial.fix.FixPlanner;
import org.sightwork.celestial.fix.SightAverager;
import org.sightwork.celestial.reduction.ComputedAltitude;
import org.sightwork.celestial.reduction.LineOfPosition;
import org.sightwork.celestial.reduction.ReducedSight;
import org.sightwork.celestial.reduction.SightReduction;
import org.sightwork.celestial.time.AstroTime;
import org.sightwork.geo.app.Caution;
import org.sightwork.geo.earth.Angles;
import org.sightwork.geo.earth.GeoPosition;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code sightwork fix LOG.csv}: groups the sights into fixes and prints each with its ellipse. */
@Command(name = "fix", mixinStandardHelpOptions = true,
        description = {"Groups the sights of a sight log into fixes (sights within the window make one fix "
                + "at their mean time, each carried to it along the DR) and prints each fix with its 95%% "
                + "error ellipse, every sight's residual and the warnings.",
            "A window with a single line (a lone Sun sight) is advanced along the DR to the next single "
                + "sight within --advance-max-h hours, for a running fix at that later sight (morning, noon "
                + "and afternoon Sun give two running fixes). --running-fix-at makes one running fix from "
                + "every sight instead.",
            "Fixes go to standard output; lines that give no fix, and bad rows, to standard error."},
        footer = {"", Caution.TEXT})
public final class FixCommand implements Callable<Integer> {

    @Parameters(index = "0", paramLabel = "LOG.csv", description = "the sight log (see docs/SIGHT-LOG.md)")
    Path log;

    @Option(names = "--format", defaultValue = "text", description = "text, csv or json (default ${DEFAULT-VALUE})")
    OutputFormat format;

    @Option(names = "--window-min", defaultValue = "30", paramLabel = "MINUTES",
            description = "sights within this many minutes make one fix (default ${DEFAULT-VALUE})")
    double windowMin;

    @Option(names = "--running-fix-at", paramLabel = "UTC",
            description = "one running fix from all sights at this time (ISO 8601, e.g. 2025-03-14T12:00:00Z)")
    String runningFixAt;

    @Option(names = "--advance-max-h", defaultValue = "4", paramLabel = "HOURS",
            description = "advance a lone line at most this far to the next lone line for a running fix "
                    + "(default ${DEFAULT-VALUE}; 0: never)")
    double advanceMaxH;

    @Option(names = "--per-sight", description = "with --format csv: one row per sight of each fix (its Ho, Hc, "
            + "Zn, intercept, residual, distance run, left out or not) instead of one row per fix")
    boolean perSight;

    @Option(names = "--ap", paramLabel = "LAT,LON", description = "reduce from this assumed position instead of each DR")
    String ap;

    @Option(names = "--dr-error-pct", defaultValue = "5", paramLabel = "PERCENT",
            description = "DR error per distance run, one standard deviation (default ${DEFAULT-VALUE}%%)")
    double drErrorPct;

    @Option(names = "--keep-all", description = "never leave a sight out as an outlier")
    boolean keepAll;

    @Option(names = "--average-min", defaultValue = "0", paramLabel = "MINUTES",
            description = "fit shots of one body within this many minutes into one sight (default off)")
    double averageMin;

    @Option(names = "--dut1", defaultValue = "0", paramLabel = "SECONDS", description = "DUT1 = UT1 - UTC (s; default 0)")
    double dut1;

    @Spec
    CommandSpec spec;

    /** Appended to the message of a lone line: the option that carries it to a chosen time. */
    static final String RUNNING_FIX_HINT = "; or give --running-fix-at TIME to carry every sight along the DR to "
            + "TIME (ISO 8601 UTC) for one running fix";

    @Override
    public Integer call() throws Exception {
        PrintWriter out = spec.commandLine().getOut();
        PrintWriter err = spec.commandLine().getErr();
        if (!(drErrorPct >= 0 && drErrorPct <= 100)) {
            throw new IllegalArgumentException("--dr-error-pct " + drErrorPct + " must be between 0 and 100");
        }
        if (perSight && format != OutputFormat.CSV) {
            throw new IllegalArgumentException("--per-sight goes with --format csv (text and json show every sight)");
        }
        Instant at = null;
        if (runningFixAt != null) {
            try {
                at = Instant.parse(runningFixAt);
            } catch (DateTimeParseException e) {
                throw new IllegalArgumentException("--running-fix-at '" + runningFixAt
                        + "': expected an ISO 8601 UTC time such as 2025-03-14T12:00:00Z");
            }
        }
        SightInput in = SightInput.load(log, SightInput.parseAp(ap), dut1);
        in.reportProblems(err);
        FixOptions options = FixOptions.DEFAULTS.withDrErrorFraction(drErrorPct / 100.0).withRejectOutliers(!keepAll);
        List<String> notes = new ArrayList<>();
        List<ReducedSight> sights = averageMin > 0 ? average(in.reduced, notes) : in.reduced;
        List<FixPlanner.Attempt> attempts = at != null ? List.of(FixPlanner.runningFixAt(sights, at, options))
                : FixPlanner.fixes(sights, windowMin, advanceMaxH, options);
        String hint = at == null ? RUNNING_FIX_HINT : "";
        for (FixPlanner.Attempt a : attempts) {
            a.failure().ifPresent(f -> err.println(log.getFileName() + ": " + f + (a.sights().size() == 1 ? hint : "")));
        }
        err.flush();
        switch (format) {
            case TEXT -> text(attempts, notes, out);
            case CSV -> {
                if (perSight) {
                    csvPerSight(attempts, out);
                } else {
                    csv(attempts, out);
                }
            }
            case JSON -> json(attempts, notes, in, out);
        }
        out.flush();
        boolean anyFix = attempts.stream().anyMatch(a -> a.fix().isPresent());
        if (!anyFix) {
            return 1;
        }
        return in.problems.isEmpty() && attempts.stream().allMatch(a -> a.fix().isPresent()) ? 0 : 2;
    }

    /** Replaces runs of shots of one body (and limb) within the window by one fitted sight. */
    private List<ReducedSight> average(List<ReducedSight> all, List<String> notes) {
        List<ReducedSight> sorted = new ArrayList<>(all);
        sorted.sort(java.util.Comparator.comparing(r -> r.lop().utc()));
        Optional<DrTrack> track = FixPlanner.track(sorted);
        Almanac almanac = Almanac.standard();
        List<ReducedSight> out = new ArrayList<>();
        boolean[] used = new boolean[sorted.size()];
        for (int i = 0; i < sorted.size(); i++) {
            if (used[i]) {
                continue;
            }
            ReducedSight first = sorted.get(i);
            List<ReducedSight> run = new ArrayList<>();
            for (int j = i; j < sorted.size(); j++) {
                ReducedSight r = sorted.get(j);
                if (!used[j] && r.position().body().equals(first.position().body())
                        && r.worksheet().sight().limb() == first.worksheet().sight().limb()
                        && Duration.between(first.lop().utc(), r.lop().utc()).toNanos() / 6e10 <= averageMin) {
                    run.add(r);
                    used[j] = true;
                }
            }
            if (run.size() < 2) {
                out.add(first);
                continue;
            }
            GeoPosition ap0 = first.lop().ap();
            Instant t0 = first.lop().utc();
            java.util.function.Function<Instant, GeoPosition> apAt = t -> track.map(tr -> tr.move(ap0, t0, t)).orElse(ap0);
            java.util.function.Function<Instant, BodyPosition> placeAt = t ->
                    almanac.position(first.position().body(), AstroTime.ofUtc(t, dut1));
            List<SightAverager.Shot> shots = run.stream()
                    .map(r -> new SightAverager.Shot(r.lop().utc(), r.lop().hoDeg())).toList();
            SightAverager.Averaged avg = SightAverager.average(shots, t -> {
                BodyPosition p = placeAt.apply(t);
                return SightReduction.reduce(apAt.apply(t), p.ghaDeg(), p.decDeg()).hcDeg();
            }, first.lop().sigmaNm());
            BodyPosition p = placeAt.apply(avg.utc());
            GeoPosition apBar = apAt.apply(avg.utc());
            ComputedAltitude c = SightReduction.reduce(apBar, p.ghaDeg(), p.decDeg());
            String label = first.lop().label().replaceAll(" \\d\\d:\\d\\d:\\d\\d$", "") + " fit of " + run.size();
            LineOfPosition lop = new LineOfPosition(label, avg.utc(), apBar, p.ghaDeg(), p.decDeg(), avg.hoDeg(),
                    c.hcDeg(), c.znDeg(), (avg.hoDeg() - c.hcDeg()) * 60.0, avg.standardErrorArcmin());
            List<String> w = new ArrayList<>();
            StringBuilder note = new StringBuilder(String.format(Locale.ROOT, "%s at %s: Ho %s ±%.1f′ from %d shots",
                    label, avg.utc(), Angles.formatDm(avg.hoDeg(), 2), avg.standardErrorArcmin(), run.size()));
            for (int k = 0; k < run.size(); k++) {
                note.append(String.format(Locale.ROOT, "; %s %+.1f′%s", run.get(k).lop().utc().toString().substring(11, 19),
                        avg.residualsArcmin().get(k), avg.rejected().get(k) ? " (left out)" : ""));
            }
            avg.warning().ifPresent(w::add);
            notes.add(note.toString());
            avg.warning().ifPresent(x -> notes.add(label + ": " + x));
            out.add(new ReducedSight(first.worksheet(), p, c, lop, w));
        }
        return out;
    }

    private static String body(FixLineResult l) {
        return l.original().label().replaceAll(" \\d\\d:\\d\\d:\\d\\d$", "");
    }

    private static void text(List<FixPlanner.Attempt> attempts, List<String> notes, PrintWriter out) {
        for (String n : notes) {
            out.println("averaged: " + n);
        }
        if (!notes.isEmpty()) {
            out.println();
        }
        for (FixPlanner.Attempt a : attempts) {
            if (a.fix().isEmpty()) {
                continue; // said on standard error
            }
            Fix f = a.fix().get();
            out.printf(Locale.ROOT, "%s %s  %s%n", a.running() ? "Running fix" : "Fix", f.utc(), f.position());
            out.printf(Locale.ROOT, "  95%% ellipse %.1f × %.1f nm, major axis %03.0f°  (%d lines, %d used%s)%n",
                    f.ellipse95().majorNm(), f.ellipse95().minorNm(), f.ellipse95().orientationDeg(), f.lines().size(),
                    f.usedLines().size(), Double.isNaN(f.varianceFactor()) ? ""
                            : String.format(Locale.ROOT, ", variance factor %.2f%s", f.varianceFactor(),
                                    f.scaledByAPosteriori() ? ", ellipse enlarged" : ""));
            out.println("  sight                      Ho          Hc          Zn     int nm  res nm  run nm");
            for (FixLineResult l : f.lines()) {
                out.printf(Locale.ROOT, "  %-24s %s  %s  %05.1f°  %+6.1f  %+6.2f  %+6.1f%s%n", l.original().label(),
                        Angles.formatDm(l.original().hoDeg(), 2), Angles.formatDm(l.original().hcDeg(), 2),
                        l.original().znDeg(), l.original().interceptNm(), l.residualNm(), l.distanceRunNm(),
                        l.rejected() ? "  LEFT OUT" : "");
            }
            f.cockedHat().ifPresent(h -> out.printf(Locale.ROOT, "  cocked hat: largest side %.1f nm%n", h.largestSideNm()));
            for (String w : f.warnings()) {
                out.println("  warning: " + w);
            }
            out.println();
        }
        out.println(Caution.TEXT);
    }

    private static void csv(List<FixPlanner.Attempt> attempts, PrintWriter out) {
        out.println("utc,latDeg,lonDeg,majorNm,minorNm,orientationDeg,lines,used,varianceFactor,warnings");
        for (FixPlanner.Attempt a : attempts) {
            if (a.fix().isEmpty()) {
                continue;
            }
            Fix f = a.fix().get();
            out.printf(Locale.ROOT, "%s,%.6f,%.6f,%.3f,%.3f,%.1f,%d,%d,%.3f,\"%s\"%n", f.utc(), f.position().latDeg(),
                    f.position().lonDeg(), f.ellipse95().majorNm(), f.ellipse95().minorNm(),
                    f.ellipse95().orientationDeg(), f.lines().size(), f.usedLines().size(), f.varianceFactor(),
                    String.join("; ", f.warnings()).replace("\"", "\"\""));
        }
    }

    /** Header of {@code --format csv --per-sight}. */
    static final String PER_SIGHT_HEADER = "fixUtc,running,body,sightUtc,hoDeg,hcDeg,znDeg,interceptNm,residualNm,"
            + "runNm,leftOut,reason";

    private static void csvPerSight(List<FixPlanner.Attempt> attempts, PrintWriter out) {
        out.println(PER_SIGHT_HEADER);
        for (FixPlanner.Attempt a : attempts) {
            if (a.fix().isEmpty()) {
                continue;
            }
            Fix f = a.fix().get();
            for (FixLineResult l : f.lines()) {
                out.printf(Locale.ROOT, "%s,%b,\"%s\",%s,%.6f,%.6f,%.2f,%.3f,%.3f,%.3f,%b,\"%s\"%n", f.utc(), a.running(),
                        body(l).replace("\"", "\"\""), l.original().utc(), l.original().hoDeg(), l.original().hcDeg(),
                        l.original().znDeg(), l.original().interceptNm(), l.residualNm(), l.distanceRunNm(),
                        l.rejected(), l.rejectionReason().orElse("").replace("\"", "\"\""));
            }
        }
    }

    private static void json(List<FixPlanner.Attempt> attempts, List<String> notes, SightInput in, PrintWriter out)
            throws Exception {
        ObjectMapper m = ReduceCommand.mapper();
        ObjectNode root = m.createObjectNode();
        ArrayNode fixes = root.putArray("fixes");
        ArrayNode failures = root.putArray("failures");
        for (FixPlanner.Attempt a : attempts) {
            if (a.fix().isEmpty()) {
                failures.add(a.failure().orElse(""));
                continue;
            }
            Fix f = a.fix().get();
            ObjectNode o = fixes.addObject();
            o.put("utc", f.utc().toString());
            o.put("running", a.running());
            o.put("latDeg", f.position().latDeg());
            o.put("lonDeg", f.position().lonDeg());
            ObjectNode e = o.putObject("ellipse95");
            e.put("majorNm", f.ellipse95().majorNm());
            e.put("minorNm", f.ellipse95().minorNm());
            e.put("orientationDeg", f.ellipse95().orientationDeg());
            if (Double.isNaN(f.varianceFactor())) {
                o.putNull("varianceFactor");
            } else {
                o.put("varianceFactor", f.varianceFactor());
            }
            ArrayNode w = o.putArray("warnings");
            f.warnings().forEach(w::add);
            ArrayNode s = o.putArray("sights");
            for (FixLineResult l : f.lines()) {
                ObjectNode x = s.addObject();
                x.put("body", body(l));
                x.put("utc", l.original().utc().toString());
                x.put("hoDeg", l.original().hoDeg());
                x.put("hcDeg", l.original().hcDeg());
                x.put("znDeg", l.original().znDeg());
                x.put("interceptNm", l.original().interceptNm());
                x.put("residualNm", l.residualNm());
                x.put("rejected", l.rejected());
                l.rejectionReason().ifPresent(r -> x.put("rejectionReason", r));
            }
        }
        ArrayNode av = root.putArray("averaged");
        notes.forEach(av::add);
        ReduceCommand.problems(root, in);
        out.println(m.writeValueAsString(root));
    }
}
