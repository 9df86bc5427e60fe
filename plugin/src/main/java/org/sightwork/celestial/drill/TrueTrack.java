package org.sightwork.celestial.drill;

import java.time.Duration;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import org.sightwork.geo.earth.GeoPosition;
import org.sightwork.geo.earth.Sailings;

/**
 * The vessel's true track over the ground, from a scenario's waypoints: rhumb-line legs at constant
 * speed over the ground, and for each leg the heading and speed through the water that, with the
 * current, make that ground track.
 *
 * <p><b>Method.</b> Each leg is a rhumb line ({@link Sailings#rhumbLine}, WGS84); the position at a
 * time is the rhumb destination at the leg's speed over the ground. Water track: the ground
 * velocity less the current's velocity, as a plane vector sum in the local east-north frame (the
 * current triangle of current sailing, Bowditch, <i>The American Practical Navigator</i>, Pub. No. 9,
 * chapter on dead reckoning, from memory: velocity through the water = ground velocity − current). The
 * current is taken as steady, so the heading is constant along a leg.
 *
 * <p><b>Accuracy.</b> The position is exact for the defined track (the track is defined as these
 * rhumb lines); the heading is the local vector sum, which is the seaman's definition.
 *
 * <p><b>Limits.</b> A leg where the current is within 0.5 kn of the vessel's whole speed through the
 * water is refused (the vessel could not hold it). Times before departure or after the last
 * waypoint are refused with the span.
 */
public final class TrueTrack {

    /** The least speed through the water the vessel can steer at (knots): common practice. */
    static final double MIN_SPEED_THROUGH_WATER_KN = 0.5;

    /**
     * One leg of the true track.
     *
     * @param number the leg's number, from 1
     * @param startUtc start of the leg
     * @param endUtc end of the leg
     * @param from start position
     * @param to end position
     * @param courseOverGroundDeg the rhumb-line course (degrees true)
     * @param speedOverGroundKn speed over the ground (knots)
     * @param headingDeg heading steered, true (degrees)
     * @param speedThroughWaterKn speed through the water, as the log reads it (knots)
     */
    public record Leg(int number, Instant startUtc, Instant endUtc, GeoPosition from, GeoPosition to,
            double courseOverGroundDeg, double speedOverGroundKn, double headingDeg, double speedThroughWaterKn) {
    }

    private final List<Leg> legs;

    private TrueTrack(List<Leg> legs) {
        this.legs = List.copyOf(legs);
    }

    /**
     * Builds the true track of a scenario.
     *
     * @param track the scenario's track
     * @return the true track
     * @throws DrillException if a leg cannot be sailed (times out of order, current too strong)
     */
    public static TrueTrack of(Scenario.Track track) {
        List<Leg> legs = new ArrayList<>();
        List<String> problems = new ArrayList<>();
        Instant t0 = track.startUtc();
        GeoPosition p0 = track.start();
        Scenario.Current c = track.current();
        double cE = c.driftKn() * Math.sin(Math.toRadians(c.setDeg()));
        double cN = c.driftKn() * Math.cos(Math.toRadians(c.setDeg()));
        int n = 0;
        for (Scenario.Waypoint w : track.waypoints()) {
            n++;
            Sailings.RhumbLine r = Sailings.rhumbLine(p0, w.position());
            if (r.distanceNm() < 1e-6) {
                problems.add("track.waypoints[" + (n - 1) + "]: the waypoint is where the previous leg ends; "
                        + "expected a different position");
                continue;
            }
            Instant t1;
            double sog;
            if (w.arrivalUtc().isPresent()) {
                t1 = w.arrivalUtc().get();
                double hours = Duration.between(t0, t1).toMillis() / 3_600_000.0;
                if (hours <= 0) {
                    problems.add("track.waypoints[" + (n - 1) + "].utc: expected a time after " + t0 + ", got " + t1);
                    continue;
                }
                sog = r.distanceNm() / hours;
                if (sog > 40) {
                    problems.add(String.format(java.util.Locale.ROOT,
                            "track.waypoints[%d]: %.1f nm in %.2f h needs %.1f kn; expected at most 40 kn",
                            n - 1, r.distanceNm(), hours, sog));
                    continue;
                }
            } else {
                sog = w.speedOverGroundKn().getAsDouble();
                t1 = t0.plusMillis(Math.round(r.distanceNm() / sog * 3_600_000.0));
            }
            double gE = sog * Math.sin(Math.toRadians(r.courseDeg()));
            double gN = sog * Math.cos(Math.toRadians(r.courseDeg()));
            double wE = gE - cE;
            double wN = gN - cN;
            double stw = Math.hypot(wE, wN);
            if (stw < MIN_SPEED_THROUGH_WATER_KN) {
                problems.add(String.format(java.util.Locale.ROOT,
                        "track.waypoints[%d]: with the current (%.1f kn toward %03.0f°) the vessel would need only "
                                + "%.2f kn through the water to make %.1f kn over the ground; expected at least %.1f kn",
                        n - 1, c.driftKn(), c.setDeg(), stw, sog, MIN_SPEED_THROUGH_WATER_KN));
                continue;
            }
            double heading = (Math.toDegrees(Math.atan2(wE, wN)) + 360.0) % 360.0;
            legs.add(new Leg(n, t0, t1, p0, w.position(), r.courseDeg(), sog, heading, stw));
            t0 = t1;
            p0 = w.position();
        }
        if (!problems.isEmpty()) {
            throw new DrillException(problems);
        }
        return new TrueTrack(legs);
    }

    /** @return the legs, in order */
    public List<Leg> legs() {
        return legs;
    }

    /** @return time of departure */
    public Instant startUtc() {
        return legs.get(0).startUtc();
    }

    /** @return time of arrival at the last waypoint */
    public Instant endUtc() {
        return legs.get(legs.size() - 1).endUtc();
    }

    /**
     * @param utc a time in [departure, arrival]
     * @return whether the track covers it
     */
    public boolean covers(Instant utc) {
        return !utc.isBefore(startUtc()) && !utc.isAfter(endUtc());
    }

    /**
     * The leg sailed at a time (at a turning point, the leg that starts there).
     *
     * @param utc a time the track covers
     * @return the leg
     */
    public Leg legAt(Instant utc) {
        requireCovered(utc);
        for (Leg l : legs) {
            if (utc.isBefore(l.endUtc())) {
                return l;
            }
        }
        return legs.get(legs.size() - 1);
    }

    /**
     * The true position at a time.
     *
     * @param utc a time the track covers
     * @return the position
     */
    public GeoPosition positionAt(Instant utc) {
        Leg l = legAt(utc);
        double hours = Duration.between(l.startUtc(), utc).toNanos() / 3.6e12;
        return Sailings.rhumbDestination(l.from(), l.courseOverGroundDeg(), l.speedOverGroundKn() * hours);
    }

    private void requireCovered(Instant utc) {
        if (!covers(utc)) {
            throw new DrillException("the time " + utc + " is outside the passage (" + startUtc() + " to "
                    + endUtc() + ")");
        }
    }
}
