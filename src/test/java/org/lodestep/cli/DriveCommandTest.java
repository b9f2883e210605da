package org.lodestep.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class DriveCommandTest {
    @TempDir
    Path dir;

    static final List<String> MOTOR = List.of("--phase-resistance-ohm", "2.43", "--phase-inductance-h", "8.2e-3",
            "--kt-nm-per-a", "0.18", "--rotor-inertia-kgm2", "5.4e-6", "--current-a", "1.2", "--microsteps", "16",
            "--travel-mm-per-rev", "40", "--load-mass-kg", "2.0", "--friction-torque-nm", "0.11");

    static String[] args(String command, String... more) {
        List<String> a = new ArrayList<>(List.of("drive", command));
        a.addAll(MOTOR);
        a.addAll(List.of(more));
        return a.toArray(String[]::new);
    }

    @Test
    void curveAnswersInEveryUnitAndExitsThreeWhenTheMarginFallsShort() throws Exception {
        CliRun ok = CliRun.of(args("curve", "--supply-v", "48", "--target-mm-per-s", "450", "--json"));
        assertEquals(0, ok.code(), ok.err());
        JsonNode j = new ObjectMapper().readTree(ok.out());
        assertEquals("reachable", j.get("answer").get("verdict").asText());
        // 450 mm/s at 40 mm/rev and 200 full steps/rev: 2250 full steps/s, 675 rpm, 36000 pulses/s at 1/16
        assertEquals(2250, j.get("answer").get("target").get("full_steps_per_s").asDouble(), 1e-9);
        assertEquals(675, j.get("answer").get("target").get("rpm").asDouble(), 1e-9);
        assertEquals(36000, j.get("answer").get("target").get("pulses_per_s").asDouble(), 1e-9);
        assertTrue(j.get("answer").get("margin_rule").asText().contains("common practice"));
        CliRun shortMargin = CliRun.of(args("curve", "--supply-v", "24", "--target-mm-per-s", "450"));
        assertEquals(3, shortMargin.code(), shortMargin.err());
        assertTrue(shortMargin.out().contains("LESS margin") && shortMargin.out().contains("Raise the supply"),
                shortMargin.out());
    }

    @Test
    void targetBeyondTheCurveIsAFinding() {
        CliRun r = CliRun.of(args("curve", "--supply-v", "24", "--target-rpm", "5000"));
        assertEquals(3, r.code());
        assertTrue(r.out().contains("NOT REACHED"), r.out());
        CliRun p = CliRun.of(args("plan", "--supply-v", "24", "--target-rpm", "5000"));
        assertEquals(3, p.code());
        assertTrue(p.err().startsWith("lodestep drive plan: no profile: the target") && p.err().lines().count() == 1,
                p.err());
    }

    @Test
    void negativeInductanceIsAOneLineUsageError() {
        List<String> a = new ArrayList<>(List.of(args("curve", "--supply-v", "24")));
        a.set(a.indexOf("8.2e-3"), "-8.2e-3");
        CliRun r = CliRun.of(a.toArray(String[]::new));
        assertEquals(2, r.code());
        assertEquals(1, r.err().lines().count(), r.err());
        assertTrue(r.err().contains("phase inductance must be positive") && r.err().contains("H"), r.err());
    }

    @Test
    void avoidListThatBlocksTheWholeRangeIsAFindingWithOneLine() throws Exception {
        Path avoid = dir.resolve("avoid.json");
        Files.writeString(avoid, """
                {"format": "lodestep-avoid-list", "version": 1, "microsteps": 16, "rotor_teeth": 50,
                 "ranges": [{"from_full_steps_per_s": 0, "to_full_steps_per_s": 100000,
                             "min_acceleration_full_steps_per_s2": 10}]}
                """);
        CliRun r = CliRun.of(args("plan", "--supply-v", "48", "--target-mm-per-s", "450", "--avoid-list",
                avoid.toString()));
        assertEquals(3, r.code(), r.err());
        assertEquals(1, r.err().lines().count(), r.err());
        assertTrue(r.err().contains("lies inside the avoid band"), r.err());
    }

    @Test
    void badAvoidListNamesFileAndLine() throws Exception {
        Path avoid = dir.resolve("avoid.json");
        Files.writeString(avoid, "{\"format\": \"lodestep-avoid-list\", \"version\": 1,\n \"ranges\": [\n"
                + " {\"from_full_steps_per_s\": \"fast\", \"to_full_steps_per_s\": 100}]}\n");
        CliRun r = CliRun.of(args("plan", "--supply-v", "48", "--target-mm-per-s", "450", "--avoid-list",
                avoid.toString()));
        assertEquals(2, r.code());
        assertTrue(r.err().contains(avoid + " line 3: '\"fast\"' is not a number"), r.err());
    }

    @Test
    void planWritesTheTableTheJsonAndTheReport() throws Exception {
        Path csv = dir.resolve("p.csv");
        Path json = dir.resolve("p.json");
        Path html = dir.resolve("p.html");
        CliRun r = CliRun.of(args("plan", "--supply-v", "48", "--target-mm-per-s", "450", "--shape", "s-curve",
                "--table", csv.toString(), "--table-json", json.toString(), "--report", html.toString(), "--json"));
        assertEquals(0, r.code(), r.err());
        JsonNode j = new ObjectMapper().readTree(r.out());
        assertEquals("s-curve", j.get("profile").get("shape").asText());
        List<String> lines = Files.readAllLines(csv);
        assertEquals("# format=lodestep-step-rate-table", lines.get(0));
        assertTrue(lines.contains("time_s,rate_full_steps_per_s,rate_pulses_per_s,position_full_steps"));
        JsonNode t = new ObjectMapper().readTree(json.toFile());
        assertEquals("lodestep-step-rate-table", t.get("format").asText());
        assertEquals(j.get("profile").get("table_rows").asInt(), t.get("rows").size());
        String page = Files.readString(html);
        assertTrue(page.contains("<svg") && page.contains("Profile"), "report has the charts");
        assertFalse(page.contains("NaN"));
    }

    @Test
    void curveSimulateAddsTheVirtualDynamometerBesideThePrediction() throws Exception {
        CliRun r = CliRun.of(args("curve", "--supply-v", "48", "--simulate", "--json"));
        assertEquals(0, r.code(), r.err());
        JsonNode dyno = new ObjectMapper().readTree(r.out()).get("dynamometer");
        assertEquals(8, dyno.size());
        // at a tenth of the corner the set current is reached: the simulation agrees within 15 %
        JsonNode first = dyno.get(0);
        assertEquals(first.get("predicted_nm").asDouble(), first.get("simulated_nm").asDouble(),
                0.15 * first.get("predicted_nm").asDouble());
    }

    @Test
    void constantVoltageDriveRefusesACurrentSetting() {
        CliRun r = CliRun.of(args("curve", "--supply-v", "24", "--drive", "constant-voltage"));
        assertEquals(2, r.code());
        assertTrue(r.err().contains("constant-voltage drive has no current setting"), r.err());
    }
}
