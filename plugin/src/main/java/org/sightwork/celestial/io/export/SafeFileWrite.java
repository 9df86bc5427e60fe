package org.sightwork.celestial.io.export;

import java.io.IOException;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;

/**
 * Writes a file through a temporary file in the same directory and a rename, so that the target is
 * either the old file or the complete new one, never a part.
 *
 * <p><b>Thread safety:</b> stateless; two writers of the same target race only on the rename.
 */
final class SafeFileWrite {

    /** The work that fills the temporary file. */
    @FunctionalInterface
    interface Writer {
        void write(Path temporary) throws IOException;
    }

    private SafeFileWrite() {
    }

    /**
     * Writes {@code target} through a temporary file.
     *
     * @param target the file to write
     * @param writer fills the temporary file (which does not exist yet when it is called)
     * @throws IOException if writing or renaming fails; the target is then unchanged
     */
    static void write(Path target, Writer writer) throws IOException {
        Path absolute = target.toAbsolutePath();
        Path dir = absolute.getParent();
        Files.createDirectories(dir);
        Path temporary = Files.createTempFile(dir, "." + absolute.getFileName() + ".", ".part");
        Files.delete(temporary);
        try {
            writer.write(temporary);
            try {
                Files.move(temporary, absolute, StandardCopyOption.ATOMIC_MOVE,
                        StandardCopyOption.REPLACE_EXISTING);
            } catch (AtomicMoveNotSupportedException e) {
                Files.move(temporary, absolute, StandardCopyOption.REPLACE_EXISTING);
            }
        } finally {
            Files.deleteIfExists(temporary);
        }
    }
}
