package org.lodestep.motor;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;

import org.junit.jupiter.api.Test;

class NormalisedStepTest {

    @Test
    void anExactFirstOrderRiseLiesOnTheUniversalCurveWithZeroResidual() {
        // references §10 (Alexander and Sadiku, Fundamentals of Electric Circuits, RL step response): V = 2.0 V,
        // R = 2.0 Ω, L = 4.0 mH → τ = 2.000 ms, I∞ = 1.000 A, i(τ) = 0.632121 A, i(2τ) = 0.864665 A. Here the step
        // comes at 1 ms on a sensor offset of 0.05 A.
        double[] t = SyntheticMotor.times(1001, 1e-5);
        double[] i = SyntheticMotor.rlStep(t, 2.0, 2.0, 4e-3, 1e-3, 0, 0, 1);
        for (int k = 0; k < i.length; k++) {
            i[k] += 0.05;
        }
        StepResponseFit fit = new StepResponseFit(1.0, 2e-3, 1e-3, 0.05, 2.0, 2.0, 4e-3, 0, 2e-3, 2e-3,
                ResponseShape.EXPONENTIAL, List.of());
        NormalisedStep s = NormalisedStep.of(fit, t, i);
        double[] x = s.timeConstants();
        // samples before the step are left out: the first kept is at (or a rounding after) the step
        assertEquals(0.0, x[0], 0.0051);
        int tau = nearest(x, 1.0);
        int twoTau = nearest(x, 2.0);
        assertEquals(1.0, x[tau], 1e-6);
        assertEquals(0.632121, s.measured()[tau], 1e-6);
        assertEquals(0.864665, s.measured()[twoTau], 1e-6);
        assertEquals(0.632121, s.fitted()[tau], 1e-6);
        for (double r : s.residual()) {
            assertEquals(0, r, 1e-12);
        }
    }

    @Test
    void aFittedNoisyStepNormalisesOntoTheCurveWithResidualsAtTheNoise() {
        // the same circuit (references §10) with 2 mA of noise, fitted by the engine's fitter, not given its answer
        double[] t = SyntheticMotor.times(2001, 1e-5);
        double[] i = SyntheticMotor.rlStep(t, 2.0, 2.0, 4e-3, 1e-3, 0.002, 0, 7);
        StepResponseFit fit = new StepResponseFitter(2.0, 0, null).fit(t, i);
        NormalisedStep s = NormalisedStep.of(fit, t, i);
        double ss = 0;
        for (double r : s.residual()) {
            ss += r * r;
        }
        // residual RMS about the noise over the final current (2 mA of 1 A)
        assertEquals(0.002, Math.sqrt(ss / s.residual().length), 0.0005);
        // where t/τ = 1 the fitted curve reads 1 − 1/e
        double[] x = s.timeConstants();
        int k = 0;
        while (x[k] < 1) {
            k++;
        }
        assertEquals(0.632121, s.fitted()[k], 0.01);
    }

    private static int nearest(double[] x, double v) {
        int best = 0;
        for (int k = 0; k < x.length; k++) {
            if (Math.abs(x[k] - v) < Math.abs(x[best] - v)) {
                best = k;
            }
        }
        return best;
    }
}
