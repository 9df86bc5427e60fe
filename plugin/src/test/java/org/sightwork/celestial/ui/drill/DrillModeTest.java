package org.sightwork.celestial.ui.drill;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.image.BufferedImage;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.TimeUnit;
import javafx.scene.paint.Color;
import org.apache.sis.referencing.CRS;
import org.apache.sis.referencing.CommonCRS;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.locationtech.jts.geom.Envelope;
import org.opengis.referencing.operation.MathTransform;
import org.sightwork.celestial.drill.AnswerKey;
import org.sightwork.celestial.drill.AnswerKeyIo;
import org.sightwork.celestial.drill.DrillGrader;
import org.sightwork.celestial.drill.Mistake;
import org.sightwork.celestial.drill.StudentAnswers;
import org.sightwork.celestial.drill.StudentGrade;
import org.sightwork.geo.app.HeadlessChart;
import org.sightwork.geo.app.LayerEntry;
import org.sightwork.geo.chart.ChartSet;
import org.sightwork.geo.earth.Angles;
import org.sightwork.geo.earth.GeoPosition;
import org.sightwork.geo.earth.Sailings;
import org.sightwork.geo.render.Palette;
import org.sightwork.geo.render.Viewport;
import org.sightwork.geo.testing.HeadlessFx;

/**
 * The drill mode on a headless chart, with a pack made by the drill generator (demo scenario, an
 * invented passage; seed 7): the truth is hidden until revealed (no truth-coloured pixel, the
 * layer reports nothing drawn), then drawn where the projection puts the true positions (within
 * {@link #PIXEL_TOLERANCE_PX}), and the panel shows {@link DrillGrader}'s numbers unchanged.
 *
 * <p>The projection check is against Apache SIS's EPSG:3395 (World Mercator), outside our code,
 * as in geo's {@code PluginOverlayTest}. The grade is checked against the grader called here on
 * the same files: the panel must neither re-grade nor round the numbers it keeps.
 */
class DrillModeTest {

    /** A true position drawn within 2 px of where SIS projects it (the brief's bound; markers are 9-15 px). */
    static final double PIXEL_TOLERANCE_PX = 2.0;
    /** A pixel counts as a drill colour within this RGB distance (unit cube): anti-aliased edges stay out. */
    static final double COLOUR_MATCH = 0.25;

    /** Height of the strip at the bottom holding the shell's scale bar (dark, like the key's colour). */
    static final int SCALE_BAR_PX = 60;

    private static final ChartSet NO_CHART = new ChartSet(List.of(), List.of(), new Envelope(), new Envelope());
    private static final Viewport VIEW = Viewport.fitting(37.55, -28.75, 38.65, -25.55, 1200, 800);

    @TempDir
    static Path tmp;
    static Path pack;
    static Path answers;
    static AnswerKey key;

    @BeforeAll
    static void makePack() throws Exception {
        pack = DrillPacks.demo(Files.createDirectories(tmp.resolve("petrel")));
        key = AnswerKeyIo.read(pack.resolve("key/answer-key.json"));
        answers = tmp.resolve("ana.csv");
        Files.writeString(answers, answersOf(key), StandardCharsets.UTF_8);
    }

    /**
     * Invented answers of a student: the first fix 2 nm north of the key's, the second as the key's,
     * the third 3.5 nm east, the fourth not handed in; sight 1 with the index error the wrong way
     * round, sight 3 right.
     */
    static String answersOf(AnswerKey k) {
        StringBuilder b = new StringBuilder("# student: Ana (invented)\n").append(StudentAnswers.HEADER).append('\n');
        double[][] moves = {{0, 2.0}, {0, 0}, {90, 3.5}};
        for (int i = 0; i < 3; i++) {
            AnswerKey.FixKey f = k.fixes().get(i);
            GeoPosition p = Sailings.rhumbDestination(GeoPosition.of(f.fix().latDeg(), f.fix().lonDeg()), moves[i][0],
                    moves[i][1]);
            b.append("fix,").append(f.session()).append(',').append(f.utc()).append(',')
                    .append(Angles.formatLatitude(p.latDeg())).append(',').append(Angles.formatLongitude(p.lonDeg()))
                    .append(",,\n");
        }
        AnswerKey.SightKey s1 = k.sights().get(0);
        b.append(String.format(Locale.ROOT, "sight,1,,,,%.6f,%n",
                s1.with(Mistake.INDEX_ERROR_WRONG_SIGN).orElseThrow().hoDeg()));
        AnswerKey.SightKey s3 = k.sights().get(2);
        b.append(String.format(Locale.ROOT, "sight,3,,,,%.6f,%+.3f%n", s3.hoDeg(), s3.interceptNm()));
        return b.toString();
    }

