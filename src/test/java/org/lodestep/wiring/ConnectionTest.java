package org.lodestep.wiring;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;


/**
 * Checks from REFERENCE-CHECKS item 5 (coupled coils L = L1 + L2 ± 2M, any circuit-theory text; current factors a
 * trade convention from equal I²R loss): r = 1.20 Ω, L_c = 2.00 mH, I_u = 1.00 A, rel 1e-4.
 */
class ConnectionTest {

    @Test
    void seriesDoublesResistanceQuadruplesInductanceAndDividesCurrentByRootTwo() {
        assertEquals(2.40, Connection.SERIES.phaseResistanceOhm(1.20), 2.4e-4);
        assertEquals(8.00e-3, Connection.SERIES.phaseInductanceH(2.00e-3, 1.0), 8e-7);
        assertEquals(7.80e-3, Connection.SERIES.phaseInductanceH(2.00e-3, 0.95), 7.8e-7);
        assertEquals(0.7071, Connection.SERIES.currentFactor() * 1.00, 0.7071e-4);
        assertEquals(4.0, Connection.SERIES.inductanceFactor());
    }

    @Test
    void parallelHalvesResistanceKeepsInductanceAndMultipliesCurrentByRootTwo() {
        assertEquals(0.600, Connection.PARALLEL.phaseResistanceOhm(1.20), 0.6e-4);
        assertEquals(2.00e-3, Connection.PARALLEL.phaseInductanceH(2.00e-3, 1.0), 2e-7);
        assertEquals(1.95e-3, Connection.PARALLEL.phaseInductanceH(2.00e-3, 0.95), 1.95e-7);
        assertEquals(1.4142, Connection.PARALLEL.currentFactor(), 1.4142e-4);
    }

    @Test
    void everyConnectionHasTheSameCopperLossPerPhase() {
        // Item 5: 1.200 W per phase in series, parallel and half-coil (I² R with the rated currents).
        for (Connection m : new Connection[] {Connection.SERIES, Connection.PARALLEL, Connection.HALF, Connection.UNIPOLAR}) {
            double i = m.currentFactor() * 1.00;
            assertEquals(1.200, i * i * m.phaseResistanceOhm(1.20), 1.2e-4, m.name());
        }
    }

    @Test
    void timeConstantsMatchItem5() {
        // Item 5: τ = L/R = 3.333 ms series and parallel (κ = 1), 1.667 ms half-coil.
        double series = Connection.SERIES.phaseInductanceH(2e-3, 1)
                / Connection.SERIES.phaseResistanceOhm(1.2);
        double half = Connection.HALF.phaseInductanceH(2e-3, 1)
                / Connection.HALF.phaseResistanceOhm(1.2);
        assertEquals(3.333e-3, series, 1e-6);
        assertEquals(1.667e-3, half, 1e-6);
    }

    // Moved from motor.CoupledCoilsTest with the factors: REFERENCE-CHECKS item 5 (common practice; L = L1 + L2 + 2M
    // from circuit theory): r = 1.20 ohm, Lc = 2.00 mH, Iu = 1.00 A; checks rel 1e-4.
    private static final double TOL = 1e-4;

    @Test
    void seriesAndParallelInductanceFollowCoupling() {
        assertEquals(8.00e-3, Connection.SERIES.phaseInductanceH(2.0e-3, 1.0), 8.00e-3 * TOL);
        assertEquals(7.80e-3, Connection.SERIES.phaseInductanceH(2.0e-3, 0.95), 7.80e-3 * TOL);
        assertEquals(2.00e-3, Connection.PARALLEL.phaseInductanceH(2.0e-3, 1.0), 2.00e-3 * TOL);
        assertEquals(1.95e-3, Connection.PARALLEL.phaseInductanceH(2.0e-3, 0.95), 1.95e-3 * TOL);
    }

    @Test
    void resistanceAndEqualLossCurrents() {
        assertEquals(2.40, Connection.SERIES.phaseResistanceOhm(1.20), 2.40 * TOL);
        assertEquals(0.600, Connection.PARALLEL.phaseResistanceOhm(1.20), 0.600 * TOL);
        assertEquals(0.7071, Connection.SERIES.equalLossCurrentA(1.0), 0.7071 * TOL);
        assertEquals(1.4142, Connection.PARALLEL.equalLossCurrentA(1.0), 1.4142 * TOL);
        assertEquals(1.0, Connection.HALF.equalLossCurrentA(1.0), 0.0);
        // item 5: all three connections dissipate 1.200 W per phase
        double series = Math.pow(Connection.SERIES.equalLossCurrentA(1.0), 2) * 2.40;
        assertEquals(1.200, series, 1.200 * TOL);
    }
}
