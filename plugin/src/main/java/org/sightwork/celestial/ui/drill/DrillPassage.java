package org.sightwork.celestial.ui.drill;

import java.io.IOException;
import java.io.StringReader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.time.ZoneOffset;
import java.time.format.DateTimeFormatter;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.TreeMap;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.sightwork.celestial.drill.AnswerKey;
import org.sightwork.celestial.drill.SightLogCsv;
import org.sightwork.celestial.io.Session;
import org.sightwork.celestial.io.SessionFile;
import org.sightwork.celestial.io.SightLog;
import org.sightwork.celestial.io.SightLogReader;
import org.sightwork.celestial.sight.Limb;
import org.sightwork.celestial.sight.Sight;
import org.sightwork.geo.earth.Angles;
import org.sightwork.geo.earth.GeoPosition;
import org.sightwork.geo.track.DrLog;
import org.sightwork.geo.track.ImportResult;

/**
 * Turns a student pack (the sight log and the deck log) into a passage file of the celestial
 * plugin, which the plugin then opens as any passage: the sights are worked, the DR is drawn, the
 * sights of each fix asked for share a fix name. No GPS track is named: the GPS is withheld.
 *
 * <p>The passage file is the plugin's session file ({@link SessionFile}); the editor's cells go
 * into its {@code settings} under the keys the plugin writes for every passage it saves
 * ({@code passage.day}, {@code log.rows}, {@code row.NNN.COLUMN}, {@code dr.log.csv}), so the
 * drill opens exactly as a passage saved by the editor. {@code DrillPassageTest} opens the file
 * through the plugin's own reader and checks every cell.
 *
 * <p>The watch time stays in the sight log's time column, as the observer wrote it. The watch
 * error is filled in only from the answer key's "UTC as worked" (the watch error the exercise sheet
 * gives, nothing more); without the key the cell stays blank and a note says to type it in from the
 * sheet.
 *
 * <p><b>Thread safety:</b> stateless; runs on a worker thread.
 */
public final class DrillPassage {

    /**
     * The note the pack writes on each sight: "sight N; WHAT IT IS; fix SESSION" ({@link SightLogCsv});
     * group 2 is the fix the sight belongs to (packs made before the description was added wrote
     * "sight N; SESSION", which the second alternative reads).
     */
    private static final Pattern NOTE = Pattern.compile("sight\\s+(\\d+);(?:.*;\\s*fix\\s+(.*)|\\s*([^;]*))");
    private static final DateTimeFormatter CELL_TIME = DateTimeFormatter.ofPattern("yyyy-MM-dd HH:mm:ss", Locale.ROOT)
            .withZone(ZoneOffset.UTC);

    private DrillPassage() {
    }

    /**
     * What was written.
     *
     * @param file the passage file
     * @param sights the sights in it
     * @param fixes the fix names used (one per fix asked for)
     * @param drLog whether the DR log went in
     * @param watchErrorFilled whether the watch error was filled in from the key
     * @param firstDr the DR of the first sight, if written (where the chart's drill banner goes)
     * @param notes problems of the student's files (file, line, column, what was expected), and
     *     what the user must do by hand
     */
    public record Written(Path file, int sights, List<String> fixes, boolean drLog, boolean watchErrorFilled,
            Optional<GeoPosition> firstDr, List<String> notes) {
        /** Copies the lists. */
        public Written {
            fixes = List.copyOf(fixes);
            notes = List.copyOf(notes);
        }
    }

