package org.lodestep.motor;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class StepResponseFitterTest {

    @Test
    void fitsInductanceOfNoisyQuantisedResponseWithinHalfPercent() {
        // Alexander and Sadiku, Fundamentals of Electric Circuits, first-order circuits, references §10: V = 2.0 V, R
        // = 2.0 ohm, L = 4.0 mH sampled at 10 us -> fitted L = 4.000 mH
        // (rel 5e-3). Noise 5 mA RMS and a 12-bit converter over 2 A (0.49 mA per count) are our own choice.
        double[] t = SyntheticMotor.times(2000, 10e-6);
        double[] i = SyntheticMotor.rlStep(t, 2.0, 2.0, 4.0e-3, 1.0e-3, 0.005, 2.0 / 4096, 7);
        StepResponseFit fit = new StepResponseFitter(2.0, 0.0, null).fit(t, i);
        assertEquals(4.0e-3, fit.inductanceH(), 4.0e-3 * 5e-3);
        assertEquals(2.0e-3, fit.timeConstantS(), 2.0e-3 * 5e-3);
        assertEquals(1.0e-3, fit.stepTimeS(), 2e-5);
        assertEquals(2.0, fit.loopResistanceOhm(), 2.0 * 5e-3);
        assertEquals(ResponseShape.EXPONENTIAL, fit.shape());
        assertTrue(fit.findings().isEmpty(), fit.findings().toString());
    }

    @Test
    void oneGlitchSampleIsBridgedAndNamedAndTheFitIsTheCleanOnes() {
        // the same first-order circuit (references §10): V = 2.0 V, R = 2.0 ohm, L = 4.0 mH; one sample during the
        // rise reads 9 A. An inductor's current cannot jump, and left in, the glitch alone pushes the rise's scatter
        // past the fit's screen.
        double[] t = SyntheticMotor.times(2000, 10e-6);
        double[] i = SyntheticMotor.rlStep(t, 2.0, 2.0, 4.0e-3, 1.0e-3, 0.005, 2.0 / 4096, 7);
        StepResponseFit clean = new StepResponseFitter(2.0, 0.0, null).fit(t, i);
        i[300] = 9.0;
        StepResponseFit fit = new StepResponseFitter(2.0, 0.0, null).fit(t, i);
        assertEquals(clean.inductanceH(), fit.inductanceH(), clean.inductanceH() * 1e-3);
        assertEquals(4.0e-3, fit.inductanceH(), 4.0e-3 * 5e-3);
        assertEquals(1, fit.findings().stream().filter(f -> f.code() == MotorFindingCode.GLITCH_BRIDGED).count());
        assertTrue(fit.findings().get(0).message().contains("t = 0.003 s read 9.00 A"), fit.findings().toString());
    }

    @Test
    void subtractsSeriesResistanceFromLoop() {
        // item 10: R is the whole loop; winding 1.5 ohm + 0.5 ohm sense resistor = 2.0 ohm, tau = 2 ms
        double[] t = SyntheticMotor.times(2000, 10e-6);
        double[] i = SyntheticMotor.rlStep(t, 2.0, 2.0, 4.0e-3, 0.5e-3, 0.001, 0, 3);
        StepResponseFit fit = new StepResponseFitter(2.0, 0.5, null).fit(t, i);
        assertEquals(1.5, fit.windingResistanceOhm(), 1.5 * 5e-3);
        assertEquals(4.0e-3, fit.inductanceH(), 4.0e-3 * 5e-3);
    }

    @Test
    void usesKnownWindingResistanceWhenSupplyUnknown() {
        double[] t = SyntheticMotor.times(2000, 10e-6);
        double[] i = SyntheticMotor.rlStep(t, 2.0, 2.0, 4.0e-3, 0.5e-3, 0.001, 0, 5);
        StepResponseFit fit = new StepResponseFitter(null, 0.0, 2.0).fit(t, i);
        assertEquals(4.0e-3, fit.inductanceH(), 4.0e-3 * 5e-3);
        StepResponseFit unknown = new StepResponseFitter(null, 0.0, null).fit(t, i);
        assertNull(unknown.inductanceH());
        assertEquals(2.0e-3, unknown.timeConstantS(), 2.0e-3 * 5e-3);
    }

    @Test
    void flagsSaturationWhenInductanceFallsWithCurrent() {
        // L(i) = L0/(1 + (i/0.8 A)^2): at the 1 A final current L is 39 % of L0, so the late rise is much faster.
        double[] t = SyntheticMotor.times(3000, 10e-6);
        double[] i = SyntheticMotor.saturatingStep(t, 2.0, 2.0, 4.0e-3, 0.8);
        StepResponseFit fit = new StepResponseFitter(2.0, 0.0, null).fit(t, i);
        assertEquals(ResponseShape.SATURATION, fit.shape());
        assertTrue(fit.findings().stream().anyMatch(f -> f.code().code().equals("saturation")));
    }

    @Test
    void flagsEddyCurrentsWhenRiseStartsFast() {
        double[] t = SyntheticMotor.times(3000, 10e-6);
        double[] i = SyntheticMotor.eddyStep(t, 2.0, 2.0, 2.0e-3, 0.3);
        StepResponseFit fit = new StepResponseFitter(2.0, 0.0, null).fit(t, i);
        assertEquals(ResponseShape.EDDY_CURRENT, fit.shape());
    }

    @Test
    void warnsWhenRecordIsShorterThanThreeTimeConstants() {
        double[] t = SyntheticMotor.times(400, 10e-6);
        double[] i = SyntheticMotor.rlStep(t, 2.0, 2.0, 4.0e-3, 0.5e-3, 0.0, 0, 1);
        StepResponseFit fit = new StepResponseFitter(2.0, 0.0, null).fit(t, i);
        assertTrue(fit.findings().stream().anyMatch(f -> f.code().code().equals("short_record")));
    }

    @Test
    void rejectsFlatTrace() {
        double[] t = SyntheticMotor.times(200, 10e-6);
        double[] i = new double[200];
        assertThrows(IllegalArgumentException.class, () -> new StepResponseFitter(2.0, 0, null).fit(t, i));
    }

    @Test
    void refusesNoiseInsteadOfFittingACoil() {
        // Gaussian noise of 10 mA with no step in it: no RL rise (L·di/dt = V - R·i, references §10) can be found, so
        // the fitter says so instead of reporting an inductance.
        double[] t = SyntheticMotor.times(600, 20e-6);
        java.util.Random rnd = new java.util.Random(5);
        double[] i = new double[t.length];
        for (int k = 0; k < i.length; k++) {
            i[k] = 0.01 * rnd.nextGaussian();
        }
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> new StepResponseFitter(2.0, 0, null).fit(t, i));
        assertTrue(e.getMessage().startsWith("no "), e.getMessage());
    }

    @Test
    void refusesARecordThatNeverSettles() {
        // a straight ramp: its exponential fit needs a time constant far longer than the record
        double[] t = SyntheticMotor.times(600, 20e-6);
        double[] i = new double[t.length];
        for (int k = 0; k < i.length; k++) {
            i[k] = 0.5 * k / i.length;
        }
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> new StepResponseFitter(2.0, 0, null).fit(t, i));
        assertTrue(e.getMessage().startsWith("no settled RL step response found"), e.getMessage());
    }
}
