package org.lodestep.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;

import org.junit.jupiter.api.Test;
import org.lodestep.wiring.IdentifySettings;
import org.lodestep.wiring.Identification;
import org.lodestep.wiring.LeadIdentifier;
import org.lodestep.wiring.ResistanceMatrix;

/** The README's JSON contract: key names and value shapes. */
class LeadsJsonViewTest {

    @Test
    void contractKeysAndShapes() throws Exception {
        ResistanceMatrix m = ResistanceMatrix.builder().reading("1", "2", 2.4).reading("3", "4", 2.4)
                .reading("1", "3", 50_000).build();
        Identification id = LeadIdentifier.identify(m, IdentifySettings.DEFAULT);
        JsonNode j = new ObjectMapper().readTree(LeadsJsonView.write(List.of(LeadsJsonView.of("x.csv", null, id,
                null))));
        for (String key : List.of("source", "motor", "topology", "determined", "leads", "windings", "findings",
                "connections", "missing_pairs", "temperature", "readings", "measured_pairs", "total_pairs", "probe")) {
            assertTrue(j.has(key), key);
        }
        assertEquals("4-lead", j.get("topology").asText(), "a leakage reading still separates the windings");
        JsonNode f = j.get("findings").get(0);
        assertEquals("phase-leakage", f.get("code").asText());
        assertEquals("error", f.get("severity").asText());
        JsonNode w = j.get("windings").get(0);
        assertTrue(w.get("ends").isArray() && w.has("tap") && w.has("resistance_ohm"));
        assertTrue(j.get("missing_pairs").isArray() && j.get("missing_pairs").isEmpty());
        assertEquals("leakage", j.get("readings").get(1).get("kind").asText());
    }

    @Test
    void openReadingIsNullAndSeveralMotorsMakeAnArray() throws Exception {
        ResistanceMatrix m = ResistanceMatrix.builder().reading("1", "2", 2.4).reading("3", "4", 2.4).open("1", "3")
                .build();
        Identification id = LeadIdentifier.identify(m, IdentifySettings.DEFAULT);
        LeadsJsonView.MotorJson one = LeadsJsonView.of("a.csv", "KL-1", id, null);
        JsonNode arr = new ObjectMapper().readTree(LeadsJsonView.write(List.of(one, one)));
        assertTrue(arr.isArray());
        JsonNode open = arr.get(0).get("readings").get(1);
        assertEquals("open", open.get("kind").asText());
        assertTrue(open.get("resistance_ohm").isNull());
    }
}
