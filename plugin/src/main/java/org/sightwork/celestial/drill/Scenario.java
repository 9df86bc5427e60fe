package org.sightwork.celestial.drill;

import org.sightwork.celestial.sight.Limb;
import java.time.Instant;
import java.time.LocalDate;
import java.util.EnumSet;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.Set;
import org.sightwork.geo.earth.GeoPosition;

/**
 * A drill as the instructor wrote it: read from the documented JSON format ({@code docs/DRILLS.md})
 * by {@link ScenarioReader}. Immutable; the records check their own ranges, the reader checks the
 * whole (names, order of times) and reports every problem with file and field.
 *
 * @param formatVersion the format's version ({@value #FORMAT_VERSION})
 * @param title a short title for the exercise sheet
 * @param description what the passage is, for the sheet (may be empty)
 * @param invented true when the scenario is invented (demo and teaching data must say so)
 * @param vesselName the vessel's name
 * @param track the vessel's true track
 * @param schedule when and what the observer sights
 * @param fixes the fixes the student must work, one per session of sights
 * @param observer the observer profile (errors of sextant and watch)
 * @param drLog how the deck log is kept
 * @param given what the student is given; everything else (always the GPS track) is withheld
 */
public record Scenario(int formatVersion, String title, String description, boolean invented,
        String vesselName, Track track, Schedule schedule, List<FixRequest> fixes,
        ObserverProfile observer, DrLogSpec drLog, Set<Given> given) {

    /** The format version this program writes and reads. */
    public static final int FORMAT_VERSION = 1;

    /** Copies the lists. */
    public Scenario {
        fixes = List.copyOf(fixes);
        given = given.isEmpty() ? Set.of() : Set.copyOf(EnumSet.copyOf(given));
    }

    /**
     * The vessel's true track over the ground.
     *
     * @param startUtc time of departure
     * @param start position of departure
     * @param waypoints the turning points, in order; each reached along a rhumb line
     * @param current the current (the same everywhere and always in this format)
     */
    public record Track(Instant startUtc, GeoPosition start, List<Waypoint> waypoints, Current current) {
        /** Copies the list. */
        public Track {
            waypoints = List.copyOf(waypoints);
        }
    }

    /**
     * A turning point of the true track, reached either at a given time or at a given speed over the
     * ground along the leg to it (exactly one of the two).
     *
     * @param position the turning point
     * @param arrivalUtc when the vessel is there
     * @param speedOverGroundKn speed over the ground on the leg to it (knots, (0, 40])
     */
    public record Waypoint(GeoPosition position, Optional<Instant> arrivalUtc, OptionalDouble speedOverGroundKn) {
        /** Exactly one of time and speed. */
        public Waypoint {
            if (arrivalUtc.isPresent() == speedOverGroundKn.isPresent()) {
                throw new IllegalArgumentException("a waypoint needs either an arrival time or a speed, not both or neither");
            }
            if (speedOverGroundKn.isPresent()
                    && !(speedOverGroundKn.getAsDouble() > 0 && speedOverGroundKn.getAsDouble() <= 40)) {
                throw new IllegalArgumentException("speed " + speedOverGroundKn.getAsDouble()
                        + " kn is outside (0 kn, 40 kn]");
            }
        }
    }

    /**
     * A steady current: the water moves toward {@code setDeg} at {@code driftKn}.
     *
     * @param setDeg direction the current flows toward (degrees true, [0, 360))
     * @param driftKn its rate (knots, [0, 10])
     */
    public record Current(double setDeg, double driftKn) {
        /** Checks the ranges. */
        public Current {
            if (!(setDeg >= 0 && setDeg < 360)) {
                throw new IllegalArgumentException("set " + setDeg + "° is outside [0°, 360°)");
            }
            if (!(driftKn >= 0 && driftKn <= 10)) {
                throw new IllegalArgumentException("drift " + driftKn + " kn is outside [0 kn, 10 kn]");
            }
        }

        /** No current. */
        public static final Current NONE = new Current(0, 0);
    }

    /**
     * When and what the observer sights: explicit sights, and optionally sessions chosen by the
     * program (well-placed bodies at morning and evening twilight, a noon Sun).
     *
     * @param sights explicit sights, in any order
     * @param auto sessions for the program to choose
     */
    public record Schedule(List<ScheduledSight> sights, Optional<AutoSchedule> auto) {
        /** Copies the list. */
        public Schedule {
            sights = List.copyOf(sights);
        }
    }

    /**
     * One sight asked for by the instructor.
     *
     * @param utc the true time of the sight (UTC)
     * @param body the body's name as the almanac knows it ("Sun", "Sirius", "Venus")
     * @param limb the limb (CENTRE for stars and planets)
     * @param session the session it belongs to: sights of one session make one fix
     */
    public record ScheduledSight(Instant utc, String body, Limb limb, String session) {
    }

    /**
     * Sessions the program chooses, day by day: stars at morning and evening twilight, the Sun at
     * local noon.
     *
     * @param days the days, in order
     */
    public record AutoSchedule(List<AutoDay> days) {
        /** Copies the list. */
        public AutoSchedule {
            days = List.copyOf(days);
        }
    }

    /**
     * What the program chooses on one day.
     *
     * @param date the date (zone date at the DR)
     * @param morningBodies how many bodies at morning twilight (0 for none, else 3..5)
     * @param eveningBodies how many bodies at evening twilight (0 for none, else 3..5)
     * @param noonSun whether to add a noon Sun sight (a latitude by meridian altitude) and a
     *     forenoon Sun sight to run up to it
     */
    public record AutoDay(LocalDate date, int morningBodies, int eveningBodies, boolean noonSun) {
    }

    /**
     * A fix the student must work.
     *
     * @param session the session whose sights make it
     * @param utc the time of the fix; empty for the time of the session's last sight
     */
    public record FixRequest(String session, Optional<Instant> utc) {
    }

    /**
     * How the deck log is kept (what the DR is worked from).
     *
     * @param intervalMinutes an entry every so many minutes, and at every alteration ([10, 240])
     * @param courseResolutionDeg the logged heading's step (degrees, (0, 10])
     * @param speedResolutionKn the logged speed's step (knots, (0, 1])
     */
    public record DrLogSpec(int intervalMinutes, double courseResolutionDeg, double speedResolutionKn) {
        /** Checks the ranges. */
        public DrLogSpec {
            if (intervalMinutes < 10 || intervalMinutes > 240) {
                throw new IllegalArgumentException("intervalMinutes " + intervalMinutes + " is outside [10, 240]");
            }
            if (!(courseResolutionDeg > 0 && courseResolutionDeg <= 10)) {
                throw new IllegalArgumentException("courseResolutionDeg " + courseResolutionDeg + "° is outside (0°, 10°]");
            }
            if (!(speedResolutionKn > 0 && speedResolutionKn <= 1)) {
                throw new IllegalArgumentException("speedResolutionKn " + speedResolutionKn + " kn is outside (0 kn, 1 kn]");
            }
        }

        /** Hourly, to 1° and 0.1 kn. */
        public static final DrLogSpec HOURLY = new DrLogSpec(60, 1.0, 0.1);
    }

    /** What the student may be given. The GPS track is never given: it is the answer. */
    public enum Given {
        /** The deck log (heading steered and speed through the water), from which to work the DR. */
        DR_LOG("drLog"),
        /** The departure position and time. */
        DEPARTURE("departure"),
        /** The index error as the observer read it. */
        INDEX_ERROR("indexError"),
        /** The watch error on UTC. */
        WATCH_ERROR("watchError"),
        /** The current's set and drift. */
        CURRENT("current");

        private final String word;

        Given(String word) {
            this.word = word;
        }

        /** @return the word used in the scenario file */
        public String word() {
            return word;
        }
    }

    /** @return whether the student is given this item */
    public boolean gives(Given item) {
        return given.contains(item);
    }
}