    private static double distance(int argb, Color c) {
        double r = ((argb >> 16) & 255) / 255.0 - c.getRed();
        double g = ((argb >> 8) & 255) / 255.0 - c.getGreen();
        double bl = (argb & 255) / 255.0 - c.getBlue();
        return Math.sqrt(r * r + g * g + bl * bl);
    }

    private static int count(BufferedImage img, Color c) {
        int n = 0;
        for (int y = 0; y < img.getHeight(); y++) {
            for (int x = 0; x < img.getWidth(); x++) {
                n += distance(img.getRGB(x, y), c) < COLOUR_MATCH ? 1 : 0;
            }
        }
        return n;
    }

    /** Where SIS's World Mercator puts a position on the test view (pixels). */
    private static double[] pixel(AnswerKey.Position p) throws Exception {
        MathTransform sis = CRS.findOperation(CommonCRS.WGS84.geographic(), CRS.forCode("EPSG:3395"), null)
                .getMathTransform();
        double[] c = {p.latDeg(), p.lonDeg()};
        sis.transform(c, 0, c, 0, 1);
        return new double[] {VIEW.screenX(c[0]), VIEW.screenY(c[1])};
    }

    /** The centre of the pixels of a colour within 8 px of a point, or null if none. */
    private static double[] centroid(BufferedImage img, Color c, double[] at) {
        double sx = 0;
        double sy = 0;
        int n = 0;
        for (int y = (int) at[1] - 8; y <= (int) at[1] + 8; y++) {
            for (int x = (int) at[0] - 8; x <= (int) at[0] + 8; x++) {
                if (distance(img.getRGB(x, y), c) < COLOUR_MATCH) {
                    sx += x + 0.5;
                    sy += y + 0.5;
                    n++;
                }
            }
        }
        return n == 0 ? null : new double[] {sx / n, sy / n};
    }

    private record Run(HeadlessChart chart, TestContext ctx, DrillMode mode, List<Path> opened) {
        BufferedImage render() {
            return HeadlessFx.call(() -> chart.render(VIEW));
        }
    }

    private static Run start(Path userDir) {
        return HeadlessFx.call(() -> {
            HeadlessChart hc = new HeadlessChart(NO_CHART, Palette.DAY, false);
            hc.model().layers().stream().filter(l -> l.kind() != LayerEntry.Kind.OVERLAY)
                    .forEach(l -> l.visibleProperty().set(false));
            TestContext ctx = new TestContext(hc, userDir);
            List<Path> opened = new ArrayList<>();
            DrillMode m = DrillMode.install(ctx, opened::add);
            return new Run(hc, ctx, m, opened);
        });
    }

    @Test
    void truthHiddenUntilRevealedThenAtItsPixels() throws Exception {
        Run r = start(Files.createDirectories(tmp.resolve("user1")));
        List<String> names = HeadlessFx.call(() -> r.chart().model().layers().stream()
                .filter(l -> l.kind() == LayerEntry.Kind.OVERLAY).map(LayerEntry::name).toList());
        assertEquals(List.of("Drill: truth (true track, true positions)", "Drill: key's fixes",
                "Drill: student's fixes"), names, "the three drill layers are in the layer list, truth on top");

        HeadlessFx.call(() -> r.mode().open(pack)).get(60, TimeUnit.SECONDS);
        assertEquals(1, r.opened().size(), "the drill's passage was handed to the plugin to open: " + r.ctx().notes);
        assertTrue(Files.isRegularFile(r.opened().get(0)), "the drill's passage file exists");
        assertTrue(HeadlessFx.call(() -> r.mode().state().key().get().isPresent()
                && r.mode().state().trueTrack().get().isPresent()), "key and true track read");
        HeadlessFx.call(() -> r.mode().loadAnswers(List.of(answers))).get(60, TimeUnit.SECONDS);

        BufferedImage hidden = r.render();
        assertEquals(0, HeadlessFx.call(() -> r.mode().truthFiguresPainted()), "the truth layer draws nothing");
        assertEquals(0, count(hidden, DrillStyle.TRUTH), "no truth-coloured pixel while the truth is hidden");
        assertEquals(0, count(hidden.getSubimage(0, 0, VIEW.widthPx(), VIEW.heightPx() - SCALE_BAR_PX), DrillStyle.KEY),
                "no key-coloured pixel while the truth is hidden (above the shell's dark scale bar)");
        assertTrue(count(hidden, DrillStyle.STUDENT) > 0, "the student's own fixes are drawn");
        assertTrue(count(hidden, DrillStyle.BANNER) > 0, "the 'GPS withheld' banner is on the chart");

        assertTrue(HeadlessFx.call(() -> r.mode().reveal()), "revealed");
        BufferedImage shown = r.render();
        // 1 true track + 4 true positions + 3 error lines (the fourth fix was not handed in)
        assertEquals(8, HeadlessFx.call(() -> r.mode().truthFiguresPainted()), "figures of the truth layer");
        for (AnswerKey.FixKey f : key.fixes()) {
            double[] want = pixel(f.truth());
            double[] got = centroid(shown, DrillStyle.TRUTH, want);
            assertTrue(got != null, "truth drawn near " + f.session());
            assertEquals(want[0], got[0], PIXEL_TOLERANCE_PX, "x of the true position, " + f.session());
            assertEquals(want[1], got[1], PIXEL_TOLERANCE_PX, "y of the true position, " + f.session());
            double[] k = pixel(f.fix());
            assertTrue(centroid(shown, DrillStyle.KEY, k) != null, "key's fix drawn at its place, " + f.session());
        }

        HeadlessFx.run(() -> r.mode().hide());
        BufferedImage again = r.render();
        assertEquals(0, count(again, DrillStyle.TRUTH), "hidden again: no truth-coloured pixel");
        HeadlessFx.run(() -> r.chart().close());
    }

