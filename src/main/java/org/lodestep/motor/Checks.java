package org.lodestep.motor;

/** Argument checks for the compact constructors of this package; messages name the value and its unit. */
final class Checks {
    private Checks() {
    }

    static void finite(double v, String what, String unit) {
        if (!Double.isFinite(v)) {
            throw new IllegalArgumentException(what + " must be finite, got " + v + " " + unit);
        }
    }

    static void positive(double v, String what, String unit) {
        if (!(v > 0) || !Double.isFinite(v)) {
            throw new IllegalArgumentException(what + " must be positive and finite, got " + v + " " + unit);
        }
    }

    static void nonNegative(double v, String what, String unit) {
        if (!(v >= 0) || !Double.isFinite(v)) {
            throw new IllegalArgumentException(what + " must be zero or more, got " + v + " " + unit);
        }
    }

    static void positiveOrNull(Double v, String what, String unit) {
        if (v != null) {
            positive(v, what, unit);
        }
    }

    static void finiteOrNull(Double v, String what, String unit) {
        if (v != null) {
            finite(v, what, unit);
        }
    }
}
