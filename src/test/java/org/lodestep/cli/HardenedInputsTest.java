package org.lodestep.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;

import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * What the command line refuses up front and how it says so: QA input that cannot be judged, folders and outputs
 * that cannot be written, bad option values; each one line and exit 2, with nothing recorded or written.
 */
class HardenedInputsTest {

    @TempDir
    Path dir;
    private Path spec;
    private String db;

    @BeforeEach
    void spec() throws IOException {
        spec = dir.resolve("kv.toml");
        Files.writeString(spec, """
                [part]
                number = "KV-4218-M"
                revision = "C"
                spec_version = 3

                [resistance]
                phase_nominal_ohm = 1.90
                tolerance_pct = 10

                [insulation]
                """);
        db = dir.resolve("qa.sqlite").toString();
    }

    private static String oneLine(CliRun r) {
        String e = r.err().strip();
        assertEquals(1, e.lines().count(), r.err());
        assertFalse(e.contains("Exception"), e);
        return e;
    }

    @Test
    void onePhaseResistanceOnATwoPhaseSpecIsRefusedAndNotRecorded() {
        CliRun r = CliRun.of("qa", "check", "--spec", spec.toString(), "--db", db, "--serial", "SN-1",
                "--phase-ohm", "1.90", "--ambient-c", "20");
        assertEquals(ExitCode.USAGE, r.code(), r.err());
        assertTrue(oneLine(r).contains("1 phase resistance given: expected two"), r.err());
        assertFalse(Files.exists(Path.of(db)), "nothing recorded, no store created");
    }

    @Test
    void aRescannedSerialCountsOnceWithItsLatestVerdict() throws IOException {
        Path serials = dir.resolve("scanned.txt");
        Files.writeString(serials, "SN-1\nSN-2\nSN-1\n");
        CliRun r = CliRun.of("qa", "check", "--spec", spec.toString(), "--db", db, "--lot", "L-1", "--serials",
                serials.toString(), "--phase-ohm", "1.90,1.91", "--ambient-c", "20", "--insulation", "A-frame=500");
        assertEquals(ExitCode.OK, r.code(), r.err());
        assertTrue(r.out().contains("lot L-1 done: tally: 2 tested, 2 PASS, 0 FAIL, 0 INCOMPLETE"), r.out());
    }

    @Test
    void aDatabaseInAFolderThatDoesNotExistIsRefusedAndTheFolderNotMade() {
        Path missing = dir.resolve("typo/qa.sqlite");
        CliRun r = CliRun.of("qa", "check", "--spec", spec.toString(), "--db", missing.toString(), "--serial", "SN-1",
                "--phase-ohm", "1.90,1.91", "--ambient-c", "20");
        assertEquals(ExitCode.USAGE, r.code(), r.err());
        assertTrue(oneLine(r).contains(missing.getParent() + " does not exist"), r.err());
        assertFalse(Files.exists(missing.getParent()));
    }

    @Test
    void theInsulationCautionAppearsOnlyWhereAnInsulationTestIsDone() {
        CliRun without = CliRun.of("qa", "check", "--spec", spec.toString(), "--db", db, "--serial", "SN-1",
                "--phase-ohm", "1.90,1.91", "--ambient-c", "20");
        assertFalse(without.out().contains("Caution"), without.out());
        CliRun with = CliRun.of("qa", "check", "--spec", spec.toString(), "--db", db, "--serial", "SN-2",
                "--phase-ohm", "1.90,1.91", "--ambient-c", "20", "--insulation", "A-frame=500");
        assertTrue(with.out().contains("Caution: the insulation test applies 500 V DC"), with.out());
    }

    @Test
    void aMisspeltSpecKeyIsNamedWithItsLineAndTheNearestKnownKey() throws IOException {
        Files.writeString(spec, Files.readString(spec).replace("tolerance_pct", "tolerence_pct"));
        CliRun r = CliRun.of("qa", "check", "--spec", spec.toString(), "--db", db, "--serial", "SN-1");
        assertEquals(ExitCode.USAGE, r.code());
        assertTrue(oneLine(r).contains(spec + " line 8, column resistance.tolerence_pct: 'tolerence_pct' is not a key"
                + " of [resistance]: did you mean tolerance_pct?"), r.err());
    }

    @Test
    void anUnreadableMeterLogOrAnEmptySerialsFileStopsTheLotBeforeItStarts() throws IOException {
        Path serials = dir.resolve("scanned.txt");
        Files.writeString(serials, "SN-1\n");
        Path log = dir.resolve("log.csv");
        Files.write(log, new byte[] {'s', 'e', 'r', 'i', 'a', 'l', '\n', 'S', 'N', (byte) 0xFF, '\n'});
        CliRun r = CliRun.of("qa", "check", "--spec", spec.toString(), "--db", db, "--lot", "L-2", "--serials",
                serials.toString(), "--meter-log", log.toString());
        assertEquals(ExitCode.USAGE, r.code(), r.err());
        assertTrue(oneLine(r).contains(log + " line 2: has a byte that is not UTF-8"), r.err());
        assertFalse(r.out().contains("scan or type"), "the lot never started: " + r.out());

        Path empty = dir.resolve("empty.txt");
        Files.writeString(empty, "\n# nothing scanned\n");
        CliRun e = CliRun.of("qa", "check", "--spec", spec.toString(), "--db", db, "--lot", "L-2", "--serials",
                empty.toString(), "--phase-ohm", "1.9,1.9");
        assertEquals(ExitCode.USAGE, e.code(), e.err());
        assertTrue(oneLine(e).contains(empty + ": has no serial numbers"), e.err());
    }

    @Test
    void aFolderAsInputOrAsOutputIsNamedAsGivenWithExitTwo() {
        CliRun in = CliRun.of("resonance", "ringdown", dir.toString());
        assertEquals(ExitCode.USAGE, in.code(), in.err());
        assertTrue(oneLine(in).contains(dir + ": is a folder"), in.err());
        CliRun out = CliRun.of("leads", "identify", "sample-captures/leads/kl-01-shaker-4lead.csv", "--report",
                dir.toString());
        assertEquals(ExitCode.USAGE, out.code(), out.err());
        assertTrue(oneLine(out).contains(dir + ": cannot be written: is a folder"), out.err());
    }

    @Test
    void aBadOptionValueIsOneLineWithTheHelpHint() {
        CliRun r = CliRun.of("resonance", "predict", "--holding-torque-nm", "lots");
        assertEquals(ExitCode.USAGE, r.code());
        String line = oneLine(r);
        assertTrue(line.contains("'lots'"), line);
        assertTrue(line.endsWith("(see 'lodestep resonance predict --help')"), line);
    }
}
