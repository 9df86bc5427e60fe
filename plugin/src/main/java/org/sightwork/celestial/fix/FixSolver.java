package org.sightwork.celestial.fix;

import java.time.Duration;
import java.time.Instant;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import org.hipparchus.distribution.continuous.ChiSquaredDistribution;
import org.sightwork.celestial.reduction.LineOfPosition;
import org.sightwork.celestial.reduction.Sphere;
import org.sightwork.geo.earth.GeoPosition;

/**
 * The least-squares fix from any number of lines of position, with running-fix advance along a DR
 * track, error ellipse, residuals, outlier rejection, cocked hat and geometry warnings.
 *
 * <p><b>Method.</b> Gauss-Newton on the circles of equal altitude: at the current estimate X each
 * sight is carried back along the DR to its own time, re-reduced there (its intercept pᵢ is
 * Ho - Hc), and the linear model pᵢ = aᵢ·δ with aᵢ = (sin Zn, cos Zn) is solved by generalised
 * least squares δ = (AᵀC⁻¹A)⁻¹AᵀC⁻¹p; X moves by δ along a great circle; repeat until |δ| <
 * 0.01 nm (the method of Kaplan, "Determining the position and motion of a vessel from celestial
 * observations", Navigation 42 (1995) 631, in its least-squares form; the linear algebra in any
 * text, e.g. Strang, <i>Linear Algebra and its Applications</i>, 4th ed., §3.3).
 *
 * <p>The covariance of the intercepts is C = diag(σᵢ²) + V Vᵀ with Vᵢ = k dᵢ sᵢ aᵢ: the DR error
 * of a line carried a distance dᵢ (sᵢ = +1 advanced, -1 retired) is one unknown drift common to
 * the track, of standard deviation k × distance run in each direction. C is inverted by the
 * Woodbury identity (C⁻¹ = D⁻¹ - D⁻¹V(I + VᵀD⁻¹V)⁻¹VᵀD⁻¹), so the work is O(n) for n lines;
 * the 2 × 2 systems are solved in closed form (why not Hipparchus: nothing larger than 2 × 2 is
 * ever formed; measured in {@code FixBenchmark}).
 *
 * <p><b>Error ellipse.</b> From Q = (AᵀC⁻¹A)⁻¹, the a-priori covariance, at 95 % (χ² = 5.991).
 * The a-posteriori variance factor s² = rᵀC⁻¹r/(n - 2) is reported; it scales the covariance up
 * (never down) only when n ≥ 5 and s² exceeds the 95 % point of χ²(n - 2)/(n - 2), that is when
 * the lines demonstrably disagree more than their sigmas allow. With three or four lines s² rests
 * on one or two degrees of freedom and would shrink the ellipse of a lucky small cocked hat to
 * nothing: the stated sigmas are the better knowledge then. Validated by simulation: with known
 * sigmas the 95 % ellipse holds the truth in 93-97 % of 2,000 fixes ({@code FixSolverTest}).
 *
 * <p><b>Outliers.</b> With four or more lines, the line with the largest standardised residual
 * |rᵢ| / √(C - AQAᵀ)ᵢᵢ is left out if that exceeds 3, and the fix is worked again; one at a time,
 * never below three lines.
 *
 * <p><b>Geometry.</b> With all lines inside a sector narrower than 15° (two lines crossing at less
 * than 15°) no fix is given; under 30°, or when the ellipse is more than four times longer than
 * wide, a warning says so.
 *
 * <p><b>Limits.</b> Positions near the poles and across the date line are handled (unit-vector
 * steps; azimuths at a pole refer to the meridian of the estimate's longitude). The Jacobian of a
 * carried line is taken as the unit vector toward its body: exact for a line not carried, off by
 * the convergence of the meridians over the distance run otherwise (under 1e-3 relative for 50 nm
 * at 60° latitude). Thread safety: stateless.
 */
public final class FixSolver {

    /** Lines at times further apart than this need a DR track (seconds). */
    public static final double SIMULTANEOUS_SECONDS = 60.0;

    private FixSolver() {
    }

