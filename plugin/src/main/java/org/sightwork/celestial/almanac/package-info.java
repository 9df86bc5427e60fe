/**
 * The navigator's almanac: apparent geocentric places of date of the Sun, the Moon, Venus, Mars,
 * Jupiter, Saturn, the first point of Aries and the stars, as GHA, declination, SHA, horizontal
 * parallax, semi-diameter and magnitude.
 *
 * <p><b>Units and conventions:</b> angles in degrees at the API ([0°, 360°) for GHA, SHA and RA,
 * [-90°, 90°] for declination, north positive), parallax and semi-diameter in arcminutes, distances
 * in kilometres. GHA is measured westward from Greenwich with UT1 (DUT1 from
 * {@link org.sightwork.celestial.time.AstroTime}); the places are referred to the true equator and
 * equinox of date. Inside the package angles are radians. The method and its measured accuracy are
 * written up in {@code docs/METHOD-ALMANAC.md}.
 */
package org.sightwork.celestial.almanac;
