package org.sightwork.celestial.drill;

import org.sightwork.celestial.sight.Limb;
import com.fasterxml.jackson.core.JsonLocation;
import com.fasterxml.jackson.core.JsonParseException;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.time.LocalDate;
import java.time.format.DateTimeParseException;
import java.util.ArrayList;
import java.util.EnumSet;
import java.util.Iterator;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.Set;
import org.sightwork.geo.earth.Angles;
import org.sightwork.geo.earth.GeoPosition;

/**
 * Reads a drill scenario (the JSON format of {@code docs/DRILLS.md}, {@code formatVersion} 1) and
 * checks it. Every problem found is collected with the file and the field (a path such as
 * {@code track.waypoints[2].lat}) and what was expected; they are reported together in one
 * {@link DrillException}. Unknown fields are problems too (a misspelt field would otherwise be
 * silently ignored).
 *
 * <p>What is checked here is the file alone; whether the sights can be taken (body above the
 * horizon, Sun and stars in their light) is checked by the generator, which knows the sky.
 */
public final class ScenarioReader {

    private static final ObjectMapper JSON = new ObjectMapper();

    private final String file;
    private final List<String> problems = new ArrayList<>();

    private ScenarioReader(String file) {
        this.file = file;
    }

    /**
     * Reads and checks a scenario file.
     *
     * @param path the file
     * @return the scenario
     * @throws DrillException listing every problem (file, field, what was expected)
     * @throws IOException if the file cannot be read
     */
    public static Scenario read(Path path) throws IOException {
        return parse(Files.readString(path), path.toString());
    }

    /**
     * Reads and checks a scenario from text.
     *
     * @param json the scenario
     * @param fileName the name to use in messages
     * @return the scenario
     * @throws DrillException listing every problem
     */
    public static Scenario parse(String json, String fileName) {
        JsonNode root;
        try {
            root = JSON.readTree(json);
        } catch (JsonParseException e) {
            JsonLocation at = e.getLocation();
            throw new DrillException(fileName + ": line " + at.getLineNr() + ", column " + at.getColumnNr()
                    + ": not valid JSON (" + e.getOriginalMessage() + ")");
        } catch (IOException e) {
            throw new DrillException(fileName + ": cannot be read as JSON (" + e.getMessage() + ")");
        }
        if (root == null || !root.isObject()) {
            throw new DrillException(fileName + ": expected a JSON object with formatVersion and drill fields");
        }
        return new ScenarioReader(fileName).scenario(root);
    }

    private Scenario scenario(JsonNode root) {
        allowOnly(root, "", "formatVersion", "title", "description", "invented", "vessel", "track",
                "sights", "autoSights", "fixes", "observer", "drLog", "given");
        JsonNode fv = root.get("formatVersion");
        if (fv == null || !fv.isInt()) {
            problem("formatVersion", "expected the number " + Scenario.FORMAT_VERSION);
        } else if (fv.asInt() != Scenario.FORMAT_VERSION) {
            problem("formatVersion", "this program reads version " + Scenario.FORMAT_VERSION + ", the file says "
                    + fv.asInt());
        }
        String title = text(root, "", "title", null);
        String description = text(root, "", "description", "");
        boolean invented = bool(root, "", "invented", false);
        String vessel = "";
        JsonNode v = object(root, "", "vessel", true);
        if (v != null) {
            allowOnly(v, "vessel", "name");
            vessel = text(v, "vessel", "name", null);
        }
        Scenario.Track track = track(object(root, "", "track", true));
        List<Scenario.ScheduledSight> sights = sights(root.get("sights"));
        Optional<Scenario.AutoSchedule> auto = auto(root.get("autoSights"));
        if (sights.isEmpty() && auto.isEmpty()) {
            problem("sights", "expected at least one sight, or an autoSights section");
        }
        List<Scenario.FixRequest> fixes = fixes(root.get("fixes"), sights, auto.isPresent());
        ObserverProfile observer = observer(object(root, "", "observer", true));
        Scenario.DrLogSpec drLog = drLog(root.get("drLog"));
        Set<Scenario.Given> given = given(root.get("given"));
        if (!problems.isEmpty()) {
            throw new DrillException(problems);
        }
        return new Scenario(fv.asInt(), title, description, invented, vessel, track,
                new Scenario.Schedule(sights, auto), fixes, observer, drLog, given);
    }