    /**
     * A fix from simultaneous lines (within {@value #SIMULTANEOUS_SECONDS} s of each other).
     *
     * @param lines the lines (at least two)
     * @param start first estimate (the DR)
     * @param options settings
     * @return the fix, at the mean time of the lines
     */
    public static Fix solve(List<LineOfPosition> lines, GeoPosition start, FixOptions options) {
        Instant mean = meanTime(lines);
        return solve(lines, mean, start, Optional.empty(), options);
    }

    /**
     * A fix (running fix when the lines' times differ) at a chosen time.
     *
     * @param lines the lines (at least two)
     * @param fixTime the time of the fix
     * @param start first estimate of the position at {@code fixTime} (the DR)
     * @param track the DR track to carry lines to {@code fixTime}; needed when their times differ
     * @param options settings
     * @return the fix
     * @throws FixGeometryException when the lines make no fix
     * @throws IllegalArgumentException when lines at different times come without a DR track
     */
    public static Fix solve(List<LineOfPosition> lines, Instant fixTime, GeoPosition start, Optional<DrTrack> track,
            FixOptions options) {
        int n = lines.size();
        if (n < 2) {
            throw new FixGeometryException(n == 0 ? "no lines of position: no fix"
                    : "one line of position gives no fix: take a second body at least 30° away in azimuth, "
                            + "or advance this line to a later sight for a running fix");
        }
        double[] run = new double[n];
        for (int i = 0; i < n; i++) {
            LineOfPosition l = lines.get(i);
            double dt = Duration.between(l.utc(), fixTime).toNanos() / 1e9;
            if (track.isEmpty() && Math.abs(dt) > SIMULTANEOUS_SECONDS) {
                throw new IllegalArgumentException(String.format(Locale.ROOT,
                        "the sight '%s' is %.0f min from the fix time: a running fix needs the DR course and "
                                + "speed between them (course_deg, speed_kn; speed 0 if hove-to)",
                        l.label(), Math.abs(dt) / 60.0));
            }
            run[i] = track.map(t -> t.distanceRunNm(l.utc(), fixTime) * Math.signum(dt)).orElse(0.0);
        }
        boolean[] rejected = new boolean[n];
        String[] reasons = new String[n];
        List<String> warnings = new ArrayList<>();
        GeoPosition pos = start;
        Solution sol;
        int totalIterations = 0;
        while (true) {
            checkGeometry(lines, rejected, warnings, false, options);
            sol = iterate(lines, rejected, run, fixTime, pos, track, options);
            totalIterations += sol.iterations;
            pos = sol.position;
            int used = countUsed(rejected);
            if (!options.rejectOutliers() || used < 4) {
                break;
            }
            int worst = -1;
            for (int i = 0; i < n; i++) {
                if (!rejected[i] && (worst < 0 || Math.abs(sol.normalised[i]) > Math.abs(sol.normalised[worst]))) {
                    worst = i;
                }
            }
            if (!(Math.abs(sol.normalised[worst]) > options.outlierLimit())) {
                break;
            }
            rejected[worst] = true;
            if (sectorDeg(lines, rejected) < options.refuseCrossingDeg()) {
                // Leaving it out would leave no fix: keep it and say so.
                rejected[worst] = false;
                warnings.add(String.format(Locale.ROOT,
                        "%s: residual %.1f nm is %.1f times its expected spread, but without it the other lines "
                                + "cross too shallow for a fix: kept; check it", lines.get(worst).label(),
                        sol.residual[worst], Math.abs(sol.normalised[worst])));
                break;
            }
            reasons[worst] = String.format(Locale.ROOT,
                    "residual %.1f nm is %.1f times its expected spread (limit %.1f): left out of the fix; "
                            + "check the reading, the time and the body's name",
                    sol.residual[worst], Math.abs(sol.normalised[worst]), options.outlierLimit());
            warnings.add(lines.get(worst).label() + ": " + reasons[worst]);
        }
        checkGeometry(lines, rejected, warnings, true, options);
        if (!sol.converged) {
            warnings.add(String.format(Locale.ROOT,
                    "the fix did not settle to %.2f nm in %d re-reductions: the lines may not meet near here",
                    options.convergenceNm(), options.maxIterations()));
        }
        // Covariance, a-posteriori factor and its policy.
        int used = countUsed(rejected);
        PositionCovariance cov = sol.covariance;
        boolean scaled = false;
        double factor = used > 2 ? sol.weightedSquares / (used - 2) : Double.NaN;
        if (used >= 5) {
            double limit = new ChiSquaredDistribution(used - 2).inverseCumulativeProbability(0.95) / (used - 2);
            if (factor > limit) {
                scaled = true;
                cov = cov.scaled(factor);
                warnings.add(String.format(Locale.ROOT,
                        "the lines disagree more than their standard errors allow (variance factor %.1f): "
                                + "the ellipse has been enlarged by %.1f×", factor, Math.sqrt(factor)));
            }
        }
        ErrorEllipse ellipse = ErrorEllipse.of95(cov);
        if (ellipse.minorNm() > 0 && ellipse.majorNm() > 4.0 * ellipse.minorNm()
                && warnings.stream().noneMatch(w -> w.startsWith("weak geometry"))) {
            warnings.add(String.format(Locale.ROOT,
                    "weak geometry: the error ellipse is %.0f times longer than wide (along %03.0f°); "
                            + "a body well off in azimuth would tighten it", ellipse.majorNm() / ellipse.minorNm(),
                    ellipse.orientationDeg()));
        }
        List<FixLineResult> results = new ArrayList<>(n);
        for (int i = 0; i < n; i++) {
            results.add(new FixLineResult(lines.get(i), sol.atFix[i], run[i], sol.residual[i], sol.normalised[i],
                    rejected[i], Optional.ofNullable(reasons[i])));
        }
        Optional<CockedHat> hat = used == 3 ? Optional.of(cockedHat(sol, rejected)) : Optional.empty();
        return new Fix(fixTime, pos, cov, ellipse, results, warnings, hat, totalIterations, factor, scaled);
    }

