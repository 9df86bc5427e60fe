package org.sightwork.celestial.drill;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.sightwork.geo.files.SafeWrite;

/**
 * Writes a drill to a folder: {@code student/} (hand this out) and {@code key/} (keep this).
 *
 * <pre>
 * student/sight-log.csv         the sights as the observer wrote them
 * student/dr-log.csv            the deck log (when given)
 * student/exercise.pdf          the printable exercise sheet
 * student/answers-template.csv  the form of the answers to hand in
 * key/answer-key.json           the answer key, for 'drill grade'
 * key/true-track.nmea           the true track (the withheld GPS), NMEA 0183 RMC + GGA
 * </pre>
 *
 * Every file is written through a temporary file and a rename; an existing file is never
 * overwritten unless asked.
 */
public final class DrillPackWriter {

    private DrillPackWriter() {
    }

    /**
     * The files of a pack, by path relative to the folder, in writing order.
     *
     * @param pack the drill
     * @return the contents
     */
    public static Map<String, byte[]> files(DrillPack pack) {
        Map<String, byte[]> f = new LinkedHashMap<>();
        Scenario sc = pack.scenario();
        f.put("student/sight-log.csv", utf8(SightLogCsv.csv(pack.sights(), sc.observer(),
                sc.gives(Scenario.Given.INDEX_ERROR))));
        if (sc.gives(Scenario.Given.DR_LOG)) {
            f.put("student/dr-log.csv", utf8(pack.deckLog().csv()));
        }
        f.put("student/exercise.pdf", ExerciseSheet.pdf(pack));
        f.put("student/answers-template.csv", utf8(answersTemplate(pack)));
        f.put("key/answer-key.json", utf8(AnswerKeyIo.toJson(pack.key())));
        f.put("key/true-track.nmea", utf8(String.join("\r\n", pack.truthNmea()) + "\r\n"));
        return f;
    }

    /**
     * Writes the pack.
     *
     * @param pack the drill
     * @param dir the folder (made if missing)
     * @param overwrite whether existing files may be replaced
     * @return the files written
     * @throws DrillException if a file exists and overwriting was not asked
     * @throws IOException if a file cannot be written (that file is then as it was)
     */
    public static List<Path> write(DrillPack pack, Path dir, boolean overwrite) throws IOException {
        Map<String, byte[]> files = files(pack);
        if (!overwrite) {
            List<String> exist = new ArrayList<>();
            for (String name : files.keySet()) {
                if (Files.exists(dir.resolve(name))) {
                    exist.add(dir.resolve(name) + " exists: choose another --out folder, or --force to replace it");
                }
            }
            if (!exist.isEmpty()) {
                throw new DrillException(exist);
            }
        }
        List<Path> written = new ArrayList<>();
        for (Map.Entry<String, byte[]> e : files.entrySet()) {
            Path p = dir.resolve(e.getKey());
            Files.createDirectories(p.getParent());
            SafeWrite.write(p, out -> out.write(e.getValue()));
            written.add(p);
        }
        return written;
    }

    /**
     * @param pack the drill
     * @return an answers file with one fix line per fix asked for and one sight line per sight, empty
     */
    static String answersTemplate(DrillPack pack) {
        StringBuilder b = new StringBuilder("# student: (your name)\n");
        b.append("# Fill in lat and lon of each fix (d°m.m′ with N/S, E/W), and for each sight Ho and the\n");
        b.append("# intercept in nm (+ or T toward, - or A away). Leave out what you did not work.\n");
        b.append(StudentAnswers.HEADER).append('\n');
        for (AnswerKey.FixKey f : pack.key().fixes()) {
            b.append("fix,").append(f.session().contains(",") ? "" : f.session()).append(',').append(f.utc())
                    .append(",,,,\n");
        }
        for (LoggedSight s : pack.sights()) {
            b.append("sight,").append(s.number()).append(",,,,,\n");
        }
        return b.toString();
    }

    private static byte[] utf8(String s) {
        return s.getBytes(StandardCharsets.UTF_8);
    }
}
