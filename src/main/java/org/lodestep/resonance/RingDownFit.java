package org.lodestep.resonance;

import org.apache.commons.math3.fitting.leastsquares.LeastSquaresBuilder;
import org.apache.commons.math3.fitting.leastsquares.LeastSquaresOptimizer;
import org.apache.commons.math3.fitting.leastsquares.LevenbergMarquardtOptimizer;
import org.apache.commons.math3.fitting.leastsquares.MultivariateJacobianFunction;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.ArrayRealVector;
import org.apache.commons.math3.linear.RealMatrix;
import org.apache.commons.math3.linear.RealVector;
import org.apache.commons.math3.stat.regression.SimpleRegression;
import org.apache.commons.math3.util.Pair;

/**
 * Fits a damped sinusoid to a single-step (or tap) response to find the natural frequency and damping ratio.
 *
 * <p>Model: x(t) = A·e^(-σt)·cos(ω_d·t + φ) + c (S. S. Rao, <i>Mechanical Vibrations</i>, 5th ed., 2011, ch. 2,
 * free viscously damped vibration). Starting values come from zero crossings (ω_d) and the logarithmic decrement of
 * the half-period peaks (σ); Levenberg-Marquardt least squares (Commons Math) then refines all five parameters. The
 * fit starts at the first peak of the free oscillation (after a pre-trigger stretch, and for a step response after
 * the first crossing of the settled value, where the rotor is released from the step) and ends where the oscillation
 * has decayed into the noise.
 *
 * <p>A hybrid stepper's ring-down is not one sinusoid: its restoring torque is sinusoidal in rotor angle, so the
 * first large swings ring slower than the small oscillation they decay into. The ring is therefore first measured
 * cycle by cycle ({@link RingDownBackbone}); the reported natural frequency and damping ratio are the small-signal
 * values extrapolated to zero amplitude, and the damped sinusoid is fitted to the settled tail (swings at most half
 * the largest), where the model holds.
 */
public final class RingDownFit {
    /** The fit stops where the envelope falls below this fraction of the first peak. */
    private static final double END_FRACTION = 0.03;
    /**
     * Least ratio of the first swing to the RMS noise of the record's last fifth for a signal to count as a ring-down.
     * The largest of a million samples of Gaussian noise lies near 5 σ (the normal distribution's tail), so pure
     * noise stays below 8 (references §28); a measured ring starts tens to hundreds of times above its noise floor.
     * Our own screen (common practice).
     */
    static final double MIN_PEAK_TO_NOISE = 8;

    private RingDownFit() {
    }

