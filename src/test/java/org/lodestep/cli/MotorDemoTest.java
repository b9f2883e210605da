package org.lodestep.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;

import com.fasterxml.jackson.databind.JsonNode;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.lodestep.report.Json;

class MotorDemoTest {

    @Test
    void identifiesSampleMotorAndWritesJsonCard(@TempDir Path out) throws Exception {
        StringWriter text = new StringWriter();
        StringWriter err = new StringWriter();
        int code = new MotorDemo().run(Path.of("sample-captures"), out, new PrintWriter(text), new PrintWriter(err));
        assertEquals(ExitCode.OK, code, err.toString());
        assertTrue(text.toString().contains("MOTOR CARD  8-lead motor, bipolar series"), text.toString());
        JsonNode card = Json.mapper().readTree(Files.readString(out.resolve("motor-card.json")));
        // sample generator: 50 rotor teeth (Acarnley, Stepping Motors, 4th ed., ch. 1-2, references §1: 200 full
        // steps per revolution)
        assertEquals(200, card.get("full_steps_per_revolution").asInt());
        assertTrue(card.get("natural_frequency_hz").isNumber());
    }
}