    @Test
    void panelShowsTheGradersNumbersOnlyOnceRevealed() throws Exception {
        Run r = start(Files.createDirectories(tmp.resolve("user2")));
        HeadlessFx.call(() -> r.mode().open(pack)).get(60, TimeUnit.SECONDS);
        HeadlessFx.call(() -> r.mode().loadAnswers(List.of(answers))).get(60, TimeUnit.SECONDS);
        DrillPanel panel = HeadlessFx.call(() -> new DrillPanel(r.mode().state(), () -> { }, () -> { }, () -> { }));
        assertTrue(HeadlessFx.call(panel::bannerText).startsWith("Drill: GPS withheld"), "banner while withheld");
        assertTrue(HeadlessFx.call(panel::rows).isEmpty(), "no grade listed before the reveal");

        StudentGrade want = DrillGrader.grade(key, StudentAnswers.read(answers));
        HeadlessFx.call(() -> r.mode().reveal());
        List<DrillRow> rows = HeadlessFx.call(panel::rows);
        assertEquals(want.fixes().size(), rows.size(), "one row per fix asked for");
        for (int i = 0; i < rows.size(); i++) {
            StudentGrade.FixGrade g = want.fixes().get(i);
            DrillRow row = rows.get(i);
            String what = "fix " + g.session();
            assertEquals(g.student(), row.student(), what + ": student's position");
            assertEquals(g.keyFix(), row.keyFix(), what + ": key's fix");
            assertEquals(g.truth(), row.truth(), what + ": truth");
            assertEquals(g.errorFromKeyNm(), row.errorFromKeyNm(), what + ": error from the key");
            assertEquals(g.errorFromTruthNm(), row.errorFromTruthNm(), what + ": error from the truth");
            assertEquals(g.points(), row.points(), 0.0, what + ": points");
            assertEquals(g.mistakes(), row.mistakes(), what + ": mistakes");
        }
        // Our invented answers: the first fix is 2 nm from the key's fix, the fourth not handed in.
        assertEquals(2.0, rows.get(0).errorFromKeyNm().getAsDouble(), 0.05, "first fix 2 nm from the key's");
        assertTrue(rows.get(3).student().isEmpty(), "fourth fix not handed in");
        assertEquals(want.comments(), HeadlessFx.call(panel::comments), "the grader's comments, in its order");
        assertTrue(want.comments().stream().anyMatch(c -> c.contains("index error")),
                "the wrong-sign index error of sight 1 is among the comments: " + want.comments());
        assertEquals(String.format(Locale.ROOT, "score %.1f / 100", want.score()), HeadlessFx.call(panel::scoreText),
                "the grader's score");
        assertTrue(HeadlessFx.call(panel::bannerText).startsWith("Drill: truth revealed"), "banner once revealed");
        HeadlessFx.run(() -> r.chart().close());
    }

    @Test
    void aStudentPackHasNothingToReveal() throws Exception {
        Run r = start(Files.createDirectories(tmp.resolve("user3")));
        Path student = tmp.resolve("handed-out");
        Files.createDirectories(student);
        for (String f : List.of("sight-log.csv", "dr-log.csv")) {
            Files.copy(pack.resolve("student").resolve(f), student.resolve(f));
        }
        HeadlessFx.call(() -> r.mode().open(student)).get(60, TimeUnit.SECONDS);
        assertTrue(HeadlessFx.call(() -> r.mode().state().isOpen()), "the student pack opens");
        assertFalse(HeadlessFx.call(() -> r.mode().reveal()), "nothing to reveal without the key");
        assertTrue(r.ctx().notes.stream().anyMatch(n -> n.contains("watch error")),
                "told to type the watch error from the sheet: " + r.ctx().notes);
        assertEquals(0, count(r.render(), DrillStyle.TRUTH), "no truth-coloured pixel");
        HeadlessFx.run(() -> r.chart().close());
    }
}
