/**
 * Positions on the Earth, angles and their d°m.m′ notation, and the constants of the trade.
 *
 * <p>Conventions: latitude in degrees, north positive, [-90°, 90°]; longitude in degrees, east
 * positive, [-180°, 180°); courses, bearings and azimuths in degrees true, clockwise from north,
 * [0°, 360°); distances in nautical miles. Angles shown to a person are in d°m.m′ to 0.1′.
 */
package org.sightwork.geo.earth;
