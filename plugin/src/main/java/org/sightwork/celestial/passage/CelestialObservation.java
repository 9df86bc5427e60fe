package org.sightwork.celestial.passage;

import java.time.Instant;
import java.util.Objects;
import org.sightwork.geo.earth.GeoPosition;

/**
 * A celestial observation as the reconciliation uses it: either one line of position, or a fix
 * with its covariance. Both say where the vessel was at a time, with a stated uncertainty.
 */
public sealed interface CelestialObservation permits CelestialObservation.Line, CelestialObservation.Position {

    /** @return when the observation was made (UTC) */
    Instant time();

    /** @return a short label for tables ("Vega", "fix 3") */
    String label();

    /**
     * A line of position by the intercept method: the vessel lies on the line through the intercept
     * point, perpendicular to the azimuth, {@code interceptNm} from the assumed position towards the
     * body (away when negative).
     *
     * @param time time of the sight (UTC)
     * @param label the body or a name
     * @param ap the assumed position (AP)
     * @param azimuthDeg azimuth Zn of the body (degrees true, [0°, 360°))
     * @param interceptNm intercept (nautical miles, positive towards)
     * @param sigmaNm standard deviation of the line across its direction (nautical miles, &gt; 0)
     */
    record Line(Instant time, String label, GeoPosition ap, double azimuthDeg, double interceptNm, double sigmaNm)
            implements CelestialObservation {
        /** Checks the ranges. */
        public Line {
            Objects.requireNonNull(time, "time");
            Objects.requireNonNull(label, "label");
            Objects.requireNonNull(ap, "ap");
            if (!(azimuthDeg >= 0 && azimuthDeg < 360)) {
                throw new IllegalArgumentException("azimuth " + azimuthDeg + "° is outside [0°, 360°)");
            }
            if (!Double.isFinite(interceptNm) || Math.abs(interceptNm) > 600) {
                throw new IllegalArgumentException("intercept " + interceptNm + " nm: expected at most 600 nm");
            }
            if (!(sigmaNm > 0 && sigmaNm < 100)) {
                throw new IllegalArgumentException("line sigma " + sigmaNm + " nm: expected (0, 100) nm");
            }
        }
    }

    /**
     * A fix with its covariance (east and north standard deviations and their correlation).
     *
     * @param time time of the fix (UTC)
     * @param label a name
     * @param position the fix
     * @param sigmaEastNm standard deviation east (nautical miles, &gt; 0)
     * @param sigmaNorthNm standard deviation north (nautical miles, &gt; 0)
     * @param correlation correlation of the east and north errors, (-1, 1)
     */
    record Position(Instant time, String label, GeoPosition position, double sigmaEastNm, double sigmaNorthNm,
            double correlation) implements CelestialObservation {
        /** Checks the ranges. */
        public Position {
            Objects.requireNonNull(time, "time");
            Objects.requireNonNull(label, "label");
            Objects.requireNonNull(position, "position");
            if (!(sigmaEastNm > 0 && sigmaEastNm < 100) || !(sigmaNorthNm > 0 && sigmaNorthNm < 100)) {
                throw new IllegalArgumentException("fix sigmas " + sigmaEastNm + " / " + sigmaNorthNm
                        + " nm: expected (0, 100) nm");
            }
            if (!(Math.abs(correlation) < 1)) {
                throw new IllegalArgumentException("fix correlation " + correlation + ": expected (-1, 1)");
            }
        }
    }
}