    /** Result of one Gauss-Newton run. */
    private static final class Solution {
        GeoPosition position;
        PositionCovariance covariance;
        LineOfPosition[] atFix;
        double[] residual;
        double[] normalised;
        double[] ae;
        double[] an;
        double weightedSquares;
        int iterations;
        boolean converged;
    }

    private static Solution iterate(List<LineOfPosition> lines, boolean[] rejected, double[] run, Instant fixTime,
            GeoPosition start, Optional<DrTrack> track, FixOptions options) {
        int n = lines.size();
        double k = options.drErrorFraction();
        Solution s = new Solution();
        s.atFix = new LineOfPosition[n];
        s.residual = new double[n];
        s.normalised = new double[n];
        s.ae = new double[n];
        s.an = new double[n];
        GeoPosition pos = start;
        double[] nm = new double[3];
        double[] rhs = new double[2];
        for (int it = 1; it <= options.maxIterations() + 1; it++) {
            for (int i = 0; i < n; i++) {
                LineOfPosition l = lines.get(i);
                GeoPosition at = track.isPresent() ? track.get().move(pos, fixTime, l.utc()) : pos;
                LineOfPosition r = l.reducedFrom(at);
                s.atFix[i] = r;
                s.residual[i] = r.interceptNm();
                double z = Math.toRadians(r.znDeg());
                s.ae[i] = Math.sin(z);
                s.an[i] = Math.cos(z);
            }
            normalEquations(lines, rejected, run, k, s, nm, rhs);
            double det = nm[0] * nm[1] - nm[2] * nm[2];
            double qee = nm[1] / det;
            double qnn = nm[0] / det;
            double qen = -nm[2] / det;
            double de = qee * rhs[0] + qen * rhs[1];
            double dn = qen * rhs[0] + qnn * rhs[1];
            s.covariance = new PositionCovariance(qee, qnn, qen);
            s.iterations = it;
            if (Math.hypot(de, dn) < options.convergenceNm() || it > options.maxIterations()) {
                s.converged = Math.hypot(de, dn) < options.convergenceNm();
                // The residuals above were taken at pos; the last step is below the tolerance.
                break;
            }
            pos = Sphere.step(pos, de, dn);
        }
        s.position = pos;
        standardise(lines, rejected, run, k, s);
        return s;
    }

