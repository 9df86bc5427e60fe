/**
 * Time-stamped tracks: import of NMEA 0183 logs, GPX 1.1 and our CSV; export to GPX and CSV;
 * interpolation in time; dead reckoning from a log of legs or from heading and speed through the
 * water.
 *
 * <p>Conventions: times are UTC {@link java.time.Instant}s (stored as milliseconds since
 * 1970-01-01T00:00Z); positions WGS84 latitude and longitude in degrees; courses and headings in
 * degrees true [0°, 360°); speeds in knots; distances in nautical miles. A value a source did not
 * give is absent ({@link java.util.OptionalDouble#empty()}), never a made-up zero.
 *
 * <p>Input problems are collected as {@link org.sightwork.geo.track.ImportProblem}s naming file,
 * line and column; the good data goes on. Exports write a temporary file and rename it, so that a
 * failed write never damages the file already there.
 */
package org.sightwork.geo.track;
