package org.sightwork.celestial.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.sightwork.geo.testing.CliRun.run;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.sightwork.celestial.drill.AnswerKey;
import org.sightwork.celestial.drill.AnswerKeyIo;
import org.sightwork.celestial.drill.ClassReport;
import org.sightwork.celestial.drill.StudentAnswers;
import org.sightwork.geo.earth.Angles;
import org.sightwork.geo.testing.CliRun;

/** {@code sightwork drill new} and {@code drill grade} end to end, with their exit codes. */
class DrillCommandTest {

    private static Path demo(Path dir) throws Exception {
        Path p = dir.resolve("drill-scenario.json");
        try (var in = DrillCommandTest.class.getResourceAsStream("/org/sightwork/celestial/demo/drill-scenario.json")) {
            Files.write(p, in.readAllBytes());
        }
        return p;
    }

    @Test
    void newThenGradeAClass(@TempDir Path dir) throws Exception {
        Path out = dir.resolve("drill");
        CliRun r = run("drill", "new", demo(dir).toString(), "--seed", "7", "--out", out.toString());
        assertEquals(0, r.code(), r.err());
        assertTrue(Files.exists(out.resolve("student/exercise.pdf")), r.out());
        assertTrue(Files.exists(out.resolve("key/true-track.nmea")), r.out());
        AnswerKey key = AnswerKeyIo.read(out.resolve("key/answer-key.json"));
        StringBuilder good = new StringBuilder("# student: Ana\n" + StudentAnswers.HEADER + "\n");
        for (AnswerKey.FixKey f : key.fixes()) {
            good.append("fix,").append(f.session()).append(',').append(f.utc()).append(',')
                    .append(Angles.formatLatitude(f.fix().latDeg())).append(',')
                    .append(Angles.formatLongitude(f.fix().lonDeg())).append(",,\n");
        }
        Path ana = Files.writeString(dir.resolve("ana.csv"), good.toString(), StandardCharsets.UTF_8);
        AnswerKey.SightKey s1 = key.sights().get(0);
        double dipAdded = s1.with(org.sightwork.celestial.drill.Mistake.DIP_WRONG_SIGN).orElseThrow().hoDeg();
        Path ben = Files.writeString(dir.resolve("ben.csv"), StudentAnswers.HEADER + "\n"
                + String.format(Locale.ROOT, "sight,1,,,,%s,\n", Angles.formatDm(dipAdded, 2)), StandardCharsets.UTF_8);
        Path report = dir.resolve("class.csv");
        CliRun g = run("drill", "grade", out.resolve("key/answer-key.json").toString(), ana.toString(), ben.toString(),
                "--report", report.toString());
        assertEquals(0, g.code(), g.err());
        assertTrue(g.out().contains("Ana") && g.out().contains("ben"), g.out());
        assertTrue(g.out().contains("dip-wrong-sign"), g.out());
        String csv = Files.readString(report);
        assertTrue(csv.startsWith(ClassReport.CSV_HEADER), csv);
        assertTrue(csv.contains("\nAna,100.0,"), csv);
    }

    @Test
    void aBadScenarioIsAUsageErrorNamingFileAndField(@TempDir Path dir) throws Exception {
        String json = Files.readString(demo(dir)).replace("\"eyeHeightM\": 2.5", "\"eyeHeightM\": -2.5");
        Path bad = Files.writeString(dir.resolve("bad.json"), json);
        CliRun r = run("drill", "new", bad.toString(), "--seed", "1", "--out", dir.resolve("o").toString());
        assertEquals(2, r.code(), r.err());
        assertTrue(r.err().contains("bad.json: field observer.eyeHeightM: expected a number in [0.1 m, 50 m], got -2.5"),
                r.err());
        assertTrue(!Files.exists(dir.resolve("o")), "nothing written");
    }

    @Test
    void anImpossibleDrillFailsWithTheReason(@TempDir Path dir) throws Exception {
        String json = Files.readString(demo(dir)).replace("\"2026-06-21T17:10:00Z\", \"body\": \"Sun\"",
                "\"2026-06-21T17:10:00Z\", \"body\": \"Vega\"").replace(
                "\"body\": \"Vega\", \"limb\": \"lower\"", "\"body\": \"Vega\"");
        Path bad = Files.writeString(dir.resolve("day-star.json"), json);
        CliRun r = run("drill", "new", bad.toString(), "--seed", "1", "--out", dir.resolve("o").toString());
        assertEquals(1, r.code(), r.err());
        assertTrue(r.err().contains("cannot be made") && r.err().contains("Vega"), r.err());
    }

    @Test
    void aMissingKeyIsAUsageError(@TempDir Path dir) {
        CliRun r = run("drill", "grade", dir.resolve("nope.json").toString(), dir.resolve("a.csv").toString());
        assertEquals(2, r.code(), r.err());
        assertTrue(r.err().contains("nope.json: no such file"), r.err());
    }
}
