package org.sightwork.celestial.planning;

import java.time.Duration;
import java.time.Instant;
import java.time.LocalDate;
import java.time.ZoneOffset;
import java.util.Objects;
import java.util.OptionalInt;

/**
 * The day a navigator asks about, as a span of UTC: either the zone day at the ship's DR or the
 * UTC day.
 *
 * <p>The zone day: the zone is {@code round(lon / 15°)} hours east of Greenwich (zone time = UTC +
 * zone; the nautical zone description has the opposite sign), taken at the ship's DR at the start
 * of the day (found by one fixed-point step: the zone of the start DR gives a first midnight, the DR
 * at that midnight gives the zone). The whole day keeps that zone, even if the ship crosses into
 * the next one during the day: clocks at sea are changed at a time the master chooses, and the
 * times are listed in UTC anyway.
 *
 * @param date the calendar date
 * @param startUtc the day's first instant (included)
 * @param endUtc the day's end (excluded); 24 h after the start
 * @param zoneHours the zone (hours east, -12..+12), empty for the UTC day
 */
public record DayWindow(LocalDate date, Instant startUtc, Instant endUtc, OptionalInt zoneHours) {

    /** Checks the span. */
    public DayWindow {
        Objects.requireNonNull(date, "date");
        if (!endUtc.isAfter(startUtc)) {
            throw new IllegalArgumentException("the day ends (" + endUtc + ") before it starts (" + startUtc + ")");
        }
    }

    /**
     * The zone of a longitude.
     *
     * @param lonDeg longitude (degrees, east positive, [-180°, 180°))
     * @return the zone (hours east of Greenwich, -12..+12)
     */
    public static int zoneOf(double lonDeg) {
        return (int) Math.round(lonDeg / 15.0);
    }

    /**
     * The UTC day.
     *
     * @param date the date
     * @return 00:00 to 24:00 UTC
     */
    public static DayWindow utcDay(LocalDate date) {
        Instant s = date.atStartOfDay(ZoneOffset.UTC).toInstant();
        return new DayWindow(date, s, s.plus(Duration.ofDays(1)), OptionalInt.empty());
    }

    /**
     * The zone day at the ship's DR (see the record comment).
     *
     * @param date the date (zone time)
     * @param track the ship's track
     * @return the day
     */
    public static DayWindow zoneDay(LocalDate date, ShipTrack track) {
        int zone = zoneOf(track.start().lonDeg());
        Instant s = midnight(date, zone);
        int atMidnight = zoneOf(track.positionAt(s).lonDeg());
        if (atMidnight != zone) {
            zone = atMidnight;
            s = midnight(date, zone);
        }
        return new DayWindow(date, s, s.plus(Duration.ofDays(1)), OptionalInt.of(zone));
    }

    /**
     * The zone day of a zone chosen by the navigator (the ship's clocks), e.g. on the date line
     * itself, where 180° belongs to zone +12 on one side and -12 on the other.
     *
     * @param date the date (zone time)
     * @param zoneHours the zone (hours east of Greenwich, -12..+14)
     * @return the day
     */
    public static DayWindow ofZone(LocalDate date, int zoneHours) {
        if (zoneHours < -12 || zoneHours > 14) {
            throw new IllegalArgumentException("zone " + zoneHours + " h is outside -12..+14 h");
        }
        Instant s = midnight(date, zoneHours);
        return new DayWindow(date, s, s.plus(Duration.ofDays(1)), OptionalInt.of(zoneHours));
    }

    private static Instant midnight(LocalDate date, int zoneHours) {
        return date.atStartOfDay(ZoneOffset.ofHours(zoneHours)).toInstant();
    }

    /** @return the day's length (seconds) */
    double spanSeconds() {
        return Duration.between(startUtc, endUtc).toNanos() / 1e9;
    }

    /**
     * The instant a number of seconds after the start.
     *
     * @param s seconds from the start
     * @return the instant (to the nanosecond)
     */
    Instant at(double s) {
        return startUtc.plusNanos(Math.round(s * 1e9));
    }

    /**
     * Whether an instant falls in the day.
     *
     * @param t the instant
     * @return true if start ≤ t &lt; end
     */
    public boolean contains(Instant t) {
        return !t.isBefore(startUtc) && t.isBefore(endUtc);
    }
}
