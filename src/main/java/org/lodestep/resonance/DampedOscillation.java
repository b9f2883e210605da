package org.lodestep.resonance;

/**
 * Relations of a viscously damped single-degree-of-freedom oscillation: logarithmic decrement, damping ratio,
 * damped and undamped natural frequency, quality factor.
 *
 * <p>Source: S. S. Rao, <i>Mechanical Vibrations</i>, 5th ed., Prentice Hall 2011, ch. 2 (free vibration with viscous
 * damping; references §16): δ = (1/n)·ln(x_0/x_n); ζ = δ/√(4π² + δ²), so δ = 2πζ/√(1 - ζ²); ω_d = ω_n·√(1 - ζ²);
 * envelope e^(-ζ·ω_n·t), which falls to a level x after ln(A/x)/σ; Q = 1/(2ζ). The same relations in W. T. Thomson
 * and M. D. Dahleh, <i>Theory of Vibration with Applications</i>, 5th ed., Prentice Hall 1998, ch. 2
 * (references §27).
 */
final class DampedOscillation {
    private DampedOscillation() {
    }

    /** Logarithmic decrement from two peaks {@code periods} apart. */
    public static double logDecrement(double firstPeak, double laterPeak, int periods) {
        Require.positive(firstPeak, "first peak", "");
        Require.positive(laterPeak, "later peak", "");
        if (periods < 1) {
            throw new IllegalArgumentException("periods must be at least 1, got " + periods);
        }
        return Math.log(firstPeak / laterPeak) / periods;
    }

    /** Damping ratio from the logarithmic decrement. */
    public static double dampingRatio(double logDecrement) {
        return logDecrement / Math.sqrt(4 * Math.PI * Math.PI + logDecrement * logDecrement);
    }

    /** Logarithmic decrement of successive peaks from the damping ratio: 2πζ/√(1 - ζ²), the inverse of {@link #dampingRatio(double)}. */
    public static double logDecrement(double dampingRatio) {
        if (!(dampingRatio >= 0 && dampingRatio < 1)) {
            throw new IllegalArgumentException("damping ratio must be 0 ... 1 for an oscillation, got " + dampingRatio);
        }
        return 2 * Math.PI * dampingRatio / Math.sqrt(1 - dampingRatio * dampingRatio);
    }

    /**
     * Time for the envelope A·e^(-σ·t) to fall to {@code level}, s: ln(A/level)/σ; 0 when it starts at or below the
     * level, infinite when the level is zero or the oscillation does not decay.
     */
    public static double timeToDecay(double amplitude, double decayRatePerS, double level) {
        if (!(level > 0) || !(decayRatePerS > 0)) {
            return Double.POSITIVE_INFINITY;
        }
        return Math.max(0, Math.log(Math.abs(amplitude) / level) / decayRatePerS);
    }

    /** Undamped natural frequency f_n = f_d/√(1 - ζ²), in Hz. */
    public static double naturalHz(double dampedHz, double dampingRatio) {
        if (!(dampingRatio >= 0 && dampingRatio < 1)) {
            throw new IllegalArgumentException("damping ratio must be 0 ... 1 for an oscillation, got " + dampingRatio);
        }
        return dampedHz / Math.sqrt(1 - dampingRatio * dampingRatio);
    }

    /** Damping ratio from the envelope decay rate σ (1/s) and damped angular frequency ω_d (rad/s): σ/√(σ² + ω_d²). */
    public static double dampingRatio(double decayRatePerS, double dampedRadPerS) {
        return decayRatePerS / Math.hypot(decayRatePerS, dampedRadPerS);
    }

    /** Quality factor 1/(2ζ). */
    public static double qualityFactor(double dampingRatio) {
        return 1 / (2 * dampingRatio);
    }

    /** Envelope A·e^(-σ·t) of a free damped oscillation t seconds after its start (σ = ζ·ω_n). */
    public static double envelope(double amplitude, double decayRatePerS, double t) {
        return amplitude * Math.exp(-decayRatePerS * t);
    }

    /** Displacement A·e^(-σ·t)·cos(ω_d·t + φ) + c of a free damped oscillation t seconds after its start. */
    public static double displacement(double amplitude, double decayRatePerS, double dampedRadPerS, double phaseRad,
                                      double offset, double t) {
        return envelope(amplitude, decayRatePerS, t) * Math.cos(dampedRadPerS * t + phaseRad) + offset;
    }
}
