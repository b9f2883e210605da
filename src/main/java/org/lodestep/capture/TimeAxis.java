package org.lodestep.capture;

import org.lodestep.sample.InputFormatException;
import java.util.Arrays;

/**
 * The sample clock implied by a CSV time column, and the check that every time stamp keeps to it.
 *
 * <p>The nominal interval is estimated from the first rows: their median interval screens out gaps, then a
 * least-squares line through the time stamps gives the rate. When an integer rate in Hz fits every one of those
 * stamps within a tenth of an interval, that integer is used, so stamps rounded when they were written still give
 * the rate the instrument ran at. A rate declared in a {@code # sample_rate_hz=} comment is used as given and the
 * stamps are checked against it.
 *
 * <p>Tolerances (documented for users in the README): each interval must lie within ±50 % of the nominal interval (a
 * missing sample makes an interval of 2, a repeated stamp one of 0); and each stamp must lie within half an interval
 * plus 0.1 % of the elapsed time of where the nominal clock puts it, which catches a clock that runs at another rate
 * than the first rows showed. Anything else is an error naming the line; nothing is resampled or filled in.
 */
final class TimeAxis {
    static final double INTERVAL_TOLERANCE = 0.5;
    static final double DRIFT_TOLERANCE = 1e-3;
    static final int ESTIMATE_ROWS = 4096;
    private static final double SNAP_TOLERANCE_INTERVALS = 0.1;

    private final String source;
    private final String column;
    final double startTimeS;
    final double intervalS;
    final double sampleRateHz;
    private double previousS;

    private TimeAxis(String source, String column, double startTimeS, double sampleRateHz) {
        this.source = source;
        this.column = column;
        this.startTimeS = startTimeS;
        this.sampleRateHz = sampleRateHz;
        this.intervalS = 1.0 / sampleRateHz;
        this.previousS = Double.NaN;
    }

    /**
     * Estimates the clock from the first {@code n} time stamps (in seconds) and checks them.
     *
     * @param declaredRateHz a rate from the file's metadata, or NaN
     */
    static TimeAxis fromFirstRows(double[] timesS, int[] lines, int n, double declaredRateHz, String source,
                                  String column) throws InputFormatException {
        double rateHz;
        if (Double.isFinite(declaredRateHz)) {
            rateHz = declaredRateHz;
        } else {
            if (n < 2) {
                throw new InputFormatException(source, lines.length > 0 && n > 0 ? lines[0] : InputFormatException.NO_LINE,
                        column, null, "has fewer than two rows: expected at least two time stamps to know the "
                        + "sample rate, or a '# sample_rate_hz=' comment");
            }
            for (int i = 1; i < n; i++) {
                if (!(timesS[i] > timesS[i - 1])) {
                    throw notIncreasing(source, column, lines[i], timesS[i], timesS[i - 1]);
                }
            }
            double[] intervals = new double[n - 1];
            for (int i = 1; i < n; i++) {
                intervals[i - 1] = timesS[i] - timesS[i - 1];
            }
            Arrays.sort(intervals);
            double medianS = intervals[(n - 1) / 2];
            TimeAxis screen = new TimeAxis(source, column, timesS[0], 1.0 / medianS);
            for (int i = 0; i < n; i++) {
                screen.checkInterval(timesS[i], lines[i]);
            }
            rateHz = 1.0 / leastSquaresSlope(timesS, n);
            double snapped = Math.rint(rateHz);
            if (snapped > 0 && fits(timesS, n, snapped)) {
                rateHz = snapped;
            }
        }
        TimeAxis axis = new TimeAxis(source, column, timesS[0], rateHz);
        for (int i = 0; i < n; i++) {
            axis.check(i, timesS[i], lines[i]);
        }
        return axis;
    }

    private static double leastSquaresSlope(double[] t, int n) {
        double meanI = (n - 1) / 2.0;
        double meanT = 0;
        for (int i = 0; i < n; i++) {
            meanT += t[i];
        }
        meanT /= n;
        double sxy = 0;
        double sxx = 0;
        for (int i = 0; i < n; i++) {
            double di = i - meanI;
            sxy += di * (t[i] - meanT);
            sxx += di * di;
        }
        return sxy / sxx;
    }

    private static boolean fits(double[] t, int n, double rateHz) {
        double dt = 1.0 / rateHz;
        for (int i = 0; i < n; i++) {
            if (Math.abs(t[i] - (t[0] + i * dt)) > SNAP_TOLERANCE_INTERVALS * dt) {
                return false;
            }
        }
        return true;
    }

    /** Checks stamp {@code index} (0-based frame number) read from {@code line}. */
    void check(long index, double timeS, int line) throws InputFormatException {
        checkInterval(timeS, line);
        double elapsedS = index * intervalS;
        double deviationS = timeS - (startTimeS + elapsedS);
        if (Math.abs(deviationS) > 0.5 * intervalS + DRIFT_TOLERANCE * elapsedS) {
            throw new InputFormatException(source, line, column, Double.toString(timeS),
                    String.format(java.util.Locale.ROOT, "is %.6g s from where a steady %.6g Hz clock puts this row "
                            + "(%.6g s): expected the time stamps to keep one sample rate (within 0.1 %%)",
                            deviationS, sampleRateHz, startTimeS + elapsedS));
        }
    }

    private void checkInterval(double timeS, int line) throws InputFormatException {
        double prev = previousS;
        previousS = timeS;
        if (Double.isNaN(prev)) {
            return;
        }
        double stepS = timeS - prev;
        if (!(stepS > 0)) {
            throw notIncreasing(source, column, line, timeS, prev);
        }
        if (stepS > (1 + INTERVAL_TOLERANCE) * intervalS) {
            throw new InputFormatException(source, line, column, Double.toString(timeS),
                    String.format(java.util.Locale.ROOT, "follows %.9g s: a gap of %.6g s (%.1f sample intervals); "
                            + "expected one interval of %.6g s (±50 %%)", prev, stepS, stepS / intervalS, intervalS));
        }
        if (stepS < (1 - INTERVAL_TOLERANCE) * intervalS) {
            throw new InputFormatException(source, line, column, Double.toString(timeS),
                    String.format(java.util.Locale.ROOT, "follows %.9g s after only %.6g s; expected one interval "
                            + "of %.6g s (±50 %%)", prev, stepS, intervalS));
        }
    }

    private static InputFormatException notIncreasing(String source, String column, int line, double t, double prev) {
        return new InputFormatException(source, line, column, Double.toString(t),
                "is not later than the previous row's " + prev + " s: expected increasing time stamps "
                        + "(if the stamps were written with too few decimals, drop the time column and give "
                        + "'# sample_rate_hz=')");
    }
}
