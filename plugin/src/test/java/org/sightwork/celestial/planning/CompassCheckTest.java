package org.sightwork.celestial.planning;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.time.Instant;
import java.time.LocalDate;
import java.util.OptionalDouble;
import java.util.Random;
import org.junit.jupiter.api.Test;
import org.sightwork.celestial.almanac.Almanac;
import org.sightwork.celestial.almanac.Body;
import org.sightwork.celestial.almanac.BodyPosition;
import org.sightwork.celestial.time.AstroTime;
import org.sightwork.geo.earth.GeoPosition;

/** The compass check by amplitude and azimuth. */
class CompassCheckTest {

    /** 0.01°: the compass is read to 0.5°; the root's half second moves the Sun by under 0.003°. */
    private static final double AMPLITUDE_TOL_DEG = 0.01;

    private final Almanac almanac = Almanac.standard();
    private final CompassCheck check = new CompassCheck(almanac);

    @Test
    void amplitudeAgreesWithTheHandbookFormula() {
        // sin A = sin Dec / cos Lat (the amplitude formula of the navigation handbooks; from memory).
        Random rnd = new Random(1852L);
        int n = 0;
        for (int i = 0; i < 60; i++) {
            GeoPosition p = GeoPosition.of(-60 + 120 * rnd.nextDouble(), -180 + 360 * rnd.nextDouble());
            LocalDate d = LocalDate.of(2020, 1, 1).plusDays(rnd.nextInt(3650));
            ShipTrack still = ShipTrack.stationary(p);
            boolean rising = rnd.nextBoolean();
            CompassCheck.AmplitudeCheck a = check.byAmplitude(Body.SUN, still, DayWindow.zoneDay(d, still), rising,
                    OptionalDouble.empty(), OptionalDouble.empty()).orElseThrow();
            double formula = Math.toDegrees(Math.asin(Math.sin(Math.toRadians(a.decDeg()))
                    / Math.cos(Math.toRadians(p.latDeg()))));
            assertEquals(formula, a.amplitudeDeg(), AMPLITUDE_TOL_DEG, "amplitude at " + p + " on " + d);
            assertEquals(Math.signum(a.decDeg()), Math.signum(a.amplitudeDeg()), "north declination, north amplitude");
            n++;
        }
        assertTrue(n == 60, "all cases had a rising or setting");
    }

    @Test
    void compassErrorAndDeviationSigns() {
        // Common practice: "compass least, error east"; deviation = compass error − variation.
        CompassCheck.Reading r = CompassCheck.Reading.of(95.0, 93.0, OptionalDouble.of(-4.0));
        assertEquals(2.0, r.compassErrorDeg(), 1e-12, "2° E");
        assertEquals(6.0, r.deviationDeg().getAsDouble(), 1e-12, "error 2°E with variation 4°W: deviation 6°E");
        CompassCheck.Reading across = CompassCheck.Reading.of(2.0, 358.0, OptionalDouble.empty());
        assertEquals(4.0, across.compassErrorDeg(), 1e-12, "across north: 4° E");
    }

    @Test
    void azimuthIsTheTrianglesAzimuth() {
        Instant t = Instant.parse("2026-06-21T08:00:00Z");
        GeoPosition dr = new GeoPosition(45.0, -10.0);
        CompassCheck.AzimuthCheck a = check.byAzimuth(Body.SUN, t, dr, OptionalDouble.of(100.0), OptionalDouble.empty());
        BodyPosition p = almanac.position(Body.SUN, AstroTime.ofUtc(t));
        assertEquals(Horizon.fromEquatorial(p.ghaDeg(), p.decDeg(), dr).azimuthDeg(), a.trueAzimuthDeg(), 1e-12, "Zn");
        assertEquals(Horizon.norm180(a.trueAzimuthDeg() - 100.0), a.reading().orElseThrow().compassErrorDeg(), 1e-12,
                "compass error");
    }
}
