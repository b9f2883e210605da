package org.lodestep.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.net.URISyntaxException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;

import org.junit.jupiter.api.Test;

/**
 * End-to-end tests of {@code leads identify} on the bundled sample captures (layouts of common practice, from the
 * circuit topology, references §4) and
 * on the broken fixtures of {@code capture/resistance/bad}.
 */
class LeadsIdentifyCommandTest {
    private static final String SAMPLES = "sample-captures/leads/";

    private static JsonNode json(CliRun r) throws Exception {
        return new ObjectMapper().readTree(r.out());
    }

    @Test
    void fourLeadSampleIdentifiesWithBipolarConnection() throws Exception {
        CliRun r = CliRun.of("leads", "identify", "--json", SAMPLES + "kl-01-shaker-4lead.csv");
        assertEquals(0, r.code(), r.err());
        JsonNode j = json(r);
        assertEquals("4-lead", j.get("topology").asText());
        assertEquals("KL-01", j.get("motor").asText());
        assertEquals(2, j.get("windings").size());
        JsonNode w = j.get("windings").get(0);
        assertEquals("red", w.get("ends").get(0).asText());
        assertEquals("blue", w.get("ends").get(1).asText());
        assertTrue(w.get("tap").isNull());
        assertEquals(2.48, w.get("resistance_ohm").asDouble(), 1e-9);
        // 22.5 °C → 20 °C with k = 235 (IEC 60034-1): 2.48 × 255/257.5 (references §3 formula), given to the
        // meter's 1 mΩ: 2.456.
        assertEquals(2.456, w.get("resistance_at_reference_ohm").asDouble(), 1e-12);
        assertEquals(2.48 * 255 / 257.5, w.get("resistance_at_reference_ohm").asDouble(), 5e-4);
        assertEquals(0, j.get("findings").size());
        assertEquals(0, j.get("missing_pairs").size());
        JsonNode c = j.get("connections").get(0);
        assertEquals("red", c.get("terminals").get("A+").get(0).asText());
        assertEquals("black", c.get("terminals").get("B-").get(0).asText());
    }

    @Test
    void everySampleIdentifiesAsItsFileNameSays() throws Exception {
        String[][] expected = {
            {"kl-01-shaker-4lead.csv", "4-lead", "0"},
            {"kl-02-syringe-pump-5lead.csv", "5-lead", "0"},
            {"kl-03-microscope-stage-6lead.tsv", "6-lead", "0"},
            {"kl-04-autosampler-8lead.csv", "8-lead", "0"},
            {"kl-05-centrifuge-6lead-fault.csv", "6-lead", "3"},
            {"kl-06-fan-4lead-partial.csv", "4-lead", "0"},
        };
        for (String[] e : expected) {
            CliRun r = CliRun.of("leads", "identify", "--json", SAMPLES + e[0]);
            assertEquals(Integer.parseInt(e[2]), r.code(), e[0] + ": " + r.err());
            assertEquals(e[1], json(r).get("topology").asText(), e[0]);
        }
    }

    @Test
    void sixLeadSampleFindsTapsAndThreeConnections() throws Exception {
        JsonNode j = json(CliRun.of("leads", "identify", "--json", SAMPLES + "kl-03-microscope-stage-6lead.tsv"));
        assertEquals("yellow", j.get("windings").get(0).get("tap").asText());
        assertEquals("white", j.get("windings").get(1).get("tap").asText());
        List<String> names = new ArrayList<>();
        j.get("connections").forEach(c -> names.add(c.get("name").asText()));
        assertEquals(List.of("bipolar-series", "bipolar-half-winding", "unipolar"), names);
        // Item 5: series inductance ×4 and current ×0.7071 of one half-winding.
        assertEquals(4.0, j.get("connections").get(0).get("inductance_factor").asDouble());
        assertEquals(0.7071, j.get("connections").get(0).get("current_factor").asDouble(), 1e-4);
    }

    @Test
    void eightLeadConnectionsAreMarkedUnverified() throws Exception {
        JsonNode j = json(CliRun.of("leads", "identify", "--json", SAMPLES + "kl-04-autosampler-8lead.csv"));
        assertEquals(4, j.get("windings").size());
        j.get("windings").forEach(w -> assertTrue(w.get("half_winding").asBoolean()));
        j.get("connections").forEach(c -> {
            assertFalse(c.get("verified").asBoolean());
            assertTrue(c.get("note").asText().contains("back-EMF"));
        });
    }

