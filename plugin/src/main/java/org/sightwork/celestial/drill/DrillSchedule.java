package org.sightwork.celestial.drill;

import org.sightwork.celestial.sight.Limb;
import java.time.Duration;
import java.time.Instant;
import java.time.LocalDate;
import java.time.temporal.ChronoUnit;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.sightwork.celestial.almanac.Almanac;
import org.sightwork.celestial.almanac.Body;
import org.sightwork.celestial.almanac.UnknownBodyException;
import org.sightwork.celestial.planning.DayEvents;
import org.sightwork.celestial.planning.DayPlanner;
import org.sightwork.celestial.planning.DayWindow;
import org.sightwork.celestial.planning.SelectionCriteria;
import org.sightwork.celestial.planning.ShipTrack;
import org.sightwork.celestial.planning.SightPlan;
import org.sightwork.celestial.planning.StarSelector;
import org.sightwork.celestial.planning.VisibleBody;
import org.sightwork.geo.earth.GeoPosition;
import org.sightwork.geo.track.DrLeg;

/**
 * The sights and fixes of a drill, with times and bodies settled: the scenario's explicit sights,
 * and the sessions it asks the program to choose, planned as the observer would plan them, from
 * the DR (the observer does not know the truth).
 *
 * <p><b>Method.</b> For each date of {@code autoSights}: the day's twilight and meridian passage at
 * the moving DR ({@link DayPlanner}, zone day of the DR's longitude); the best-placed set of stars
 * and planets at the middle of morning and of evening nautical twilight ({@link StarSelector}, 15°-70°,
 * the observer's height of eye), sighted {@value #STAR_SPACING_MINUTES} minutes apart around that
 * time; and for {@code noonSun} a Sun sight {@value #MORNING_SUN_HOURS_BEFORE_NOON} h before the
 * meridian passage and one at it, run up to a running fix at noon (common practice: the forenoon
 * sight and the noon latitude).
 *
 * <p>Sights are numbered in time order (ties by body name), as the observer writes them.
 */
public final class DrillSchedule {

    /** Minutes between star sights of one twilight session (common practice: a few minutes each). */
    static final int STAR_SPACING_MINUTES = 2;
    /** Hours between the forenoon Sun sight and the meridian passage (common practice: 3 to 4 h). */
    static final int MORNING_SUN_HOURS_BEFORE_NOON = 3;

    /**
     * A sight with its time and body settled.
     *
     * @param number its number in the sight log (from 1)
     * @param session the session it belongs to
     * @param utc the true time of the sight
     * @param body the body
     * @param limb the limb
     */
    public record PlannedSight(int number, String session, Instant utc, Body body, Limb limb) {
    }

    /**
     * A fix with its sights settled.
     *
     * @param session the session
     * @param utc the time of the fix
     * @param sightNumbers its sights
     */
    public record PlannedFix(String session, Instant utc, List<Integer> sightNumbers) {
        /** Copies the list. */
        public PlannedFix {
            sightNumbers = List.copyOf(sightNumbers);
        }
    }

    private final List<PlannedSight> sights;
    private final List<PlannedFix> fixes;

    private DrillSchedule(List<PlannedSight> sights, List<PlannedFix> fixes) {
        this.sights = List.copyOf(sights);
        this.fixes = List.copyOf(fixes);
    }

    /** @return the sights, numbered in time order */
    public List<PlannedSight> sights() {
        return sights;
    }

    /** @return the fixes, in time order */
    public List<PlannedFix> fixes() {
        return fixes;
    }

