package org.sightwork.celestial.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.sightwork.geo.testing.CliRun.run;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.time.Instant;
import org.junit.jupiter.api.Test;
import org.sightwork.celestial.almanac.Almanac;
import org.sightwork.celestial.almanac.Body;
import org.sightwork.celestial.time.AstroTime;
import org.sightwork.geo.testing.CliRun;

/** The {@code sightwork almanac} command, run in-process. */
class AlmanacCommandTest {

    @Test
    void textTableShowsTheDefaultBodiesInDegreesAndMinutes() {
        CliRun r = run("almanac", "--at", "2026-03-20T18:30:00Z");
        assertEquals(0, r.code(), r.err());
        for (String b : new String[] {"Sun", "Moon", "Venus", "Mars", "Jupiter", "Saturn", "Aries"}) {
            assertTrue(r.out().contains(b), b + " in\n" + r.out());
        }
        // GHA Aries at that instant, written as the almanac computes it (non-regression of the format).
        double gha = Almanac.standard().at(AstroTime.ofUtc(Instant.parse("2026-03-20T18:30:00Z"))).ghaAriesDeg();
        assertTrue(r.out().contains(org.sightwork.geo.earth.Angles.formatDm(gha, 3)), r.out());
    }

    @Test
    void jsonHasCamelCaseKeysAndNullsWhereNotApplicable() throws Exception {
        CliRun r = run("almanac", "--at", "2026-03-20T18:30:00Z", "--bodies", "SUN,aries,Sirius", "--format", "json", "--dut1", "0.1");
        assertEquals(0, r.code(), r.err());
        JsonNode a = new ObjectMapper().readTree(r.out());
        assertEquals(3, a.size());
        JsonNode sun = a.get(0);
        assertEquals("Sun", sun.get("body").asText());
        assertEquals("2026-03-20T18:30:00Z", sun.get("utc").asText());
        var expected = Almanac.standard().position(Body.SUN, AstroTime.ofUtc(Instant.parse("2026-03-20T18:30:00Z"), 0.1));
        assertEquals(expected.ghaDeg(), sun.get("ghaDeg").asDouble(), 1e-12, "GHA as computed, DUT1 passed on");
        assertTrue(sun.get("shaDeg").isNull(), "no SHA for the Sun");
        assertTrue(a.get(1).get("mag").isNull(), "no magnitude for Aries");
        assertEquals(-1.46, a.get(2).get("mag").asDouble(), 1e-9, "Sirius V (BSC5)");
        assertTrue(a.get(2).get("hpArcmin").isNull(), "no HP for a star");
    }

    @Test
    void csvForADayHas24HoursPerBody() {
        CliRun r = run("almanac", "--day", "2026-03-20", "--bodies", "planets,stars", "--format", "csv");
        assertEquals(0, r.code(), r.err());
        String[] lines = r.out().strip().split("\n");
        assertEquals("body,utc,ghaDeg,decDeg,shaDeg,hpArcmin,sdArcmin,mag", lines[0]);
        assertEquals(1 + 24 * (4 + 58), lines.length, "header + 24 hours x 62 bodies");
        assertTrue(lines[lines.length - 1].contains("2026-03-20T23:00:00Z"), lines[lines.length - 1]);
    }

    @Test
    void badInputIsAUsageErrorWithAMessage() {
        CliRun r = run("almanac", "--bodies", "sun,Siruis");
        assertEquals(2, r.code());
        assertTrue(r.err().contains("Sirius"), r.err());
        r = run("almanac", "--at", "20 March 2026");
        assertEquals(2, r.code());
        assertTrue(r.err().contains("2026-03-20T18:30:00Z"), "expected form shown: " + r.err());
        r = run("almanac", "--at", "1890-01-01T00:00:00Z");
        assertEquals(2, r.code());
        assertTrue(r.err().contains("1900-01-01 to 2100-12-31"), r.err());
        r = run("almanac", "--at", "2026-03-20T18:30:00Z", "--dut1", "1.5");
        assertEquals(2, r.code());
        assertTrue(r.err().contains("0.9"), r.err());
        r = run("almanac", "--day", "2026-13-01");
        assertEquals(2, r.code());
        assertTrue(r.err().contains("YYYY-MM-DD"), r.err());
        assertEquals("", r.out(), "nothing on standard output");
    }

    @Test
    void tableFromAStartForSomeDaysAtAStep() {
        CliRun r = run("almanac", "--from", "2026-01-01", "--days", "3", "--step", "30m", "--bodies", "sun,moon", "--format", "csv");
        assertEquals(0, r.code(), r.err());
        String[] lines = r.out().strip().split("\n");
        assertEquals(1 + 3 * 48 * 2, lines.length, "header + 3 days x 48 half hours x 2 bodies");
        assertTrue(lines[1].startsWith("Sun,2026-01-01T00:00:00Z,"), lines[1]);
        assertTrue(lines[lines.length - 1].startsWith("Moon,2026-01-03T23:30:00Z,"), lines[lines.length - 1]);
        // A day of hours is the same table as --day.
        CliRun a = run("almanac", "--from", "2026-03-20", "--days", "1", "--bodies", "planets,aries", "--format", "csv");
        CliRun b = run("almanac", "--day", "2026-03-20", "--bodies", "planets,aries", "--format", "csv");
        assertEquals(b.out(), a.out(), "--from D --days 1 (step 1h by default) = --day D");
        CliRun j = run("almanac", "--from", "2026-03-20T06:00:00Z", "--days", "1", "--step", "6h", "--bodies", "venus", "--format", "json");
        assertEquals(0, j.code(), j.err());
        assertTrue(j.out().contains("\"2026-03-21T00:00:00Z\""), j.out());
        assertTrue(!j.out().contains("2026-03-21T06:00:00Z"), "the table ends before start + N days");
    }

    @Test
    void badTableOptionsAreUsageErrorsWithNothingWritten() {
        String[][] cases = {
            {"--from", "2026-01-01", "--step", "1.5h"},
            {"--from", "2026-01-01", "--step", "0m"},
            {"--from", "2026-01-01", "--days", "0"},
            {"--at", "2026-01-01T00:00:00Z", "--days", "2"},
            {"--from", "2026-01-01", "--day", "2026-01-01"},
            {"--from", "2100-12-30", "--days", "5"},
            {"--from", "2026-01-01", "--days", "400", "--step", "1m"},
        };
        String[] expect = {"s, m, h or d", "s, m, h or d", "1 to 73415", "go with --from", "one of --at, --day or --from",
            "1900-01-01 to 2100-12-31", "at most"};
        for (int i = 0; i < cases.length; i++) {
            String[] args = new String[cases[i].length + 1];
            args[0] = "almanac";
            System.arraycopy(cases[i], 0, args, 1, cases[i].length);
            CliRun r = run(args);
            assertEquals(2, r.code(), String.join(" ", args));
            assertTrue(r.err().contains(expect[i]), String.join(" ", args) + ": " + r.err());
            assertEquals("", r.out(), "nothing on standard output: " + String.join(" ", args));
        }
    }
}
