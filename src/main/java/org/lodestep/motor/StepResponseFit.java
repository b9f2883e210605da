package org.lodestep.motor;

import java.util.List;
import java.util.Objects;
import org.lodestep.wiring.Finding;

/**
 * Result of fitting {@code i(t) = i0 + Iinf·(1 - e^(-(t - t0)/tau))} to a current step response.
 *
 * @param finalCurrentA          fitted final current rise {@code Iinf}, A
 * @param timeConstantS          fitted electrical time constant {@code tau}, s
 * @param stepTimeS              fitted instant the voltage was applied {@code t0}, s
 * @param offsetA                fitted current before the step (sensor offset), A
 * @param loopResistanceOhm      whole loop resistance: {@code V/Iinf} when the supply is known, else winding plus
 *                               series resistance when the winding resistance is known; null when neither is
 * @param windingResistanceOhm   loop resistance less the series resistance; null when unknown
 * @param inductanceH            {@code tau·R_loop}; null when the loop resistance is unknown
 * @param rmsResidualA           RMS difference between data and fit, A
 * @param earlyTimeConstantS     time constant of the 5-50 % part of the rise alone, s
 * @param lateTimeConstantS      time constant of the 50-90 % part of the rise alone, s
 * @param shape                  how the rise departs from one exponential
 * @param findings               warnings about the data or the fit
 */
public record StepResponseFit(double finalCurrentA, double timeConstantS, double stepTimeS, double offsetA,
                              Double loopResistanceOhm, Double windingResistanceOhm, Double inductanceH,
                              double rmsResidualA, double earlyTimeConstantS, double lateTimeConstantS,
                              ResponseShape shape, List<Finding> findings) {
    public StepResponseFit {
        Checks.positive(finalCurrentA, "final current", "A");
        Checks.positive(timeConstantS, "time constant", "s");
        Checks.finite(stepTimeS, "step time", "s");
        Checks.finite(offsetA, "offset", "A");
        Checks.positiveOrNull(loopResistanceOhm, "loop resistance", "ohm");
        Checks.finiteOrNull(windingResistanceOhm, "winding resistance", "ohm");
        Checks.positiveOrNull(inductanceH, "inductance", "H");
        Checks.nonNegative(rmsResidualA, "RMS residual", "A");
        Objects.requireNonNull(shape, "shape");
        findings = List.copyOf(findings);
    }

    /** The fitted model at {@code timeS}, A: {@code i0} plus the {@link RlStep} rise from {@code t0}. */
    public double modelCurrentA(double timeS) {
        return offsetA + RlStep.riseA(finalCurrentA, timeConstantS, timeS - stepTimeS);
    }
}
