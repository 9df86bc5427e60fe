/**
 * Training drills: a scenario (the vessel's true track, the sights to take, the observer), a
 * generator that turns it into a student pack (sight log, DR log, exercise sheet) and an answer key
 * (true positions, correct Ho, Hc, Zn, intercepts, fixes, the true track as NMEA 0183), and a grader
 * that scores students' answers against the key and recognises the common mistakes.
 *
 * <p>Conventions: latitude and longitude in degrees (north and east positive), altitudes and
 * azimuths in degrees at the API, altitude differences and intercepts in minutes of arc (= nautical
 * miles), intercepts positive <em>toward</em> the body; times are UTC {@link java.time.Instant}s.
 * Everything is deterministic from the scenario and a seed: no clock, no hash-order iteration in
 * output, numbers written with {@link java.util.Locale#ROOT}.
 *
 * <p>Nothing here imports JavaFX; the GUI's drill mode uses {@link
 * org.sightwork.celestial.drill.DrillGrader} and {@link org.sightwork.celestial.drill.StudentGrade}.
 */
package org.sightwork.celestial.drill;