    private Scenario.Track track(JsonNode t) {
        if (t == null) {
            return null;
        }
        allowOnly(t, "track", "departure", "waypoints", "current");
        Instant start = null;
        GeoPosition startPos = null;
        JsonNode d = object(t, "track", "departure", true);
        if (d != null) {
            allowOnly(d, "track.departure", "utc", "lat", "lon");
            start = instant(d, "track.departure", "utc");
            startPos = position(d, "track.departure");
        }
        List<Scenario.Waypoint> wps = new ArrayList<>();
        JsonNode w = t.get("waypoints");
        if (w == null || !w.isArray() || w.isEmpty()) {
            problem("track.waypoints", "expected a list of at least one waypoint {lat, lon, utc or speedKn}");
        } else {
            Instant previous = start;
            for (int i = 0; i < w.size(); i++) {
                String p = "track.waypoints[" + i + "]";
                JsonNode n = w.get(i);
                if (!n.isObject()) {
                    problem(p, "expected an object {lat, lon, utc or speedKn}");
                    continue;
                }
                allowOnly(n, p, "lat", "lon", "utc", "speedKn");
                GeoPosition pos = position(n, p);
                boolean hasTime = n.has("utc");
                boolean hasSpeed = n.has("speedKn");
                if (hasTime == hasSpeed) {
                    problem(p, "expected either utc (arrival time) or speedKn (speed over the ground on the leg), "
                            + (hasTime ? "not both" : "got neither"));
                    continue;
                }
                Optional<Instant> at = Optional.empty();
                OptionalDouble speed = OptionalDouble.empty();
                if (hasTime) {
                    Instant a = instant(n, p, "utc");
                    if (a != null && previous != null && !a.isAfter(previous)) {
                        problem(p + ".utc", "expected a time after the previous point's (" + previous + "), got " + a);
                    }
                    previous = a;
                    at = Optional.ofNullable(a);
                } else {
                    Double s = number(n, p, "speedKn", 0.1, 40, " kn");
                    speed = s == null ? OptionalDouble.empty() : OptionalDouble.of(s);
                    previous = null; // its time is computed; later times are checked by the track
                }
                if (pos != null && (at.isPresent() || speed.isPresent())) {
                    wps.add(new Scenario.Waypoint(pos, at, speed));
                }
            }
        }
        Scenario.Current current = Scenario.Current.NONE;
        JsonNode c = object(t, "track", "current", false);
        if (c != null) {
            allowOnly(c, "track.current", "setDeg", "driftKn");
            Double set = number(c, "track.current", "setDeg", 0, 360, "°");
            Double drift = number(c, "track.current", "driftKn", 0, 10, " kn");
            if (set != null && drift != null) {
                current = new Scenario.Current(set % 360.0, drift);
            }
        }
        if (start == null || startPos == null) {
            return null;
        }
        return new Scenario.Track(start, startPos, wps, current);
    }

    private List<Scenario.ScheduledSight> sights(JsonNode s) {
        List<Scenario.ScheduledSight> out = new ArrayList<>();
        if (s == null) {
            return out;
        }
        if (!s.isArray()) {
            problem("sights", "expected a list of sights {utc, body, limb, session}");
            return out;
        }
        for (int i = 0; i < s.size(); i++) {
            String p = "sights[" + i + "]";
            JsonNode n = s.get(i);
            if (!n.isObject()) {
                problem(p, "expected an object {utc, body, limb, session}");
                continue;
            }
            allowOnly(n, p, "utc", "body", "limb", "session");
            Instant t = instant(n, p, "utc");
            String body = text(n, p, "body", null);
            Limb limb = Limb.CENTRE;
            if (n.has("limb")) {
                switch (n.get("limb").asText().strip().toLowerCase(Locale.ROOT)) {
                    case "lower" -> limb = Limb.LOWER;
                    case "upper" -> limb = Limb.UPPER;
                    case "centre", "center" -> limb = Limb.CENTRE;
                    default -> problem(p + ".limb", "expected lower, upper or centre, got '"
                            + n.get("limb").asText() + "'");
                }
            } else if (body != null && (body.equalsIgnoreCase("sun") || body.equalsIgnoreCase("moon"))) {
                limb = Limb.LOWER;
            }
            String session = text(n, p, "session", null);
            if (t != null && body != null && session != null) {
                out.add(new Scenario.ScheduledSight(t, body, limb, session));
            }
        }
        return out;
    }

