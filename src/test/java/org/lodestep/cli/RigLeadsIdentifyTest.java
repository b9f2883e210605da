package org.lodestep.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.HashSet;
import java.util.List;
import java.util.Set;

import org.junit.jupiter.api.Test;

import com.fasterxml.jackson.databind.JsonNode;

/** {@code leads identify --rig}: the engine's order of pairs, measured by the virtual rig, end to end. */
class RigLeadsIdentifyTest {

    /** The pairs that conduct, from a full four-wire scan (rig measure), as label sets. */
    private static Set<Set<String>> conductingPairs(String address) throws Exception {
        RigCommandTest.Result scan = RigCommandTest.run("rig", "measure", address, "resistance", "--json");
        assertEquals(0, scan.code(), scan.err());
        RigCommandTest.Result info = RigCommandTest.run("rig", "info", address, "--json");
        List<String> labels = new java.util.ArrayList<>();
        org.lodestep.report.Json.mapper().readTree(info.out()).get("labels").forEach(n -> labels.add(n.asText()));
        Set<Set<String>> out = new HashSet<>();
        for (JsonNode r : org.lodestep.report.Json.mapper().readTree(scan.out())) {
            // under 100 ohm: a winding; the faulty motor's 47 kOhm leakage is not one
            if (!r.get("resistance_ohm").isNull() && r.get("resistance_ohm").asDouble() < 100) {
                out.add(Set.of(labels.get(r.get("lead_a").asInt() - 1), labels.get(r.get("lead_b").asInt() - 1)));
            }
        }
        return out;
    }

    @Test
    void salvagedEightLeadMotorIsIdentifiedWithFewerThanAllPairs() throws Exception {
        RigCommandTest.Result r = RigCommandTest.run("leads", "identify", "--rig", "sim:salvage-8", "--json");
        assertEquals(0, r.code(), r.err());
        JsonNode j = org.lodestep.report.Json.mapper().readTree(r.out());
        assertEquals("8-lead", j.get("topology").asText());
        assertTrue(j.get("determined").asBoolean());
        Set<Set<String>> windings = new HashSet<>();
        for (JsonNode w : j.get("windings")) {
            windings.add(Set.of(w.get("ends").get(0).asText(), w.get("ends").get(1).asText()));
            // scenario salvage-8: 1.25 ohm half-windings (scenarios.toml); meter noise 0.05 %, contact 3 mOhm
            assertEquals(1.25, w.get("resistance_ohm").asDouble(), 0.01);
        }
        // the identified half-windings are exactly the pairs a full scan finds conducting
        assertEquals(conductingPairs("sim:salvage-8"), windings);
        assertTrue(j.get("probe").get("readings_taken").asInt() < 28, r.out());
    }

    @Test
    void sixLeadMotorIsIdentifiedWithItsTaps() throws Exception {
        RigCommandTest.Result r = RigCommandTest.run("leads", "identify", "--rig", "sim:salvage-6", "--json");
        assertEquals(0, r.code(), r.err());
        JsonNode j = org.lodestep.report.Json.mapper().readTree(r.out());
        assertEquals("6-lead", j.get("topology").asText());
        for (JsonNode w : j.get("windings")) {
            assertTrue(!w.get("tap").isNull());
            // two 3.3 ohm halves end to end (scenarios.toml)
            assertEquals(6.6, w.get("resistance_ohm").asDouble(), 0.02);
        }
    }

    @Test
    void faultyMotorEndsWithExitCodeThree() {
        RigCommandTest.Result r = RigCommandTest.run("leads", "identify", "--rig", "sim:faulty-8");
        assertEquals(ExitCode.FINDING, r.code(), r.err());
        assertTrue(r.out().contains("leakage"), r.out());
    }

    @Test
    void rigAndFilesTogetherAreAUsageError() {
        RigCommandTest.Result r = RigCommandTest.run("leads", "identify", "--rig", "sim:bench-4", "x.csv");
        assertEquals(ExitCode.USAGE, r.code());
    }
}
