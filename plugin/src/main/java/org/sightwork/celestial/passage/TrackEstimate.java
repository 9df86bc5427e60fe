package org.sightwork.celestial.passage;

import java.time.Instant;
import org.sightwork.geo.earth.GeoPosition;
import org.sightwork.geo.track.DeadReckoning;

/**
 * The reconciled state at one time.
 *
 * @param time the time (UTC)
 * @param position the best position
 * @param positionCovariance its covariance (true nm²)
 * @param current the current estimated (set and drift)
 * @param currentSigmaKn standard deviation of each current component (knots, the larger of the two)
 * @param speedScale the log's scale error found (fraction: the speed through the water is log × (1 + this))
 * @param compassBiasDeg the compass error found (degrees, added to the heading steered)
 */
public record TrackEstimate(Instant time, GeoPosition position, Covariance2 positionCovariance,
        DeadReckoning.Current current, double currentSigmaKn, double speedScale, double compassBiasDeg) {
}
