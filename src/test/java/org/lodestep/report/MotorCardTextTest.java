package org.lodestep.report;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

/**
 * Significant figures (common practice in reporting measurements: the zeros a rounding leaves are significant, so a
 * Ke read as 0.0900 V·s/rad says three figures and 0.09 only one); exact values such as a step angle keep no zeros.
 */
class MotorCardTextTest {

    @Test
    void measuredValuesKeepTheZerosOfTheirFigures() {
        assertEquals("0.0900", MotorCardText.measured(0.09, 3));
        assertEquals("2.00", MotorCardText.measured(2.0, 3));
        assertEquals("1.21", MotorCardText.measured(1.2149, 3));
        assertEquals("8.41", MotorCardText.measured(8.4072, 3));
        assertEquals("1400", MotorCardText.measured(1399.6, 3));
        assertEquals("-0.500", MotorCardText.measured(-0.5, 3));
        assertEquals("?", MotorCardText.measured(Double.NaN, 3));
    }

    @Test
    void exactValuesDropThem() {
        assertEquals("1.8", MotorCardText.num(1.8, 4));
        assertEquals("0.9", MotorCardText.num(0.9, 4));
        assertEquals("50", MotorCardText.num(50.0, 3));
    }
}
