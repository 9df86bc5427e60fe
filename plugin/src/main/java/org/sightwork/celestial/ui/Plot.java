package org.sightwork.celestial.ui;

import java.time.Instant;
import java.util.List;
import java.util.Optional;
import org.sightwork.celestial.fix.Fix;
import org.sightwork.celestial.reduction.ReducedSight;
import org.sightwork.geo.earth.GeoPosition;
import org.sightwork.geo.track.Track;

/**
 * Everything the chart and the panels show of a passage, worked out by {@link PlotComputer}: each
 * sight's reduction (or why it has none), each fix, the lines advanced for running fixes, the DR
 * track and the set and drift between fixes. Immutable.
 *
 * @param sights one per sight log row, in row order
 * @param fixes one per fix name used in the log, in time order
 * @param drTrack the DR track sampled every {@link PlotComputer#DR_STEP_MINUTES} minutes (empty
 *     without a DR log)
 * @param gps the GPS track, if loaded
 * @param setDrifts set and drift between consecutive fixes
 */
record Plot(List<SightResult> sights, List<FixResult> fixes, List<TimedPosition> drTrack, Optional<Track> gps,
        List<SetDrift> setDrifts) {

    /** Copies the lists. */
    Plot {
        sights = List.copyOf(sights);
        fixes = List.copyOf(fixes);
        drTrack = List.copyOf(drTrack);
        setDrifts = List.copyOf(setDrifts);
    }

    /** An empty plot. */
    static final Plot EMPTY = new Plot(List.of(), List.of(), List.of(), Optional.empty(), List.of());

    /**
     * A position at a time.
     *
     * @param utc the time
     * @param position the position
     */
    record TimedPosition(Instant utc, GeoPosition position) {
    }

    /**
     * One row's outcome.
     *
     * @param row the row index
     * @param read what the row says (with the problem of each bad cell)
     * @param reduced the worked sight, when the row could be worked
     * @param problem why it could not, when it could not (bad cells, or the reduction's refusal)
     * @param circleWanted whether the navigator asked for the circle of equal altitude
     */
    record SightResult(int row, SightRowReader.Read read, Optional<ReducedSight> reduced, Optional<String> problem,
            boolean circleWanted) {

        /** @return a short label, e.g. "Sun LL 09:12" */
        String label() {
            return reduced.map(r -> r.lop().label()).orElse("row " + (row + 1));
        }

        /** @return the time of the sight, when it could be read */
        Optional<Instant> utc() {
            return read.sight().map(s -> s.utc());
        }
    }

    /**
     * A fix from the sights that share a fix name.
     *
     * @param name the fix name
     * @param rows the rows that went into it
     * @param fix the fix, when there was one
     * @param problem why there was none
     * @param advanced the lines carried along the DR to the fix time
     * @param running whether it is a running fix: its sights span more than
     *     {@link PlotComputer#ROUND_MINUTES} minutes (a round of star sights a few minutes apart is
     *     a fix, its lines carried to a common time)
     */
    record FixResult(String name, List<Integer> rows, Optional<Fix> fix, Optional<String> problem,
            List<AdvancedLine> advanced, boolean running) {
        FixResult {
            rows = List.copyOf(rows);
            advanced = List.copyOf(advanced);
        }

        /** @return whether it is a running fix (sights hours apart, not one round) */
        boolean isRunning() {
            return running;
        }
    }

    /**
     * A line of position carried along the DR to a later (or earlier) time.
     *
     * @param row the row of its sight
     * @param to the time it was carried to
     * @param interceptPoint its intercept point, carried
     * @param znDeg the azimuth of the body (the line is at right angles to it; degrees true)
     * @param runNm distance run (nautical miles; negative when retired)
     */
    record AdvancedLine(int row, Instant to, GeoPosition interceptPoint, double znDeg, double runNm) {
    }

    /**
     * The current worked out between two fixes.
     *
     * @param from the earlier fix's time
     * @param to the later fix's time
     * @param drAtTo the earlier fix carried along the DR to the later time
     * @param fixAtTo the later fix
     * @param setDeg the set (direction toward which the water moved the vessel, degrees true)
     * @param driftKn the drift (knots)
     */
    record SetDrift(Instant from, Instant to, GeoPosition drAtTo, GeoPosition fixAtTo, double setDeg, double driftKn) {
    }
}
