package org.sightwork.geo.app;

import java.awt.image.BufferedImage;
import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;
import javax.imageio.ImageIO;
import org.locationtech.jts.geom.Envelope;
import org.sightwork.geo.chart.ChartProblem;
import org.sightwork.geo.chart.ChartSet;
import org.sightwork.geo.earth.Angles;
import org.sightwork.geo.files.SafeWrite;
import org.sightwork.geo.render.Palette;
import org.sightwork.geo.render.Viewport;
import org.sightwork.geo.spi.Lighting;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/**
 * {@code sightwork chart}: renders the chart, with the plugins' overlays, to a PNG without a
 * display (JavaFX on Monocle, software rendering).
 */
@Command(name = "chart", mixinStandardHelpOptions = true,
        description = {"Renders the chart to a PNG image without a display.",
                "The whole extent is shown, centred, at true Mercator aspect; the other axis is widened",
                "to fill the image. With no --chart, the bundled chart (test-charts/) is used."},
        footer = {"", Caution.TEXT})
public final class ChartCommand implements Callable<Integer> {

    @Spec
    private CommandSpec spec;

    @Option(names = "--extent", paramLabel = "S,W,N,E",
            description = "Area to show: south, west, north, east edges (degrees, or d°m.m′ with N/S/E/W). "
                    + "Default: all the data.")
    private String extent;

    @Option(names = "--size", paramLabel = "WxH", defaultValue = "1600x1000",
            description = "Image size in pixels (default ${DEFAULT-VALUE}).")
    private String size;

    @Option(names = "--out", paramLabel = "FILE", required = true, description = "The PNG to write.")
    private Path out;

    @Option(names = "--palette", paramLabel = "LIGHT", defaultValue = "day",
            description = "day, dusk or night (default ${DEFAULT-VALUE}).")
    private Lighting lighting;

    @Option(names = "--chart", paramLabel = "FILE",
            description = "A chart file (GeoPackage or GeoJSON), least detailed first; may be repeated.")
    private List<Path> charts = new ArrayList<>();

    @Option(names = "--no-plugins", description = "Leave the plugins' overlays out.")
    private boolean noPlugins;

    @Override
    public Integer call() throws Exception {
        PrintWriter err = spec.commandLine().getErr();
        int[] wh = parseSize(size);
        double[] swne = extent == null ? null : parseExtent(extent);
        List<Path> files = charts.isEmpty() ? BundledChart.files() : charts;
        if (files.isEmpty()) {
            err.println("sightwork chart: no chart data: the bundled chart is not in " + BundledChart.directory()
                    + " and no --chart was given");
            return Main.EXIT_FAILED;
        }
        ChartSet chart = ChartSet.load(files, charts.isEmpty(), f -> { });
        for (ChartProblem p : chart.problems()) {
            err.println("sightwork chart: warning: " + p);
        }
        Envelope e = chart.extentDeg();
        if (swne == null && e.isNull()) {
            err.println("sightwork chart: nothing could be read from the chart files, and no --extent was given");
            return Main.EXIT_FAILED;
        }
        Viewport v = swne != null
                ? Viewport.fitting(swne[0], swne[1], swne[2], swne[3], wh[0], wh[1])
                : Viewport.fitting(e.getMinY(), e.getMinX(), e.getMaxY(), e.getMaxX(), wh[0], wh[1]);
        HeadlessPlatform.start();
        HeadlessChart hc = HeadlessPlatform.call(() -> new HeadlessChart(chart, Palette.of(lighting), !noPlugins));
        try {
            hc.awaitIdle(60_000);
            BufferedImage img = HeadlessPlatform.call(() -> hc.render(v));
            writeAtomically(img, out);
        } finally {
            HeadlessPlatform.call(() -> {
                hc.close();
                return null;
            });
        }
        spec.commandLine().getOut().printf(Locale.ROOT, "wrote %s (%dx%d px, %s to %s)%n", out, wh[0], wh[1],
                v.positionAt(0, wh[1]), v.positionAt(wh[0], 0));
        return 0;
    }

    /**
     * Writes a PNG through {@link SafeWrite} (a temporary file in the same directory, then a rename),
     * making the directory if missing.
     *
     * @param img the image
     * @param file the PNG
     * @throws IOException if it cannot be written
     */
    static void writeAtomically(BufferedImage img, Path file) throws IOException {
        Files.createDirectories(file.toAbsolutePath().getParent());
        SafeWrite.write(file, out -> {
            if (!ImageIO.write(img, "png", out)) {
                throw new IOException("no PNG writer available");
            }
        });
    }

    static int[] parseSize(String s) {
        String[] p = s.toLowerCase(Locale.ROOT).split("x");
        try {
            if (p.length == 2) {
                int w = Integer.parseInt(p[0].strip());
                int h = Integer.parseInt(p[1].strip());
                if (w >= 16 && h >= 16 && w <= 8192 && h <= 8192) {
                    return new int[] {w, h};
                }
            }
        } catch (NumberFormatException e) {
            // fall through
        }
        throw new IllegalArgumentException("--size '" + s + "': expected WIDTHxHEIGHT in pixels, 16 to 8192, "
                + "such as 1600x1000");
    }

    static double[] parseExtent(String s) {
        String[] p = s.split(",");
        if (p.length != 4) {
            throw new IllegalArgumentException("--extent '" + s + "': expected four values S,W,N,E such as "
                    + "36.5,-32,40.5,-24");
        }
        double south = Angles.parseLatitude(p[0]);
        double west = Angles.parseLongitude(p[1]);
        double north = Angles.parseLatitude(p[2]);
        double east = Angles.parseLongitude(p[3]);
        if (!(north > south)) {
            throw new IllegalArgumentException("--extent '" + s + "': the north edge must be north of the south edge");
        }
        return new double[] {south, west, north, east};
    }
}
