package org.lodestep.qa;

import java.util.Objects;

/**
 * The judgement of one measured value against one limit of the spec.
 *
 * @param parameter stable parameter key ({@link Parameters})
 * @param label     which instance: phase {@code A}, {@code B}, insulation {@code A-frame}; empty for a motor-wide value
 * @param measured  the value as measured, in {@code limit.unit()}, or NaN when not measured
 * @param judged    the value compared with the limits (after temperature correction where the spec asks for it),
 *                  NaN when not measured, +Infinity for an insulation reading above the tester's range
 * @param limit     the spec limit used
 * @param verdict   pass, fail or incomplete
 * @param note      why, in words an inspector understands (the correction applied, what is missing)
 */
public record CheckResult(String parameter, String label, double measured, double judged, Limit limit, Verdict verdict,
                          String note) {
    public CheckResult {
        Objects.requireNonNull(parameter, "parameter");
        Objects.requireNonNull(label, "label");
        Objects.requireNonNull(limit, "limit");
        Objects.requireNonNull(verdict, "verdict");
        Objects.requireNonNull(note, "note");
        if (verdict == Verdict.PASS && Double.isNaN(judged)) {
            throw new IllegalArgumentException(parameter + " " + label + ": a " + verdict
                    + " verdict needs a judged value, got " + judged + " " + limit.unit());
        }
    }

    /**
     * The limit that decides the margin: the one the judged value is outside, else the nearer one; "LSL" or "USL",
     * "" when the value was not judged.
     */
    public String decidingLimit() {
        if (Double.isNaN(judged)) {
            return "";
        }
        if (!limit.hasLower()) {
            return "USL";
        }
        if (!limit.hasUpper()) {
            return "LSL";
        }
        return limit.upper() - judged < judged - limit.lower() ? "USL" : "LSL";
    }

    /** The value of {@link #decidingLimit}, in {@code limit.unit()}, or NaN. */
    public double decidingLimitValue() {
        return switch (decidingLimit()) {
            case "USL" -> limit.upper();
            case "LSL" -> limit.lower();
            default -> Double.NaN;
        };
    }

    /**
     * Signed distance of the judged value inside its deciding limit (USL − value, or value − LSL), in
     * {@code limit.unit()}: negative outside the spec, NaN when not judged.
     */
    public double margin() {
        return switch (decidingLimit()) {
            case "USL" -> limit.upper() - judged;
            case "LSL" -> judged - limit.lower();
            default -> Double.NaN;
        };
    }
}
