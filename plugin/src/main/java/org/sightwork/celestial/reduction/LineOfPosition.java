package org.sightwork.celestial.reduction;

import java.time.Instant;
import java.util.Objects;
import org.sightwork.geo.earth.GeoPosition;

/**
 * A line of position (LOP) by the intercept method (Marcq St Hilaire): from the assumed position
 * AP, run the intercept toward (or away from) the body along Zn; the LOP is the straight line
 * through that point perpendicular to Zn, the tangent of the circle of equal altitude.
 *
 * <p>The record keeps the body's GHA, Dec and Ho as well, so that the line can be worked again
 * from any other position ({@link #reducedFrom}) and drawn as the exact circle ({@link #circle}).
 *
 * @param label the sight's name for people, e.g. "Sun LL 05:12:30"
 * @param utc time of the sight
 * @param ap assumed position the line is reduced from
 * @param ghaDeg Greenwich hour angle of the body at {@code utc} (degrees)
 * @param decDeg declination (degrees)
 * @param hoDeg observed altitude Ho (degrees)
 * @param hcDeg computed altitude Hc from the AP (degrees)
 * @param znDeg true azimuth of the body from the AP (degrees, [0°, 360°))
 * @param interceptNm Ho - Hc (nautical miles; positive toward the body)
 * @param sigmaNm standard error of the line across itself (nautical miles, positive)
 */
public record LineOfPosition(String label, Instant utc, GeoPosition ap, double ghaDeg, double decDeg,
        double hoDeg, double hcDeg, double znDeg, double interceptNm, double sigmaNm) {

    /** Checks the values. */
    public LineOfPosition {
        Objects.requireNonNull(label, "label");
        Objects.requireNonNull(utc, "utc");
        Objects.requireNonNull(ap, "ap");
        if (!(znDeg >= 0.0 && znDeg < 360.0)) {
            throw new IllegalArgumentException("azimuth " + znDeg + "° is outside [0°, 360°)");
        }
        if (!(sigmaNm > 0.0) || !Double.isFinite(sigmaNm)) {
            throw new IllegalArgumentException("line standard error " + sigmaNm + " nm must be positive");
        }
        if (!Double.isFinite(interceptNm) || !Double.isFinite(hoDeg)) {
            throw new IllegalArgumentException("intercept and Ho must be numbers");
        }
    }

    /**
     * Reduces a sight from an AP.
     *
     * @param label name for people
     * @param utc time of the sight
     * @param ap assumed position
     * @param ghaDeg GHA (degrees)
     * @param decDeg Dec (degrees)
     * @param hoDeg Ho (degrees)
     * @param sigmaNm standard error (nautical miles)
     * @return the line
     */
    public static LineOfPosition reduce(String label, Instant utc, GeoPosition ap, double ghaDeg, double decDeg,
            double hoDeg, double sigmaNm) {
        ComputedAltitude c = SightReduction.reduce(ap, ghaDeg, decDeg);
        return new LineOfPosition(label, utc, ap, ghaDeg, decDeg, hoDeg, c.hcDeg(), c.znDeg(),
                (hoDeg - c.hcDeg()) * 60.0, sigmaNm);
    }

    /**
     * @param newAp another assumed position
     * @return the same sight reduced from it
     */
    public LineOfPosition reducedFrom(GeoPosition newAp) {
        return reduce(label, utc, newAp, ghaDeg, decDeg, hoDeg, sigmaNm);
    }

    /** @return true when Ho ≥ Hc: the intercept is run toward the body */
    public boolean isToward() {
        return interceptNm >= 0.0;
    }

    /** @return the intercept point: the AP moved the intercept along Zn (great circle) */
    public GeoPosition interceptPoint() {
        return Sphere.destination(ap, znDeg, interceptNm);
    }

    /** @return the direction of the line itself (degrees, [0°, 180°)): Zn ± 90° */
    public double lineDirectionDeg() {
        return Sphere.normalize360(znDeg + 90.0) % 180.0;
    }

    /**
     * A point on the line, along it from the intercept point (for drawing).
     *
     * @param alongNm distance along the line (nautical miles; positive toward Zn + 90°)
     * @return the point (great-circle step from the intercept point)
     */
    public GeoPosition pointAlong(double alongNm) {
        return Sphere.destination(interceptPoint(), Sphere.normalize360(znDeg + 90.0), alongNm);
    }

    /** @return the exact circle of equal altitude of this sight */
    public CircleOfEqualAltitude circle() {
        return CircleOfEqualAltitude.of(ghaDeg, decDeg, hoDeg);
    }

    /**
     * @param p a position
     * @return Ho - Hc(p) (nautical miles): how far p is from the circle, positive when the body is
     *     higher than seen from p (the circle lies toward the body)
     */
    public double residualNm(GeoPosition p) {
        return (hoDeg - SightReduction.reduce(p, ghaDeg, decDeg).hcDeg()) * 60.0;
    }
}
