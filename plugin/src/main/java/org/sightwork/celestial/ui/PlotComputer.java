package org.sightwork.celestial.ui;

import java.time.Duration;
import java.time.Instant;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.sightwork.celestial.fix.DrTrack;
import org.sightwork.celestial.fix.Fix;
import org.sightwork.celestial.fix.FixGeometryException;
import org.sightwork.celestial.fix.FixLineResult;
import org.sightwork.celestial.fix.FixOptions;
import org.sightwork.celestial.fix.FixSolver;
import org.sightwork.celestial.reduction.LineOfPosition;
import org.sightwork.celestial.reduction.ReducedSight;
import org.sightwork.celestial.reduction.SightReducer;
import org.sightwork.celestial.sight.Sight;
import org.sightwork.celestial.sight.SightException;
import org.sightwork.geo.earth.GeoPosition;
import org.sightwork.geo.earth.Sailings;
import org.sightwork.geo.track.DeadReckoning;
import org.sightwork.geo.track.DrLeg;
import org.sightwork.geo.track.DrLog;

/**
 * Works out a {@link Plot} from a {@link Passage}: reads every row, reduces every sight from its AP
 * (or its DR, or the passage's DR at its time), makes a fix of each group of sights sharing a fix
 * name (a running fix when their times differ, the lines carried along the DR log), and the set and
 * drift between consecutive fixes. The arithmetic is the engine's ({@link SightReducer},
 * {@link FixSolver}, {@link DeadReckoning}); this class only wires it.
 *
 * <p><b>Set and drift</b> between fixes F1 at t1 and F2 at t2: F1 is carried along the DR log to
 * t2 (position D); the set is the rhumb-line course from D to F2, the drift its distance over
 * t2 - t1 (Bowditch, <i>American Practical Navigator</i>, 2019 ed., ch. 7, "set and drift",
 * from memory).
 *
 * <p><b>Thread safety:</b> immutable; may run on any thread (the UI runs it on a worker thread when
 * a passage is opened, and on the FX thread after an edit: a dozen sights take a few milliseconds).
 */
final class PlotComputer {

    /**
     * Longest span (minutes) of one round of sights taken as one fix rather than a running fix:
     * a twilight round of stars takes some 10 to 20 minutes (common practice).
     */
    static final int ROUND_MINUTES = 30;

    /** DR track sampling (minutes): fine enough that a leg change is drawn where it happens. */
    static final int DR_STEP_MINUTES = 10;

    private final SightReducer reducer;
    private final FixOptions options;

    PlotComputer(SightReducer reducer, FixOptions options) {
        this.reducer = reducer;
        this.options = options;
    }

    Plot compute(Passage passage) {
        Optional<DrLog> log = passage.drLog();
        List<Plot.SightResult> sights = new ArrayList<>();
        for (int i = 0; i < passage.rows().size(); i++) {
            sights.add(work(i, passage.rows().get(i), passage, log));
        }
        List<Plot.FixResult> fixes = fixes(sights, log);
        List<Plot.TimedPosition> dr = new ArrayList<>();
        log.ifPresent(l -> {
            for (Instant t = l.start(); !t.isAfter(l.end()); t = t.plus(Duration.ofMinutes(DR_STEP_MINUTES))) {
                dr.add(new Plot.TimedPosition(t, DeadReckoning.dr(l, t)));
            }
            dr.add(new Plot.TimedPosition(l.end(), DeadReckoning.dr(l, l.end())));
        });
        return new Plot(sights, fixes, dr, passage.gps(), setDrifts(fixes, log));
    }

    /**
     * The DR position at a time, if the log covers it.
     *
     * @param log the DR log
     * @param t the time
     * @return the DR position
     */
    static Optional<GeoPosition> drAt(Optional<DrLog> log, Instant t) {
        return log.filter(l -> !t.isBefore(l.start()) && !t.isAfter(l.end())).map(l -> DeadReckoning.dr(l, t));
    }

    /**
     * The DR log as the fix solver's track (course = water track, leeway included).
     *
     * @param log the DR log
     * @return the track
     */
    static DrTrack track(DrLog log) {
        List<DrTrack.Leg> legs = new ArrayList<>();
        for (DrLeg leg : log.legs()) {
            legs.add(new DrTrack.Leg(leg.start(), leg.waterTrackDeg(), leg.stwKn()));
        }
        return new DrTrack(legs);
    }

