package org.lodestep.motor;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;

class StepGeometryTest {
    // references §1 (exact): Acarnley, Stepping Motors, 4th ed., ch. 1-2; Jones, Stepping Motors tutorial
    // part 2 (torque-angle period = 4 steps).

    @Test
    void fiftyTeethGive200StepsOf1Point8Degrees() {
        assertEquals(200, StepGeometry.fullStepsPerRevolution(50));
        assertEquals(1.8, StepGeometry.stepAngleDeg(50), 1e-12);
        assertEquals(7.2, StepGeometry.toothPitchDeg(50), 1e-12);
        assertEquals(400, StepGeometry.stepsPerRevolution(50, 2));
        assertEquals(3200, StepGeometry.stepsPerRevolution(50, 16));
    }

    @Test
    void hundredTeethGive400StepsOf0Point9Degrees() {
        assertEquals(400, StepGeometry.fullStepsPerRevolution(100));
        assertEquals(0.9, StepGeometry.stepAngleDeg(100), 1e-12);
        assertEquals(6400, StepGeometry.stepsPerRevolution(100, 16));
        // item 1: 1/16 microstep of a 0.9° motor = 0.05625°
        assertEquals(0.05625, 360.0 / StepGeometry.stepsPerRevolution(100, 16), 1e-12);
    }

    @Test
    void cyclesPerRevolutionIsToothCount() {
        // item 14: f_e = N_r x rev/s, so 150 electrical cycles in 3 revolutions means 50 teeth
        assertEquals(50.0, StepGeometry.cyclesPerRevolution(150, 3), 1e-12);
        assertThrows(IllegalArgumentException.class, () -> StepGeometry.cyclesPerRevolution(150, 0));
        assertThrows(IllegalArgumentException.class, () -> StepGeometry.stepAngleDeg(0));
    }
}
