package org.lodestep.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import com.fasterxml.jackson.databind.JsonNode;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.lodestep.report.Json;

class MotorIdentifyCommandTest {
    private static final Path DIR = Path.of("sample-captures/motor");

    record Run(int code, String out, String err) {
    }

    private static Run run(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int code = Main.run(new PrintWriter(out), new PrintWriter(err), args);
        return new Run(code, out.toString(), err.toString());
    }

    private static List<String> allSampleArgs() {
        List<String> a = new ArrayList<>(List.of("motor", "identify", "--resistance",
                DIR.resolve("resistance.csv").toString()));
        for (String f : List.of("step-1-7.csv", "step-2-5.csv", "step-3-8.csv", "step-4-6.csv",
                "step-7-6-joined-1-4.csv")) {
            a.add("--step-response");
            a.add(DIR.resolve(f).toString());
        }
        a.add("--back-emf");
        a.add(DIR.resolve("back-emf.csv").toString());
        return a;
    }

    private static JsonNode terminal(JsonNode card, String name) {
        for (JsonNode t : card.get("wiring").get("terminals")) {
            if (t.get("terminal").asText().equals(name)) {
                return t.get("leads");
            }
        }
        throw new AssertionError("no terminal " + name);
    }

    @Test
    void wiresSampleEightLeadMotorInSeries() throws Exception {
        List<String> a = allSampleArgs();
        a.add("--json");
        Run r = run(a.toArray(String[]::new));
        assertEquals(ExitCode.OK, r.code(), r.err() + r.out());
        JsonNode card = Json.mapper().readTree(r.out());
        assertEquals("8-lead", card.get("topology").asText());
        // The generator's truth: phase A = coils 7->1 and 4->6, phase B = 2->5 and 8->3 (or every coil reversed,
        // which is the same motor turned half an electrical cycle). Series: the coils of a phase meet at a joint.
        String aPlus = terminal(card, "A+").get(0).asText();
        String aMinus = terminal(card, "A-").get(0).asText();
        assertTrue(List.of("7-6", "1-4").contains(aPlus + "-" + aMinus), aPlus + "-" + aMinus);
        String bPlus = terminal(card, "B+").get(0).asText();
        String bMinus = terminal(card, "B-").get(0).asText();
        // B lags A: with A+ = 7 the truth gives B+ = 2 (B- = 3); with A reversed, B reversed too
        assertEquals(aPlus.equals("7") ? "2-3" : "5-8", bPlus + "-" + bMinus);
        // REFERENCE-CHECKS item 1: 50 teeth -> 1.8°
        assertEquals(50, card.get("rotor_teeth").asInt());
        assertEquals(1.8, card.get("step_angle_deg").asDouble(), 1e-12);
        // generator: Ke 0.090 V·s/rad per coil (issue 5 key ke_v_s_per_rad), 2 % for the hand-turn envelope
        assertEquals(0.090, card.get("ke_v_s_per_rad").asDouble(), 0.090 * 0.02);
        // generator: 2.10 mH coils (item 10 fit, rel 2 % with noise and a 12-bit converter at 20 us sampling)
        JsonNode hw = card.get("phases").get(0).get("half_windings").get(0);
        assertEquals(2.10e-3, hw.get("inductance_h").asDouble(), 2.10e-3 * 0.02);
        // generator: coupling 0.96 from the series response (item 5: L = 2Lc(1+kappa))
        assertEquals(0.96, card.get("phases").get(0).get("coupling_factor").asDouble(), 0.03);
    }

    @Test
    void textCardNamesEveryTerminalAndSafety() {
        List<String> a = allSampleArgs();
        a.addAll(List.of("--connection", "parallel"));
        Run r = run(a.toArray(String[]::new));
        assertEquals(ExitCode.OK, r.code(), r.err());
        assertTrue(r.out().contains("bipolar parallel"), r.out());
        for (String t : List.of("A+", "A-", "B+", "B-")) {
            assertTrue(r.out().contains("  " + t + " "), t + " missing in\n" + r.out());
        }
        assertTrue(r.out().contains("1.8° full step"), r.out());
        assertTrue(r.out().contains("Safety"), r.out());
    }

    @Test
    void nothingGivenIsUsageError() {
        Run r = run("motor", "identify");
        assertEquals(ExitCode.USAGE, r.code());
        assertTrue(r.err().contains("nothing to identify"), r.err());
    }

    @Test
    void deadBackEmfChannelExitsWithFinding(@TempDir Path tmp) throws Exception {
        // Two live quadrature channels and one coil with no voltage at all (open coil): error finding, exit 3.
        Path f = tmp.resolve("emf.csv");
        StringBuilder b = new StringBuilder("# sample_rate_hz=2000\n# revolutions=1\nemf_1_2_v,emf_3_4_v,emf_5_6_v\n");
        int n = 2000;
        for (int i = 0; i < n; i++) {
            double u = i / (double) (n - 1);
            double theta = 2 * Math.PI * (u - Math.sin(2 * Math.PI * u) / (2 * Math.PI));
            double w = 2 * Math.PI * (1 - Math.cos(2 * Math.PI * u));
            b.append(String.format(Locale.ROOT, "%.5f,%.5f,0%n", -0.05 * w * Math.sin(50 * theta),
                    0.05 * w * Math.cos(50 * theta)));
        }
        Files.writeString(f, b.toString());
        Run r = run("motor", "identify", "--back-emf", f.toString());
        assertEquals(ExitCode.FINDING, r.code(), r.out() + r.err());
        assertTrue(r.out().contains("5-6 shows no back-EMF"), r.out());
    }

    @Test
    void openCoilInResistanceMatrixExitsWithFinding(@TempDir Path tmp) throws Exception {
        // REFERENCE-CHECKS item 4: an 8-lead motor reads 4 coils; here 7-8 reads open, so one coil is broken.
        StringBuilder b = new StringBuilder("lead_a,lead_b,resistance_ohm\n");
        for (int i = 1; i <= 8; i++) {
            for (int j = i + 1; j <= 8; j++) {
                boolean coil = j == i + 1 && i % 2 == 1 && i < 7;
                b.append(i).append(',').append(j).append(',').append(coil ? "1.20" : "OL").append('\n');
            }
        }
        Path f = tmp.resolve("open.csv");
        Files.writeString(f, b.toString());
        Run r = run("motor", "identify", "--resistance", f.toString());
        assertEquals(ExitCode.FINDING, r.code(), r.out() + r.err());
        assertTrue(r.out().contains("ERROR") && r.out().contains("coil 7-8 open"), r.out());
    }

    @Test
    void helpDescribesOptionsWithUnits() {
        Run r = run("motor", "identify", "--help");
        assertEquals(ExitCode.OK, r.code());
        assertTrue(r.out().contains("--inertia-kgm2") && r.out().contains("kg·m²"), r.out());
        assertTrue(r.out().contains("emf_1_2_v"), r.out());
    }
}
