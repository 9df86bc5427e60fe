package org.sightwork.celestial.ui;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Optional;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.sightwork.celestial.drill.AnswerKey;
import org.sightwork.celestial.drill.AnswerKeyIo;
import org.sightwork.celestial.fix.FixOptions;
import org.sightwork.celestial.reduction.SightReducer;
import org.sightwork.celestial.ui.drill.DrillFiles;
import org.sightwork.celestial.ui.drill.DrillPacks;
import org.sightwork.celestial.ui.drill.DrillPassage;
import org.sightwork.geo.earth.GeoPosition;
import org.sightwork.geo.earth.Sailings;

/**
 * The drill's passage, opened through the plugin's own passage reader: every sight of the pack is
 * a row, the sights of each fix asked for share its name, the DR log is there and no GPS is. Worked
 * by the plugin's plot, each fix lands on the answer key's fix (made by the drill generator's own
 * working, independently of the plugin's plot) within the rubric's full-marks distance.
 */
class DrillPassageTest {

    /** A navigator working the pack without a mistake earns full marks: within 1.0 nm of the key (docs/DRILLS.md). */
    static final double FULL_MARKS_NM = AnswerKey.Tolerances.STANDARD.fixFullMarksNm();

    @TempDir
    static Path tmp;
    static Path pack;
    static AnswerKey key;

    @BeforeAll
    static void makePack() throws Exception {
        pack = DrillPacks.demo(Files.createDirectories(tmp.resolve("petrel")));
        key = AnswerKeyIo.read(pack.resolve("key/answer-key.json"));
    }

    @Test
    void theInstructorsPackOpensAsAPassageAndWorksToTheKeysFixes() throws Exception {
        DrillFiles files = DrillFiles.locate(pack);
        assertTrue(files.isInstructorsCopy(), "key and true track found");
        DrillPassage.Written w = DrillPassage.write(files, Optional.of(key), tmp.resolve("user/drill.json"));
        assertTrue(w.watchErrorFilled(), "the watch error given on the sheet is filled in from the key");
        PassageFiles.Opened o = PassageFiles.open(w.file());
        assertTrue(o.passage().isPresent(), "opens: " + o.message());
        Passage p = o.passage().get();
        assertEquals(key.sights().size(), p.rows().size(), "one row per sight of the log");
        assertTrue(p.gps().isEmpty() && p.gpsFile().isEmpty(), "the GPS is withheld");
        assertTrue(p.drLog().isPresent(), "the deck log is the passage's DR log");
        for (AnswerKey.SightKey s : key.sights()) {
            SightRow row = p.rows().get(s.number() - 1);
            boolean inFix = key.fixes().stream().anyMatch(f -> f.sightNumbers().contains(s.number()));
            assertEquals(inFix ? s.session() : "", row.get(SightColumn.FIX), "fix name of sight " + s.number());
            assertEquals(s.body(), row.get(SightColumn.BODY), "body of sight " + s.number());
        }
        Plot plot = new PlotComputer(SightReducer.standard(), FixOptions.DEFAULTS).compute(p);
        assertEquals(key.fixes().size(), plot.fixes().size(), "one plot fix per fix asked for");
        for (AnswerKey.FixKey k : key.fixes()) {
            Plot.FixResult f = plot.fixes().stream().filter(x -> x.name().equals(k.session())).findFirst().orElseThrow();
            assertTrue(f.fix().isPresent(), k.session() + " worked: " + f.problem());
            double d = Sailings.rhumbLine(f.fix().get().position(), GeoPosition.of(k.fix().latDeg(), k.fix().lonDeg()))
                    .distanceNm();
            assertEquals(0.0, d, FULL_MARKS_NM, "plugin's fix vs the key's fix (nm), " + k.session());
        }
    }

    @Test
    void aStudentPackOpensWithTheWatchErrorLeftToTheStudent() throws Exception {
        DrillFiles files = DrillFiles.locate(pack.resolve("student"));
        DrillPassage.Written w = DrillPassage.write(files, Optional.empty(), tmp.resolve("user/student.json"));
        assertTrue(!w.watchErrorFilled() && w.notes().stream().anyMatch(n -> n.contains("watch error")),
                "says the watch error is to be typed in: " + w.notes());
        Passage p = PassageFiles.open(w.file()).passage().orElseThrow();
        assertEquals(key.sights().size(), p.rows().size(), "one row per sight");
        assertTrue(p.rows().stream().allMatch(r -> r.get(SightColumn.WATCH_FAST).isEmpty()), "watch error blank");
        assertEquals(key.fixes().size(), p.rows().stream().map(r -> r.get(SightColumn.FIX)).filter(s -> !s.isEmpty())
                .distinct().count(), "the sessions of two sights or more are the fixes");
    }

    @Test
    void aDirectoryWithoutASightLogIsRefusedWithWhatWasExpected() throws Exception {
        Path empty = Files.createDirectories(tmp.resolve("empty"));
        IllegalArgumentException e = org.junit.jupiter.api.Assertions.assertThrows(IllegalArgumentException.class,
                () -> DrillFiles.locate(empty));
        assertTrue(e.getMessage().contains("student/sight-log.csv"), "names what was expected: " + e.getMessage());
    }
}
