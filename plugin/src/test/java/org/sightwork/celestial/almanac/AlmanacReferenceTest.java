package org.sightwork.celestial.almanac;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.time.Instant;
import java.time.ZoneOffset;
import java.util.Random;
import net.e175.klaus.solarpositioning.SPA;
import net.e175.klaus.solarpositioning.SolarPosition;
import org.jastronomy.jsofa.JSOFA;
import org.junit.jupiter.api.Test;
import org.sightwork.celestial.time.AstroTime;

/**
 * Validation of the almanac against worked examples and reference libraries run in-process (SOFA
 * through jsofa, NREL SPA). The JPL-based tables are checked in {@code AlmanacVsSwetestTest}.
 */
class AlmanacReferenceTest {

    private static final Almanac A = Almanac.standard();
    private static final double ARCSEC_DEG = 1.0 / 3600.0;
    /** The almanac's goal for the Sun, planets and stars: 0.05'. */
    private static final double GOAL_DEG = 0.05 / 60.0;

    private static double dRaArcsec(double raDeg, double refDeg, double decDeg) {
        double d = raDeg - refDeg;
        d -= 360.0 * Math.rint(d / 360.0);
        return d * 3600.0 * Math.cos(Math.toRadians(decDeg));
    }

    @Test
    void sunAgreesWithMeeusExamples25aAnd25b() {
        // 1992 October 13.0 TD: UTC = TT - 59.184 s (TAI - UTC = 27 s then).
        AstroTime t = AstroTime.ofUtc(Instant.parse("1992-10-12T23:59:00.816Z"));
        assertEquals(2448908.5, t.jdTt(), 1e-8, "JDE of the example");
        BodyPosition s = A.position(Body.SUN, t);
        // Meeus, Astronomical Algorithms 2nd ed., Example 25.a (low-accuracy method, good to 0.01°),
        // from memory: RA 13h13m31.4s, Dec -7°47'06".
        assertEquals((13 + 13 / 60.0 + 31.4 / 3600.0) * 15.0, s.raDeg(), 0.01, "RA vs 25.a");
        assertEquals(-(7 + 47 / 60.0 + 6 / 3600.0), s.decDeg(), 0.01, "Dec vs 25.a");
        // Example 25.b (full VSOP87, FK5 correction, nutation, aberration), from memory:
        // RA 13h13m30.749s, Dec -7°47'01.74"; to the example's 0.01 s and 0.01" plus 0.05".
        assertEquals((13 + 13 / 60.0 + 30.749 / 3600.0) * 15.0, s.raDeg(), 0.2 * ARCSEC_DEG, "RA vs 25.b");
        assertEquals(-(7 + 47 / 60.0 + 1.74 / 3600.0), s.decDeg(), 0.06 * ARCSEC_DEG, "Dec vs 25.b");
    }

    @Test
    void moonAgreesWithMeeusExample47a() {
        // 1992 April 12.0 TD = JDE 2448724.5: UTC = TT - 58.184 s (TAI - UTC = 26 s then).
        AstroTime t = AstroTime.ofUtc(Instant.parse("1992-04-11T23:59:01.816Z"));
        assertEquals(2448724.5, t.jdTt(), 1e-8, "JDE of the example");
        BodyPosition m = A.position(Body.MOON, t);
        // Meeus Example 47.a, from memory: apparent RA 134.688470°, Dec +13.768368°, distance
        // 368409.7 km, HP 0.991990°. Meeus' truncated ELP-2000/82 is good to about 10" in longitude
        // and 4" in latitude; allow 10" and 10 km.
        assertEquals(134.688470, m.raDeg(), 10 * ARCSEC_DEG, "RA");
        assertEquals(13.768368, m.decDeg(), 4 * ARCSEC_DEG, "Dec");
        assertEquals(368409.7, m.distanceKm().getAsDouble(), 10.0, "distance");
        assertEquals(0.991990 * 60.0, m.hpArcmin().getAsDouble(), 0.002, "HP (10 km = 0.0016')");
        assertEquals(Math.toDegrees(Math.asin(0.272493 * Math.sin(Math.toRadians(0.991990)))) * 60.0,
                m.sdArcmin().getAsDouble(), 0.002, "SD = asin(k sin HP)");
    }

    @Test
    void ghaAriesAgreesWithMeeusExamples12aAnd12b() {
        // Meeus Example 12.a, from memory: 1987 April 10, 0h UT, GAST 13h10m46.1351s. Meeus uses the
        // IAU 1982 GMST and 1980 nutation; IAU 2006/2000B differs by a few ms: allow 0.01 s.
        AstroTime t = AstroTime.ofUtc(Instant.parse("1987-04-10T00:00:00Z"));
        double gast = (13 + 10 / 60.0 + 46.1351 / 3600.0) * 15.0;
        assertEquals(gast, A.at(t).ghaAriesDeg(), 0.01 * 15 * ARCSEC_DEG, "GHA Aries 12.a");
        // Example 12.b, from memory: 19h21m00s UT, GMST 8h34m57.0896s; GAST = GMST + equation of the
        // equinoxes, taken from 12.a (-0.2317 s; it changes by under 0.01 s in 19 h).
        AstroTime u = AstroTime.ofUtc(Instant.parse("1987-04-10T19:21:00Z"));
        double gastB = (8 + 34 / 60.0 + (57.0896 - 0.2317) / 3600.0) * 15.0;
        assertEquals(gastB, A.at(u).ghaAriesDeg(), 0.015 * 15 * ARCSEC_DEG, "GHA Aries 12.b");
    }

