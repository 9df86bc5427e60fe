/**
 * The passage: reconciliation of the dead-reckoning track with celestial observations (a Kalman
 * filter with a Rauch-Tung-Striebel smoother), the current found on the way, and the comparison of
 * a GPS track with it: discrepancies, a consistency test and an integrity verdict.
 *
 * <p>Conventions: times UTC {@link java.time.Instant}; positions WGS84 degrees at the API; inside
 * the filter a local plane ({@link org.sightwork.celestial.passage.LocalFrame}) in nautical miles
 * east and north, time in hours, velocities in knots; courses, bearings, azimuths and set in degrees
 * true [0°, 360°); standard deviations (sigma) in nautical miles or knots, one standard deviation.
 */
package org.sightwork.celestial.passage;
