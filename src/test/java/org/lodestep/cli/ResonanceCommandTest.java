package org.lodestep.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.lodestep.report.Json;

import com.fasterxml.jackson.databind.JsonNode;

class ResonanceCommandTest {
    static final Path SAMPLES = Path.of("sample-captures", "resonance");
    static final String SWEEP_CSV = SAMPLES.resolve("belt-axis-sweep.csv").toString();
    static final String PHONE_WAV = SAMPLES.resolve("belt-axis-phone.wav").toString();
    static final String RINGDOWN_CSV = SAMPLES.resolve("belt-axis-ringdown.csv").toString();
    /** Natural frequency of the generator's small-angle model, Hz (SampleCaptureGenerator). */
    static final double MODEL_NATURAL_HZ = 120;

    record Run(int code, String out, String err) {
        JsonNode json() throws Exception {
            return Json.mapper().readTree(out);
        }
    }

    static Run run(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int code = Main.run(new PrintWriter(out), new PrintWriter(err), args);
        return new Run(code, out.toString(), err.toString());
    }

    @Test
    void sweepOfTheSampleCsvFindsTheResonanceAtTheNaturalFrequency() throws Exception {
        Run r = run("resonance", "sweep", SWEEP_CSV, "--json", "--microsteps", "16", "--travel-mm-per-rev", "40");
        assertEquals(0, r.code(), r.err());
        JsonNode j = r.json();
        JsonNode strongest = null;
        for (JsonNode b : j.get("bands")) {
            if (strongest == null || b.get("peak_level").asDouble() > strongest.get("peak_level").asDouble()) {
                strongest = b;
            }
        }
        assertTrue(strongest != null, r.out());
        // Low-speed resonance at a full-step rate equal to f_n (Acarnley 2002, section 4.3; references §12):
        // the band must reach within 8 % of the model's 120 Hz.
        assertTrue(strongest.get("start_full_steps_per_s").asDouble() <= MODEL_NATURAL_HZ * 1.08
                && strongest.get("end_full_steps_per_s").asDouble() >= MODEL_NATURAL_HZ * 0.92, strongest.toString());
        assertEquals("low_speed_resonance", strongest.get("class").asText());
        // 16 pulses per full step; 200 steps/rev and 40 mm/rev (Acarnley, Stepping Motors, 4th ed., ch. 1-2,
        // references §1): mm/s = rate / 200 × 40.
        double start = strongest.get("start_full_steps_per_s").asDouble();
        assertEquals(start * 16, strongest.get("start_pulses_per_s").asDouble(), 1e-9);
        assertEquals(start / 200 * 40, strongest.get("start_mm_per_s").asDouble(), 1e-9);
        assertEquals(MODEL_NATURAL_HZ, j.get("natural_frequency_hz").asDouble(), MODEL_NATURAL_HZ * 0.08);
        assertTrue(strongest.has("peak_full_steps_per_s"));
        assertTrue(strongest.has("peak_level"));
        assertEquals("lodestep-avoid-list", j.get("avoid_list").get("format").asText());
    }

    @Test
    void sweepTextShowsBandsAdviceAndSafety() {
        Run r = run("resonance", "sweep", SWEEP_CSV, "--natural-hz", "118");
        assertEquals(0, r.code(), r.err());
        assertTrue(r.out().contains("low-speed resonance f_n "), r.out());
        assertTrue(r.out().contains("Natural frequency: 118.0 Hz (given)"), r.out());
        assertTrue(r.out().contains("accelerate at"), r.out());
        assertTrue(r.out().contains("emergency stop"), r.out());
    }

    @Test
    void pulseChannelGivesTheRateWithoutASweepLaw() throws Exception {
        Run r = run("resonance", "sweep", SWEEP_CSV, "--pulse-channel", "step", "--json");
        assertEquals(0, r.code(), r.err());
        assertEquals("pulses", r.json().get("rate_source").asText());
        assertTrue(r.json().get("bands").size() >= 1, r.out());
    }

