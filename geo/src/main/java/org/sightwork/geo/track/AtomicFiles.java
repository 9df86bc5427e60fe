package org.sightwork.geo.track;

import java.io.IOException;
import java.io.OutputStream;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;

/** Writes a file through a temporary file in the same folder and a rename, so a failed write leaves the old file. */
public final class AtomicFiles {

    /** What writes the content. */
    @FunctionalInterface
    public interface Content {
        /**
         * Writes the content.
         *
         * @param out the stream to the temporary file
         * @throws IOException if writing fails
         */
        void writeTo(OutputStream out) throws IOException;
    }

    private AtomicFiles() {
    }

    /**
     * Writes a file atomically.
     *
     * @param target the file to write
     * @param content what to write
     * @throws IOException if it cannot be written; the target is then as it was
     */
    public static void write(Path target, Content content) throws IOException {
        Path abs = target.toAbsolutePath();
        Path dir = abs.getParent();
        Path tmp = Files.createTempFile(dir, "." + abs.getFileName() + ".", ".tmp");
        try {
            try (OutputStream out = Files.newOutputStream(tmp)) {
                content.writeTo(out);
            }
            try {
                Files.move(tmp, abs, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
            } catch (AtomicMoveNotSupportedException e) {
                Files.move(tmp, abs, StandardCopyOption.REPLACE_EXISTING);
            }
        } finally {
            Files.deleteIfExists(tmp);
        }
    }
}
