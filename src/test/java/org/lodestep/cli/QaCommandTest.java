package org.lodestep.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;

/** {@code lodestep qa ...} run in-process against a SQLite file in a temporary folder. */
class QaCommandTest {

    @TempDir
    Path dir;

    private Path spec;
    private String db;
    private String out;
    private String err;

    @BeforeEach
    void writeSpec() throws IOException {
        spec = dir.resolve("kv.toml");
        Files.writeString(spec, """
                [part]
                number = "KV-4218-M"
                revision = "C"
                spec_version = 3

                [resistance]
                phase_nominal_ohm = 1.90
                tolerance_pct = 10
                max_imbalance_pct = 5

                [insulation]
                """);
        db = dir.resolve("qa.sqlite").toString();
    }

    private int run(String... args) {
        StringWriter o = new StringWriter();
        StringWriter e = new StringWriter();
        int code = Main.run(new PrintWriter(o), new PrintWriter(e), args);
        out = o.toString();
        err = e.toString();
        return code;
    }

    private int check(String serial, String phases, String... extra) {
        return checkBy("tester", serial, phases, extra);
    }

    private int checkBy(String operator, String serial, String phases, String... extra) {
        List<String> args = new java.util.ArrayList<>(List.of("qa", "check", "--spec", spec.toString(), "--db", db,
                "--serial", serial, "--phase-ohm", phases, "--ambient-c", "20", "--insulation", "A-frame=500",
                "--operator", operator, "--station", "bench-9"));
        args.addAll(List.of(extra));
        return run(args.toArray(String[]::new));
    }

    @Test
    void passingMotorExitsZeroAndIsRecorded() {
        assertEquals(ExitCode.OK, check("SN-1", "1.90,1.92"), err);
        assertTrue(out.contains("#### "), out);
        assertTrue(out.contains("recorded as #1"), out);
        assertEquals(ExitCode.OK, run("qa", "certificate", "--db", db, "--serial", "SN-1"));
        assertTrue(out.contains("operator             tester"), out);
        assertTrue(out.contains("(verified)"), out);
        Path file = dir.resolve("certs/SN-1.txt");
        assertEquals(ExitCode.OK, run("qa", "certificate", "--db", db, "--serial", "SN-1", "--out", file.toString()));
        assertTrue(out.startsWith("wrote the certificate of SN-1 (record #1, PASS)"), out);
        assertTrue(readString(file).startsWith("INCOMING INSPECTION CERTIFICATE"));
    }

    private static String readString(Path p) {
        try {
            return Files.readString(p, StandardCharsets.UTF_8);
        } catch (IOException e) {
            throw new java.io.UncheckedIOException(e);
        }
    }

    @Test
    void aLimitChangedWithoutANewSpecVersionIsAnInputErrorNotADatabaseFailure() throws IOException {
        assertEquals(ExitCode.OK, check("SN-1", "1.90,1.92"), err);
        Files.writeString(spec, Files.readString(spec).replace("tolerance_pct = 10", "tolerance_pct = 15"));
        assertEquals(ExitCode.USAGE, check("SN-2", "1.90,1.92"));
        // one line naming the spec file and the line of its spec_version (line 4 of this spec), and what is expected
        assertTrue(err.contains(spec + " line 4: spec_version 3 of ") && !err.contains("database:"), err);
        assertTrue(err.contains("expected a new spec_version, 4 or more"), err);
        assertEquals(1, err.strip().lines().count(), err);
    }

    @Test
    void failingMotorExitsThreeAndRetestLinks() {
        assertEquals(ExitCode.FINDING, check("SN-2", "2.40,1.92"));
        assertTrue(out.contains("XXXX"), out);
        assertEquals(ExitCode.OK, check("SN-2", "1.91,1.92"));
        assertTrue(out.contains("(re-test of #1)"), out);
    }

    @Test
    void lotModeReadsSerialsUntilEndWithRunningTally() throws IOException {
        Path serials = dir.resolve("scanned.txt");
        Files.writeString(serials, "LOT-A-001\n\n# scanner test line\nLOT-A-002\r\nLOT-A-003\n");
        int code = run("qa", "check", "--spec", spec.toString(), "--db", db, "--lot", "L-77", "--serials",
                serials.toString(), "--phase-ohm", "1.90,1.91", "--insulation", "A-frame=500", "--ambient-c", "20");
        assertEquals(ExitCode.OK, code, err);
        assertTrue(out.contains("tally: 3 tested, 3 PASS, 0 FAIL, 0 INCOMPLETE"), out);
        assertTrue(out.contains("lot L-77 done"), out);
        assertEquals(ExitCode.OK, run("qa", "report", "--db", db, "--lot", "L-77", "--json"));
        JsonNode doc = json(out);
        assertEquals(3, doc.at("/summary/counts/motors").asInt());
        assertEquals(100.0, doc.at("/summary/counts/final_yield_pct").asDouble(), 1e-9);
        assertEquals("phase_resistance", doc.at("/summary/parameters/0/parameter").asText());
    }

    @Test
    void lotModeGoesOnPastAMissingCapture() throws IOException {
        Path serials = dir.resolve("scanned.txt");
        Files.writeString(serials, "M-1\nM-2\n");
        int code = run("qa", "check", "--spec", spec.toString(), "--db", db, "--lot", "L-78", "--serials",
                serials.toString(), "--resistance-pattern", dir.resolve("none/{serial}.csv").toString());
        assertEquals(ExitCode.FINDING, code);
        assertEquals(2, err.lines().filter(l -> l.contains("not recorded")).count(), err);
        assertTrue(out.contains("0 PASS, 0 FAIL, 2 INCOMPLETE"), out);
    }

