package org.lodestep.drive;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class TorqueCurvesTest {
    @Test
    void curveStartsAtTheLowSpeedTorqueAndEndsAtTenPercentOfIt() {
        Driver d = new Driver(DriveMode.CHOPPER, 24, 1.2, 16);
        TorqueCurve c = TorqueCurves.of(PhasorTorqueTest.MOTOR, d);
        assertEquals(0.216, c.points().get(0).pullOutTorqueNm(), 1e-12);
        TorquePoint last = c.points().get(c.points().size() - 1);
        assertEquals(0.1 * 0.216, last.pullOutTorqueNm(), 1e-6);
        for (int k = 1; k < c.points().size(); k++) {
            assertTrue(c.points().get(k).pullOutTorqueNm() <= c.points().get(k - 1).pullOutTorqueNm() + 1e-12,
                    "torque never rises with speed");
        }
        // power = T·ω, ω = 2π·rate/(4·N_r)
        TorquePoint p = c.points().get(100);
        assertEquals(p.pullOutTorqueNm() * p.rateFullStepsPerS() * 2 * Math.PI / 200, p.powerW(), 1e-9);
        assertEquals(p.rateFullStepsPerS() * 60 / 200, p.speedRpm(), 1e-9);
    }

    @Test
    void rejectsImpossibleMotorConstants() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> new PhaseModel(2.4, -8e-3, 0.18, 50, 5.4e-6, 0));
        assertTrue(e.getMessage().contains("phase inductance") && e.getMessage().contains("H"), e.getMessage());
        assertThrows(IllegalArgumentException.class, () -> new PhaseModel(Double.NaN, 8e-3, 0.18, 50, 5.4e-6, 0));
        assertThrows(IllegalArgumentException.class, () -> new Driver(DriveMode.CHOPPER, 24, 0, 16));
        assertThrows(IllegalArgumentException.class, () -> new Driver(DriveMode.CHOPPER, -1, 1, 16));
    }
}