    private Optional<Scenario.AutoSchedule> auto(JsonNode a) {
        if (a == null) {
            return Optional.empty();
        }
        if (!a.isArray() || a.isEmpty()) {
            problem("autoSights", "expected a list of days {date, morningBodies, eveningBodies, noonSun}");
            return Optional.empty();
        }
        List<Scenario.AutoDay> days = new ArrayList<>();
        for (int i = 0; i < a.size(); i++) {
            String p = "autoSights[" + i + "]";
            JsonNode n = a.get(i);
            if (!n.isObject()) {
                problem(p, "expected an object {date, morningBodies, eveningBodies, noonSun}");
                continue;
            }
            allowOnly(n, p, "date", "morningBodies", "eveningBodies", "noonSun");
            LocalDate date = null;
            JsonNode d = n.get("date");
            try {
                date = d == null ? null : LocalDate.parse(d.asText());
                if (date == null) {
                    problem(p + ".date", "missing; expected a date such as 2026-06-21");
                }
            } catch (DateTimeParseException e) {
                problem(p + ".date", "expected a date YYYY-MM-DD, got '" + d.asText() + "'");
            }
            int morning = count(n, p, "morningBodies");
            int evening = count(n, p, "eveningBodies");
            boolean noon = bool(n, p, "noonSun", false);
            if (morning == 0 && evening == 0 && !noon) {
                problem(p, "asks for nothing: expected morningBodies, eveningBodies or noonSun");
            }
            if (date != null) {
                days.add(new Scenario.AutoDay(date, morning, evening, noon));
            }
        }
        return Optional.of(new Scenario.AutoSchedule(days));
    }

    private int count(JsonNode a, String path, String name) {
        JsonNode n = a.get(name);
        if (n == null) {
            return 0;
        }
        if (!n.isInt() || (n.asInt() != 0 && (n.asInt() < 3 || n.asInt() > 5))) {
            problem(path + "." + name, "expected 0 (none) or a whole number of bodies from 3 to 5, got " + n);
            return 0;
        }
        return n.asInt();
    }

    private List<Scenario.FixRequest> fixes(JsonNode f, List<Scenario.ScheduledSight> sights, boolean auto) {
        List<Scenario.FixRequest> out = new ArrayList<>();
        Set<String> sessions = new LinkedHashSet<>();
        for (Scenario.ScheduledSight s : sights) {
            sessions.add(s.session());
        }
        if (f == null) {
            // One fix per session of two sights or more, at its last sight.
            for (String s : sessions) {
                if (sights.stream().filter(x -> x.session().equals(s)).count() >= 2) {
                    out.add(new Scenario.FixRequest(s, Optional.empty()));
                }
            }
            return out;
        }
        if (!f.isArray()) {
            problem("fixes", "expected a list of fixes {session, utc}");
            return out;
        }
        for (int i = 0; i < f.size(); i++) {
            String p = "fixes[" + i + "]";
            JsonNode n = f.get(i);
            if (!n.isObject()) {
                problem(p, "expected an object {session, utc}");
                continue;
            }
            allowOnly(n, p, "session", "utc");
            String s = text(n, p, "session", null);
            if (s != null && !sessions.contains(s) && !auto) {
                problem(p + ".session", "expected the name of a session of the sights (" + String.join(", ", sessions)
                        + "), got '" + s + "'");
            }
            Optional<Instant> t = n.has("utc") ? Optional.ofNullable(instant(n, p, "utc")) : Optional.empty();
            if (s != null) {
                out.add(new Scenario.FixRequest(s, t));
            }
        }
        return out;
    }

