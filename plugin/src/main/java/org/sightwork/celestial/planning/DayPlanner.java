package org.sightwork.celestial.planning;

import java.time.Instant;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;
import java.util.function.DoubleUnaryOperator;
import org.sightwork.celestial.almanac.Almanac;
import org.sightwork.celestial.almanac.Body;
import org.sightwork.celestial.almanac.BodyPosition;
import org.sightwork.celestial.time.AstroTime;
import org.sightwork.geo.earth.GeoPosition;

/**
 * The day's times at a DR that moves with the ship: sunrise, sunset, civil and nautical twilight,
 * moonrise, moonset and meridian passages.
 *
 * <p><b>Method:</b> each event is a zero of a function of time, {@code Hc(t) − h0(t)} for a rise,
 * set or twilight, the hour angle for a transit, where the almanac gives the body's GHA and Dec at
 * {@code t} and the ship's track gives the DR at {@code t}; so the answer is iterated for the ship's
 * run by construction (the root finder evaluates the body at the DR of each trial time), not
 * corrected afterwards. Roots are bracketed by 10-minute steps and refined to half a second
 * ({@link EventFinder}). The thresholds h0, for the geocentric altitude of the body's centre:
 * <ul>
 * <li>sunrise, sunset: the upper limb on the visible horizon, {@code h0 = HP − SD − 34′ − dip}
 *     (34′ the conventional horizontal refraction; SD and HP of the moment from the almanac; the
 *     dip {@code 1.76′ √(eye height m)}; a height of eye of 0 gives the almanac's sea-level
 *     convention);</li>
 * <li>civil and nautical twilight: the centre at −6° and −12°, geometric (no refraction, no dip),
 *     the usual definitions;</li>
 * <li>moonrise, moonset: {@code h0 = 0.7275 HP − 34′ − dip} (Meeus, <i>Astronomical Algorithms</i>,
 *     2nd ed., ch. 15; from memory): parallax minus semi-diameter (0.2725 HP) minus refraction;</li>
 * <li>meridian passage: the local hour angle passes 0° (upper transit); for the Sun this is local
 *     apparent noon.</li>
 * </ul>
 *
 * <p><b>Accuracy:</b> measured against PyEphem and NREL SPA (see {@code docs/PLANNING.md}): within a
 * minute outside polar day and night. Near the poles, where the Sun skims the horizon, a small
 * change of altitude moves the time by many minutes; the times are then as good as the refraction
 * at the horizon, which nobody knows to better than a few arcminutes.
 *
 * <p><b>Limits:</b> the first event of each kind in the day is given; a second one (possible for
 * the Moon at high latitudes) is not. A graze that dips below the threshold for less than a few
 * seconds may be missed.
 *
 * <p><b>Thread safety:</b> immutable; safe to share if the almanac is.
 */
public final class DayPlanner {

    /** Sampling step of the bracketing search (seconds): the Moon moves its altitude under 4° in it. */
    static final double STEP_S = 600.0;

    /** Threshold of civil twilight: the Sun's centre 6° below the horizon (geometric). */
    public static final double CIVIL_TWILIGHT_DEG = -6.0;

    /** Threshold of nautical twilight: the Sun's centre 12° below the horizon (geometric). */
    public static final double NAUTICAL_TWILIGHT_DEG = -12.0;

    /** Meeus' factor of HP in the Moon's rising altitude, ch. 15 (from memory): 1 − 0.2725. */
    public static final double MOON_RISE_HP_FACTOR = 0.7275;

    private final Almanac almanac;

    /**
     * A planner on an almanac.
     *
     * @param almanac the almanac
     */
    public DayPlanner(Almanac almanac) {
        this.almanac = Objects.requireNonNull(almanac, "almanac");
    }

