package org.lodestep.workflow;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.OptionalDouble;

import org.junit.jupiter.api.Test;
import org.lodestep.rig.RigClient;
import org.lodestep.rig.RigInfo;
import org.lodestep.wiring.LeadPair;
import org.lodestep.wiring.Topology;
import org.lodestep.wiring.Winding;

class LeadsOnRigTest {

    @Test
    void salvagedEightLeadMotorIsSettledWithFewerThanAllPairs() throws Exception {
        List<LeadPair> heard = new ArrayList<>();
        int[] announced = new int[1];
        LeadsOnRig.Result r;
        try (RigClient rig = RigClient.open("sim:salvage-8")) {
            r = LeadsOnRig.run(rig, LeadsSettings.DEFAULT, new LeadsOnRig.Listener() {
                @Override
                public void connected(RigInfo info, List<String> leads, int allPairs) {
                    announced[0] = allPairs;
                }

                @Override
                public void measured(LeadPair pair, OptionalDouble ohms) {
                    heard.add(pair);
                }
            });
        }
        assertEquals(Topology.EIGHT_LEAD, r.identification().topology());
        assertTrue(r.identification().determined());
        // 8 leads make N(N-1)/2 = 28 pairs; the probe order settles the layout with fewer
        assertEquals(28, announced[0]);
        assertEquals(28, r.allPairs());
        assertTrue(r.readings() < 28, "readings " + r.readings());
        assertEquals(r.readings(), heard.size());
        for (Winding w : r.identification().windings()) {
            // scenario salvage-8: 1.25 ohm half-windings (scenarios.toml); meter noise 0.05 %, contact 3 mOhm
            assertEquals(1.25, w.resistanceOhm(), 0.01);
        }
    }

    @Test
    void rigLabelsAreUsedWhenDistinctElsePositions() {
        assertEquals(List.of("red", "blue"), LeadsOnRig.labels(List.of("red", "blue"), 2));
        assertEquals(List.of("1", "2", "3"), LeadsOnRig.labels(List.of("a", "a", "b"), 3));
        assertEquals(List.of("1", "2"), LeadsOnRig.labels(List.of(), 2));
    }
}
