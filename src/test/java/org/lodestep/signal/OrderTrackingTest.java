package org.lodestep.signal;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.ArrayList;
import java.util.List;

import org.junit.jupiter.api.Test;

class OrderTrackingTest {

    @Test
    void readsTheAmplitudeOfAnOffBinToneWithoutScallopingLoss() {
        // Harris (1978), section IV: summing the main lobe and dividing by the ENBW recovers a sine's power;
        // tone amplitude 0.7 at 123.37 Hz (between bins) is the known answer.
        double fs = 2048;
        SegmentSpectra framer = new SegmentSpectra(SpectralSettings.hann(1024), fs);
        List<Double> amps = new ArrayList<>();
        framer.addListener((first, mag2, ms) -> amps.add(OrderTracking.amplitudeAt(mag2, framer, 123.37)));
        double[] x = new double[8192];
        for (int i = 0; i < x.length; i++) {
            x[i] = 0.7 * Math.sin(2 * Math.PI * 123.37 * i / fs) + 0.2 * Math.sin(2 * Math.PI * 400 * i / fs);
        }
        framer.feed(x, 0, x.length);
        assertEquals(15, amps.size());
        for (double a : amps) {
            assertEquals(0.7, a, 0.7 * 0.01);
        }
    }

    @Test
    void frequencyAboveNyquistHasNoAmplitude() {
        SegmentSpectra framer = new SegmentSpectra(SpectralSettings.hann(64), 100);
        assertEquals(Double.NaN, OrderTracking.amplitudeAt(new double[33], framer, 60));
    }
}
