package org.sightwork.celestial.drill;

import java.time.Duration;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import org.sightwork.celestial.almanac.Almanac;
import org.sightwork.celestial.almanac.Body;
import org.sightwork.celestial.fix.DrTrack;
import org.sightwork.celestial.fix.Fix;
import org.sightwork.celestial.fix.FixGeometryException;
import org.sightwork.celestial.fix.FixOptions;
import org.sightwork.celestial.fix.FixSolver;
import org.sightwork.celestial.reduction.ComputedAltitude;
import org.sightwork.celestial.reduction.LineOfPosition;
import org.sightwork.celestial.reduction.SightReduction;
import org.sightwork.celestial.almanac.BodyPosition;
import org.sightwork.celestial.reduction.ReducedSight;
import org.sightwork.celestial.reduction.SightReducer;
import org.sightwork.celestial.sight.SightException;
import org.sightwork.celestial.time.AstroTime;
import org.sightwork.celestial.sight.IndexError;
import org.sightwork.celestial.sight.Limb;
import org.sightwork.celestial.sight.Sight;
import org.sightwork.celestial.sight.Worksheet;
import org.sightwork.geo.earth.GeoPosition;
import org.sightwork.geo.track.DrLeg;

/**
 * Makes a drill from a scenario and a seed: the sights an observer on the true track would have
 * taken, written as he would write them, and the answer key.
 *
 * <p><b>Method.</b> For each sight: the vessel's true position at the true time ({@link TrueTrack});
 * the body's GHA and Dec there and then from the almanac and the exact observed altitude Ho = Hc at
 * the true position ({@link SightReduction}); the sextant altitude that the observer's conditions
 * (index error, height of eye, temperature, pressure, limb) turn into that Ho, by the altitude
 * corrections of {@link SightReducer} in reverse (fixed-point iteration, {@code hsFor}); then the observer's random error
 * (normal, {@link ObserverErrors}) is added and the reading rounded to the sextant's step. The
 * watch time is the true time plus the watch error, rounded to the watch's step. The DR columns are
 * the deck log's DR ({@link DeckLog}), not the truth.
 *
 * <p>The key works the sights exactly as a careful student would from the pack: the written Hs and
 * watch time, the given index and watch errors, the written DR as the assumed position
 * ({@link SightReducer}: the almanac, the corrections, the reduction), the fixes by least squares
 * ({@link FixSolver}, lines at other times carried along the deck log's DR). Each sight is also
 * worked with each {@link Mistake}, for the grader.
 *
 * <p><b>Rules of the sky</b> (a sight breaking one is refused with the reason): the body's observed
 * altitude between {@value #MIN_ALTITUDE_DEG}° and {@value #MAX_ALTITUDE_DEG}° (lower sights refract
 * unpredictably, higher ones give poor azimuths: common practice); stars and planets only while
 * the Sun's centre is between {@value #STAR_BAND_HIGH_SUN_DEG}° and {@value #STAR_BAND_LOW_SUN_DEG}°
 * (civil and early nautical twilight: sky dark enough for the body, horizon still sharp; common
 * practice); the Moon only while the Sun is above {@value #STAR_BAND_LOW_SUN_DEG}° (a lit horizon);
 * the Sun only by day (implied by its altitude).
 *
 * <p><b>Accuracy.</b> With a perfect observer (no noise, no index or watch error, no rounding) the
 * sights reduce back to the true position within 0.01 nm ({@code DrillGeneratorTest}).
 */
public final class DrillGenerator {

    /** Lowest observed altitude allowed (degrees): common practice. */
    public static final double MIN_ALTITUDE_DEG = 10.0;
    /** Highest observed altitude allowed (degrees): common practice. */
    public static final double MAX_ALTITUDE_DEG = 80.0;
    /** The Sun's altitude above which the sky is too bright for stars and planets (degrees). */
    public static final double STAR_BAND_HIGH_SUN_DEG = -3.0;
    /** The Sun's altitude below which the horizon is too dark for a sight (degrees). */
    public static final double STAR_BAND_LOW_SUN_DEG = -10.0;
    /** Seconds between NMEA fixes of the true track. */
    public static final int NMEA_INTERVAL_S = 60;
    /** The smallest sigma given to a line in the key's fix (minutes): a perfect observer still has 0.1′ drums. */
    static final double MIN_LINE_SIGMA_ARCMIN = 0.1;

