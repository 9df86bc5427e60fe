package org.sightwork.celestial.drill;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayInputStream;
import java.io.StringReader;
import java.nio.charset.StandardCharsets;
import java.time.Instant;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.text.PDFTextStripper;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.sightwork.celestial.almanac.Almanac;
import org.sightwork.celestial.io.SightLog;
import org.sightwork.celestial.io.SightLogReader;
import org.sightwork.celestial.sight.Sight;
import org.sightwork.geo.earth.GeoPosition;
import org.sightwork.geo.track.DeadReckoning;
import org.sightwork.geo.track.DrLog;
import org.sightwork.geo.track.ImportResult;
import org.sightwork.geo.track.NmeaTrackReader;
import org.sightwork.geo.track.Track;

/** The student pack and the key as files: deterministic, and read back by the project's own readers. */
class DrillPackTest {

    private static final Almanac ALMANAC = Almanac.standard();

    @Test
    void theSameSeedGivesTheSameBytesEvenUnderAnotherDefaultLocale() {
        Map<String, byte[]> a = DrillPackWriter.files(DrillGenerator.generate(Scenarios.demo(), 7, ALMANAC));
        Locale before = Locale.getDefault();
        Map<String, byte[]> b;
        try {
            Locale.setDefault(Locale.GERMANY); // decimal comma: must not leak into any file
            b = DrillPackWriter.files(DrillGenerator.generate(Scenarios.demo(), 7, ALMANAC));
        } finally {
            Locale.setDefault(before);
        }
        assertEquals(a.keySet(), b.keySet(), "the same files");
        for (String name : a.keySet()) {
            assertArrayEquals(a.get(name), b.get(name), name + " byte for byte");
        }
        Map<String, byte[]> c = DrillPackWriter.files(DrillGenerator.generate(Scenarios.demo(), 8, ALMANAC));
        assertFalse(java.util.Arrays.equals(a.get("student/sight-log.csv"), c.get("student/sight-log.csv")),
                "another seed, other sights");
    }

    @Test
    void thePdfCarriesNoClockAndReadsBack() throws Exception {
        DrillPack p = DrillGenerator.generate(Scenarios.demo(), 7, ALMANAC);
        byte[] pdf = ExerciseSheet.pdf(p);
        try (PDDocument d = Loader.loadPDF(pdf)) {
            assertEquals(p.track().startUtc().toEpochMilli(),
                    d.getDocumentInformation().getCreationDate().getTimeInMillis(), "creation date = departure");
            String text = new PDFTextStripper().getText(d);
            assertTrue(text.contains("INVENTED SCENARIO"), "the sheet says the scenario is invented");
            assertTrue(text.contains("CAUTION"), "the sheet carries the caution");
            for (LoggedSight s : p.sights()) {
                assertTrue(text.contains(SightLogCsv.altitude(s.hsDeg()).replace('′', '\'')), "Hs of sight " + s.number());
            }
        }
    }

    @Test
    void theSightLogIsReadBackByTheProjectsSightLogReader() throws Exception {
        DrillPack p = DrillGenerator.generate(Scenarios.demo(), 7, ALMANAC);
        String csv = new String(DrillPackWriter.files(p).get("student/sight-log.csv"), StandardCharsets.UTF_8);
        SightLog log = SightLogReader.read(new StringReader(csv), "sight-log.csv");
        assertTrue(log.problems().isEmpty(), log.problems().toString());
        assertEquals(p.sights().size(), log.sights().size(), "every sight read");
        for (int i = 0; i < p.sights().size(); i++) {
            LoggedSight g = p.sights().get(i);
            Sight s = log.sights().get(i);
            AnswerKey.SightKey k = p.key().sights().get(i);
            assertEquals(g.hsDeg() * 60, s.hsDeg() * 60, 1e-6, "Hs (minutes) of sight " + g.number());
            assertEquals(g.watchTime(), s.watchTime(), "watch time of sight " + g.number());
            assertEquals(k.corrections().indexArcmin(), s.indexError().correctionArcmin(), 1e-9, "index correction");
            assertEquals(g.dr().latDeg(), s.dr().orElseThrow().latDeg(), 1e-9, "DR latitude");
            assertEquals(g.dr().lonDeg(), s.dr().orElseThrow().lonDeg(), 1e-9, "DR longitude");
            assertEquals(g.limb(), s.limb(), "limb");
        }
    }

    @Test
    void theDeckLogIsReadBackByTheShellsDrLogReaderWithTheSameDr() throws Exception {
        DrillPack p = DrillGenerator.generate(Scenarios.demo(), 7, ALMANAC);
        String csv = p.deckLog().csv();
        ImportResult<Optional<DrLog>> r = DrLog.read(new StringReader(csv), "dr-log.csv");
        assertTrue(r.problems().isEmpty(), r.problems().toString());
        DrLog back = r.value().orElseThrow();
        for (LoggedSight s : p.sights()) {
            GeoPosition dr = DeadReckoning.dr(back, s.trueUtc());
            // The sight log's DR is written to 0.1′: 0.05′ of latitude, 0.05′ of longitude.
            assertEquals(s.dr().latDeg() * 60, dr.latDeg() * 60, 0.05 + 1e-9, "DR latitude at sight " + s.number());
            assertEquals(s.dr().lonDeg() * 60, dr.lonDeg() * 60, 0.05 + 1e-9, "DR longitude at sight " + s.number());
        }
    }

