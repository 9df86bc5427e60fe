package org.sightwork.geo.app;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.image.BufferedImage;
import java.util.List;
import javafx.scene.paint.Color;
import net.sf.geographiclib.Geodesic;
import net.sf.geographiclib.GeodesicData;
import org.apache.sis.referencing.CRS;
import org.apache.sis.referencing.CommonCRS;
import org.junit.jupiter.api.Test;
import org.locationtech.jts.geom.Envelope;
import org.opengis.referencing.operation.MathTransform;
import org.sightwork.geo.chart.ChartSet;
import org.sightwork.geo.render.Palette;
import org.sightwork.geo.render.Viewport;
import org.sightwork.geo.testing.HeadlessFx;
import org.sightwork.geo.testing.TestMarkPlugin;

/**
 * The plugin contract, end to end: the test plugin (found by ServiceLoader from
 * {@code src/test/resources/META-INF/services}) adds an overlay that is listed in the layer list and
 * whose marker and small circle are on the right pixels. Circle points are computed outside our
 * code: GeographicLib's direct problem on a sphere (f = 0), projected with SIS's EPSG:3395.
 */
class PluginOverlayTest {

    private static final ChartSet NO_CHART = new ChartSet(List.of(), List.of(), new Envelope(), new Envelope());

    private static double distance(int argb, Color c) {
        double r = ((argb >> 16) & 255) / 255.0 - c.getRed();
        double g = ((argb >> 8) & 255) / 255.0 - c.getGreen();
        double b = (argb & 255) / 255.0 - c.getBlue();
        return Math.sqrt(r * r + g * g + b * b);
    }

    @Test
    void markerAndCircleAreWhereThePluginPutThem() throws Exception {
        Viewport v = Viewport.fitting(36.3, -28.9, 38.2, -26.1, 1200, 900);
        MathTransform sis = CRS.findOperation(CommonCRS.WGS84.geographic(), CRS.forCode("EPSG:3395"), null)
                .getMathTransform();
        BufferedImage[] imgs = HeadlessFx.call(() -> {
            HeadlessChart hc = new HeadlessChart(NO_CHART, Palette.DAY, true);
            assertTrue(hc.pluginNames().contains("Test marks"), "plugin started: " + hc.pluginNames());
            LayerEntry overlay = hc.model().layers().stream().filter(l -> l.name().equals(TestMarkPlugin.OVERLAY))
                    .findFirst().orElseThrow();
            assertEquals(LayerEntry.Kind.OVERLAY, overlay.kind(), "listed as an overlay");
            hc.model().layers().stream().filter(l -> l.kind() == LayerEntry.Kind.GRATICULE)
                    .forEach(l -> l.visibleProperty().set(false));
            BufferedImage shown = hc.render(v);
            overlay.visibleProperty().set(false);
            BufferedImage hidden = hc.render(v);
            hc.close();
            return new BufferedImage[] {shown, hidden};
        });
        double[] c = {TestMarkPlugin.CENTRE.latDeg(), TestMarkPlugin.CENTRE.lonDeg()};
        sis.transform(c, 0, c, 0, 1);
        int cx = (int) Math.floor(v.screenX(c[0]));
        int cy = (int) Math.floor(v.screenY(c[1]));
        assertTrue(distance(imgs[0].getRGB(cx, cy), TestMarkPlugin.MARK) < 0.02, "marker at its centre pixel");
        assertTrue(distance(imgs[0].getRGB(cx + 8, cy), Palette.DAY.sea()) < 0.02, "marker is 12 px: sea 8 px right");
        assertTrue(distance(imgs[1].getRGB(cx, cy), Palette.DAY.sea()) < 0.02, "hidden overlay is not painted");

        // Circle of 30 nm = 30′ of arc on the navigator's sphere: points by GeographicLib on a unit sphere.
        Geodesic sphere = new Geodesic(1.0, 0.0);
        double deltaDeg = TestMarkPlugin.RADIUS_NM / 60.0;
        int onCircle = 0;
        for (int az = 0; az < 360; az += 15) {
            GeodesicData d = sphere.Direct(TestMarkPlugin.CENTRE.latDeg(), TestMarkPlugin.CENTRE.lonDeg(), az,
                    Math.toRadians(deltaDeg));
            double[] p = {d.lat2, d.lon2};
            sis.transform(p, 0, p, 0, 1);
            int x = (int) Math.floor(v.screenX(p[0]));
            int y = (int) Math.floor(v.screenY(p[1]));
            boolean hit = false;
            for (int dx = -1; dx <= 1; dx++) {
                for (int dy = -1; dy <= 1; dy++) {
                    hit |= distance(imgs[0].getRGB(x + dx, y + dy), TestMarkPlugin.CIRCLE) < 0.15;
                }
            }
            assertTrue(hit, "circle within 1 px of azimuth " + az + "° point (" + x + "," + y + ")");
            onCircle++;
            // 20 nm from the centre is inside the circle, away from the line and the marker: sea
            GeodesicData in = sphere.Direct(TestMarkPlugin.CENTRE.latDeg(), TestMarkPlugin.CENTRE.lonDeg(), az,
                    Math.toRadians(20 / 60.0));
            double[] q = {in.lat2, in.lon2};
            sis.transform(q, 0, q, 0, 1);
            assertTrue(distance(imgs[0].getRGB((int) v.screenX(q[0]), (int) v.screenY(q[1])), Palette.DAY.sea()) < 0.02,
                    "sea inside the circle at azimuth " + az + "°");
        }
        assertEquals(24, onCircle, "circle points checked");
    }
}
