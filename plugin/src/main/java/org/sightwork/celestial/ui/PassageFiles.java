package org.sightwork.celestial.ui;

import java.io.IOException;
import java.io.StringReader;
import java.nio.file.Path;
import java.time.Instant;
import java.time.LocalDate;
import java.time.ZoneOffset;
import java.time.format.DateTimeFormatter;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.TreeMap;
import org.sightwork.celestial.io.Session;
import org.sightwork.celestial.io.SessionFile;
import org.sightwork.geo.track.CsvTrackIo;
import org.sightwork.geo.track.DrLeg;
import org.sightwork.geo.track.DrLog;
import org.sightwork.geo.track.ImportResult;
import org.sightwork.geo.track.NmeaTrackReader;
import org.sightwork.geo.track.GpxTrackIo;
import org.sightwork.geo.track.Track;
import org.sightwork.geo.earth.Angles;

/**
 * A passage in the session file ({@link SessionFile}: versioned JSON, written through a temporary
 * file and a rename with the previous file kept as {@code .bak}; a newer or damaged file opens
 * read-only).
 *
 * <p>What the editor needs beyond the session's own fields goes into its {@code settings}: the
 * passage day, every cell of the sight log as typed ({@code row.N.COLUMN}, so that a half-typed
 * row survives a save), the circles asked for, and the DR log in its CSV form. The session's
 * {@code sights}, {@code drLegs} and {@code fixes} are filled too, for every other reader of the
 * file (the command line); a session written without the editor's settings is opened from them.
 * The GPS track is named by a path relative to the session file.
 *
 * <p><b>Thread safety:</b> stateless; may run on a worker thread.
 */
final class PassageFiles {

    static final String DAY = "passage.day";
    static final String ROWS = "log.rows";
    static final String DR_LOG = "dr.log.csv";

    private PassageFiles() {
    }

    /**
     * An opened passage.
     *
     * @param passage the passage, when one could be read
     * @param readOnly whether it must not be saved over
     * @param message what the navigator must know, or empty
     */
    record Opened(Optional<Passage> passage, boolean readOnly, String message) {
    }

    static Opened open(Path file) {
        SessionFile.Opened o = SessionFile.open(file);
        if (o.session().isEmpty()) {
            return new Opened(Optional.empty(), true, o.message());
        }
        List<String> notes = new ArrayList<>();
        if (!o.message().isEmpty()) {
            notes.add(o.message());
        }
        Passage p = fromSession(o.session().get(), file.toAbsolutePath().getParent(), notes);
        return new Opened(Optional.of(p), o.readOnly(), String.join("; ", notes));
    }

    /**
     * Saves a passage ({@link SessionFile#save}: temporary file, then rename; the previous file kept
     * as {@code .bak}), then removes temporary files of the same passage left by a save that was cut
     * off (a crash or a kill) and that are older than {@link #STALE_TEMP_SECONDS}: a save takes
     * milliseconds, so such a file belongs to no running writer. Opening never reads them.
     *
     * @param p the passage
     * @param plot its plot (the fixes are written for other readers of the file)
     * @param file the file
     * @throws IOException if it cannot be written; the old file is then unchanged
     */
    static void save(Passage p, Plot plot, Path file) throws IOException {
        SessionFile.save(toSession(p, plot, file.toAbsolutePath().getParent()), file);
        removeStaleTemps(file);
    }

    /** Age (seconds) after which a temporary file of a passage is a leftover of a cut-off save. */
    static final long STALE_TEMP_SECONDS = 60;

    private static void removeStaleTemps(Path file) {
        Path dir = file.toAbsolutePath().getParent();
        String prefix = "." + file.getFileName() + ".";
        java.time.Instant cutoff = java.time.Instant.now().minusSeconds(STALE_TEMP_SECONDS);
        try (var list = java.nio.file.Files.list(dir)) {
            for (Path t : (Iterable<Path>) list::iterator) {
                String n = t.getFileName().toString();
                if (n.startsWith(prefix) && n.endsWith(".tmp")
                        && java.nio.file.Files.getLastModifiedTime(t).toInstant().isBefore(cutoff)) {
                    java.nio.file.Files.deleteIfExists(t);
                }
            }
        } catch (IOException | RuntimeException e) {
            // tidying only: a leftover that cannot be removed now is removed by a later save
        }
    }

