package org.sightwork.geo.track;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.IOException;
import java.io.StringReader;
import org.junit.jupiter.api.Test;

/** The CSV track reader follows the quoting of RFC 4180 (October 2005), section 2. */
class CsvTrackQuotingTest {

    private static final double EXACT = 1e-12;

    @Test
    void quotedCellsAreReadAndAnOpenQuoteLeavesOnlyItsLineOut() throws IOException {
        String csv = "time_utc,lat_deg,lon_deg\n"
                // rule 5: any cell may be enclosed in double quotes
                + "2026-06-21T06:00:00Z,\"38.5\",\"-28.6\"\n"
                // rule 6 allows a line break inside quotes; a line read on its own cannot close it
                + "2026-06-21T06:10:00Z,\"38.6,-28.5\n"
                + "2026-06-21T06:20:00Z,38.7,-28.4\n";
        ImportResult<Track> r = CsvTrackIo.read(new StringReader(csv), "quoted.csv");
        assertEquals(2, r.value().size(), "the two good lines");
        assertEquals(38.5, r.value().latDeg(0), EXACT, "a quoted latitude");
        assertEquals(1, r.problemCount(), "one bad line");
        assertEquals(3, r.problems().get(0).line(), "the line with the open quote");
        assertEquals("a quoted cell is not closed: expected a closing \"", r.problems().get(0).message(), "message");
    }
}
