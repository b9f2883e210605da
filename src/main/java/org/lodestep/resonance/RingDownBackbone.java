package org.lodestep.resonance;

import java.util.ArrayList;
import java.util.List;

/**
 * A ring-down measured cycle by cycle: zero crossings about the settled value give each cycle's period, each half
 * wave fitted by least squares its amplitude, and the ratio of successive peaks its logarithmic decrement. The backbone
 * (frequency against amplitude) of a hybrid stepper softens: its restoring torque T_h·sin(N_r·δ) stiffens less than
 * linearly, so a large swing rings slower. For small swings the shift is quadratic in amplitude, f ≈ f_0·(1 − κ·a²)
 * (the Lindstedt–Poincaré result for a softening cubic term: A. H. Nayfeh, D. T. Mook, <i>Nonlinear
 * Oscillations</i>, Wiley 1979, ch. 4; from memory), so the small-signal frequency f_0 and decrement δ_0 are the
 * intercepts of weighted straight-line fits against a² (weights a², as the noise's effect falls with the swing;
 * weighted least squares with known relative variances: P. R. Bevington and D. K. Robinson, <i>Data Reduction and
 * Error Analysis for the Physical Sciences</i>, 3rd ed., McGraw-Hill 2003, ch. 6; from memory) over the cycles
 * whose amplitude is at most {@link #SMALL_SWING} of the largest, with their standard errors; ζ = δ/√(4π² + δ²)
 * (S. S. Rao, <i>Mechanical Vibrations</i>, 5th ed., 2011, ch. 2). The cycle frequencies are damped frequencies, so f_0 is the damped intercept divided by √(1 − ζ²). Zero
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
                    peaks.add(halfWaveAmplitude(x, crossings.get(crossings.size() - 1), lastZero, settled));
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
        WeightedLine freq = new WeightedLine();
        WeightedLine decay = new WeightedLine();
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
            // noise moves a zero crossing by noise/slope and a decrement by noise/amplitude: both variances fall as
            // 1/a², so the cycles are weighted by a²
            freq.add(a2, c.frequencyHz(), a2);
            if (!Double.isNaN(c.logDecrement())) {
                decay.add(a2, c.logDecrement(), a2);
            }
        }
        if (freq.n < MIN_CYCLES || decay.n < MIN_CYCLES - 1
                || !Double.isFinite(freq.intercept()) || !Double.isFinite(decay.intercept())) {
            return null;
        }
        double d0 = decay.intercept();
        double zeta = DampedOscillation.dampingRatio(Math.max(0, d0));
        double f0 = DampedOscillation.naturalHz(freq.intercept(), zeta);
        // dζ/dδ = 4π²/(4π² + δ²)^1.5
        double dz = 4 * Math.PI * Math.PI / Math.pow(4 * Math.PI * Math.PI + d0 * d0, 1.5);
        return new Result(List.copyOf(cycles), f0, orZero(freq.interceptStdErr()), zeta,
                orZero(decay.interceptStdErr()) * dz, cycles.get(0).frequencyHz(), freq.n,
                firstTail < 0 ? firstSmall : firstTail);
    }

    private static double orZero(double v) {
        return Double.isFinite(v) ? v : 0;
    }

    /**
     * The amplitude of one half wave, least squares over all its samples: x − settled ≈ a·cos(φ) + b·sin(φ) with
     * φ = π·(i − centre)/(half period), amplitude √(a² + b²). The largest sample of a noisy half wave reads high (it
     * is the largest of several noisy samples), which near the noise floor inflates the late peaks and lowers the
     * decrement; the fit averages the noise instead. For a linear decay every half wave has the same shape scaled, so
     * the ratio of successive fitted amplitudes is the decay of the envelope over half a period, as the peaks' is.
     */
    private static double halfWaveAmplitude(double[] x, double fromZero, double toZero, double settled) {
        double half = toZero - fromZero;
        double centre = 0.5 * (fromZero + toZero);
        double cc = 0;
        double ss = 0;
        double cs = 0;
        double xc = 0;
        double xs = 0;
        for (int i = (int) Math.ceil(fromZero); i <= (int) Math.floor(toZero) && i < x.length; i++) {
            double phi = Math.PI * (i - centre) / half;
            double c = Math.cos(phi);
            double s = Math.sin(phi);
            double v = x[i] - settled;
            cc += c * c;
            ss += s * s;
            cs += c * s;
            xc += v * c;
            xs += v * s;
        }
        double det = cc * ss - cs * cs;
        if (!(det > 1e-12 * cc * ss) || !(half > 2)) {
            // too few samples per half wave for two terms: the cosine term alone
            return cc > 0 ? Math.abs(xc / cc) : 0;
        }
        double a = (xc * ss - xs * cs) / det;
        double b = (xs * cc - xc * cs) / det;
        return Math.hypot(a, b);
    }

    /** y = intercept + slope·x by weighted least squares, with the intercept's standard error scaled by the scatter. */
    private static final class WeightedLine {
        private double sw;
        private double swx;
        private double swy;
        private double swxx;
        private double swxy;
        private double swyy;
        private int n;

        void add(double x, double y, double w) {
            sw += w;
            swx += w * x;
            swy += w * y;
            swxx += w * x * x;
            swxy += w * x * y;
            swyy += w * y * y;
            n++;
        }

        private double det() {
            return sw * swxx - swx * swx;
        }

        double slope() {
            return (sw * swxy - swx * swy) / det();
        }

        double intercept() {
            return (swxx * swy - swx * swxy) / det();
        }

        /** √(χ²/(n − 2) · Σw·x²/Δ): the weights are relative, so the scatter about the line sets their scale. */
        double interceptStdErr() {
            if (n < 3) {
                return Double.NaN;
            }
            double a = intercept();
            double b = slope();
            double chi2 = swyy - 2 * a * swy - 2 * b * swxy + a * a * sw + 2 * a * b * swx + b * b * swxx;
            return Math.sqrt(Math.max(0, chi2) / (n - 2) * swxx / det());
        }
    }
}
