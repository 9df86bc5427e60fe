package org.sightwork.celestial.fix;

import java.time.Duration;
import java.time.Instant;
import java.time.ZoneOffset;
import java.time.format.DateTimeFormatter;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import org.sightwork.celestial.reduction.LineOfPosition;
import org.sightwork.celestial.reduction.ReducedSight;
import org.sightwork.celestial.sight.Sight;
import org.sightwork.geo.earth.GeoPosition;

/**
 * Turns a sight log's worked sights into fixes: sights within a window (default 30 minutes) make
 * one fix at their mean time, each carried to it along the DR; or one running fix from all sights
 * at a chosen time.
 *
 * <p>A window that holds a single line (a lone Sun sight, say) gives no fix by itself. When the
 * next window also holds a single line, no more than {@link #DEFAULT_ADVANCE_MAX_HOURS} hours later,
 * the earlier line is advanced along the DR to the later sight and the two make a running fix at
 * the later sight's time, as a navigator works morning, noon and afternoon Sun lines ("Sun-run-Sun",
 * common practice): with three such sights, a running fix at noon and another in the afternoon, the
 * noon line serving in both. A lone line followed by a window of several lines is not advanced into
 * that fix, which stays a fix of simultaneous sights; it is reported as giving no fix.
 *
 * <p>The DR track is built from the sights' own course and speed (a leg starting at each sight
 * that gives them); the first estimate of the fix is the DR of the sight nearest in time, run on
 * to the fix time. Thread safety: stateless.
 */
public final class FixPlanner {

    /** The default grouping window (minutes). */
    public static final double DEFAULT_WINDOW_MIN = 30.0;

    /**
     * How far a lone line is advanced to a later lone line for a running fix, by default (hours):
     * morning and afternoon Sun sights some three to four hours either side of noon (common
     * practice); over longer runs the DR error, 5 % of the run by default, outgrows the lines'.
     */
    public static final double DEFAULT_ADVANCE_MAX_HOURS = 4.0;

    private static final DateTimeFormatter HM = DateTimeFormatter.ofPattern("HH:mm").withZone(ZoneOffset.UTC);

    /**
     * One group of sights and what came of it.
     *
     * @param utc the fix time
     * @param sights the sights of the group
     * @param fix the fix, if one could be made
     * @param failure why not, in a navigator's words, when no fix
     * @param running true for a running fix: a lone line advanced along the DR to a later one, or
     *     every sight carried to a chosen time
     */
    public record Attempt(Instant utc, List<ReducedSight> sights, Optional<Fix> fix, Optional<String> failure,
            boolean running) {
        /** Copies the list. */
        public Attempt {
            sights = List.copyOf(sights);
        }
    }

    private FixPlanner() {
    }

    /**
     * Fixes, with lone lines advanced up to {@link #DEFAULT_ADVANCE_MAX_HOURS} (see the class comment).
     *
     * @param sights worked sights, any order
     * @param windowMin sights within this many minutes of a group's first make one fix
     * @param options fix settings
     * @return one attempt per group, in time order
     */
    public static List<Attempt> fixes(List<ReducedSight> sights, double windowMin, FixOptions options) {
        return fixes(sights, windowMin, DEFAULT_ADVANCE_MAX_HOURS, options);
    }

