package org.lodestep.workflow;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.lodestep.drive.PlanningException;
import org.lodestep.drive.ProfileShape;

class DrivePlanTest {
    @TempDir
    Path dir;

    Path avoidList() throws Exception {
        Path f = dir.resolve("avoid.json");
        Files.writeString(f, """
                {"format": "lodestep-avoid-list", "version": 1, "microsteps": 16, "rotor_teeth": 50,
                 "ranges": [{"from_full_steps_per_s": 49.1, "to_full_steps_per_s": 69.8,
                             "min_acceleration_full_steps_per_s2": 482.9},
                            {"from_full_steps_per_s": 89.4, "to_full_steps_per_s": 157.4,
                             "min_acceleration_full_steps_per_s2": null}]}
                """);
        return f;
    }

    @Test
    void planCrossesTheBandsAndTheVirtualRigLosesNoStep() throws Exception {
        DrivePlan.Settings s = new DrivePlan.Settings(DriveCurveTest.typed(48, 450, DriveCurve.SpeedUnit.MM_PER_S),
                avoidList(), ProfileShape.S_CURVE, Double.POSITIVE_INFINITY, Double.NaN, 0.2, 0.001, true);
        DrivePlan.Result r = DrivePlan.run(s, Progress.NONE);
        assertEquals(2, r.bands().size());
        assertTrue(r.notes().stream().anyMatch(n -> n.contains("no crossing acceleration") && n.contains("line")),
                r.notes().toString());
        assertEquals(2, r.profile().crossings().size());
        assertEquals(0, r.simulation().planned().lostFullSteps(), r.simulation().toString());
        assertTrue(r.simulation().naive().lostFullSteps() > 0, r.simulation().toString());
    }

    @Test
    void noTargetIsASettingsErrorAndABlockingBandAFinding() throws Exception {
        DrivePlan.Settings none = new DrivePlan.Settings(DriveCurveTest.typed(48, Double.NaN,
                DriveCurve.SpeedUnit.MM_PER_S), null, ProfileShape.TRAPEZOIDAL, Double.POSITIVE_INFINITY, Double.NaN,
                0.2, 0.001, false);
        assertThrows(SettingsException.class, () -> DrivePlan.run(none, Progress.NONE));
        DrivePlan.Settings inBand = new DrivePlan.Settings(DriveCurveTest.typed(48, 100,
                DriveCurve.SpeedUnit.FULL_STEPS_PER_S), avoidList(), ProfileShape.TRAPEZOIDAL,
                Double.POSITIVE_INFINITY, Double.NaN, 0.2, 0.001, false);
        PlanningException e = assertThrows(PlanningException.class, () -> DrivePlan.run(inBand, Progress.NONE));
        assertTrue(e.getMessage().contains("lies inside the avoid band"), e.getMessage());
    }
}