    private DrillGenerator() {
    }

    /**
     * Makes the drill.
     *
     * @param scenario the scenario
     * @param seed the seed of the observer's random errors
     * @param almanac the almanac
     * @return the pack
     * @throws DrillException if the scenario asks for what cannot be done, with every reason
     */
    public static DrillPack generate(Scenario scenario, long seed, Almanac almanac) {
        TrueTrack track = TrueTrack.of(scenario.track());
        DeckLog deck = DeckLog.keep(track, scenario.drLog());
        DrillSchedule schedule = DrillSchedule.of(scenario, almanac, deck);
        ObserverProfile obs = scenario.observer();
        ObserverErrors errors = new ObserverErrors(seed, obs.sextantSigmaArcmin());
        SightReducer reducer = new SightReducer(almanac, 0.0);
        double ieRead = Math.round(obs.indexErrorArcmin() * 10.0) / 10.0;
        List<LoggedSight> logged = new ArrayList<>();
        List<String> problems = new ArrayList<>();
        for (DrillSchedule.PlannedSight p : schedule.sights()) {
            double noise = errors.nextAltitudeErrorArcmin(); // drawn for every sight: the sequence is fixed
            String who = "sight " + p.number() + " (" + p.body().name() + " at " + p.utc() + ")";
            if (!track.covers(p.utc())) {
                problems.add(who + ": outside the passage (" + track.startUtc() + " to " + track.endUtc() + ")");
                continue;
            }
            GeoPosition truth = track.positionAt(p.utc());
            AstroTime at = AstroTime.ofUtc(p.utc());
            BodyPosition bp = almanac.position(p.body(), at);
            ComputedAltitude trueC = SightReduction.reduce(truth, bp.ghaDeg(), bp.decDeg());
            BodyPosition sun = almanac.position(Body.SUN, at);
            ComputedAltitude sunC = SightReduction.reduce(truth, sun.ghaDeg(), sun.decDeg());
            double sunAlt = sunC.hcDeg();
            Optional<String> refusal = skyRule(p.body(), trueC.hcDeg(), sunAlt);
            if (refusal.isPresent()) {
                problems.add(who + ": " + refusal.get());
                continue;
            }
            Sight conditions = Sight.builder(p.body().name(), p.utc(), trueC.hcDeg()).limb(p.limb())
                    .indexError(IndexError.ofSignedReading(obs.indexErrorArcmin())).eyeHeightM(obs.eyeHeightM())
                    .temperatureC(obs.temperatureC()).pressureHpa(obs.pressureHpa()).dr(truth).build();
            double hsExact = hsFor(reducer, trueC.hcDeg(), conditions);
            double hsRead = roundTo(hsExact + noise / 60.0, obs.sextantResolutionArcmin() / 60.0);
            Instant watch = roundTo(p.utc().plusNanos(Math.round(obs.watchErrorS() * 1e9)), obs.watchResolutionS());
            GeoPosition dr = deck.drAt(p.utc());
            GeoPosition drWritten = GeoPosition.of(Math.round(dr.latDeg() * 600.0) / 600.0,
                    Math.round(dr.lonDeg() * 600.0) / 600.0);
            DrLeg leg = deck.inForceAt(p.utc());
            logged.add(new LoggedSight(p.number(), p.session(), p.body(), p.limb(), p.utc(), watch, hsRead, noise,
                    ieRead, truth, drWritten, leg.headingDeg(), leg.stwKn(), trueC.hcDeg(), trueC.znDeg(), sunAlt,
                    SightDescription.of(p.body(), sunC.lhaDeg(), sunAlt)));
        }
        if (!problems.isEmpty()) {
            throw new DrillException(problems);
        }
        AnswerKey key = key(scenario, seed, reducer, track, deck, schedule, logged);
        return new DrillPack(scenario, seed, track, deck, logged, key, TruthNmea.sentences(track, NMEA_INTERVAL_S));
    }