    @Test
    void phoneRecordingWithoutMetadataNeedsASweepLaw() {
        Run r = run("resonance", "sweep", PHONE_WAV);
        assertEquals(2, r.code());
        assertTrue(r.err().contains("belt-axis-phone.wav: has no sweep law"), r.err());
        assertEquals(1, r.err().strip().lines().count(), r.err());
    }

    @Test
    void phoneRecordingWithFlagsFindsTheSameResonance() throws Exception {
        Run r = run("resonance", "sweep", PHONE_WAV, "--sweep", "log", "--start", "40", "--end", "600",
                "--duration", "24", "--json");
        assertEquals(0, r.code(), r.err());
        boolean found = false;
        for (JsonNode b : r.json().get("bands")) {
            found |= b.get("start_full_steps_per_s").asDouble() <= MODEL_NATURAL_HZ * 1.08
                    && b.get("end_full_steps_per_s").asDouble() >= MODEL_NATURAL_HZ * 0.92;
        }
        assertTrue(found, r.out());
    }

    @Test
    void avoidListIsWrittenAsJson(@TempDir Path tmp) throws Exception {
        Path file = tmp.resolve("avoid.json");
        Run r = run("resonance", "sweep", SWEEP_CSV, "--avoid-list", file.toString(), "--microsteps", "8");
        assertEquals(0, r.code(), r.err());
        JsonNode a = Json.mapper().readTree(Files.readString(file));
        assertEquals("lodestep-avoid-list", a.get("format").asText());
        assertEquals(8, a.get("microsteps").asInt());
        JsonNode first = a.get("ranges").get(0);
        assertEquals(first.get("from_full_steps_per_s").asDouble() * 8, first.get("from_pulses_per_s").asDouble(),
                1e-9);
        try (var files = Files.list(tmp)) {
            assertEquals(1, files.count(), "no temporary file left behind");
        }
    }

    @Test
    void ringDownAgreesWithTheModelAndTheSweep() throws Exception {
        Run r = run("resonance", "ringdown", RINGDOWN_CSV, "--json");
        assertEquals(0, r.code(), r.err());
        JsonNode j = r.json();
        // The model's small-angle f_n is 120 Hz (Acarnley 2002, ch. 4; references §11); a full step is a
        // large swing that softens the sinusoidal torque curve, so agreement within 8 %. ζ of the model is 0.08.
        assertEquals(MODEL_NATURAL_HZ, j.get("natural_frequency_hz").asDouble(), MODEL_NATURAL_HZ * 0.08);
        assertEquals(0.08, j.get("damping_ratio").asDouble(), 0.02);
        assertTrue(j.get("damped_frequency_hz").asDouble() < j.get("natural_frequency_hz").asDouble());
        assertTrue(j.get("r_squared").asDouble() > 0.95, j.toString());
        Run sweep = run("resonance", "sweep", SWEEP_CSV, "--json");
        assertEquals(j.get("natural_frequency_hz").asDouble(), sweep.json().get("natural_frequency_hz").asDouble(),
                0.05 * MODEL_NATURAL_HZ);
    }

    @Test
    void predictMatchesTheReferenceCheckValues() throws Exception {
        // references §11 (Acarnley 2002, ch. 4; from memory): 0.4 N·m, 5.4e-6 kg·m², N_r 50 → 306.294 Hz;
        // item 12: sub-multiples 153.15 and 102.10 full steps/s, 91.89 rpm at f_n.
        Run r = run("resonance", "predict", "--holding-torque-nm", "0.4", "--inertia-kgm2", "5.4e-6", "--json");
        assertEquals(0, r.code(), r.err());
        JsonNode j = r.json();
        assertEquals(306.294, j.get("natural_frequency_hz").asDouble(), 306.294 * 1e-4);
        assertEquals(153.15, j.get("risky_rates").get(1).get("full_steps_per_s").asDouble(), 153.15 * 1e-4);
        assertEquals(102.10, j.get("risky_rates").get(2).get("full_steps_per_s").asDouble(), 102.10 * 1e-4);
        assertEquals(91.89, j.get("risky_rates").get(0).get("rpm").asDouble(), 91.89 * 1e-4);
    }

