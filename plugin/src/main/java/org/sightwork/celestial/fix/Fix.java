package org.sightwork.celestial.fix;

import java.time.Instant;
import java.util.List;
import java.util.Optional;
import org.sightwork.geo.earth.GeoPosition;

/**
 * A least-squares fix from lines of position, with its error ellipse and every line's residual.
 *
 * @param utc time of the fix (lines at other times were carried to it along the DR)
 * @param position the fix
 * @param covariance its covariance (nm², tangent plane east/north), from the a-priori sigmas and
 *     the DR error model, scaled up by the a-posteriori variance factor only when
 *     {@code scaledByAPosteriori}
 * @param ellipse95 the 95 % error ellipse of that covariance
 * @param lines every line, used or rejected, in the order given
 * @param warnings plain-language warnings (weak geometry, lines that disagree, low altitudes...)
 * @param cockedHat for exactly three lines used: the triangle of their crossings
 * @param iterations re-reductions used
 * @param varianceFactor a-posteriori variance factor rᵀ C⁻¹ r / (n - 2) (NaN for two lines)
 * @param scaledByAPosteriori whether the covariance was scaled up by {@code varianceFactor}
 */
public record Fix(Instant utc, GeoPosition position, PositionCovariance covariance, ErrorEllipse ellipse95,
        List<FixLineResult> lines, List<String> warnings, Optional<CockedHat> cockedHat, int iterations,
        double varianceFactor, boolean scaledByAPosteriori) {

    /** Copies the lists. */
    public Fix {
        lines = List.copyOf(lines);
        warnings = List.copyOf(warnings);
    }

    /** @return the lines used (not rejected) */
    public List<FixLineResult> usedLines() {
        return lines.stream().filter(l -> !l.rejected()).toList();
    }
}
