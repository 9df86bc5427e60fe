package org.sightwork.bench;

import java.io.BufferedWriter;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.time.ZoneOffset;
import java.time.ZonedDateTime;
import java.util.Locale;
import org.sightwork.geo.track.NmeaChecksum;

/** Generated NMEA 0183 logs for the benchmarks: one GGA and one RMC a second on a slow track. */
final class NmeaLogs {

    private NmeaLogs() {
    }

    /** Appends the sentences of one epoch (GGA then RMC). */
    static void epoch(StringBuilder sb, long epochSecond) {
        ZonedDateTime z = Instant.ofEpochSecond(epochSecond).atZone(ZoneOffset.UTC);
        double lat = 38.5 - epochSecond % 86_400 * 1e-5;
        double lon = -28.6 + epochSecond % 86_400 * 2e-5;
        String hms = String.format(Locale.ROOT, "%02d%02d%02d.00", z.getHour(), z.getMinute(), z.getSecond());
        String la = String.format(Locale.ROOT, "%02d%07.4f,N", (int) lat, (lat - (int) lat) * 60);
        double alon = Math.abs(lon);
        String lo = String.format(Locale.ROOT, "%03d%07.4f,W", (int) alon, (alon - (int) alon) * 60);
        sb.append(NmeaChecksum.append("$GPGGA," + hms + "," + la + "," + lo + ",1,09,0.8,3.0,M,52.0,M,,")).append("\r\n");
        sb.append(NmeaChecksum.append(String.format(Locale.ROOT, "$GPRMC,%s,A,%s,%s,6.1,105.2,%02d%02d%02d,,,A", hms, la,
                lo, z.getDayOfMonth(), z.getMonthValue(), z.getYear() % 100))).append("\r\n");
    }

    /** A log of the given number of seconds in memory. */
    static byte[] inMemory(int seconds) {
        StringBuilder sb = new StringBuilder(seconds * 150);
        long t0 = Instant.parse("2026-06-21T00:00:00Z").getEpochSecond();
        for (int i = 0; i < seconds; i++) {
            epoch(sb, t0 + i);
        }
        return sb.toString().getBytes(StandardCharsets.US_ASCII);
    }

    /** Writes a log of the given number of seconds to a file. */
    static void toFile(Path file, int seconds) throws IOException {
        long t0 = Instant.parse("2026-06-01T00:00:00Z").getEpochSecond();
        try (BufferedWriter w = Files.newBufferedWriter(file, StandardCharsets.US_ASCII)) {
            StringBuilder sb = new StringBuilder(1 << 16);
            for (int i = 0; i < seconds; i++) {
                epoch(sb, t0 + i);
                if (sb.length() > 60_000) {
                    w.append(sb);
                    sb.setLength(0);
                }
            }
            w.append(sb);
        }
    }
}
