package org.sightwork.celestial.io;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.DeserializationFeature;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Optional;
import org.sightwork.geo.files.SafeWrite;

/**
 * Reads and writes the session file (JSON, Jackson).
 *
 * <p>Writing: through {@link SafeWrite} with {@link SafeWrite.Previous#KEEP_AS_BAK}: the new
 * content goes to a temporary file in the same folder and is forced to disk, the current file (if
 * any) becomes {@code NAME.bak}, and the temporary file is renamed over the current one. A crash at
 * any point leaves either the old or the new file whole.
 *
 * <p>Reading: a file of a newer {@code formatVersion} is opened read-only (it may hold what this
 * version cannot keep); a damaged file (not JSON, or not a session) is reported and its backup,
 * if readable, is opened read-only instead; the damaged file is left as it is.
 *
 * <p>Thread safety: stateless; one writer per file at a time.
 */
public final class SessionFile {

    /** The format version this program writes. */
    public static final int FORMAT_VERSION = 1;

    private static final ObjectMapper JSON = new ObjectMapper()
            .enable(SerializationFeature.INDENT_OUTPUT)
            .disable(DeserializationFeature.FAIL_ON_UNKNOWN_PROPERTIES);

    /**
     * A session as opened.
     *
     * @param session the session, if one could be read
     * @param readOnly true when it must not be saved over (newer version, or a backup of a damaged file)
     * @param message what the navigator must know, or empty
     */
    public record Opened(Optional<Session> session, boolean readOnly, String message) {
    }

    private SessionFile() {
    }

    /**
     * @param path the session file
     * @return the session, or why it could not be opened
     */
    public static Opened open(Path path) {
        try {
            return readChecked(path, false);
        } catch (IOException | IllegalArgumentException e) {
            String why = path.getFileName() + " is damaged and was not changed (" + firstLine(e) + ")";
            Path bak = backupOf(path);
            if (Files.exists(bak)) {
                try {
                    Opened b = readChecked(bak, true);
                    return new Opened(b.session(), true, why + "; its backup " + bak.getFileName()
                            + " is open read-only: save under a new name to keep working");
                } catch (IOException | IllegalArgumentException e2) {
                    return new Opened(Optional.empty(), true, why + "; the backup is damaged too");
                }
            }
            return new Opened(Optional.empty(), true, why + "; there is no backup");
        }
    }

    private static Opened readChecked(Path path, boolean readOnly) throws IOException {
        JsonNode node = JSON.readTree(path.toFile());
        if (node == null || !node.isObject() || !node.has("formatVersion") || !node.get("formatVersion").canConvertToInt()) {
            throw new IllegalArgumentException("no formatVersion number: not a session file");
        }
        int version = node.get("formatVersion").asInt();
        Session s;
        try {
            s = JSON.treeToValue(node, Session.class);
        } catch (JsonProcessingException e) {
            if (version > FORMAT_VERSION) {
                return new Opened(Optional.empty(), true, path.getFileName() + " was written in format " + version
                        + ", newer than this program's " + FORMAT_VERSION + ", and cannot be read: use a newer version");
            }
            throw e;
        }
        if (version > FORMAT_VERSION) {
            return new Opened(Optional.of(s), true, path.getFileName() + " was written in format " + version
                    + ", newer than this program's " + FORMAT_VERSION
                    + ": opened read-only so that nothing it holds is lost");
        }
        return new Opened(Optional.of(s), readOnly, "");
    }

    /**
     * Saves atomically, keeping the previous file as {@code .bak}.
     *
     * @param session the session (written with {@link #FORMAT_VERSION})
     * @param path the session file
     * @throws IOException if it cannot be written; the old file is then unchanged
     */
    public static void save(Session session, Path path) throws IOException {
        Session s = new Session(FORMAT_VERSION, session.name(), session.sights(), session.drLegs(), session.gpsTrack(),
                session.fixes(), session.settings());
        SafeWrite.write(path, SafeWrite.Previous.KEEP_AS_BAK, out -> JSON.writeValue(out, s));
    }

    /**
     * @param path a session file
     * @return its backup's path ({@code NAME.bak})
     */
    public static Path backupOf(Path path) {
        return SafeWrite.backupOf(path);
    }

    private static String firstLine(Exception e) {
        String m = e.getMessage() == null ? e.getClass().getSimpleName() : e.getMessage();
        int nl = m.indexOf('\n');
        return nl < 0 ? m : m.substring(0, nl);
    }
}
