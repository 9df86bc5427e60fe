package org.sightwork.geo.render;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.sightwork.geo.earth.GeoPosition;
import org.sightwork.geo.earth.Mercator;

/** Non-regression of the viewport's arithmetic (exact identities of the affine map; no outside source needed). */
class ViewportTest {

    private static final double TOL_PX = 1e-6;

    @Test
    void fitShowsTheWholeExtentCentredAtTrueAspect() {
        Viewport v = Viewport.fitting(36.5, -32, 40.5, -24, 1600, 1000);
        double x0 = v.screenX(Mercator.eastingM(-32));
        double x1 = v.screenX(Mercator.eastingM(-24));
        double y0 = v.screenY(Mercator.northingM(36.5));
        double y1 = v.screenY(Mercator.northingM(40.5));
        assertEquals(800, (x0 + x1) / 2, TOL_PX, "centred across");
        assertEquals(500, (y0 + y1) / 2, TOL_PX, "centred up and down");
        assertTrue(x0 >= -TOL_PX && x1 <= 1600 + TOL_PX && y1 >= -TOL_PX && y0 <= 1000 + TOL_PX, "all in view");
        assertTrue(Math.abs(x1 - x0 - 1600) < TOL_PX || Math.abs(y0 - y1 - 1000) < TOL_PX, "fills one axis");
    }

    @Test
    void zoomKeepsThePointUnderTheCursor() {
        Viewport v = Viewport.fitting(36.5, -32, 40.5, -24, 1600, 1000);
        GeoPosition before = v.positionAt(300, 700);
        Viewport z = v.zoomedAbout(300, 700, 3.7);
        GeoPosition after = z.positionAt(300, 700);
        assertEquals(before.latDeg(), after.latDeg(), 1e-9, "latitude under cursor");
        assertEquals(before.lonDeg(), after.lonDeg(), 1e-9, "longitude under cursor");
        assertEquals(v.metresPerPx() / 3.7, z.metresPerPx(), 1e-9, "scale");
    }

    @Test
    void panMovesTheChartWithThePointer() {
        Viewport v = Viewport.fitting(36.5, -32, 40.5, -24, 1600, 1000);
        GeoPosition p = v.positionAt(100, 100);
        Viewport m = v.panned(50, -20);
        GeoPosition q = m.positionAt(150, 80);
        assertEquals(p.latDeg(), q.latDeg(), 1e-9, "latitude follows");
        assertEquals(p.lonDeg(), q.lonDeg(), 1e-9, "longitude follows");
    }

    @Test
    void acrossTheAntimeridian() {
        Viewport v = Viewport.fitting(-20, 170, -10, -170, 800, 600);
        assertEquals(180.0, Math.abs(v.positionAt(400, 300).lonDeg()), 1e-9, "centre on the antimeridian");
    }

    @Test
    void scaleBarIsANiceLengthThatFits() {
        Viewport v = Viewport.fitting(36.5, -32, 40.5, -24, 1600, 1000);
        double nm = ScaleBar.lengthNm(v);
        double px = nm * v.pixelsPerNm(v.centreLatDeg());
        assertTrue(px <= ScaleBar.MAX_LENGTH_PX && px > ScaleBar.MAX_LENGTH_PX / 2.5, "length " + px + " px");
        double mant = nm / Math.pow(10, Math.floor(Math.log10(nm)));
        assertTrue(Math.abs(mant - 1) < 1e-9 || Math.abs(mant - 2) < 1e-9 || Math.abs(mant - 5) < 1e-9, "nice " + nm);
    }
}
