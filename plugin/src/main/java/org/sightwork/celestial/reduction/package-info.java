/**
 * Sight reduction: local hour angle, computed altitude Hc and azimuth Zn, intercept, the line of
 * position, the circle of equal altitude, latitude by meridian altitude and by Polaris, and the
 * predicted time of local apparent noon.
 *
 * <p>Units: degrees for angles (GHA, Dec, LHA, Hc, Zn in [0°, 360°) true), nautical miles for
 * distances, one nautical mile being one minute of arc of a great circle: the navigator's sphere,
 * on which geodetic latitude and longitude are used as spherical coordinates (the standard practice
 * of sight reduction; the oblate Earth enters only through the parallax of the Moon, in
 * {@link org.sightwork.celestial.sight.Corrections#topocentric}). Intercepts are positive toward
 * the body.
 */
package org.sightwork.celestial.reduction;
