package org.sightwork.geo.earth;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.Random;
import org.apache.sis.referencing.CRS;
import org.apache.sis.referencing.CommonCRS;
import org.junit.jupiter.api.Test;
import org.opengis.referencing.operation.MathTransform;

/**
 * Validation of the inline Mercator against outside references: Apache SIS's own EPSG:3395
 * ("WGS 84 / World Mercator") transform, and the meridional-parts formula of Bowditch.
 */
class MercatorTest {

    /** 1 mm on the chart: far below a pixel at any zoom the shell allows (5 cm per pixel). */
    private static final double TOL_M = 1e-3;
    /** Agreement with Bowditch's series: its constants are given to 4-5 decimals (about 4e-9 relative). */
    private static final double TOL_ARCMIN = 1e-3;
    private static final long SEED = 20_261_201L;

    @Test
    void agreesWithSisWorldMercator() throws Exception {
        // Reference: Apache SIS 1.6, EPSG:3395, axis order (easting, northing); input (lat, lon).
        MathTransform sis = CRS.findOperation(CommonCRS.WGS84.geographic(), CRS.forCode("EPSG:3395"), null)
                .getMathTransform();
        Random r = new Random(SEED);
        double[] p = new double[2];
        for (int i = 0; i < 2000; i++) {
            double lat = -85 + 170 * r.nextDouble();
            double lon = -180 + 360 * r.nextDouble();
            p[0] = lat;
            p[1] = lon;
            sis.transform(p, 0, p, 0, 1);
            assertEquals(p[0], Mercator.eastingM(lon), TOL_M, "easting at " + lat + ", " + lon);
            assertEquals(p[1], Mercator.northingM(lat), TOL_M, "northing at " + lat + ", " + lon);
        }
    }

    @Test
    void inverseReturnsTheLatitude() throws Exception {
        // Reference: SIS's inverse of EPSG:3395.
        MathTransform inv = CRS.findOperation(CRS.forCode("EPSG:3395"), CommonCRS.WGS84.geographic(), null)
                .getMathTransform();
        Random r = new Random(SEED + 1);
        double[] p = new double[2];
        for (int i = 0; i < 500; i++) {
            double e = -2e7 + 4e7 * r.nextDouble();
            double n = -1.9e7 + 3.8e7 * r.nextDouble();
            p[0] = e;
            p[1] = n;
            inv.transform(p, 0, p, 0, 1);
            // 1e-9° is 0.1 mm on the ground
            assertEquals(p[0], Mercator.latitudeDeg(n), 1e-9, "latitude of northing " + n);
            assertEquals(p[1], Mercator.longitudeDeg(e), 1e-9, "longitude of easting " + e);
        }
    }

    @Test
    void meridionalPartsFollowBowditch() {
        // Bowditch, The American Practical Navigator, explanation of Table 6 (from memory):
        // M = 7915.7045 log10 tan(45° + L/2) − 3437.7468 (e² sin L + e⁴/3 sin³ L + e⁶/5 sin⁵ L + ...),
        // WGS84 e² = 0.00669437999014 (NIMA TR8350.2 table 3.3).
        double e2 = 0.00669437999014;
        for (int latDeg = -80; latDeg <= 80; latDeg += 5) {
            double s = Math.sin(Math.toRadians(latDeg));
            double m = 7915.7045 * Math.log10(Math.tan(Math.toRadians(45 + latDeg / 2.0)))
                    - 3437.7468 * (e2 * s + e2 * e2 / 3 * s * s * s + e2 * e2 * e2 / 5 * Math.pow(s, 5)
                    + Math.pow(e2, 4) / 7 * Math.pow(s, 7));
            assertEquals(m, Mercator.meridionalParts(latDeg), TOL_ARCMIN, "meridional parts at " + latDeg + "°");
        }
    }

    @Test
    void scaleFactorIsTheMeridianScale() {
        // A conformal projection's parallel scale equals its meridian scale: k = (dN/dφ) / M, with M the
        // meridian radius of curvature a(1 − e²)/(1 − e² sin²φ)^(3/2) (Snyder 1987, eq. 4-18, from memory).
        double a = Earth.WGS84_SEMI_MAJOR_AXIS_M;
        double f = 1 / Earth.WGS84_INVERSE_FLATTENING;
        double e2 = 2 * f - f * f;
        for (int latDeg = -80; latDeg <= 80; latDeg += 10) {
            double h = 1e-4;
            double dNdPhi = (Mercator.northingM(latDeg + h) - Mercator.northingM(latDeg - h)) / Math.toRadians(2 * h);
            double s = Math.sin(Math.toRadians(latDeg));
            double meridianRadius = a * (1 - e2) / Math.pow(1 - e2 * s * s, 1.5);
            // central difference with h = 1e-4°: relative error about h² = 3e-12, well below 1e-8
            assertEquals(dNdPhi / meridianRadius, Mercator.scaleFactor(latDeg), 1e-8, "scale at " + latDeg + "°");
        }
    }

    @Test
    void clampsAtTheChartLimit() {
        assertEquals(Mercator.northingM(Mercator.MAX_LAT_DEG), Mercator.northingM(90), 0, "pole clamped");
        assertEquals(0.0, Mercator.northingM(0), 0, "equator");
    }
}
