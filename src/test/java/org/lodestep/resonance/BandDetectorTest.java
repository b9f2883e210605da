package org.lodestep.resonance;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;

import org.junit.jupiter.api.Test;

class BandDetectorTest {

    /** Flat 0 dB curve on a 1 % log grid from 50 to 1000, with Gaussian bumps (in log rate) added. */
    private static double[][] curve(double[][] bumps) {
        int n = (int) (Math.log(1000 / 50.0) / Math.log(1.01));
        double[] r = new double[n];
        double[] l = new double[n];
        for (int i = 0; i < n; i++) {
            r[i] = 50 * Math.pow(1.01, i);
            for (double[] b : bumps) {
                double u = Math.log(r[i] / b[0]) / b[2];
                l[i] += b[1] * Math.exp(-0.5 * u * u);
            }
            l[i] += 0.3 * Math.sin(i * 1.7);
        }
        return new double[][] {r, l};
    }

    @Test
    void findsTwoBumpsAtTheirRatesAndIgnoresRipple() {
        // Known answer by construction: bumps of 12 dB at 200 and 8 dB at 600 full steps/s, ripple ±0.3 dB.
        double[][] c = curve(new double[][] {{200, 12, 0.04}, {600, 8, 0.03}});
        List<BandDetector.Span> spans = BandDetector.detect(c[0], c[1], BandSettings.defaults());
        assertEquals(2, spans.size());
        assertEquals(200, c[0][spans.get(0).peak()], 4);
        assertEquals(600, c[0][spans.get(1).peak()], 12);
        assertEquals(12, spans.get(0).excessDb(), 1.0);
        // Edges at the half-power points: a Gaussian bump of 12 dB with σ = 0.04 in ln(rate) is within 3 dB of its
        // peak for |ln(r/200)| ≤ 0.04·√(2·ln(12/9)) = 0.0303, i.e. 194.0 ... 206.2 full steps/s.
        assertEquals(194.0, c[0][spans.get(0).first()], 2.5);
        assertEquals(206.2, c[0][spans.get(0).last()], 2.5);
    }

    @Test
    void mergesTwoBumpsCloserThanTheMergeGap() {
        // Two narrow 10 dB bumps 6 % apart (each above the exit level for about ±1.7 %): a 10 % merge gap joins
        // them, no merge gap keeps them apart.
        double[][] c = curve(new double[][] {{300, 10, 0.01}, {318, 10, 0.01}});
        BandSettings merge = new BandSettings(4, Double.NaN, 1.5, 0.4, 0.2, 0.1, 1, 20);
        assertEquals(1, BandDetector.detect(c[0], c[1], merge).size());
        BandSettings noMerge = new BandSettings(4, Double.NaN, 1.5, 0.4, 0.2, 0.0, 1, 20);
        assertEquals(2, BandDetector.detect(c[0], c[1], noMerge).size());
    }

    @Test
    void absoluteLevelReplacesTheRelativeThreshold() {
        // 20·log10(3) = 9.54 dB: only the 12 dB bump passes an absolute RMS level of 3 units.
        double[][] c = curve(new double[][] {{200, 12, 0.04}, {600, 8, 0.03}});
        BandSettings abs = new BandSettings(4, 3.0, 1.5, 0.4, 0.2, 0.05, 2, 3);
        List<BandDetector.Span> spans = BandDetector.detect(c[0], c[1], abs);
        assertEquals(1, spans.size());
        assertEquals(200, c[0][spans.get(0).peak()], 4);
    }

    @Test
    void quantileInterpolatesBetweenOrderStatistics() {
        // Definition (Hyndman & Fan 1996, type 7, the default of R and NumPy; from memory).
        assertEquals(1.8, BandDetector.quantile(new double[] {4, 1, 3, 2, 5}, 0.2), 1e-12);
        assertEquals(3.0, BandDetector.median(new double[] {4, 1, 3, 2, 5}), 1e-12);
    }
}
