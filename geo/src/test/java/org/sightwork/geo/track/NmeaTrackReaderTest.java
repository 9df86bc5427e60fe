package org.sightwork.geo.track;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.time.Instant;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.Random;
import net.sf.marineapi.nmea.parser.SentenceFactory;
import net.sf.marineapi.nmea.sentence.GGASentence;
import net.sf.marineapi.nmea.sentence.RMCSentence;
import net.sf.marineapi.nmea.sentence.Sentence;
import org.junit.jupiter.api.Test;

/**
 * The NMEA 0183 reader. Validation: the checksum against the published example, positions and
 * times against the Java Marine API 0.12.0 (an independent parser) on a seeded random log; the
 * comparison with gpsbabel is in {@link GpsbabelReferenceTest}. The rest checks the stated rules
 * (date carried from RMC to GGA, midnight, time going back, bad lines) on logs built here.
 */
class NmeaTrackReaderTest {

    /** marineapi and this reader both turn ddmm.mmmm into degrees in double: agree to 1e-12°. */
    private static final double TOL_DEG = 1e-12;

    @Test
    void checksumOfThePublishedExample() {
        // NMEA 0183 checksum; the widely circulated GGA example (REFERENCES.md): *47.
        String s = "$GPGGA,123519,4807.038,N,01131.000,E,1,08,0.9,545.4,M,46.9,M,,*47";
        assertEquals(0x47, NmeaChecksum.of(s), "checksum of the example");
        ImportResult<Track> r = read(s, "$GPRMC,123519,A,4807.038,N,01131.000,E,022.4,084.4,230394,003.1,W*6A");
        assertEquals(0, r.problemCount(), "both example sentences are accepted: " + r.problems());
        assertEquals(1, r.value().size(), "one epoch");
        // 48°07.038'N 11°31.000'E, 1994-03-23 12:35:19 UTC: the sentences' own fields.
        assertEquals(48 + 7.038 / 60, r.value().latDeg(0), TOL_DEG, "latitude");
        assertEquals(11 + 31.0 / 60, r.value().lonDeg(0), TOL_DEG, "longitude");
        assertEquals(Instant.parse("1994-03-23T12:35:19Z"), r.value().time(0), "time with the RMC date");
        assertEquals(84.4, r.value().cogDeg(0).getAsDouble(), 1e-5, "course over ground");
    }

    @Test
    void agreesWithMarineApiOnARandomLog() {
        Random rnd = new Random(7);
        List<String> lines = new ArrayList<>();
        String[] talkers = {"GP", "GN", "GL", "GA", "II"};
        long t0 = Instant.parse("2026-06-21T22:00:00Z").toEpochMilli();
        for (int i = 0; i < 3000; i++) {
            double lat = rnd.nextDouble() * 178 - 89;
            double lon = rnd.nextDouble() * 358 - 179;
            long t = t0 + i * 7_000L; // crosses midnight
            String talker = talkers[rnd.nextInt(talkers.length)];
            lines.add(rnd.nextBoolean() ? rmc(talker, t, lat, lon, 5.5, 123.4) : gga(talker, t, lat, lon));
        }
        ImportResult<Track> ours = read(lines.toArray(new String[0]));
        // GGA lines before the first RMC are dated when it comes.
        assertEquals(0, ours.problemCount(), "no problem: " + ours.problems());
        assertEquals(lines.size(), ours.value().size(), "one point per sentence (each its own epoch)");
        SentenceFactory sf = SentenceFactory.getInstance();
        for (int i = 0; i < lines.size(); i++) {
            Sentence s = sf.createParser(lines.get(i));
            net.sf.marineapi.nmea.util.Position p;
            net.sf.marineapi.nmea.util.Time time;
            if (s instanceof RMCSentence rmc) {
                p = rmc.getPosition();
                time = rmc.getTime();
                net.sf.marineapi.nmea.util.Date d = rmc.getDate();
                LocalDate ours2 = LocalDate.ofEpochDay(Math.floorDiv(ours.value().timeMs(i), 86_400_000L));
                assertEquals(LocalDate.of(d.getYear(), d.getMonth(), d.getDay()), ours2, "date, line " + (i + 1));
            } else {
                GGASentence gga = (GGASentence) s;
                p = gga.getPosition();
                time = gga.getTime();
            }
            assertEquals(p.getLatitude(), ours.value().latDeg(i), TOL_DEG, "latitude, line " + (i + 1));
            assertEquals(p.getLongitude(), ours.value().lonDeg(i), TOL_DEG, "longitude, line " + (i + 1));
            long tod = Math.floorMod(ours.value().timeMs(i), 86_400_000L);
            assertEquals(Math.round(time.getMilliseconds() % 86_400_000L), tod, "time of day, line " + (i + 1));
        }
    }

