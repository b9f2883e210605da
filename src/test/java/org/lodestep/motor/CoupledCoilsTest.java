package org.lodestep.motor;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

class CoupledCoilsTest {
    // REFERENCE-CHECKS item 5 (common practice; L = L1 + L2 + 2M from circuit theory): r = 1.20 ohm, Lc = 2.00 mH,
    // Iu = 1.00 A; checks rel 1e-4.
    private static final double TOL = 1e-4;

    @Test
    void seriesAndParallelInductanceFollowCoupling() {
        assertEquals(8.00e-3, CoupledCoils.seriesInductanceH(2.0e-3, 1.0), 8.00e-3 * TOL);
        assertEquals(7.80e-3, CoupledCoils.seriesInductanceH(2.0e-3, 0.95), 7.80e-3 * TOL);
        assertEquals(2.00e-3, CoupledCoils.parallelInductanceH(2.0e-3, 1.0), 2.00e-3 * TOL);
        assertEquals(1.95e-3, CoupledCoils.parallelInductanceH(2.0e-3, 0.95), 1.95e-3 * TOL);
    }

    @Test
    void couplingFactorInvertsSeriesRelation() {
        // item 5: 7.80 mH in series from 2.00 mH coils means kappa = 0.95
        assertEquals(0.95, CoupledCoils.couplingFactor(2.0e-3, 7.80e-3), 1e-12);
    }

    @Test
    void resistanceAndEqualLossCurrents() {
        assertEquals(2.40, CoupledCoils.seriesResistanceOhm(1.20), 2.40 * TOL);
        assertEquals(0.600, CoupledCoils.parallelResistanceOhm(1.20), 0.600 * TOL);
        assertEquals(0.7071, CoupledCoils.equalLossCurrentA(1.0, Connection.SERIES), 0.7071 * TOL);
        assertEquals(1.4142, CoupledCoils.equalLossCurrentA(1.0, Connection.PARALLEL), 1.4142 * TOL);
        assertEquals(1.0, CoupledCoils.equalLossCurrentA(1.0, Connection.HALF), 0.0);
        // item 5: all three connections dissipate 1.200 W per phase
        double series = Math.pow(CoupledCoils.equalLossCurrentA(1.0, Connection.SERIES), 2) * 2.40;
        assertEquals(1.200, series, 1.200 * TOL);
    }
}
