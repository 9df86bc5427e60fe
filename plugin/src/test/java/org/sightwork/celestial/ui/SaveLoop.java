package org.sightwork.celestial.ui;

import java.nio.file.Path;
import java.time.LocalDate;
import java.util.Locale;

/**
 * For {@link KillDuringSaveTest}, run in a child JVM: saves a large passage over and over through
 * the editor's real path ({@link PassageFiles#save}, hence {@code SessionFile.save}), each version
 * titled with its number, and prints {@code saved N} after each save returns, until killed.
 *
 * <p>Arguments: the passage file, the number of sight rows.
 */
public final class SaveLoop {

    /** Title of version N. */
    static String title(long n) {
        return "Load test passage, save " + n;
    }

    /** A passage of the given number of rows, every cell filled (invented values, only for size). */
    static Passage large(int rows, long n) {
        Passage p = new Passage(title(n), LocalDate.of(2026, 6, 21));
        for (int i = 0; i < rows; i++) {
            SightRow r = new SightRow();
            r.set(SightColumn.BODY, i % 2 == 0 ? "Sun" : "Vega");
            r.set(SightColumn.LIMB, i % 2 == 0 ? "LL" : "");
            r.set(SightColumn.TIME, String.format(Locale.ROOT, "2026-06-21 %02d:%02d:%02d", 8 + i % 12, i % 60, (i * 7) % 60));
            r.set(SightColumn.WATCH_FAST, "0");
            r.set(SightColumn.HS, String.format(Locale.ROOT, "%d°%04.1f'", 20 + i % 50, (i * 0.7) % 60));
            r.set(SightColumn.INDEX, "+1.5");
            r.set(SightColumn.EYE, "2.4");
            r.set(SightColumn.TEMPERATURE, "19");
            r.set(SightColumn.PRESSURE, "1022");
            r.set(SightColumn.DR, "38°10.0'N 027°30.0'W");
            r.set(SightColumn.FIX, "group " + (i / 4));
            p.rows().add(r);
        }
        return p;
    }

    public static void main(String[] args) throws Exception {
        Path file = Path.of(args[0]);
        int rows = Integer.parseInt(args[1]);
        for (long n = 1; ; n++) {
            PassageFiles.save(large(rows, n), Plot.EMPTY, file);
            System.out.println("saved " + n);
            System.out.flush();
        }
    }

    private SaveLoop() {
    }
}