    /**
     * Writes the drill's passage file (through a temporary file and a rename; an older copy is
     * kept as {@code .bak}).
     *
     * @param files the drill's files
     * @param key the answer key, when the instructor's directory was opened
     * @param target the passage file to write
     * @return what was written
     * @throws IOException if a file cannot be read or the passage written
     * @throws IllegalArgumentException if the sight log holds no readable sight
     */
    public static Written write(DrillFiles files, Optional<AnswerKey> key, Path target) throws IOException {
        List<String> notes = new ArrayList<>();
        SightLog log = SightLogReader.read(files.sightLog());
        log.problems().forEach(p -> notes.add(files.sightLog().getParent().getFileName() + "/" + p));
        if (log.sights().isEmpty()) {
            throw new IllegalArgumentException(files.sightLog() + ": no sight could be read"
                    + (notes.isEmpty() ? "" : ": " + notes.get(0)));
        }
        Map<String, String> settings = new TreeMap<>();
        List<Session.SessionSight> sessionSights = new ArrayList<>();
        Map<Integer, AnswerKey.SightKey> keyed = new HashMap<>();
        key.ifPresent(k -> k.sights().forEach(s -> keyed.put(s.number(), s)));
        Map<Integer, String> fixOf = fixNames(log, key);
        boolean watchFilled = false;
        for (int i = 0; i < log.sights().size(); i++) {
            Sight s = log.sights().get(i);
            int number = number(s, i);
            Map<String, String> cells = new LinkedHashMap<>();
            cells.put("BODY", s.body());
            cells.put("LIMB", s.limb() == Limb.LOWER ? "LL" : s.limb() == Limb.UPPER ? "UL" : "");
            cells.put("TIME", CELL_TIME.format(s.watchTime()));
            double fastS = s.watchFastSeconds();
            AnswerKey.SightKey k = keyed.get(number);
            if (k != null) {
                fastS = Duration.between(k.utcAsWorked(), s.watchTime()).toMillis() / 1000.0;
                watchFilled = true;
            }
            if (fastS != 0) {
                cells.put("WATCH_FAST", String.format(Locale.ROOT, "%.0f", fastS));
            }
            cells.put("HS", Angles.formatDm(s.hsDeg(), 2));
            cells.put("INDEX", SightLogCsv.indexError(-s.indexError().correctionArcmin()));
            cells.put("EYE", String.format(Locale.ROOT, "%.1f", s.eyeHeightM()));
            cells.put("TEMPERATURE", String.format(Locale.ROOT, "%.1f", s.temperatureC()));
            cells.put("PRESSURE", String.format(Locale.ROOT, "%.1f", s.pressureHpa()));
            s.dr().ifPresent(d -> cells.put("DR", Angles.formatLatitude(d.latDeg()) + " "
                    + Angles.formatLongitude(d.lonDeg())));
            cells.put("FIX", fixOf.getOrDefault(number, ""));
            for (Map.Entry<String, String> c : cells.entrySet()) {
                if (!c.getValue().isEmpty()) {
                    settings.put(String.format(Locale.ROOT, "row.%03d.%s", i, c.getKey()), c.getValue());
                }
            }
            Sight worked = s.toBuilder().watchFastSeconds(fastS).build();
            Session.SessionSight ss = Session.SessionSight.of(worked);
            sessionSights.add(new Session.SessionSight(ss.utc(), ss.body(), ss.limb(), ss.hsDeg(),
                    ss.indexErrorArcmin(), ss.eyeHeightM(), ss.temperatureC(), ss.pressureHpa(), ss.drLatDeg(),
                    ss.drLonDeg(), ss.sigmaArcmin(), fixOf.getOrDefault(number, "")));
        }
        if (!watchFilled) {
            notes.add("The watch error is on the exercise sheet: type it into the sight log's W.E. column "
                    + "(seconds fast) before trusting the fixes");
        }
        settings.put("passage.day", log.sights().get(0).watchTime().atZone(ZoneOffset.UTC).toLocalDate().toString());
        settings.put("log.rows", Integer.toString(log.sights().size()));
        boolean dr = false;
        List<Session.DrLeg> legs = new ArrayList<>();
        if (files.drLog().isPresent()) {
            String text = Files.readString(files.drLog().get(), StandardCharsets.UTF_8);
            ImportResult<Optional<DrLog>> r = DrLog.read(new StringReader(text), files.drLog().get().toString());
            r.problems().forEach(p -> notes.add(p.toString()));
            if (r.value().isPresent()) {
                settings.put("dr.log.csv", text);
                r.value().get().legs().forEach(l -> legs.add(new Session.DrLeg(l.start().toString(),
                        l.waterTrackDeg(), l.stwKn())));
                dr = true;
            }
        } else {
            notes.add("The pack has no DR log (" + DrillFiles.DR_LOG + "): the DR written in the sight log is used");
        }
        String title = key.map(AnswerKey::title).orElse("Drill " + files.name()) + " (drill: GPS withheld)";
        Files.createDirectories(target.toAbsolutePath().getParent());
        SessionFile.save(new Session(SessionFile.FORMAT_VERSION, title, sessionSights, legs, null, List.of(), settings),
                target);
        List<String> fixes = fixOf.values().stream().distinct().sorted().toList();
        return new Written(target, log.sights().size(), fixes, dr, watchFilled,
                log.sights().stream().flatMap(x -> x.dr().stream()).findFirst(), notes);
    }

    /** The sight's number in the log: from the pack's note, else its place. */
    private static int number(Sight s, int index) {
        Matcher m = NOTE.matcher(s.note().strip());
        return m.matches() ? Integer.parseInt(m.group(1)) : index + 1;
    }

    /**
     * The fix name of each sight (by number): the key's fixes when there is a key (each fix asked
     * for names its sights), else the session written in the note, for sessions of two or more.
     */
    private static Map<Integer, String> fixNames(SightLog log, Optional<AnswerKey> key) {
        Map<Integer, String> names = new HashMap<>();
        if (key.isPresent()) {
            for (AnswerKey.FixKey f : key.get().fixes()) {
                f.sightNumbers().forEach(n -> names.put(n, f.session()));
            }
            return names;
        }
        Map<String, List<Integer>> bySession = new LinkedHashMap<>();
        for (int i = 0; i < log.sights().size(); i++) {
            Matcher m = NOTE.matcher(log.sights().get(i).note().strip());
            String session = m.matches() ? (m.group(2) != null ? m.group(2) : m.group(3)) : null;
            if (session != null && !session.isBlank()) {
                bySession.computeIfAbsent(session.strip(), s -> new ArrayList<>()).add(Integer.parseInt(m.group(1)));
            }
        }
        bySession.forEach((s, ns) -> {
            if (ns.size() >= 2) {
                ns.forEach(n -> names.put(n, s));
            }
        });
        return names;
    }

    /**
     * The passage file of a drill in the user's directory.
     *
     * @param userDirectory {@code ~/.sightwork}
     * @param files the drill's files
     * @return {@code ~/.sightwork/celestial/drill/NAME.json}
     */
    public static Path target(Path userDirectory, DrillFiles files) {
        String safe = files.name().replaceAll("[^A-Za-z0-9._-]+", "-");
        return userDirectory.resolve("celestial").resolve("drill").resolve(safe + ".json");
    }
}
