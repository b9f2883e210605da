package org.lodestep.motor;

import java.util.Arrays;

/**
 * A current step response in the dimensionless form every first-order rise shares: time since the step in time
 * constants, t' = (t − t0)/τ, and the rise over its final value, i' = (i − i0)/I∞, so that every fit is the one curve
 * 1 − e^(−t') ({@link RlStep}; references §10) and responses of different coils lie on each other. The residual is
 * (measured − fitted)/I∞ at each sample: a first-order rise leaves noise, saturation or eddy currents leave a shape.
 * Samples before the step are left out.
 *
 * @param timeConstants   t', time since the fitted step in fitted time constants
 * @param measured        i', the measured rise over the fitted final current
 * @param fitted          1 − e^(−t'), the fit in the same form
 * @param residual        measured − fitted, as a fraction of the final current
 */
public record NormalisedStep(double[] timeConstants, double[] measured, double[] fitted, double[] residual) {
    public NormalisedStep {
        int n = timeConstants.length;
        if (measured.length != n || fitted.length != n || residual.length != n) {
            throw new IllegalArgumentException("a normalised step needs equal lengths, got " + n + ", "
                    + measured.length + ", " + fitted.length + " and " + residual.length);
        }
        timeConstants = timeConstants.clone();
        measured = measured.clone();
        fitted = fitted.clone();
        residual = residual.clone();
    }

    /**
     * @param fit      the fit of the recording
     * @param timeS    sample times, s
     * @param currentA the current the fit used, A
     */
    public static NormalisedStep of(StepResponseFit fit, double[] timeS, double[] currentA) {
        if (timeS.length != currentA.length) {
            throw new IllegalArgumentException(timeS.length + " times but " + currentA.length + " currents");
        }
        int from = 0;
        while (from < timeS.length && timeS[from] < fit.stepTimeS()) {
            from++;
        }
        int n = timeS.length - from;
        double[] t = new double[n];
        double[] m = new double[n];
        double[] f = new double[n];
        double[] r = new double[n];
        for (int k = 0; k < n; k++) {
            double ts = timeS[from + k];
            t[k] = (ts - fit.stepTimeS()) / fit.timeConstantS();
            m[k] = (currentA[from + k] - fit.offsetA()) / fit.finalCurrentA();
            f[k] = RlStep.riseA(1, 1, t[k]);
            r[k] = (currentA[from + k] - fit.modelCurrentA(ts)) / fit.finalCurrentA();
        }
        return new NormalisedStep(t, m, f, r);
    }

    @Override
    public double[] timeConstants() {
        return timeConstants.clone();
    }

    @Override
    public double[] measured() {
        return measured.clone();
    }

    @Override
    public double[] fitted() {
        return fitted.clone();
    }

    @Override
    public double[] residual() {
        return residual.clone();
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof NormalisedStep s && Arrays.equals(timeConstants, s.timeConstants)
                && Arrays.equals(measured, s.measured) && Arrays.equals(residual, s.residual);
    }

    @Override
    public int hashCode() {
        return 31 * Arrays.hashCode(timeConstants) + Arrays.hashCode(measured);
    }

    @Override
    public String toString() {
        return "NormalisedStep[" + timeConstants.length + " samples]";
    }
}
