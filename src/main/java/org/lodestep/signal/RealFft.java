package org.lodestep.signal;

import org.jtransforms.fft.DoubleFFT_1D;

/** Squared DFT magnitudes |X_k|², k = 0 ... n/2, of a real sequence, on JTransforms; not thread-safe. */
final class RealFft {
    private final int n;
    private final DoubleFFT_1D fft;

    RealFft(int n) {
        this.n = n;
        this.fft = new DoubleFFT_1D(n);
    }

    /** Transforms {@code data} (length n, overwritten) and writes |X_k|² into {@code out} (length n/2 + 1). */
    void magnitudeSquared(double[] data, double[] out) {
        fft.realForward(data);
        // JTransforms packed layout: a[0] = Re X_0, a[1] = Re X_{n/2} (n even) or Im X_{(n-1)/2} (n odd),
        // a[2k] = Re X_k, a[2k+1] = Im X_k.
        out[0] = data[0] * data[0];
        int half = n / 2;
        if (n % 2 == 0) {
            for (int k = 1; k < half; k++) {
                double re = data[2 * k];
                double im = data[2 * k + 1];
                out[k] = re * re + im * im;
            }
            out[half] = data[1] * data[1];
        } else {
            for (int k = 1; k < half; k++) {
                double re = data[2 * k];
                double im = data[2 * k + 1];
                out[k] = re * re + im * im;
            }
            double re = data[n - 1];
            double im = data[1];
            out[half] = re * re + im * im;
        }
    }
}
