package org.sightwork.celestial.passage;

import java.time.Duration;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import org.sightwork.geo.earth.GeoPosition;
import org.sightwork.geo.track.DrLeg;
import org.sightwork.geo.track.DrLog;
import org.sightwork.geo.track.Track;

/**
 * Simulated passages for the tests: a true track drawn from the filter's own noise model (so that
 * the filter's claimed uncertainty can be checked), the DR log the navigator would keep, sight
 * sessions and a GPS track with an optional fault. Invented data: never a check value by itself;
 * the tests check statistical properties that the chi-square law predicts.
 */
final class PassageSimulation {

    /** What went wrong with the GPS, if anything. */
    enum Fault {
        NONE, STEP, DRIFT
    }

    /** A simulated passage. */
    record Passage(DrLog dr, List<CelestialObservation> observations, Track gps, List<GeoPosition> truth,
            List<Instant> truthTimes, Instant faultStart, List<Instant> sessionEnds) {
    }

    static final Duration TRUTH_STEP = Duration.ofMinutes(1);
    /** Correlation time of the simulated DR velocity error (hours). */
    static final double TAU_H = 0.5;

    private PassageSimulation() {
    }

    /**
     * A 30-hour passage from 17:00 UTC: evening stars (+4 h), morning stars (+12.5 h), a morning Sun
     * line (+16 h), a noon Sun line (+19 h), evening stars (+28 h).
     */
    static Passage simulate(long seed, PassageNoise noise, Fault fault, double offsetNm, double driftKn) {
        Random rnd = new Random(seed);
        Instant t0 = Instant.parse("2026-06-20T17:00:00Z");
        GeoPosition dep = new GeoPosition(38.53 + rnd.nextGaussian() * 5, -28.63 + rnd.nextGaussian() * 10);
        LocalFrame frame = new LocalFrame(dep);
        Duration length = Duration.ofHours(30);
        Instant end = t0.plus(length);
        // legs every 3-6 h
        List<DrLeg> legs = new ArrayList<>();
        Instant t = t0;
        while (t.isBefore(end)) {
            legs.add(new DrLeg(t, rnd.nextDouble() * 360, 4 + rnd.nextDouble() * 3, 0));
            t = t.plus(Duration.ofMinutes(180 + rnd.nextInt(180)));
        }
        DrLog dr = new DrLog(dep, legs, end);
        // true constants and initial state
        double k = rnd.nextGaussian() * noise.speedScaleSigma();
        double b = Math.toRadians(rnd.nextGaussian() * noise.compassBiasSigmaDeg());
        double ce = rnd.nextGaussian() * noise.currentSigmaKn();
        double cn = rnd.nextGaussian() * noise.currentSigmaKn();
        double e = rnd.nextGaussian() * noise.departureSigmaNm();
        double n = rnd.nextGaussian() * noise.departureSigmaNm();
        double dt = TRUTH_STEP.toMillis() / 3_600_000.0;
        double ve = 0;
        double vn = 0;
        List<GeoPosition> truth = new ArrayList<>();
        List<Instant> times = new ArrayList<>();
        List<double[]> local = new ArrayList<>();
        for (Instant s = t0; !s.isAfter(end); s = s.plus(TRUTH_STEP)) {
            truth.add(frame.toGeo(e, n));
            times.add(s);
            local.add(new double[] {e, n});
            DrLeg leg = legs.get(dr.legAt(s));
            double h = Math.toRadians(leg.waterTrackDeg()) + b;
            double sp = leg.stwKn() * (1 + k);
            double m = frame.eastScale(frame.latitudeAt(n));
            double sc = noise.currentChangeKnPerSqrtHour() * Math.sqrt(dt);
            // position integrates velocity, current and a velocity error; the error is a first-order
            // Gauss-Markov process (correlation time TAU_H) whose integral grows in variance as
            // 2 σ² τ t = q t for t much longer than τ: the filter's white-noise model at the scale
            // of hours, and a smooth velocity at the scale of minutes (as a real vessel's).
            e += ((sp * Math.sin(h) + ce + ve) * dt) / m;
            n += (sp * Math.cos(h) + cn + vn) * dt;
            double phi = Math.exp(-dt / TAU_H);
            double sigmaV = noise.drVelocityNoiseKn() / Math.sqrt(2 * TAU_H);
            ve = phi * ve + Math.sqrt(1 - phi * phi) * sigmaV * rnd.nextGaussian();
            vn = phi * vn + Math.sqrt(1 - phi * phi) * sigmaV * rnd.nextGaussian();
            ce += rnd.nextGaussian() * sc;
            cn += rnd.nextGaussian() * sc;
        }
        double sigmaLop = 0.5 + rnd.nextDouble() * 0.3;
        List<CelestialObservation> obs = new ArrayList<>();
        List<Instant> sessionEnds = new ArrayList<>();
        double[] starHours = {4, 12.5, 28};
        for (double hStart : starHours) {
            int stars = 4 + rnd.nextInt(3);
            double z0 = rnd.nextDouble() * 360;
            Instant last = null;
            for (int i = 0; i < stars; i++) {
                Instant ts = t0.plusSeconds((long) (hStart * 3600 + i * 240));
                double z = (z0 + i * 360.0 / stars + rnd.nextGaussian() * 10 + 360) % 360;
                obs.add(line(frame, local, t0, ts, z, sigmaLop, "star " + (i + 1), rnd));
                last = ts;
            }
            sessionEnds.add(last);
        }
        for (double[] sun : new double[][] {{16, 100 + rnd.nextDouble() * 20}, {19, 180}}) {
            Instant ts = t0.plusSeconds((long) (sun[0] * 3600));
            obs.add(line(frame, local, t0, ts, sun[1], sigmaLop + 0.2, "Sun", rnd));
            sessionEnds.add(ts);
        }
        sessionEnds.sort(null);
        // GPS every minute, with the fault
        Instant faultStart = t0.plusSeconds((long) ((4.5 + rnd.nextDouble() * 7.5) * 3600)); // between sessions 1 and 2
        double dir = rnd.nextDouble() * 2 * Math.PI;
        Track.Builder gb = Track.builder();
        for (int i = 0; i < truth.size(); i++) {
            double[] p = local.get(i).clone();
            double m = frame.eastScale(truth.get(i).latDeg());
            double oe = 0;
            double on = 0;
            if (fault != Fault.NONE && !times.get(i).isBefore(faultStart)) {
                double size = fault == Fault.STEP ? offsetNm
                        : driftKn * Duration.between(faultStart, times.get(i)).toMillis() / 3_600_000.0;
                oe = size * Math.sin(dir);
                on = size * Math.cos(dir);
            }
            p[0] += (oe + rnd.nextGaussian() * noise.gpsSigmaNm()) / m;
            p[1] += on + rnd.nextGaussian() * noise.gpsSigmaNm();
            GeoPosition g = frame.toGeo(p[0], p[1]);
            gb.add(times.get(i).toEpochMilli(), g.latDeg(), g.lonDeg(), Double.NaN, Double.NaN, Double.NaN, Double.NaN);
        }
        return new Passage(dr, obs, gb.build(), truth, times, faultStart, sessionEnds);
    }

    private static CelestialObservation.Line line(LocalFrame frame, List<double[]> local, Instant t0, Instant ts,
            double zDeg, double sigma, String label, Random rnd) {
        int idx = (int) (Duration.between(t0, ts).toMillis() / TRUTH_STEP.toMillis());
        double[] p = local.get(idx);
        GeoPosition truePos = frame.toGeo(p[0], p[1]);
        // AP: a rounded position some miles off, as a navigator would choose
        GeoPosition ap = GeoPosition.of(Math.round((truePos.latDeg() + rnd.nextGaussian() * 0.08) * 60) / 60.0,
                Math.round((truePos.lonDeg() + rnd.nextGaussian() * 0.1) * 60) / 60.0);
        double[] a = frame.toLocal(ap);
        double m = frame.eastScale(ap.latDeg());
        double z = Math.toRadians(zDeg);
        double intercept = Math.sin(z) * m * (p[0] - a[0]) + Math.cos(z) * (p[1] - a[1]) + rnd.nextGaussian() * sigma;
        return new CelestialObservation.Line(ts, label, ap, zDeg, intercept, sigma);
    }
}
