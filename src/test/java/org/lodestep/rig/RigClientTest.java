package org.lodestep.rig;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;

class RigClientTest {

    @Test
    void handshakeReportsLeadsAndScenario() throws Exception {
        try (RigClient c = RigClient.open("sim:salvage-8")) {
            RigInfo i = c.info();
            assertEquals(1, i.protocolVersion());
            assertEquals(8, i.leads());
            assertEquals(8, i.labels().size());
            assertEquals("salvage-8", i.capability("scenario", ""));
            assertTrue(i.measures().contains("sweep"));
        }
    }

    @Test
    void eightLeadMotorShowsFourHalfWindingsAndOpensElsewhere() throws Exception {
        try (RigClient c = RigClient.open("sim:salvage-8")) {
            int finite = 0;
            for (int a = 1; a <= 8; a++) {
                for (int b = a + 1; b <= 8; b++) {
                    ResistanceReading r = c.resistance(a, b);
                    if (!r.open()) {
                        finite++;
                        // scenario value 1.25 ohm per half-winding; meter noise 0.05 % and contact error 3 mOhm
                        assertEquals(1.25, r.resistanceOhm(), 0.01);
                    }
                }
            }
            // an 8-lead motor has 4 isolated half-windings: 4 of the 28 pairs conduct (common practice, from the
            // circuit topology, references §4,
            // common practice)
            assertEquals(4, finite);
        }
    }

    @Test
    void badLeadIsRefusedWithItsCode() throws Exception {
        try (RigClient c = RigClient.open("sim:bench-4")) {
            RigRefusedException e = assertThrows(RigRefusedException.class, () -> c.resistance(1, 9));
            assertEquals(RigError.BAD_ARGUMENT, e.error());
            assertTrue(e.getMessage().contains("lead '9'"), e.getMessage());
        }
    }

    @Test
    void sweepStreamArrivesWholeWithThreeChannels() throws Exception {
        try (RigClient c = RigClient.open("sim:gantry-axis")) {
            RigCapture cap = c.sweep(new SweepPlan(20, 200, 2, 8, 5000), RigClient.Progress.NONE);
            assertEquals(10000, cap.signal().length());
            assertEquals(List.of("accel", "current", "step"), cap.signal().channelNames());
            double fraction = (double) cap.sampleBytes() / cap.wireBytes();
            assertTrue(fraction > 0.9, "payload fraction " + fraction);
            assertFalse(cap.metadata().get("rig_id").isEmpty());
        }
    }
}
