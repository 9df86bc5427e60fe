package org.sightwork.geo.app;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.image.BufferedImage;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import javax.imageio.ImageIO;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.sightwork.geo.testing.TestCharts;

/** {@code sightwork chart} end to end: options, exit codes, the PNG written, bad input reported. */
class ChartCommandTest {

    private record Run(int code, String out, String err) {
    }

    private static Run run(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int code = Main.run(args, new PrintWriter(out, true), new PrintWriter(err, true));
        return new Run(code, out.toString(), err.toString());
    }

    @Test
    void rendersAChartToPng(@TempDir Path tmp) throws Exception {
        Path png = tmp.resolve("map.png");
        Run r = run("chart", "--chart", TestCharts.file("demo-region.gpkg").toString(),
                "--extent", "37.5,-28.9,39.2,-26.9", "--size", "640x400", "--out", png.toString(), "--palette", "night");
        assertEquals(0, r.code(), r.err());
        BufferedImage img = ImageIO.read(png.toFile());
        assertEquals(640, img.getWidth(), "width");
        assertEquals(400, img.getHeight(), "height");
        try (var files = Files.list(tmp)) {
            assertEquals(1, files.count(), "no temporary file left behind");
        }
    }

    @Test
    void badInputGoesOnWithAWarning(@TempDir Path tmp) {
        Path png = tmp.resolve("map.png");
        Run r = run("chart", "--chart", TestCharts.file("fixtures/truncated.gpkg").toString(),
                "--chart", TestCharts.file("demo-region.gpkg").toString(), "--size", "320x200", "--out", png.toString());
        assertEquals(0, r.code(), r.err());
        assertTrue(r.err().contains("truncated.gpkg"), "the bad file is named: " + r.err());
        assertTrue(Files.isRegularFile(png), "the good file is drawn");
    }

    @Test
    void usageErrorsExitWithTwo(@TempDir Path tmp) {
        Run size = run("chart", "--size", "big", "--out", tmp.resolve("a.png").toString());
        assertEquals(Main.EXIT_USAGE, size.code(), "bad size");
        assertTrue(size.err().contains("WIDTHxHEIGHT"), size.err());
        Run ext = run("chart", "--extent", "40,-30,39,-28", "--out", tmp.resolve("a.png").toString());
        assertEquals(Main.EXIT_USAGE, ext.code(), "north south of south");
    }
}
