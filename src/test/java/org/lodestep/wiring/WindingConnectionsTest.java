package org.lodestep.wiring;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

import org.lodestep.wiring.WindingConnections.Mode;

/**
 * Checks from REFERENCE-CHECKS item 5 (coupled coils L = L1 + L2 ± 2M, any circuit-theory text; current factors a
 * trade convention from equal I²R loss): r = 1.20 Ω, L_c = 2.00 mH, I_u = 1.00 A, rel 1e-4.
 */
class WindingConnectionsTest {

    @Test
    void seriesDoublesResistanceQuadruplesInductanceAndDividesCurrentByRootTwo() {
        assertEquals(2.40, WindingConnections.phaseResistanceOhm(Mode.BIPOLAR_SERIES, 1.20), 2.4e-4);
        assertEquals(8.00e-3, WindingConnections.phaseInductanceH(Mode.BIPOLAR_SERIES, 2.00e-3, 1.0), 8e-7);
        assertEquals(7.80e-3, WindingConnections.phaseInductanceH(Mode.BIPOLAR_SERIES, 2.00e-3, 0.95), 7.8e-7);
        assertEquals(0.7071, Mode.BIPOLAR_SERIES.currentFactor() * 1.00, 0.7071e-4);
        assertEquals(4.0, Mode.BIPOLAR_SERIES.inductanceFactor());
    }

    @Test
    void parallelHalvesResistanceKeepsInductanceAndMultipliesCurrentByRootTwo() {
        assertEquals(0.600, WindingConnections.phaseResistanceOhm(Mode.BIPOLAR_PARALLEL, 1.20), 0.6e-4);
        assertEquals(2.00e-3, WindingConnections.phaseInductanceH(Mode.BIPOLAR_PARALLEL, 2.00e-3, 1.0), 2e-7);
        assertEquals(1.95e-3, WindingConnections.phaseInductanceH(Mode.BIPOLAR_PARALLEL, 2.00e-3, 0.95), 1.95e-7);
        assertEquals(1.4142, Mode.BIPOLAR_PARALLEL.currentFactor(), 1.4142e-4);
    }

    @Test
    void everyConnectionHasTheSameCopperLossPerPhase() {
        // Item 5: 1.200 W per phase in series, parallel and half-coil (I² R with the rated currents).
        for (Mode m : new Mode[] {Mode.BIPOLAR_SERIES, Mode.BIPOLAR_PARALLEL, Mode.BIPOLAR_HALF, Mode.UNIPOLAR}) {
            double i = m.currentFactor() * 1.00;
            assertEquals(1.200, i * i * WindingConnections.phaseResistanceOhm(m, 1.20), 1.2e-4, m.name());
        }
    }

    @Test
    void timeConstantsMatchItem5() {
        // Item 5: τ = L/R = 3.333 ms series and parallel (κ = 1), 1.667 ms half-coil.
        double series = WindingConnections.phaseInductanceH(Mode.BIPOLAR_SERIES, 2e-3, 1)
                / WindingConnections.phaseResistanceOhm(Mode.BIPOLAR_SERIES, 1.2);
        double half = WindingConnections.phaseInductanceH(Mode.BIPOLAR_HALF, 2e-3, 1)
                / WindingConnections.phaseResistanceOhm(Mode.BIPOLAR_HALF, 1.2);
        assertEquals(3.333e-3, series, 1e-6);
        assertEquals(1.667e-3, half, 1e-6);
    }
}
