package org.sightwork.bench;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.sightwork.geo.track.CsvTrackIo;
import org.sightwork.geo.track.ImportResult;
import org.sightwork.geo.track.NmeaTrackReader;
import org.sightwork.geo.track.Track;

/**
 * Whole-process import of a big NMEA log, for {@code hyperfine} against gpsbabel
 * (docs/PERFORMANCE.md): {@code generate FILE DAYS} writes a log of DAYS days at 1 Hz;
 * {@code import FILE [OUT.csv]} reads it (and writes our CSV) and prints the number of fixes.
 */
public final class NmeaImportMain {

    private NmeaImportMain() {
    }

    /**
     * @param args see the class comment
     * @throws IOException if a file cannot be read or written
     */
    public static void main(String[] args) throws IOException {
        if (args[0].equals("generate")) {
            NmeaLogs.toFile(Path.of(args[1]), Integer.parseInt(args[2]) * 86_400);
            System.out.println(Files.size(Path.of(args[1])) + " bytes");
            return;
        }
        long t0 = System.nanoTime();
        ImportResult<Track> r = NmeaTrackReader.read(Path.of(args[1]), NmeaTrackReader.Options.DEFAULT);
        long t1 = System.nanoTime();
        if (args.length > 2) {
            CsvTrackIo.write(Path.of(args[2]), r.value());
        }
        Runtime rt = Runtime.getRuntime();
        System.out.printf("%d fixes, %d problems, import %.2f s, heap used %d MB%n", r.value().size(), r.problemCount(),
                (t1 - t0) / 1e9, (rt.totalMemory() - rt.freeMemory()) >> 20);
    }
}