    static Session toSession(Passage p, Plot plot, Path folder) {
        Map<String, String> settings = new TreeMap<>();
        settings.put(DAY, p.day().toString());
        settings.put(ROWS, Integer.toString(p.rows().size()));
        List<Session.SessionSight> sights = new ArrayList<>();
        for (int i = 0; i < p.rows().size(); i++) {
            SightRow r = p.rows().get(i);
            for (SightColumn c : SightColumn.values()) {
                if (!r.get(c).isEmpty()) {
                    settings.put(rowKey(i, c.name()), r.get(c));
                }
            }
            if (r.circleWanted()) {
                settings.put(rowKey(i, "CIRCLE"), "yes");
            }
            SightRowReader.Read read = SightRowReader.read(r, p.day());
            read.sight().ifPresent(s -> sights.add(new Session.SessionSight(s.utc().toString(), s.body(),
                    s.limb().name(), s.hsDeg(), s.indexError().correctionArcmin(), s.eyeHeightM(), s.temperatureC(),
                    s.pressureHpa(), s.dr().map(d -> d.latDeg()).orElse(null), s.dr().map(d -> d.lonDeg()).orElse(null),
                    s.sigmaArcmin(), read.fixGroup())));
        }
        List<Session.DrLeg> legs = new ArrayList<>();
        p.drLog().ifPresent(log -> {
            settings.put(DR_LOG, drLogCsv(log));
            for (DrLeg l : log.legs()) {
                legs.add(new Session.DrLeg(l.start().toString(), l.waterTrackDeg(), l.stwKn()));
            }
        });
        List<Session.SessionFix> fixes = new ArrayList<>();
        for (Plot.FixResult f : plot.fixes()) {
            f.fix().ifPresent(x -> fixes.add(new Session.SessionFix(x.utc().toString(), x.position().latDeg(),
                    x.position().lonDeg(), x.ellipse95().majorNm(), x.ellipse95().minorNm(),
                    x.ellipse95().orientationDeg(), x.lines().stream().map(l -> l.original().label()).toList())));
        }
        String gps = p.gpsFile().map(g -> relative(folder, g)).orElse(null);
        return new Session(SessionFile.FORMAT_VERSION, p.title(), sights, legs, gps, fixes, settings);
    }

    private static String relative(Path folder, Path file) {
        try {
            return folder.relativize(file.toAbsolutePath()).toString().replace('\\', '/');
        } catch (IllegalArgumentException e) {
            return file.toAbsolutePath().toString();
        }
    }

    static Passage fromSession(Session s, Path folder, List<String> notes) {
        Map<String, String> set = s.settings();
        LocalDate day;
        try {
            day = set.containsKey(DAY) ? LocalDate.parse(set.get(DAY))
                    : s.sights().isEmpty() ? LocalDate.now(ZoneOffset.UTC)
                    : Instant.parse(s.sights().get(0).utc()).atZone(ZoneOffset.UTC).toLocalDate();
        } catch (RuntimeException e) {
            notes.add("the passage day '" + set.get(DAY) + "' is not a date (yyyy-mm-dd); today is used");
            day = LocalDate.now(ZoneOffset.UTC);
        }
        Passage p = new Passage(s.name().isEmpty() ? "Passage" : s.name(), day);
        if (set.containsKey(ROWS)) {
            int n = Integer.parseInt(set.get(ROWS));
            for (int i = 0; i < n; i++) {
                SightRow r = new SightRow();
                for (SightColumn c : SightColumn.values()) {
                    r.set(c, set.getOrDefault(rowKey(i, c.name()), ""));
                }
                r.setCircleWanted(set.containsKey(rowKey(i, "CIRCLE")));
                p.rows().add(r);
            }
        } else {
            for (Session.SessionSight ss : s.sights()) {
                p.rows().add(rowOf(ss));
            }
        }
        if (set.containsKey(DR_LOG)) {
            try {
                ImportResult<Optional<DrLog>> r = DrLog.read(new StringReader(set.get(DR_LOG)), "DR log in the session");
                p.setDrLog(r.value());
                r.problems().forEach(pr -> notes.add(pr.toString()));
            } catch (IOException e) {
                notes.add("the DR log in the session could not be read: " + e.getMessage());
            }
        }
        if (s.gpsTrack() != null && !s.gpsTrack().isBlank()) {
            Path g = folder.resolve(s.gpsTrack());
            p.setGpsFile(Optional.of(g));
            try {
                p.setGps(Optional.of(readTrack(g, notes)));
            } catch (IOException e) {
                notes.add("the GPS track " + g + " could not be read: " + e.getMessage());
            }
        }
        return p;
    }

