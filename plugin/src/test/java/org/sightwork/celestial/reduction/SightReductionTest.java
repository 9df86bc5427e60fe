package org.sightwork.celestial.reduction;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.Random;
import net.sf.geographiclib.Geodesic;
import net.sf.geographiclib.GeodesicData;
import org.junit.jupiter.api.Test;
import org.sightwork.geo.earth.GeoPosition;

/**
 * Validation of Hc and Zn against GeographicLib (Karney 2013, net.sf.geographiclib): on a sphere
 * (f = 0) the zenith distance 90° - Hc is the arc from the AP to the body's geographical
 * position and Zn is the initial azimuth of that arc.
 */
class SightReductionTest {

    private static final Geodesic UNIT_SPHERE = new Geodesic(1.0, 0.0);
    /** 1e-9°: far below 0.1′; both are exact formulas in double precision. */
    private static final double ROUND_OFF_DEG = 1e-9;
    /** Azimuth is ill-conditioned near the zenith and the antipode: 1e-7° there. */
    private static final double AZIMUTH_TOL_DEG = 1e-7;

    @Test
    void hcAndZnMatchGeographicLibOnTheSphere() {
        Random random = new Random(20240611L);
        for (int i = 0; i < 20000; i++) {
            GeoPosition ap = GeoPosition.of(random.nextDouble() * 180.0 - 90.0, random.nextDouble() * 360.0 - 180.0);
            double gha = random.nextDouble() * 360.0;
            double dec = random.nextDouble() * 180.0 - 90.0;
            if (i % 100 == 0) {
                ap = GeoPosition.of(i % 200 == 0 ? 89.9999 : -90.0 + 1e-4, ap.lonDeg());
            }
            ComputedAltitude c = SightReduction.reduce(ap, gha, dec);
            GeoPosition gp = SightReduction.geographicalPosition(gha, dec);
            GeodesicData g = UNIT_SPHERE.Inverse(ap.latDeg(), ap.lonDeg(), gp.latDeg(), gp.lonDeg());
            assertEquals(g.a12, 90.0 - c.hcDeg(), ROUND_OFF_DEG, "zenith distance, case " + i);
            if (g.a12 > 0.01 && g.a12 < 179.99) {
                double dz = Math.abs(((g.azi1 - c.znDeg()) % 360.0 + 540.0) % 360.0 - 180.0);
                assertEquals(0.0, dz, AZIMUTH_TOL_DEG, "azimuth, case " + i);
            }
        }
    }

    @Test
    void greatCircleStepsMatchGeographicLib() {
        Random random = new Random(7L);
        for (int i = 0; i < 5000; i++) {
            GeoPosition a = GeoPosition.of(random.nextDouble() * 178.0 - 89.0, random.nextDouble() * 360.0 - 180.0);
            double course = random.nextDouble() * 360.0;
            double nm = random.nextDouble() * 5000.0;
            GeoPosition b = Sphere.destination(a, course, nm);
            GeodesicData g = UNIT_SPHERE.Direct(a.latDeg(), a.lonDeg(), course, nm / Sphere.NM_PER_RADIAN);
            assertEquals(0.0, Sphere.distanceNm(b, GeoPosition.of(g.lat2, g.lon2)), 1e-7, "destination, case " + i);
            GeodesicData inv = UNIT_SPHERE.Inverse(a.latDeg(), a.lonDeg(), b.latDeg(), b.lonDeg());
            assertEquals(inv.a12 * 60.0, Sphere.distanceNm(a, b), 1e-7, "distance, case " + i);
        }
    }

    @Test
    void rhumbLineKeepsItsCourseAndDistance() {
        // Mercator sailing (Bowditch ch. 24): a rhumb run due east along a parallel changes the
        // longitude by distance / cos(latitude) minutes; due north changes the latitude only.
        GeoPosition p = GeoPosition.of(60.0, 179.5);
        GeoPosition east = Sphere.rhumb(p, 90.0, 30.0);
        assertEquals(60.0, east.latDeg(), 1e-12, "latitude kept");
        assertEquals(-179.5, east.lonDeg(), 1e-9, "across the date line, 60' of longitude");
        GeoPosition north = Sphere.rhumb(GeoPosition.of(10.0, 20.0), 0.0, 120.0);
        assertEquals(12.0, north.latDeg(), 1e-12, "120 nm north");
    }

    @Test
    void lineOfPositionInterceptPointLiesOnTheCircle() {
        GeoPosition ap = GeoPosition.of(-33.0, 151.0);
        LineOfPosition l = LineOfPosition.reduce("test", java.time.Instant.EPOCH, ap, 100.0, -20.0, 40.0, 1.0);
        assertEquals(0.0, l.residualNm(l.interceptPoint()), 1e-6, "the intercept point is on the circle");
        assertEquals(l.circle().radiusNm(), Sphere.distanceNm(l.circle().gp(), l.interceptPoint()), 1e-6,
                "circle radius 60 × (90° - Ho)");
        assertEquals(l.isToward(), l.interceptNm() >= 0, "toward when Ho ≥ Hc");
    }
}
