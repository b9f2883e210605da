package org.lodestep.wiring;

/**
 * How the coils of each phase are connected to a driver, and the one table of what that does to a phase's
 * resistance, inductance and current rating relative to one half-winding (resistance r, inductance L_c, unipolar
 * current rating I_u).
 *
 * <p>Resistances add in series (2r) and halve in parallel (r/2). Two magnetically coupled coils give
 * L = L1 + L2 + 2M with M = κ·L_c, so series aiding 2·L_c·(1 + κ) and two identical coils in parallel L_c·(1 + κ)/2
 * (C. K. Alexander, M. N. O. Sadiku, <i>Fundamentals of Electric Circuits</i>, chapter on magnetically coupled
 * circuits, series and parallel connection of coupled inductors); at full coupling (κ = 1, bifilar windings) 4·L_c and
 * L_c. Real coupling is a little below 1, so the full-coupling factors are upper bounds. The current factors 1/√2
 * (series) and √2 (parallel) keep the copper loss I²R of a phase equal to one half-winding at its unipolar rating: a
 * trade convention from equal I²R loss, not a standard.
 */
public enum Connection {
    /** Bipolar, both half-windings of a phase in series aiding (8-lead, or 6-lead end to end). */
    SERIES(2.0, 4.0, 1.0 / Math.sqrt(2.0)),
    /** Bipolar, both half-windings of a phase in parallel (8-lead only). */
    PARALLEL(0.5, 1.0, Math.sqrt(2.0)),
    /** Bipolar on one half-winding per phase (6-lead end to centre tap, or one coil of an 8-lead motor). */
    HALF(1.0, 1.0, 1.0),
    /** Unipolar: centre taps (or joined coil ends) to the supply, each half-winding switched alone. */
    UNIPOLAR(1.0, 1.0, 1.0),
    /** A 4-lead motor's winding: it is the whole phase; factors are relative to itself. */
    WHOLE(1.0, 1.0, 1.0);

    private final double resistanceFactor;
    private final double inductanceFactor;
    private final double currentFactor;

    Connection(double resistanceFactor, double inductanceFactor, double currentFactor) {
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

    /** Effective phase resistance, Ω, for half-windings of {@code halfOhm} each. */
    public double phaseResistanceOhm(double halfOhm) {
        if (!(halfOhm >= 0) || Double.isInfinite(halfOhm)) {
            throw new IllegalArgumentException("half-winding resistance must be finite and >= 0 ohm: " + halfOhm);
        }
        return switch (this) {
            case SERIES -> 2.0 * halfOhm;
            case PARALLEL -> halfOhm / 2.0;
            default -> halfOhm;
        };
    }

    /**
     * Phase inductance, H, of half-windings of {@code halfInductanceH} each with coupling κ = M/L_c: series
     * 2·L_c·(1 + κ), parallel L_c·(1 + κ)/2, otherwise L_c.
     *
     * @param coupling κ; physically 0 to 1, a measured value may stray a little beyond (it is used as measured)
     */
    public double phaseInductanceH(double halfInductanceH, double coupling) {
        if (!Double.isFinite(coupling) || !Double.isFinite(halfInductanceH)) {
            throw new IllegalArgumentException("inductance and coupling must be finite: " + halfInductanceH + " H, "
                    + "coupling " + coupling);
        }
        return switch (this) {
            case SERIES -> 2.0 * halfInductanceH * (1.0 + coupling);
            case PARALLEL -> halfInductanceH * (1.0 + coupling) / 2.0;
            default -> halfInductanceH;
        };
    }

    /** Phase current giving the same copper loss as {@code unipolarA} in one half-winding, A. */
    public double equalLossCurrentA(double unipolarA) {
        return unipolarA * currentFactor;
    }

    /** Lower-case name used in output ({@code series}, {@code parallel}, ...). */
    public String label() {
        return name().toLowerCase(java.util.Locale.ROOT);
    }
}
