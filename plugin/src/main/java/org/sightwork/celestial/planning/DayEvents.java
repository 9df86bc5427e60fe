package org.sightwork.celestial.planning;

import java.time.Instant;
import java.util.Objects;
import java.util.Optional;

/**
 * The day's times at the ship's DR, each the first such event in the day (UTC instants); empty
 * when the event does not happen in the day (polar day or night, a moonless day).
 *
 * @param day the day asked about
 * @param eyeHeightM height of eye used for the dip in sunrise, sunset, moonrise and moonset (metres)
 * @param sunrise upper limb on the visible horizon, rising
 * @param sunset upper limb on the visible horizon, setting
 * @param civilDawn Sun's centre at -6°, rising
 * @param civilDusk Sun's centre at -6°, setting
 * @param nauticalDawn Sun's centre at -12°, rising
 * @param nauticalDusk Sun's centre at -12°, setting
 * @param meridianPassage Sun's upper transit (local apparent noon)
 * @param moonrise Moon's upper limb on the visible horizon, rising
 * @param moonset Moon's upper limb on the visible horizon, setting
 * @param sunDay whether the Sun rises and sets, stays up, or stays down
 */
public record DayEvents(DayWindow day, double eyeHeightM,
        Optional<Instant> sunrise, Optional<Instant> sunset,
        Optional<Instant> civilDawn, Optional<Instant> civilDusk,
        Optional<Instant> nauticalDawn, Optional<Instant> nauticalDusk,
        Optional<Instant> meridianPassage,
        Optional<Instant> moonrise, Optional<Instant> moonset,
        SunDay sunDay) {

    /** Whether the Sun crosses the sunrise threshold in the day. */
    public enum SunDay {
        /** The Sun rises or sets (or both) in the day. */
        RISES_OR_SETS,
        /** The Sun stays above the horizon all day (midnight sun). */
        ALWAYS_UP,
        /** The Sun stays below the horizon all day (polar night). */
        ALWAYS_DOWN
    }

    /** Checks for nulls. */
    public DayEvents {
        Objects.requireNonNull(day, "day");
        Objects.requireNonNull(sunrise, "sunrise");
        Objects.requireNonNull(sunset, "sunset");
        Objects.requireNonNull(civilDawn, "civilDawn");
        Objects.requireNonNull(civilDusk, "civilDusk");
        Objects.requireNonNull(nauticalDawn, "nauticalDawn");
        Objects.requireNonNull(nauticalDusk, "nauticalDusk");
        Objects.requireNonNull(meridianPassage, "meridianPassage");
        Objects.requireNonNull(moonrise, "moonrise");
        Objects.requireNonNull(moonset, "moonset");
        Objects.requireNonNull(sunDay, "sunDay");
    }

    /**
     * The middle of morning nautical twilight (between nautical and civil dawn), the usual time for
     * morning star sights.
     *
     * @return the instant, empty if either dawn does not happen
     */
    public Optional<Instant> morningStarTime() {
        return mid(nauticalDawn, civilDawn);
    }

    /**
     * The middle of evening nautical twilight (between civil and nautical dusk).
     *
     * @return the instant, empty if either dusk does not happen
     */
    public Optional<Instant> eveningStarTime() {
        return mid(civilDusk, nauticalDusk);
    }

    private static Optional<Instant> mid(Optional<Instant> a, Optional<Instant> b) {
        if (a.isEmpty() || b.isEmpty()) {
            return Optional.empty();
        }
        long ms = (b.get().toEpochMilli() - a.get().toEpochMilli()) / 2;
        return Optional.of(a.get().plusMillis(ms));
    }
}