    @Test
    void theTrueTrackNmeaHasValidChecksumsAndTheTruePositions() throws Exception {
        DrillPack p = DrillGenerator.generate(Scenarios.demo(), 7, ALMANAC);
        // The widely circulated example sentence (REFERENCES.md) checks the checksum rule below.
        assertEquals("47", checksum("$GPGGA,123519,4807.038,N,01131.000,E,1,08,0.9,545.4,M,46.9,M,,*47"),
                "the published example");
        for (String s : p.truthNmea()) {
            assertEquals(checksum(s), s.substring(s.indexOf('*') + 1), "checksum of " + s);
            assertTrue(s.startsWith("$GPRMC,") || s.startsWith("$GPGGA,"), s);
        }
        byte[] file = DrillPackWriter.files(p).get("key/true-track.nmea");
        ImportResult<Track> r = NmeaTrackReader.read(new ByteArrayInputStream(file), "true-track.nmea",
                NmeaTrackReader.Options.DEFAULT);
        Track t = r.value();
        assertTrue(t.size() > 1000, "one fix a minute over the passage: " + t.size());
        for (int i = 0; i < t.size(); i += 97) {
            GeoPosition truth = p.track().positionAt(t.time(i));
            // NMEA writes minutes to 0.001′ here: 0.0005′ of rounding.
            assertEquals(truth.latDeg() * 60, t.latDeg(i) * 60, 0.0006, "latitude at " + t.time(i));
            assertEquals(truth.lonDeg() * 60, t.lonDeg(i) * 60, 0.0006, "longitude at " + t.time(i));
        }
    }

    /** NMEA 0183: the XOR of the characters between '$' and '*', as two upper-case hex digits. */
    private static String checksum(String sentence) {
        int x = 0;
        for (int i = 1; i < sentence.indexOf('*'); i++) {
            x ^= sentence.charAt(i);
        }
        return String.format(Locale.ROOT, "%02X", x);
    }

    @Test
    void writingRefusesToOverwriteUnlessAsked(@TempDir java.nio.file.Path dir) throws Exception {
        DrillPack p = DrillGenerator.generate(Scenarios.demo(), 7, ALMANAC);
        List<java.nio.file.Path> written = DrillPackWriter.write(p, dir, false);
        assertEquals(6, written.size(), "six files");
        DrillException e = org.junit.jupiter.api.Assertions.assertThrows(DrillException.class,
                () -> DrillPackWriter.write(p, dir, false));
        assertTrue(e.getMessage().contains("answer-key.json exists"), e.getMessage());
        DrillPackWriter.write(p, dir, true);
        AnswerKey k = AnswerKeyIo.read(dir.resolve("key/answer-key.json"));
        assertEquals(AnswerKeyIo.toJson(p.key()), AnswerKeyIo.toJson(k), "the key reads back as written");
        assertEquals(Instant.parse("2026-06-21T08:00:00Z"), p.track().startUtc(), "demo departure");
    }

    /** Regression: the pack came out 0600 (a temporary file's permissions), unreadable to the class. */
    @Test
    void theStudentPackIsReadableByOthers(@TempDir java.nio.file.Path dir) throws Exception {
        org.junit.jupiter.api.Assumptions.assumeTrue(java.nio.file.Files.getFileAttributeView(dir,
                java.nio.file.attribute.PosixFileAttributeView.class) != null, "POSIX permissions");
        DrillPack p = DrillGenerator.generate(Scenarios.demo(), 7, ALMANAC);
        for (java.nio.file.Path f : DrillPackWriter.write(p, dir, false)) {
            assertTrue(java.nio.file.Files.getPosixFilePermissions(f)
                    .contains(java.nio.file.attribute.PosixFilePermission.OTHERS_READ), f + " readable by others");
        }
    }

    /**
     * Regression: the note named the session a sight was grouped into ("2026-06-21 noon" on a
     * forenoon sight at 10:54Z). It now says what the sight is; checked against the Sun's true
     * azimuth (east of the meridian before noon, the definition of forenoon) and the Sun's altitude.
     */
    @Test
    void theLogsNoteSaysWhatTheSightIs() {
        DrillPack p = DrillGenerator.generate(Scenarios.demo(), 7, ALMANAC);
        String csv = new String(DrillPackWriter.files(p).get("student/sight-log.csv"), StandardCharsets.UTF_8);
        String[] rows = csv.strip().split("\n");
        boolean sawNoon = false;
        for (LoggedSight s : p.sights()) {
            String note = rows[s.number()].substring(rows[s.number()].lastIndexOf(',') + 1);
            assertTrue(note.startsWith("sight " + s.number() + "; "), note);
            assertTrue(note.endsWith("; fix " + s.session()), "names the fix the sight is for: " + note);
            String what = note.substring(note.indexOf("; ") + 2, note.lastIndexOf("; fix "));
            if (s.body().name().equals("Sun")) {
                double offMeridianDeg = Math.abs(s.trueZnDeg() - 180.0); // the demo is in 38°N: noon Sun due south
                if (offMeridianDeg < 1.0) {
                    assertEquals("noon Sun (meridian)", what, "Sun at Zn " + s.trueZnDeg());
                    sawNoon = true;
                } else {
                    assertEquals(s.trueZnDeg() < 180.0 ? "forenoon Sun" : "afternoon Sun", what, "Sun at Zn " + s.trueZnDeg());
                }
            } else {
                assertTrue(s.sunAltitudeDeg() < 0.0, "twilight sight of " + s.body().name());
                assertTrue(what.equals("morning stars") || what.equals("evening stars") || what.endsWith(" Moon"), what);
                assertEquals(s.trueUtc().toString().startsWith("2026-06-22T05"), what.startsWith("morning"),
                        "dawn on the 22nd, dusk on the 21st: " + what);
            }
            assertFalse(what.contains("2026"), "no session name: " + what);
        }
        assertTrue(sawNoon, "the demo has a meridian sight");
    }
}
