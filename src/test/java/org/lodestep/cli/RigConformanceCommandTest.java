package org.lodestep.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.net.InetAddress;
import java.net.ServerSocket;

import org.junit.jupiter.api.Test;
import org.lodestep.rig.BrokenRig;

/** {@code rig conformance}: the caution, the table, and exit 3 on a failing rig. */
class RigConformanceCommandTest {

    private static int run(StringWriter out, StringWriter err, String... args) {
        return Main.run(new PrintWriter(out, true), new PrintWriter(err, true), args);
    }

    @Test
    void refusesToStartWithoutTheConfirmation() {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        assertEquals(ExitCode.USAGE, run(out, err, "rig", "conformance", "sim:bench-4"));
        assertTrue(out.toString().contains("CAUTION"), out.toString());
        assertTrue(err.toString().contains("--yes-i-have-read-the-caution"), err.toString());
    }

    @Test
    void virtualRigPassesAndTheTableNamesSections() {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int code = run(out, err, "rig", "conformance", "sim:bench-4", "--quick", "--yes-i-have-read-the-caution");
        assertEquals(ExitCode.OK, code, out + "\n" + err);
        assertTrue(out.toString().contains("CAUTION"), out.toString());
        assertTrue(out.toString().contains("PASS  §4.2"), out.toString());
        assertTrue(out.toString().contains(" 0 failed"), out.toString());
    }

    @Test
    void aFaultyRigExitsThreeNamingTheSection() throws Exception {
        try (ServerSocket server = new ServerSocket(0, 1, InetAddress.getLoopbackAddress())) {
            BrokenRig.serveOnce(server, BrokenRig.Fault.NO_HELLO_FIRST);
            StringWriter out = new StringWriter();
            StringWriter err = new StringWriter();
            int code = run(out, err, "rig", "conformance", "tcp:127.0.0.1:" + server.getLocalPort(), "--quick",
                    "--yes-i-have-read-the-caution");
            assertEquals(ExitCode.FINDING, code, out + "\n" + err);
            assertTrue(out.toString().contains("FAIL  §3       a command before HELLO is refused with 10 VERSION"),
                    out.toString());
        }
    }

    @Test
    void jsonListsEveryCheck() {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int code = run(out, err, "rig", "conformance", "sim:bench-4", "--quick", "--yes-i-have-read-the-caution",
                "--json");
        assertEquals(ExitCode.OK, code, err.toString());
        assertTrue(out.toString().trim().startsWith("{"), out.toString());
        assertTrue(out.toString().contains("\"verdict\""), out.toString());
    }
}
