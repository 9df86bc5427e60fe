package org.sightwork.celestial.passage;

import java.time.Duration;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.TreeSet;
import org.hipparchus.filtering.kalman.KalmanSmoother;
import org.hipparchus.filtering.kalman.Measurement;
import org.hipparchus.filtering.kalman.ProcessEstimate;
import org.hipparchus.filtering.kalman.linear.LinearEvolution;
import org.hipparchus.filtering.kalman.linear.LinearKalmanFilter;
import org.hipparchus.filtering.kalman.linear.LinearProcess;
import org.hipparchus.linear.Array2DRowRealMatrix;
import org.hipparchus.linear.ArrayRealVector;
import org.hipparchus.linear.MatrixDecomposer;
import org.hipparchus.linear.MatrixUtils;
import org.hipparchus.linear.QRDecomposer;
import org.hipparchus.linear.RealMatrix;
import org.hipparchus.linear.RealVector;
import org.sightwork.geo.earth.GeoPosition;
import org.sightwork.geo.track.DeadReckoning;
import org.sightwork.geo.track.DrLeg;
import org.sightwork.geo.track.DrLog;

/**
 * Reconciles a dead-reckoning log with celestial observations: a linear Kalman filter forward in
 * time and a Rauch-Tung-Striebel smoother back, on Hipparchus ({@code LinearKalmanFilter} with its
 * {@code KalmanSmoother} observer).
 *
 * <p><b>Method.</b> State (6): position east and north in a {@link LocalFrame} (nm), current east
 * and north (kn), log scale error k (fraction) and compass error b (radians). Over a step of dt
 * hours on a leg with water track H and log speed S, the velocity over the ground is
 * S(1 + k)(sin(H + b), cos(H + b)) + c, linearised in the small k and b:
 * S(sin H, cos H) + k S(sin H, cos H) + b S(cos H, −sin H) + c (first order in b; a compass error of
 * 3° leaves 0.14 % of the distance run). The east rate is divided by the frame's east scale at the
 * current latitude. Process noise: the DR velocity error as white noise (position variance grows
 * as q·dt), the current as a random walk integrated into the position (the continuous white-noise
 * acceleration model: Q = q_c [dt³/3, dt²/2; dt²/2, dt]), log scale and compass error as constants.
 * (Bar-Shalom, Li, Kirubarajan, <i>Estimation with Applications to Tracking and Navigation</i>,
 * Wiley 2001, §6.2.2 and §8.6 for the smoother; Rauch, Tung, Striebel, AIAA J. 3 (1965) 1445.)
 * A line of position measures u·(p − AP) = intercept with u = (sin Zn, cos Zn) (Bowditch, Pub. 9,
 * 2019, ch. 19, the intercept method), standard deviation σ; a fix measures the position with its
 * covariance.
 *
 * <p><b>Accuracy.</b> The filter is the exact linear Kalman filter of this model; the tests check it
 * against closed forms (weighted mean σ²/n of repeated fixes; the least-squares straight line for a
 * constant current) and its consistency on 1,000 simulated passages (mean normalised innovation
 * squared 2 for 2 degrees of freedom).
 *
 * <p><b>Limits.</b> Lines of position are used as linear (the intercept method's own
 * approximation, good while the intercept is a few tens of miles); a passage of a few hundred miles
 * at most (the local plane); no outlier rejection: a wild sight shows in {@link Reconciliation#observationChecks()}.
 */
public final class PassageFilter {

    /** Observations with no gap longer than this form one sight session. */
    public static final Duration SESSION_GAP = Duration.ofMinutes(30);
    private static final int N = 6;
    private static final double MS_PER_HOUR = 3_600_000.0;

    private PassageFilter() {
    }

