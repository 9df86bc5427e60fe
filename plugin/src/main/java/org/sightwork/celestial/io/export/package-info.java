/**
 * Exports of a passage's plot: GeoJSON (RFC 7946), GPX 1.1, GeoPackage (OGC 12-128r18), a PNG of the
 * chart view and a printable PDF worksheet.
 *
 * <p>The exporters take a small neutral model ({@link org.sightwork.celestial.io.export.PlotExport},
 * {@link org.sightwork.celestial.io.export.WorksheetReport}) that the user interface fills from the
 * engine's results, so that the file formats know nothing of how a line or a fix was computed.
 *
 * <p>Units: positions in WGS84 degrees, times in UTC, distances in nautical miles. Every exporter
 * writes to a temporary file beside the target and renames it into place, so that a failed export
 * never leaves a half-written file under the user's name.
 */
package org.sightwork.celestial.io.export;
