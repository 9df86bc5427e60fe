package org.sightwork.celestial.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The session file: round trip, backup, newer version and damaged file (non-regression). */
class SessionFileTest {

    @TempDir
    Path dir;

    private static Session sample(String name) {
        return new Session(1, name, List.of(new Session.SessionSight("2025-03-14T12:00:00Z", "Sun", "LOWER", 34.2, -1.2,
                2.5, 18, 1016, 38.5, -35.0, 1.0, "")), List.of(new Session.DrLeg("2025-03-14T09:00:00Z", 250, 6.5)),
                "track.gpx", List.of(), Map.of("windowMin", "30"));
    }

    @Test
    void savesAtomicallyAndKeepsTheBackup() throws Exception {
        Path f = dir.resolve("passage.json");
        SessionFile.save(sample("first"), f);
        SessionFile.save(sample("second"), f);
        SessionFile.Opened o = SessionFile.open(f);
        assertEquals("second", o.session().orElseThrow().name(), "latest saved");
        assertFalse(o.readOnly(), "writable");
        assertEquals("first", SessionFile.open(SessionFile.backupOf(f)).session().orElseThrow().name(), "backup");
        assertEquals(38.5, o.session().get().sights().get(0).drLatDeg(), 0.0, "values kept");
        try (var files = Files.list(dir)) {
            assertEquals(2, files.count(), "no temporary file left behind");
        }
    }

    @Test
    void aNewerVersionOpensReadOnly() throws Exception {
        Path f = dir.resolve("new.json");
        Files.writeString(f, "{\"formatVersion\": 7, \"name\": \"future\", \"sights\": [], \"newThing\": 1}");
        SessionFile.Opened o = SessionFile.open(f);
        assertTrue(o.readOnly(), "read-only");
        assertTrue(o.message().contains("newer"), o.message());
        assertEquals("future", o.session().orElseThrow().name(), "still shown");
    }

    @Test
    void aDamagedFileFallsBackToItsBackupReadOnlyAndIsNotChanged() throws Exception {
        Path f = dir.resolve("p.json");
        SessionFile.save(sample("good"), f);
        SessionFile.save(sample("good2"), f);
        Files.writeString(f, "{\"formatVersion\": 1, \"sights\": [ {\"utc\": ");
        SessionFile.Opened o = SessionFile.open(f);
        assertTrue(o.readOnly(), "read-only");
        assertTrue(o.message().contains("damaged"), o.message());
        assertEquals("good", o.session().orElseThrow().name(), "the backup");
        assertEquals("{\"formatVersion\": 1, \"sights\": [ {\"utc\": ", Files.readString(f), "damaged file untouched");
    }

    @Test
    void sightsRoundTripThroughTheSession() {
        var sight = org.sightwork.celestial.sight.Sight.builder("Moon", java.time.Instant.parse("2025-03-14T12:00:00Z"),
                20.5).limb(org.sightwork.celestial.sight.Limb.UPPER)
                .indexError(org.sightwork.celestial.sight.IndexError.onArc(1.2)).eyeHeightM(3.0)
                .dr(org.sightwork.geo.earth.GeoPosition.of(-12.0, 170.0)).build();
        assertEquals(sight, Session.SessionSight.of(sight).toSight(), "same sight back");
    }
}