    /**
     * Runs the reconciliation.
     *
     * @param dr the DR log (departure, legs, end)
     * @param observations celestial observations within the log's time span (any order)
     * @param noise the noise model
     * @param gridStep the spacing of the smoothed track's points
     * @return the best track, the sessions and the observation checks
     * @throws IllegalArgumentException if an observation falls outside the DR log
     */
    public static Reconciliation run(DrLog dr, List<CelestialObservation> observations, PassageNoise noise,
            Duration gridStep) {
        List<CelestialObservation> obs = new ArrayList<>(observations);
        obs.sort((a, b) -> a.time().compareTo(b.time()));
        for (CelestialObservation o : obs) {
            if (o.time().isBefore(dr.start()) || o.time().isAfter(dr.end())) {
                throw new IllegalArgumentException("observation '" + o.label() + "' at " + o.time()
                        + " is outside the DR log (" + dr.start() + " to " + dr.end() + ")");
            }
        }
        LocalFrame frame = new LocalFrame(dr.departure());
        long t0 = dr.start().toEpochMilli();

        // Event times: leg starts, grid, observations (as ms), then one filter step per event and per observation.
        TreeSet<Long> times = new TreeSet<>();
        for (DrLeg l : dr.legs()) {
            times.add(l.start().toEpochMilli());
        }
        for (long t = t0; t <= dr.end().toEpochMilli(); t += gridStep.toMillis()) {
            times.add(t);
        }
        times.add(dr.end().toEpochMilli());
        for (CelestialObservation o : obs) {
            times.add(o.time().toEpochMilli());
        }
        List<Step> steps = new ArrayList<>();
        int oi = 0;
        for (long t : times) {
            if (t == t0) {
                // the initial state is the departure; observations at the very start follow as zero steps
            } else {
                steps.add(Step.predict(t));
            }
            while (oi < obs.size() && obs.get(oi).time().toEpochMilli() == t) {
                steps.add(Step.observe(t, obs.get(oi), frame));
                oi++;
            }
        }

        RealVector x0 = new ArrayRealVector(N);
        RealMatrix p0 = MatrixUtils.createRealDiagonalMatrix(new double[] {
            sq(noise.departureSigmaNm()), sq(noise.departureSigmaNm()), sq(noise.currentSigmaKn()),
            sq(noise.currentSigmaKn()), sq(noise.speedScaleSigma()), sq(Math.toRadians(noise.compassBiasSigmaDeg()))});
        MatrixDecomposer decomposer = new QRDecomposer(1e-30);
        Process process = new Process(dr, frame, noise, t0);
        LinearKalmanFilter<Step> filter = new LinearKalmanFilter<>(decomposer, process, new ProcessEstimate(0, x0, p0));
        process.filter = filter;
        KalmanSmoother smoother = new KalmanSmoother(decomposer);
        filter.setObserver(smoother);

        List<Reconciliation.ObservationCheck> checks = new ArrayList<>();
        List<ProcessEstimate> filtered = new ArrayList<>();
        for (Step s : steps) {
            process.previousMs = process.currentMs;
            process.currentMs = s.ms;
            ProcessEstimate e = filter.estimationStep(s);
            filtered.add(e);
            if (s.observation != null && e.getInnovationCovariance() != null) {
                checks.add(check(s, filter.getPredicted(), e.getInnovationCovariance()));
            }
        }
        List<ProcessEstimate> smoothedAll = smoother.backwardsSmooth();

        // Sessions from the causal estimates.
        List<Reconciliation.Session> sessions = new ArrayList<>();
        int si = 0;
        while (si < steps.size()) {
            if (steps.get(si).observation == null) {
                si++;
                continue;
            }
            int first = si;
            int last = si;
            List<String> labels = new ArrayList<>();
            List<CelestialObservation> inSession = new ArrayList<>();
            for (int k = si; k < steps.size(); k++) {
                Step s = steps.get(k);
                if (s.observation == null) {
                    continue;
                }
                if (s.ms - steps.get(last).ms > SESSION_GAP.toMillis()) {
                    break;
                }
                labels.add(s.observation.label());
                inSession.add(s.observation);
                last = k;
            }
            sessions.add(new Reconciliation.Session(sessions.size() + 1, Instant.ofEpochMilli(steps.get(first).ms),
                    Instant.ofEpochMilli(steps.get(last).ms), labels, estimate(frame, steps.get(last).ms, filtered.get(last)),
                    fixesOnItsOwn(inSession)));
            si = last + 1;
        }

        // The smoothed track: one estimate per distinct time (the last step at that time).
        int offset = smoothedAll.size() - steps.size(); // the smoother may hold the initial estimate first
        List<TrackEstimate> track = new ArrayList<>();
        track.add(estimate(frame, t0, offset == 1 ? smoothedAll.get(0) : new ProcessEstimate(0, x0, p0)));
        for (int k = 0; k < steps.size(); k++) {
            if (k + 1 < steps.size() && steps.get(k + 1).ms == steps.get(k).ms) {
                continue;
            }
            track.add(estimate(frame, steps.get(k).ms, smoothedAll.get(k + offset)));
        }
        return new Reconciliation(frame, track, sessions, checks);
    }

