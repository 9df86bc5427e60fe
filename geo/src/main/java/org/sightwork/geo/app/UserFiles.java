package org.sightwork.geo.app;

import java.io.IOException;
import java.io.StringReader;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Properties;
import org.sightwork.geo.files.SafeWrite;

/**
 * The user's Sightwork directory ({@code ~/.sightwork}, or {@code -Dsightwork.user.dir}) and the
 * shell's small settings file in it. Written through {@link SafeWrite} (a temporary file in the
 * same directory, then a rename over the old one), so a crash never leaves half a file.
 *
 * <p><b>Thread safety:</b> synchronised; quick (a few hundred bytes), so it may run on the FX thread.
 */
public final class UserFiles {

    private static final String SETTINGS = "shell.properties";
    private final Path dir;

    /**
     * The user's directory.
     *
     * @param dir the directory (made if missing)
     */
    public UserFiles(Path dir) {
        this.dir = dir;
    }

    /**
     * The default directory: {@code -Dsightwork.user.dir} or {@code ~/.sightwork}.
     *
     * @return the user files
     */
    public static UserFiles defaultLocation() {
        String d = System.getProperty("sightwork.user.dir");
        return new UserFiles(d != null ? Path.of(d) : Path.of(System.getProperty("user.home"), ".sightwork"));
    }

    /**
     * The directory, made if missing.
     *
     * @return the directory
     * @throws IOException if it cannot be made
     */
    public synchronized Path directory() throws IOException {
        Files.createDirectories(dir);
        return dir;
    }

    /**
     * Reads a setting.
     *
     * @param key the key
     * @return its value, or null
     */
    public synchronized String get(String key) {
        Path f = dir.resolve(SETTINGS);
        if (!Files.isRegularFile(f)) {
            return null;
        }
        try {
            Properties p = new Properties();
            p.load(new StringReader(Files.readString(f, StandardCharsets.UTF_8)));
            return p.getProperty(key);
        } catch (IOException | RuntimeException e) {
            return null;
        }
    }

    /**
     * Writes a setting (atomically).
     *
     * @param key the key
     * @param value the value
     * @throws IOException if it cannot be written
     */
    public synchronized void put(String key, String value) throws IOException {
        Path f = directory().resolve(SETTINGS);
        Properties p = new Properties();
        if (Files.isRegularFile(f)) {
            p.load(new StringReader(Files.readString(f, StandardCharsets.UTF_8)));
        }
        p.setProperty(key, value);
        StringWriter w = new StringWriter();
        p.store(w, "Sightwork chart shell settings");
        byte[] bytes = w.toString().getBytes(StandardCharsets.UTF_8);
        SafeWrite.write(f, out -> out.write(bytes));
    }
}
