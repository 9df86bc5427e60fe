/**
 * A sextant sight as observed, and the altitude corrections from the sextant altitude Hs to the
 * observed altitude Ho, step by step (a {@link org.sightwork.celestial.sight.Worksheet}).
 *
 * <p>Units: altitudes in degrees, corrections in minutes of arc (suffix {@code Arcmin}), height of
 * eye in metres, temperature in °C, pressure in hPa, distances in nautical miles. Every correction
 * is stored with the sign in which it is <em>added</em> to the running altitude.
 *
 * <p>Index error convention (common practice): a reading "on the arc" (the index reads above 0°
 * when the horizon is made straight) is <em>subtracted</em>; "off the arc" is <em>added</em>.
 * {@link org.sightwork.celestial.sight.IndexError} stores the correction (what is added to Hs).
 */
package org.sightwork.celestial.sight;
