package org.sightwork.celestial.drill;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;

/** Scenarios for the tests, written in the drill format. Invented data: inputs, never check values. */
final class Scenarios {

    private Scenarios() {
    }

    /** The demo scenario shipped with the plugin (invented). */
    static String demoJson() {
        try (InputStream in = Scenarios.class.getResourceAsStream("/org/sightwork/celestial/demo/drill-scenario.json")) {
            return new String(in.readAllBytes(), StandardCharsets.UTF_8);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    static Scenario demo() {
        return ScenarioReader.parse(demoJson(), "drill-scenario.json");
    }

    /**
     * A short passage off Faial (invented) with the given observer, current and sights.
     *
     * @param observer the observer JSON object
     * @param current the current JSON object
     * @param sights the sights JSON array
     * @param drLog the drLog JSON object
     */
    static String passage(String observer, String current, String sights, String drLog) {
        return "{\n \"formatVersion\": 1, \"title\": \"test passage (invented)\", \"invented\": true,\n"
                + " \"vessel\": {\"name\": \"Test Vessel (invented)\"},\n"
                + " \"track\": {\"departure\": {\"utc\": \"2026-06-21T18:00:00Z\", \"lat\": 38.5, \"lon\": -28.6},\n"
                + "   \"waypoints\": [{\"lat\": 38.2, \"lon\": -27.6, \"speedKn\": 6.0},"
                + " {\"lat\": 37.9, \"lon\": -26.4, \"speedKn\": 6.0}],\n"
                + "   \"current\": " + current + "},\n"
                + " \"sights\": " + sights + ",\n"
                + " \"observer\": " + observer + ",\n"
                + " \"drLog\": " + drLog + "\n}\n";
    }

    /** A perfect observer: no noise, no index or watch error, no rounding of sextant or watch. */
    static final String PERFECT = "{\"sextantSigmaArcmin\": 0, \"indexErrorArcmin\": 0, \"eyeHeightM\": 3.0,"
            + " \"watchErrorS\": 0, \"sextantResolutionArcmin\": 0, \"watchResolutionS\": 0}";

    /** A fine deck log: headings to 0.01°, speeds to 0.01 kn. */
    static final String FINE_LOG = "{\"intervalMinutes\": 60, \"courseResolutionDeg\": 0.01, \"speedResolutionKn\": 0.01}";

    /** Evening stars off Faial on 2026-06-21 (twilight about 22:00-22:10 UTC), one session. */
    static String eveningStars(String session, String... bodies) {
        StringBuilder b = new StringBuilder("[");
        for (int i = 0; i < bodies.length; i++) {
            b.append(i == 0 ? "" : ",").append("{\"utc\": \"2026-06-21T22:0").append(i * 2)
                    .append(":00Z\", \"body\": \"").append(bodies[i]).append("\", \"session\": \"").append(session)
                    .append("\"}");
        }
        return b.append("]").toString();
    }
}
