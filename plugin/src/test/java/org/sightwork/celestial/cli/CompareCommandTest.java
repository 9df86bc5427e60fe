package org.sightwork.celestial.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.Locale;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.sightwork.geo.earth.GeoPosition;
import org.sightwork.geo.earth.Sailings;
import org.sightwork.geo.testing.CliRun;

/**
 * {@code compare} on the example sight log (docs/examples/petrel-sights.csv, invented: true track
 * from 38°30'N 035°00'W on 250° at 6.5 kn from 2025-03-14T09:00Z, sights with 0.7′ errors, DR 3 nm
 * north). The sights are reduced by the sight reduction, the DR comes from the log's DR columns. A
 * GPS on the true track must not be called inconsistent; one put 4 nm off from 12:00 must be
 * flagged at the 12:40 session.
 */
class CompareCommandTest {

    private static final Path LOG = Path.of("../docs/examples/petrel-sights.csv");

    @TempDir
    Path tmp;

    @Test
    void theExampleSightLogAgainstAGpsOnTheTrueTrackAndOffIt() throws IOException {
        Path clean = gps(tmp.resolve("clean.csv"), 0);
        String out = run(clean);
        assertTrue(!out.contains("GPS integrity: INCONSISTENT"), out);
        Path off = gps(tmp.resolve("off.csv"), 4.0);
        String flagged = run(off);
        assertTrue(flagged.contains("GPS integrity: INCONSISTENT") || flagged.contains("GPS integrity: SUSPECT"), flagged);
        assertTrue(flagged.contains("first flagged at 2025-03-14T12:"), flagged);
    }

    private static String run(Path gps) {
        CliRun r = CliRun.run("compare", "--sights", LOG.toString(), "--gps", gps.toString());
        assertEquals(0, r.code(), r.err());
        return r.out();
    }

    /** The example's stated true track every minute, optionally set off 090° from 12:00Z. */
    private static Path gps(Path file, double offsetNm) throws IOException {
        StringBuilder sb = new StringBuilder("time_utc,lat_deg,lon_deg\n");
        GeoPosition start = new GeoPosition(38.5, -35.0);
        Instant t0 = Instant.parse("2025-03-14T09:00:00Z");
        for (int m = 0; m <= 8 * 60; m++) {
            GeoPosition p = Sailings.rhumbDestination(start, 250, 6.5 * m / 60.0);
            Instant t = t0.plusSeconds(60L * m);
            if (offsetNm > 0 && !t.isBefore(Instant.parse("2025-03-14T12:00:00Z"))) {
                p = Sailings.rhumbDestination(p, 90, offsetNm);
            }
            sb.append(String.format(Locale.ROOT, "%s,%.7f,%.7f%n", t, p.latDeg(), p.lonDeg()));
        }
        Files.writeString(file, sb.toString());
        return file;
    }
}
