package org.sightwork.celestial.ui;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.image.BufferedImage;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import javafx.scene.paint.Color;
import javax.imageio.ImageIO;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.sightwork.celestial.almanac.Almanac;
import org.sightwork.celestial.planning.SelectionCriteria;
import org.sightwork.celestial.planning.SightPlan;
import org.sightwork.celestial.planning.StarSelector;
import org.sightwork.celestial.planning.VisibleBody;
import org.sightwork.geo.earth.GeoPosition;

/**
 * The sky view drawn headless (Monocle, software rendering, from surefire's argLine) and read back
 * from the PNG: the geometry of the plot (north up, east right, zenith at the centre) is checked by
 * the colours found where things must be. Non-regression of the drawing; the positions drawn are
 * the planner's, validated elsewhere.
 */
class SkyViewTest {

    private static final double SIZE = 600;

    private static SightPlan plan() {
        // Evening twilight in the North Atlantic, 2026-09-12 (a date and place of our own choosing).
        return new StarSelector(Almanac.standard()).plan(Instant.parse("2026-09-12T22:10:00Z"),
                new GeoPosition(35.0, -40.0), SelectionCriteria.DEFAULT.withSetSize(4));
    }

    @Test
    void pngShowsHorizonRingsAndTheChosenSet(@TempDir Path dir) throws Exception {
        SightPlan p = plan();
        Path png = dir.resolve("sky.png");
        SkyView.writePng(p, SIZE, png);
        BufferedImage img = ImageIO.read(png.toFile());
        assertEquals((int) SIZE, img.getWidth(), "width");
        double rh = SIZE / 2 - 34;
        double cy = SIZE / 2 + 12;
        // The horizon circle straight below the centre (south) and the frame outside it.
        // Antialiased line: within 0.2 of its colour, still far from the rings' and the sky's.
        assertTrue(near(img, SIZE / 2 + 20, cy + rh, SkyView.HORIZON, 2, 0.2), "horizon circle at the bottom");
        assertTrue(near(img, SIZE / 2 + rh, cy, SkyView.HORIZON, 2, 0.2), "horizon circle to the east");
        assertTrue(isColour(img.getRGB(5, (int) SIZE - 5), SkyView.FRAME, 0.02), "frame outside");
        // Sky between the rings, away from spokes and bodies.
        assertTrue(nearOrSky(img, SIZE / 2 + rh * 0.85 * Math.sin(Math.toRadians(15)), cy - rh * 0.85 * Math.cos(Math.toRadians(15))),
                "sky inside the horizon");
        // Each chosen body has its amber ring at the right place: altitude inward, azimuth clockwise from up.
        for (VisibleBody b : p.chosen()) {
            double r = rh * (90 - b.hcDeg()) / 90;
            double x = SIZE / 2 + r * Math.sin(Math.toRadians(b.znDeg()));
            double y = cy - r * Math.cos(Math.toRadians(b.znDeg()));
            assertTrue(near(img, x, y, SkyView.CHOSEN, 14), "ring of " + b.body().name());
        }
        assertTrue(Files.size(png) > 10_000, "a real picture");
    }

    private static boolean near(BufferedImage img, double x, double y, Color c, int radius) {
        return near(img, x, y, c, radius, 0.08);
    }

    private static boolean near(BufferedImage img, double x, double y, Color c, int radius, double tol) {
        for (int dx = -radius; dx <= radius; dx++) {
            for (int dy = -radius; dy <= radius; dy++) {
                int px = (int) Math.round(x) + dx;
                int py = (int) Math.round(y) + dy;
                if (px >= 0 && py >= 0 && px < img.getWidth() && py < img.getHeight()
                        && isColour(img.getRGB(px, py), c, tol)) {
                    return true;
                }
            }
        }
        return false;
    }

    private static boolean nearOrSky(BufferedImage img, double x, double y) {
        return near(img, x, y, SkyView.SKY, 3);
    }

    private static boolean isColour(int argb, Color c, double tol) {
        double r = ((argb >> 16) & 0xff) / 255.0;
        double g = ((argb >> 8) & 0xff) / 255.0;
        double b = (argb & 0xff) / 255.0;
        return Math.abs(r - c.getRed()) < tol && Math.abs(g - c.getGreen()) < tol && Math.abs(b - c.getBlue()) < tol;
    }
}