    /**
     * @param x            the response, in any unit (position, velocity, acceleration, sound)
     * @param sampleRateHz samples per second
     * @param startTimeS   time of x[0], s
     * @throws IllegalArgumentException when there is no decaying oscillation to fit (fewer than two periods, flat,
     *                                  growing), with a message saying what was found
     */
    public static RingDownResult fit(double[] x, double sampleRateHz, double startTimeS) {
        Require.positive(sampleRateHz, "sample rate", "Hz");
        int n = x.length;
        if (n < 16) {
            throw new IllegalArgumentException("a ring-down needs at least 16 samples, got " + n);
        }
        for (int i = 0; i < n; i++) {
            if (!Double.isFinite(x[i])) {
                throw new IllegalArgumentException("sample " + i + " is not a finite number");
            }
        }
        double settled = mean(x, n - Math.max(4, n / 5), n);
        // Onset: where the signal first leaves its initial level (a pre-trigger stretch is skipped).
        double range = 0;
        for (int i = 0; i < n; i++) {
            range = Math.max(range, Math.abs(x[i] - x[0]));
        }
        if (!(range > 0)) {
            throw new IllegalArgumentException("the signal is flat: no ring-down to fit");
        }
        int onset = 0;
        while (onset < n - 1 && Math.abs(x[onset] - x[0]) <= 0.1 * range) {
            onset++;
        }
        // A step response starts far from its settled value and only then rings: the fit starts at the first
        // extremum about the settled value after the onset (the first overshoot), where the free oscillation is.
        int start = onset;
        if (Math.abs(x[onset] - settled) > 0.5 * range) {
            start = nextCrossing(x, onset, settled);
        }
        // The extremum of the half-wave that begins here: robust to noise, unlike the first local maximum.
        int halfWaveEnd = nextCrossing(x, start, settled);
        for (int i = start; i < halfWaveEnd; i++) {
            if (Math.abs(x[i] - settled) > Math.abs(x[start] - settled)) {
                start = i;
            }
        }
        double peak = Math.abs(x[start] - settled);
        if (!(peak > 0)) {
            throw new IllegalArgumentException("no oscillation about the settled value: no ring-down to fit");
        }
        int end = n;
        for (int i = n - 1; i > start; i--) {
            if (Math.abs(x[i] - settled) > END_FRACTION * peak) {
                end = Math.min(n, i + 1 + (i - start) / 10);
                break;
            }
        }
        // Cycle by cycle first: the backbone, and where the small swings (the settled tail) begin.
        double noise = tailNoise(x, settled);
        if (!(peak >= MIN_PEAK_TO_NOISE * noise)) {
            throw new IllegalArgumentException(String.format("no decaying oscillation found: the largest swing (%.3g)"
                    + " is only %.1f times the noise of the record's end (%.3g); expected a ring that rises clearly"
                    + " above the noise and dies away", peak, peak / noise, noise));
        }
        RingDownBackbone.Result bb = RingDownBackbone.measure(x, start, settled, noise, sampleRateHz, startTimeS);
        int tail = start;
        if (bb != null && bb.firstTailCycle() > 0) {
            int at = (int) Math.round((bb.cycles().get(bb.firstTailCycle()).startTimeS() - startTimeS) * sampleRateHz);
            // the tail's fit starts at the extremum of that cycle's first half-wave
            int halfEnd = nextCrossing(x, Math.min(n - 2, at + 1), settled);
            int best = at;
            for (int i = at; i < Math.min(halfEnd, n); i++) {
                if (Math.abs(x[i] - settled) > Math.abs(x[best] - settled)) {
                    best = i;
                }
            }
            if (end - best > 16) {
                tail = best;
            }
        }
        RingDownResult whole = fitFrom(x, start, end, settled, sampleRateHz, startTimeS);
        RingDownResult fit = whole;
        if (tail != start) {
            try {
                fit = fitFrom(x, tail, end, settled, sampleRateHz, startTimeS);
            } catch (IllegalArgumentException tooShort) {
                fit = whole; // a tail of fewer than two periods: keep the whole-ring fit's shape
            }
        }
        fit = fit.withRing(startTimeS + start / sampleRateHz, noise);
        if (bb == null) {
            return fit;
        }
        return fit.withBackbone(bb.smallSignalHz(), bb.smallSignalHzError(), bb.dampingRatio(),
                bb.dampingRatioError(), bb.largeSwingHz(), whole.naturalFrequencyHz(), whole.rSquared(),
                bb.cycles());
    }

    /** RMS about the settled value over the last fifth of the record: the noise once the ring has died away. */
    private static double tailNoise(double[] x, double settled) {
        int n = x.length;
        double s = 0;
        int from = n - Math.max(4, n / 5);
        for (int i = from; i < n; i++) {
            s += (x[i] - settled) * (x[i] - settled);
        }
        return Math.sqrt(s / (n - from));
    }

