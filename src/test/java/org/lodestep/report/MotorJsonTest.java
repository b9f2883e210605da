package org.lodestep.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import com.fasterxml.jackson.databind.JsonNode;
import org.junit.jupiter.api.Test;
import org.lodestep.motor.CoilResistance;
import org.lodestep.motor.IdentifyRequest;
import org.lodestep.motor.OrientedLeads;
import org.lodestep.motor.MotorCard;
import org.lodestep.motor.MotorIdentifier;
import org.lodestep.wiring.Topology;
import org.lodestep.motor.WindingInput;

class MotorJsonTest {

    private static MotorCard sixLeadCard() {
        // REFERENCE-CHECKS item 4: 6-lead, end-tap = r = 1.20 ohm per half
        WindingInput w = new WindingInput(Topology.SIX_LEAD, List.of("1", "2", "3", "4", "5", "6"), List.of(
                new CoilResistance(new OrientedLeads("1", "2"), 1.2), new CoilResistance(new OrientedLeads("2", "3"), 1.2),
                new CoilResistance(new OrientedLeads("4", "5"), 1.2), new CoilResistance(new OrientedLeads("5", "6"), 1.2)),
                List.of());
        return MotorIdentifier.identify(new IdentifyRequest(w, List.of(), null, null, null, null, null));
    }

    @Test
    void writesDocumentedKeys() throws Exception {
        JsonNode n = Json.mapper().readTree(MotorJson.write(sixLeadCard()));
        assertEquals("6-lead", n.get("topology").asText());
        assertEquals("series", n.get("connection").asText());
        assertTrue(n.has("ke_v_s_per_rad"), n.toString());
        assertTrue(n.get("ke_v_s_per_rad").isNull());
        assertTrue(n.has("rotor_teeth"));
        assertTrue(n.has("step_angle_deg"));
        JsonNode hw = n.get("phases").get(0).get("half_windings").get(0);
        assertEquals("1", hw.get("start_lead").asText());
        assertTrue(hw.has("inductance_h"));
        assertTrue(hw.has("ke_v_s_per_rad"));
        // item 5: 6-lead series = 2r = 2.40 ohm
        assertEquals(2.40, n.get("phases").get(0).get("resistance_ohm").asDouble(), 1e-12);
        assertEquals("A+", n.get("wiring").get("terminals").get(0).get("terminal").asText());
        assertTrue(n.get("unknowns").size() > 0);
    }

    @Test
    void textCardShowsWiringAndUnknowns() {
        String text = MotorCardText.render(sixLeadCard());
        assertTrue(text.contains("A+     <- lead 1"), text);
        assertTrue(text.contains("leave  2 unconnected"), text);
        assertTrue(text.contains("Unknown"), text);
    }
}
