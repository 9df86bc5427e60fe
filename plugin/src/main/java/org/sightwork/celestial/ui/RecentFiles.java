package org.sightwork.celestial.ui;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.sightwork.geo.files.SafeWrite;

/**
 * The list of passages opened lately, newest first, kept in {@code ~/.sightwork/recent.json} as a
 * JSON object {@code {"passages": ["/path/a.json", ...]}}, written through a temporary file and a
 * rename. A damaged list is read as empty (and replaced at the next save); it is only a
 * convenience.
 *
 * <p><b>Thread safety:</b> not thread-safe; used on the JavaFX application thread.
 */
final class RecentFiles {

    /** Passages remembered. */
    static final int MAX_ENTRIES = 10;

    private static final ObjectMapper JSON = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);

    /** The file's content. */
    record Content(List<String> passages) {
        Content {
            passages = passages == null ? List.of() : List.copyOf(passages);
        }
    }

    private final Path file;

    RecentFiles(Path file) {
        this.file = file;
    }

    /** @return the passages, newest first; empty if the list is missing or damaged */
    List<Path> list() {
        if (!Files.isRegularFile(file)) {
            return List.of();
        }
        try {
            return JSON.readValue(file.toFile(), Content.class).passages().stream().map(Path::of).toList();
        } catch (IOException | RuntimeException e) {
            return List.of();
        }
    }

    /**
     * Puts a passage at the top of the list.
     *
     * @param passage the passage file
     * @throws IOException if the list cannot be written (the old list is then unchanged)
     */
    void add(Path passage) throws IOException {
        String p = passage.toAbsolutePath().normalize().toString();
        List<String> now = new ArrayList<>();
        now.add(p);
        for (Path q : list()) {
            if (!q.toString().equals(p) && now.size() < MAX_ENTRIES) {
                now.add(q.toString());
            }
        }
        Files.createDirectories(file.toAbsolutePath().getParent());
        SafeWrite.write(file, out -> JSON.writeValue(out, new Content(now)));
    }
}
