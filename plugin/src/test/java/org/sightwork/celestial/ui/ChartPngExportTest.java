package org.sightwork.celestial.ui;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.awt.image.BufferedImage;
import java.nio.file.Files;
import java.nio.file.Path;
import javax.imageio.ImageIO;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.sightwork.geo.render.Viewport;
import org.sightwork.geo.testing.HeadlessFx;

/**
 * "Chart view as PNG": the file holds the chart view only (the view's size, not the window's), the
 * same pixels as the shell's renderer paints for that view, read back by the JDK's PNG reader.
 */
class ChartPngExportTest {

    @Test
    void thePngIsTheChartView(@TempDir Path home, @TempDir Path out) throws Exception {
        PluginHarness h = PluginHarness.startWithDemo(home);
        try {
            Path png = out.resolve("chart.png");
            Viewport v = HeadlessFx.call(() -> h.shownArea());
            BufferedImage expected = HeadlessFx.call(() -> {
                BufferedImage e = h.render(v);
                h.plugin.exportChartPng(png);
                return e;
            });
            PluginHarness.await(() -> h.notes.stream().anyMatch(n -> n.contains("PNG written")), "the PNG written");
            BufferedImage read = ImageIO.read(Files.newInputStream(png));
            assertEquals(v.widthPx(), read.getWidth(), "width: the chart view's");
            assertEquals(v.heightPx(), read.getHeight(), "height: the chart view's");
            int differ = 0;
            for (int y = 0; y < read.getHeight(); y++) {
                for (int x = 0; x < read.getWidth(); x++) {
                    differ += (read.getRGB(x, y) & 0xffffff) == (expected.getRGB(x, y) & 0xffffff) ? 0 : 1;
                }
            }
            assertEquals(0, differ, "pixels differing from the renderer's picture of the view");
        } finally {
            HeadlessFx.run(h::close);
        }
    }
}