    @Test
    void oneSecondOfTimeMovesGhaByAQuarterMinute() {
        // Fact of the trade (REFERENCES.md): 1 s of time moves GHA by 15" = 0.25'.
        AstroTime t = AstroTime.ofUtc(Instant.parse("2026-03-20T18:30:00Z"));
        for (Body b : new Body[] {Body.ARIES, Body.SUN, Body.MOON, Body.JUPITER, A.body("Sirius")}) {
            double d = A.position(b, t.plusSeconds(1)).ghaDeg() - A.position(b, t).ghaDeg();
            // Aries 15.04"/s; the Moon's own motion takes up to 0.6"/s off.
            assertEquals(0.25, d * 60.0, 0.012, "GHA change in 1 s, " + b.name());
        }
    }

    @Test
    void starsAgreeWithSofaAtci13() {
        // Reference: SOFA iauAtci13 (ICRS -> CIRS with IAU 2006/2000A, iauEpv00, deflection,
        // aberration), RA of date = CIRS RA - equation of the origins. Our chain uses IAU 2000B and
        // the Earth's heliocentric velocity from VSOP87: allow 0.05" (the Sun's barycentric
        // velocity, 13 m/s, makes 0.01" of aberration).
        StarCatalogue cat = new StarCatalogue();
        Random r = new Random(20260320L);
        for (int k = 0; k < 12; k++) {
            Instant i = Instant.parse("1950-01-01T00:00:00Z").plusSeconds((long) (r.nextDouble() * 100 * 365.25 * 86400));
            AstroTime t = AstroTime.ofUtc(i);
            Almanac.Snapshot s = A.at(t);
            for (Body b : A.navigationalStars()) {
                StarCatalogue.Star st = cat.byHr(b.hrNumber());
                JSOFA.SphericalCoordinateEO ref = JSOFA.jauAtci13(st.raRad(), st.decRad(), st.pmRaRadPerYear(),
                        st.pmDecRadPerYear(), st.parallaxArcsec(), st.rvKmPerS(), AstroTime.JD_J2000,
                        t.jdTt() - AstroTime.JD_J2000);
                double raRef = Math.toDegrees(JSOFA.jauAnp(ref.pos.alpha - ref.eo));
                BodyPosition p = s.position(b);
                assertEquals(0.0, dRaArcsec(p.raDeg(), raRef, p.decDeg()), 0.05, "RA cos Dec, " + b.name() + " " + i);
                assertEquals(Math.toDegrees(ref.pos.delta), p.decDeg(), 0.05 * ARCSEC_DEG, "Dec, " + b.name() + " " + i);
                assertEquals(360.0 - p.raDeg(), p.shaDeg().getAsDouble(), 1e-9, "SHA = 360 - RA");
            }
        }
    }

    @Test
    void sunAgreesWithSofaEarthEphemeris() {
        // Reference: SOFA iauEpv00 (Earth heliocentric and barycentric position and velocity, fit to
        // DE405; position error up to 13 km over 1900-2100, i.e. 0.02" in the Sun's direction),
        // with iauAb aberration, iauPnm06a (IAU 2006/2000A) and iauGst06a. Allow 0.1".
        Random r = new Random(7L);
        for (int k = 0; k < 200; k++) {
            Instant i = Instant.parse("1950-01-01T00:00:00Z").plusSeconds((long) (r.nextDouble() * 100 * 365.25 * 86400));
            AstroTime t = AstroTime.ofUtc(i);
            double d = t.jdTt() - AstroTime.JD_J2000;
            double[][] pvh = new double[2][3];
            double[][] pvb = new double[2][3];
            JSOFA.jauEpv00(AstroTime.JD_J2000, d, pvh, pvb);
            double rs = Math.sqrt(pvh[0][0] * pvh[0][0] + pvh[0][1] * pvh[0][1] + pvh[0][2] * pvh[0][2]);
            double tau = rs * Almanac.LIGHT_DAYS_PER_AU;
            double[] rho = new double[3];
            double[] v = new double[3];
            double v2 = 0;
            for (int j = 0; j < 3; j++) {
                // The Sun at t - tau (its barycentric velocity is vb - vh), seen from the Earth at t.
                rho[j] = -pvh[0][j] - (pvb[1][j] - pvh[1][j]) * tau;
                v[j] = pvb[1][j] * Almanac.LIGHT_DAYS_PER_AU;
                v2 += v[j] * v[j];
            }
            double n = Math.sqrt(rho[0] * rho[0] + rho[1] * rho[1] + rho[2] * rho[2]);
            double[] u = {rho[0] / n, rho[1] / n, rho[2] / n};
            double[] app = JSOFA.jauAb(u, v, rs, Math.sqrt(1 - v2));
            double[] tr = JSOFA.jauRxp(JSOFA.jauPnm06a(AstroTime.JD_J2000, d), app);
            double ra = Math.atan2(tr[1], tr[0]);
            double dec = Math.atan2(tr[2], Math.hypot(tr[0], tr[1]));
            double gst = JSOFA.jauGst06a(AstroTime.JD_J2000, t.jdUt1() - AstroTime.JD_J2000, AstroTime.JD_J2000, d);
            double ghaRef = Math.toDegrees(JSOFA.jauAnp(gst - ra));
            BodyPosition p = A.position(Body.SUN, t);
            assertEquals(0.0, dRaArcsec(p.ghaDeg(), ghaRef, p.decDeg()), 0.1, "GHA cos Dec (arcsec) " + i);
            assertEquals(Math.toDegrees(dec), p.decDeg(), 0.1 * ARCSEC_DEG, "Dec " + i);
            assertEquals(Math.toDegrees(JSOFA.jauAnp(gst)), A.at(t).ghaAriesDeg(), 0.005 * ARCSEC_DEG, "GAST (IAU 2000B is within 1 mas of 2000A) " + i);
        }
    }