    /**
     * @param sights worked sights, any order
     * @param windowMin sights within this many minutes of a group's first make one fix
     * @param advanceMaxHours a lone line is advanced to the next lone line at most this many hours
     *     later for a running fix (0: never)
     * @param options fix settings
     * @return one attempt per group with several lines, per running fix, and per lone line that
     *     went into neither, in time order
     */
    public static List<Attempt> fixes(List<ReducedSight> sights, double windowMin, double advanceMaxHours,
            FixOptions options) {
        if (!(windowMin > 0.0)) {
            throw new IllegalArgumentException("the grouping window must be positive (minutes), not " + windowMin);
        }
        if (!(advanceMaxHours >= 0.0 && advanceMaxHours <= 24.0)) {
            throw new IllegalArgumentException("the longest advance of a lone line must be 0 to 24 hours, not "
                    + advanceMaxHours);
        }
        List<ReducedSight> sorted = new ArrayList<>(sights);
        sorted.sort(Comparator.comparing(r -> r.lop().utc()));
        Optional<DrTrack> track = track(sorted);
        List<List<ReducedSight>> groups = new ArrayList<>();
        int i = 0;
        while (i < sorted.size()) {
            Instant first = sorted.get(i).lop().utc();
            int j = i;
            while (j < sorted.size()
                    && Duration.between(first, sorted.get(j).lop().utc()).toNanos() / 6e10 <= windowMin) {
                j++;
            }
            groups.add(sorted.subList(i, j));
            i = j;
        }
        List<Attempt> out = new ArrayList<>();
        boolean inRunningFix = false; // the lone line of this group was the later line of a running fix
        for (int g = 0; g < groups.size(); g++) {
            List<ReducedSight> group = groups.get(g);
            if (group.size() > 1) {
                Instant mean = FixSolver.meanTime(group.stream().map(ReducedSight::lop).toList());
                out.add(attempt(group, mean, track, options, false));
                inRunningFix = false;
                continue;
            }
            ReducedSight lone = group.get(0);
            Optional<ReducedSight> later = g + 1 < groups.size() && groups.get(g + 1).size() == 1
                    ? Optional.of(groups.get(g + 1).get(0)) : Optional.empty();
            double hours = later.map(l -> Duration.between(lone.lop().utc(), l.lop().utc()).toNanos() / 3.6e12)
                    .orElse(Double.POSITIVE_INFINITY);
            if (later.isPresent() && hours <= advanceMaxHours && track.isPresent()) {
                out.add(attempt(List.of(lone, later.get()), later.get().lop().utc(), track, options, true));
                inRunningFix = true;
            } else if (!inRunningFix) {
                String why = track.isEmpty() ? "no course and speed in the log to advance it to a later sight"
                        : later.isPresent() ? String.format(Locale.ROOT,
                                "the next single sight is %.1f h later, more than the %.1f h a line is advanced",
                                hours, advanceMaxHours)
                        : "no single sight follows within " + advanceMaxHours + " h to advance it to";
                out.add(new Attempt(lone.lop().utc(), group, Optional.empty(), Optional.of("fix at "
                        + HM.format(lone.lop().utc()) + "Z: one line of position (" + lone.lop().label()
                        + ") gives no fix: take a second body at least 30° away in azimuth, or a later sight "
                        + "for a running fix (" + why + ")"), false));
            } else {
                inRunningFix = false;
            }
        }
        return out;
    }

    /**
     * One running fix from every sight, carried along the DR to a chosen time.
     *
     * @param sights worked sights
     * @param at the time of the fix
     * @param options fix settings
     * @return the attempt
     */
    public static Attempt runningFixAt(List<ReducedSight> sights, Instant at, FixOptions options) {
        List<ReducedSight> sorted = new ArrayList<>(sights);
        sorted.sort(Comparator.comparing(r -> r.lop().utc()));
        return attempt(sorted, at, track(sorted), options, true);
    }

    private static Attempt attempt(List<ReducedSight> group, Instant at, Optional<DrTrack> track, FixOptions options,
            boolean running) {
        List<LineOfPosition> lines = group.stream().map(ReducedSight::lop).toList();
        String what = running ? "running fix at " : "fix at ";
        try {
            GeoPosition start = startAt(group, at, track);
            Fix fix = FixSolver.solve(lines, at, start, track, options);
            return new Attempt(at, group, Optional.of(fix), Optional.empty(), running);
        } catch (FixGeometryException | IllegalArgumentException e) {
            return new Attempt(at, group, Optional.empty(), Optional.of(what + HM.format(at) + "Z: " + e.getMessage()),
                    running);
        }
    }

    private static GeoPosition startAt(List<ReducedSight> group, Instant at, Optional<DrTrack> track) {
        ReducedSight nearest = group.stream().min(Comparator.comparingLong(
                r -> Math.abs(Duration.between(r.lop().utc(), at).toNanos()))).orElseThrow();
        GeoPosition dr = nearest.lop().ap();
        return track.map(t -> t.move(dr, nearest.lop().utc(), at)).orElse(dr);
    }

    /**
     * @param sights worked sights in time order
     * @return the DR track of their course and speed, if any sight gives both
     */
    public static Optional<DrTrack> track(List<ReducedSight> sights) {
        List<DrTrack.Leg> legs = new ArrayList<>();
        for (ReducedSight r : sights) {
            Sight s = r.worksheet().sight();
            if (s.courseDeg().isPresent() && s.speedKn().isPresent()) {
                legs.add(new DrTrack.Leg(s.utc(), s.courseDeg().getAsDouble(), s.speedKn().getAsDouble()));
            }
        }
        return legs.isEmpty() ? Optional.empty() : Optional.of(new DrTrack(legs));
    }
}
