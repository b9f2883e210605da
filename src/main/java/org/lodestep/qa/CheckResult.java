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
}