    @Test
    void ggaTakesItsDateFromRmcAndRollsOverAtMidnight() {
        ImportResult<Track> r = read(
                gga("GP", at("2026-06-21T23:59:58Z"), 38.5, -28.6),
                rmc("GP", at("2026-06-21T23:59:59Z"), 38.5, -28.6, 6, 100),
                gga("GP", at("2026-06-22T00:00:00Z"), 38.5, -28.6),
                gga("GP", at("2026-06-22T00:00:01Z"), 38.5, -28.6));
        assertEquals(0, r.problemCount(), r.problems().toString());
        assertEquals(Instant.parse("2026-06-21T23:59:58Z"), r.value().time(0), "GGA before the first RMC");
        assertEquals(Instant.parse("2026-06-22T00:00:00Z"), r.value().time(2), "GGA after midnight: next day");
        assertEquals(Instant.parse("2026-06-22T00:00:01Z"), r.value().time(3), "and on");
    }

    @Test
    void timeGoingBackOrRepeatedIsReportedAndSkipped() {
        ImportResult<Track> r = read(
                rmc("GP", at("2026-06-21T12:00:00Z"), 38.5, -28.6, 6, 100),
                rmc("GP", at("2026-06-21T12:00:10Z"), 38.51, -28.6, 6, 100),
                rmc("GP", at("2026-06-21T12:00:05Z"), 38.52, -28.6, 6, 100),
                rmc("GP", at("2026-06-21T12:00:20Z"), 38.53, -28.6, 6, 100));
        assertEquals(3, r.value().size(), "the fix with the earlier time is left out");
        assertEquals(1, r.problemCount(), "one problem");
        assertEquals(3, r.problems().get(0).line(), "on line 3");
        assertTrue(r.problems().get(0).message().contains("time goes back"), r.problems().get(0).message());
    }

    @Test
    void badLinesAreReportedWithTheirLineNumbersAndTheGoodDataKept() {
        String good1 = rmc("GP", at("2026-06-21T12:00:00Z"), 38.5, -28.6, 6, 100);
        String good2 = rmc("GP", at("2026-06-21T12:00:10Z"), 38.51, -28.6, 6, 100);
        String wrongSum = good2.substring(0, good2.length() - 2) + (good2.endsWith("00") ? "01" : "00");
        String truncated = good2.substring(0, 30);
        String good3 = rmc("GP", at("2026-06-21T12:00:20Z"), 38.52, -28.6, 6, 100);
        String badField = NmeaChecksum.append("$GPRMC,120030,A,38xx.000,N,02836.000,W,6.0,100.0,210626,,");
        byte[] bytes = String.join("\n", good1, "hello, this is not NMEA", wrongSum, truncated, "\u0001\u00ff\u0002",
                badField, good3).getBytes(StandardCharsets.ISO_8859_1);
        ImportResult<Track> r = read(bytes);
        assertEquals(2, r.value().size(), "lines 1 and 7 are the good ones");
        assertEquals(5, r.problemCount(), "lines 2 to 6 each reported: " + r.problems());
        assertProblem(r, 2, "not an NMEA 0183 sentence");
        assertProblem(r, 3, "checksum mismatch");
        assertProblem(r, 4, "no checksum");
        assertProblem(r, 5, "not an NMEA 0183 sentence");
        assertProblem(r, 6, "latitude");
        assertEquals(Instant.parse("2026-06-21T12:00:20Z"), r.value().time(1), "the good line after them");
    }

