package org.lodestep.resonance;

import java.util.ArrayList;
import java.util.List;

import org.apache.commons.math3.stat.regression.SimpleRegression;

/**
 * A ring-down measured cycle by cycle: zero crossings about the settled value give each cycle's period, parabola-
 * refined half-wave peaks its amplitude, and the ratio of successive peaks its logarithmic decrement. The backbone
 * (frequency against amplitude) of a hybrid stepper softens: its restoring torque T_h·sin(N_r·δ) stiffens less than
 * linearly, so a large swing rings slower. For small swings the shift is quadratic in amplitude, f ≈ f_0·(1 − κ·a²)
 * (the Lindstedt–Poincaré result for a softening cubic term: A. H. Nayfeh, D. T. Mook, <i>Nonlinear
 * Oscillations</i>, Wiley 1979, ch. 4; from memory), so the small-signal frequency f_0 and decrement δ_0 are the
 * intercepts of straight-line fits against a² over the cycles whose amplitude is at most {@link #SMALL_SWING} of the
 * largest, with their standard errors; ζ = δ/√(4π² + δ²) (S. S. Rao, <i>Mechanical Vibrations</i>, 5th ed., 2011,
 * ch. 2). The cycle frequencies are damped frequencies, so f_0 is the damped intercept divided by √(1 − ζ²). Zero
 * crossings need a hysteresis of {@link #HYSTERESIS} times the tail's noise, and cycles within {@link #NOISE_MARGIN}
 * times that noise are not used (common practice).
 */
final class RingDownBackbone {
    static final double SMALL_SWING = 0.5;
    /** The settled tail, where one damped sinusoid fits, begins at this fraction of the largest swing. */
    static final double TAIL_SWING = 0.2;
    static final double NOISE_MARGIN = 10;
    static final double HYSTERESIS = 3;
    static final int MIN_CYCLES = 4;

    /** The cycles, the small-signal estimates and the first cycle's frequency. */
    record Result(List<BackbonePoint> cycles, double smallSignalHz, double smallSignalHzError, double dampingRatio,
                  double dampingRatioError, double largeSwingHz, int cyclesFitted, int firstTailCycle) {
    }

    private RingDownBackbone() {
    }

    /**
     * @param x       the ring-down, from the first extremum of the free oscillation on
     * @param settled the settled value the oscillation decays to
     * @param noise   RMS noise of the signal, same unit
     * @return the result, or null when fewer than {@link #MIN_CYCLES} small-swing cycles stand above the noise
     */
    static Result measure(double[] x, int from, double settled, double noise, double sampleRateHz, double startTimeS) {
        List<Double> crossings = new ArrayList<>();
        List<Double> peaks = new ArrayList<>();
        // A crossing counts only once the signal has gone a hysteresis beyond it, so noise near zero cannot add
        // crossings; its time is the last interpolated zero crossing before that.
        double h = HYSTERESIS * noise;
        int sign = x[from] - settled >= 0 ? 1 : -1;
        double lastZero = Double.NaN;
        double peak = 0;
        int peakAt = -1;
        for (int i = from + 1; i < x.length; i++) {
            double a = x[i - 1] - settled;
            double b = x[i] - settled;
            if ((a < 0) != (b < 0) && a != b) {
                lastZero = i - 1 + a / (a - b);
            }
            if (b * sign > peak) {
                peak = b * sign;
                peakAt = i;
            }
            if (b * sign < -h && !Double.isNaN(lastZero)) {
                if (!crossings.isEmpty() && peakAt > 0) {
                    peaks.add(refinedPeak(x, peakAt, settled));
                }
                crossings.add(lastZero);
                sign = -sign;
                peak = b * sign;
                peakAt = i;
            }
        }
        // peaks.get(j) is the half wave between crossings j and j+1; a cycle spans crossings j ... j+2
        List<BackbonePoint> cycles = new ArrayList<>();
        double floor = NOISE_MARGIN * noise;
        for (int j = 0; j + 2 < crossings.size() && j + 1 < peaks.size(); j += 2) {
            double amp = 0.5 * (peaks.get(j) + peaks.get(j + 1));
            if (!(amp > floor)) {
                break;
            }
            double period = (crossings.get(j + 2) - crossings.get(j)) / sampleRateHz;
            double next = j + 3 < peaks.size() ? 0.5 * (peaks.get(j + 2) + peaks.get(j + 3)) : Double.NaN;
            double dec = next > floor ? Math.log(amp / next) : Double.NaN;
            cycles.add(new BackbonePoint(amp, 1 / period, dec, startTimeS + crossings.get(j) / sampleRateHz));
        }
        if (cycles.isEmpty()) {
            return null;
        }
        double largest = cycles.get(0).amplitude();
        SimpleRegression freq = new SimpleRegression();
        SimpleRegression decay = new SimpleRegression();
        int firstSmall = -1;
        int firstTail = -1;
        for (int i = 0; i < cycles.size(); i++) {
            BackbonePoint c = cycles.get(i);
            largest = Math.max(largest, c.amplitude());
        }
        for (int i = 0; i < cycles.size(); i++) {
            BackbonePoint c = cycles.get(i);
            if (firstTail < 0 && c.amplitude() <= TAIL_SWING * largest) {
                firstTail = i;
            }
            if (c.amplitude() > SMALL_SWING * largest) {
                continue;
            }
            if (firstSmall < 0) {
                firstSmall = i;
            }
            double a2 = c.amplitude() * c.amplitude();
            freq.addData(a2, c.frequencyHz());
            if (!Double.isNaN(c.logDecrement())) {
                decay.addData(a2, c.logDecrement());
            }
        }
        if (freq.getN() < MIN_CYCLES || decay.getN() < MIN_CYCLES - 1) {
            return null;
        }
        double d0 = decay.getIntercept();
        double zeta = DampedOscillation.dampingRatio(Math.max(0, d0));
        double f0 = DampedOscillation.naturalHz(freq.getIntercept(), zeta);
        // dζ/dδ = 4π²/(4π² + δ²)^1.5
        double dz = 4 * Math.PI * Math.PI / Math.pow(4 * Math.PI * Math.PI + d0 * d0, 1.5);
        return new Result(List.copyOf(cycles), f0, orZero(freq.getInterceptStdErr()), zeta,
                orZero(decay.getInterceptStdErr()) * dz, cycles.get(0).frequencyHz(), (int) freq.getN(), firstTail < 0 ? firstSmall : firstTail);
    }

    private static double orZero(double v) {
        return Double.isFinite(v) ? v : 0;
    }

    /** |peak − settled| refined by a parabola through the largest sample and its neighbours. */
    private static double refinedPeak(double[] x, int i, double settled) {
        if (i <= 0 || i >= x.length - 1) {
            return Math.abs(x[i] - settled);
        }
        double a = x[i - 1] - settled;
        double b = x[i] - settled;
        double c = x[i + 1] - settled;
        double den = a - 2 * b + c;
        if (den == 0) {
            return Math.abs(b);
        }
        double d = 0.5 * (a - c) / den;
        if (Math.abs(d) > 1) {
            return Math.abs(b);
        }
        return Math.abs(b - 0.25 * (a - c) * d);
    }
}
