package org.lodestep.signal;

/**
 * How a spectrum's values are scaled; every spectrum says which one it uses, so no caller guesses.
 *
 * <p>For a one-sided spectrum of a windowed segment x·w of N samples with DFT X_k (k = 0 ... N/2), the bins between
 * DC and Nyquist are doubled to fold in the negative frequencies. Conventions of P. D. Welch, IEEE Trans. Audio
 * Electroacoust. 15(2), 1967, and of F. J. Harris, Proc. IEEE 66(1), 1978 (amplitude of a bin-centred sine =
 * 2|X_k|/Σw).
 */
public enum SpectrumScaling {
    /** Peak amplitude of a sine centred on the bin, in signal units: 2|X_k|/Σw (DC and Nyquist not doubled). */
    AMPLITUDE,
    /** Power (mean square) of a sine centred on the bin, in units²: 2|X_k|²/(Σw)²; its square root is the RMS. */
    POWER,
    /** Power spectral density in units²/Hz: 2|X_k|²/(f_s·Σw²); integrates (Σ P_k·Δf) to the mean square. */
    DENSITY;

    /**
     * Scales the squared DFT magnitude of bin {@code k} of an {@code n}-point segment.
     *
     * @param magnitudeSquared |X_k|²
     * @param k                bin index, 0 ... n/2
     * @param n                segment length
     * @param sumW             Σw of the window
     * @param sumW2            Σw² of the window
     * @param sampleRateHz     f_s in Hz
     */
    double scale(double magnitudeSquared, int k, int n, double sumW, double sumW2, double sampleRateHz) {
        boolean single = k == 0 || (n % 2 == 0 && k == n / 2);
        double fold = single ? 1.0 : 2.0;
        switch (this) {
            case AMPLITUDE:
                return (single ? 1.0 : 2.0) * Math.sqrt(magnitudeSquared) / sumW;
            case POWER:
                return fold * magnitudeSquared / (sumW * sumW);
            case DENSITY:
                return fold * magnitudeSquared / (sampleRateHz * sumW2);
            default:
                throw new IllegalStateException("unknown scaling " + this);
        }
    }

    /** Whether values add like power (POWER, DENSITY) rather than like amplitude, when segments are averaged. */
    boolean isPowerLike() {
        return this != AMPLITUDE;
    }
}
