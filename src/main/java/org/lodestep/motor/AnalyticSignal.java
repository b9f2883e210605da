package org.lodestep.motor;

import org.jtransforms.fft.DoubleFFT_1D;

/**
 * Analytic signal {@code x + j·H{x}} by the FFT method: zero the negative frequencies, double the positive ones.
 *
 * <p>Source: S. L. Marple, "Computing the discrete-time analytic signal via FFT", IEEE Trans. Signal Processing
 * 47(9), 1999, pp. 2600-2603. The envelope is {@code |z|}; the instantaneous phase is {@code arg z}.
 */
final class AnalyticSignal {
    private AnalyticSignal() {
    }

    /** Returns {@code {re[], im[]}} of the analytic signal of {@code x} (mean removed by the caller if wanted). */
    static double[][] of(double[] x) {
        int len = x.length;
        // Zero-padded to a power of two: the fast radix-2 path, and less wrap-around at the record ends.
        int n = Integer.highestOneBit(Math.max(1, len - 1)) << 1;
        double[] a = new double[2 * n];
        System.arraycopy(x, 0, a, 0, len);
        DoubleFFT_1D fft = new DoubleFFT_1D(n);
        fft.realForwardFull(a);
        int half = n / 2;
        for (int k = 1; k < n; k++) {
            double gain;
            if (k < (n + 1) / 2) {
                gain = 2.0;
            } else if (n % 2 == 0 && k == half) {
                gain = 1.0;
            } else {
                gain = 0.0;
            }
            a[2 * k] *= gain;
            a[2 * k + 1] *= gain;
        }
        fft.complexInverse(a, true);
        double[] re = new double[len];
        double[] im = new double[len];
        for (int k = 0; k < len; k++) {
            re[k] = a[2 * k];
            im[k] = a[2 * k + 1];
        }
        return new double[][] {re, im};
    }
}
