package org.sightwork.celestial.fix;

import java.time.Duration;
import java.time.Instant;
import java.time.ZoneOffset;
import java.time.format.DateTimeFormatter;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Optional;
import org.sightwork.celestial.reduction.LineOfPosition;
import org.sightwork.celestial.reduction.ReducedSight;
import org.sightwork.celestial.sight.Sight;
import org.sightwork.geo.earth.GeoPosition;

/**
 * Turns a sight log's worked sights into fixes: sights within a window (default 30 minutes) make
 * one fix at their mean time, the others carried to it along the DR; or one running fix from all
 * sights at a chosen time.
 *
 * <p>The DR track is built from the sights' own course and speed (a leg starting at each sight
 * that gives them); the first estimate of the fix is the DR of the sight nearest in time, run on
 * to the fix time. Thread safety: stateless.
 */
public final class FixPlanner {

    /** The default grouping window (minutes). */
    public static final double DEFAULT_WINDOW_MIN = 30.0;

    private static final DateTimeFormatter HM = DateTimeFormatter.ofPattern("HH:mm").withZone(ZoneOffset.UTC);

    /**
     * One group of sights and what came of it.
     *
     * @param utc the fix time
     * @param sights the sights of the group
     * @param fix the fix, if one could be made
     * @param failure why not, in a navigator's words, when no fix
     */
    public record Attempt(Instant utc, List<ReducedSight> sights, Optional<Fix> fix, Optional<String> failure) {
        /** Copies the list. */
        public Attempt {
            sights = List.copyOf(sights);
        }
    }

    private FixPlanner() {
    }

    /**
     * @param sights worked sights, any order
     * @param windowMin sights within this many minutes of a group's first make one fix
     * @param options fix settings
     * @return one attempt per group, in time order
     */
    public static List<Attempt> fixes(List<ReducedSight> sights, double windowMin, FixOptions options) {
        if (!(windowMin > 0.0)) {
            throw new IllegalArgumentException("the grouping window must be positive (minutes), not " + windowMin);
        }
        List<ReducedSight> sorted = new ArrayList<>(sights);
        sorted.sort(Comparator.comparing(r -> r.lop().utc()));
        Optional<DrTrack> track = track(sorted);
        List<Attempt> out = new ArrayList<>();
        int i = 0;
        while (i < sorted.size()) {
            Instant first = sorted.get(i).lop().utc();
            int j = i;
            while (j < sorted.size()
                    && Duration.between(first, sorted.get(j).lop().utc()).toNanos() / 6e10 <= windowMin) {
                j++;
            }
            List<ReducedSight> group = sorted.subList(i, j);
            Instant mean = FixSolver.meanTime(group.stream().map(ReducedSight::lop).toList());
            out.add(attempt(group, mean, track, options));
            i = j;
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
        return attempt(sorted, at, track(sorted), options);
    }

    private static Attempt attempt(List<ReducedSight> group, Instant at, Optional<DrTrack> track, FixOptions options) {
        List<LineOfPosition> lines = group.stream().map(ReducedSight::lop).toList();
        try {
            GeoPosition start = startAt(group, at, track);
            Fix fix = FixSolver.solve(lines, at, start, track, options);
            return new Attempt(at, group, Optional.of(fix), Optional.empty());
        } catch (FixGeometryException | IllegalArgumentException e) {
            return new Attempt(at, group, Optional.empty(), Optional.of("fix at " + HM.format(at) + "Z: " + e.getMessage()));
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
