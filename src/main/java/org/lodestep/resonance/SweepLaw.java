package org.lodestep.resonance;

import org.lodestep.sample.SweepShape;

/**
 * How the commanded full-step rate changed with time during a sweep, when it was programmed rather than recorded.
 *
 * <p>Linear: r(t) = r0 + (r1 - r0)·t/T. Logarithmic (exponential in time): r(t) = r0·(r1/r0)^(t/T). Time t is
 * measured from the start of the capture; outside 0 ... T the rate is undefined (NaN) and those samples are not
 * analysed.
 *
 * @param shape                  linear or logarithmic ({@link SweepShape}, the type a capture records its sweep in)
 * @param startFullStepsPerS     rate at t = 0, full steps/s: zero or more for a linear sweep, positive for a log one
 * @param endFullStepsPerS       rate at t = T, full steps/s, positive and different from the start
 * @param durationS              sweep duration T, s, positive
 */
public record SweepLaw(SweepShape shape, double startFullStepsPerS, double endFullStepsPerS, double durationS) {

    public SweepLaw {
        if (shape == null) {
            throw new IllegalArgumentException("sweep shape is missing (linear or log)");
        }
        if (shape == SweepShape.LOG || startFullStepsPerS != 0) {
            Require.positive(startFullStepsPerS, "sweep start rate", "full steps/s");
        }
        Require.positive(endFullStepsPerS, "sweep end rate", "full steps/s");
        Require.positive(durationS, "sweep duration", "s");
        if (startFullStepsPerS == endFullStepsPerS) {
            throw new IllegalArgumentException("sweep start and end rates are equal (" + startFullStepsPerS
                    + " full steps/s): that is a dwell, not a sweep");
        }
    }

    /** Commanded rate at time t (s from the start of the sweep), full steps/s; NaN outside the sweep. */
    public double rateFullStepsPerSAt(double timeS) {
        if (!(timeS >= 0 && timeS <= durationS)) {
            return Double.NaN;
        }
        double u = timeS / durationS;
        return shape == SweepShape.LINEAR
                ? startFullStepsPerS + (endFullStepsPerS - startFullStepsPerS) * u
                : startFullStepsPerS * Math.pow(endFullStepsPerS / startFullStepsPerS, u);
    }

    /**
     * Full steps commanded from t = 0 to t (the integral of the rate), real-valued; NaN outside the sweep.
     * Linear: r0·t + (r1 − r0)·t²/(2T), worked out as t·(r0 + (r1 − r0)/(2T)·t); log: r0·T/ln(r1/r0)·((r1/r0)^(t/T)
     * − 1), with the exponent worked out as t·(ln(r1/r0)/T). The forms keep divisions out of the per-sample loop.
     */
    public double fullStepsAt(double timeS) {
        if (!(timeS >= 0 && timeS <= durationS)) {
            return Double.NaN;
        }
        if (shape == SweepShape.LINEAR) {
            return timeS * (startFullStepsPerS + halfAcceleration() * timeS);
        }
        double q = Math.log(endFullStepsPerS / startFullStepsPerS);
        return startFullStepsPerS * durationS / q * Math.expm1(timeS * (q / durationS));
    }

    /**
     * {@link #fullStepsAt} at t = (first + i) / f_s for i = 0 ... n-1, into {@code out[0 ... n-1]}: the same values
     * bit for bit, with the sweep's constants worked out once rather than per sample.
     */
    void fullStepsAt(long firstSample, double sampleRateHz, double[] out, int n) {
        // The sample index counts in a double: below 2^53 it holds every integer exactly, so it equals
        // (double) (firstSample + i); converting a long per sample instead was six times slower, its conversion
        // instruction waiting on the previous sample's division.
        double sample = firstSample;
        if (shape == SweepShape.LINEAR) {
            // fullStepsAt(t) with its constants in locals, the operations in the same order
            double start = startFullStepsPerS;
            double k = halfAcceleration();
            double duration = durationS;
            for (int i = 0; i < n; i++, sample += 1) {
                double timeS = sample / sampleRateHz;
                out[i] = timeS >= 0 && timeS <= duration ? timeS * (start + k * timeS) : Double.NaN;
            }
            return;
        }
        double q = Math.log(endFullStepsPerS / startFullStepsPerS);
        double scale = startFullStepsPerS * durationS / q;
        double perS = q / durationS;
        for (int i = 0; i < n; i++, sample += 1) {
            double timeS = sample / sampleRateHz;
            out[i] = timeS >= 0 && timeS <= durationS ? scale * Math.expm1(timeS * perS) : Double.NaN;
        }
    }

    /** (r1 − r0)/(2T) of a linear sweep: full steps = t·(r0 + this·t), one division per block, not per sample. */
    private double halfAcceleration() {
        return (endFullStepsPerS - startFullStepsPerS) / (2 * durationS);
    }

    /** Rate of change of the commanded rate at time t, in full steps/s² (the sweep's acceleration). */
    public double accelerationFullStepsPerS2At(double timeS) {
        double r = rateFullStepsPerSAt(timeS);
        return shape == SweepShape.LINEAR
                ? (endFullStepsPerS - startFullStepsPerS) / durationS
                : r * Math.log(endFullStepsPerS / startFullStepsPerS) / durationS;
    }
}
