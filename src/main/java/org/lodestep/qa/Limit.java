package org.lodestep.qa;

import java.util.Objects;

/**
 * One acceptance window of a part spec: a nominal value with lower and upper limits, in the unit named.
 *
 * <p>Either limit may be absent (a minimum only, for insulation; a maximum only, for phase balance); an absent limit
 * is {@code NaN} here and {@code null} in JSON.
 *
 * @param parameter stable parameter key ({@code phase_resistance}, {@code insulation_resistance}, ...)
 * @param unit      unit of nominal and limits ({@code ohm}, {@code H}, {@code Mohm}, {@code %}, ...)
 * @param nominal   nominal value, or NaN when the spec gives none
 * @param lower     lower specification limit (LSL), or NaN for none
 * @param upper     upper specification limit (USL), or NaN for none
 */
public record Limit(String parameter, String unit, double nominal, double lower, double upper) {
    public Limit {
        Objects.requireNonNull(parameter, "parameter");
        Objects.requireNonNull(unit, "unit");
        if (Double.isInfinite(nominal) || Double.isInfinite(lower) || Double.isInfinite(upper)) {
            throw new IllegalArgumentException(parameter + ": limits must be finite or absent, got nominal " + nominal
                    + ", lower " + lower + ", upper " + upper + " " + unit);
        }
        if (Double.isNaN(lower) && Double.isNaN(upper)) {
            throw new IllegalArgumentException(parameter + ": needs a lower or an upper limit");
        }
        if (!Double.isNaN(lower) && !Double.isNaN(upper) && !(lower < upper)) {
            throw new IllegalArgumentException(parameter + ": lower limit " + lower + " " + unit
                    + " must be below upper limit " + upper + " " + unit);
        }
    }

    /** A nominal value with a symmetric tolerance in percent of nominal. */
    static Limit percent(String parameter, String unit, double nominal, double tolerancePct) {
        double d = Math.abs(nominal) * tolerancePct / 100.0;
        return new Limit(parameter, unit, nominal, nominal - d, nominal + d);
    }

    public boolean hasLower() {
        return !Double.isNaN(lower);
    }

    public boolean hasUpper() {
        return !Double.isNaN(upper);
    }

    /**
     * The limit {@code value} is measured against: the one it crossed, else the nearer of the two; NaN for NaN.
     */
    public double nearest(double value) {
        if (Double.isNaN(value)) {
            return Double.NaN;
        }
        if (!hasLower() || !hasUpper()) {
            return hasLower() ? lower : upper;
        }
        return value - lower <= upper - value ? lower : upper;
    }

    /**
     * How far {@code value} lies inside the limits (positive) or beyond the one it crossed (negative), in this
     * limit's unit: the signed distance to {@link #nearest}. NaN for NaN; +Infinity for a reading above range (an
     * insulation reading beyond the tester's) against a lower limit only.
     */
    public double margin(double value) {
        if (Double.isNaN(value)) {
            return Double.NaN;
        }
        double aboveLower = hasLower() ? value - lower : Double.POSITIVE_INFINITY;
        double belowUpper = hasUpper() ? upper - value : Double.POSITIVE_INFINITY;
        return Math.min(aboveLower, belowUpper);
    }

    /** {@link #margin} as a fraction of the limit it is measured against (NaN against a limit of zero). */
    public double marginFraction(double value) {
        double n = Math.abs(nearest(value));
        return n > 0 ? margin(value) / n : Double.NaN;
    }

    /** True when {@code value} lies inside the limits (limits themselves included). */
    public boolean contains(double value) {
        return (!hasLower() || value >= lower) && (!hasUpper() || value <= upper);
    }
}
