package org.sightwork.celestial.ui;

import java.io.InputStream;
import java.io.StringReader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDate;
import java.time.ZoneOffset;
import java.time.format.DateTimeFormatter;
import java.util.Locale;
import org.sightwork.celestial.almanac.Almanac;
import org.sightwork.celestial.drill.DrillGenerator;
import org.sightwork.celestial.drill.DrillPack;
import org.sightwork.celestial.drill.LoggedSight;
import org.sightwork.celestial.drill.Scenario;
import org.sightwork.celestial.drill.ScenarioReader;
import org.sightwork.celestial.drill.SightLogCsv;
import org.sightwork.celestial.fix.FixOptions;
import org.sightwork.celestial.reduction.SightReducer;
import org.sightwork.celestial.sight.IndexError;
import org.sightwork.geo.earth.Angles;
import org.sightwork.geo.track.DrLog;

/**
 * Makes the bundled demo passage (INVENTED: an invented yacht on an invented passage, for showing
 * the program, never a check value) with the drill generator, from the scenario
 * {@code demo-passage-scenario.json} beside this class and the seed {@link #SEED}:
 * {@code demo-passage.json} (the session), {@code demo-sights.csv} (the sight log) and
 * {@code demo-gps-clean.nmea} (the true track as NMEA, a clean GPS log).
 *
 * <p>Run: {@code mvn -pl plugin -am test -Dtest=DemoPassageMaker -Dsightwork.makeDemo=true};
 * without the property it does nothing. Commit what it writes.
 */
class DemoPassageMaker {

    /** The seed of the demo's observer errors. */
    static final long SEED = 20260621L;

    static final Path OUT = Path.of("src/main/resources/org/sightwork/celestial/demo");

    @org.junit.jupiter.api.Test
    void make() throws Exception {
        if (!Boolean.getBoolean("sightwork.makeDemo")) {
            return;
        }
        Scenario scenario;
        try (InputStream in = DemoPassageMaker.class.getResourceAsStream("demo-passage-scenario.json")) {
            var read = ScenarioReader.parse(new String(in.readAllBytes(), StandardCharsets.UTF_8), "demo-passage-scenario.json");
            scenario = read;
        }
        DrillPack pack = DrillGenerator.generate(scenario, SEED, Almanac.standard());
        Files.createDirectories(OUT);
        Passage p = new Passage("Garajau (invented yacht), Horta to Ponta Delgada: invented demo passage",
                LocalDate.of(2026, 6, 21));
        String dr = pack.deckLog().csv();
        var log = DrLog.read(new StringReader(dr), "demo DR");
        p.setDrLog(log.value());
        DateTimeFormatter f = DateTimeFormatter.ofPattern("yyyy-MM-dd HH:mm:ss", Locale.ROOT).withZone(ZoneOffset.UTC);
        for (LoggedSight s : pack.sights()) {
            SightRow r = new SightRow();
            r.set(SightColumn.BODY, s.body().name());
            r.set(SightColumn.LIMB, switch (s.limb()) {
                case LOWER -> "LL";
                case UPPER -> "UL";
                default -> "";
            });
            r.set(SightColumn.TIME, f.format(s.watchTime()));
            r.set(SightColumn.WATCH_FAST, String.format(Locale.ROOT, "%.0f", scenario.observer().watchErrorS()));
            r.set(SightColumn.HS, Angles.formatDm(s.hsDeg(), 2).replace('′', '\''));
            double ie = IndexError.ofSignedReading(s.indexReadingArcmin()).correctionArcmin();
            r.set(SightColumn.INDEX, String.format(Locale.ROOT, "%+.1f", ie));
            r.set(SightColumn.EYE, String.format(Locale.ROOT, "%.1f", scenario.observer().eyeHeightM()));
            r.set(SightColumn.TEMPERATURE, String.format(Locale.ROOT, "%.0f", scenario.observer().temperatureC()));
            r.set(SightColumn.PRESSURE, String.format(Locale.ROOT, "%.0f", scenario.observer().pressureHpa()));
            // The day's three Sun lines make one running fix at the afternoon sight; the twilight
            // sights a fix of their own.
            r.set(SightColumn.FIX, s.session().equals("twilight") ? "twilight" : "day run");
            System.out.println("session " + s.session() + " " + s.body().name());
            p.rows().add(r);
        }
        Files.writeString(OUT.resolve("demo-gps-clean.nmea"), String.join("\r\n", pack.truthNmea()) + "\r\n");
        p.setGpsFile(java.util.Optional.of(OUT.resolve("demo-gps-clean.nmea").toAbsolutePath()));
        Files.writeString(OUT.resolve("demo-sights.csv"), SightLogCsv.csv(pack.sights(), scenario.observer(), true));
        PlotComputer pc = new PlotComputer(SightReducer.standard(), FixOptions.DEFAULTS);
        Plot plot = pc.compute(p);
        Path session = OUT.resolve("demo-passage.json");
        Files.deleteIfExists(session);
        PassageFiles.save(p, plot, session);
        Files.deleteIfExists(org.sightwork.celestial.io.SessionFile.backupOf(session));
        for (Plot.SightResult s : plot.sights()) {
            System.out.println(s.row() + " " + s.label() + " " + s.problem().orElse("ok"));
        }
        for (Plot.FixResult x : plot.fixes()) {
            System.out.println(x.name() + " " + x.fix().map(y -> y.position().toString() + " " + y.ellipse95())
                    .orElse(x.problem().orElse("")));
        }
    }
}
