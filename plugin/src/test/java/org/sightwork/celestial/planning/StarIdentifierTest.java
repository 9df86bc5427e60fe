package org.sightwork.celestial.planning;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.time.Instant;
import java.util.HashSet;
import java.util.Random;
import java.util.Set;
import org.junit.jupiter.api.Test;
import org.sightwork.celestial.almanac.Almanac;
import org.sightwork.celestial.almanac.Body;
import org.sightwork.celestial.almanac.BodyPosition;
import org.sightwork.celestial.time.AstroTime;
import org.sightwork.geo.earth.GeoPosition;

/**
 * Identification round trip on every navigational star and the planets: Hc and Zn computed for
 * the body at some time and place are identified back as that body (the brief's check).
 */
class StarIdentifierTest {

    /** An exact Hc/Zn is the body's own point: the miss is rounding only. */
    private static final double EXACT_MISS_DEG = 1e-6;

    private final Almanac almanac = Almanac.standard();
    private final StarIdentifier id = new StarIdentifier(almanac);

    @Test
    void everyNavigationalStarComesBack() {
        Random rnd = new Random(58L);
        Set<String> done = new HashSet<>();
        // Places and times until every one of the 58 has been above 5° at least twice.
        for (int k = 0; k < 400 && done.size() < 58; k++) {
            GeoPosition dr = GeoPosition.of(-75 + 150 * rnd.nextDouble(), -180 + 360 * rnd.nextDouble());
            Instant t = Instant.parse("2000-01-01T00:00:00Z").plusSeconds((long) (rnd.nextDouble() * 40 * 365.25 * 86400));
            AstroTime at = AstroTime.ofUtc(t);
            for (Body star : almanac.navigationalStars()) {
                BodyPosition p = almanac.position(star, at);
                HorizonPoint h = Horizon.fromEquatorial(p.ghaDeg(), p.decDeg(), dr);
                if (h.altitudeDeg() < 5.0) {
                    continue;
                }
                Identification r = id.identify(t, dr, h.altitudeDeg(), h.azimuthDeg());
                assertEquals(star.name(), r.best().body().name(), "identified back at " + t + " " + dr);
                assertEquals(0.0, r.best().missDeg(), EXACT_MISS_DEG, "miss for " + star.name());
                assertEquals(p.decDeg(), r.decDeg(), 1e-7, "declination of the point for " + star.name());
                assertTrue(r.runnerUp().orElseThrow().missDeg() > 0.05, "a runner-up apart from " + star.name());
                done.add(star.name());
            }
        }
        assertEquals(58, done.size(), "all 58 navigational stars tried");
    }

    @Test
    void planetsComeBackAndTheShaIsTheStarsSha() {
        Instant t = Instant.parse("2026-06-21T21:30:00Z");
        GeoPosition dr = new GeoPosition(10.0, -30.0);
        AstroTime at = AstroTime.ofUtc(t);
        for (Body b : new Body[] {Body.VENUS, Body.MARS, Body.JUPITER, Body.SATURN, almanac.body("Sirius")}) {
            BodyPosition p = almanac.position(b, at);
            HorizonPoint h = Horizon.fromEquatorial(p.ghaDeg(), p.decDeg(), dr);
            Identification r = id.identify(t, dr, Math.max(h.altitudeDeg(), 0.0) == h.altitudeDeg() ? h.altitudeDeg()
                    : 0.0, h.azimuthDeg());
            if (h.altitudeDeg() <= 0) {
                continue;
            }
            assertEquals(b.name(), r.best().body().name(), "planet or star identified back");
            // The almanac's SHA (360° − RA) against the SHA found from the observation.
            assertEquals(0.0, Horizon.norm180(p.shaDeg().orElseThrow() - r.shaDeg()), 1e-6, "SHA of " + b.name());
        }
    }

    @Test
    void aRoughAzimuthStillFindsABrightStar() {
        // Sirius with the azimuth 3° off (a hand-bearing compass, common practice): the point misses
        // by about 3° cos H and Sirius is still the nearest body brighter than 3.5.
        Instant t = Instant.parse("2026-01-15T22:00:00Z");
        GeoPosition dr = new GeoPosition(30.0, -40.0);
        BodyPosition p = almanac.position(almanac.body("Sirius"), AstroTime.ofUtc(t));
        HorizonPoint h = Horizon.fromEquatorial(p.ghaDeg(), p.decDeg(), dr);
        assertTrue(h.altitudeDeg() > 10, "Sirius is up");
        Identification r = id.identify(t, dr, h.altitudeDeg(), Horizon.norm360(h.azimuthDeg() + 3.0));
        assertEquals("Sirius", r.best().body().name(), "best match");
        assertEquals(3.0 * Math.cos(Math.toRadians(h.altitudeDeg())), r.best().missDeg(), 0.05, "miss ≈ 3° cos H");
    }
}
