package org.sightwork.celestial.planning;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.Random;
import net.sf.geographiclib.Geodesic;
import net.sf.geographiclib.GeodesicData;
import org.junit.jupiter.api.Test;
import org.sightwork.geo.earth.GeoPosition;

/**
 * Validation of the navigational triangle against GeographicLib on a sphere: Hc is 90° less the
 * great-circle distance from the DR to the body's geographical position (latitude Dec, longitude
 * −GHA), and Zn is the initial course of that great circle (the trade's definition).
 */
class HorizonTest {

    /** 1e-9 degree: two exact solutions of the same triangle; only rounding separates them. */
    private static final double EXACT_DEG = 1e-9;

    /** GeographicLib's geodesic on a unit sphere (flattening 0). */
    private static final Geodesic SPHERE = new Geodesic(1.0, 0.0);

    @Test
    void hcAndZnAgreeWithGeographicLibGreatCircles() {
        Random rnd = new Random(7L);
        for (int i = 0; i < 2000; i++) {
            GeoPosition dr = GeoPosition.of(-89 + 178 * rnd.nextDouble(), -180 + 360 * rnd.nextDouble());
            double gha = 360 * rnd.nextDouble();
            double dec = -89 + 178 * rnd.nextDouble();
            HorizonPoint h = Horizon.fromEquatorial(gha, dec, dr);
            GeodesicData g = SPHERE.Inverse(dr.latDeg(), dr.lonDeg(), dec, -gha);
            double distDeg = Math.toDegrees(g.s12);
            assertEquals(90.0 - distDeg, h.altitudeDeg(), EXACT_DEG, "Hc, case " + i);
            if (distDeg > 1e-6 && distDeg < 180 - 1e-6) {
                assertEquals(0.0, Horizon.norm180(Horizon.norm360(g.azi1) - h.azimuthDeg()), 1e-8, "Zn, case " + i);
            }
        }
    }

    @Test
    void horizonToEquatorialIsTheInverse() {
        // Round trip (non-regression of the inverse against the forward formula validated above).
        Random rnd = new Random(11L);
        for (int i = 0; i < 2000; i++) {
            GeoPosition dr = GeoPosition.of(-85 + 170 * rnd.nextDouble(), -180 + 360 * rnd.nextDouble());
            double gha = 360 * rnd.nextDouble();
            double dec = -85 + 170 * rnd.nextDouble();
            HorizonPoint h = Horizon.fromEquatorial(gha, dec, dr);
            double[] back = Horizon.toEquatorial(h, dr);
            assertEquals(dec, back[1], EXACT_DEG, "Dec, case " + i);
            assertEquals(0.0, Horizon.norm180(gha - back[0]), 1e-8, "GHA, case " + i);
        }
    }

    @Test
    void separationAgreesWithGeographicLib() {
        Random rnd = new Random(13L);
        for (int i = 0; i < 1000; i++) {
            double a1 = -90 + 180 * rnd.nextDouble();
            double z1 = 360 * rnd.nextDouble();
            double a2 = -90 + 180 * rnd.nextDouble();
            double z2 = 360 * rnd.nextDouble();
            double ref = Math.toDegrees(SPHERE.Inverse(a1, z1, a2, z2).s12);
            assertEquals(ref, Horizon.separationDeg(a1, z1, a2, z2), EXACT_DEG, "separation, case " + i);
        }
    }

    @Test
    void observerOnTheEquatorAtGreenwichSitsOnTheXAxis() {
        // WGS84 a = 6378137 m (NIMA TR8350.2 table 3.1): the ECEF point of (0°, 0°, h) is (a + h, 0, 0).
        double[] o = Horizon.observerEcef(new GeoPosition(0, 0), 10.0);
        assertEquals(6378147.0, o[0], 1e-6, "x");
        assertEquals(0.0, o[1], 1e-6, "y");
        assertEquals(0.0, o[2], 1e-6, "z");
        // At the pole: z = b + h, b = a (1 − f) = 6356752.314 m (NIMA TR8350.2 table 3.3).
        double[] p = Horizon.observerEcef(new GeoPosition(90, 0), 0.0);
        assertEquals(6356752.314, p[2], 1e-3, "polar radius");
    }
}
