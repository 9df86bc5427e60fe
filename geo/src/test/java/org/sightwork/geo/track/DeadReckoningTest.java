package org.sightwork.geo.track;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.StringReader;
import java.time.Instant;
import java.util.List;
import net.sf.geographiclib.Geodesic;
import net.sf.geographiclib.GeodesicData;
import org.junit.jupiter.api.Test;
import org.sightwork.geo.earth.GeoPosition;

/**
 * Dead reckoning against GeographicLib for Java 2.0 (Karney 2013): along a meridian and along the
 * equator the rhumb line is the geodesic, so a DR run there must land on GeographicLib's direct
 * solution. The DR log reader's rules are checked on logs written here.
 */
class DeadReckoningTest {

    /** 1e-7° = 1 cm. */
    private static final double TOL_DEG = 1e-7;

    @Test
    void drAlongAMeridianAndTheEquatorIsTheGeodesic() {
        Instant t0 = Instant.parse("2026-06-21T06:00:00Z");
        DrLog north = new DrLog(new GeoPosition(38.53, -28.63), List.of(new DrLeg(t0, 0, 6, 0)), t0.plusSeconds(36_000));
        GeoPosition p = DeadReckoning.dr(north, t0.plusSeconds(36_000));
        GeodesicData g = Geodesic.WGS84.Direct(38.53, -28.63, 0, 60 * 1852);
        assertEquals(g.lat2, p.latDeg(), TOL_DEG, "10 h at 6 kn due north");
        assertEquals(g.lon2, p.lonDeg(), TOL_DEG, "same meridian");
        // Current 090° 2 kn on a heading 000° at 0 kn... along the equator: the current alone, 2 kn east for 5 h.
        DrLog still = new DrLog(new GeoPosition(0, 10), List.of(new DrLeg(t0, 0, 0, 0)), t0.plusSeconds(18_000));
        GeoPosition ep = DeadReckoning.ep(still, t0.plusSeconds(18_000), new DeadReckoning.Current(90, 2));
        GeodesicData e = Geodesic.WGS84.Direct(0, 10, 90, 10 * 1852);
        assertEquals(e.lon2, ep.lonDeg(), TOL_DEG, "EP with current along the equator");
        assertEquals(0.0, ep.latDeg(), TOL_DEG, "stays on the equator");
        // Leeway 10° to starboard on heading 080° makes a water track 090°: along the equator again.
        DrLog lee = new DrLog(new GeoPosition(0, 10), List.of(new DrLeg(t0, 80, 5, 10)), t0.plusSeconds(7200));
        GeoPosition q = DeadReckoning.dr(lee, t0.plusSeconds(7200));
        assertEquals(Geodesic.WGS84.Direct(0, 10, 90, 10 * 1852).lon2, q.lonDeg(), TOL_DEG, "leeway applied");
    }

    @Test
    void readsTheDrLogAndReportsBadLines() throws IOException {
        String csv = DrLog.HEADER + "\n"
                + "2026-06-21T06:00:00Z,090,6,0,38°31.8'N,028°37.8'W,departure\n"
                + "2026-06-21T07:00:00Z,abc,6,0,,,\n"
                + "2026-06-21T08:00:00Z,000,6,0,,,\n"
                + "2026-06-21T09:00:00Z,,,,,,end\n";
        ImportResult<java.util.Optional<DrLog>> r = DrLog.read(new StringReader(csv), "dr.csv");
        assertEquals(1, r.problemCount(), r.problems().toString());
        assertEquals(3, r.problems().get(0).line(), "the bad heading's line");
        DrLog log = r.value().orElseThrow();
        assertEquals(2, log.legs().size(), "two good legs");
        assertEquals(Instant.parse("2026-06-21T09:00:00Z"), log.end(), "end line");
        assertEquals(38 + 31.8 / 60, log.departure().latDeg(), 1e-12, "departure in d°m.m′");
        assertTrue(DeadReckoning.dr(log, log.end()).latDeg() > log.departure().latDeg(), "the last leg goes north");
    }
}
