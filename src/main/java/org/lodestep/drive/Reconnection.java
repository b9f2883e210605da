package org.lodestep.drive;

/**
 * A phase of two equal coils moved from bipolar series to bipolar parallel: R/4, L/4, K_t/2, and twice the current
 * for the same copper loss and ampere-turns.
 *
 * <p>Source: the coupled-coil relation L = L1 + L2 ± 2M of circuit theory (series ≈ 4·L_coil, parallel ≈ L_coil at
 * full coupling) and series and parallel resistance; the equal-loss current factor is a trade convention (common
 * practice, no published source). Real bifilar coupling is a little below 1, so the parallel inductance is a little
 * above a quarter.
 */
public final class Reconnection {
    private Reconnection() {
    }

    /** The motor in parallel, given its values in series. */
    public static PhaseModel seriesToParallel(PhaseModel series) {
        return new PhaseModel(series.phaseResistanceOhm() / 4, series.phaseInductanceH() / 4,
                series.ktNmPerA() / 2, series.rotorTeeth(), series.rotorInertiaKgM2(), series.detentTorqueNm());
    }

    /** Current setting in parallel for the same copper loss as {@code seriesCurrentA} in series, A. */
    public static double parallelCurrentA(double seriesCurrentA) {
        return 2 * seriesCurrentA;
    }
}
