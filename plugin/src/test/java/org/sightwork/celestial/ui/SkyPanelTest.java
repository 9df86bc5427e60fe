package org.sightwork.celestial.ui;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.time.Instant;
import java.time.ZoneOffset;
import net.e175.klaus.solarpositioning.SPA;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.sightwork.celestial.planning.SightPlan;
import org.sightwork.geo.earth.GeoPosition;
import org.sightwork.geo.testing.HeadlessFx;
import org.sightwork.geo.track.DeadReckoning;
import org.sightwork.geo.track.DrLog;

/**
 * The Sky panel follows the passage-time cursor: the sky it draws is worked for the cursor's time
 * from the DR then. The Sun's altitude it reports is checked against NREL's Solar Position
 * Algorithm ({@code net.e175.klaus:solarpositioning} 2.0.x, Reda and Andreas 2004, ±0.0003°), at
 * the DR: if the panel took another time or place it would differ by far more than the tolerance.
 */
class SkyPanelTest {

    /** Geocentric (ours) against topocentric (SPA) Sun: parallax under 0.003°, plus the almanac's 0.1′. */
    static final double SUN_ALT_TOL_DEG = 0.01;
    /** ΔT for 2026 (seconds; IERS extrapolation, from memory: about 69 s). */
    static final double DELTA_T_S = 69;

    @Test
    void theSkyIsAtTheCursorFromTheDr(@TempDir Path home) {
        PluginHarness h = PluginHarness.startWithDemo(home);
        try {
            SkyPanel sky = (SkyPanel) h.panels.get("Sky");
            DrLog log = HeadlessFx.call(() -> h.plugin.model().passage().drLog().orElseThrow());
            for (String when : new String[] {"2026-06-21T21:55:00Z", "2026-06-21T13:49:00Z"}) {
                Instant t = Instant.parse(when);
                HeadlessFx.run(() -> h.passageTime().set(t));
                PluginHarness.await(() -> HeadlessFx.call(() -> sky.view().plan() != null
                        && sky.view().plan().timeUtc().equals(t)), "the sky at " + t);
                SightPlan plan = HeadlessFx.call(() -> sky.view().plan());
                GeoPosition dr = DeadReckoning.dr(log, t);
                assertEquals(dr.latDeg(), plan.dr().latDeg(), 1e-9, "DR latitude of the sky at " + t);
                assertEquals(dr.lonDeg(), plan.dr().lonDeg(), 1e-9, "DR longitude of the sky at " + t);
                var spa = SPA.calculateSolarPosition(t.atZone(ZoneOffset.UTC), dr.latDeg(), dr.lonDeg(), 0, DELTA_T_S);
                assertEquals(90 - spa.zenithAngle(), plan.sunAltitudeDeg(), SUN_ALT_TOL_DEG, "Sun's altitude at " + t);
                String caption = HeadlessFx.call(() -> sky.caption().getText());
                assertTrue(caption.contains("bodies up"), caption);
            }
            // Twilight: stars up and a set proposed; noon: the Sun high and no stars to propose.
        } finally {
            HeadlessFx.run(h::close);
        }
    }
}