    /**
     * The day's times.
     *
     * @param track the ship's track (a stationary one for a fixed position)
     * @param day the day (see {@link DayWindow#zoneDay} and {@link DayWindow#utcDay})
     * @param eyeHeightM height of eye for the dip (metres, ≥ 0; 0 for the sea-level convention)
     * @return the times
     */
    public DayEvents dayEvents(ShipTrack track, DayWindow day, double eyeHeightM) {
        double dipDeg = SextantApprox.dipArcmin(eyeHeightM) / 60.0;
        double refrDeg = SextantApprox.HORIZON_REFRACTION_ARCMIN / 60.0;
        Track sun = new Track(Body.SUN, track, day);
        DoubleUnaryOperator sunRiseFn = s -> {
            Sample x = sun.at(s);
            return x.altDeg - ((x.hpArcmin - x.sdArcmin) / 60.0 - refrDeg - dipDeg);
        };
        List<EventFinder.Crossing> sunCross = EventFinder.crossings(sunRiseFn, day.spanSeconds(), STEP_S);
        // Twilight is defined for the Sun's centre as seen from the observer: the geocentric
        // threshold is raised by the parallax (0.15′; it matters only where the Sun skims the
        // twilight line, near the poles, where a tenth of a minute of arc is a minute of time).
        List<EventFinder.Crossing> civil = EventFinder.crossings(
                s -> sun.at(s).altDeg - (CIVIL_TWILIGHT_DEG + sun.at(s).hpArcmin / 60.0), day.spanSeconds(), STEP_S);
        List<EventFinder.Crossing> nautical = EventFinder.crossings(
                s -> sun.at(s).altDeg - (NAUTICAL_TWILIGHT_DEG + sun.at(s).hpArcmin / 60.0), day.spanSeconds(), STEP_S);
        Optional<Instant> noon = first(EventFinder.transitCrossings(
                s -> Horizon.norm180(sun.at(s).lhaDeg), day.spanSeconds(), STEP_S), day);

        Track moon = new Track(Body.MOON, track, day);
        List<EventFinder.Crossing> moonCross = EventFinder.crossings(s -> {
            Sample x = moon.at(s);
            return x.altDeg - (MOON_RISE_HP_FACTOR * x.hpArcmin / 60.0 - refrDeg - dipDeg);
        }, day.spanSeconds(), STEP_S);

        DayEvents.SunDay sunDay = DayEvents.SunDay.RISES_OR_SETS;
        if (sunCross.isEmpty()) {
            sunDay = sunRiseFn.applyAsDouble(0.0) > 0 ? DayEvents.SunDay.ALWAYS_UP : DayEvents.SunDay.ALWAYS_DOWN;
        }
        return new DayEvents(day, eyeHeightM,
                first(sunCross, true, day), first(sunCross, false, day),
                first(civil, true, day), first(civil, false, day),
                first(nautical, true, day), first(nautical, false, day),
                noon,
                first(moonCross, true, day), first(moonCross, false, day),
                sunDay);
    }

    /**
     * The first upper transit (meridian passage) of a body in a day, at the moving DR.
     *
     * @param body any body the almanac knows
     * @param track the ship's track
     * @param day the day
     * @return the instant, empty if the body does not transit in the day
     */
    public Optional<Instant> upperTransit(Body body, ShipTrack track, DayWindow day) {
        Track b = new Track(body, track, day);
        return first(EventFinder.transitCrossings(s -> Horizon.norm180(b.at(s).lhaDeg), day.spanSeconds(), STEP_S), day);
    }

    /**
     * The first instant in a day at which a body's geocentric altitude (centre, no refraction)
     * crosses a given value, rising or setting, at the moving DR.
     *
     * @param body the body
     * @param track the ship's track
     * @param day the day
     * @param altitudeDeg the altitude (degrees)
     * @param rising true for the crossing upwards
     * @return the instant, empty if there is none in the day
     */
    public Optional<Instant> altitudeCrossing(Body body, ShipTrack track, DayWindow day, double altitudeDeg,
            boolean rising) {
        Track b = new Track(body, track, day);
        return first(EventFinder.crossings(s -> b.at(s).altDeg - altitudeDeg, day.spanSeconds(), STEP_S),
                rising, day);
    }

    private static Optional<Instant> first(List<EventFinder.Crossing> cs, boolean upward, DayWindow day) {
        return cs.stream().filter(c -> c.upward() == upward).findFirst().map(c -> day.at(c.tS()))
                .filter(day::contains);
    }

    private static Optional<Instant> first(List<Double> ts, DayWindow day) {
        return ts.stream().findFirst().map(day::at).filter(day::contains);
    }

    /** What the root finder needs of a body at one instant. */
    private record Sample(double altDeg, double lhaDeg, double hpArcmin, double sdArcmin) {
    }

    /** A body seen from the moving DR over a day. */
    private final class Track {
        private final Body body;
        private final ShipTrack ship;
        private final DayWindow day;

        Track(Body body, ShipTrack ship, DayWindow day) {
            this.body = body;
            this.ship = ship;
            this.day = day;
        }

        /** Samples already computed: the grid is shared by the several thresholds of one body. */
        private final Map<Double, Sample> memo = new HashMap<>();

        Sample at(double s) {
            return memo.computeIfAbsent(s, this::compute);
        }

        private Sample compute(double s) {
            Instant t = day.at(s);
            BodyPosition p = almanac.position(body, AstroTime.ofUtc(t));
            GeoPosition dr = ship.positionAt(t);
            HorizonPoint h = Horizon.fromEquatorial(p.ghaDeg(), p.decDeg(), dr);
            boolean needsDisc = body.kind() == Body.Kind.SUN || body.kind() == Body.Kind.MOON;
            if (needsDisc && (p.hpArcmin().isEmpty() || p.sdArcmin().isEmpty())) {
                throw new IllegalStateException("the almanac gave no parallax or semi-diameter for the " + body.name());
            }
            return new Sample(h.altitudeDeg(), p.ghaDeg() + dr.lonDeg(),
                    p.hpArcmin().orElse(0.0), p.sdArcmin().orElse(0.0));
        }
    }
}