    @Test
    void faultySampleExitsThreeWithOpenWindingInText() {
        CliRun r = CliRun.of("leads", "identify", SAMPLES + "kl-05-centrifuge-6lead-fault.csv");
        assertEquals(ExitCode.FINDING, r.code());
        assertTrue(r.out().contains("ERROR open-winding"), r.out());
        assertTrue(r.out().contains("green"), r.out());
    }

    @Test
    void textReportDrawsTheTapAndGivesTheCaution() {
        CliRun r = CliRun.of("leads", "identify", SAMPLES + "kl-03-microscope-stage-6lead.tsv");
        assertEquals(0, r.code());
        assertTrue(r.out().contains("o yellow (centre tap)"), r.out());
        assertTrue(r.out().contains("A+=black"), r.out());
        assertTrue(r.out().contains("Caution"), r.out());
        assertTrue(r.out().contains("IEC 60034-1"), r.out());
    }

    @Test
    void pairsOnTheCommandLineAreEnough() throws Exception {
        CliRun r = CliRun.of("leads", "identify", "--json", "--pair", "red-blue=2.4", "--pair", "green-black=2.5",
                "--pair", "red-green=OL");
        assertEquals(0, r.code(), r.err());
        assertEquals("4-lead", json(r).get("topology").asText());
        CliRun partial = CliRun.of("leads", "identify", "--json", "--pair", "red-blue=2.4", "--pair",
                "green-black=2.5");
        JsonNode j = json(partial);
        assertEquals("unknown", j.get("topology").asText());
        assertFalse(j.get("determined").asBoolean());
        assertEquals(1, j.get("missing_pairs").size());
    }

    @Test
    void pairOptionReplacesTheFilesValue() throws Exception {
        CliRun r = CliRun.of("leads", "identify", "--json", SAMPLES + "kl-01-shaker-4lead.csv", "--pair",
                "red-blue=3.1");
        assertEquals(3.1, json(r).get("windings").get(0).get("resistance_ohm").asDouble(), 1e-12);
        assertTrue(r.out().contains("phase-imbalance"), "3.1 against 2.52 is 21 %");
    }

    @Test
    void ambientOptionOverridesTheFileAndCopperKCanBeIeee() throws Exception {
        CliRun r = CliRun.of("leads", "identify", "--json", "--ambient-c", "25", "--copper-k", "234.5",
                "--pair", "a-b=1.5", "--pair", "c-d=1.5", "--pair", "a-c=OL");
        // IEC 60034-1, references §3: 1.500 Ω at 25 °C → 1.47110 Ω at 20 °C with k = 234.5; JSON gives it to the
        // meter's 1 mΩ.
        assertEquals(1.471, json(r).get("windings").get(0).get("resistance_at_reference_ohm").asDouble(), 1e-12);
        assertEquals(2, CliRun.of("leads", "identify", "--copper-k", "240", "--pair", "a-b=1").code());
    }

    private static Path bad(String name) throws URISyntaxException {
        return Path.of(LeadsIdentifyCommandTest.class.getResource("/org/lodestep/capture/resistance/bad/" + name)
                .toURI());
    }

    @Test
    void badFilesExitTwoWithOneLineNamingFileAndLine() throws Exception {
        String[][] cases = {
            {"wrong-header.csv", "line 1"},
            {"text-in-number.csv", "line 3"},
            {"pair-twice.csv", "line 4"},
            {"self-pair.csv", "line 3"},
            {"empty.csv", "no data"},
            {"matrix-asymmetric.csv", "line 3"},
        };
        for (String[] c : cases) {
            CliRun r = CliRun.of("leads", "identify", bad(c[0]).toString());
            assertEquals(ExitCode.USAGE, r.code(), c[0]);
            String err = r.err().strip();
            assertFalse(err.contains("\n"), c[0] + ": " + err);
            assertTrue(err.contains(c[0]) && err.contains(c[1]), c[0] + ": " + err);
            assertFalse(err.contains("Exception"), err);
        }
    }

    @Test
    void usageErrorsExitTwo() {
        assertEquals(ExitCode.USAGE, CliRun.of("leads", "identify").code());
        assertEquals(ExitCode.USAGE, CliRun.of("leads", "identify", "--pair", "red=2").code());
        assertEquals(ExitCode.USAGE, CliRun.of("leads", "identify", "no-such-file.csv").code());
    }

    @Test
    void helpDescribesOptionsWithUnits() {
        CliRun r = CliRun.of("leads", "identify", "--help");
        assertEquals(0, r.code());
        assertTrue(r.out().contains("--ambient-c"));
        assertTrue(r.out().contains("percent"));
        assertTrue(r.out().contains("Exit code 3"));
    }
}