    @Test
    void inverseGivesTheLoadInertia() throws Exception {
        // Item 11 backwards: 216.582 Hz with 0.4 N·m and N_r 50 → J = 1.08e-5 kg·m²; rotor 5.4e-6 → load 5.4e-6.
        Run r = run("resonance", "predict", "--holding-torque-nm", "0.4", "--inertia-kgm2", "5.4e-6",
                "--measured-natural-hz", "216.582", "--json");
        assertEquals(0, r.code(), r.err());
        assertEquals(1.08e-5, r.json().get("total_inertia_kgm2").asDouble(), 1.08e-5 * 1e-4);
        assertEquals(5.4e-6, r.json().get("load_inertia_kgm2").asDouble(), 5.4e-6 * 2e-4);
    }

    @Test
    void predictWithoutInertiaIsAUsageError() {
        Run r = run("resonance", "predict", "--holding-torque-nm", "0.4");
        assertEquals(2, r.code());
        assertTrue(r.err().contains("--inertia-kgm2"), r.err());
    }

    @Test
    void unknownChannelNamesTheChannelsThatExist() {
        Run r = run("resonance", "sweep", SWEEP_CSV, "--channel", "vib");
        assertEquals(2, r.code());
        assertTrue(r.err().contains("expected one of accel, step"), r.err());
    }

    @Test
    void truncatedWavIsAClearError(@TempDir Path tmp) throws Exception {
        byte[] wav = Files.readAllBytes(Path.of(PHONE_WAV));
        Path cut = tmp.resolve("cut.wav");
        Files.write(cut, Arrays.copyOf(wav, 30_001));
        Run r = run("resonance", "sweep", cut.toString(), "--sweep", "linear", "--start", "40", "--end", "600",
                "--duration", "24");
        assertEquals(2, r.code(), r.out());
        assertTrue(r.err().contains("cut.wav"), r.err());
        assertEquals(1, r.err().strip().lines().count(), r.err());
    }

    @Test
    void unsortedTimeIsAClearError(@TempDir Path tmp) throws Exception {
        Path f = tmp.resolve("unsorted.csv");
        StringBuilder b = new StringBuilder("# sweep=linear\n# sweep_start_full_steps_per_s=10\n"
                + "# sweep_end_full_steps_per_s=100\ntime_s,accel_g\n");
        for (int i = 0; i < 2000; i++) {
            double t = (i == 1000 ? 998 : i) / 1000.0;
            b.append(t).append(',').append(Math.sin(i)).append('\n');
        }
        Files.writeString(f, b.toString(), StandardCharsets.UTF_8);
        Run r = run("resonance", "sweep", f.toString());
        assertEquals(2, r.code(), r.out());
        assertTrue(r.err().contains("unsorted.csv line"), r.err());
    }

    @Test
    void sweepShorterThanOneSegmentIsAClearError(@TempDir Path tmp) throws Exception {
        Path f = tmp.resolve("short.csv");
        Files.writeString(f, "# sample_rate_hz=1000\n# sweep=linear\n# sweep_start_full_steps_per_s=10\n"
                + "# sweep_end_full_steps_per_s=100\naccel_g\n0.1\n0.2\n0.1\n", StandardCharsets.UTF_8);
        Run r = run("resonance", "sweep", f.toString());
        assertEquals(2, r.code(), r.out());
        assertTrue(r.err().contains("fewer than one analysis segment"), r.err());
    }

    @Test
    void helpDescribesUnitsAndSafety() {
        Run r = run("resonance", "sweep", "--help");
        assertEquals(0, r.code());
        assertTrue(r.out().contains("full steps/s"), r.out());
        assertTrue(r.out().contains("emergency stop"), r.out());
    }
}
