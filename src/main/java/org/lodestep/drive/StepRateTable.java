package org.lodestep.drive;

import java.util.List;
import java.util.Locale;

import org.lodestep.resonance.RateUnits;

/**
 * A motion profile as a step-rate table for a motion controller: our own simple format.
 *
 * <p>CSV (UTF-8, comma, point decimals, one header row after {@code #} comment lines):
 * <pre>
 * # format=lodestep-step-rate-table
 * # version=1
 * # shape=s-curve
 * # microsteps=16
 * # full_steps_per_rev=200
 * # travel_mm_per_rev=40        (only with a travel)
 * time_s,rate_full_steps_per_s,rate_pulses_per_s,position_full_steps
 * 0.000000,0.000,0.000,0.0000
 * </pre>
 * Rows are at a fixed time step (the last row at the end of the move); the rate between rows is meant to be
 * interpolated linearly, the position is the integral of the planned rate (not of the interpolation).
 *
 * @param units the units the pulse figures use
 * @param shape the profile's shape
 * @param rows  the table, by rising time
 */
public record StepRateTable(RateUnits units, ProfileShape shape, List<Row> rows) {
    /** Value of the {@code format} line. */
    public static final String FORMAT = "lodestep-step-rate-table";
    /** Format version. */
    public static final int VERSION = 1;
    /** Header row of the CSV. */
    public static final String HEADER = "time_s,rate_full_steps_per_s,rate_pulses_per_s,position_full_steps";

    public StepRateTable {
        rows = List.copyOf(rows);
    }

    /** One row. */
    public record Row(double timeS, double rateFullStepsPerS, double ratePulsesPerS, double positionFullSteps) {
    }

    /** The shape as written in the file: {@code trapezoidal} or {@code s-curve}. */
    public String shapeWord() {
        return shape == ProfileShape.S_CURVE ? "s-curve" : "trapezoidal";
    }

    /** The table as CSV text. */
    public String csv() {
        StringBuilder b = new StringBuilder(rows.size() * 40 + 200);
        b.append("# format=").append(FORMAT).append('\n');
        b.append("# version=").append(VERSION).append('\n');
        b.append("# shape=").append(shapeWord()).append('\n');
        b.append("# microsteps=").append(units.microsteps()).append('\n');
        b.append("# full_steps_per_rev=").append(units.fullStepsPerRev()).append('\n');
        if (units.hasTravel()) {
            b.append("# travel_mm_per_rev=").append(units.travelMmPerRev()).append('\n');
        }
        b.append(HEADER).append('\n');
        for (Row r : rows) {
            b.append(String.format(Locale.ROOT, "%.6f,%.3f,%.3f,%.4f\n", r.timeS(), r.rateFullStepsPerS(),
                    r.ratePulsesPerS(), r.positionFullSteps()));
        }
        return b.toString();
    }
}
