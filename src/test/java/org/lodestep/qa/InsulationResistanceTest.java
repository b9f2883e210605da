package org.lodestep.qa;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;

class InsulationResistanceTest {

    // IEEE Std 43-2013 clause 6.3, halving per 10 °C (references §8, rel 1e-9): 200 Mohm at 20 °C -> 50;
    // 40 Mohm at 45 °C -> 56.5685; 3 Mohm at 70 °C -> 24.
    @Test
    void correctionToFortyDegreesMatchesStandardExamples() {
        assertEquals(50e6, InsulationResistance.correctedTo40C(200e6, 20), 50e6 * 1e-9);
        assertEquals(56.5685e6, InsulationResistance.correctedTo40C(40e6, 45), 56.5685e6 * 1e-6);
        assertEquals(24e6, InsulationResistance.correctedTo40C(3e6, 70), 24e6 * 1e-9);
    }

    // references §9 (common practice): 150 Mohm at 25 °C -> 53.033 Mohm at 40 °C (rel 1e-6).
    @Test
    void smallMotorTrendingValue() {
        assertEquals(53.033e6, InsulationResistance.correctedTo40C(150e6, 25), 53.033e6 * 1e-5);
    }

    // IEEE Std 43-2013 Table 1 (references §6): 48 V DC -> 500 V; 400 V AC -> 500 V; 4160 V -> 1000-2500 V
    // (lower end 1000 V used); 13.8 kV -> 5000-10000 V (lower end 5000 V).
    @Test
    void testVoltageFollowsTableOne() {
        assertEquals(500, InsulationResistance.testVoltageV(48));
        assertEquals(500, InsulationResistance.testVoltageV(400));
        assertEquals(1000, InsulationResistance.testVoltageV(4160));
        assertEquals(5000, InsulationResistance.testVoltageV(13800));
    }

    @Test
    void rejectsNonPositiveReading() {
        assertThrows(IllegalArgumentException.class, () -> InsulationResistance.correctedTo40C(0, 20));
    }
}
