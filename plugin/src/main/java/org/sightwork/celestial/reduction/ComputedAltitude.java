package org.sightwork.celestial.reduction;

/**
 * The computed altitude and azimuth of a body from an assumed position.
 *
 * @param lhaDeg local hour angle (degrees, [0°, 360°), westward from the observer's meridian)
 * @param hcDeg computed altitude Hc (degrees, [-90°, 90°])
 * @param znDeg true azimuth Zn (degrees, [0°, 360°))
 */
public record ComputedAltitude(double lhaDeg, double hcDeg, double znDeg) {
}
