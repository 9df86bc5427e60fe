package org.sightwork.geo.render;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.image.BufferedImage;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.util.ArrayList;
import java.util.List;
import javafx.scene.paint.Color;
import org.apache.sis.referencing.CRS;
import org.apache.sis.referencing.CommonCRS;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.locationtech.jts.geom.Envelope;
import org.opengis.referencing.operation.MathTransform;
import org.sightwork.geo.app.BundledChart;
import org.sightwork.geo.app.HeadlessChart;
import org.sightwork.geo.chart.ChartSet;
import org.sightwork.geo.earth.Mercator;
import org.sightwork.geo.testing.HeadlessFx;
import org.sightwork.geo.testing.TestCharts;

/**
 * Validation of headless renders of the bundled chart: every probe point of
 * {@code test-charts/probe-points.tsv} (checked against GSHHG with GEOS and GMT when the charts were
 * made) is painted land or sea as expected; and every graticule line lies on the pixel computed
 * independently through Apache SIS's EPSG:3395 transform, within 1 px.
 */
class ChartPixelTest {

    private static ChartSet bundled;
    private static MathTransform sis;
    private static String cacheBefore;

    @AfterAll
    static void restoreCache() {
        if (cacheBefore == null) {
            System.clearProperty("sightwork.cache");
        } else {
            System.setProperty("sightwork.cache", cacheBefore);
        }
    }

    @BeforeAll
    static void load() throws Exception {
        List<java.nio.file.Path> files = new ArrayList<>();
        for (String f : BundledChart.FILES) {
            files.add(TestCharts.file(f));
        }
        // prepared here from the chart files, not read back from (nor written to) the prepared-chart cache
        cacheBefore = System.getProperty("sightwork.cache");
        System.setProperty("sightwork.cache", "none");
        bundled = ChartSet.load(files, true, f -> { });
        assertTrue(bundled.problems().isEmpty(), "bundled chart reads cleanly: " + bundled.problems());
        sis = CRS.findOperation(CommonCRS.WGS84.geographic(), CRS.forCode("EPSG:3395"), null).getMathTransform();
        HeadlessFx.start();
    }

    /** Screen point of a position through SIS (the outside reference), not through our Mercator. */
    private static double[] pixel(Viewport v, double latDeg, double lonDeg) throws Exception {
        double[] p = {latDeg, lonDeg};
        sis.transform(p, 0, p, 0, 1);
        return new double[] {(p[0] - v.centreXM()) / v.metresPerPx() + v.widthPx() / 2.0,
            v.heightPx() / 2.0 - (p[1] - v.centreYM()) / v.metresPerPx()};
    }

    private static double distance(int argb, Color c) {
        double r = ((argb >> 16) & 255) / 255.0 - c.getRed();
        double g = ((argb >> 8) & 255) / 255.0 - c.getGreen();
        double b = (argb & 255) / 255.0 - c.getBlue();
        return Math.sqrt(r * r + g * g + b * b);
    }

    private static BufferedImage render(ChartSet chart, Viewport v, boolean graticule) {
        return HeadlessFx.call(() -> {
            HeadlessChart hc = new HeadlessChart(chart, Palette.DAY, false);
            hc.model().layers().stream().filter(l -> l.name().equals("Graticule"))
                    .forEach(l -> l.visibleProperty().set(graticule));
            hc.model().layers().stream().filter(l -> l.name().equals("Place names"))
                    .forEach(l -> l.visibleProperty().set(false));
            BufferedImage img = hc.render(v);
            hc.close();
            return img;
        });
    }

