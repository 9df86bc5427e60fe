package org.sightwork.celestial.ui;

import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.Optional;
import org.sightwork.geo.track.DrLog;
import org.sightwork.geo.track.Track;

/**
 * A passage as the plugin edits it: its title and day, the sight log rows as typed, the DR log and
 * the GPS track. This is the editor's document; it is saved in the session file.
 *
 * <p><b>Thread safety:</b> not thread-safe; used on the JavaFX application thread. {@link #copy()}
 * gives a snapshot for background work.
 */
final class Passage {

    private String title;
    private LocalDate day;
    private final List<SightRow> rows = new ArrayList<>();
    private Optional<DrLog> drLog = Optional.empty();
    private Optional<Track> gps = Optional.empty();
    private Optional<java.nio.file.Path> gpsFile = Optional.empty();

    Passage(String title, LocalDate day) {
        this.title = Objects.requireNonNull(title, "title");
        this.day = Objects.requireNonNull(day, "day");
    }

    String title() {
        return title;
    }

    void setTitle(String title) {
        this.title = Objects.requireNonNull(title, "title");
    }

    LocalDate day() {
        return day;
    }

    void setDay(LocalDate day) {
        this.day = Objects.requireNonNull(day, "day");
    }

    /** @return the rows, live (the editor changes them in place) */
    List<SightRow> rows() {
        return rows;
    }

    Optional<DrLog> drLog() {
        return drLog;
    }

    void setDrLog(Optional<DrLog> log) {
        drLog = Objects.requireNonNull(log, "log");
    }

    Optional<Track> gps() {
        return gps;
    }

    void setGps(Optional<Track> track) {
        gps = Objects.requireNonNull(track, "track");
    }

    /** @return the file the GPS track was read from, if any */
    Optional<java.nio.file.Path> gpsFile() {
        return gpsFile;
    }

    void setGpsFile(Optional<java.nio.file.Path> file) {
        gpsFile = Objects.requireNonNull(file, "file");
    }

    /** @return a deep copy (rows copied; the DR log and track are immutable) */
    Passage copy() {
        Passage p = new Passage(title, day);
        rows.forEach(r -> p.rows.add(r.copy()));
        p.drLog = drLog;
        p.gps = gps;
        p.gpsFile = gpsFile;
        return p;
    }
}
