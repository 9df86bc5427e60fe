package org.sightwork.geo.files;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.PosixFileAttributeView;
import java.nio.file.attribute.PosixFilePermissions;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The safe writer's contract (package-info): whole files, permissions, backups, clean failure.
 * The expected permission strings are those the contract names (0644 for a new file), so a
 * writer that left {@code Files.createTempFile}'s 0600 fails here.
 */
class SafeWriteTest {

    @TempDir
    Path dir;

    private static byte[] utf8(String s) {
        return s.getBytes(StandardCharsets.UTF_8);
    }

    private List<String> names() throws IOException {
        try (Stream<Path> s = Files.list(dir)) {
            return s.map(p -> p.getFileName().toString()).sorted().toList();
        }
    }

    private boolean posix() {
        return Files.getFileAttributeView(dir, PosixFileAttributeView.class) != null;
    }

    @Test
    void writesTheWholeContentAndLeavesNoTemporaryFile() throws IOException {
        Path f = dir.resolve("log.csv");
        byte[] big = new byte[300_000]; // larger than any stream buffer, so several writes
        for (int i = 0; i < big.length; i++) {
            big[i] = (byte) (i * 31);
        }
        SafeWrite.write(f, out -> out.write(big));
        assertArrayEquals(big, Files.readAllBytes(f), "content");
        assertEquals(List.of("log.csv"), names(), "files in the folder");
    }

    @Test
    void aNewFileIsReadableByOthers() throws IOException {
        assumeTrue(posix(), "POSIX permissions");
        Path f = dir.resolve("sight-log.csv");
        SafeWrite.write(f, out -> out.write(utf8("a\n")));
        assertEquals("rw-r--r--", PosixFilePermissions.toString(Files.getPosixFilePermissions(f)), "new file");
    }

    @Test
    void aReplacedFileKeepsItsPermissions() throws IOException {
        assumeTrue(posix(), "POSIX permissions");
        Path f = dir.resolve("private.json");
        Files.writeString(f, "old");
        Files.setPosixFilePermissions(f, PosixFilePermissions.fromString("rw-r-----"));
        SafeWrite.write(f, out -> out.write(utf8("new")));
        assertEquals("new", Files.readString(f), "content");
        assertEquals("rw-r-----", PosixFilePermissions.toString(Files.getPosixFilePermissions(f)), "kept");
    }

    @Test
    void keepsThePreviousVersionAsBak() throws IOException {
        Path f = dir.resolve("passage.sightwork");
        SafeWrite.write(f, SafeWrite.Previous.KEEP_AS_BAK, out -> out.write(utf8("first")));
        assertEquals(List.of("passage.sightwork"), names(), "no backup of a file that did not exist");
        SafeWrite.write(f, SafeWrite.Previous.KEEP_AS_BAK, out -> out.write(utf8("second")));
        SafeWrite.write(f, SafeWrite.Previous.KEEP_AS_BAK, out -> out.write(utf8("third")));
        assertEquals("third", Files.readString(f), "current");
        assertEquals("second", Files.readString(SafeWrite.backupOf(f)), "backup is the version before");
        assertEquals(List.of("passage.sightwork", "passage.sightwork.bak"), names(), "files in the folder");
    }

    @Test
    void discardDoesNotTouchAnOldBackup() throws IOException {
        Path f = dir.resolve("a.txt");
        Files.writeString(SafeWrite.backupOf(f), "older");
        Files.writeString(f, "old");
        SafeWrite.write(f, out -> out.write(utf8("new")));
        assertEquals("older", Files.readString(SafeWrite.backupOf(f)), "backup");
    }

    @Test
    void aFailingWriteLeavesTargetAndBackupAsTheyWere() throws IOException {
        Path f = dir.resolve("passage.sightwork");
        Files.writeString(f, "current");
        Files.writeString(SafeWrite.backupOf(f), "backup");
        IOException e = assertThrows(IOException.class, () -> SafeWrite.write(f, SafeWrite.Previous.KEEP_AS_BAK, out -> {
            out.write(utf8("half a fi"));
            throw new IOException("disk full");
        }));
        assertEquals("disk full", e.getMessage(), "the cause goes through");
        assertEquals("current", Files.readString(f), "target");
        assertEquals("backup", Files.readString(SafeWrite.backupOf(f)), "backup");
        assertEquals(List.of("passage.sightwork", "passage.sightwork.bak"), names(), "no temporary file left");
    }

    @Test
    void aRuntimeFailureAlsoCleansUp() throws IOException {
        Path f = dir.resolve("x.csv");
        assertThrows(IllegalStateException.class, () -> SafeWrite.write(f, out -> {
            out.write(1);
            throw new IllegalStateException("bug");
        }));
        assertEquals(List.of(), names(), "neither target nor temporary file");
    }

    @Test
    void writeFileHandsANotYetExistingNameInTheSameFolder() throws IOException {
        Path f = dir.resolve("plot.gpkg");
        Path[] seen = new Path[1];
        SafeWrite.writeFile(f, SafeWrite.Previous.DISCARD, tmp -> {
            seen[0] = tmp;
            assertFalse(Files.exists(tmp), "not yet existing");
            Files.writeString(tmp, "db");
        });
        assertEquals(f.toAbsolutePath().getParent(), seen[0].getParent(), "same folder");
        assertEquals("db", Files.readString(f), "content");
        assertEquals(List.of("plot.gpkg"), names(), "files in the folder");
    }

    @Test
    void writeFileThatWritesNothingIsAnError() throws IOException {
        Path f = dir.resolve("plot.gpkg");
        Files.writeString(f, "old");
        IOException e = assertThrows(IOException.class, () -> SafeWrite.writeFile(f, SafeWrite.Previous.DISCARD, tmp -> { }));
        assertTrue(e.getMessage().contains("plot.gpkg"), e.getMessage());
        assertEquals("old", Files.readString(f), "target");
    }

    @Test
    void aMissingFolderIsAnErrorNotAFolderMadeBehindTheUsersBack() {
        Path f = dir.resolve("no-such-folder/a.txt");
        assertThrows(IOException.class, () -> SafeWrite.write(f, out -> out.write(1)));
        assertFalse(Files.exists(f.getParent()), "folder not made");
    }
}