    /**
     * Whether a body can be sighted: the reason when not.
     *
     * @param body the body
     * @param hoDeg its observed (geocentric) altitude (degrees)
     * @param sunAltDeg the Sun's altitude (degrees)
     * @return the reason, empty when the sight can be taken
     */
    static Optional<String> skyRule(Body body, double hoDeg, double sunAltDeg) {
        String name = body.name();
        if (hoDeg < 0) {
            return Optional.of(String.format(Locale.ROOT, "%s is below the horizon (altitude %.1f°) at the vessel's"
                    + " true position; choose another body or time", name, hoDeg));
        }
        if (hoDeg < MIN_ALTITUDE_DEG) {
            return Optional.of(String.format(Locale.ROOT, "%s is only %.1f° high; the drill allows %.0f° to %.0f° "
                    + "(low sights refract unpredictably)", name, hoDeg, MIN_ALTITUDE_DEG, MAX_ALTITUDE_DEG));
        }
        if (hoDeg > MAX_ALTITUDE_DEG) {
            return Optional.of(String.format(Locale.ROOT, "%s is %.1f° high; the drill allows %.0f° to %.0f° "
                    + "(near the zenith the azimuth is too uncertain)", name, hoDeg, MIN_ALTITUDE_DEG, MAX_ALTITUDE_DEG));
        }
        boolean starLike = body.isStar() || body.isPlanet();
        if (starLike && (sunAltDeg > STAR_BAND_HIGH_SUN_DEG || sunAltDeg < STAR_BAND_LOW_SUN_DEG)) {
            return Optional.of(String.format(Locale.ROOT, "stars and planets are sighted only in twilight, with the "
                    + "Sun between %.0f° and %.0f° (body visible, horizon sharp); the Sun is at %.1f°", STAR_BAND_HIGH_SUN_DEG,
                    STAR_BAND_LOW_SUN_DEG, sunAltDeg));
        }
        if (body.kind() == Body.Kind.MOON && sunAltDeg < STAR_BAND_LOW_SUN_DEG) {
            return Optional.of(String.format(Locale.ROOT, "the Moon is sighted only with a lit horizon, the Sun above "
                    + "%.0f°; the Sun is at %.1f°", STAR_BAND_LOW_SUN_DEG, sunAltDeg));
        }
        return Optional.empty();
    }

    // --- the key ---

