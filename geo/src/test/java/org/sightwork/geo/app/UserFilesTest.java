package org.sightwork.geo.app;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;

import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The settings file: remembered, and written without leaving temporary files. */
class UserFilesTest {

    @Test
    void remembersAndWritesAtomically(@TempDir Path tmp) throws Exception {
        UserFiles u = new UserFiles(tmp.resolve("sub"));
        assertNull(u.get("caution.shown"), "nothing before the first start");
        u.put("caution.shown", "true");
        u.put("palette", "NIGHT");
        UserFiles again = new UserFiles(tmp.resolve("sub"));
        assertEquals("true", again.get("caution.shown"), "remembered");
        assertEquals("NIGHT", again.get("palette"), "second key kept");
        try (var files = Files.list(tmp.resolve("sub"))) {
            assertEquals(1, files.count(), "only the settings file, no temporary left");
        }
    }
}
