/**
 * Fixes from lines of position: weighted least squares iterated by re-reduction, the 95% error
 * ellipse, residuals and outlier rejection, the cocked hat, running fixes along a DR track, the
 * grouping of a sight log into fixes, and the averaging of several shots of one body.
 *
 * <p>Units: positions in degrees (latitude, longitude), offsets in nautical miles east and north
 * in the plane tangent at the fix, variances in nm², directions in degrees true.
 *
 * <p>Error model: each line has its a-priori standard error (the sight's sigma, 1′ = 1 nm);
 * a line advanced or retired along the DR gets a DR error that grows as k × distance run
 * (k = {@value org.sightwork.celestial.fix.FixOptions#DEFAULT_DR_ERROR_FRACTION} by default),
 * common to all lines run over the same track (one unknown set and drift), so correlated
 * between them. See {@code docs/METHOD.md}.
 */
package org.sightwork.celestial.fix;
