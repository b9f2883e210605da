package org.lodestep.motor;

/**
 * The coupling of the two coils of one phase (centre-tapped or 8-lead motors), measured from one coil's inductance
 * and the inductance of both in series aiding. The series and parallel factors themselves live in
 * {@link org.lodestep.wiring.Connection}.
 *
 * <p>Coupled-coil relation {@code L = L1 + L2 + 2M} with {@code M = kappa·Lc} (C. K. Alexander, M. N. O. Sadiku,
 * <i>Fundamentals of Electric Circuits</i>, chapter on magnetically coupled circuits), solved for kappa.
 */
final class CoupledCoils {
    private CoupledCoils() {
    }

    /** Coupling factor {@code kappa = Lfull/(2·Lc) - 1} from one coil and the two coils in series aiding. */
    static double couplingFactor(double coilInductanceH, double seriesInductanceH) {
        return seriesInductanceH / (2.0 * coilInductanceH) - 1.0;
    }
}
