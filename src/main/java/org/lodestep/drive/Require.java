package org.lodestep.drive;

/** Argument checks for this package; messages name the value and its unit. */
final class Require {
    private Require() {
    }

    static double positive(double v, String what, String unit) {
        if (!(v > 0) || !Double.isFinite(v)) {
            throw new IllegalArgumentException(what + " must be positive and finite, got " + v + " " + unit);
        }
        return v;
    }

    static double nonNegative(double v, String what, String unit) {
        if (!(v >= 0) || !Double.isFinite(v)) {
            throw new IllegalArgumentException(what + " must be zero or more, got " + v + " " + unit);
        }
        return v;
    }

    static double finite(double v, String what, String unit) {
        if (!Double.isFinite(v)) {
            throw new IllegalArgumentException(what + " must be finite, got " + v + " " + unit);
        }
        return v;
    }
}
