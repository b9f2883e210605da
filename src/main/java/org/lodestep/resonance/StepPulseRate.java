package org.lodestep.resonance;

import java.util.ArrayDeque;

/**
 * Instantaneous step rate from a recorded step-pulse channel: rising edges through a threshold (with hysteresis, so
 * ringing on an edge is not counted twice), edge times interpolated between samples, rate = pulses per second
 * between the first and last edge inside an interval, divided by the microstep setting.
 *
 * <p>Memory holds only the edges of the interval being asked about: feed samples in order, then ask about intervals
 * that end at or before the last fed sample, in increasing order.
 */
final class StepPulseRate {
    private final double sampleRateHz;
    private final int microsteps;
    private final double high;
    private final double low;
    private final ArrayDeque<Double> edgesS = new ArrayDeque<>();
    private boolean isHigh;
    private boolean started;
    private long index;
    private double previous;

    /**
     * @param thresholdHigh level a rising edge must cross, in the channel's unit
     * @param thresholdLow  level the signal must fall below before the next rising edge counts
     */
    StepPulseRate(double sampleRateHz, int microsteps, double thresholdLow, double thresholdHigh) {
        if (!(thresholdHigh > thresholdLow)) {
            throw new IllegalArgumentException("pulse thresholds must rise: low " + thresholdLow + ", high "
                    + thresholdHigh);
        }
        this.sampleRateHz = sampleRateHz;
        this.microsteps = microsteps;
        this.high = thresholdHigh;
        this.low = thresholdLow;
    }

    void feed(double[] x, int off, int len) {
        for (int i = off; i < off + len; i++) {
            double v = x[i];
            if (!started) {
                started = true;
                isHigh = v >= high;
            } else if (!isHigh && v >= high) {
                isHigh = true;
                double frac = (high - previous) / (v - previous);
                edgesS.addLast((index - 1 + frac) / sampleRateHz);
            } else if (isHigh && v < low) {
                isHigh = false;
            }
            previous = v;
            index++;
        }
    }

    /**
     * Mean rate between {@code fromS} and {@code toS}, full steps/s; NaN when fewer than two edges fall inside.
     * Edges before {@code fromS} are forgotten.
     */
    double rateFullStepsPerS(double fromS, double toS) {
        while (!edgesS.isEmpty() && edgesS.peekFirst() < fromS) {
            edgesS.removeFirst();
        }
        int count = 0;
        double first = Double.NaN;
        double last = Double.NaN;
        for (double e : edgesS) {
            if (e >= toS) {
                break;
            }
            if (count == 0) {
                first = e;
            }
            last = e;
            count++;
        }
        if (count < 2) {
            return Double.NaN;
        }
        return (count - 1) / (last - first) / microsteps;
    }
}
