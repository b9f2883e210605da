package org.lodestep.motor;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

import org.apache.commons.math3.fitting.leastsquares.LeastSquaresBuilder;
import org.apache.commons.math3.fitting.leastsquares.LeastSquaresOptimizer;
import org.apache.commons.math3.fitting.leastsquares.LevenbergMarquardtOptimizer;
import org.apache.commons.math3.fitting.leastsquares.MultivariateJacobianFunction;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.ArrayRealVector;
import org.apache.commons.math3.linear.RealMatrix;
import org.apache.commons.math3.linear.RealVector;
import org.apache.commons.math3.stat.regression.SimpleRegression;
import org.apache.commons.math3.util.Pair;
import org.lodestep.signal.LoneSamples;
import org.lodestep.signal.LoneSamples.LoneSample;
import org.lodestep.wiring.Finding;

/**
 * Fits the RL step response of {@link RlStep} to a sampled winding current with Commons Math's Levenberg-Marquardt
 * least squares, and derives the loop resistance, winding resistance and inductance.
 *
 * <p>Four parameters are fitted: offset before the step, final rise, step instant and time constant, so a trace with
 * pre-trigger samples or a sensor offset needs no trimming. Saturation and eddy currents are told apart by fitting the
 * early (5-50 %) and late (50-90 %) parts of the rise separately: saturation shortens the late time constant, eddy
 * currents shorten the early one. The 15 % threshold is common practice (no published source).
 */
public final class StepResponseFitter {
    /** Relative difference between the early and late time constants above which the shape is not exponential. */
    static final double SHAPE_TOLERANCE = 0.15;
    /**
     * Largest RMS residual, as a fraction of the fitted rise, for which the trace is still a step response: noise or
     * a trace of another shape fits an exponential with a residual comparable to the rise itself. The 20 % bound is
     * our own choice (common practice for a goodness-of-fit screen), far above the residual of a real, noisy rise.
     */
    static final double MAX_RESIDUAL_OF_RISE = 0.20;

    private final Double supplyV;
    private final double seriesOhm;
    private final Double knownWindingOhm;

    /**
     * @param supplyV         step voltage across the loop, V; null when unknown
     * @param seriesOhm       resistance in the loop besides the winding (sense resistor, source), ohm, 0 or more
     * @param knownWindingOhm winding resistance from a resistance measurement, ohm; null when unknown. Used for the
     *                        inductance only when the supply voltage is unknown.
     */
    public StepResponseFitter(Double supplyV, double seriesOhm, Double knownWindingOhm) {
        Checks.positiveOrNull(supplyV, "supply voltage", "V");
        Checks.nonNegative(seriesOhm, "series resistance", "ohm");
        Checks.positiveOrNull(knownWindingOhm, "winding resistance", "ohm");
        this.supplyV = supplyV;
        this.seriesOhm = seriesOhm;
        this.knownWindingOhm = knownWindingOhm;
    }

