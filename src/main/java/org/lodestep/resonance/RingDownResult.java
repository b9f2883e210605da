package org.lodestep.resonance;

/**
 * A ring-down measured cycle by cycle, with a damped sinusoid x(t) = A·e^(-σt)·cos(ω_d·t + φ) + c fitted to its
 * settled tail (t from {@code startTimeS}). With a backbone, the natural frequency and damping ratio are the
 * small-signal values extrapolated to zero swing, and σ and ω_d follow them; A, φ and c are the tail fit's.
 *
 * @param naturalFrequencyHz small-signal undamped natural frequency f_n, Hz (without a backbone √(σ² + ω_d²)/2π)
 * @param dampedFrequencyHz  damped frequency f_d = ω_d/2π, Hz
 * @param dampingRatio       small-signal ζ, 0 ... 1 (without a backbone σ/ω_n)
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
 * @param naturalFrequencyErrorHz standard error of the small-signal natural frequency, Hz (NaN without a backbone)
 * @param dampingRatioError  standard error of the small-signal damping ratio (NaN without a backbone)
 * @param largeSwingFrequencyHz frequency of the first, largest cycle, Hz (NaN without a backbone)
 * @param wholeRingFrequencyHz natural frequency of one damped sinusoid fitted to the whole ring, Hz: what a
 *                           constant-frequency fit reports, biased low by the large swings
 * @param wholeRingRSquared  R² of that whole-ring fit
 * @param backbone           cycle-by-cycle amplitude, frequency and decrement, largest swing first
 * @param ringStartTimeS     time of the ring's largest excursion, where the free oscillation begins, s (the tail
 *                           fit may start later, at {@code startTimeS})
 * @param noiseRms           RMS about the settled value once the ring has died away (the last fifth of the
 *                           record), signal units
 */
public record RingDownResult(double naturalFrequencyHz, double dampedFrequencyHz, double dampingRatio,
                             double decayRatePerS, double amplitude, double offset, double qualityFactor,
                             double rSquared, double rmsResidual, double startTimeS, double fittedDurationS,
                             double periodsFitted, double phaseRad, double naturalFrequencyErrorHz,
                             double dampingRatioError, double largeSwingFrequencyHz, double wholeRingFrequencyHz,
                             double wholeRingRSquared, java.util.List<BackbonePoint> backbone,
                             double ringStartTimeS, double noiseRms) {
    public RingDownResult {
        backbone = java.util.List.copyOf(backbone);
        Require.positive(naturalFrequencyHz, "natural frequency", "Hz");
        Require.positive(dampedFrequencyHz, "damped frequency", "Hz");
        if (!(dampingRatio >= 0 && dampingRatio < 1)) {
            throw new IllegalArgumentException("damping ratio must be 0 ... 1, got " + dampingRatio);
        }
        if (Double.isNaN(rSquared)) {
            throw new IllegalArgumentException("fit quality R² is NaN");
        }
        if (!(ringStartTimeS <= startTimeS)) {
            throw new IllegalArgumentException("the ring starts (" + ringStartTimeS + " s) after its fitted tail ("
                    + startTimeS + " s)");
        }
        if (!(noiseRms >= 0)) {
            throw new IllegalArgumentException("noise RMS must be zero or more, got " + noiseRms);
        }
    }

    /** The envelope has fallen to the noise where it is this many times the noise RMS (common practice). */
    public static final double NOISE_MULTIPLE = 3;

    /** A fit without a backbone (too few cycles above the noise). */
    RingDownResult(double naturalFrequencyHz, double dampedFrequencyHz, double dampingRatio, double decayRatePerS,
                   double amplitude, double offset, double qualityFactor, double rSquared, double rmsResidual,
                   double startTimeS, double fittedDurationS, double periodsFitted, double phaseRad,
                   double ringStartTimeS, double noiseRms) {
        this(naturalFrequencyHz, dampedFrequencyHz, dampingRatio, decayRatePerS, amplitude, offset, qualityFactor,
                rSquared, rmsResidual, startTimeS, fittedDurationS, periodsFitted, phaseRad, Double.NaN, Double.NaN,
                Double.NaN, naturalFrequencyHz, rSquared, java.util.List.of(), ringStartTimeS, noiseRms);
    }

    /** This tail fit with the small-signal values of a backbone in place of its own f_n and ζ. */
    RingDownResult withBackbone(double smallSignalHz, double smallSignalErrorHz, double smallSignalZeta,
                                double zetaError, double largeSwingHz, double wholeHz, double wholeR2,
                                java.util.List<BackbonePoint> cycles) {
        // σ and ω_d follow the small-signal values (the tail's own differ by well under 1 %); A, φ, c stay the tail's
        double fd = smallSignalHz * Math.sqrt(1 - smallSignalZeta * smallSignalZeta);
        return new RingDownResult(smallSignalHz, fd, smallSignalZeta, smallSignalZeta * 2 * Math.PI * smallSignalHz,
                amplitude, offset, DampedOscillation.qualityFactor(smallSignalZeta), rSquared, rmsResidual,
                startTimeS, fittedDurationS, periodsFitted, phaseRad, smallSignalErrorHz, zetaError, largeSwingHz,
                wholeHz, wholeR2, cycles, ringStartTimeS, noiseRms);
    }

    /** This result with the ring's start and noise of a longer record (the tail was fitted on its own). */
    RingDownResult withRing(double ringStart, double noise) {
        return new RingDownResult(naturalFrequencyHz, dampedFrequencyHz, dampingRatio, decayRatePerS, amplitude,
                offset, qualityFactor, rSquared, rmsResidual, startTimeS, fittedDurationS, periodsFitted, phaseRad,
                naturalFrequencyErrorHz, dampingRatioError, largeSwingFrequencyHz, wholeRingFrequencyHz,
                wholeRingRSquared, backbone, ringStart, noise);
    }

    /**
     * The logarithmic decrement δ = ln(x_n/x_(n+1)) of successive peaks that the damping ratio implies,
     * 2πζ/√(1 − ζ²) ({@link DampedOscillation#logDecrement(double)}).
     */
    public double logDecrement() {
        return DampedOscillation.logDecrement(dampingRatio);
    }

    /**
     * Where the fitted envelope A·e^(-σ(t - t0)) has fallen to {@link #NOISE_MULTIPLE} times the noise RMS, s: the
     * end of the decay worth drawing. At {@code startTimeS} when the envelope starts in the noise; infinite on a
     * noiseless record.
     */
    public double decayEndTimeS() {
        return startTimeS + DampedOscillation.timeToDecay(amplitude, decayRatePerS, NOISE_MULTIPLE * noiseRms);
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
