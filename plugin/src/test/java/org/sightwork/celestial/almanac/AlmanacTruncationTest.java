package org.sightwork.celestial.almanac;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.time.Instant;
import java.util.Random;
import org.junit.jupiter.api.Test;
import org.sightwork.celestial.time.AstroTime;

/**
 * Non-regression of the series truncation: the standard (truncated) almanac against the full
 * series as shipped, 1950-2050, fixed seed. The bound is the one written beside
 * {@link Almanac#STANDARD_THRESHOLDS}: under 0.4" of apparent place, 0.01" of HP.
 */
class AlmanacTruncationTest {

    @Test
    void truncatedSeriesStayWithinTheirWrittenBound() {
        Almanac full = Almanac.fullSeries();
        Almanac std = Almanac.standard();
        Body[] bodies = {Body.SUN, Body.MOON, Body.VENUS, Body.MARS, Body.JUPITER, Body.SATURN};
        Random r = new Random(1L);
        long t0 = Instant.parse("1950-01-01T00:00:00Z").getEpochSecond();
        long span = Instant.parse("2050-01-01T00:00:00Z").getEpochSecond() - t0;
        double[] max = new double[bodies.length];
        for (int i = 0; i < 150; i++) {
            AstroTime t = AstroTime.ofUtc(Instant.ofEpochSecond(t0 + (long) (r.nextDouble() * span)));
            Almanac.Snapshot a = std.at(t);
            Almanac.Snapshot b = full.at(t);
            for (int k = 0; k < bodies.length; k++) {
                BodyPosition p = a.position(bodies[k]);
                BodyPosition q = b.position(bodies[k]);
                double dra = p.raDeg() - q.raDeg();
                dra -= 360.0 * Math.rint(dra / 360.0);
                double e = Math.max(Math.abs(dra * Math.cos(Math.toRadians(q.decDeg()))),
                        Math.abs(p.decDeg() - q.decDeg())) * 3600.0;
                max[k] = Math.max(max[k], e);
                double dhp = Math.abs(p.hpArcmin().getAsDouble() - q.hpArcmin().getAsDouble()) * 60.0;
                assertTrue(dhp < 0.01, bodies[k].name() + " HP error " + dhp + "\" at " + t.utc());
            }
        }
        for (int k = 0; k < bodies.length; k++) {
            assertTrue(max[k] < 0.4, bodies[k].name() + " truncation error " + max[k] + "\"");
        }
    }
}
