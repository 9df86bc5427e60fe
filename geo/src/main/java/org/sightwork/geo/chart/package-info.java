/**
 * Chart data: the sources (GeoPackage, GeoJSON), the feature model (JTS geometry + class +
 * attributes), reprojection to WGS84 through Apache SIS, and the spatial index with generalisation
 * per zoom band that the renderer draws from, with a cache of prepared files in the user's cache
 * directory ({@code PreparedCache}) for the next opening.
 *
 * <p>Units: feature geometries are in WGS84 longitude (x) and latitude (y), degrees; prepared
 * geometries are in Mercator (EPSG:3395) metres. Nothing here touches JavaFX.
 */
package org.sightwork.geo.chart;