    private static AnswerKey key(Scenario sc, long seed, SightReducer reducer, TrueTrack track, DeckLog deck,
            DrillSchedule schedule, List<LoggedSight> logged) {
        ObserverProfile obs = sc.observer();
        boolean ieGiven = sc.gives(Scenario.Given.INDEX_ERROR);
        boolean weGiven = sc.gives(Scenario.Given.WATCH_ERROR);
        double weTold = weGiven ? obs.watchErrorS() : 0.0;
        double sigma = Math.max(obs.sextantSigmaArcmin(), MIN_LINE_SIGMA_ARCMIN);
        List<AnswerKey.SightKey> keys = new ArrayList<>();
        List<LineOfPosition> lines = new ArrayList<>();
        for (LoggedSight s : logged) {
            Sight sight = Sight.builder(s.body().name(), s.watchTime(), s.hsDeg()).limb(s.limb())
                    .watchFastSeconds(weTold)
                    .indexError(ieGiven ? IndexError.ofSignedReading(s.indexReadingArcmin()) : IndexError.NONE)
                    .eyeHeightM(obs.eyeHeightM()).temperatureC(obs.temperatureC()).pressureHpa(obs.pressureHpa())
                    .dr(s.dr()).courseDeg(s.courseDeg()).speedKn(s.speedKn()).sigmaArcmin(sigma).build();
            ReducedSight rs = reducer.reduce(sight, Optional.empty());
            Worksheet ws = rs.worksheet();
            double ho = ws.hoDeg();
            ComputedAltitude c = rs.computed();
            double intercept = rs.lop().interceptNm();
            List<AnswerKey.MistakeResult> mistakes = new ArrayList<>();
            // Each mistake: the sight worked again, through the same reducer, with that one mistake.
            if (ieGiven && sight.indexError().correctionArcmin() != 0.0) {
                mistakes.add(worked(reducer, Mistake.INDEX_ERROR_WRONG_SIGN, sight.toBuilder()
                        .indexError(new IndexError(-sight.indexError().correctionArcmin())).build(), s.dr(), ho));
            }
            // Dip left out: Ha = Hs + IE; with the wrong sign: Ha = Hs + IE - dip. Worked by shifting Hs.
            mistakes.add(worked(reducer, Mistake.DIP_FORGOTTEN, with(sight, s.hsDeg() - ws.dipArcmin() / 60.0,
                    sight.watchTime(), sight.watchFastSeconds()), s.dr(), ho));
            mistakes.add(worked(reducer, Mistake.DIP_WRONG_SIGN, with(sight, s.hsDeg() - 2.0 * ws.dipArcmin() / 60.0,
                    sight.watchTime(), sight.watchFastSeconds()), s.dr(), ho));
            if (s.limb() != Limb.CENTRE) {
                mistakes.add(worked(reducer, Mistake.SEMI_DIAMETER_FORGOTTEN, sight.toBuilder().limb(Limb.CENTRE).build(),
                        s.dr(), ho));
                mistakes.add(worked(reducer, Mistake.WRONG_LIMB, sight.toBuilder()
                        .limb(s.limb() == Limb.LOWER ? Limb.UPPER : Limb.LOWER).build(), s.dr(), ho));
            }
            // Almanac mistakes: the almanac read for the wrong hour or day, the longitude's sign.
            mistakes.add(worked(reducer, Mistake.HOUR_LATE, shifted(sight, Duration.ofHours(1)), s.dr(), ho));
            mistakes.add(worked(reducer, Mistake.HOUR_EARLY, shifted(sight, Duration.ofHours(-1)), s.dr(), ho));
            mistakes.add(worked(reducer, Mistake.DAY_LATE, shifted(sight, Duration.ofDays(1)), s.dr(), ho));
            mistakes.add(worked(reducer, Mistake.DAY_EARLY, shifted(sight, Duration.ofDays(-1)), s.dr(), ho));
            mistakes.add(worked(reducer, Mistake.LONGITUDE_SIGN, sight,
                    GeoPosition.of(s.dr().latDeg(), -s.dr().lonDeg()), ho));
            if (weGiven && weTold != 0.0) {
                mistakes.add(worked(reducer, Mistake.WATCH_ERROR_NOT_APPLIED,
                        with(sight, s.hsDeg(), sight.watchTime(), 0.0), s.dr(), ho));
                mistakes.add(worked(reducer, Mistake.WATCH_ERROR_WRONG_SIGN,
                        with(sight, s.hsDeg(), sight.watchTime(), -weTold), s.dr(), ho));
            }
            mistakes.add(new AnswerKey.MistakeResult(Mistake.TOWARD_AWAY_SWAPPED, ho, c.hcDeg(), c.znDeg(), -intercept));
            lines.add(rs.lop());
            keys.add(new AnswerKey.SightKey(s.number(), s.session(), s.body().name(), s.limb(), s.trueUtc(),
                    SightLogCsv.time(s.watchTime()), sight.utc(), SightLogCsv.altitude(s.hsDeg()), s.hsDeg(),
                    s.randomErrorArcmin(), pos(s.truePosition()), pos(s.dr()), s.trueHoDeg(),
                    new AnswerKey.Corrections(ws.indexArcmin(), ws.dipArcmin(), ws.refractionArcmin(),
                            ws.semiDiameterArcmin(), ws.parallaxArcmin(), ws.phaseArcmin()),
                    ho, rs.position().ghaDeg(), rs.position().decDeg(), c.lhaDeg(), c.hcDeg(), c.znDeg(), intercept,
                    mistakes));
        }
        List<AnswerKey.FixKey> fixes = new ArrayList<>();
        List<String> problems = new ArrayList<>();
        DrTrack drTrack = new DrTrack(deck.drLog().legs().stream()
                .map(l -> new DrTrack.Leg(l.start(), l.waterTrackDeg(), l.stwKn())).toList());
        for (DrillSchedule.PlannedFix f : schedule.fixes()) {
            List<LineOfPosition> of = new ArrayList<>();
            for (int n : f.sightNumbers()) {
                of.add(lines.get(n - 1));
            }
            GeoPosition drAtFix = deck.drAt(f.utc());
            try {
                Fix fix = FixSolver.solve(of, f.utc(), drAtFix, Optional.of(drTrack),
                        FixOptions.DEFAULTS.withRejectOutliers(false));
                GeoPosition truth = track.positionAt(f.utc());
                boolean running = of.stream().anyMatch(l -> Math.abs(Duration.between(l.utc(), f.utc()).getSeconds())
                        > FixSolver.SIMULTANEOUS_SECONDS);
                fixes.add(new AnswerKey.FixKey(f.session(), f.utc(), f.sightNumbers(), pos(fix.position()), pos(truth),
                        pos(drAtFix), DrillGrader.distanceNm(fix.position(), pos(truth)),
                        "least squares, " + of.size() + " lines" + (running ? ", carried along the DR to the fix time"
                                : "")));
            } catch (FixGeometryException e) {
                problems.add("fix '" + f.session() + "': " + e.getMessage());
            }
        }
        if (!problems.isEmpty()) {
            throw new DrillException(problems);
        }
        return new AnswerKey(AnswerKey.FORMAT_VERSION, sc.title(), sc.invented(), seed, AnswerKey.Tolerances.STANDARD,
                keys, fixes);
    }

