package org.sightwork.geo.app;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.image.BufferedImage;
import java.util.List;
import javafx.embed.swing.SwingFXUtils;
import org.junit.jupiter.api.Test;
import org.locationtech.jts.geom.Envelope;
import org.sightwork.geo.chart.ChartSet;
import org.sightwork.geo.earth.Mercator;
import org.sightwork.geo.render.Palette;
import org.sightwork.geo.render.Viewport;
import org.sightwork.geo.testing.HeadlessFx;
import org.sightwork.geo.testing.TestMarkPlugin;

/**
 * {@code PluginContext.renderChart()} headless: the picture is the view last rendered, pixel for
 * pixel, or before any rendering the area last shown at 1200 x 800, with the plugins' overlays on
 * it (the test plugin's marker on its pixel).
 */
class RenderChartTest {

    private static final ChartSet NO_CHART = new ChartSet(List.of(), List.of(), new Envelope(), new Envelope());

    @Test
    void theChartViewAsAPicture() {
        BufferedImage[] imgs = HeadlessFx.call(() -> {
            HeadlessChart hc = new HeadlessChart(NO_CHART, Palette.DAY, true);
            hc.showArea(36.3, -28.9, 38.2, -26.1);
            BufferedImage shown = SwingFXUtils.fromFXImage(hc.renderChart(), null);
            Viewport v = Viewport.fitting(37, -28, 37.5, -27, 640, 480);
            BufferedImage rendered = hc.render(v);
            BufferedImage again = SwingFXUtils.fromFXImage(hc.renderChart(), null);
            hc.close();
            return new BufferedImage[] {shown, rendered, again};
        });
        assertEquals(HeadlessChart.DEFAULT_WIDTH_PX, imgs[0].getWidth(), "width before any render");
        assertEquals(HeadlessChart.DEFAULT_HEIGHT_PX, imgs[0].getHeight(), "height before any render");
        Viewport area = Viewport.fitting(36.3, -28.9, 38.2, -26.1, 1200, 800);
        int x = (int) Math.floor(area.screenX(Mercator.eastingM(TestMarkPlugin.CENTRE.lonDeg())));
        int y = (int) Math.floor(area.screenY(Mercator.northingM(TestMarkPlugin.CENTRE.latDeg())));
        // the test plugin's filled 12 px square (our own colour, exact on its centre pixel)
        assertEquals(TestMarkPlugin.MARK.toString(), javafx.scene.paint.Color.rgb((imgs[0].getRGB(x, y) >> 16) & 255,
                (imgs[0].getRGB(x, y) >> 8) & 255, imgs[0].getRGB(x, y) & 255).toString(), "the overlay is in the picture");
        assertEquals(640, imgs[2].getWidth(), "the last view's width");
        assertEquals(480, imgs[2].getHeight(), "the last view's height");
        int differ = 0;
        for (int j = 0; j < 480; j++) {
            for (int i = 0; i < 640; i++) {
                differ += imgs[1].getRGB(i, j) == imgs[2].getRGB(i, j) ? 0 : 1;
            }
        }
        assertEquals(0, differ, "the picture is the view last rendered, pixel for pixel");
        assertTrue(imgs[1].getRGB(0, 0) != 0, "painted");
    }
}
