package org.lodestep.signal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class SpectrogramTest {

    @Test
    void columnsStayWithinTheLimitAndFollowALinearChirp() {
        // A linear chirp f(t) = f0 + c·t has instantaneous frequency f0 + c·t (definition of instantaneous
        // frequency as the phase derivative; e.g. Oppenheim & Schafer, 3rd ed., from memory).
        double fs = 8000;
        double f0 = 200;
        double c = 50; // Hz per second
        int n = (int) (fs * 60);
        SegmentSpectra framer = new SegmentSpectra(SpectralSettings.hann(1024), fs);
        Spectrogram sg = new Spectrogram(framer, 64);
        double[] block = new double[777];
        int done = 0;
        while (done < n) {
            int len = Math.min(block.length, n - done);
            for (int i = 0; i < len; i++) {
                double t = (done + i) / fs;
                block[i] = Math.sin(2 * Math.PI * (f0 * t + 0.5 * c * t * t));
            }
            framer.feed(block, 0, len);
            done += len;
        }
        assertTrue(sg.columnCount() < 64, "columns " + sg.columnCount());
        assertTrue(sg.columnCount() >= 32, "columns " + sg.columnCount());
        for (int col = 0; col < sg.columnCount(); col++) {
            double[] p = sg.column(col, SpectrumScaling.POWER);
            int peak = 1;
            for (int k = 1; k < p.length; k++) {
                if (p[k] > p[peak]) {
                    peak = k;
                }
            }
            double expectedHz = f0 + c * sg.columnTimeS(col);
            // A column spans up to about 2 s of the chirp (±50 Hz around its centre); the peak lies inside.
            assertEquals(expectedHz, peak * sg.binHz(), 60, "column " + col);
        }
    }
}
