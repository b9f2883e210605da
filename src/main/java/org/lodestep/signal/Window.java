package org.lodestep.signal;

/**
 * Periodic ("DFT-even") data windows for spectral analysis, with their coherent gain and equivalent noise bandwidth.
 *
 * <p>Source: F. J. Harris, "On the use of windows for harmonic analysis with the discrete Fourier transform",
 * Proc. IEEE 66(1), 1978, pp. 51-83: section II (DFT-even windows), Table 1 (coherent gain, ENBW). Flat-top
 * coefficients: G. D'Antona, A. Ferrero, <i>Digital Signal Processing for Measurement Systems</i>, Springer 2006,
 * p. 70 (the five-term window also used by common numerical libraries).
 */
public enum Window {
    /** No shaping: best frequency resolution, worst leakage (Harris Table 1: ENBW 1.00 bin). */
    RECTANGULAR(new double[] {1.0}),
    /** Raised cosine: the usual default for PSD estimates (Harris Table 1: CG 0.50, ENBW 1.50 bins). */
    HANN(new double[] {0.5, 0.5}),
    /** Five-term flat-top: amplitude within 0.01 dB anywhere in a bin, at the cost of a wide main lobe. */
    FLAT_TOP(new double[] {0.21557895, 0.41663158, 0.277263158, 0.083578947, 0.006947368});

    /** Cosine-sum coefficients a_k of w[n] = sum_k (-1)^k a_k cos(2 pi k n / N). */
    private final double[] cosineTerms;

    Window(double[] cosineTerms) {
        this.cosineTerms = cosineTerms;
    }

    /**
     * The periodic window of length {@code n}: the first {@code n} points of the symmetric window of length n + 1,
     * so that a tone centred on a bin is measured exactly (Harris 1978, section II).
     */
    public double[] periodic(int n) {
        if (n < 1) {
            throw new IllegalArgumentException("window length must be at least 1 sample, got " + n);
        }
        double[] w = new double[n];
        for (int i = 0; i < n; i++) {
            double sum = 0;
            double sign = 1;
            for (int k = 0; k < cosineTerms.length; k++) {
                sum += sign * cosineTerms[k] * Math.cos(2 * Math.PI * k * i / n);
                sign = -sign;
            }
            w[i] = sum;
        }
        return w;
    }

    /** Coherent gain Σw/N of the periodic window of length {@code n} (Harris 1978, eq. 13). */
    public double coherentGain(int n) {
        double s = 0;
        for (double v : periodic(n)) {
            s += v;
        }
        return s / n;
    }

    /** Equivalent noise bandwidth N·Σw²/(Σw)² in bins of the periodic window of length {@code n} (Harris, eq. 14). */
    public double enbwBins(int n) {
        double[] w = periodic(n);
        double s1 = 0;
        double s2 = 0;
        for (double v : w) {
            s1 += v;
            s2 += v * v;
        }
        return n * s2 / (s1 * s1);
    }

    /** Half-width of the main lobe in bins (where a tone's energy spreads): 1 for rectangular, 2 Hann, 5 flat-top. */
    public int mainLobeHalfWidthBins() {
        return cosineTerms.length == 1 ? 1 : cosineTerms.length;
    }
}