    @Test
    void probePointsArePaintedLandOrSea() throws Exception {
        List<String> rows = Files.readAllLines(TestCharts.file("probe-points.tsv"), StandardCharsets.UTF_8);
        Viewport demo = Viewport.fitting(36.8, -29.0, 39.2, -24.6, 1600, 1000);
        Viewport world = Viewport.fitting(-60, -180, 75, 180, 1600, 1000);
        // First as the first frame draws it (full resolution only), then from the generalised zoom
        // bands (the world view from the coarsest, simplified to 1.5 px at its scale).
        for (boolean generalised : new boolean[] {false, true}) {
            if (generalised) {
                bundled.generalise(f -> { });
            }
            BufferedImage demoImg = render(bundled, demo, false);
            BufferedImage worldImg = render(bundled, world, false);
            int checked = 0;
            for (String row : rows.subList(1, rows.size())) {
                String[] c = row.split("\t");
                boolean isDemo = c[0].startsWith("demo");
                Viewport v = isDemo ? demo : world;
                BufferedImage img = isDemo ? demoImg : worldImg;
                double[] px = pixel(v, Double.parseDouble(c[1]), Double.parseDouble(c[2]));
                int argb = img.getRGB((int) Math.floor(px[0]), (int) Math.floor(px[1]));
                boolean land = distance(argb, Palette.DAY.land()) < distance(argb, Palette.DAY.sea());
                assertEquals(c[3], land ? "land" : "sea", c[0] + " at pixel " + (int) px[0] + "," + (int) px[1]
                        + (generalised ? " (generalised bands)" : " (full resolution)"));
                checked++;
            }
            assertEquals(26, checked, "probe points");
        }
    }

    @Test
    void graticuleLinesLieOnTheirPixels() throws Exception {
        ChartSet none = new ChartSet(List.of(), List.of(), new Envelope(), new Envelope());
        for (Viewport v : List.of(Viewport.fitting(36.8, -29.0, 39.2, -24.6, 1600, 1000),
                Viewport.fitting(38.4, -28.8, 38.6, -28.5, 1200, 800),
                Viewport.fitting(-60, -170, 70, 170, 1600, 1000))) {
            BufferedImage img = render(none, v, true);
            int step = Graticule.stepArcmin(v);
            double stepDeg = step / 60.0;
            double west = Mercator.longitudeDeg(v.xM(80));
            double east = Mercator.longitudeDeg(v.xM(v.widthPx() - 100));
            int row = v.heightPx() / 2 + 7; // a row between labels; parallels found separately below
            int lines = 0;
            for (long k = (long) Math.ceil(west / stepDeg); k * stepDeg <= east; k++) {
                double x = pixel(v, 0, k * stepDeg)[0];
                assertTrue(lineNear(img, (int) Math.floor(x), row, true), "meridian " + k * step + "′ near x=" + x
                        + " at step " + step + "′");
                lines++;
            }
            double south = Mercator.latitudeDeg(v.yM(v.heightPx() - 60));
            double north = Mercator.latitudeDeg(v.yM(30));
            int col = v.widthPx() / 2 + 7;
            for (long k = (long) Math.ceil(south / stepDeg); k * stepDeg <= north; k++) {
                double y = pixel(v, k * stepDeg, 0)[1];
                assertTrue(lineNear(img, (int) Math.floor(y), col, false), "parallel " + k * step + "′ near y=" + y);
                lines++;
            }
            assertTrue(lines >= 4, "lines checked in " + v + ": " + lines);
        }
    }

    /** A graticule-coloured pixel within 1 px of the expected one, and plain sea 4 px away (a thin line). */
    private static boolean lineNear(BufferedImage img, int at, int across, boolean vertical) {
        double seaDist = 0.08;
        boolean found = false;
        for (int d = -1; d <= 1; d++) {
            int argb = vertical ? img.getRGB(at + d, across) : img.getRGB(across, at + d);
            found |= distance(argb, Palette.DAY.sea()) > seaDist;
        }
        int far1 = vertical ? img.getRGB(at + 4, across) : img.getRGB(across, at + 4);
        int far2 = vertical ? img.getRGB(at - 4, across) : img.getRGB(across, at - 4);
        return found && distance(far1, Palette.DAY.sea()) < 0.02 && distance(far2, Palette.DAY.sea()) < 0.02;
    }
}
