package org.sightwork.celestial.passage;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.time.Duration;
import java.time.Instant;
import java.util.List;
import net.sf.geographiclib.Geodesic;
import net.sf.geographiclib.GeodesicData;
import org.junit.jupiter.api.Test;
import org.sightwork.celestial.reduction.LineOfPosition;
import org.sightwork.geo.earth.GeoPosition;
import org.sightwork.geo.track.DrLeg;
import org.sightwork.geo.track.DrLog;

/**
 * Sights reduced by the reduction package, fed to the reconciliation, find the true position.
 * Validation: the observed altitudes come from GeographicLib on the unit sphere (f = 0): the
 * altitude of a body is 90° minus the arc from the observer to its geographical position
 * (Bowditch, Pub. 9, 2019, ch. 19). Two bodies 90° apart in azimuth, reduced from an AP 10′ away:
 * the intercept method's linearisation leaves well under 0.05 nm at that distance.
 */
class ObservationsTest {

    @Test
    void reducedSightsFindTheTruePosition() {
        Geodesic sphere = new Geodesic(1.0, 0.0);
        GeoPosition truth = new GeoPosition(38.2, -27.9);
        GeoPosition ap = new GeoPosition(38.0 + 2.0 / 60, -28.0 + 5.0 / 60);
        Instant t = Instant.parse("2026-06-21T05:20:00Z");
        // Two invented geographical positions (GHA = −longitude west of Greenwich, Dec = latitude).
        double[][] gp = {{60.0, 70.0}, {-10.0, 20.0}}; // {dec, lon}
        List<CelestialObservation> obs = new java.util.ArrayList<>();
        for (double[] g : gp) {
            GeodesicData arc = sphere.Inverse(truth.latDeg(), truth.lonDeg(), g[0], g[1]);
            double ho = 90.0 - arc.a12;
            double gha = ((-g[1]) % 360 + 360) % 360;
            obs.add(Observations.of(LineOfPosition.reduce("body", t, ap, gha, g[0], ho, 0.5)));
        }
        DrLog still = new DrLog(ap, List.of(new DrLeg(t.minusSeconds(3600), 0, 0, 0)), t.plusSeconds(3600));
        PassageNoise diffuse = new PassageNoise(0, 1e-6, 0, 1e-6, 1e-6, 1000, 0.01);
        Reconciliation r = PassageFilter.run(still, obs, diffuse, Duration.ofMinutes(30));
        GeoPosition found = r.sessions().get(0).filtered().position();
        double missNm = Geodesic.WGS84.Inverse(truth.latDeg(), truth.lonDeg(), found.latDeg(), found.lonDeg()).s12 / 1852;
        assertEquals(0.0, missNm, 0.05, "distance from the true position (nm)");
    }
}
