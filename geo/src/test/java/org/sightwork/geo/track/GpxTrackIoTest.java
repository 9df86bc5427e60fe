package org.sightwork.geo.track;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.time.Instant;
import java.util.List;
import java.util.Optional;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.sightwork.geo.earth.GeoPosition;

/**
 * GPX 1.1 (schema at topografix.com/GPX/1/1) and CSV import/export, the refusal of XML external
 * entities (OWASP XXE cheat sheet: a DTD in the file must not make the parser read a local file),
 * and interpolation in time.
 */
class GpxTrackIoTest {

    @TempDir
    Path dir;

    @Test
    void refusesAnExternalEntity() throws IOException {
        Path secret = dir.resolve("secret.txt");
        Files.writeString(secret, "SECRET-CONTENT");
        String xxe = "<?xml version=\"1.0\"?>\n<!DOCTYPE gpx [<!ENTITY x SYSTEM \"" + secret.toUri() + "\">]>\n"
                + "<gpx version=\"1.1\" creator=\"t\" xmlns=\"http://www.topografix.com/GPX/1/1\">"
                + "<wpt lat=\"1\" lon=\"2\"><name>&x;</name></wpt></gpx>";
        Path f = dir.resolve("xxe.gpx");
        Files.writeString(f, xxe);
        IOException e = assertThrows(IOException.class, () -> GpxTrackIo.read(f));
        assertTrue(e.getMessage().contains("refused"), e.getMessage());
        assertFalse(e.getMessage().contains("SECRET-CONTENT"), "the file's content never shows");
    }

    @Test
    void theXmlFactoryJpxUsesReadsNoExternalEntity() throws Exception {
        // JPX 3.2.1 itself stops at a DTD event; the factory must also refuse on its own (defence in depth).
        assertTrue(io.jenetics.jpx.XMLProvider.provider() instanceof SafeXmlProvider, "our provider is the one in use");
        Path secret = dir.resolve("secret2.txt");
        Files.writeString(secret, "SECRET-CONTENT");
        String xml = "<?xml version=\"1.0\"?>\n<!DOCTYPE a [<!ENTITY x SYSTEM \"" + secret.toUri() + "\">]><a>&x;</a>";
        javax.xml.stream.XMLStreamReader r = new SafeXmlProvider().xmlInputFactory()
                .createXMLStreamReader(new java.io.StringReader(xml));
        StringBuilder text = new StringBuilder();
        try {
            while (r.hasNext()) {
                if (r.next() == javax.xml.stream.XMLStreamConstants.CHARACTERS) {
                    text.append(r.getText());
                }
            }
        } catch (javax.xml.stream.XMLStreamException refused) {
            // refusing the undeclared entity is as good as not expanding it
        }
        assertFalse(text.toString().contains("SECRET-CONTENT"), "the entity is not expanded");
    }

    @Test
    void readsTracksAndWaypointsAndWritesThemBack() throws IOException {
        String gpx = "<?xml version=\"1.0\"?>\n<gpx version=\"1.1\" creator=\"t\" xmlns=\"http://www.topografix.com/GPX/1/1\">"
                + "<wpt lat=\"38.53\" lon=\"-28.63\"><name>Horta</name></wpt>"
                + "<trk><trkseg>"
                + "<trkpt lat=\"38.5\" lon=\"-28.6\"><time>2026-06-21T06:00:00Z</time></trkpt>"
                + "<trkpt lat=\"38.4\" lon=\"-28.4\"><time>2026-06-21T07:00:00Z</time></trkpt>"
                + "<trkpt lat=\"38.3\" lon=\"-28.3\"></trkpt>"
                + "</trkseg></trk></gpx>";
        Path f = dir.resolve("t.gpx");
        Files.writeString(f, gpx);
        ImportResult<GpxTrackIo.GpxContent> r = GpxTrackIo.read(f);
        assertEquals(2, r.value().track().size(), "two timed points");
        assertEquals(1, r.problemCount(), "the untimed point is reported");
        assertTrue(r.problems().get(0).message().contains("point 3"), r.problems().toString());
        assertEquals("Horta", r.value().waypoints().get(0).name(), "waypoint");
        Path out = dir.resolve("out.gpx");
        GpxTrackIo.write(out, "test", r.value().track(), r.value().waypoints());
        ImportResult<GpxTrackIo.GpxContent> back = GpxTrackIo.read(out);
        assertEquals(38.4, back.value().track().latDeg(1), 1e-9, "latitude written with 9 decimals");
        assertEquals(Instant.parse("2026-06-21T07:00:00Z"), back.value().track().time(1), "time");
        try (var s = Files.list(dir)) {
            assertTrue(s.noneMatch(p -> p.getFileName().toString().endsWith(".tmp")), "no temporary file left");
        }
    }

    @Test
    void csvRoundTripAndBadCells() throws IOException {
        Path f = dir.resolve("t.csv");
        Files.writeString(f, "time_utc,lat_deg,lon_deg,sog_kn\n"
                + "2026-06-21T06:00:00Z,38°30.0'N,028°36.0'W,6\n"
                + "2026-06-21T06:10:00Z,north,-28.59,6\n"
                + "2026-06-21T06:20:00Z,38.49,-28.58,\n");
        ImportResult<Track> r = CsvTrackIo.read(f);
        assertEquals(2, r.value().size(), "two good lines");
        assertEquals(1, r.problemCount(), "one bad line");
        assertEquals(3, r.problems().get(0).line(), "line 3");
        assertEquals(2, r.problems().get(0).column(), "column 2");
        assertEquals(38.5, r.value().latDeg(0), 1e-12, "d°m.m′ read");
        Path out = dir.resolve("out.csv");
        CsvTrackIo.write(out, r.value());
        ImportResult<Track> back = CsvTrackIo.read(out);
        assertEquals(0, back.problemCount(), back.problems().toString());
        assertEquals(-28.58, back.value().lonDeg(1), 1e-7, "longitude back");
        assertEquals(6.0, back.value().sogKn(0).getAsDouble(), 1e-9, "speed back");
        assertTrue(back.value().sogKn(1).isEmpty(), "an empty cell stays absent");
    }

    @Test
    void interpolatesInTimeAcrossTheDateLine() {
        Track t = Track.builder()
                .add(Instant.parse("2026-06-21T00:00:00Z").toEpochMilli(), 10, 179.9, Double.NaN, Double.NaN, Double.NaN, Double.NaN)
                .add(Instant.parse("2026-06-21T00:10:00Z").toEpochMilli(), 10.1, -179.9, Double.NaN, Double.NaN, Double.NaN, Double.NaN)
                .build();
        // Linear interpolation: half-way in time is half-way in latitude and longitude (definition).
        Optional<GeoPosition> p = t.positionAt(Instant.parse("2026-06-21T00:05:00Z"), Duration.ofMinutes(15));
        assertEquals(10.05, p.orElseThrow().latDeg(), 1e-12, "latitude");
        assertEquals(-180.0, p.orElseThrow().lonDeg(), 1e-9, "longitude on the date line");
        assertTrue(t.positionAt(Instant.parse("2026-06-21T00:05:00Z"), Duration.ofMinutes(5)).isEmpty(), "gap too long");
        assertTrue(t.positionAt(Instant.parse("2026-06-21T00:11:00Z"), Duration.ofHours(1)).isEmpty(), "after the end");
    }
}
