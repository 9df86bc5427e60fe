package org.sightwork.celestial.planning;

import java.util.ArrayList;
import java.util.List;
import java.util.function.DoubleUnaryOperator;
import org.hipparchus.analysis.solvers.AllowedSolution;
import org.hipparchus.analysis.solvers.BracketingNthOrderBrentSolver;
import org.hipparchus.optim.MaxEval;
import org.hipparchus.optim.nonlinear.scalar.GoalType;
import org.hipparchus.optim.univariate.BrentOptimizer;
import org.hipparchus.optim.univariate.SearchInterval;
import org.hipparchus.optim.univariate.UnivariateObjectiveFunction;
import org.hipparchus.optim.univariate.UnivariatePointValuePair;

/**
 * Zero crossings of a smooth function of time over a window: the root finder behind every rise,
 * set, twilight and transit.
 *
 * <p><b>Method:</b> bracket by stepping (the function is sampled every {@code stepS} seconds),
 * then refine each bracket with Hipparchus' bracketing Brent solver of order 2
 * ({@link BracketingNthOrderBrentSolver}, which keeps the root inside the bracket). A pair of roots
 * that falls between two samples (a body that grazes the threshold near the poles) is caught by
 * looking at every local extremum of the samples: the extremum is located with Brent's optimizer
 * ({@link BrentOptimizer}) and, where it lies on the other side of zero, it splits the step in two.
 *
 * <p><b>Accuracy:</b> each root to {@value #ROOT_ABS_ACCURACY_S} s in time (the function's own
 * accuracy aside).
 *
 * <p><b>Limits:</b> two roots closer together than the extremum search can resolve (a graze that
 * dips below the threshold by less than the function's noise) count as none; the function must be
 * continuous over the window (hour angles are handled by {@link #transitCrossings}).
 */
final class EventFinder {

    /** Root accuracy (seconds of time): far inside the minute the times are given to. */
    static final double ROOT_ABS_ACCURACY_S = 0.5;

    private static final int MAX_EVAL = 200;

    private EventFinder() {
    }

    /**
     * A zero crossing.
     *
     * @param tS time of the crossing (seconds from the window's start)
     * @param upward true if the function goes from negative to positive
     */
    record Crossing(double tS, boolean upward) {
    }

    /**
     * Every zero crossing of {@code f} over [0, spanS], in time order.
     *
     * @param f the function of time (seconds from the window's start)
     * @param spanS the window's length (seconds)
     * @param stepS the sampling step (seconds)
     * @return the crossings, in time order
     */
    static List<Crossing> crossings(DoubleUnaryOperator f, double spanS, double stepS) {
        int n = (int) Math.ceil(spanS / stepS);
        List<Double> ts = new ArrayList<>();
        List<Double> fs = new ArrayList<>();
        for (int i = 0; i <= n; i++) {
            double t = Math.min(i * stepS, spanS);
            ts.add(t);
            fs.add(f.applyAsDouble(t));
        }
        // Local extrema on the wrong side of zero hide a pair of roots: add the extremum as a sample.
        List<Double> extraT = new ArrayList<>();
        List<Double> extraF = new ArrayList<>();
        for (int i = 1; i < ts.size() - 1; i++) {
            double a = fs.get(i - 1);
            double b = fs.get(i);
            double c = fs.get(i + 1);
            boolean minAbove = b <= a && b <= c && b > 0;
            boolean maxBelow = b >= a && b >= c && b < 0;
            if (minAbove || maxBelow) {
                UnivariatePointValuePair p = new BrentOptimizer(1e-10, ROOT_ABS_ACCURACY_S).optimize(
                        new MaxEval(MAX_EVAL), new UnivariateObjectiveFunction(f::applyAsDouble),
                        minAbove ? GoalType.MINIMIZE : GoalType.MAXIMIZE,
                        new SearchInterval(ts.get(i - 1), ts.get(i + 1), ts.get(i)));
                if (Math.signum(p.getValue()) != Math.signum(b) && p.getPoint() != ts.get(i)) {
                    extraT.add(p.getPoint());
                    extraF.add(p.getValue());
                }
            }
        }
        for (int k = 0; k < extraT.size(); k++) {
            int at = 0;
            while (at < ts.size() && ts.get(at) < extraT.get(k)) {
                at++;
            }
            ts.add(at, extraT.get(k));
            fs.add(at, extraF.get(k));
        }
        return refine(f, ts, fs, null);
    }

    /**
     * Every upper transit over [0, spanS]: the instants where the signed hour angle (in
     * [-180°, 180°)) goes from negative to positive, the jump at ±180° (lower transit) excluded.
     *
     * @param signedLhaDeg the local hour angle as a function of time, brought into [-180°, 180°)
     * @param spanS the window's length (seconds)
     * @param stepS the sampling step (seconds); must keep the hour angle's change per step well
     *     under 90°
     * @return the transit times (seconds from the window's start), in order
     */
    static List<Double> transitCrossings(DoubleUnaryOperator signedLhaDeg, double spanS, double stepS) {
        int n = (int) Math.ceil(spanS / stepS);
        List<Double> ts = new ArrayList<>();
        List<Double> fs = new ArrayList<>();
        for (int i = 0; i <= n; i++) {
            double t = Math.min(i * stepS, spanS);
            ts.add(t);
            fs.add(signedLhaDeg.applyAsDouble(t));
        }
        List<Double> out = new ArrayList<>();
        for (Crossing c : refine(signedLhaDeg, ts, fs, 90.0)) {
            if (c.upward()) {
                out.add(c.tS());
            }
        }
        return out;
    }

    private static List<Crossing> refine(DoubleUnaryOperator f, List<Double> ts, List<Double> fs, Double maxAbs) {
        List<Crossing> out = new ArrayList<>();
        BracketingNthOrderBrentSolver solver = new BracketingNthOrderBrentSolver(1e-12, ROOT_ABS_ACCURACY_S, 2);
        for (int i = 0; i + 1 < ts.size(); i++) {
            double fa = fs.get(i);
            double fb = fs.get(i + 1);
            boolean up = fa < 0 && fb >= 0;
            boolean down = fa >= 0 && fb < 0;
            if (!(up || down)) {
                continue;
            }
            if (maxAbs != null && (Math.abs(fa) > maxAbs || Math.abs(fb) > maxAbs)) {
                continue; // the wrap of an angle, not a crossing
            }
            double a = ts.get(i);
            double b = ts.get(i + 1);
            double root = fb == 0 ? b
                    : solver.solve(MAX_EVAL, f::applyAsDouble, a, b, AllowedSolution.ANY_SIDE);
            out.add(new Crossing(root, up));
        }
        return out;
    }
}
