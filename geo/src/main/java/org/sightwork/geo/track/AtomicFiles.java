package org.sightwork.geo.track;

import java.io.IOException;
import java.io.OutputStream;
import org.sightwork.geo.files.SafeWrite;

/**
 * Writes a file through a temporary file in the same folder and a rename, so a failed write leaves
 * the old file: a forwarder to {@link SafeWrite}, which holds the contract.
 *
 * @deprecated call {@link SafeWrite#write(java.nio.file.Path, SafeWrite.Content)}; kept only until
 *             the remaining callers have moved over.
 */
@Deprecated
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
     * Writes a file atomically (see {@link SafeWrite}).
     *
     * @param target the file to write
     * @param content what to write
     * @throws IOException if it cannot be written; the target is then as it was
     */
    public static void write(java.nio.file.Path target, Content content) throws IOException {
        SafeWrite.write(target, content::writeTo);
    }
}
