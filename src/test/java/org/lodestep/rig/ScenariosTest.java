package org.lodestep.rig;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayInputStream;
import java.nio.charset.StandardCharsets;
import java.util.Map;

import org.junit.jupiter.api.Test;

class ScenariosTest {

    private static Map<String, Scenario> parse(String toml) throws Exception {
        return Scenarios.parse(new ByteArrayInputStream(toml.getBytes(StandardCharsets.UTF_8)));
    }

    private static final String MINIMAL = """
            [m]
            seed = 1
            serial = "X-1"
            leads = 4
            rotor_teeth = 50
            shuffle_leads = false
            lead_labels = ["a", "b", "c", "d"]
            half_winding_ohm = 1.0
            half_winding_h = 0.001
            coupling = 0.9
            ke_vs_per_rad = 0.2
            rated_current_a = 1.0
            holding_torque_nm = 0.3
            detent_torque_nm = 0.01
            rotor_inertia_kg_m2 = 5e-6
            load_inertia_kg_m2 = 0.0
            damping_nms_per_rad = 1e-4
            insulation_ohm = 1e9
            accel_radius_m = 0.02
            accel_noise_g = 0.01
            hand_turn_rpm = 60
            """;

    @Test
    void everyBundledScenarioBuildsAMotorTheIssueAsksFor() {
        Map<String, Scenario> all = Scenarios.all();
        assertTrue(all.keySet().containsAll(java.util.List.of("salvage-8", "salvage-6", "bench-4", "faulty-8",
                "open-6", "gantry-axis")), all.keySet().toString());
        for (Map.Entry<String, Scenario> e : all.entrySet()) {
            BenchMotor m = new BenchMotor(e.getValue());
            assertEquals(e.getValue().leads(), m.leadCount(), e.getKey());
        }
        assertTrue(all.get("salvage-8").shuffleLeads());
        assertEquals(100, all.get("salvage-6").rotorTeeth());
    }

    @Test
    void sameSeedGivesTheSameShuffleAndAnotherSeedUsuallyAnother() {
        Scenario s = Scenarios.all().get("salvage-8");
        assertEquals(new BenchMotor(s).labels(), new BenchMotor(s).labels());
        assertTrue(!new BenchMotor(s).labels().equals(new BenchMotor(s.withSeed(9)).labels()));
    }

    @Test
    void minimalScenarioParsesWithNoFaults() throws Exception {
        Scenario s = parse(MINIMAL).get("m");
        assertEquals(0, s.faults().size());
        assertEquals(5e-6, s.totalInertiaKgM2(), 0);
    }

    @Test
    void unknownKeyIsRejected() {
        Exception e = assertThrows(Exception.class, () -> parse(MINIMAL + "holding_torque_ncm = 3\n"));
        assertTrue(e.getMessage().contains("holding_torque_ncm"), e.getMessage());
    }

    @Test
    void impossibleValueIsRejectedNamingKeyAndUnit() {
        Exception e = assertThrows(Exception.class,
                () -> parse(MINIMAL.replace("half_winding_ohm = 1.0", "half_winding_ohm = -1.0")));
        assertTrue(e.getMessage().contains("half_winding_ohm must be positive"), e.getMessage());
        assertTrue(e.getMessage().contains("ohm"), e.getMessage());
        Exception t = assertThrows(Exception.class, () -> parse(MINIMAL.replace("rotor_teeth = 50", "rotor_teeth = 48")));
        assertTrue(t.getMessage().contains("rotor_teeth must be 50 or 100"), t.getMessage());
        Exception f = assertThrows(Exception.class, () -> parse(MINIMAL + "faults = [ { kind = \"melted\" } ]\n"));
        assertTrue(f.getMessage().contains("melted"), f.getMessage());
    }
}
