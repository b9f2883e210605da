package org.lodestep.signal;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;

class WindowTest {

    @Test
    void periodicHannOfEightPointsMatchesTheDftEvenDefinition() {
        // Harris (1978), Proc. IEEE 66(1), section II (DFT-even windows); values as references §17.
        double[] expected = {0, 0.146447, 0.5, 0.853553, 1, 0.853553, 0.5, 0.146447};
        assertArrayEquals(expected, Window.HANN.periodic(8), 1e-6);
    }

    @Test
    void periodicHannOfEightPointsHasEnbwOfExactlyOneAndAHalfBins() {
        // Harris (1978), Table 1: Hann ENBW 1.50 bins; periodic N = 8: Σw = 4, Σw² = 3 (references §17).
        assertEquals(1.5, Window.HANN.enbwBins(8), 1e-9);
    }

    @Test
    void coherentGainAndEnbwMatchHarrisTableOne() {
        // Harris (1978), Proc. IEEE 66(1), Table 1: rectangular CG 1.00, ENBW 1.00 bin.
        assertEquals(1.0, Window.RECTANGULAR.coherentGain(4096), 0.01);
        assertEquals(1.0, Window.RECTANGULAR.enbwBins(4096), 0.01);
        // Harris (1978), Table 1: Hann CG 0.50, ENBW 1.50 bins.
        assertEquals(0.5, Window.HANN.coherentGain(4096), 0.01);
        assertEquals(1.5, Window.HANN.enbwBins(4096), 1e-9);
        // Five-term flat-top (D'Antona & Ferrero 2006, p. 70): CG 0.2156, ENBW 3.770 bins (Harris, Proc. IEEE 66(1),
        // 1978, references §17).
        assertEquals(0.2156, Window.FLAT_TOP.coherentGain(4096), 0.01);
        assertEquals(3.770, Window.FLAT_TOP.enbwBins(4096), 0.01);
    }

    @Test
    void flatTopPeaksAtOneInTheMiddle() {
        // D'Antona & Ferrero (2006), p. 70: coefficients sum to 1.0 at the centre (Harris, Proc. IEEE 66(1), 1978,
        // references §17).
        assertEquals(1.0, Window.FLAT_TOP.periodic(1024)[512], 1e-6);
    }

    @Test
    void rejectsEmptyWindow() {
        assertThrows(IllegalArgumentException.class, () -> Window.HANN.periodic(0));
    }
}