    @Test
    void headingAndSpeedThroughTheWater() {
        ImportResult<Track> r = read(
                rmc("GP", at("2026-06-21T12:00:00Z"), 38.5, -28.6, 6, 100),
                NmeaChecksum.append("$HEHDT,101.5,T"),
                NmeaChecksum.append("$VWVHW,101.5,T,,M,5.8,N,10.7,K"),
                rmc("GP", at("2026-06-21T12:00:01Z"), 38.5, -28.6, 6, 100),
                // magnetic 110.0, deviation 1.0 E, variation 9.5 W: true 101.5 (the sentence's definition)
                NmeaChecksum.append("$HCHDG,110.0,1.0,E,9.5,W"));
        assertEquals(0, r.problemCount(), r.problems().toString());
        assertEquals(101.5, r.value().headingDeg(0).getAsDouble(), 1e-4, "HDT");
        assertEquals(5.8, r.value().stwKn(0).getAsDouble(), 1e-4, "VHW speed");
        assertEquals(101.5, r.value().headingDeg(1).getAsDouble(), 1e-4, "HDG made true");
    }

    @Test
    void aLogWithoutDateNeedsOne() {
        String g = gga("GP", at("2026-06-21T12:00:00Z"), 38.5, -28.6);
        ImportResult<Track> r = read(g);
        assertEquals(0, r.value().size(), "no date, no fix");
        assertTrue(r.problems().get(0).message().contains("give the log's start date"), r.problems().toString());
        ImportResult<Track> dated = readWith(new NmeaTrackReader.Options(true, Optional.of(LocalDate.of(2026, 6, 21))),
                g.getBytes(StandardCharsets.US_ASCII));
        assertEquals(Instant.parse("2026-06-21T12:00:00Z"), dated.value().time(0), "with the given date");
    }

    @Test
    void notNmeaAtAll() {
        ImportResult<Track> r = read(new byte[] {(byte) 0x89, 'P', 'N', 'G', 0, 0, 1});
        assertEquals(0, r.value().size(), "no fix");
        assertTrue(r.problems().get(0).message().contains("unreadable bytes"), r.problems().toString());
    }

    // ---- helpers: sentences written from the layouts of NMEA 0183 ----

    static long at(String iso) {
        return Instant.parse(iso).toEpochMilli();
    }

    static String rmc(String talker, long t, double lat, double lon, double sogKn, double cogDeg) {
        Instant i = Instant.ofEpochMilli(t);
        String date = String.format(Locale.ROOT, "%1$td%1$tm%1$ty", java.util.Date.from(i).toInstant()
                .atZone(java.time.ZoneOffset.UTC));
        return NmeaChecksum.append(String.format(Locale.ROOT, "$%sRMC,%s,A,%s,%s,%.1f,%.1f,%s,,,A", talker, hms(t),
                lat(lat), lon(lon), sogKn, cogDeg, date));
    }

    static String gga(String talker, long t, double lat, double lon) {
        return NmeaChecksum.append(String.format(Locale.ROOT, "$%sGGA,%s,%s,%s,1,08,0.9,5.0,M,46.9,M,,", talker,
                hms(t), lat(lat), lon(lon)));
    }

    static String hms(long t) {
        long s = Math.floorMod(t, 86_400_000L) / 1000;
        return String.format(Locale.ROOT, "%02d%02d%02d.00", s / 3600, s / 60 % 60, s % 60);
    }

    static String lat(double lat) {
        double a = Math.abs(lat);
        int d = (int) a;
        return String.format(Locale.ROOT, "%02d%07.4f,%s", d, (a - d) * 60, lat < 0 ? "S" : "N");
    }

    static String lon(double lon) {
        double a = Math.abs(lon);
        int d = (int) a;
        return String.format(Locale.ROOT, "%03d%07.4f,%s", d, (a - d) * 60, lon < 0 ? "W" : "E");
    }

    private static void assertProblem(ImportResult<Track> r, long line, String text) {
        assertTrue(r.problems().stream().anyMatch(p -> p.line() == line && p.message().contains(text)),
                "line " + line + " reported as '" + text + "': " + r.problems());
    }

    private static ImportResult<Track> read(String... lines) {
        return read(String.join("\r\n", lines).getBytes(StandardCharsets.US_ASCII));
    }

    private static ImportResult<Track> read(byte[] bytes) {
        return readWith(NmeaTrackReader.Options.DEFAULT, bytes);
    }

    private static ImportResult<Track> readWith(NmeaTrackReader.Options o, byte[] bytes) {
        try {
            return NmeaTrackReader.read(new ByteArrayInputStream(bytes), "test.nmea", o);
        } catch (IOException e) {
            throw new AssertionError(e);
        }
    }
}
