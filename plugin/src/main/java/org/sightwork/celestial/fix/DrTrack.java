package org.sightwork.celestial.fix;

import java.time.Duration;
import java.time.Instant;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import java.util.Objects;
import org.sightwork.celestial.reduction.Sphere;
import org.sightwork.geo.earth.GeoPosition;

/**
 * A dead-reckoning track as legs of constant course and speed, used to carry a position from one
 * time to another (advance or retire a line of position).
 *
 * <p><b>Method.</b> Each leg is a rhumb line ({@link Sphere#rhumb}); a leg holds from its start
 * until the next leg starts; before the first leg the first leg's course and speed are assumed,
 * after the last the last's.
 *
 * @param legs the legs, in time order (at least one)
 */
public record DrTrack(List<Leg> legs) {

    /**
     * One leg.
     *
     * @param start when this course and speed began (UTC)
     * @param courseDeg course made good (degrees true, [0°, 360°])
     * @param speedKn speed made good (knots, [0, 60])
     */
    public record Leg(Instant start, double courseDeg, double speedKn) {
        /** Checks the ranges. */
        public Leg {
            Objects.requireNonNull(start, "start");
            if (!(courseDeg >= 0.0 && courseDeg <= 360.0)) {
                throw new IllegalArgumentException(String.format(Locale.ROOT, "course %.1f° is outside 000°-360°", courseDeg));
            }
            if (!(speedKn >= 0.0 && speedKn <= 60.0)) {
                throw new IllegalArgumentException(String.format(Locale.ROOT, "speed %.1f kn is outside 0-60 kn", speedKn));
            }
        }
    }

    /** Sorts and copies the legs. */
    public DrTrack {
        if (legs.isEmpty()) {
            throw new IllegalArgumentException("a DR track needs at least one leg");
        }
        List<Leg> sorted = new ArrayList<>(legs);
        sorted.sort(Comparator.comparing(Leg::start));
        legs = List.copyOf(sorted);
    }

    /**
     * @param start start time
     * @param courseDeg course (degrees true)
     * @param speedKn speed (knots)
     * @return a one-leg track
     */
    public static DrTrack steady(Instant start, double courseDeg, double speedKn) {
        return new DrTrack(List.of(new Leg(start, courseDeg, speedKn)));
    }

    /**
     * Carries a position along the track.
     *
     * @param position the position at {@code from}
     * @param from its time
     * @param to the wanted time (earlier or later)
     * @return the DR position at {@code to}
     */
    public GeoPosition move(GeoPosition position, Instant from, Instant to) {
        GeoPosition p = position;
        if (to.equals(from)) {
            return p;
        }
        boolean forward = to.isAfter(from);
        Instant a = forward ? from : to;
        Instant b = forward ? to : from;
        List<double[]> pieces = new ArrayList<>(); // {course, distance} in time order
        for (int i = 0; i < legs.size(); i++) {
            Instant ls = i == 0 ? Instant.MIN : legs.get(i).start();
            Instant le = i + 1 < legs.size() ? legs.get(i + 1).start() : Instant.MAX;
            Instant s = ls.isAfter(a) ? ls : a;
            Instant e = le.isBefore(b) ? le : b;
            if (e.isAfter(s)) {
                double hours = Duration.between(s, e).toNanos() / 3.6e12;
                pieces.add(new double[] {legs.get(i).courseDeg(), legs.get(i).speedKn() * hours});
            }
        }
        if (forward) {
            for (double[] piece : pieces) {
                p = Sphere.rhumb(p, piece[0], piece[1]);
            }
        } else {
            for (int i = pieces.size() - 1; i >= 0; i--) {
                p = Sphere.rhumb(p, pieces.get(i)[0], -pieces.get(i)[1]);
            }
        }
        return p;
    }

    /**
     * @param from one time
     * @param to another
     * @return distance run between them along the track (nautical miles, not negative)
     */
    public double distanceRunNm(Instant from, Instant to) {
        Instant a = from.isBefore(to) ? from : to;
        Instant b = from.isBefore(to) ? to : from;
        double total = 0.0;
        for (int i = 0; i < legs.size(); i++) {
            Instant ls = i == 0 ? Instant.MIN : legs.get(i).start();
            Instant le = i + 1 < legs.size() ? legs.get(i + 1).start() : Instant.MAX;
            Instant s = ls.isAfter(a) ? ls : a;
            Instant e = le.isBefore(b) ? le : b;
            if (e.isAfter(s)) {
                total += legs.get(i).speedKn() * Duration.between(s, e).toNanos() / 3.6e12;
            }
        }
        return total;
    }
}
