package org.lodestep.resonance;

/**
 * A damped sinusoid fitted to a ring-down: x(t) = A·e^(-σt)·cos(ω_d·t + φ) + c, with t from {@code startTimeS}.
 *
 * @param naturalFrequencyHz undamped natural frequency f_n = √(σ² + ω_d²)/2π, Hz
 * @param dampedFrequencyHz  damped frequency f_d = ω_d/2π, Hz
 * @param dampingRatio       ζ = σ/ω_n, 0 ... 1
 * @param decayRatePerS      envelope decay rate σ = ζ·ω_n, 1/s
 * @param amplitude          A, in signal units
 * @param offset             c, the settled value, in signal units
 * @param qualityFactor      Q = 1/(2ζ)
 * @param rSquared           fit quality: 1 - (residual sum of squares)/(total sum of squares), 1 = perfect
 * @param rmsResidual        RMS of the fit residual, in signal units
 * @param startTimeS         time of the first fitted sample (the largest excursion), s
 * @param fittedDurationS    length of the fitted stretch, s
 * @param periodsFitted      damped periods within the fitted stretch
 * @param phaseRad           φ, rad, at {@code startTimeS}
 */
public record RingDownResult(double naturalFrequencyHz, double dampedFrequencyHz, double dampingRatio,
                             double decayRatePerS, double amplitude, double offset, double qualityFactor,
                             double rSquared, double rmsResidual, double startTimeS, double fittedDurationS,
                             double periodsFitted, double phaseRad) {
    public RingDownResult {
        Require.positive(naturalFrequencyHz, "natural frequency", "Hz");
        Require.positive(dampedFrequencyHz, "damped frequency", "Hz");
        if (!(dampingRatio >= 0 && dampingRatio < 1)) {
            throw new IllegalArgumentException("damping ratio must be 0 ... 1, got " + dampingRatio);
        }
        if (Double.isNaN(rSquared)) {
            throw new IllegalArgumentException("fit quality R² is NaN");
        }
    }

    /** The fitted curve x(t) at time t (s, on the capture's clock); NaN before the fitted stretch starts. */
    public double fittedAt(double timeS) {
        double dt = timeS - startTimeS;
        return dt < 0 ? Double.NaN : DampedOscillation.displacement(amplitude, decayRatePerS,
                2 * Math.PI * dampedFrequencyHz, phaseRad, offset, dt);
    }

    /** Upper decay envelope c + A·e^(-σ(t - t0)) at time t; NaN before the fitted stretch starts. */
    public double upperEnvelopeAt(double timeS) {
        double dt = timeS - startTimeS;
        return dt < 0 ? Double.NaN : offset + DampedOscillation.envelope(amplitude, decayRatePerS, dt);
    }

    /** Lower decay envelope c - A·e^(-σ(t - t0)) at time t; NaN before the fitted stretch starts. */
    public double lowerEnvelopeAt(double timeS) {
        double dt = timeS - startTimeS;
        return dt < 0 ? Double.NaN : offset - DampedOscillation.envelope(amplitude, decayRatePerS, dt);
    }

    /**
     * Full-step rates where low-speed resonance is expected from this natural frequency: f_n/k for k = 1 ... count
     * ({@link LowSpeedResonance}), highest first.
     */
    public java.util.List<Double> riskyRatesFullStepsPerS(int count) {
        return LowSpeedResonance.riskyRatesFullStepsPerS(naturalFrequencyHz, count);
    }
}
