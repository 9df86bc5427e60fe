package org.sightwork.celestial.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.StringReader;
import java.time.Instant;
import org.junit.jupiter.api.Test;
import org.sightwork.celestial.sight.Limb;
import org.sightwork.celestial.sight.Sight;

/** The sight log format of docs/SIGHT-LOG.md (non-regression of our own format). */
class SightLogReaderTest {

    @Test
    void columnsInAnyOrderWithDefaultsAndCarriedValues() throws Exception {
        String csv = String.join("\n",
                "Body, HS ,utc,index_error,eye_height_m,dr_lat,dr_lon,course_deg,speed_kn,note",
                "Sun,34°12.4',2025-03-14T12:00:00Z,1.2 on,8 ft,38°30.0'N,035°00.0'W,270,6,\"noon, cloudy\"",
                "Moon,20 05.5,2025-03-14T13:00:00Z,,,,,,,", "");
        SightLog log = SightLogReader.read(new StringReader(csv), "t.csv");
        assertEquals(0, log.problems().size(), log.problems().toString());
        Sight a = log.sights().get(0);
        Sight b = log.sights().get(1);
        assertEquals(34.0 + 12.4 / 60.0, a.hsDeg(), 1e-12, "d°m.m′");
        assertEquals(-1.2, a.indexError().correctionArcmin(), 0.0, "on the arc, subtracted");
        assertEquals(8 * 0.3048, a.eyeHeightM(), 1e-12, "feet accepted");
        assertEquals(Limb.LOWER, a.limb(), "Sun defaults to lower limb");
        assertEquals("noon, cloudy", a.note(), "quoted cell");
        assertEquals(10.0, a.temperatureC(), 0.0, "default temperature");
        assertEquals(1010.0, a.pressureHpa(), 0.0, "default pressure");
        assertEquals(-1.2, b.indexError().correctionArcmin(), 0.0, "index error carried down");
        assertEquals(a.eyeHeightM(), b.eyeHeightM(), 0.0, "height of eye carried down");
        // The DR run on 1 h at 270°, 6 kn: 6' of departure, 6/cos(38.5°) = 7.67' of longitude (plane sailing)
        assertEquals(38.5, b.dr().orElseThrow().latDeg(), 1e-9, "DR latitude run on west");
        assertEquals(-35.0 - 6.0 / Math.cos(Math.toRadians(38.5)) / 60.0, b.dr().orElseThrow().lonDeg(), 1e-9,
                "DR longitude run on");
        assertEquals(Instant.parse("2025-03-14T13:00:00Z"), b.utc(), "time");
    }

    @Test
    void badCellsAreReportedWithLineAndColumnAndTheRestGoesOn() throws Exception {
        String csv = String.join("\n",
                "utc,body,hs,index_error,dr_lat,dr_lon",
                "2025-03-14T12:00:00Z,Sun,34 72.0,,38N,35W",
                "2025-03-14T12:10:00Z,Sun,34 12.0,2 sideways,38N,35W",
                "2025-03-14T12:20:00Z,Sun,34 12.0,,38N,",
                "2025-03-14T12:30:00Z,Sun,34 12.0,0.8 off,38N,35W", "");
        SightLog log = SightLogReader.read(new StringReader(csv), "t.csv");
        assertEquals(1, log.sights().size(), "the good row");
        assertEquals(0.8, log.sights().get(0).indexError().correctionArcmin(), 0.0, "off the arc, added");
        assertEquals(3, log.problems().size(), log.problems().toString());
        assertEquals("t.csv:2: column 3 (hs)", log.problems().get(0).toString().substring(0, 22), "place of the first");
        assertTrue(log.problems().get(1).toString().contains("column 4 (index_error)"), log.problems().toString());
        assertTrue(log.problems().get(2).toString().contains("dr_lon"), log.problems().toString());
    }

    @Test
    void aMissingRequiredColumnStopsWithOneMessage() throws Exception {
        SightLog log = SightLogReader.read(new StringReader("utc,body\n2025-03-14T12:00:00Z,Sun\n"), "t.csv");
        assertTrue(log.sights().isEmpty(), "no sights");
        assertTrue(log.problems().get(0).message().contains("'hs'"), log.problems().toString());
    }
}
