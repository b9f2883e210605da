package org.lodestep.wiring;

/**
 * Resistance, inductance and current-rating factors of the ways two equal half-windings of one phase can be driven,
 * relative to one half-winding (resistance r, inductance L_c, unipolar current rating I_u).
 *
 * <p>Circuit relations: two coils in series R = 2r, in parallel R = r/2; coupled coils L = L1 + L2 ± 2M, so with full
 * coupling (M = L_c, bifilar windings) series gives 4·L_c and parallel L_c (any circuit-theory text). The current
 * factors 1/√2 (series) and √2 (parallel) keep the copper loss per phase equal to the unipolar rating: a trade
 * convention from equal I²R loss, not a standard. Real coupling is below 1, so the inductance factors are upper
 * bounds; measure inductance to be sure.
 */
public final class WindingConnections {

    /** A way to drive one phase made of two half-windings (or one half-winding alone). */
    public enum Mode {
        /** Both halves in series, driven bipolar. */
        BIPOLAR_SERIES(2.0, 4.0, 1.0 / Math.sqrt(2.0)),
        /** Both halves in parallel, driven bipolar. */
        BIPOLAR_PARALLEL(0.5, 1.0, Math.sqrt(2.0)),
        /** One half only, driven bipolar (6-lead: tap and one end). */
        BIPOLAR_HALF(1.0, 1.0, 1.0),
        /** Each half driven alone from a common supply, one direction (unipolar). */
        UNIPOLAR(1.0, 1.0, 1.0),
        /** A 4-lead motor's winding: it is the whole phase; factors are relative to itself. */
        BIPOLAR_WHOLE(1.0, 1.0, 1.0);

        private final double resistanceFactor;
        private final double inductanceFactor;
        private final double currentFactor;

        Mode(double resistanceFactor, double inductanceFactor, double currentFactor) {
            this.resistanceFactor = resistanceFactor;
            this.inductanceFactor = inductanceFactor;
            this.currentFactor = currentFactor;
        }

        /** Phase resistance divided by one half-winding's resistance. */
        public double resistanceFactor() {
            return resistanceFactor;
        }

        /** Phase inductance divided by one half-winding's inductance, at full coupling (an upper bound). */
        public double inductanceFactor() {
            return inductanceFactor;
        }

        /** Phase current rating divided by the unipolar (one half-winding) rating: trade convention. */
        public double currentFactor() {
            return currentFactor;
        }
    }

    private WindingConnections() {
    }

    /** Effective phase resistance in ohms for a half-winding of {@code halfOhm} ohms. */
    public static double phaseResistanceOhm(Mode mode, double halfOhm) {
        if (!(halfOhm >= 0) || Double.isInfinite(halfOhm)) {
            throw new IllegalArgumentException("half-winding resistance must be finite and >= 0 ohm: " + halfOhm);
        }
        return mode.resistanceFactor() * halfOhm;
    }

    /**
     * Phase inductance of two coupled half-windings in series or parallel: series L_c·(2 + 2κ), parallel L_c·(1 + κ)/2.
     *
     * @param halfInductanceH one half-winding's inductance in henries
     * @param coupling        κ = M/L_c, 0 to 1
     */
    public static double phaseInductanceH(Mode mode, double halfInductanceH, double coupling) {
        if (!(coupling >= 0 && coupling <= 1)) {
            throw new IllegalArgumentException("coupling must be within 0..1: " + coupling);
        }
        return switch (mode) {
            case BIPOLAR_SERIES -> halfInductanceH * (2 + 2 * coupling);
            case BIPOLAR_PARALLEL -> halfInductanceH * (1 + coupling) / 2;
            default -> halfInductanceH;
        };
    }
}
