package org.lodestep.workflow;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.lodestep.drive.DriveMode;
import org.lodestep.drive.Load;
import org.lodestep.drive.SpeedAnswer;

class DriveCurveTest {
    @TempDir
    Path dir;

    static DriveCurve.Settings typed(double supplyV, double target, DriveCurve.SpeedUnit unit) {
        return new DriveCurve.Settings(null, 2.43, 8.2e-3, 0.18, null, 5.4e-6, 0, DriveMode.CHOPPER, supplyV, 1.2, 16,
                0, new Load(8.1e-5, 0.11, 0, 40), target, unit, 0.3, false);
    }

    @Test
    void typedConstantsGiveTheCurveAndTheAnswer() throws Exception {
        DriveCurve.Result r = DriveCurve.run(typed(48, 450, DriveCurve.SpeedUnit.MM_PER_S), Progress.NONE);
        assertEquals(SpeedAnswer.Verdict.REACHABLE, r.answer().verdict());
        assertEquals(2250, r.answer().target().fullStepsPerS(), 1e-9);
        assertTrue(r.notes().stream().anyMatch(n -> n.contains("50 assumed")), r.notes().toString());
        // 4·(R/L)/2π (Acarnley section 5.5): 2.43/8.2e-3 = 296.3 rad/s -> 188.7 full steps/s
        assertEquals(4 * 2.43 / 8.2e-3 / (2 * Math.PI), r.midBandCentreFullStepsPerS(), 1e-9);
    }

    @Test
    void cardValuesFillWhatIsNotTypedAndAnEightLeadSeriesCardMayGoParallel() throws Exception {
        Path card = dir.resolve("card.json");
        Files.writeString(card, """
                {"topology": "8-lead", "connection": "series", "rotor_teeth": 50, "kt_nm_per_a": 0.18,
                 "phase_current_a": 1.2, "supply_v": 24, "inertia_kg_m2": 5.4e-6,
                 "phases": [{"resistance_ohm": 2.43, "inductance_h": 0.0082},
                            {"resistance_ohm": 2.43, "inductance_h": 0.0082}]}
                """);
        DriveCurve.Settings s = new DriveCurve.Settings(card, null, null, null, null, null, 0, DriveMode.CHOPPER,
                null, null, 16, 0, new Load(8.1e-5, 0.11, 0, 40), 450, DriveCurve.SpeedUnit.MM_PER_S, 0.3, false);
        DriveCurve.Result r = DriveCurve.run(s, Progress.NONE);
        assertEquals(24, r.curve().drive().supplyV());
        assertEquals(SpeedAnswer.Verdict.MARGIN_SHORT, r.answer().verdict());
        assertTrue(r.answer().suggestions().stream().anyMatch(g -> g.change().equals("parallel")));
        assertTrue(r.notes().stream().anyMatch(n -> n.contains("rotor inertia taken from the card")));
    }

    @Test
    void missingConstantsAreASettingsError() {
        DriveCurve.Settings s = new DriveCurve.Settings(null, 2.43, null, 0.18, null, 5.4e-6, 0, DriveMode.CHOPPER,
                24.0, 1.2, 16, 0, Load.none(), Double.NaN, DriveCurve.SpeedUnit.RPM, 0.3, false);
        SettingsException e = assertThrows(SettingsException.class, () -> DriveCurve.run(s, Progress.NONE));
        assertTrue(e.getMessage().contains("phase inductance"), e.getMessage());
        SettingsException mm = assertThrows(SettingsException.class, () -> DriveCurve.run(new DriveCurve.Settings(
                null, 2.43, 8.2e-3, 0.18, null, 5.4e-6, 0, DriveMode.CHOPPER, 24.0, 1.2, 16, 0, Load.none(), 100,
                DriveCurve.SpeedUnit.MM_PER_S, 0.3, false), Progress.NONE));
        assertTrue(mm.getMessage().contains("travel per revolution"), mm.getMessage());
    }
}
