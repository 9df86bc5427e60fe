package org.sightwork.geo.files;

import java.io.BufferedOutputStream;
import java.io.IOException;
import java.io.OutputStream;
import java.nio.channels.FileChannel;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.LinkOption;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.StandardOpenOption;
import java.nio.file.attribute.PosixFileAttributeView;
import java.nio.file.attribute.PosixFilePermission;
import java.nio.file.attribute.PosixFilePermissions;
import java.util.Set;

/**
 * Writes a user's file so that it is either the old file or the complete new one, never a part:
 * a temporary file in the same directory, forced to disk, then an atomic rename (see the package
 * contract in {@code package-info}).
 *
 * <pre>{@code
 * SafeWrite.write(path, out -> out.write(bytes));                               // no backup
 * SafeWrite.write(path, SafeWrite.Previous.KEEP_AS_BAK, out -> json.writeValue(out, session));
 * SafeWrite.writeFile(path, SafeWrite.Previous.DISCARD, tmp -> library.saveTo(tmp.toFile()));
 * }</pre>
 *
 * <p><b>Thread safety:</b> stateless; see the package contract for two writers of one target.
 */
public final class SafeWrite {

    /** Permissions of a new file where POSIX permissions exist: rw-r--r-- (0644). */
    public static final Set<PosixFilePermission> NEW_FILE_PERMISSIONS = PosixFilePermissions.fromString("rw-r--r--");

    private static final System.Logger LOG = System.getLogger("org.sightwork.geo.files");

    /** What to do with the file being replaced. */
    public enum Previous {
        /** Replace it. */
        DISCARD,
        /** Keep it as {@code NAME.bak} (replacing an older backup); nothing when there is no file yet. */
        KEEP_AS_BAK
    }

    /** Writes the content to a stream. */
    @FunctionalInterface
    public interface Content {
        /**
         * Writes the content.
         *
         * @param out the stream to the temporary file (closing it is allowed)
         * @throws IOException if writing fails
         */
        void writeTo(OutputStream out) throws IOException;
    }

    /** Writes the content to a file by name, for libraries that want a path rather than a stream. */
    @FunctionalInterface
    public interface FileContent {
        /**
         * Writes the content.
         *
         * @param temporary the file to create and fill: in the target's directory, not yet existing
         * @throws IOException if writing fails
         */
        void writeTo(Path temporary) throws IOException;
    }

    private SafeWrite() {
    }

    /**
     * Writes a file, replacing what was there.
     *
     * @param target the file
     * @param content what to write
     * @throws IOException if it cannot be written; the target is then as it was
     */
    public static void write(Path target, Content content) throws IOException {
        write(target, Previous.DISCARD, content);
    }

    /**
     * Writes a file through a stream.
     *
     * @param target the file
     * @param previous whether to keep the file being replaced as {@code NAME.bak}
     * @param content what to write
     * @throws IOException if it cannot be written; the target and its backup are then as they were
     */
    public static void write(Path target, Previous previous, Content content) throws IOException {
        writeFile(target, previous, tmp -> {
            try (OutputStream out = new BufferedOutputStream(
                    Files.newOutputStream(tmp, StandardOpenOption.CREATE_NEW, StandardOpenOption.WRITE))) {
                content.writeTo(out);
            }
        });
    }

    /**
     * Writes a file through a library that wants a file name.
     *
     * @param target the file
     * @param previous whether to keep the file being replaced as {@code NAME.bak}
     * @param content creates and fills the temporary file it is given
     * @throws IOException if it cannot be written, or the content made no file; the target and its
     *         backup are then as they were
     */
    public static void writeFile(Path target, Previous previous, FileContent content) throws IOException {
        Path abs = target.toAbsolutePath();
        Path tmp = reserveTemporary(abs);
        try {
            content.writeTo(tmp);
            if (!Files.isRegularFile(tmp, LinkOption.NOFOLLOW_LINKS)) {
                throw new IOException("nothing was written for " + abs.getFileName());
            }
            force(tmp);
            setPermissions(tmp, permissionsFor(abs));
            if (previous == Previous.KEEP_AS_BAK && Files.isRegularFile(abs)) {
                keepBackup(abs);
            }
            rename(tmp, abs);
            forceDirectory(abs.getParent());
        } finally {
            Files.deleteIfExists(tmp);
        }
    }

    /**
     * The backup kept by {@link Previous#KEEP_AS_BAK}.
     *
     * @param path a file
     * @return its backup's path ({@code NAME.bak} beside it)
     */
    public static Path backupOf(Path path) {
        return path.resolveSibling(path.getFileName() + ".bak");
    }

    /** A unique, not yet existing name in the target's directory. */
    private static Path reserveTemporary(Path abs) throws IOException {
        Path tmp = Files.createTempFile(abs.getParent(), "." + abs.getFileName() + ".", ".tmp");
        // createTempFile made the name unique; the content makes the file (libraries that write by
        // name, such as the GeoPackage one, refuse an existing file).
        Files.delete(tmp);
        return tmp;
    }

    private static void keepBackup(Path abs) throws IOException {
        Path bak = backupOf(abs);
        Path bakTmp = reserveTemporary(bak);
        try {
            Files.copy(abs, bakTmp, StandardCopyOption.COPY_ATTRIBUTES);
            force(bakTmp);
            rename(bakTmp, bak);
        } finally {
            Files.deleteIfExists(bakTmp);
        }
    }

    private static Set<PosixFilePermission> permissionsFor(Path abs) throws IOException {
        if (Files.isRegularFile(abs) && Files.getFileAttributeView(abs, PosixFileAttributeView.class) != null) {
            return Files.getPosixFilePermissions(abs);
        }
        return NEW_FILE_PERMISSIONS;
    }

    private static void setPermissions(Path tmp, Set<PosixFilePermission> perms) throws IOException {
        if (Files.getFileAttributeView(tmp, PosixFileAttributeView.class) != null) {
            Files.setPosixFilePermissions(tmp, perms);
        }
    }

    private static void force(Path file) throws IOException {
        try (FileChannel ch = FileChannel.open(file, StandardOpenOption.WRITE)) {
            ch.force(true);
        }
    }

    /** Makes the rename itself durable where the platform allows a directory to be forced (Linux does). */
    private static void forceDirectory(Path dir) {
        try (FileChannel ch = FileChannel.open(dir, StandardOpenOption.READ)) {
            ch.force(true);
        } catch (IOException | UnsupportedOperationException e) {
            // Not every platform opens a directory as a channel (Windows does not); the file is whole either way.
        }
    }

    private static void rename(Path from, Path to) throws IOException {
        try {
            Files.move(from, to, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
        } catch (AtomicMoveNotSupportedException e) {
            LOG.log(System.Logger.Level.WARNING, "the file system of {0} refuses an atomic rename: {1} was replaced"
                    + " in place (complete, but a crash during the replace could leave it missing)",
                    to.getParent(), to.getFileName());
            Files.move(from, to, StandardCopyOption.REPLACE_EXISTING);
        }
    }
}