    private static boolean fixesOnItsOwn(List<CelestialObservation> obs) {
        for (CelestialObservation a : obs) {
            if (a instanceof CelestialObservation.Position) {
                return true;
            }
            for (CelestialObservation b : obs) {
                if (a instanceof CelestialObservation.Line la && b instanceof CelestialObservation.Line lb) {
                    double d = Math.abs(la.azimuthDeg() - lb.azimuthDeg()) % 180;
                    if (d >= 30 && d <= 150) {
                        return true;
                    }
                }
            }
        }
        return false;
    }

    private static Reconciliation.ObservationCheck check(Step s, ProcessEstimate predicted, RealMatrix innovationCov) {
        RealVector innov = s.value.subtract(s.h.operate(predicted.getState()));
        RealMatrix sInv = new QRDecomposer(1e-30).decompose(innovationCov).getInverse();
        double nis = innov.dotProduct(sInv.operate(innov));
        double residual = innov.getDimension() == 1 ? innov.getEntry(0) : innov.getNorm();
        return new Reconciliation.ObservationCheck(s.observation.time(), s.observation.label(), residual, nis,
                innov.getDimension());
    }

    private static TrackEstimate estimate(LocalFrame frame, long ms, ProcessEstimate e) {
        RealVector x = e.getState();
        RealMatrix p = e.getCovariance();
        double lat = frame.latitudeAt(x.getEntry(1));
        double m = frame.eastScale(lat);
        GeoPosition pos = frame.toGeo(x.getEntry(0), x.getEntry(1));
        Covariance2 c = new Covariance2(m * m * p.getEntry(0, 0), p.getEntry(1, 1), m * p.getEntry(0, 1));
        double cSigma = Math.sqrt(Math.max(p.getEntry(2, 2), p.getEntry(3, 3)));
        return new TrackEstimate(Instant.ofEpochMilli(ms), pos, c,
                DeadReckoning.Current.ofComponents(x.getEntry(2), x.getEntry(3)), cSigma, x.getEntry(4),
                Math.toDegrees(x.getEntry(5)));
    }

    private static double sq(double v) {
        return v * v;
    }

    /** One filter step: a prediction to a time, with or without an observation there. */
    static final class Step implements Measurement {
        final long ms;
        final CelestialObservation observation;
        final RealMatrix h;
        final RealVector value;
        final RealMatrix r;

        private Step(long ms, CelestialObservation o, RealMatrix h, RealVector value, RealMatrix r) {
            this.ms = ms;
            this.observation = o;
            this.h = h;
            this.value = value;
            this.r = r;
        }

        static Step predict(long ms) {
            return new Step(ms, null, null, new ArrayRealVector(1), MatrixUtils.createRealIdentityMatrix(1));
        }

