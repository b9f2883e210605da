package org.lodestep.resonance;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;

class BandClassifierTest {

    private static ResonanceBand band(double start, double end, double peak, double levelDb, double mechHz) {
        return new ResonanceBand(start, end, peak, Math.pow(10, levelDb / 20), levelDb, 6, mechHz,
                BandClass.UNCLASSIFIED, 0);
    }

    @Test
    void bandsAtTheNaturalFrequencyAndItsSubMultiplesAreLowSpeedResonance() {
        // Acarnley (2002), section 4.3 / references §12: f_n = 306.29 Hz → risky 306.29, 153.15, 102.10.
        double fn = 306.294;
        ResonanceBand at = BandClassifier.classify(band(290, 320, 300, 10, 300), fn);
        assertEquals(BandClass.LOW_SPEED_RESONANCE, at.bandClass());
        assertEquals(1, at.subharmonic());
        ResonanceBand half = BandClassifier.classify(band(148, 158, 153.15, 5, 306), fn);
        assertEquals(2, half.subharmonic());
        ResonanceBand third = BandClassifier.classify(band(99, 105, 102.10, 3, 306), fn);
        assertEquals(3, third.subharmonic());
    }

    @Test
    void bandWellAboveTheNaturalFrequencyIsMidBandInstability() {
        // Acarnley (2002), section 5.5: instability well above f_n is of the mid-band kind.
        ResonanceBand b = BandClassifier.classify(band(900, 1000, 950, 8, 40), 306.294);
        assertEquals(BandClass.MID_BAND_INSTABILITY, b.bandClass());
        assertEquals(0, b.subharmonic());
    }

    @Test
    void withoutANaturalFrequencyBandsStayUnclassified() {
        assertEquals(BandClass.UNCLASSIFIED, BandClassifier.classify(band(290, 320, 300, 10, 300), Double.NaN)
                .bandClass());
    }

    @Test
    void estimateTakesTheWeakestBandWhoseVibrationIsAMultipleOfItsRate() {
        // Softening of the sin torque curve (Acarnley 2002, ch. 4): the weaker f_n/2 band's 2 × 58 = 116 Hz
        // vibration is preferred over the strong f_n band's softened 110 Hz; a band at 400 with 37 Hz does not match.
        List<ResonanceBand> bands = List.of(band(55, 62, 58, 20, 116), band(95, 160, 108, 26, 110),
                band(380, 420, 400, 22, 37));
        assertEquals(116, BandClassifier.estimateNaturalHz(bands), 1e-9);
        assertTrue(Double.isNaN(BandClassifier.estimateNaturalHz(List.of(band(380, 420, 400, 22, 37)))));
    }
}
