package org.sightwork.geo.track;

import java.time.Duration;
import java.time.Instant;
import java.util.List;
import org.sightwork.geo.earth.GeoPosition;
import org.sightwork.geo.earth.Sailings;

/**
 * Dead reckoning (DR) and estimated positions (EP) from a {@link DrLog}.
 *
 * <p><b>Method.</b> The DR position runs each leg by rhumb-line sailing ({@link Sailings#rhumbDestination})
 * on the water track (heading + leeway) for the leg's speed times its duration (Bowditch,
 * <i>The American Practical Navigator</i>, Pub. 9, 2019 ed., ch. 7 "Dead reckoning"). An EP adds a
 * stated current: on each leg, the water-track vector plus the set-and-drift vector give the course
 * and speed made good, run by the same sailing.
 *
 * <p><b>Limits.</b> Legs over 24 h on a course near east or west at high latitude are fine (the
 * rhumb line is exact); a leg that would cross a pole is refused by the sailing.
 */
public final class DeadReckoning {

    private DeadReckoning() {
    }

    /**
     * A current (tidal or ocean) as set and drift.
     *
     * @param setDeg the direction towards which the water moves (degrees true, [0°, 360°))
     * @param driftKn its speed (knots, ≥ 0)
     */
    public record Current(double setDeg, double driftKn) {
        /** No current. */
        public static final Current NONE = new Current(0, 0);

        /** Checks the ranges. */
        public Current {
            if (!(setDeg >= 0 && setDeg < 360) || !(driftKn >= 0)) {
                throw new IllegalArgumentException("current set " + setDeg + "° / drift " + driftKn
                        + " kn: expected set in [0°, 360°) and drift ≥ 0 kn");
            }
        }

        /**
         * A current from its east and north components.
         *
         * @param eastKn east component (knots)
         * @param northKn north component (knots)
         * @return the current
         */
        public static Current ofComponents(double eastKn, double northKn) {
            double set = Math.toDegrees(Math.atan2(eastKn, northKn));
            set = set < 0 ? set + 360 : set;
            return new Current(set >= 360 ? 0 : set, Math.hypot(eastKn, northKn));
        }
    }

    /**
     * The DR position at a time.
     *
     * @param log the DR log
     * @param t the time, within the log
     * @return the DR position
     */
    public static GeoPosition dr(DrLog log, Instant t) {
        return ep(log, t, Current.NONE);
    }

    /**
     * The estimated position at a time with a stated current.
     *
     * @param log the DR log
     * @param t the time, from departure to the log's end
     * @param current the current assumed over the whole log
     * @return the EP
     * @throws IllegalArgumentException if t is outside the log
     */
    public static GeoPosition ep(DrLog log, Instant t, Current current) {
        if (t.isBefore(log.start()) || t.isAfter(log.end())) {
            throw new IllegalArgumentException("time " + t + " is outside the DR log (" + log.start() + " to "
                    + log.end() + ")");
        }
        List<DrLeg> legs = log.legs();
        GeoPosition p = log.departure();
        double ce = current.driftKn() * Math.sin(Math.toRadians(current.setDeg()));
        double cn = current.driftKn() * Math.cos(Math.toRadians(current.setDeg()));
        for (int i = 0; i < legs.size(); i++) {
            DrLeg leg = legs.get(i);
            if (!leg.start().isBefore(t)) {
                break;
            }
            Instant legEnd = i + 1 < legs.size() ? legs.get(i + 1).start() : log.end();
            Instant until = legEnd.isBefore(t) ? legEnd : t;
            double hours = Duration.between(leg.start(), until).toMillis() / 3_600_000.0;
            double w = Math.toRadians(leg.waterTrackDeg());
            double ve = leg.stwKn() * Math.sin(w) + ce;
            double vn = leg.stwKn() * Math.cos(w) + cn;
            double speed = Math.hypot(ve, vn);
            if (speed * hours > 0) {
                double course = Math.toDegrees(Math.atan2(ve, vn));
                p = Sailings.rhumbDestination(p, course < 0 ? course + 360 : course, speed * hours);
            }
        }
        return p;
    }
}