    /** The damped-sinusoid fit of x[start ... end). */
    private static RingDownResult fitFrom(double[] x, int start, int end, double settled, double sampleRateHz,
                                          double startTimeS) {
        int m = end - start;
        double dt = 1 / sampleRateHz;
        // Zero crossings of the oscillation about its settled value give the damped period.
        double firstCross = Double.NaN;
        double lastCross = Double.NaN;
        int crossings = 0;
        SimpleRegression logPeaks = new SimpleRegression();
        double halfPeak = 0;
        double halfPeakT = 0;
        for (int i = start + 1; i < end; i++) {
            double a = x[i - 1] - settled;
            double b = x[i] - settled;
            if (Math.abs(b) > halfPeak) {
                halfPeak = Math.abs(b);
                halfPeakT = (i - start) * dt;
            }
            if ((a < 0) != (b < 0) && a != b) {
                double t = (i - 1 - start + a / (a - b)) * dt;
                if (crossings == 0) {
                    firstCross = t;
                } else if (halfPeak > 0) {
                    logPeaks.addData(halfPeakT, Math.log(halfPeak));
                }
                lastCross = t;
                crossings++;
                halfPeak = 0;
            }
        }
        if (crossings < 4) {
            throw new IllegalArgumentException("found " + crossings + " zero crossings after the largest excursion;"
                    + " a ring-down fit needs at least two periods of decaying oscillation");
        }
        double omegaD0 = Math.PI * (crossings - 1) / (lastCross - firstCross);
        double sigma0 = logPeaks.getN() >= 2 ? Math.max(0, -logPeaks.getSlope()) : 1 / (m * dt);
        double[] t = new double[m];
        double[] y = new double[m];
        double sst = 0;
        double ym = mean(x, start, end);
        for (int i = 0; i < m; i++) {
            t[i] = i * dt;
            y[i] = x[start + i];
            sst += (y[i] - ym) * (y[i] - ym);
        }
        double a0 = x[start] - settled;
        LeastSquaresOptimizer.Optimum opt;
        try {
            opt = new LevenbergMarquardtOptimizer().optimize(new LeastSquaresBuilder()
                    .model(model(t))
                    .target(y)
                    .start(new double[] {a0, sigma0, omegaD0, 0.0, settled})
                    .maxEvaluations(10_000)
                    .maxIterations(10_000)
                    .build());
        } catch (IllegalStateException | ArithmeticException e) {
            // Commons Math's convergence and evaluation-count failures: nothing shaped like a damped sinusoid
            throw new IllegalArgumentException("no decaying oscillation found: the damped-sinusoid fit did not"
                    + " converge; expected a ring-down of at least two periods");
        }
        double[] p = opt.getPoint().toArray();
        double amplitude = p[0];
        double phase = p[3];
        if (amplitude < 0) {
            amplitude = -amplitude;
            phase += Math.PI;
        }
        double sigma = p[1];
        double omegaD = Math.abs(p[2]);
        if (p[2] < 0) {
            phase = -phase; // cos(-ω·t + φ) = cos(ω·t - φ): the same curve with a positive frequency
        }
        if (!(sigma > 0)) {
            throw new IllegalArgumentException("the fitted oscillation does not decay (decay rate " + sigma
                    + " 1/s): not a ring-down");
        }
        double omegaN = Math.hypot(sigma, omegaD);
        double zeta = DampedOscillation.dampingRatio(sigma, omegaD);
        double ssr = opt.getRMS() * opt.getRMS() * m;
        double duration = m * dt;
        return new RingDownResult(omegaN / (2 * Math.PI), omegaD / (2 * Math.PI), zeta, sigma, amplitude, p[4],
                DampedOscillation.qualityFactor(zeta), 1 - ssr / sst, opt.getRMS(), startTimeS + start * dt,
                duration, duration * omegaD / (2 * Math.PI), phase, startTimeS + start * dt, 0);
    }

    /** Index of the first sample after {@code from} on the other side of {@code level}, or x.length. */
    private static int nextCrossing(double[] x, int from, double level) {
        boolean above = x[from] >= level;
        int i = from + 1;
        while (i < x.length && (x[i] >= level) == above) {
            i++;
        }
        return i;
    }

    private static double mean(double[] x, int from, int to) {
        double s = 0;
        for (int i = from; i < to; i++) {
            s += x[i];
        }
        return s / (to - from);
    }

    /** Values and analytic Jacobian of A·e^(-σt)·cos(ωt + φ) + c over the parameters (A, σ, ω, φ, c). */
    private static MultivariateJacobianFunction model(double[] t) {
        return point -> {
            double a = point.getEntry(0);
            double s = point.getEntry(1);
            double w = point.getEntry(2);
            double ph = point.getEntry(3);
            double c = point.getEntry(4);
            RealVector v = new ArrayRealVector(t.length);
            RealMatrix j = new Array2DRowRealMatrix(t.length, 5);
            for (int i = 0; i < t.length; i++) {
                double e = Math.exp(-s * t[i]);
                double arg = w * t[i] + ph;
                double cos = Math.cos(arg);
                double sin = Math.sin(arg);
                v.setEntry(i, a * e * cos + c);
                j.setEntry(i, 0, e * cos);
                j.setEntry(i, 1, -t[i] * a * e * cos);
                j.setEntry(i, 2, -t[i] * a * e * sin);
                j.setEntry(i, 3, -a * e * sin);
                j.setEntry(i, 4, 1.0);
            }
            return new Pair<>(v, j);
        };
    }
}
