package org.sightwork.celestial.drill;

import java.time.Duration;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.sightwork.geo.earth.Angles;
import org.sightwork.geo.earth.GeoPosition;
import org.sightwork.geo.track.DeadReckoning;
import org.sightwork.geo.track.DrLeg;
import org.sightwork.geo.track.DrLog;

/**
 * The deck log an honest watchkeeper writes on the true track (heading steered and speed through
 * the water, rounded as logged), as the shell's {@link DrLog}, and the dead reckoning worked from it
 * by {@link DeadReckoning#dr}. The DR knows nothing of the current, so it drifts from the truth by
 * the current's set and drift, as at sea.
 *
 * <p>An entry at departure, at every alteration (start of a leg, its time written to the minute) and every
 * {@code intervalMinutes} from departure; between entries the logged heading and speed hold.
 *
 * <p><b>Limits.</b> No leeway, no compass or log error beyond the rounding of the entries.
 */
public final class DeckLog {

    private final DrLog log;
    private final List<String> remarks;
    private final Scenario.DrLogSpec spec;

    private DeckLog(DrLog log, List<String> remarks, Scenario.DrLogSpec spec) {
        this.log = log;
        this.remarks = List.copyOf(remarks);
        this.spec = spec;
    }

    /**
     * Writes the deck log of a true track.
     *
     * @param track the true track
     * @param spec how the log is kept
     * @return the log
     */
    public static DeckLog keep(TrueTrack track, Scenario.DrLogSpec spec) {
        List<DrLeg> legs = new ArrayList<>();
        List<String> remarks = new ArrayList<>();
        Duration step = Duration.ofMinutes(spec.intervalMinutes());
        Instant nextRoutine = track.startUtc().plus(step);
        for (TrueTrack.Leg leg : track.legs()) {
            double hdg = roundTo(leg.headingDeg(), spec.courseResolutionDeg()) % 360.0;
            double spd = roundTo(leg.speedThroughWaterKn(), spec.speedResolutionKn());
            String remark = leg.number() == 1 ? "departure" : "altered course, leg " + leg.number();
            // The watchkeeper writes the time of an alteration to the minute.
            Instant at = leg.number() == 1 ? leg.startUtc() : roundToMinute(leg.startUtc());
            if (!legs.isEmpty() && !at.isAfter(legs.get(legs.size() - 1).start())) {
                legs.remove(legs.size() - 1); // a routine entry in the same minute gives way
                remarks.remove(remarks.size() - 1);
            }
            while (true) {
                legs.add(new DrLeg(at, hdg, spd, 0.0));
                remarks.add(remark);
                while (!nextRoutine.isAfter(at)) {
                    nextRoutine = nextRoutine.plus(step);
                }
                if (!nextRoutine.isBefore(leg.endUtc())) {
                    break;
                }
                at = nextRoutine;
                remark = "";
            }
        }
        return new DeckLog(new DrLog(track.legs().get(0).from(), legs, track.endUtc()), remarks, spec);
    }

    /** @return the log as the shell's DR log */
    public DrLog drLog() {
        return log;
    }

    /**
     * The DR position at a time.
     *
     * @param utc a time between departure and arrival
     * @return the DR position
     * @throws DrillException outside the log
     */
    public GeoPosition drAt(Instant utc) {
        try {
            return DeadReckoning.dr(log, utc);
        } catch (IllegalArgumentException e) {
            throw new DrillException("the time " + utc + " is outside the deck log (" + log.start() + " to "
                    + log.end() + ")");
        }
    }

    /**
     * The logged heading and speed in force at a time.
     *
     * @param utc a time between departure and arrival
     * @return the leg in force
     */
    public DrLeg inForceAt(Instant utc) {
        int k = log.legAt(utc);
        if (k < 0 || utc.isAfter(log.end())) {
            throw new DrillException("the time " + utc + " is outside the deck log");
        }
        return log.legs().get(k);
    }

    /**
     * The log as CSV in the shell's DR log form ({@link DrLog#HEADER}): the departure position on
     * the first line, an end line with the time of arrival.
     *
     * @return the lines, LF line ends, ending with one
     */
    public String csv() {
        int hd = decimals(spec.courseResolutionDeg());
        int sd = decimals(spec.speedResolutionKn());
        StringBuilder b = new StringBuilder(DrLog.HEADER).append('\n');
        for (int i = 0; i < log.legs().size(); i++) {
            DrLeg l = log.legs().get(i);
            b.append(l.start()).append(',')
                    .append(String.format(Locale.ROOT, "%0" + (hd == 0 ? 3 : hd + 4) + "." + hd + "f", l.headingDeg()))
                    .append(',').append(String.format(Locale.ROOT, "%." + sd + "f", l.stwKn())).append(",0,");
            if (i == 0) {
                b.append(Angles.formatLatitude(log.departure().latDeg()).replace('′', '\'')).append(',')
                        .append(Angles.formatLongitude(log.departure().lonDeg()).replace('′', '\''));
            } else {
                b.append(',');
            }
            b.append(',').append(remarks.get(i)).append('\n');
        }
        b.append(log.end()).append(",,,,,,arrived; log stopped\n");
        return b.toString();
    }

    private static Instant roundToMinute(Instant t) {
        return Instant.ofEpochSecond(Math.round(t.toEpochMilli() / 60_000.0) * 60);
    }

    static int decimals(double step) {
        int d = 0;
        while (d < 4 && Math.abs(step * Math.pow(10, d) - Math.rint(step * Math.pow(10, d))) > 1e-9) {
            d++;
        }
        return d;
    }

    static double roundTo(double v, double step) {
        return step <= 0 ? v : Math.round(v / step) * step;
    }
}
