package org.lodestep.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.lodestep.report.Json;

import com.fasterxml.jackson.databind.JsonNode;

/**
 * {@code resonance sweep} on a virtual-rig sweep of the lightly damped gantry axis (ζ = 0.05, f_n = 100 Hz by the
 * scenario's model, Acarnley, Stepping Motors, 4th ed., ch. 4): the rotor slips poles below f_n, so the command says
 * so first, in text, JSON and the report banner, and exits 3.
 */
class ResonanceStallCommandTest {

    @Test
    void lostSynchronismComesFirstAndExitsThree(@TempDir Path tmp) throws Exception {
        Path csv = tmp.resolve("g.csv");
        CliRun cap = CliRun.of("rig", "capture", "sim:gantry-axis", "sweep", "--from", "20", "--to", "400",
                "--seconds", "20", "--out", csv.toString(), "--quiet");
        assertEquals(0, cap.code(), cap.err());
        CliRun text = CliRun.of("resonance", "sweep", csv.toString(), "--report", tmp.resolve("r.html").toString());
        assertEquals(ExitCode.FINDING, text.code(), text.err());
        assertTrue(text.out().startsWith("WARNING: LOST SYNCHRONISM from "), text.out());
        String html = Files.readString(tmp.resolve("r.html"));
        assertTrue(html.contains("Lost synchronism from"), "report banner");
        CliRun json = CliRun.of("resonance", "sweep", csv.toString(), "--json");
        assertEquals(ExitCode.FINDING, json.code());
        JsonNode stall = Json.mapper().readTree(json.out()).get("stall");
        assertTrue(stall.get("lost_synchronism").asBoolean());
        // the rotor equation slips near 0.77·f_n on this axis (the integration of ResonanceVirtualRigTest)
        double first = stall.get("first_slip_full_steps_per_s").asDouble();
        assertTrue(first > 60 && first < 95, stall.toString());
        assertTrue(stall.get("relock_full_steps_per_s").asDouble() > first, stall.toString());
        assertTrue(stall.get("evidence").asText().contains("vibration"), stall.toString());
    }

    @Test
    void aChopperCurrentIsReadWithItsCaveatAndAWrongDriveWordIsAUsageError(@TempDir Path tmp) {
        Path csv = tmp.resolve("c.csv");
        CliRun cap = CliRun.of("rig", "capture", "sim:bench-4", "sweep", "--from", "40", "--to", "300",
                "--seconds", "5", "--drive", "chopper", "--out", csv.toString(), "--quiet");
        assertEquals(0, cap.code(), cap.err());
        CliRun r = CliRun.of("resonance", "sweep", csv.toString(), "--channel", "current_a", "--drive", "chopper");
        assertEquals(0, r.code(), r.err());
        assertTrue(r.out().contains("chopper"), r.out());
        assertTrue(r.out().contains("No bands reported"), r.out());
        assertEquals(2, CliRun.of("resonance", "sweep", csv.toString(), "--drive", "pwm").code());
    }
}
