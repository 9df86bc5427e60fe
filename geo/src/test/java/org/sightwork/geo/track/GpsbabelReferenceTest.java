package org.sightwork.geo.track;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.nio.charset.StandardCharsets;
import java.time.Instant;
import java.util.Arrays;
import org.junit.jupiter.api.Test;

/**
 * Validation against GPSBabel 1.8.0 (Debian {@code gpsbabel}): the committed table
 * {@code reference/gpsbabel-track.csv}, written by {@code reference/make-gpsbabel-tables.sh}, holds
 * every track point gpsbabel makes of {@code reference/gpsbabel-input.nmea} (via GPX). Each of them
 * must be in our track with the same time and position.
 *
 * <p>The log has GGA in every second, before RMC: in a log where an RMC comes in a second without
 * GGA, gpsbabel 1.8.0 gives the RMC's time to the previous GGA point (we found this while making the
 * table), so such logs would not compare point for point. Both drop the lines with a wrong checksum.
 */
class GpsbabelReferenceTest {

    /** gpsbabel writes 9 decimals of a degree: half a unit of the last place. */
    private static final double TOL_DEG = 0.5e-9 + 1e-12;

    @Test
    void everyGpsbabelPointIsOursToo() throws IOException {
        ImportResult<Track> ours;
        try (InputStream in = getClass().getResourceAsStream("/reference/gpsbabel-input.nmea")) {
            ours = NmeaTrackReader.read(in, "gpsbabel-input.nmea", NmeaTrackReader.Options.DEFAULT);
        }
        Track t = ours.value();
        long[] times = new long[t.size()];
        for (int i = 0; i < t.size(); i++) {
            times[i] = t.timeMs(i);
        }
        int rows = 0;
        try (BufferedReader r = new BufferedReader(new InputStreamReader(
                getClass().getResourceAsStream("/reference/gpsbabel-track.csv"), StandardCharsets.UTF_8))) {
            String s;
            while ((s = r.readLine()) != null) {
                if (s.startsWith("#") || s.startsWith("time_utc")) {
                    continue;
                }
                String[] c = s.split(",");
                long ms = Instant.parse(c[0]).toEpochMilli();
                int k = Arrays.binarySearch(times, ms);
                assertTrue(k >= 0, "gpsbabel's point at " + c[0] + " is in our track");
                assertEquals(Double.parseDouble(c[1]), t.latDeg(k), TOL_DEG, "latitude at " + c[0]);
                assertEquals(Double.parseDouble(c[2]), t.lonDeg(k), TOL_DEG, "longitude at " + c[0]);
                rows++;
            }
        }
        assertEquals(t.size(), rows, "gpsbabel and we keep the same epochs");
        // The generator writes 1200 epochs across midnight and 12 lines with a wrong checksum.
        assertEquals(1200, t.size(), "every epoch of the log");
        assertEquals(12, ours.problemCount(), "the lines with a wrong checksum: " + ours.problems());
        assertTrue(ours.problems().stream().allMatch(p -> p.message().contains("checksum mismatch")), "and only those");
    }
}
