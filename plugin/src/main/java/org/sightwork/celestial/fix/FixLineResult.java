package org.sightwork.celestial.fix;

import java.util.Optional;
import org.sightwork.celestial.reduction.LineOfPosition;

/**
 * One line's part in a fix.
 *
 * @param original the line as given (reduced from its DR or AP)
 * @param atFix the same sight reduced from the fix (carried back along the DR to the sight's
 *     time): its intercept is the residual
 * @param distanceRunNm distance the line was advanced (positive) or retired (negative) along the
 *     DR (nautical miles)
 * @param residualNm Ho - Hc from the fix (nautical miles, positive toward the body)
 * @param normalisedResidual the residual divided by its own expected spread (the standardised
 *     residual, using the residual covariance C - A Q Aᵀ); NaN when it has none (two lines)
 * @param rejected whether the line was left out of the fix
 * @param rejectionReason why, in words, when rejected
 */
public record FixLineResult(LineOfPosition original, LineOfPosition atFix, double distanceRunNm, double residualNm,
        double normalisedResidual, boolean rejected, Optional<String> rejectionReason) {
}