    private Plot.SightResult work(int row, SightRow r, Passage passage, Optional<DrLog> log) {
        SightRowReader.Read read = SightRowReader.read(r, passage.day());
        if (!read.ok()) {
            String first = read.problems().entrySet().stream()
                    .sorted(Map.Entry.comparingByKey())
                    .map(e -> e.getKey().heading() + ": " + e.getValue()).findFirst().orElse("incomplete row");
            return new Plot.SightResult(row, read, Optional.empty(), Optional.of(first), r.circleWanted());
        }
        Sight sight = read.sight().orElseThrow();
        if (sight.dr().isEmpty()) {
            Optional<GeoPosition> dr = drAt(log, sight.utc());
            if (dr.isPresent()) {
                sight = sight.toBuilder().dr(dr.get()).build();
            }
        }
        try {
            ReducedSight reduced = reducer.reduce(sight, read.ap());
            return new Plot.SightResult(row, read, Optional.of(reduced), Optional.empty(), r.circleWanted());
        } catch (IllegalArgumentException e) {
            return new Plot.SightResult(row, read, Optional.empty(), Optional.of(e.getMessage()), r.circleWanted());
        }
    }

    private List<Plot.FixResult> fixes(List<Plot.SightResult> sights, Optional<DrLog> log) {
        Map<String, List<Plot.SightResult>> groups = new LinkedHashMap<>();
        for (Plot.SightResult s : sights) {
            String name = s.read().fixGroup();
            if (!name.isEmpty() && s.reduced().isPresent()) {
                groups.computeIfAbsent(name, k -> new ArrayList<>()).add(s);
            }
        }
        List<Plot.FixResult> out = new ArrayList<>();
        groups.forEach((name, members) -> out.add(fix(name, members, log)));
        out.sort(Comparator.comparing((Plot.FixResult f) -> f.fix().map(Fix::utc).orElse(Instant.MAX)));
        return out;
    }

    private Plot.FixResult fix(String name, List<Plot.SightResult> members, Optional<DrLog> log) {
        List<Integer> rows = members.stream().map(Plot.SightResult::row).toList();
        List<LineOfPosition> lines = members.stream().map(s -> s.reduced().orElseThrow().lop()).toList();
        Instant fixTime = lines.stream().map(LineOfPosition::utc).max(Comparator.naturalOrder()).orElseThrow();
        Instant first = lines.stream().map(LineOfPosition::utc).min(Comparator.naturalOrder()).orElseThrow();
        boolean running = Duration.between(first, fixTime).toSeconds() > FixSolver.SIMULTANEOUS_SECONDS;
        if (!running) {
            fixTime = FixSolver.meanTime(lines);
        }
        LineOfPosition last = members.get(members.size() - 1).reduced().orElseThrow().lop();
        GeoPosition start = drAt(log, fixTime).orElse(last.ap());
        Optional<DrTrack> track = log.map(PlotComputer::track);
        try {
            Fix fix = FixSolver.solve(lines, fixTime, start, track, options);
            List<Plot.AdvancedLine> advanced = new ArrayList<>();
            for (int i = 0; i < fix.lines().size(); i++) {
                FixLineResult lr = fix.lines().get(i);
                if (lr.distanceRunNm() != 0.0 && track.isPresent()) {
                    LineOfPosition l = lr.original();
                    GeoPosition moved = track.get().move(l.interceptPoint(), l.utc(), fix.utc());
                    advanced.add(new Plot.AdvancedLine(rows.get(i), fix.utc(), moved, l.znDeg(), lr.distanceRunNm()));
                }
            }
            return new Plot.FixResult(name, rows, Optional.of(fix), Optional.empty(), advanced, isRunning(first, fixTime));
        } catch (FixGeometryException | IllegalArgumentException e) {
            return new Plot.FixResult(name, rows, Optional.empty(), Optional.of(e.getMessage()), List.of(),
                    isRunning(first, fixTime));
        }
    }

    /** @return true (running) when the span exceeds one round */
    private static boolean isRunning(Instant first, Instant last) {
        return Duration.between(first, last).toMinutes() > ROUND_MINUTES;
    }

    private static List<Plot.SetDrift> setDrifts(List<Plot.FixResult> fixes, Optional<DrLog> log) {
        List<Plot.SetDrift> out = new ArrayList<>();
        if (log.isEmpty()) {
            return out;
        }
        DrTrack track = track(log.get());
        Fix previous = null;
        for (Plot.FixResult fr : fixes) {
            if (fr.fix().isEmpty()) {
                continue;
            }
            Fix f = fr.fix().get();
            if (previous != null && f.utc().isAfter(previous.utc())) {
                GeoPosition d = track.move(previous.position(), previous.utc(), f.utc());
                Sailings.RhumbLine rl = Sailings.rhumbLine(d, f.position());
                double hours = Duration.between(previous.utc(), f.utc()).toSeconds() / 3600.0;
                out.add(new Plot.SetDrift(previous.utc(), f.utc(), d, f.position(), rl.courseDeg(),
                        rl.distanceNm() / hours));
            }
            previous = f;
        }
        return out;
    }
}