    /**
     * Fits one response.
     *
     * @param timeS    sample times, s, increasing
     * @param readA    winding current at those times, A; a lone glitch sample is bridged and named in a finding
     * @throws IllegalArgumentException when the arrays differ in length, hold fewer than 20 samples or show no rise
     */
    public StepResponseFit fit(double[] timeS, double[] readA) {
        if (timeS.length != readA.length) {
            throw new IllegalArgumentException(timeS.length + " times but " + readA.length + " currents");
        }
        int n = timeS.length;
        if (n < 20) {
            throw new IllegalArgumentException("a step response needs at least 20 samples, got " + n);
        }
        // A winding's current cannot jump (its inductance), so one sample far over both neighbours is a glitch; left
        // in, it alone can make the rise scatter past the fit's screen.
        List<LoneSample> lone = LoneSamples.find(readA);
        double[] currentA = LoneSamples.bridged(readA, lone);
        double[] guess = initialGuess(timeS, currentA);
        LeastSquaresOptimizer.Optimum optimum;
        try {
            optimum = new LevenbergMarquardtOptimizer().optimize(new LeastSquaresBuilder()
                    .start(guess)
                    .model(model(timeS))
                    .target(currentA)
                    .lazyEvaluation(false)
                    .maxEvaluations(2000)
                    .maxIterations(2000)
                    .build());
        } catch (IllegalStateException | ArithmeticException e) {
            // Commons Math's convergence and evaluation-count failures: the trace has no RL rise to fit
            throw new IllegalArgumentException("no RL step response found: the least-squares fit of the rise did not"
                    + " converge; expected a current rising to a settled level after the step");
        }
        double[] p = optimum.getPoint().toArray();
        double offsetA = p[0];
        double finalA = p[1];
        double stepS = p[2];
        double tauS = Math.abs(p[3]);
        if (!(finalA > 0) || !(tauS > 0)) {
            throw new IllegalArgumentException("no RL step response found: the current does not rise after the step (fitted rise "
                    + finalA + " A); is the current channel inverted or the winding open?");
        }
        double rms = optimum.getRMS();
        double recordS = timeS[n - 1] - timeS[0];
        if (!(stepS >= timeS[0] - recordS && stepS < timeS[n - 1]) || !(tauS < recordS)) {
            throw new IllegalArgumentException(String.format("no settled RL step response found: the fitted time"
                    + " constant (%.3g s) or step instant lies outside the record of %.3g s; expected a record that"
                    + " shows the current settle", tauS, recordS));
        }
        if (!(rms <= MAX_RESIDUAL_OF_RISE * finalA)) {
            throw new IllegalArgumentException(String.format("no RL step response found: the current scatters by"
                    + " %.3g A about the best exponential rise of %.3g A (more than %.0f %%); expected a clean rise, not"
                    + " noise", rms, finalA, MAX_RESIDUAL_OF_RISE * 100));
        }

        List<Finding> findings = new ArrayList<>();
        if (!lone.isEmpty()) {
            findings.add(Finding.warning(MotorFindingCode.GLITCH_BRIDGED, LoneSamples.describe(lone, timeS, "A")));
        }
        double early = localTimeConstant(timeS, currentA, offsetA, finalA, stepS, 0.05, 0.50);
        double late = localTimeConstant(timeS, currentA, offsetA, finalA, stepS, 0.50, 0.90);
        ResponseShape shape = ResponseShape.EXPONENTIAL;
        if (Double.isFinite(early) && Double.isFinite(late)) {
            if (late < early * (1 - SHAPE_TOLERANCE)) {
                shape = ResponseShape.SATURATION;
                findings.add(Finding.warning(MotorFindingCode.SATURATION, String.format(
                        "the rise speeds up as current grows (time constant %.3g ms early, %.3g ms late): the iron "
                                + "saturates; the inductance is current-dependent and the fitted value is an average",
                        early * 1e3, late * 1e3)));
            } else if (early < late * (1 - SHAPE_TOLERANCE)) {
                shape = ResponseShape.EDDY_CURRENT;
                findings.add(Finding.warning(MotorFindingCode.EDDY_CURRENT, String.format(
                        "the rise starts faster than it continues (time constant %.3g ms early, %.3g ms late): eddy "
                                + "currents; the inductance at driver chopping frequencies is lower than fitted",
                        early * 1e3, late * 1e3)));
            }
        } else {
            early = tauS;
            late = tauS;
        }
        double coveredTau = (timeS[n - 1] - stepS) / tauS;
        if (coveredTau < 3.0) {
            findings.add(Finding.warning(MotorFindingCode.SHORT_RECORD, String.format(
                    "the record ends %.1f time constants after the step; capture at least 5 so the final current "
                            + "is measured rather than extrapolated", coveredTau)));
        }

        Double loopOhm = null;
        if (supplyV != null) {
            loopOhm = supplyV / finalA;
        } else if (knownWindingOhm != null) {
            loopOhm = knownWindingOhm + seriesOhm;
        }
        Double windingOhm = loopOhm == null ? null : loopOhm - seriesOhm;
        if (windingOhm != null && windingOhm <= 0) {
            findings.add(Finding.warning(MotorFindingCode.SERIES_RESISTANCE, String.format(
                    "the series resistance %.4g ohm is not less than the loop resistance %.4g ohm; check the supply "
                            + "voltage and series resistance", seriesOhm, loopOhm)));
        }
        Double inductanceH = loopOhm == null ? null : RlStep.inductanceH(tauS, loopOhm);
        return new StepResponseFit(finalA, tauS, stepS, offsetA, loopOhm, windingOhm, inductanceH, rms,
                early, late, shape, findings);
    }

    private static double[] initialGuess(double[] t, double[] i) {
        int n = t.length;
        int head = Math.max(3, n / 50);
        double[] first = Arrays.copyOf(i, head);
        Arrays.sort(first);
        double offset = first[head / 2];
        double sum = 0;
        int tail = Math.max(3, n / 20);
        for (int k = n - tail; k < n; k++) {
            sum += i[k];
        }
        double rise = sum / tail - offset;
        double t10 = crossing(t, i, offset + 0.10 * rise);
        double t63 = crossing(t, i, offset + (1 - Math.exp(-1)) * rise);
        double tau = (t63 - t10) / (1 - Math.log(1 / 0.9));
        if (!(tau > 0)) {
            tau = (t[n - 1] - t[0]) / 5;
        }
        double t0 = t10 - tau * Math.log(1 / 0.9);
        return new double[] {offset, rise, t0, tau};
    }

    private static double crossing(double[] t, double[] i, double level) {
        for (int k = 0; k < t.length; k++) {
            if (i[k] >= level) {
                return t[k];
            }
        }
        return t[t.length - 1];
    }

    private static MultivariateJacobianFunction model(double[] t) {
        return point -> {
            double off = point.getEntry(0);
            double rise = point.getEntry(1);
            double t0 = point.getEntry(2);
            double tau = point.getEntry(3);
            RealVector value = new ArrayRealVector(t.length);
            RealMatrix jac = new Array2DRowRealMatrix(t.length, 4);
            for (int k = 0; k < t.length; k++) {
                double dt = t[k] - t0;
                jac.setEntry(k, 0, 1.0);
                if (dt <= 0) {
                    value.setEntry(k, off);
                    continue;
                }
                double e = Math.exp(-dt / tau);
                value.setEntry(k, off + rise * (1 - e));
                jac.setEntry(k, 1, 1 - e);
                jac.setEntry(k, 2, -rise * e / tau);
                jac.setEntry(k, 3, -rise * e * dt / (tau * tau));
            }
            return new Pair<>(value, jac);
        };
    }

    /** Time constant of the part of the rise between two fractions, from the slope of ln(1 - rise fraction). */
    private static double localTimeConstant(double[] t, double[] i, double off, double rise, double t0,
                                            double fromFraction, double toFraction) {
        SimpleRegression reg = new SimpleRegression();
        for (int k = 0; k < t.length; k++) {
            if (t[k] <= t0) {
                continue;
            }
            double f = (i[k] - off) / rise;
            if (f >= fromFraction && f <= toFraction) {
                reg.addData(t[k], Math.log(1 - f));
            }
        }
        if (reg.getN() < 5 || !(reg.getSlope() < 0)) {
            return Double.NaN;
        }
        return -1.0 / reg.getSlope();
    }
}
