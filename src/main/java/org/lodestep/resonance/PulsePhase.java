package org.lodestep.resonance;

/**
 * Commanded full steps at each sample from a recorded step-pulse channel: rising edges through a threshold with
 * hysteresis (as {@link StepPulseRate}), counted and divided by the microstep setting, with the fraction of the
 * present pulse interpolated from the previous interval. NaN before the second edge.
 */
final class PulsePhase {
    private final double low;
    private final double high;
    private final int microsteps;
    private boolean started;
    private boolean isHigh;
    private double previous;
    private long index;
    private long edges;
    private double lastEdge = Double.NaN;
    private double interval = Double.NaN;

    PulsePhase(int microsteps, double thresholdLow, double thresholdHigh) {
        this.microsteps = microsteps;
        this.low = thresholdLow;
        this.high = thresholdHigh;
    }

    /** Writes the commanded full steps for {@code len} samples of {@code pulses} into {@code out}. */
    void feed(double[] pulses, int off, int len, double[] out, int outOff) {
        for (int i = 0; i < len; i++, index++) {
            double v = pulses[off + i];
            if (!started) {
                started = true;
                isHigh = v >= high;
            } else if (!isHigh && v >= high) {
                isHigh = true;
                double edge = index - 1 + (high - previous) / (v - previous);
                if (!Double.isNaN(lastEdge)) {
                    interval = edge - lastEdge;
                }
                lastEdge = edge;
                edges++;
            } else if (isHigh && v < low) {
                isHigh = false;
            }
            previous = v;
            out[outOff + i] = Double.isNaN(interval) ? Double.NaN
                    : (edges + Math.min(0.999, (index - lastEdge) / interval)) / microsteps;
        }
    }
}
