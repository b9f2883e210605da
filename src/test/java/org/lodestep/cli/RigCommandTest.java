package org.lodestep.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class RigCommandTest {

    record Result(int code, String out, String err) {
    }

    static Result run(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int code = Main.run(new PrintWriter(out, true), new PrintWriter(err, true), args);
        return new Result(code, out.toString(), err.toString());
    }

    @Test
    void infoWithBareSimListsEveryScenario() {
        Result r = run("rig", "info", "sim:");
        assertEquals(0, r.code());
        for (String s : new String[] {"salvage-8", "salvage-6", "bench-4", "faulty-8", "open-6", "gantry-axis"}) {
            assertTrue(r.out().contains(s), s + " missing from: " + r.out());
        }
    }

    @Test
    void infoOfAScenarioShowsLeadsAndFirmwareAsJson() {
        Result r = run("rig", "info", "sim:salvage-6", "--json");
        assertEquals(0, r.code(), r.err());
        assertTrue(r.out().contains("\"leads\" : 6"), r.out());
        assertTrue(r.out().contains("\"firmware\" : \"0.1.0\""), r.out());
    }

    @Test
    void resistanceOfAllPairsOfASixLeadMotorShowsSixConductingPairs() {
        Result r = run("rig", "measure", "sim:salvage-6", "resistance");
        assertEquals(0, r.code(), r.err());
        // 6 leads: 15 pairs, of which each phase's 3 leads give 3 conducting pairs (common practice, from the circuit
        // topology, references §4)
        long open = r.out().lines().filter(l -> l.endsWith("open")).count();
        assertEquals(15 - 6, open, r.out());
    }

    @Test
    void resistanceAsJsonWritesOpenPairsAsNull() {
        Result r = run("rig", "measure", "sim:bench-4", "resistance", "--pair", "1-3", "--json");
        assertEquals(0, r.code(), r.err());
        assertTrue(r.out().contains("\"resistance_ohm\" : null"), r.out());
    }

    @Test
    void everyReadingNamesTheRigThatTookIt() {
        // Traceability: a resistance or insulation reading is only as good as the instrument that took it, so its
        // provenance names the rig and its firmware, in text and in JSON, as a capture's does.
        String rig = "\"rig\" : \"lodestep-virtual-rig, id ";
        Result json = run("rig", "measure", "sim:bench-4", "resistance", "--pair", "1-2", "--json");
        assertEquals(0, json.code(), json.err());
        assertTrue(json.out().contains("\"provenance\"") && json.out().contains(rig), json.out());
        Result ins = run("rig", "measure", "sim:bench-4", "insulation", "--lead", "1", "--volts", "250", "--seconds",
                "1", "--yes-i-have-read-the-caution", "--json");
        assertEquals(0, ins.code(), ins.err());
        assertTrue(ins.out().contains(rig), ins.out());
        Result text = run("rig", "measure", "sim:bench-4", "resistance", "--pair", "1-2");
        assertTrue(text.out().lines().anyMatch(l -> l.strip().startsWith("rig") && l.contains("firmware 0.1.0")),
                text.out());
        Result info = run("rig", "info", "sim:bench-4", "--json");
        assertTrue(info.out().strip().startsWith("{\n  \"provenance\""), info.out());
    }

    @Test
    void insulationWithoutConfirmationPrintsTheCautionAndRefuses() {
        Result r = run("rig", "measure", "sim:bench-4", "insulation");
        assertEquals(ExitCode.USAGE, r.code());
        assertTrue(r.out().contains("CAUTION - insulation test"), r.out());
        assertTrue(r.out().contains("licensed practice"), r.out());
        assertTrue(r.err().contains("--yes-i-have-read-the-caution"), r.err());
    }

    @Test
    void insulationWithConfirmationReadsEveryLead() {
        Result r = run("rig", "measure", "sim:bench-4", "insulation", "--volts", "250",
                "--yes-i-have-read-the-caution");
        assertEquals(0, r.code(), r.err());
        assertEquals(4, r.out().lines().filter(l -> l.contains("G\u03A9")).count(), r.out());
    }

    @Test
    void unknownAddressFormIsAUsageError() {
        Result r = run("rig", "info", "usb:/dev/x");
        assertEquals(ExitCode.USAGE, r.code());
        assertTrue(r.err().contains("tcp:HOST:PORT"), r.err());
        assertEquals(1, r.err().lines().count(), "one line, no stack trace: " + r.err());
    }

    @Test
    void unknownScenarioIsAUsageErrorNamingTheKnownOnes() {
        Result r = run("rig", "info", "sim:nope");
        assertEquals(ExitCode.USAGE, r.code());
        assertTrue(r.err().contains("gantry-axis"), r.err());
    }

    @Test
    void unreachableTcpRigIsARigFailure() {
        // port 1 on loopback: nothing listens there
        Result r = run("rig", "info", "tcp:127.0.0.1:1");
        assertEquals(ExitCode.RIG_OR_IO, r.code());
        assertTrue(r.err().contains("cannot connect"), r.err());
    }

    @Test
    void aRigHostThatDoesNotResolveIsNamedAsUnknown() {
        // .invalid never resolves (RFC 6761, section 6.4; references §32)
        Result r = run("rig", "info", "tcp:rig.example.invalid:5000");
        assertEquals(ExitCode.RIG_OR_IO, r.code());
        assertTrue(r.err().contains("cannot connect (unknown host rig.example.invalid)"), r.err());
    }

    @Test
    void badPairAndBadKindAreUsageErrors() {
        assertEquals(ExitCode.USAGE, run("rig", "measure", "sim:bench-4", "resistance", "--pair", "2-2").code());
        assertEquals(ExitCode.USAGE, run("rig", "measure", "sim:bench-4", "inductance").code());
        assertEquals(ExitCode.USAGE, run("rig", "capture", "sim:bench-4", "ringdown", "--out", "x.csv").code());
    }

    @Test
    void captureRefusesToOverwriteAndPrintsNothingMoving(@TempDir Path dir) throws Exception {
        Path existing = Files.writeString(dir.resolve("old.csv"), "keep me");
        Result r = run("rig", "capture", "sim:gantry-axis", "sweep", "--out", existing.toString());
        assertEquals(ExitCode.USAGE, r.code());
        assertEquals("keep me", Files.readString(existing));
    }

    @Test
    void stepResponsePrintsTheEnergisedCautionAndASummary() {
        Result r = run("rig", "measure", "sim:bench-4", "step-response", "--pair", "1-2", "--volts", "1.5");
        assertEquals(0, r.code(), r.err());
        assertTrue(r.out().contains("CAUTION - energised winding"), r.out());
        assertTrue(r.out().contains("1000 frames at 50000 Hz"), r.out());
    }

    @Test
    void everyRigCommandHasHelpWithAnExample() {
        for (String c : new String[] {"ports", "info", "measure", "capture", "serve"}) {
            Result r = run("rig", c, "--help");
            assertEquals(0, r.code());
            assertTrue(r.out().contains("lodestep rig " + c), c + ": " + r.out());
        }
    }

    @Test
    void sweepCaptureIsWrittenWholeAndReadsBackWithItsProvenance(@TempDir Path dir) throws Exception {
        Path csv = dir.resolve("gantry.csv");
        Result r = run("rig", "capture", "sim:gantry-axis", "sweep", "--from", "40", "--to", "160", "--seconds", "2",
                "--microsteps", "4", "--out", csv.toString());
        assertEquals(0, r.code(), r.err());
        assertTrue(r.out().contains("CAUTION - moving axis"), r.out());
        org.lodestep.capture.CaptureSidecar side = org.lodestep.capture.CaptureReader.verify(csv);
        assertTrue(side.complete());
        assertEquals("gantry-axis", side.scenario());
        assertEquals("KL5002-00871", side.serialNumber());
        org.lodestep.sample.SampledSignal s = org.lodestep.capture.Captures.readAll(csv);
        assertEquals(10000, s.length());
        assertEquals(java.util.List.of("accel", "current", "step"), s.channelNames());
        assertEquals(5000.0, s.sampleRateHz());
        // no stray temporary files beside the capture
        try (var files = Files.list(dir)) {
            assertEquals(2, files.count());
        }
    }

    @Test
    void stepResponseSavedWithOutReadsBack(@TempDir Path dir) throws Exception {
        Path csv = dir.resolve("step.csv");
        Result r = run("rig", "measure", "sim:bench-4", "step-response", "--pair", "1-2", "--out", csv.toString());
        assertEquals(0, r.code(), r.err());
        org.lodestep.sample.SampledSignal s = org.lodestep.capture.Captures.readAll(csv);
        assertEquals(java.util.List.of("current", "voltage"), s.channelNames());
        // 2 V into 1.5 ohm winding + 0.1 ohm drive (scenarios.toml): settles at 1.25 A (Ohm's law)
        double[] i = s.channel(0);
        assertEquals(1.25, i[i.length - 1], 0.01);
    }

    @Test
    void rigDemoSectionRunsEveryStepWithoutUnexpectedFailure(@TempDir Path dir) throws Exception {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int code = new RigDemo().run(dir, dir, new PrintWriter(out, true), new PrintWriter(err, true));
        assertEquals(ExitCode.OK, code, err.toString());
        assertTrue(Files.exists(dir.resolve("rig").resolve("gantry-sweep.csv")));
        // runs again over its own earlier output
        assertEquals(ExitCode.OK, new RigDemo().run(dir, dir, new PrintWriter(out, true), new PrintWriter(err, true)));
    }

    @Test
    void jsonOutputStaysOneDocumentWithTheCautionOnStderr() throws Exception {
        Result r = run("rig", "measure", "sim:bench-4", "insulation", "--lead", "2", "--json",
                "--yes-i-have-read-the-caution");
        assertEquals(0, r.code(), r.err());
        com.fasterxml.jackson.databind.JsonNode j = org.lodestep.report.Json.mapper().readTree(r.out());
        // the one insulation-reading type names what was measured: relay position 2 to the frame
        assertEquals("2-frame", j.get(0).get("label").asText());
        assertEquals(500, j.get(0).get("test_voltage_v").asInt());
        assertTrue(r.err().contains("CAUTION - insulation test"), r.err());
    }

    @Test
    void portsListsTheVirtualRigAddresses() {
        Result r = run("rig", "ports");
        assertEquals(0, r.code(), r.err());
        assertTrue(r.out().contains("sim:gantry-axis"), r.out());
    }
}