    @Test
    void hostileSerialAndOperatorAreRecordedVerbatimAndShownHarmlessly() throws Exception {
        String serial = "=HYPERLINK(\"x\")'; DROP TABLE qa_record;--\u001b[31m";
        String operator = "Ann \"O'Neil\"\r\n\u0007";
        assertEquals(ExitCode.OK, checkBy(operator, serial, "1.90,1.92"), err);
        assertFalse(out.contains("\u001b"), "raw escape reached the terminal");
        assertTrue(out.contains("\\x1B[31m"), out);
        assertEquals(ExitCode.OK, run("qa", "certificate", "--db", db, "--serial", serial, "--json"));
        JsonNode doc = json(out);
        assertEquals(serial, doc.at("/latest/submission/serial").asText());
        assertEquals(operator, doc.at("/latest/submission/operator").asText());
        Path csv = dir.resolve("out/export.csv");
        assertEquals(ExitCode.OK, run("qa", "export", "--db", db, "--out", csv.toString()));
        String text = Files.readString(csv, StandardCharsets.UTF_8);
        assertTrue(text.startsWith("record_id,retest_of,serial"), text);
        // The formula is neutralised with a leading apostrophe; the rest is verbatim, quoted per RFC 4180.
        assertTrue(text.contains("\"'=HYPERLINK(\"\"x\"\")'; DROP TABLE qa_record;--\u001b[31m\""), text);
        assertEquals(ExitCode.OK, run("qa", "report", "--db", db));
        assertTrue(out.contains("motors 1"), out);
    }

    @Test
    void badSpecIsOneLineNamingFileAndLine() throws IOException {
        Files.writeString(spec, "[part]\nnumber = \"A\"\nrevision = \"1\"\nspec_version = 1\n[resistance]\n"
                + "phase_nominal_ohm = -2\ntolerance_pct = 5\n");
        assertEquals(ExitCode.USAGE, check("SN-3", "1.9,1.9"));
        assertEquals(1, err.lines().count(), err);
        assertTrue(err.contains("kv.toml line 6, column resistance.phase_nominal_ohm: '-2' expected ohms"), err);
    }

    @Test
    void rigMeasuresResistanceAndInsulationAfterTheCautionIsConfirmed() throws Exception {
        // The virtual rig's bench-4 motor: 4 leads, two 0.75 ohm halves per phase (1.5 ohm), insulation 5 Gohm.
        Files.writeString(spec, Files.readString(spec).replace("phase_nominal_ohm = 1.90", "phase_nominal_ohm = 1.50"));
        assertEquals(ExitCode.USAGE, run("qa", "check", "--spec", spec.toString(), "--db", db, "--serial", "KL-1",
                "--rig", "sim:bench-4"));
        assertTrue(err.contains("--yes-i-have-read-the-caution"), err);
        assertEquals(ExitCode.OK, run("qa", "check", "--spec", spec.toString(), "--db", db, "--serial", "KL-1",
                "--rig", "sim:bench-4", "--yes-i-have-read-the-caution", "--ambient-c", "20", "--json"), err + out);
        JsonNode doc = json(out);
        assertEquals("PASS", doc.at("/record/submission/verdict").asText());
        assertEquals("rig", doc.at("/record/submission/measurements/captures/0/kind").asText());
        assertEquals(2, doc.at("/record/submission/measurements/insulation").size());
        assertTrue(err.contains("insulation blk to frame at 500 V DC"), err);
    }

    @Test
    void passwordInDatabaseUrlIsRefused() {
        int code = run("qa", "report", "--db", "jdbc:postgresql://127.0.0.1:5432/test?user=postgres&password=secret");
        assertEquals(ExitCode.USAGE, code);
        assertTrue(err.contains("LODESTEP_DB_PASSWORD"), err);
    }

    @Test
    void unreachableDatabaseExitsFive() {
        int code = run("qa", "report", "--db", "jdbc:postgresql://127.0.0.1:9/none?connectTimeout=2");
        assertEquals(ExitCode.DATABASE, code);
        assertTrue(err.startsWith("lodestep qa report: database: "), err);
        assertEquals(1, err.lines().count(), err);
    }

    @Test
    void reportOnMissingStoreFileIsUsageErrorAndCreatesNothing() {
        assertEquals(ExitCode.USAGE, run("qa", "report", "--db", db));
        assertTrue(err.contains("no QA records at"), err);
        assertFalse(Files.exists(Path.of(db)));
    }

    @Test
    void certificateOfUnknownSerialIsUsageError() {
        check("SN-0", "1.9,1.9");
        assertEquals(ExitCode.USAGE, run("qa", "certificate", "--db", db, "--serial", "NOPE"));
        assertTrue(err.contains("no record of serial 'NOPE'"), err);
    }

    @Test
    void sameSerialWithoutReadingsIsIncompleteNotPass() {
        assertEquals(ExitCode.FINDING, run("qa", "check", "--spec", spec.toString(), "--db", db, "--serial", "SN-4"));
        assertTrue(out.contains("INCOMPLETE") || out.contains("?"), out);
    }

    private static JsonNode json(String text) throws IOException {
        return new ObjectMapper().readTree(text);
    }
}
