package org.sightwork.celestial.reduction;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.time.Duration;
import java.time.Instant;
import java.util.Random;
import org.junit.jupiter.api.Test;
import org.sightwork.celestial.reduction.MeridianAltitude.Bearing;
import org.sightwork.celestial.reduction.MeridianAltitude.Transit;
import org.sightwork.celestial.sight.SightException;
import org.sightwork.geo.earth.GeoPosition;

/** Meridian altitude, Polaris and noon prediction. */
class MeridianAndPolarisTest {

    private static final double EXACT = 1e-12;

    @Test
    void meridianAltitudeFactsOfTheTrade() {
        // REFERENCES.md (facts of the trade): observer 40°N, Sun dec 23.5°S -> zenith distance 63.5°
        assertEquals(40.0, MeridianAltitude.latitudeDeg(90.0 - 63.5, -23.5, Transit.UPPER, Bearing.SOUTH), EXACT,
                "contrary name");
        // ... and dec 23.5°N -> zenith distance 16.5°
        assertEquals(40.0, MeridianAltitude.latitudeDeg(90.0 - 16.5, 23.5, Transit.UPPER, Bearing.SOUTH), EXACT,
                "same name");
        // zenith distance ~15° with dec ~15° same side -> latitude ~30°
        assertEquals(30.0, MeridianAltitude.latitudeDeg(75.0, 15.0, Transit.UPPER, Bearing.SOUTH), EXACT,
                "same side, 15° + 15°");
        // common practice: a body on the equator culminates at 90° - |φ|
        assertEquals(-25.0, MeridianAltitude.latitudeDeg(65.0, 0.0, Transit.UPPER, Bearing.NORTH), EXACT,
                "body on the equator, southern observer");
        // body between observer and pole: observer 10°N, dec 20°N culminates north at 80°
        assertEquals(10.0, MeridianAltitude.latitudeDeg(80.0, 20.0, Transit.UPPER, Bearing.NORTH), EXACT,
                "body between observer and pole");
        // common practice (from memory): at lower transit latitude = altitude + polar distance;
        // a star of dec 60°N seen at 10° below the pole from 40°N
        assertEquals(40.0, MeridianAltitude.latitudeDeg(10.0, 60.0, Transit.LOWER, Bearing.NORTH), EXACT,
                "lower transit");
        assertEquals(-40.0, MeridianAltitude.latitudeDeg(10.0, -60.0, Transit.LOWER, Bearing.SOUTH), EXACT,
                "lower transit, south");
        assertThrows(SightException.class,
                () -> MeridianAltitude.latitudeDeg(10.0, 60.0, Transit.LOWER, Bearing.SOUTH), "wrong side");
    }

    @Test
    void polarisLatitudeInvertsTheReduction() {
        // Validation through SightReduction, itself checked against GeographicLib.
        Random random = new Random(42L);
        for (int i = 0; i < 2000; i++) {
            double lat = 1.0 + random.nextDouble() * 85.0;
            double lon = random.nextDouble() * 360.0 - 180.0;
            double gha = random.nextDouble() * 360.0;
            double dec = 89.3 + random.nextDouble() * 0.1;
            double ho = SightReduction.reduce(GeoPosition.of(lat, lon), gha, dec).hcDeg();
            double drLat = lat + (random.nextDouble() - 0.5);
            assertEquals(lat, PolarisLatitude.latitudeDeg(ho, gha, dec, lon, drLat), 1e-9, "latitude, case " + i);
        }
    }

    @Test
    void noonComesWhenTheSunCrossesTheMovingMeridian() {
        // A Sun with no equation of time: GHA = 180° + 15°/h from 00h UTC, dec fixed.
        Instant day = Instant.parse("2024-03-20T00:00:00Z");
        GhaDecSource sun = t -> new GhaDecSource.GhaDec(
                Sphere.normalize360(180.0 + 15.0 * Duration.between(day, t).toNanos() / 3.6e12), 0.0);
        // common practice: at 30°W, noon is 2 h after Greenwich noon
        LocalApparentNoon.Noon still = LocalApparentNoon.next(day.plusSeconds(6 * 3600), GeoPosition.of(0.0, -30.0),
                0.0, 0.0, sun);
        assertEquals(14.0 * 3600.0, Duration.between(day, still.utc()).toNanos() / 1e9, 0.05, "stationary at 30°W");
        // Running east at 10 kn on the equator: λ = -30° + t/6 (degrees, t hours from 00h);
        // 150° + 15 t + t/6 = 360° gives t = 210 / (15 + 1/6) h.
        LocalApparentNoon.Noon moving = LocalApparentNoon.next(day, GeoPosition.of(0.0, -30.0), 90.0, 10.0, sun);
        assertEquals(210.0 / (15.0 + 1.0 / 6.0) * 3600.0, Duration.between(day, moving.utc()).toNanos() / 1e9, 0.05,
                "running east");
        assertEquals(90.0 - 0.0, moving.meridianAltitudeDeg(), 1e-9, "Sun in the zenith at the equator");
    }
}
