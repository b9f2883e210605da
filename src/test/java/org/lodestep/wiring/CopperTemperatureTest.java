package org.lodestep.wiring;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;

/** Checks from references §3 (electrical-engineering-portal.com formula page; IEC 60034-1 k = 235). */
class CopperTemperatureTest {
    private static final CopperTemperature.Constant IEC = CopperTemperature.Constant.IEC_60034_1;
    private static final CopperTemperature.Constant IEEE = CopperTemperature.Constant.IEEE_234_5;

    @Test
    void twoOhmsAtTwentyReadsHigherAtEighty() {
        // Item 3: 2.000 Ω at 20 °C → 2.47151 Ω at 80 °C (k = 234.5), 2.47059 Ω (k = 235), rel 1e-5.
        assertEquals(2.47151, CopperTemperature.correct(2.0, 20, 80, IEEE), 2.47151 * 1e-5);
        assertEquals(2.47059, CopperTemperature.correct(2.0, 20, 80, IEC), 2.47059 * 1e-5);
    }

    @Test
    void warmReadingCorrectsDownToTwenty() {
        // Item 3: 1.500 Ω measured at 25 °C → R20 = 1.47110 Ω (234.5) / 1.47115 Ω (235), rel 1e-5.
        assertEquals(1.47110, CopperTemperature.correct(1.5, 25, 20, IEEE), 1.47110 * 1e-5);
        assertEquals(1.47115, CopperTemperature.correct(1.5, 25, 20, IEC), 1.47115 * 1e-5);
    }

    @Test
    void temperatureFromResistanceRise() {
        // Item 3: 2.000 → 2.400 Ω from 20 °C → θ2 = 70.90 °C (234.5) / 71.00 °C (235), abs 0.01 K.
        assertEquals(70.90, CopperTemperature.temperatureC(2.0, 2.4, 20, IEEE), 0.01);
        assertEquals(71.00, CopperTemperature.temperatureC(2.0, 2.4, 20, IEC), 0.01);
    }

    @Test
    void defaultIsIec() {
        assertEquals(235.0, CopperTemperature.DEFAULT.kC());
        // Item 2: 1/α20 − 20 = 234.45 K for α20 = 0.00393 K⁻¹ (IEC 60028), consistent with 234.5 to 0.05 K.
        assertEquals(1 / 0.00393 - 20, IEEE.kC(), 0.06);
    }

    @Test
    void rejectsImpossibleInputs() {
        assertThrows(IllegalArgumentException.class, () -> CopperTemperature.correct(Double.NaN, 20, 20, IEC));
        assertThrows(IllegalArgumentException.class, () -> CopperTemperature.correct(-1, 20, 20, IEC));
        assertThrows(IllegalArgumentException.class, () -> CopperTemperature.correct(1, -300, 20, IEC));
        assertThrows(IllegalArgumentException.class, () -> CopperTemperature.temperatureC(0, 1, 20, IEC));
    }
}
