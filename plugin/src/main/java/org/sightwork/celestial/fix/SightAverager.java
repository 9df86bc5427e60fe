package org.sightwork.celestial.fix;

import java.time.Duration;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Objects;
import java.util.Optional;
import java.util.function.ToDoubleFunction;

/**
 * Several shots of one body within a few minutes, fitted against the computed altitude curve and
 * reduced to one sight.
 *
 * <p><b>Method.</b> The altitude changes along the curve Hc(t) computed from the almanac and the
 * moving DR (not a straight line, not a plain mean of the readings): each shot gives an offset
 * oᵢ = Hoᵢ - Hc(tᵢ); the fitted sight is Hc(t̄) + mean(o) at the mean time t̄, its standard error
 * σ/√n. The shot with the largest |oᵢ - mean| is left out while that exceeds 3σ and at least three
 * remain (one at a time). With three or more shots the observed slope (least-squares line through
 * the shots) is compared with the computed slope; a difference over 3 standard errors gets a
 * warning (wrong body, or the watch).
 *
 * <p><b>Accuracy.</b> The curve's error cancels in the offsets to the extent Hc is smooth over the
 * minutes spanned (second differences under 0.01′ for 5 minutes below 80° altitude).
 * Thread safety: stateless.
 */
public final class SightAverager {

    private SightAverager() {
    }

    /**
     * One shot.
     *
     * @param utc time
     * @param hoDeg its observed altitude (degrees)
     */
    public record Shot(Instant utc, double hoDeg) {
        /** Checks. */
        public Shot {
            Objects.requireNonNull(utc, "utc");
        }
    }

    /**
     * The fitted sight.
     *
     * @param utc the mean time of the shots used
     * @param hoDeg the fitted observed altitude at that time (degrees)
     * @param standardErrorArcmin its standard error (minutes)
     * @param residualsArcmin each shot's offset from the fit (minutes), same order as given
     * @param rejected whether each shot was left out
     * @param warning a slope warning, if any
     */
    public record Averaged(Instant utc, double hoDeg, double standardErrorArcmin, List<Double> residualsArcmin,
            List<Boolean> rejected, Optional<String> warning) {
        /** Copies the lists. */
        public Averaged {
            residualsArcmin = List.copyOf(residualsArcmin);
            rejected = List.copyOf(rejected);
        }
    }

    /**
     * @param shots the shots (at least one)
     * @param hcAt the computed altitude of the body from the DR at a time (degrees)
     * @param sigmaArcmin the standard error of one shot (minutes)
     * @return the fitted sight
     */
    public static Averaged average(List<Shot> shots, ToDoubleFunction<Instant> hcAt, double sigmaArcmin) {
        int n = shots.size();
        if (n == 0) {
            throw new IllegalArgumentException("no shots to average");
        }
        double[] off = new double[n];
        double[] hc = new double[n];
        for (int i = 0; i < n; i++) {
            hc[i] = hcAt.applyAsDouble(shots.get(i).utc());
            off[i] = (shots.get(i).hoDeg() - hc[i]) * 60.0;
        }
        boolean[] out = new boolean[n];
        int used = n;
        while (true) {
            double mean = mean(off, out);
            int worst = -1;
            for (int i = 0; i < n; i++) {
                if (!out[i] && (worst < 0 || Math.abs(off[i] - mean) > Math.abs(off[worst] - mean))) {
                    worst = i;
                }
            }
            if (used > 3 && Math.abs(off[worst] - mean) > 3.0 * sigmaArcmin) {
                out[worst] = true;
                used--;
            } else {
                break;
            }
        }
        double mean = mean(off, out);
        Instant t0 = shots.get(0).utc();
        double tSum = 0;
        for (int i = 0; i < n; i++) {
            if (!out[i]) {
                tSum += Duration.between(t0, shots.get(i).utc()).toNanos() / 1e9;
            }
        }
        Instant tBar = t0.plusNanos(Math.round(tSum / used * 1e9));
        double ho = hcAt.applyAsDouble(tBar) + mean / 60.0;
        List<Double> res = new ArrayList<>();
        List<Boolean> rej = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            res.add(off[i] - mean);
            rej.add(out[i]);
        }
        Optional<String> warning = Optional.empty();
        if (used >= 3) {
            // Observed and computed slopes (minutes per minute of time) by least squares.
            double st = 0;
            double stt = 0;
            double so = 0;
            double sto = 0;
            double sc = 0;
            double stc = 0;
            for (int i = 0; i < n; i++) {
                if (out[i]) {
                    continue;
                }
                double t = Duration.between(tBar, shots.get(i).utc()).toNanos() / 6e10;
                st += t;
                stt += t * t;
                so += shots.get(i).hoDeg() * 60.0;
                sto += t * shots.get(i).hoDeg() * 60.0;
                sc += hc[i] * 60.0;
                stc += t * hc[i] * 60.0;
            }
            double den = used * stt - st * st;
            if (den > 0) {
                double slopeObs = (used * sto - st * so) / den;
                double slopeHc = (used * stc - st * sc) / den;
                double slopeSe = sigmaArcmin * Math.sqrt(used / den);
                if (Math.abs(slopeObs - slopeHc) > 3.0 * slopeSe) {
                    warning = Optional.of(String.format(Locale.ROOT,
                            "the shots rise %.2f′ a minute but the body should rise %.2f′ a minute from the DR: "
                                    + "check the body's name and the watch", slopeObs, slopeHc));
                }
            }
        }
        return new Averaged(tBar, ho, sigmaArcmin / Math.sqrt(used), res, rej, warning);
    }

    private static double mean(double[] v, boolean[] out) {
        double s = 0;
        int c = 0;
        for (int i = 0; i < v.length; i++) {
            if (!out[i]) {
                s += v[i];
                c++;
            }
        }
        return s / c;
    }
}