        static Step observe(long ms, CelestialObservation o, LocalFrame frame) {
            if (o instanceof CelestialObservation.Line l) {
                double z = Math.toRadians(l.azimuthDeg());
                double[] ap = frame.toLocal(l.ap());
                double m = frame.eastScale(l.ap().latDeg());
                RealMatrix h = new Array2DRowRealMatrix(1, N);
                h.setEntry(0, 0, Math.sin(z) * m);
                h.setEntry(0, 1, Math.cos(z));
                double value = l.interceptNm() + Math.sin(z) * m * ap[0] + Math.cos(z) * ap[1];
                return new Step(ms, o, h, new ArrayRealVector(new double[] {value}),
                        MatrixUtils.createRealDiagonalMatrix(new double[] {l.sigmaNm() * l.sigmaNm()}));
            }
            CelestialObservation.Position f = (CelestialObservation.Position) o;
            double[] p = frame.toLocal(f.position());
            double m = frame.eastScale(f.position().latDeg());
            RealMatrix h = new Array2DRowRealMatrix(2, N);
            h.setEntry(0, 0, m);
            h.setEntry(1, 1, 1);
            double se = f.sigmaEastNm();
            double sn = f.sigmaNorthNm();
            RealMatrix r = new Array2DRowRealMatrix(new double[][] {{se * se, f.correlation() * se * sn},
                {f.correlation() * se * sn, sn * sn}});
            return new Step(ms, o, h, new ArrayRealVector(new double[] {m * p[0], p[1]}), r);
        }

        @Override
        public double getTime() {
            return ms / MS_PER_HOUR;
        }

        @Override
        public RealVector getValue() {
            return value;
        }

        @Override
        public RealMatrix getCovariance() {
            return r;
        }
    }

    /** The linear process: transition, command and noise of one step on the leg in force. */
    private static final class Process implements LinearProcess<Step> {
        private final DrLog dr;
        private final LocalFrame frame;
        private final PassageNoise noise;
        private final RealMatrix identity = MatrixUtils.createRealIdentityMatrix(N);
        LinearKalmanFilter<Step> filter;
        long previousMs;
        long currentMs;

        Process(DrLog dr, LocalFrame frame, PassageNoise noise, long t0) {
            this.dr = dr;
            this.frame = frame;
            this.noise = noise;
            this.previousMs = t0;
            this.currentMs = t0;
        }

        @Override
        public LinearEvolution getEvolution(Step step) {
            double dt = (currentMs - previousMs) / MS_PER_HOUR;
            RealMatrix f = MatrixUtils.createRealIdentityMatrix(N);
            RealVector u = new ArrayRealVector(N);
            RealMatrix q = new Array2DRowRealMatrix(N, N);
            if (dt > 0) {
                int legIndex = dr.legAt(Instant.ofEpochMilli(previousMs));
                DrLeg leg = dr.legs().get(Math.max(legIndex, 0));
                double hRad = Math.toRadians(leg.waterTrackDeg());
                double s = leg.stwKn();
                double lat = frame.latitudeAt(filter.getCorrected().getState().getEntry(1));
                double m = frame.eastScale(lat);
                double sinH = Math.sin(hRad);
                double cosH = Math.cos(hRad);
                f.setEntry(0, 2, dt / m);
                f.setEntry(0, 4, dt * s * sinH / m);
                f.setEntry(0, 5, dt * s * cosH / m);
                f.setEntry(1, 3, dt);
                f.setEntry(1, 4, dt * s * cosH);
                f.setEntry(1, 5, -dt * s * sinH);
                u.setEntry(0, dt * s * sinH / m);
                u.setEntry(1, dt * s * cosH);
                double qv = noise.drVelocityNoiseKn() * noise.drVelocityNoiseKn(); // nm²/h: variance per hour
                double qc = noise.currentChangeKnPerSqrtHour() * noise.currentChangeKnPerSqrtHour();
                double ppos = qv * dt + qc * dt * dt * dt / 3;
                q.setEntry(0, 0, ppos / (m * m));
                q.setEntry(1, 1, ppos);
                q.setEntry(0, 2, qc * dt * dt / 2 / m);
                q.setEntry(2, 0, qc * dt * dt / 2 / m);
                q.setEntry(1, 3, qc * dt * dt / 2);
                q.setEntry(3, 1, qc * dt * dt / 2);
                q.setEntry(2, 2, qc * dt);
                q.setEntry(3, 3, qc * dt);
            }
            return new LinearEvolution(f, identity, u, q, step.h);
        }
    }
}
