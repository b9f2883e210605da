package org.lodestep.drive;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.lodestep.resonance.RateUnits;

class SpeedQuestionTest {
    static final PhaseModel MOTOR = PhasorTorqueTest.MOTOR;
    static final Driver DRIVE = new Driver(DriveMode.CHOPPER, 24, 1.2, 16);
    static final RateUnits UNITS = new RateUnits(16, 50, 40);

    @Test
    void marginIsTheShareOfPullOutTorqueLeftUnused() {
        TorqueCurve c = TorqueCurves.of(MOTOR, DRIVE);
        Load load = new Load(1e-5, 0.05, 0, 40);
        SpeedAnswer a = SpeedQuestion.answer(c, load, 500, 0.3, UNITS, false);
        assertEquals(SpeedAnswer.Verdict.REACHABLE, a.verdict());
        assertEquals(1 - 0.05 / 0.216, a.marginAtTarget(), 1e-9);
        // 500 full steps/s at 200 steps/rev and 40 mm/rev: 150 rpm, 100 mm/s, 8000 pulses/s at 1/16
        assertEquals(150, a.target().rpm(), 1e-9);
        assertEquals(100, a.target().mmPerS(), 1e-9);
        assertEquals(8000, a.target().pulsesPerS(), 1e-9);
        // highest rate with the margin: (1 − m)·T_po = load there
        double top = a.maxRateWithMarginFullStepsPerS();
        assertEquals(0.05, 0.7 * c.torqueNm(top), 1e-6);
        // acceleration left: ((1 − m)·T − load)/J in rad/s², per 2π/200 rad per full step
        assertEquals((0.7 * 0.216 - 0.05) / (5.4e-6 + 1e-5) / (2 * Math.PI / 200),
                a.accelerationAtTargetFullStepsPerS2(), 1e-6);
        assertTrue(a.suggestions().isEmpty());
    }

    @Test
    void aLoadWithNoSteadyTorqueHasNoHighestRateRatherThanASearchCap() {
        // with no torque at constant speed, (1 − m)·T_po ≥ 0 holds wherever the model's torque is positive: at every
        // rate (it only tends to zero as 1/ω, PhasorTorque), so no finite highest rate exists
        TorqueCurve c = TorqueCurves.of(MOTOR, DRIVE);
        SpeedAnswer a = SpeedQuestion.answer(c, new Load(1e-5, 0, 0, 40), 500, 0.3, UNITS, false);
        assertEquals(SpeedAnswer.Verdict.REACHABLE, a.verdict());
        assertTrue(Double.isInfinite(a.maxRateWithMarginFullStepsPerS()), "got " + a.maxRateWithMarginFullStepsPerS());
    }

    @Test
    void gravityLoadBecomesTorqueThroughTheTravelPerRevolution() {
        // F·p/2π: 50 N on a 5 mm/rev screw is 0.0398 N·m (energy balance)
        Load load = new Load(0, 0, 50, 5);
        assertEquals(50 * 0.005 / (2 * Math.PI), load.steadyTorqueNm(), 1e-12);
        // m·(p/2π)²: 2 kg on a 40 mm/rev belt is 8.1e-5 kg·m²
        assertEquals(2 * Math.pow(0.04 / (2 * Math.PI), 2), Load.massInertiaKgM2(2, 40), 1e-15);
    }

    @Test
    void targetBeyondTheCurveIsNotReachableAndSuggestionsReachIt() {
        TorqueCurve c = TorqueCurves.of(MOTOR, DRIVE);
        Load load = new Load(0, 0.08, 0, 40);
        double target = 4000;
        SpeedAnswer a = SpeedQuestion.answer(c, load, target, 0.3, UNITS, true);
        assertFalse(a.verdict() == SpeedAnswer.Verdict.REACHABLE);
        assertTrue(a.marginAtTarget() < 0.3);
        assertFalse(a.suggestions().isEmpty());
        for (Suggestion s : a.suggestions()) {
            PhaseModel m = s.change().equals("parallel") ? Reconnection.seriesToParallel(MOTOR) : MOTOR;
            Driver d = switch (s.change()) {
                case "supply" -> DRIVE.withSupplyV(s.value());
                case "parallel", "current" -> DRIVE.withCurrentA(s.value());
                default -> throw new AssertionError(s.change());
            };
            double t = PhasorTorque.pullOutTorqueNm(m, d, m.radPerS(target));
            assertTrue(0.7 * t >= 0.08, s.text());
        }
    }

    @Test
    void parallelWiringHasAQuarterOfTheResistanceAndInductanceAndHalfTheKt() {
        // Series L ≈ 4·L_coil, parallel ≈ L_coil at full coupling; R 2r vs r/2; Kt halves (coupled-coil relation
        // L = L1 + L2 ± 2M; trade convention of equal copper loss for the current: common practice)
        PhaseModel p = Reconnection.seriesToParallel(MOTOR);
        assertEquals(0.6, p.phaseResistanceOhm(), 1e-12);
        assertEquals(2e-3, p.phaseInductanceH(), 1e-15);
        assertEquals(0.09, p.ktNmPerA(), 1e-12);
        // the same ampere-turns: same low-speed torque at twice the current
        Driver dp = DRIVE.withCurrentA(Reconnection.parallelCurrentA(1.2));
        assertEquals(PhasorTorque.pullOutTorqueNm(MOTOR, DRIVE, 0), PhasorTorque.pullOutTorqueNm(p, dp, 0), 1e-12);
        // and the same copper loss: I²R
        assertEquals(1.2 * 1.2 * 2.4, 2.4 * 2.4 * 0.6, 1e-12);
    }
}