    /**
     * Forms N = AᵀC⁻¹A (as {ee, nn, en}) and AᵀC⁻¹p with C = D + VVᵀ by Woodbury; also rᵀC⁻¹r.
     */
    private static void normalEquations(List<LineOfPosition> lines, boolean[] rejected, double[] run, double k,
            Solution s, double[] nm, double[] rhs) {
        // Sums with D⁻¹ = diag(1/σ²): AᵀD⁻¹A, AᵀD⁻¹V, VᵀD⁻¹V, AᵀD⁻¹p, VᵀD⁻¹p, pᵀD⁻¹p.
        double aee = 0;
        double ann = 0;
        double aen = 0;
        double[][] av = new double[2][2];
        double[][] vv = new double[2][2];
        double ape = 0;
        double apn = 0;
        double vp0 = 0;
        double vp1 = 0;
        double pp = 0;
        for (int i = 0; i < lines.size(); i++) {
            if (rejected[i]) {
                continue;
            }
            double w = 1.0 / (lines.get(i).sigmaNm() * lines.get(i).sigmaNm());
            double e = s.ae[i];
            double nn = s.an[i];
            double p = s.residual[i];
            double c = k * run[i];
            double v0 = c * e;
            double v1 = c * nn;
            aee += w * e * e;
            ann += w * nn * nn;
            aen += w * e * nn;
            av[0][0] += w * e * v0;
            av[0][1] += w * e * v1;
            av[1][0] += w * nn * v0;
            av[1][1] += w * nn * v1;
            vv[0][0] += w * v0 * v0;
            vv[0][1] += w * v0 * v1;
            vv[1][1] += w * v1 * v1;
            ape += w * e * p;
            apn += w * nn * p;
            vp0 += w * v0 * p;
            vp1 += w * v1 * p;
            pp += w * p * p;
        }
        vv[1][0] = vv[0][1];
        // M = I + VᵀD⁻¹V, its inverse.
        double m00 = 1 + vv[0][0];
        double m11 = 1 + vv[1][1];
        double m01 = vv[0][1];
        double md = m00 * m11 - m01 * m01;
        double i00 = m11 / md;
        double i11 = m00 / md;
        double i01 = -m01 / md;
        // X = AᵀD⁻¹V (2×2), N = AᵀD⁻¹A - X M⁻¹ Xᵀ.
        double x00 = av[0][0];
        double x01 = av[0][1];
        double x10 = av[1][0];
        double x11 = av[1][1];
        double y00 = x00 * i00 + x01 * i01;
        double y01 = x00 * i01 + x01 * i11;
        double y10 = x10 * i00 + x11 * i01;
        double y11 = x10 * i01 + x11 * i11;
        nm[0] = aee - (y00 * x00 + y01 * x01);
        nm[1] = ann - (y10 * x10 + y11 * x11);
        nm[2] = aen - (y00 * x10 + y01 * x11);
        rhs[0] = ape - (y00 * vp0 + y01 * vp1);
        rhs[1] = apn - (y10 * vp0 + y11 * vp1);
        // rᵀC⁻¹r at the solution ≈ pᵀC⁻¹p - rhsᵀ N⁻¹ rhs (the part explained by δ removed).
        double pcp = pp - (vp0 * (i00 * vp0 + i01 * vp1) + vp1 * (i01 * vp0 + i11 * vp1));
        double det = nm[0] * nm[1] - nm[2] * nm[2];
        double explained = (nm[1] * rhs[0] * rhs[0] - 2 * nm[2] * rhs[0] * rhs[1] + nm[0] * rhs[1] * rhs[1]) / det;
        s.weightedSquares = Math.max(0.0, pcp - explained);
    }

