package org.sightwork.celestial.passage;

import java.time.Instant;
import java.util.List;

/**
 * What the reconciliation found.
 *
 * @param frame the local plane the filter worked in
 * @param smoothed the best track (Rauch-Tung-Striebel smoothed, using every observation), on the
 *        output grid and at each observation
 * @param sessions the sight sessions, each with the filter's estimate at its end from the
 *        observations up to then (not the later ones): what the navigator knew at that time
 * @param observationChecks each observation against the filter's prediction before it
 */
public record Reconciliation(LocalFrame frame, List<TrackEstimate> smoothed, List<Session> sessions,
        List<ObservationCheck> observationChecks) {

    /** Copies the lists. */
    public Reconciliation {
        smoothed = List.copyOf(smoothed);
        sessions = List.copyOf(sessions);
        observationChecks = List.copyOf(observationChecks);
    }

    /**
     * A sight session: observations close in time (no gap over 30 minutes), taken together.
     *
     * @param index number of the session, from 1
     * @param start time of its first observation
     * @param end time of its last observation
     * @param labels the observations' labels
     * @param filtered the filter's estimate at the end of the session (causal: no later observation used)
     * @param fixOnItsOwn true when the session fixes the position by itself: a fix, or lines whose
     *        azimuths differ by 30° to 150°; a lone line (a Sun line) only moves the estimate along it
     */
    public record Session(int index, Instant start, Instant end, List<String> labels, TrackEstimate filtered,
            boolean fixOnItsOwn) {
        /** Copies the list. */
        public Session {
            labels = List.copyOf(labels);
        }
    }

    /**
     * One observation against the filter's prediction just before it: a check of the sight itself.
     *
     * @param time the observation's time
     * @param label its label
     * @param residualNm innovation: for a line, the observed minus the predicted intercept (nm); for
     *        a fix, the distance from the predicted position (nm)
     * @param nis normalised innovation squared (1 degree of freedom for a line, 2 for a fix)
     * @param dof degrees of freedom of the test
     */
    public record ObservationCheck(Instant time, String label, double residualNm, double nis, int dof) {
    }
}