    private ObserverProfile observer(JsonNode o) {
        if (o == null) {
            return null;
        }
        String p = "observer";
        allowOnly(o, p, "sextantSigmaArcmin", "indexErrorArcmin", "eyeHeightM", "watchErrorS", "temperatureC",
                "pressureHpa", "sextantResolutionArcmin", "watchResolutionS");
        Double sigma = number(o, p, "sextantSigmaArcmin", 0, 10, "′");
        Double ie = optNumber(o, p, "indexErrorArcmin", -10, 10, "′", 0);
        Double eye = number(o, p, "eyeHeightM", 0.1, 50, " m");
        Double we = optNumber(o, p, "watchErrorS", -600, 600, " s", 0);
        Double temp = optNumber(o, p, "temperatureC", -40, 50, " °C", 10);
        Double press = optNumber(o, p, "pressureHpa", 900, 1100, " hPa", 1010);
        Double res = optNumber(o, p, "sextantResolutionArcmin", 0, 1, "′", 0.1);
        Double wres = optNumber(o, p, "watchResolutionS", 0, 60, " s", 1);
        if (sigma == null || ie == null || eye == null || we == null || temp == null || press == null
                || res == null || wres == null) {
            return null;
        }
        return new ObserverProfile(sigma, ie, eye, we, temp, press, res, wres);
    }

    private Scenario.DrLogSpec drLog(JsonNode d) {
        if (d == null) {
            return Scenario.DrLogSpec.HOURLY;
        }
        if (!d.isObject()) {
            problem("drLog", "expected an object {intervalMinutes, courseResolutionDeg, speedResolutionKn}");
            return Scenario.DrLogSpec.HOURLY;
        }
        allowOnly(d, "drLog", "intervalMinutes", "courseResolutionDeg", "speedResolutionKn");
        Double interval = optNumber(d, "drLog", "intervalMinutes", 10, 240, " min", 60);
        Double c = optNumber(d, "drLog", "courseResolutionDeg", 0.01, 10, "°", 1);
        Double s = optNumber(d, "drLog", "speedResolutionKn", 0.01, 1, " kn", 0.1);
        if (interval == null || c == null || s == null) {
            return Scenario.DrLogSpec.HOURLY;
        }
        if (interval != Math.rint(interval)) {
            problem("drLog.intervalMinutes", "expected whole minutes, got " + interval);
            return Scenario.DrLogSpec.HOURLY;
        }
        return new Scenario.DrLogSpec(interval.intValue(), c, s);
    }

    private Set<Scenario.Given> given(JsonNode g) {
        Set<Scenario.Given> out = EnumSet.noneOf(Scenario.Given.class);
        if (g == null) {
            out.addAll(EnumSet.of(Scenario.Given.DR_LOG, Scenario.Given.DEPARTURE, Scenario.Given.INDEX_ERROR,
                    Scenario.Given.WATCH_ERROR));
            return out;
        }
        if (!g.isArray()) {
            problem("given", "expected a list of words from " + givenWords());
            return out;
        }
        for (int i = 0; i < g.size(); i++) {
            String w = g.get(i).asText();
            if (w.equalsIgnoreCase("gps")) {
                problem("given[" + i + "]", "the GPS track is the answer and is always withheld from the student");
                continue;
            }
            Optional<Scenario.Given> item = EnumSet.allOf(Scenario.Given.class).stream()
                    .filter(x -> x.word().equalsIgnoreCase(w)).findFirst();
            if (item.isEmpty()) {
                problem("given[" + i + "]", "expected one of " + givenWords() + ", got '" + w + "'");
            } else {
                out.add(item.get());
            }
        }
        return out;
    }

    private static String givenWords() {
        StringBuilder b = new StringBuilder();
        for (Scenario.Given x : Scenario.Given.values()) {
            b.append(b.length() == 0 ? "" : ", ").append(x.word());
        }
        return b.toString();
    }

    // --- field readers: each records a problem and returns null when the field is bad ---

    private void problem(String field, String expected) {
        problems.add(file + ": field " + (field.isEmpty() ? "(top level)" : field) + ": " + expected);
    }

    private static String join(String parent, String name) {
        return parent.isEmpty() ? name : parent + "." + name;
    }

