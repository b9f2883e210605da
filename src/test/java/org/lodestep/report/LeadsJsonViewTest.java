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

    @Test
    void inferredValuesAreFlaggedAndOhmsCarryTheMetersResolution() throws Exception {
        // 6 leads: both halves of one winding read (the whole their sum, inferred); the other winding read whole
        // and one half (the other half inferred). In binary floating point 1.01 + 1.02 is 2.0300000000000002 and
        // 2.23 − 1.11 is 1.1199999999999999 (IEEE 754 double): they must print as 2.03 and 1.12.
        ResistanceMatrix m = ResistanceMatrix.builder()
                .reading("a1", "at", 1.01).reading("a2", "at", 1.02)
                .reading("b1", "b2", 2.23).reading("b1", "bt", 1.11)
                .open("a1", "b1").build();
        Identification id = LeadIdentifier.identify(m, IdentifySettings.DEFAULT);
        String text = LeadsJsonView.write(List.of(LeadsJsonView.of("x.csv", null, id, null)));
        JsonNode j = new ObjectMapper().readTree(text);
        JsonNode a = j.get("windings").get(0).get("tap").asText().equals("at") ? j.get("windings").get(0)
                : j.get("windings").get(1);
        JsonNode b = a == j.get("windings").get(0) ? j.get("windings").get(1) : j.get("windings").get(0);
        assertEquals(2.03, a.get("resistance_ohm").asDouble(), 0.0);
        assertTrue(text.contains("1.12") && !text.contains("1.1199999999999999"), text);
        assertEquals(false, a.get("resistance_measured").asBoolean());
        assertEquals("[true,true]", a.get("half_resistances_measured").toString());
        assertEquals(true, b.get("resistance_measured").asBoolean());
        assertTrue(b.get("half_resistances_measured").toString().contains("false"), b.toString());
        // every number in the document has at most 3 decimals (1 mΩ), factors of a connection aside
        java.util.regex.Matcher noise = java.util.regex.Pattern.compile("\"(\\w+_ohm)\" : (-?\\d+\\.\\d{4,})")
                .matcher(text);
        assertTrue(!noise.find(), () -> "binary noise in " + noise.group(1) + ": " + noise.group(2));
        java.util.regex.Matcher lists = java.util.regex.Pattern.compile("\\d\\.\\d{6,}").matcher(
                j.get("windings").toString() + j.get("readings").toString());
        assertTrue(!lists.find(), j.get("windings").toString());
        for (JsonNode c : j.get("connections")) {
            double r = c.get("phase_resistance_ohm").asDouble();
            assertEquals(Math.round(r * 1000) / 1000.0, r, 0.0);
        }
        // the readings say which were read
        assertTrue(j.get("readings").get(0).has("measured"));
    }
}