    /**
     * The sextant altitude that the conditions turn into the wanted Ho: the corrections of the
     * reducer in reverse, by fixed-point iteration (dHo/dHs is within 1 ± 0.01 above -1°, so each
     * step gains two digits; 1e-10° is reached in five or six).
     */
    static double hsFor(SightReducer reducer, double hoDeg, Sight conditions) {
        double hs = conditions.hsDeg();
        for (int i = 0; i < 30; i++) {
            double ho = reducer.reduce(with(conditions, hs, conditions.watchTime(), conditions.watchFastSeconds()),
                    Optional.empty()).worksheet().hoDeg();
            double step = hoDeg - ho;
            hs += step;
            if (Math.abs(step) < 1e-10) {
                break;
            }
        }
        return hs;
    }

    /** The sight worked with a mistake; a wrong hour or longitude may put the body below the horizon. */
    private static AnswerKey.MistakeResult worked(SightReducer reducer, Mistake m, Sight wrong, GeoPosition ap,
            double correctHoDeg) {
        try {
            ReducedSight r = reducer.reduce(wrong, Optional.of(ap));
            return new AnswerKey.MistakeResult(m, r.worksheet().hoDeg(), r.computed().hcDeg(), r.computed().znDeg(),
                    r.lop().interceptNm());
        } catch (SightException e) {
            // The reducer refuses a body far below the horizon (only almanac mistakes get there, which
            // leave Ho as it was); the student's Hc is still the formula's.
            BodyPosition p = reducer.almanac().position(reducer.almanac().body(wrong.body()),
                    AstroTime.ofUtc(wrong.utc()));
            ComputedAltitude c = SightReduction.reduce(ap, p.ghaDeg(), p.decDeg());
            return new AnswerKey.MistakeResult(m, correctHoDeg, c.hcDeg(), c.znDeg(), (correctHoDeg - c.hcDeg()) * 60.0);
        }
    }

    private static Sight shifted(Sight s, Duration d) {
        return with(s, s.hsDeg(), s.watchTime().plus(d), s.watchFastSeconds());
    }

    private static Sight with(Sight s, double hsDeg, Instant watch, double watchFastS) {
        return new Sight(s.body(), s.limb(), watch, watchFastS, hsDeg, s.indexError(),
                s.eyeHeightM(), s.temperatureC(), s.pressureHpa(), s.dr(), s.courseDeg(), s.speedKn(),
                s.sigmaArcmin(), s.artificialHorizon(), s.dipShortNm(), s.note());
    }

    private static AnswerKey.Position pos(GeoPosition p) {
        return new AnswerKey.Position(p.latDeg(), p.lonDeg());
    }

    private static double roundTo(double v, double step) {
        return step <= 0 ? v : Math.round(v / step) * step;
    }

    private static Instant roundTo(Instant t, double stepS) {
        if (stepS <= 0) {
            return t;
        }
        long stepNanos = Math.round(stepS * 1e9);
        long epochNanosMod = Math.floorMod(t.getEpochSecond(), 86_400L) * 1_000_000_000L + t.getNano();
        long rounded = Math.round((double) epochNanosMod / stepNanos) * stepNanos;
        return t.minusNanos(epochNanosMod).plusNanos(rounded);
    }
}