    /**
     * Settles the schedule of a scenario.
     *
     * @param scenario the scenario
     * @param almanac the almanac
     * @param deckLog the deck log (the observer plans from the DR)
     * @return the schedule
     * @throws DrillException if a body is unknown or a session cannot be planned (no twilight, too
     *     few bodies, outside the passage)
     */
    public static DrillSchedule of(Scenario scenario, Almanac almanac, DeckLog deckLog) {
        List<String> problems = new ArrayList<>();
        record Raw(String session, Instant utc, Body body, Limb limb) {
        }
        List<Raw> raw = new ArrayList<>();
        for (int i = 0; i < scenario.schedule().sights().size(); i++) {
            Scenario.ScheduledSight s = scenario.schedule().sights().get(i);
            try {
                Body b = almanac.body(s.body());
                Limb limb = s.limb();
                boolean disc = b.kind() == Body.Kind.SUN || b.kind() == Body.Kind.MOON;
                if (!disc && limb != Limb.CENTRE) {
                    problems.add("sights[" + i + "].limb: " + b.name() + " shows no disc; expected centre (or no limb)");
                    continue;
                }
                if (disc && limb == Limb.CENTRE) {
                    problems.add("sights[" + i + "].limb: a " + b.name() + " sight is taken by a limb; expected lower or upper");
                    continue;
                }
                if (b.kind() == Body.Kind.ARIES) {
                    problems.add("sights[" + i + "].body: Aries is a reference point, not a body to sight");
                    continue;
                }
                raw.add(new Raw(s.session(), s.utc(), b, limb));
            } catch (UnknownBodyException e) {
                problems.add("sights[" + i + "].body: " + e.getMessage());
            }
        }
        Map<String, Instant> autoFixTimes = new LinkedHashMap<>();
        if (scenario.schedule().auto().isPresent()) {
            Scenario.AutoSchedule auto = scenario.schedule().auto().get();
            DayPlanner planner = new DayPlanner(almanac);
            StarSelector selector = new StarSelector(almanac);
            double eye = scenario.observer().eyeHeightM();
            for (Scenario.AutoDay ad : auto.days()) {
                LocalDate date = ad.date();
                Instant middle = date.atStartOfDay(java.time.ZoneOffset.UTC).plusHours(12).toInstant();
                Instant ref = clamp(middle, deckLog);
                DrLeg leg = deckLog.inForceAt(ref);
                ShipTrack ship = new ShipTrack(deckLog.drAt(ref), ref, leg.headingDeg(), leg.stwKn());
                DayWindow day = DayWindow.zoneDay(date, ship);
                DayEvents ev = planner.dayEvents(ship, day, eye);
                if (ad.morningBodies() > 0) {
                    starSession(date + " morning stars", ev.morningStarTime(), "morning", ad.morningBodies(),
                            selector, deckLog, eye, problems, (sess, t, b) -> raw.add(new Raw(sess, t, b, b.kind() == Body.Kind.MOON ? Limb.LOWER : Limb.CENTRE)),
                            autoFixTimes);
                }
                if (ad.noonSun()) {
                    Optional<Instant> noon = planner.upperTransit(Body.SUN, ship, day);
                    String sess = date + " noon";
                    if (noon.isEmpty()) {
                        problems.add("autoSights: on " + date + " the Sun does not cross the meridian at the DR");
                    } else {
                        Instant tn = noon.get().truncatedTo(ChronoUnit.SECONDS);
                        Instant tm = tn.minus(Duration.ofHours(MORNING_SUN_HOURS_BEFORE_NOON));
                        raw.add(new Raw(sess, tm, Body.SUN, Limb.LOWER));
                        raw.add(new Raw(sess, tn, Body.SUN, Limb.LOWER));
                        autoFixTimes.put(sess, tn);
                    }
                }
                if (ad.eveningBodies() > 0) {
                    starSession(date + " evening stars", ev.eveningStarTime(), "evening", ad.eveningBodies(),
                            selector, deckLog, eye, problems, (sess, t, b) -> raw.add(new Raw(sess, t, b, b.kind() == Body.Kind.MOON ? Limb.LOWER : Limb.CENTRE)),
                            autoFixTimes);
                }
            }
        }
        if (!problems.isEmpty()) {
            throw new DrillException(problems);
        }
        raw.sort(Comparator.comparing(Raw::utc).thenComparing(r -> r.body().name()));
        List<PlannedSight> sights = new ArrayList<>();
        for (Raw r : raw) {
            sights.add(new PlannedSight(sights.size() + 1, r.session(), r.utc(), r.body(), r.limb()));
        }
        // Fixes: those asked for, then one per auto session.
        List<PlannedFix> fixes = new ArrayList<>();
        List<Scenario.FixRequest> requests = new ArrayList<>(scenario.fixes());
        for (String s : autoFixTimes.keySet()) {
            if (requests.stream().noneMatch(f -> f.session().equals(s))) {
                requests.add(new Scenario.FixRequest(s, Optional.of(autoFixTimes.get(s))));
            }
        }
        for (Scenario.FixRequest f : requests) {
            List<PlannedSight> of = sights.stream().filter(s -> s.session().equals(f.session())).toList();
            if (of.isEmpty()) {
                problems.add("fixes: the session '" + f.session() + "' has no sights");
                continue;
            }
            if (of.size() < 2) {
                problems.add("fixes: the session '" + f.session() + "' has one sight; a fix needs at least two");
                continue;
            }
            Instant t = f.utc().orElse(of.get(of.size() - 1).utc());
            fixes.add(new PlannedFix(f.session(), t, of.stream().map(PlannedSight::number).toList()));
        }
        if (!problems.isEmpty()) {
            throw new DrillException(problems);
        }
        fixes.sort(Comparator.comparing(PlannedFix::utc));
        return new DrillSchedule(sights, fixes);
    }

    private interface SightSink {
        void add(String session, Instant utc, Body body);
    }

    private static void starSession(String session, Optional<Instant> when, String which, int n,
            StarSelector selector, DeckLog deckLog, double eye, List<String> problems, SightSink sink,
            Map<String, Instant> fixTimes) {
        if (when.isEmpty()) {
            problems.add("autoSights: no " + which + " nautical twilight for '" + session + "' at the DR");
            return;
        }
        Instant t = when.get().truncatedTo(ChronoUnit.MINUTES);
        if (!deckLog.drLog().start().isBefore(t) || t.isAfter(deckLog.drLog().end())) {
            problems.add("autoSights: " + which + " twilight for '" + session + "' (" + t + ") is outside the passage ("
                    + deckLog.drLog().start() + " to " + deckLog.drLog().end() + ")");
            return;
        }
        GeoPosition dr = deckLog.drAt(t);
        SelectionCriteria c = SelectionCriteria.DEFAULT.withSetSize(n).withEyeHeight(eye);
        SightPlan plan = selector.plan(t, dr, c);
        if (plan.chosen().size() < n) {
            problems.add("autoSights: at " + which + " twilight for '" + session + "' too few well-placed bodies ("
                    + plan.chosen().size() + " of " + n + ")" + plan.firstNote().map(x -> ": " + x).orElse(""));
            return;
        }
        List<VisibleBody> chosen = plan.chosen();
        Instant first = t.minus(Duration.ofMinutes((long) STAR_SPACING_MINUTES * (n - 1) / 2));
        Instant last = first;
        for (int i = 0; i < n; i++) {
            last = first.plus(Duration.ofMinutes((long) STAR_SPACING_MINUTES * i));
            sink.add(session, last, chosen.get(i).body());
        }
        fixTimes.put(session, last);
    }

    private static Instant clamp(Instant t, DeckLog log) {
        if (t.isBefore(log.drLog().start())) {
            return log.drLog().start();
        }
        if (t.isAfter(log.drLog().end())) {
            return log.drLog().end();
        }
        return t;
    }
}