    private void allowOnly(JsonNode n, String path, String... names) {
        Set<String> allowed = Set.of(names);
        for (Iterator<String> it = n.fieldNames(); it.hasNext();) {
            String f = it.next();
            if (!allowed.contains(f)) {
                problem(join(path, f), "unknown field; expected one of " + String.join(", ", names));
            }
        }
    }

    private JsonNode object(JsonNode parent, String path, String name, boolean required) {
        JsonNode n = parent.get(name);
        if (n == null) {
            if (required) {
                problem(join(path, name), "missing; expected an object");
            }
            return null;
        }
        if (!n.isObject()) {
            problem(join(path, name), "expected an object, got " + n.getNodeType().toString().toLowerCase(Locale.ROOT));
            return null;
        }
        return n;
    }

    private String text(JsonNode parent, String path, String name, String dflt) {
        JsonNode n = parent.get(name);
        if (n == null) {
            if (dflt == null) {
                problem(join(path, name), "missing; expected a text");
            }
            return dflt;
        }
        if (!n.isTextual() || n.asText().isBlank()) {
            problem(join(path, name), "expected a non-empty text, got " + n);
            return dflt;
        }
        return n.asText().strip();
    }

    private boolean bool(JsonNode parent, String path, String name, boolean dflt) {
        JsonNode n = parent.get(name);
        if (n == null) {
            return dflt;
        }
        if (!n.isBoolean()) {
            problem(join(path, name), "expected true or false, got " + n);
            return dflt;
        }
        return n.asBoolean();
    }

    private Double number(JsonNode parent, String path, String name, double min, double max, String unit) {
        if (!parent.has(name)) {
            problem(join(path, name), "missing; expected a number in [" + fmt(min) + unit + ", " + fmt(max) + unit + "]");
            return null;
        }
        return optNumber(parent, path, name, min, max, unit, Double.NaN);
    }

    private Double optNumber(JsonNode parent, String path, String name, double min, double max, String unit,
            double dflt) {
        JsonNode n = parent.get(name);
        if (n == null) {
            return dflt;
        }
        if (!n.isNumber() || !(n.asDouble() >= min && n.asDouble() <= max)) {
            problem(join(path, name), "expected a number in [" + fmt(min) + unit + ", " + fmt(max) + unit + "], got " + n);
            return null;
        }
        return n.asDouble();
    }

    private static String fmt(double v) {
        return v == Math.rint(v) ? Long.toString((long) v) : Double.toString(v);
    }

    private Instant instant(JsonNode parent, String path, String name) {
        JsonNode n = parent.get(name);
        if (n == null) {
            problem(join(path, name), "missing; expected a UTC time such as 2026-06-21T05:12:30Z");
            return null;
        }
        try {
            return Instant.parse(n.asText());
        } catch (DateTimeParseException e) {
            problem(join(path, name), "expected a UTC time such as 2026-06-21T05:12:30Z, got '" + n.asText() + "'");
            return null;
        }
    }

    private GeoPosition position(JsonNode n, String path) {
        Double lat = angle(n, path, "lat", true);
        Double lon = angle(n, path, "lon", false);
        return lat == null || lon == null ? null : GeoPosition.of(lat, lon);
    }

    private Double angle(JsonNode parent, String path, String name, boolean latitude) {
        JsonNode n = parent.get(name);
        String what = latitude ? "a latitude: degrees north positive, or d°m.m′ with N or S"
                : "a longitude: degrees east positive, or d°m.m′ with E or W";
        if (n == null) {
            problem(join(path, name), "missing; expected " + what);
            return null;
        }
        try {
            double v = n.isNumber() ? n.asDouble()
                    : latitude ? Angles.parseLatitude(n.asText()) : Angles.parseLongitude(n.asText());
            if (Math.abs(v) > (latitude ? 89.0 : 180.0)) {
                problem(join(path, name), "expected " + what + (latitude ? " within 89° of the equator" : " in [-180°, 180°]")
                        + ", got " + n);
                return null;
            }
            return v;
        } catch (IllegalArgumentException e) {
            problem(join(path, name), "expected " + what + ", got " + n);
            return null;
        }
    }
}
