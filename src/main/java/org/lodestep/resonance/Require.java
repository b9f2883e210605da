package org.lodestep.resonance;

/** Argument checks shared by the resonance records and analyzers; messages name the quantity and its unit. */
final class Require {
    private Require() {
    }

    static void positive(double v, String what, String unit) {
        if (!(v > 0) || !Double.isFinite(v)) {
            throw new IllegalArgumentException(what + " must be positive and finite, got " + v + " " + unit);
        }
    }
}
