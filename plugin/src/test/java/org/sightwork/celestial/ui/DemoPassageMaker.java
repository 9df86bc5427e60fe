package org.sightwork.celestial.ui;

import java.io.InputStream;
import java.io.StringReader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDate;
import java.time.ZoneOffset;
import java.time.format.DateTimeFormatter;
import java.util.List;
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
 * {@code demo-passage.json} (the session) and {@code demo-sights.csv} (the sight log).
 *
 * <p>One truth for the whole demo: the vessel's true track is the passage demo's
 * ({@code demo-true-track.csv}, written by the passage demo's generator with {@code demo-gps.nmea},
 * the GPS log with its invented spoofing episode, and {@code demo-dr.csv}, the DR log); the
 * scenario's own track is replaced by it here, leg by leg (each leg of that track is a rhumb line
 * sailed at a steady speed; its ends are at the DR log's leg times). So the sights are taken from
 * where the GPS log says the vessel was, but for the spoofing; the passage's DR log is
 * {@code demo-dr.csv} and its GPS track {@code demo-gps.nmea}.
 *
 * <p>Run: {@code mvn -pl plugin -am test -Dtest=DemoPassageMaker -Dsightwork.makeDemo=true};
 * without the property it does nothing. Commit what it writes.
 */
class DemoPassageMaker {

    /** The seed of the demo's observer errors. */
    static final long SEED = 20260621L;

    static final Path OUT = Path.of("src/main/resources/org/sightwork/celestial/demo");

    /** The true track of the passage demo, every 10 minutes (time, position). */
    private static final java.util.TreeMap<java.time.Instant, org.sightwork.geo.earth.GeoPosition> TRUTH = new java.util.TreeMap<>();

    private static void readTruth() throws java.io.IOException {
        TRUTH.clear();
        for (String line : Files.readAllLines(OUT.resolve("demo-true-track.csv"))) {
            if (line.startsWith("#") || line.startsWith("time_utc") || line.isBlank()) {
                continue;
            }
            String[] f = line.split(",");
            TRUTH.put(java.time.Instant.parse(f[0]), org.sightwork.geo.earth.GeoPosition.of(Double.parseDouble(f[1]),
                    Double.parseDouble(f[2])));
        }
    }

    /** The true position at a time: along the rhumb line between the 10-minute samples around it. */
    static org.sightwork.geo.earth.GeoPosition truthAt(java.time.Instant t) {
        var a = TRUTH.floorEntry(t);
        var b = TRUTH.ceilingEntry(t);
        if (a == null || b == null) {
            throw new IllegalArgumentException(t + " is outside the true track");
        }
        if (a.getKey().equals(b.getKey())) {
            return a.getValue();
        }
        var rl = org.sightwork.geo.earth.Sailings.rhumbLine(a.getValue(), b.getValue());
        double f = java.time.Duration.between(a.getKey(), t).toMillis()
                / (double) java.time.Duration.between(a.getKey(), b.getKey()).toMillis();
        return org.sightwork.geo.earth.Sailings.rhumbDestination(a.getValue(), rl.courseDeg(), rl.distanceNm() * f);
    }

    /**
     * The passage demo's true track as a scenario track: a waypoint at each end of a DR leg (the
     * vessel alters course there), found by running the leg's steady course and speed (from its
     * first and last 10-minute samples) from its last sample to the leg's end.
     */
    static Scenario.Track trueTrack(DrLog log) throws java.io.IOException {
        readTruth();
        List<java.time.Instant> ends = new java.util.ArrayList<>();
        for (int i = 1; i < log.legs().size(); i++) {
            ends.add(log.legs().get(i).start());
        }
        ends.add(log.end());
        java.time.Instant start = log.legs().get(0).start();
        List<Scenario.Waypoint> wps = new java.util.ArrayList<>();
        java.time.Instant legStart = start;
        for (java.time.Instant end : ends) {
            var first = TRUTH.ceilingEntry(legStart.plusSeconds(1));
            var last = TRUTH.lowerEntry(end);
            var legFrom = legStart.equals(start) ? TRUTH.firstEntry() : first;
            var rl = org.sightwork.geo.earth.Sailings.rhumbLine(legFrom.getValue(), last.getValue());
            double hours = java.time.Duration.between(legFrom.getKey(), last.getKey()).toSeconds() / 3600.0;
            double kn = rl.distanceNm() / hours;
            double run = kn * java.time.Duration.between(last.getKey(), end).toSeconds() / 3600.0;
            var at = org.sightwork.geo.earth.Sailings.rhumbDestination(last.getValue(), rl.courseDeg(), run);
            wps.add(new Scenario.Waypoint(at, java.util.Optional.of(end), java.util.OptionalDouble.empty()));
            TRUTH.put(end, at);
            legStart = end;
        }
        return new Scenario.Track(start, TRUTH.firstEntry().getValue(), wps,
                new Scenario.Current(PASSAGE_CURRENT_SET_DEG, PASSAGE_CURRENT_DRIFT_KN));
    }

    /** The passage demo's invented current (its README): set 160°, drift 0.5 kn. */
    static final double PASSAGE_CURRENT_SET_DEG = 160;
    static final double PASSAGE_CURRENT_DRIFT_KN = 0.5;

    static Scenario withTrack(Scenario s, Scenario.Track t) {
        return new Scenario(s.formatVersion(), s.title(), s.description(), s.invented(), s.vesselName(), t, s.schedule(),
                s.fixes(), s.observer(), s.drLog(), s.given());
    }

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
        var drRead = DrLog.read(Files.newBufferedReader(OUT.resolve("demo-dr.csv")), "demo-dr.csv");
        if (!drRead.problems().isEmpty() || drRead.value().isEmpty()) {
            throw new IllegalStateException("demo-dr.csv: " + drRead.problems());
        }
        DrLog drLog = drRead.value().get();
        scenario = withTrack(scenario, trueTrack(drLog));
        DrillPack pack = DrillGenerator.generate(scenario, SEED, Almanac.standard());
        Files.createDirectories(OUT);
        Passage p = new Passage("Petrel (invented yacht), Horta to Ponta Delgada: invented demo passage",
                LocalDate.of(2026, 6, 21));
        p.setDrLog(java.util.Optional.of(drLog));
        for (LoggedSight s : pack.sights()) {
            var truth = s.truePosition();
            var onTrack = truthAt(s.trueUtc());
            double offNm = org.sightwork.geo.earth.Sailings.rhumbLine(truth, onTrack).distanceNm();
            if (offNm > 0.01) {
                throw new IllegalStateException("sight at " + s.trueUtc() + " is " + offNm + " nm off the passage's true track");
            }
        }
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
        Files.deleteIfExists(OUT.resolve("demo-gps-clean.nmea"));
        p.setGpsFile(java.util.Optional.of(OUT.resolve("demo-gps.nmea").toAbsolutePath()));
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
