package org.sightwork.celestial.passage;

import org.sightwork.celestial.fix.Fix;
import org.sightwork.celestial.fix.PositionCovariance;
import org.sightwork.celestial.reduction.LineOfPosition;

/** Turns the sight-reduction and fix types into the reconciliation's observations. */
public final class Observations {

    private Observations() {
    }

    /**
     * A reduced sight as an observation: its AP, azimuth, intercept and sigma.
     *
     * @param lop the line of position
     * @return the observation
     */
    public static CelestialObservation.Line of(LineOfPosition lop) {
        return new CelestialObservation.Line(lop.utc(), lop.label(), lop.ap(), lop.znDeg(), lop.interceptNm(),
                lop.sigmaNm());
    }

    /**
     * A fix as an observation, with its covariance.
     *
     * @param fix the fix
     * @param label a name for tables
     * @return the observation
     */
    public static CelestialObservation.Position of(Fix fix, String label) {
        PositionCovariance c = fix.covariance();
        double se = Math.sqrt(c.eastEastNm2());
        double sn = Math.sqrt(c.northNorthNm2());
        double rho = Math.max(-0.999, Math.min(0.999, c.eastNorthNm2() / (se * sn)));
        return new CelestialObservation.Position(fix.utc(), label, fix.position(), se, sn, rho);
    }
}
