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
 * @param naturalFrequencyErrorHz standard error of the small-signal natural frequency, Hz (NaN without a backbone)
 * @param dampingRatioError  standard error of the small-signal damping ratio (NaN without a backbone)
 * @param largeSwingFrequencyHz frequency of the first, largest cycle, Hz (NaN without a backbone)
 * @param wholeRingFrequencyHz natural frequency of one damped sinusoid fitted to the whole ring, Hz: what a
 *                           constant-frequency fit reports, biased low by the large swings
 * @param wholeRingRSquared  R² of that whole-ring fit
 * @param backbone           cycle-by-cycle amplitude, frequency and decrement, largest swing first
 */
public record RingDownResult(double naturalFrequencyHz, double dampedFrequencyHz, double dampingRatio,
                             double decayRatePerS, double amplitude, double offset, double qualityFactor,
                             double rSquared, double rmsResidual, double startTimeS, double fittedDurationS,
                             double periodsFitted, double naturalFrequencyErrorHz, double dampingRatioError,
                             double largeSwingFrequencyHz, double wholeRingFrequencyHz, double wholeRingRSquared,
                             java.util.List<BackbonePoint> backbone) {
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
    }

    /** A fit without a backbone (too few cycles above the noise). */
    RingDownResult(double naturalFrequencyHz, double dampedFrequencyHz, double dampingRatio, double decayRatePerS,
                   double amplitude, double offset, double qualityFactor, double rSquared, double rmsResidual,
                   double startTimeS, double fittedDurationS, double periodsFitted) {
        this(naturalFrequencyHz, dampedFrequencyHz, dampingRatio, decayRatePerS, amplitude, offset, qualityFactor,
                rSquared, rmsResidual, startTimeS, fittedDurationS, periodsFitted, Double.NaN, Double.NaN,
                Double.NaN, naturalFrequencyHz, rSquared, java.util.List.of());
    }

    /** This tail fit with the small-signal values of a backbone in place of its own f_n and ζ. */
    RingDownResult withBackbone(double smallSignalHz, double smallSignalErrorHz, double smallSignalZeta,
                                double zetaError, double largeSwingHz, double wholeHz, double wholeR2,
                                java.util.List<BackbonePoint> cycles) {
        double fd = smallSignalHz * Math.sqrt(1 - smallSignalZeta * smallSignalZeta);
        return new RingDownResult(smallSignalHz, fd, smallSignalZeta, smallSignalZeta * 2 * Math.PI * smallSignalHz,
                amplitude, offset, DampedOscillation.qualityFactor(smallSignalZeta), rSquared, rmsResidual,
                startTimeS, fittedDurationS, periodsFitted, smallSignalErrorHz, zetaError, largeSwingHz, wholeHz,
                wholeR2, cycles);
    }
}
