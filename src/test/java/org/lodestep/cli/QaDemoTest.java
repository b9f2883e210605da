package org.lodestep.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The QA demo end to end on the bundled sample lot: resistance CSVs, meter log, re-test, report, certificate. */
class QaDemoTest {

    @TempDir
    Path out;

    @Test
    void sampleLotRunsThroughCheckReportCertificateAndExport() throws Exception {
        StringWriter text = new StringWriter();
        StringWriter err = new StringWriter();
        int code = new QaDemo().run(Path.of("sample-captures"), out, new PrintWriter(text), new PrintWriter(err));
        String s = text.toString();
        assertEquals(ExitCode.OK, code, err + s);
        // Sample data are built so that 00121 fails phase B resistance and balance, 00124 fails insulation (62 Mohm)
        // and 00126 fails balance (6.3 % against 5 %): 9 of 12 pass first time, 10 after 00124 is re-tested.
        assertTrue(s.contains("lot L-2607 done: tally: 12 tested, 9 PASS, 3 FAIL, 0 INCOMPLETE"), s);
        assertTrue(s.contains("(re-test of #8)"), s);
        assertTrue(s.contains("final yield 83.3 % (10 of 12 motors pass), first-pass yield 75.0 %; failed: KV24-00121,"
                + " KV24-00126; re-tested: KV24-00124 PASS"), s);
        assertTrue(s.contains("outside X-chart limits: motor 5, serial KV24-00121"), s);
        assertTrue(s.contains("(verified)"), s);
        assertTrue(Files.readString(out.resolve("qa/lot-L-2607.csv")).lines().count() > 100);
        assertEquals("", err.toString());
    }
}
