package org.lodestep.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Step responses and rig captures analyse as they come; metadata below the header is refused, not ignored. */
class CapturesAsTheyComeTest {
    @TempDir
    Path dir;

    /** An RL step, i = V/R·(1 − e^(−t/τ)) (Alexander & Sadiku, first-order circuits), V = 2 V, R = 2 Ω, τ = 2 ms. */
    private Path rlStep(String name, String header, String metaAbove, String metaBelow) throws Exception {
        StringBuilder b = new StringBuilder(metaAbove).append(header).append('\n');
        for (int k = 0; k < 2000; k++) {
            double t = k * 1e-5;
            double i = t < 1e-3 ? 0 : 1.0 * (1 - Math.exp(-(t - 1e-3) / 2e-3));
            b.append(String.format(Locale.ROOT, "%.6f,%.6f%n", t, i));
            if (k == 10) {
                b.append(metaBelow);
            }
        }
        Path f = dir.resolve(name);
        Files.writeString(f, b.toString());
        return f;
    }

    @Test
    void stepResponseWithoutLeadsLineIsOneCoil() throws Exception {
        Path f = rlStep("one-coil.csv", "time_s,current_a", "# supply_v=2\n", "");
        CliRun r = CliRun.of("motor", "identify", "--json", "--step-response", f.toString());
        assertEquals(0, r.code(), r.err() + r.out());
        JsonNode fit = new ObjectMapper().readTree(r.out()).get("step_responses").get(0);
        // L = τ·R = 2 ms × 2 Ω = 4 mH
        assertEquals(4e-3, fit.get("fit").get("inductance_h").asDouble(), 4e-3 * 0.02, fit.toString());
    }

    @Test
    void metadataBelowTheHeaderIsRefusedWithItsLine() throws Exception {
        Path f = rlStep("late.csv", "time_s,current_a", "# leads=1,2\n", "# supply_v=2\n");
        CliRun r = CliRun.of("motor", "identify", "--step-response", f.toString());
        assertEquals(2, r.code(), r.err());
        assertTrue(r.err().contains("late.csv") && r.err().contains("line 14") && r.err().contains("above the header"),
                r.err());
    }

    @Test
    void rigStepResponseGoesStraightIntoMotorIdentify() throws Exception {
        Path f = dir.resolve("step.csv");
        CliRun m = CliRun.of("rig", "measure", "sim:bench-4", "step-response", "--pair", "1-2", "--volts", "2",
                "--out", f.toString());
        assertEquals(0, m.code(), m.err());
        String text = Files.readString(f);
        assertTrue(text.contains("# leads=") && text.contains("# supply_v=2") && text.contains("# series_ohm="), text
                .lines().limit(20).toList().toString());
        CliRun r = CliRun.of("motor", "identify", "--json", "--step-response", f.toString());
        assertEquals(0, r.code(), r.err() + r.out());
        JsonNode fit = new ObjectMapper().readTree(r.out()).get("step_responses").get(0).get("fit");
        assertTrue(fit.get("inductance_h").asDouble() > 0, fit.toString());
    }

    @Test
    void rigBackEmfStatesItsRevolutionsAndGoesStraightIntoMotorIdentify() throws Exception {
        Path f = dir.resolve("emf.csv");
        CliRun m = CliRun.of("rig", "measure", "sim:bench-4", "back-emf", "--pair", "1-2", "--pair", "3-4",
                "--seconds", "2", "--out", f.toString());
        assertEquals(0, m.code(), m.err());
        // The virtual hand (rig.BenchMotor.handSpeed) turns at 120 rpm with raised-cosine ramps over the first and
        // last 20 % of the record, each averaging half the speed: 2 rev/s × 2 s × (0.6 + 2 × 0.2 × 0.5) = 3.2 rev.
        String revs = Files.readString(f).lines().filter(l -> l.startsWith("# revolutions=")).findFirst()
                .orElseThrow(() -> new AssertionError("no '# revolutions=' line"));
        assertEquals(3.2, Double.parseDouble(revs.substring("# revolutions=".length())), 1e-3);
        CliRun r = CliRun.of("motor", "identify", "--json", "--back-emf", f.toString());
        assertEquals(0, r.code(), r.err() + r.out());
        JsonNode card = new ObjectMapper().readTree(r.out());
        // bench-4 is a 50-tooth rotor (scenarios.toml): 1.8° full steps, references §1
        assertEquals(50, card.get("rotor_teeth").asInt(), card.toString());
        assertEquals(1.8, card.get("step_angle_deg").asDouble(), 1e-9);
        assertEquals("stated", card.get("back_emf").get("revolution_source").asText().toLowerCase(Locale.ROOT));
    }
}