    /**
     * Reads a track file by its extension: {@code .nmea}/{@code .txt}/{@code .log} NMEA 0183,
     * {@code .gpx} GPX, {@code .csv} our CSV.
     *
     * @param file the file
     * @param notes where problems with lines go
     * @return the track (the good lines)
     * @throws IOException if the file cannot be read
     */
    static Track readTrack(Path file, List<String> notes) throws IOException {
        String name = file.getFileName().toString().toLowerCase(Locale.ROOT);
        ImportResult<Track> r;
        if (name.endsWith(".gpx")) {
            var g = GpxTrackIo.read(file);
            g.problems().forEach(pr -> notes.add(pr.toString()));
            return g.value().track();
        } else if (name.endsWith(".csv")) {
            r = CsvTrackIo.read(file);
        } else {
            r = NmeaTrackReader.read(file, NmeaTrackReader.Options.DEFAULT);
        }
        if (r.problemCount() > 0) {
            notes.add(file.getFileName() + ": " + r.problemCount() + " line(s) left out"
                    + (r.problems().isEmpty() ? "" : ", first: " + r.problems().get(0)));
        }
        return r.value();
    }

    private static SightRow rowOf(Session.SessionSight ss) {
        SightRow r = new SightRow();
        r.set(SightColumn.BODY, ss.body());
        r.set(SightColumn.LIMB, switch (ss.limb() == null ? "" : ss.limb()) {
            case "LOWER" -> "LL";
            case "UPPER" -> "UL";
            default -> "";
        });
        r.set(SightColumn.TIME, DateTimeFormatter.ofPattern("yyyy-MM-dd HH:mm:ss", Locale.ROOT)
                .withZone(ZoneOffset.UTC).format(Instant.parse(ss.utc())));
        r.set(SightColumn.HS, Angles.formatDm(ss.hsDeg(), 2));
        r.set(SightColumn.INDEX, String.format(Locale.ROOT, "%+.1f", ss.indexErrorArcmin()));
        r.set(SightColumn.EYE, String.format(Locale.ROOT, "%.1f", ss.eyeHeightM()));
        r.set(SightColumn.TEMPERATURE, String.format(Locale.ROOT, "%.0f", ss.temperatureC()));
        r.set(SightColumn.PRESSURE, String.format(Locale.ROOT, "%.0f", ss.pressureHpa()));
        if (ss.drLatDeg() != null && ss.drLonDeg() != null) {
            r.set(SightColumn.DR, SightRowReader.formatPosition(
                    org.sightwork.geo.earth.GeoPosition.of(ss.drLatDeg(), ss.drLonDeg())));
        }
        return r;
    }

    private static String rowKey(int i, String column) {
        return String.format(Locale.ROOT, "row.%03d.%s", i, column);
    }

    /** The DR log in the CSV form {@link DrLog#read} takes. */
    static String drLogCsv(DrLog log) {
        StringBuilder b = new StringBuilder("time_utc,heading_deg,stw_kn,leeway_deg,lat,lon,note\n");
        for (int i = 0; i < log.legs().size(); i++) {
            DrLeg l = log.legs().get(i);
            b.append(l.start()).append(',').append(num(l.headingDeg())).append(',').append(num(l.stwKn()))
                    .append(',').append(num(l.leewayDeg()));
            if (i == 0) {
                b.append(',').append(num(log.departure().latDeg())).append(',').append(num(log.departure().lonDeg()));
            } else {
                b.append(",,");
            }
            b.append(",\n");
        }
        b.append(log.end()).append(",,,,,,\n");
        return b.toString();
    }

    private static String num(double v) {
        return Double.toString(v);
    }
}