    @Test
    void sunAltitudeAgreesWithNrelSpa() {
        // Reference: NREL SPA (Reda and Andreas 2004, +/-0.0003°), topocentric zenith angle without
        // refraction. From our GHA and Dec: sin h = sin(lat) sin(Dec) + cos(lat) cos(Dec) cos(LHA),
        // then the parallax in altitude HP cos h to make it topocentric. Allow SPA's 0.0003° plus
        // 0.05' (our goal).
        Random r = new Random(42L);
        for (int k = 0; k < 200; k++) {
            Instant i = Instant.parse("1960-01-01T00:00:00Z").plusSeconds((long) (r.nextDouble() * 80 * 365.25 * 86400));
            double lat = -70 + 140 * r.nextDouble();
            double lon = -180 + 360 * r.nextDouble();
            AstroTime t = AstroTime.ofUtc(i.isBefore(Instant.parse("1972-01-01T00:00:00Z"))
                    ? Instant.parse("1972-01-01T00:00:00Z").plusSeconds(k * 86400L * 97) : i);
            BodyPosition p = A.position(Body.SUN, t);
            double lha = Math.toRadians(p.ghaDeg() + lon);
            double phi = Math.toRadians(lat);
            double dec = Math.toRadians(p.decDeg());
            double h = Math.asin(Math.sin(phi) * Math.sin(dec) + Math.cos(phi) * Math.cos(dec) * Math.cos(lha));
            double hTopo = Math.toDegrees(h) - p.hpArcmin().getAsDouble() / 60.0 * Math.cos(h);
            SolarPosition spa = SPA.calculateSolarPosition(t.utc().atZone(ZoneOffset.UTC), lat, lon, 0.0,
                    t.deltaTSeconds());
            assertEquals(90.0 - spa.zenithAngle(), hTopo, 0.0003 + GOAL_DEG, "altitude at " + t.utc() + " " + lat + " " + lon);
        }
    }

    @Test
    void planetsAndMoonHaveSaneAuxiliaryValues() {
        // Facts of the trade (REFERENCES.md): Sun SD 15.8'-16.3', HP about 0.15'; Moon HP 54'-61.5'.
        Random r = new Random(3L);
        for (int k = 0; k < 100; k++) {
            AstroTime t = AstroTime.ofUtc(Instant.parse("1950-01-01T00:00:00Z").plusSeconds((long) (r.nextDouble() * 3.15e9)));
            Almanac.Snapshot s = A.at(t);
            BodyPosition sun = s.position(Body.SUN);
            assertTrue(sun.sdArcmin().getAsDouble() > 15.7 && sun.sdArcmin().getAsDouble() < 16.35, "Sun SD " + sun);
            assertEquals(0.147, sun.hpArcmin().getAsDouble(), 0.004, "Sun HP");
            BodyPosition moon = s.position(Body.MOON);
            assertTrue(moon.hpArcmin().getAsDouble() > 53.9 && moon.hpArcmin().getAsDouble() < 61.6, "Moon HP " + moon);
            assertEquals(0.2724, moon.sdArcmin().getAsDouble() / moon.hpArcmin().getAsDouble(), 0.0005, "Moon SD/HP");
            BodyPosition venus = s.position(Body.VENUS);
            assertTrue(venus.magnitude().getAsDouble() < -3.7 && venus.magnitude().getAsDouble() > -4.95, "Venus mag " + venus);
            BodyPosition jup = s.position(Body.JUPITER);
            assertTrue(jup.magnitude().getAsDouble() < -1.5 && jup.magnitude().getAsDouble() > -3.0, "Jupiter mag " + jup);
        }
    }
}
