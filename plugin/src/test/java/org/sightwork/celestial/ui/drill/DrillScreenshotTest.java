package org.sightwork.celestial.ui.drill;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.Graphics2D;
import java.awt.image.BufferedImage;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.TimeUnit;
import javafx.embed.swing.SwingFXUtils;
import javafx.scene.Scene;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.condition.EnabledIfSystemProperty;
import org.junit.jupiter.api.io.TempDir;
import org.sightwork.celestial.drill.AnswerKeyIo;
import org.sightwork.geo.app.HeadlessChart;
import org.sightwork.geo.app.LayerEntry;
import org.sightwork.geo.chart.ChartSet;
import org.sightwork.geo.render.Palette;
import org.sightwork.geo.render.Viewport;
import org.sightwork.geo.testing.HeadlessFx;
import org.sightwork.geo.testing.TestCharts;

/**
 * Makes the documentation's picture of the drill mode ({@code docs/images/drill-mode.png}): the
 * demo chart with the truth revealed beside the drill panel, rendered headless. Not a check: run
 * on purpose with {@code -Dsightwork.drill.screenshot=FILE}.
 */
class DrillScreenshotTest {

    @Test
    @EnabledIfSystemProperty(named = "sightwork.drill.screenshot", matches = ".+")
    void writeTheDocsPicture(@TempDir Path tmp) throws Exception {
        Path out = Path.of(System.getProperty("sightwork.drill.screenshot"));
        Path pack = DrillPacks.demo(Files.createDirectories(tmp.resolve("petrel")));
        Path answers = tmp.resolve("ana.csv");
        Files.writeString(answers, DrillModeTest.answersOf(AnswerKeyIo.read(pack.resolve("key/answer-key.json"))),
                StandardCharsets.UTF_8);
        ChartSet chart = ChartSet.load(List.of(TestCharts.file("demo-region.gpkg")), false, f -> { });
        Viewport view = Viewport.fitting(37.78, -28.25, 38.42, -26.75, 900, 640);
        HeadlessChart hc = HeadlessFx.call(() -> new HeadlessChart(chart, Palette.DAY, false));
        TestContext ctx = new TestContext(hc, Files.createDirectories(tmp.resolve("user")));
        DrillMode mode = HeadlessFx.call(() -> DrillMode.install(ctx, p -> { }));
        HeadlessFx.call(() -> mode.open(pack)).get(60, TimeUnit.SECONDS);
        HeadlessFx.call(() -> mode.loadAnswers(List.of(answers))).get(60, TimeUnit.SECONDS);
        BufferedImage img = HeadlessFx.call(() -> {
            hc.model().layers().stream().filter(l -> l.kind() == LayerEntry.Kind.GRATICULE)
                    .forEach(l -> l.visibleProperty().set(true));
            mode.reveal();
            BufferedImage map = hc.render(view);
            DrillPanel panel = new DrillPanel(mode.state(), () -> { }, () -> { }, () -> { });
            Scene scene = new Scene(panel, 560, 640);
            BufferedImage side = SwingFXUtils.fromFXImage(scene.snapshot(null), null);
            BufferedImage all = new BufferedImage(map.getWidth() + side.getWidth(), 640, BufferedImage.TYPE_INT_RGB);
            Graphics2D g = all.createGraphics();
            g.drawImage(map, 0, 0, null);
            g.drawImage(side, map.getWidth(), 0, null);
            g.dispose();
            hc.close();
            return all;
        });
        javax.imageio.ImageIO.write(img, "png", out.toFile());
        assertTrue(Files.size(out) > 0, "written");
    }
}