    /** Standardised residuals rᵢ/√(C - AQAᵀ)ᵢᵢ of the used lines; rejected lines against C alone. */
    private static void standardise(List<LineOfPosition> lines, boolean[] rejected, double[] run, double k,
            Solution s) {
        PositionCovariance q = s.covariance;
        int used = countUsed(rejected);
        for (int i = 0; i < lines.size(); i++) {
            double sigma = lines.get(i).sigmaNm();
            double c = k * run[i];
            double cii = sigma * sigma + c * c;
            double e = s.ae[i];
            double nn = s.an[i];
            double aqa = e * e * q.eastEastNm2() + nn * nn * q.northNorthNm2() + 2 * e * nn * q.eastNorthNm2();
            double var = rejected[i] ? cii + aqa : cii - aqa;
            s.normalised[i] = used <= 2 && !rejected[i] ? Double.NaN
                    : var > 1e-12 * cii ? s.residual[i] / Math.sqrt(var) : Double.NaN;
        }
    }

    private static CockedHat cockedHat(Solution s, boolean[] rejected) {
        int[] idx = new int[3];
        int m = 0;
        for (int i = 0; i < rejected.length; i++) {
            if (!rejected[i]) {
                idx[m++] = i;
            }
        }
        List<GeoPosition> vertices = new ArrayList<>(3);
        double[][] xy = new double[3][];
        for (int j = 0; j < 3; j++) {
            int a = idx[j];
            int b = idx[(j + 1) % 3];
            double det = s.ae[a] * s.an[b] - s.an[a] * s.ae[b];
            double xe = (s.residual[a] * s.an[b] - s.an[a] * s.residual[b]) / det;
            double xn = (s.ae[a] * s.residual[b] - s.residual[a] * s.ae[b]) / det;
            xy[j] = new double[] {xe, xn};
            vertices.add(Sphere.step(s.position, xe, xn));
        }
        double largest = 0;
        for (int j = 0; j < 3; j++) {
            double[] p = xy[j];
            double[] q = xy[(j + 1) % 3];
            largest = Math.max(largest, Math.hypot(p[0] - q[0], p[1] - q[1]));
        }
        return new CockedHat(vertices, largest);
    }

    /**
     * The narrowest sector (degrees, [0°, 90°]) holding every used line's direction, lines taken
     * modulo 180° (a body and one opposite it give parallel lines).
     */
    static double sectorDeg(List<LineOfPosition> lines, boolean[] rejected) {
        double[] d = new double[lines.size()];
        int m = 0;
        for (int i = 0; i < lines.size(); i++) {
            if (!rejected[i]) {
                d[m++] = lines.get(i).znDeg() % 180.0;
            }
        }
        d = Arrays.copyOf(d, m);
        Arrays.sort(d);
        double largestGap = 180.0 - d[m - 1] + d[0];
        for (int i = 1; i < m; i++) {
            largestGap = Math.max(largestGap, d[i] - d[i - 1]);
        }
        return Math.min(90.0, 180.0 - largestGap);
    }

    private static void checkGeometry(List<LineOfPosition> lines, boolean[] rejected, List<String> warnings,
            boolean warn, FixOptions o) {
        double sector = sectorDeg(lines, rejected);
        int used = countUsed(rejected);
        if (sector < o.refuseCrossingDeg()) {
            throw new FixGeometryException(String.format(Locale.ROOT,
                    "%s cross at only %.0f°: too shallow for a fix (need at least %.0f°). Take a body at least "
                            + "30° away in azimuth (60°-120° is best), or wait for this one to move round",
                    used == 2 ? "the two lines of position" : "all " + used + " lines of position",
                    sector, o.refuseCrossingDeg()));
        }
        if (warn && sector < o.warnCrossingDeg()) {
            warnings.add(String.format(Locale.ROOT,
                    "weak geometry: the lines all lie within %.0f° of each other, so the fix is poor along them; "
                            + "a body 60°-120° off in azimuth would make it firm", sector));
        }
    }

    private static int countUsed(boolean[] rejected) {
        int c = 0;
        for (boolean r : rejected) {
            if (!r) {
                c++;
            }
        }
        return c;
    }

    /**
     * @param lines lines
     * @return their mean time
     */
    public static Instant meanTime(List<LineOfPosition> lines) {
        Instant t0 = lines.get(0).utc();
        double sum = 0;
        for (LineOfPosition l : lines) {
            sum += Duration.between(t0, l.utc()).toNanos();
        }
        return t0.plusNanos(Math.round(sum / lines.size()));
    }
}
