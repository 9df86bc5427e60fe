/**
 * Sight planning: the day's times (sunrise, sunset, civil and nautical twilight, moonrise,
 * moonset, meridian passage) at a DR that moves with the ship, the bodies above the horizon at a
 * chosen time with the best-placed set for a fix, star identification from an observed altitude
 * and rough azimuth, and the compass check by azimuth or amplitude.
 *
 * <p>Conventions: angles in degrees at the API ({@code hcDeg}, {@code znDeg}); azimuths true,
 * clockwise from north, [0°, 360°); altitudes above the celestial horizon unless a name says
 * otherwise ({@code presetHsDeg} is a sextant reading above the visible horizon); times are
 * {@link java.time.Instant}s (UTC); distances in nautical miles, speeds in knots. An event that
 * does not happen in the asked day is {@link java.util.Optional#empty()}.
 *
 * <p>This package never imports JavaFX (the sky plot's drawing lives in
 * {@code org.sightwork.celestial.ui}).
 */
package org.sightwork.celestial.planning;
