package org.sightwork.celestial.planning;

import java.time.Instant;
import java.util.List;
import java.util.Objects;
import java.util.Optional;
import org.sightwork.geo.earth.GeoPosition;

/**
 * The sky at a planned time and the proposed set of bodies.
 *
 * @param timeUtc the planned time
 * @param dr the DR at that time
 * @param sunAltitudeDeg the Sun's geocentric altitude then (degrees)
 * @param visible every navigational body above the horizon, by azimuth
 * @param chosen the proposed set, by azimuth; empty when too few bodies qualify
 * @param hdop the set's horizontal dilution of precision (see {@link StarSelector}); infinite when
 *     nothing is chosen
 * @param smallestGapDeg the smallest azimuth gap between neighbours of the set round the horizon
 *     (degrees); 0 when nothing is chosen
 * @param notes warnings for the navigator (dark horizon, too few bodies)
 */
public record SightPlan(Instant timeUtc, GeoPosition dr, double sunAltitudeDeg, List<VisibleBody> visible,
        List<VisibleBody> chosen, double hdop, double smallestGapDeg, List<String> notes) {

    /** Copies the lists. */
    public SightPlan {
        Objects.requireNonNull(timeUtc, "timeUtc");
        Objects.requireNonNull(dr, "dr");
        visible = List.copyOf(visible);
        chosen = List.copyOf(chosen);
        notes = List.copyOf(notes);
    }

    /**
     * Whether a body is in the proposed set.
     *
     * @param b the visible body
     * @return true if chosen
     */
    public boolean isChosen(VisibleBody b) {
        return chosen.stream().anyMatch(c -> c.body().equals(b.body()));
    }

    /** @return the first note, if any */
    public Optional<String> firstNote() {
        return notes.stream().findFirst();
    }
}
