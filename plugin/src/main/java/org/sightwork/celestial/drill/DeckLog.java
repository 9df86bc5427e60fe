package org.sightwork.celestial.drill;

import java.time.Duration;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import org.sightwork.geo.earth.GeoPosition;
import org.sightwork.geo.earth.Sailings;

/**
 * The deck log an honest watchkeeper writes on the true track (heading steered and speed through
 * the water, rounded as logged), and the dead reckoning worked from it. The DR knows nothing of
 * the current, so it drifts from the truth by the current's set and drift, as at sea.
 *
 * <p><b>Method.</b> An entry at departure, at every alteration (start of a leg) and every
 * {@code intervalMinutes} from departure; between entries the logged heading and speed hold. DR:
 * from the departure position, one rhumb line per period ({@link Sailings#rhumbDestination}) on the
 * logged heading for the logged speed times the period: the DR of Bowditch (dead reckoning: course
 * and speed through the water from a known position, no current; from memory).
 *
 * <p><b>Limits.</b> No leeway, no compass or log error beyond the rounding of the entries.
 */
public final class DeckLog {

    /**
     * One entry of the deck log.
     *
     * @param utc time of the entry
     * @param headingDeg heading steered from now on, true (degrees, rounded as logged)
     * @param speedKn speed through the water from now on (knots, rounded as logged)
     * @param drPosition the DR position at the entry
     * @param remark why the entry was made ("departure", "altered course, leg 2", "hourly")
     */
    public record Entry(Instant utc, double headingDeg, double speedKn, GeoPosition drPosition, String remark) {
    }

    private final List<Entry> entries;
    private final Instant endUtc;

    private DeckLog(List<Entry> entries, Instant endUtc) {
        this.entries = List.copyOf(entries);
        this.endUtc = endUtc;
    }

    /**
     * Writes the deck log of a true track.
     *
     * @param track the true track
     * @param spec how the log is kept
     * @return the log, with DR positions
     */
    public static DeckLog keep(TrueTrack track, Scenario.DrLogSpec spec) {
        List<Entry> out = new ArrayList<>();
        Instant t = track.startUtc();
        GeoPosition dr = track.legs().get(0).from();
        Duration step = Duration.ofMinutes(spec.intervalMinutes());
        Instant nextRoutine = t.plus(step);
        for (TrueTrack.Leg leg : track.legs()) {
            double hdg = roundTo(leg.headingDeg(), spec.courseResolutionDeg()) % 360.0;
            double spd = roundTo(leg.speedThroughWaterKn(), spec.speedResolutionKn());
            String remark = leg.number() == 1 ? "departure" : "altered course, leg " + leg.number();
            Instant at = leg.startUtc();
            while (true) {
                if (!out.isEmpty()) {
                    Entry prev = out.get(out.size() - 1);
                    dr = run(prev.drPosition(), prev.headingDeg(), prev.speedKn(), prev.utc(), at);
                }
                out.add(new Entry(at, hdg, spd, dr, remark));
                while (!nextRoutine.isAfter(at)) {
                    nextRoutine = nextRoutine.plus(step);
                }
                if (!nextRoutine.isBefore(leg.endUtc())) {
                    break;
                }
                at = nextRoutine;
                remark = "routine";
            }
            t = leg.endUtc();
        }
        Entry last = out.get(out.size() - 1);
        out.add(new Entry(t, last.headingDeg(), 0.0,
                run(last.drPosition(), last.headingDeg(), last.speedKn(), last.utc(), t), "arrived, log stopped"));
        return new DeckLog(out, t);
    }

    /** @return the entries, in time order */
    public List<Entry> entries() {
        return entries;
    }

    /**
     * The DR position at a time, from the last entry before it.
     *
     * @param utc a time between departure and arrival
     * @return the DR position
     */
    public GeoPosition drAt(Instant utc) {
        return entryAt(utc).map(e -> run(e.drPosition(), e.headingDeg(), e.speedKn(), e.utc(), utc))
                .orElseThrow(() -> new DrillException("the time " + utc + " is outside the deck log ("
                        + entries.get(0).utc() + " to " + endUtc + ")"));
    }

    /**
     * The logged heading and speed at a time (those of the last entry before it).
     *
     * @param utc a time between departure and arrival
     * @return the entry in force
     */
    public Entry inForceAt(Instant utc) {
        return entryAt(utc).orElseThrow(() -> new DrillException("the time " + utc + " is outside the deck log"));
    }

    private java.util.Optional<Entry> entryAt(Instant utc) {
        if (utc.isBefore(entries.get(0).utc()) || utc.isAfter(endUtc)) {
            return java.util.Optional.empty();
        }
        Entry found = entries.get(0);
        for (Entry e : entries) {
            if (e.utc().isAfter(utc)) {
                break;
            }
            if (e.speedKn() > 0 || found.speedKn() == 0) {
                found = e;
            }
        }
        return java.util.Optional.of(found);
    }

    private static GeoPosition run(GeoPosition from, double headingDeg, double speedKn, Instant t0, Instant t1) {
        double hours = Duration.between(t0, t1).toNanos() / 3.6e12;
        return hours == 0 ? from : Sailings.rhumbDestination(from, headingDeg, speedKn * hours);
    }

    static double roundTo(double v, double step) {
        return step <= 0 ? v : Math.round(v / step) * step;
    }
}
