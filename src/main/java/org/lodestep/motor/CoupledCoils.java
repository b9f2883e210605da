package org.lodestep.motor;

/**
 * Two equal coils of one phase (centre-tapped or 8-lead motors) joined in series or in parallel.
 *
 * <p>Coupled-coil relation {@code L = L1 + L2 + 2M} with {@code M = kappa·Lc} (any circuit-theory text, e.g.
 * Alexander and Sadiku, <i>Fundamentals of Electric Circuits</i>, chapter on magnetically coupled circuits), giving
 * series {@code 2Lc(1+kappa)} and, for two identical coupled coils in parallel, {@code Lc(1+kappa)/2}. The current
 * factors 1/sqrt2 (series) and sqrt2 (parallel) against a unipolar coil rating come from equal copper loss; they are a
 * trade convention, not a standard (REFERENCE-CHECKS item 5).
 */
public final class CoupledCoils {
    private CoupledCoils() {
    }

    /** Coupling factor {@code kappa = Lfull/(2·Lc) - 1} from one coil and the two coils in series aiding. */
    public static double couplingFactor(double coilInductanceH, double seriesInductanceH) {
        return seriesInductanceH / (2.0 * coilInductanceH) - 1.0;
    }

    /** Inductance of two coils in series aiding, {@code 2Lc(1+kappa)}, in H. */
    public static double seriesInductanceH(double coilInductanceH, double kappa) {
        return 2.0 * coilInductanceH * (1.0 + kappa);
    }

    /** Inductance of two coils in parallel (same polarity), {@code Lc(1+kappa)/2}, in H. */
    public static double parallelInductanceH(double coilInductanceH, double kappa) {
        return coilInductanceH * (1.0 + kappa) / 2.0;
    }

    /** Resistance of two equal coils in series, in ohm. */
    public static double seriesResistanceOhm(double coilOhm) {
        return 2.0 * coilOhm;
    }

    /** Resistance of two equal coils in parallel, in ohm. */
    public static double parallelResistanceOhm(double coilOhm) {
        return coilOhm / 2.0;
    }

    /** Phase current giving the same copper loss as {@code unipolarA} in one coil: 1/sqrt2 series, sqrt2 parallel. */
    public static double equalLossCurrentA(double unipolarA, Connection connection) {
        return switch (connection) {
            case SERIES -> unipolarA / Math.sqrt(2.0);
            case PARALLEL -> unipolarA * Math.sqrt(2.0);
            case HALF, UNIPOLAR -> unipolarA;
        };
    }
}
