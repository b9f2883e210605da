package org.lodestep.resonance;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;

/** Near-threshold bumps at f_n/k; the curve is synthetic, the rule the class's (common practice). */
class WatchListTest {

    @Test
    void aBumpUnderTheThresholdAtAThirdOfTheNaturalFrequencyIsListedAsWatch() {
        int n = 200;
        double[] rates = new double[n];
        double[] level = new double[n];
        for (int i = 0; i < n; i++) {
            rates[i] = 20 * Math.pow(1.01, i);
            // a 2.8 dB Gaussian bump at f_n/3 = 40 full steps/s on a flat curve
            level[i] = 2.8 * Math.exp(-Math.pow(Math.log(rates[i] / 40) / 0.02, 2));
        }
        double[] base = new double[n];
        List<WatchPoint> w = WatchList.find(rates, level, base, List.of(), 120, 3);
        assertEquals(1, w.size(), w.toString());
        assertEquals(3, w.get(0).subharmonic());
        assertEquals(40, w.get(0).rateFullStepsPerS(), 0.5);
        assertEquals(2.8, w.get(0).excessDb(), 0.1);
        // over the threshold it is a band's business, not a watch
        assertTrue(WatchList.find(rates, level, base, List.of(), 120, 2.5).isEmpty());
    }
}
