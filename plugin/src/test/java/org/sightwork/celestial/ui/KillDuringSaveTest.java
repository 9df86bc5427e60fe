package org.sightwork.celestial.ui;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.BufferedReader;
import java.io.InputStreamReader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.FileTime;
import java.time.Instant;
import java.util.List;
import java.util.Random;
import java.util.concurrent.atomic.AtomicLong;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.sightwork.celestial.io.SessionFile;

/**
 * Fault injection: a child JVM saves a large passage over and over through the editor's real path
 * and is killed ({@code destroyForcibly}, SIGKILL) at random moments, several times. After each
 * kill the passage file on disk must be a whole version, the last one the child reported saved or
 * the one it was writing, that opens with every row; its backup, when there is one, must open too;
 * leftover temporary files must not be taken for the passage, and the next save clears them.
 *
 * <p>The moments are random (fixed seed) over a span longer than one save, so that kills land in
 * every phase: writing the temporary file, forcing it to disk, copying the backup, renaming.
 */
class KillDuringSaveTest {

    /** Rows in the test passage: about 1 MB of JSON, a fraction of a second to a second a save here. */
    static final int ROWS = 1500;
    static final int KILLS = 5;
    static final long SEED = 5;

    @Test
    void aKillDuringSaveLeavesAWholeVersion(@TempDir Path dir) throws Exception {
        Path file = dir.resolve("passage.json");
        Random rnd = new Random(SEED);
        String java = Path.of(System.getProperty("java.home"), "bin", "java").toString();
        long lastSeen = 0;
        for (int k = 0; k < KILLS; k++) {
            Process p = new ProcessBuilder(java, "-Xmx512m", "-cp", System.getProperty("java.class.path"),
                    SaveLoop.class.getName(), file.toString(), Integer.toString(ROWS))
                    .redirectError(ProcessBuilder.Redirect.DISCARD).start();
            AtomicLong saved = new AtomicLong();
            long[] savedAtNs = new long[3];
            Thread reader = new Thread(() -> {
                try (BufferedReader r = new BufferedReader(new InputStreamReader(p.getInputStream(), StandardCharsets.UTF_8))) {
                    for (String line; (line = r.readLine()) != null; ) {
                        if (line.startsWith("saved ")) {
                            long n = Long.parseLong(line.substring(6).trim());
                            if (n <= 2) {
                                savedAtNs[(int) n] = System.nanoTime();
                            }
                            saved.set(n);
                        }
                    }
                } catch (Exception e) {
                    // the pipe closes when the child dies
                }
            });
            reader.start();
            long deadline = System.nanoTime() + 60_000_000_000L;
            while (saved.get() < 2 && System.nanoTime() < deadline) {
                Thread.sleep(5);
            }
            assertTrue(saved.get() >= 2, "the child saved twice within 60 s");
            // a moment anywhere in the next save or a little after: 0 to 1.2 times one save's duration
            long saveMs = Math.max(1, (savedAtNs[2] - savedAtNs[1]) / 1_000_000);
            long delayMs = (long) (rnd.nextDouble() * 1.2 * saveMs);
            Thread.sleep(delayMs);
            long before = saved.get();
            p.destroyForcibly();
            p.waitFor();
            reader.join(5000);
            long reported = saved.get();
            lastSeen = reported;
            System.out.printf("kill %d: one save %d ms, killed %d ms after save 2, %d reported saved%n", k, saveMs,
                    delayMs, reported);

            SessionFile.Opened o = SessionFile.open(file);
            assertTrue(o.session().isPresent(), "kill " + k + ": the file opens: " + o.message());
            assertFalse(o.readOnly(), "kill " + k + ": opened normally, not from the backup: " + o.message());
            String name = o.session().get().name();
            assertTrue(name.equals(SaveLoop.title(reported)) || name.equals(SaveLoop.title(reported + 1)),
                    "kill " + k + ": the version on disk (" + name + ") is the last reported saved (" + reported
                            + ") or the one being written (reported before the kill: " + before + ")");
            PassageFiles.Opened po = PassageFiles.open(file);
            assertEquals(ROWS, po.passage().orElseThrow().rows().size(), "kill " + k + ": every row is there");
            assertEquals(SaveLoop.large(ROWS, 1).rows().get(ROWS - 1).cells(),
                    po.passage().get().rows().get(ROWS - 1).cells(), "kill " + k + ": the last row whole");
            Path bak = SessionFile.backupOf(file);
            if (Files.exists(bak)) {
                SessionFile.Opened b = SessionFile.open(bak);
                assertTrue(b.session().isPresent() && b.message().isEmpty(), "kill " + k + ": the backup opens: " + b.message());
            }
        }
        assertTrue(lastSeen >= 2, "saves were made");

        // Leftover temporary files (a write cut off by a kill) are not the passage; the next save
        // removes those of a writer that is gone (older than a minute).
        Path leftover = dir.resolve("." + file.getFileName() + ".123456789.tmp");
        Files.writeString(leftover, "{\"formatVersion\": 1, \"name\": \"cut o");
        Files.setLastModifiedTime(leftover, FileTime.from(Instant.now().minusSeconds(600)));
        Path fresh = dir.resolve("." + file.getFileName() + ".987654321.tmp");
        Files.writeString(fresh, "{");
        assertTrue(PassageFiles.open(file).passage().isPresent(), "the passage opens beside a leftover");
        PassageFiles.save(SaveLoop.large(10, 99), Plot.EMPTY, file);
        assertFalse(Files.exists(leftover), "a stale temporary file is removed by the next save");
        assertTrue(Files.exists(fresh), "a fresh one (another writer's, maybe) is left alone");
        try (Stream<Path> s = Files.list(dir)) {
            List<String> names = s.map(x -> x.getFileName().toString()).sorted().toList();
            assertTrue(names.stream().filter(n -> n.endsWith(".tmp")).count() <= 1 + KILLS,
                    "temporary files: " + names);
        }
        assertEquals(SaveLoop.title(99), SessionFile.open(file).session().orElseThrow().name(), "the new save");
    }
}
