package org.sightwork.celestial.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;
import org.sightwork.celestial.almanac.Almanac;
import org.sightwork.celestial.drill.AnswerKey;
import org.sightwork.celestial.drill.AnswerKeyIo;
import org.sightwork.celestial.drill.ClassReport;
import org.sightwork.celestial.drill.DrillException;
import org.sightwork.celestial.drill.DrillGenerator;
import org.sightwork.celestial.drill.DrillGrader;
import org.sightwork.celestial.drill.DrillPack;
import org.sightwork.celestial.drill.DrillPackWriter;
import org.sightwork.celestial.drill.Scenario;
import org.sightwork.celestial.drill.ScenarioReader;
import org.sightwork.celestial.drill.StudentAnswers;
import org.sightwork.celestial.drill.StudentGrade;
import org.sightwork.geo.app.Caution;
import org.sightwork.geo.files.SafeWrite;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/**
 * {@code sightwork drill}: training drills. {@code new} makes a student pack and an answer key from
 * a scenario and a seed; {@code grade} grades students' answers against a key. Exit codes: 0 done,
 * 2 a bad file or option (the message names file and field), 1 a drill that cannot be made (a body
 * below the horizon, no twilight, a fix without geometry).
 */
@Command(name = "drill", mixinStandardHelpOptions = true,
        description = {"Training drills: make a sight-reduction exercise from a scenario, grade the answers."},
        subcommands = {DrillCommand.New.class, DrillCommand.Grade.class},
        footer = {"", Caution.TEXT})
public final class DrillCommand implements Callable<Integer> {

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() {
        spec.commandLine().usage(spec.commandLine().getOut());
        return 0;
    }

    /** {@code sightwork drill new SCENARIO.json --seed N --out DIR}. */
    @Command(name = "new", mixinStandardHelpOptions = true,
            description = {"Make a drill: student pack (sight log, deck log, exercise sheet PDF, answers form)",
                "in DIR/student and the answer key with the true track (NMEA) in DIR/key.",
                "The same scenario and seed give the same files, byte for byte."},
            footer = {"", Caution.TEXT})
    static final class New implements Callable<Integer> {
        @Spec
        CommandSpec spec;

        @Parameters(index = "0", paramLabel = "SCENARIO.json", description = "the drill scenario (docs/DRILLS.md)")
        Path scenario;

        @Option(names = "--seed", required = true, paramLabel = "N",
                description = "seed of the observer's random errors (any whole number)")
        long seed;

        @Option(names = "--out", required = true, paramLabel = "DIR", description = "folder to write the drill to")
        Path out;

        @Option(names = "--force", description = "replace files already in DIR")
        boolean force;

        @Override
        public Integer call() {
            PrintWriter err = spec.commandLine().getErr();
            PrintWriter o = spec.commandLine().getOut();
            Scenario sc;
            try {
                sc = ScenarioReader.read(scenario);
            } catch (NoSuchFileException e) {
                return fail(err, "new", "cannot read " + scenario + ": no such file", 2);
            } catch (IOException e) {
                return fail(err, "new", "cannot read " + scenario + ": " + e.getMessage(), 2);
            } catch (DrillException e) {
                return fail(err, "new", "the scenario has problems:\n  " + String.join("\n  ", e.problems()), 2);
            }
            DrillPack pack;
            try {
                pack = DrillGenerator.generate(sc, seed, Almanac.standard());
            } catch (DrillException e) {
                return fail(err, "new", "this drill cannot be made:\n  " + String.join("\n  ", e.problems()), 1);
            }
            try {
                List<Path> files = DrillPackWriter.write(pack, out, force);
                o.println("Drill '" + sc.title() + "', seed " + seed + ": " + pack.sights().size() + " sights, "
                        + pack.key().fixes().size() + " fixes.");
                for (AnswerKey.FixKey f : pack.key().fixes()) {
                    o.println(String.format(Locale.ROOT, "  fix '%s' at %s: the key's fix is %.2f nm from the truth",
                            f.session(), f.utc(), f.fixErrorNm()));
                }
                for (Path p : files) {
                    o.println("  wrote " + p);
                }
                o.println("Hand out " + out.resolve("student") + "; keep " + out.resolve("key") + ".");
                o.flush();
                return 0;
            } catch (DrillException e) {
                return fail(err, "new", String.join("\n  ", e.problems()), 2);
            } catch (IOException e) {
                return fail(err, "new", "cannot write to " + out + ": " + e.getMessage(), 1);
            }
        }
    }

    /** {@code sightwork drill grade KEY ANSWERS... [--report FILE]}. */
    @Command(name = "grade", mixinStandardHelpOptions = true,
            description = {"Grade students' answers (CSV, docs/DRILLS.md) against a drill's answer key;",
                "print the class report. --report writes it to a file too: CSV when the name ends",
                "in .csv, else text."},
            footer = {"", Caution.TEXT})
    static final class Grade implements Callable<Integer> {
        @Spec
        CommandSpec spec;

        @Parameters(index = "0", paramLabel = "KEY", description = "the answer key (key/answer-key.json)")
        Path key;

        @Parameters(index = "1..*", arity = "1..*", paramLabel = "ANSWERS", description = "students' answer files")
        List<Path> answers = new ArrayList<>();

        @Option(names = "--report", paramLabel = "FILE", description = "write the class report here (.csv or text)")
        Path report;

        @Override
        public Integer call() {
            PrintWriter err = spec.commandLine().getErr();
            PrintWriter o = spec.commandLine().getOut();
            AnswerKey k;
            try {
                k = AnswerKeyIo.read(key);
            } catch (NoSuchFileException e) {
                return fail(err, "grade", "cannot read " + key + ": no such file", 2);
            } catch (IOException e) {
                return fail(err, "grade", "cannot read " + key + ": " + e.getMessage(), 2);
            } catch (DrillException e) {
                return fail(err, "grade", e.getMessage(), 2);
            }
            List<StudentGrade> grades = new ArrayList<>();
            int unreadable = 0;
            for (Path a : answers) {
                try {
                    grades.add(DrillGrader.grade(k, StudentAnswers.read(a)));
                } catch (IOException e) {
                    err.println("sightwork drill grade: cannot read " + a + ": "
                            + (e instanceof NoSuchFileException ? "no such file" : e.getMessage()) + "; left out");
                    unreadable++;
                }
            }
            ClassReport r = new ClassReport(k.title(), grades);
            o.print(r.text());
            o.flush();
            if (report != null) {
                String content = report.getFileName().toString().toLowerCase(Locale.ROOT).endsWith(".csv")
                        ? r.csv() : r.text();
                try {
                    SafeWrite.write(report, s -> s.write(content.getBytes(StandardCharsets.UTF_8)));
                } catch (IOException e) {
                    return fail(err, "grade", "cannot write " + report + ": " + e.getMessage(), 1);
                }
            }
            return unreadable > 0 ? 2 : 0;
        }
    }

    private static int fail(PrintWriter err, String sub, String message, int code) {
        err.println("sightwork drill " + sub + ": " + message);
        err.flush();
        return code;
    }
}
