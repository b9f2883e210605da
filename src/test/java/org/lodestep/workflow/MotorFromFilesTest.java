package org.lodestep.workflow;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.lodestep.motor.MotorCard;
import org.lodestep.motor.StepResponseFit;
import org.lodestep.motor.Unknown;
import org.lodestep.sample.InputFormatException;

class MotorFromFilesTest {
    private static final Path DIR = Path.of("sample-captures", "motor");

    @Test
    void stepTracesAreKeptWithTheirFitsAndTheFitIsAFirstOrderRise() throws Exception {
        MotorFromFiles.Result r = MotorFromFiles.run(new MotorFromFiles.Settings(DIR.resolve("resistance.csv"),
                List.of(DIR.resolve("step-1-7.csv")), null, null, null, null, null, MotorCardSettings.NONE, true),
                Progress.NONE);
        assertEquals(1, r.traces().size());
        MotorCaptureInputs.StepTrace t = r.traces().get(0);
        assertEquals("step-1-7.csv", t.source());
        assertEquals(t.timeS().length, t.currentA().length);
        StepResponseFit fit = r.card().stepResponses().get(0).fit();
        // RL step (Alexander & Sadiku, Fundamentals of Electric Circuits, first-order circuits): one time constant
        // after the step the rise has reached 1 - 1/e = 63.2 % of its final value.
        double at = fit.modelCurrentA(fit.stepTimeS() + fit.timeConstantS()) - fit.offsetA();
        assertEquals(1 - Math.exp(-1), at / fit.finalCurrentA(), 1e-12);
        assertEquals(fit.offsetA(), fit.modelCurrentA(fit.stepTimeS() - 1e-3), 0.0);
    }

    @Test
    void withoutBackEmfThePhasesOfAnEightLeadMotorStayUnknownAsCodedValues() throws Exception {
        MotorCard card = MotorFromFiles.run(new MotorFromFiles.Settings(DIR.resolve("resistance.csv"), List.of(),
                null, null, null, null, null, MotorCardSettings.NONE, false), Progress.NONE).card();
        assertEquals("8-lead", card.topology());
        assertTrue(card.unknowns().stream().anyMatch(u -> u.what() == Unknown.What.PHASES_OF_EIGHT_LEAD),
                card.unknowns().toString());
        assertTrue(card.unknowns().stream().anyMatch(u -> u.what() == Unknown.What.STEP_ANGLE));
        assertFalse(card.hasError(), card.findings().toString());
    }

    @Test
    void nothingToIdentifyIsASettingError() {
        assertThrows(IllegalArgumentException.class, () -> new MotorFromFiles.Settings(null, List.of(), null, null,
                null, null, null, MotorCardSettings.NONE, false));
    }

    @Test
    void aCaptureWithoutTheColumnATestNeedsNamesTheColumnsItHas(@TempDir Path dir) throws Exception {
        Path accel = dir.resolve("tap.csv");
        Files.writeString(accel, "time_s,accel_g\n0,0.1\n0.001,0.2\n0.002,0.1\n");
        InputFormatException step = assertThrows(InputFormatException.class,
                () -> MotorCaptureInputs.stepResponse(accel, null, null, null));
        assertEquals(accel + ": has no current column (its columns: accel): expected a column such as current_a"
                + " (amperes)", step.getMessage());
        InputFormatException emf = assertThrows(InputFormatException.class,
                () -> MotorCaptureInputs.backEmf(accel, null, null));
        assertTrue(emf.getMessage().startsWith(accel + ": has no back-EMF column (its columns: accel): expected"
                + " columns named emf_"), emf.getMessage());
    }
}
