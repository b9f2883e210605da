package org.lodestep.motor;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

class CoupledCoilsTest {
    // REFERENCE-CHECKS item 5 (common practice; L = L1 + L2 + 2M from circuit theory): r = 1.20 ohm, Lc = 2.00 mH,
    // Iu = 1.00 A; the series and parallel factors are checked in wiring.ConnectionTest.

    @Test
    void couplingFactorInvertsSeriesRelation() {
        // item 5: 7.80 mH in series from 2.00 mH coils means kappa = 0.95
        assertEquals(0.95, CoupledCoils.couplingFactor(2.0e-3, 7.80e-3), 1e-12);
    }
}
