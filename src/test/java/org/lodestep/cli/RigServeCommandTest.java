package org.lodestep.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.net.ServerSocket;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicInteger;

import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.lodestep.rig.ResistanceReading;
import org.lodestep.rig.RigCapture;
import org.lodestep.rig.RigClient;
import org.lodestep.rig.SweepPlan;

/** {@code rig serve} in a thread, reached through the real TCP and jSerialComm paths. */
class RigServeCommandTest {

    private static Thread serve(AtomicInteger code, StringWriter log, String... args) {
        Thread t = new Thread(() -> code.set(Main.run(new PrintWriter(log, true), new PrintWriter(log, true), args)),
                "rig serve");
        t.setDaemon(true);
        t.start();
        return t;
    }

    @Test
    void servedRigAnswersOverTcpOnLoopback() throws Exception {
        int port;
        try (ServerSocket s = new ServerSocket(0)) {
            port = s.getLocalPort();
        }
        AtomicInteger code = new AtomicInteger(-1);
        StringWriter log = new StringWriter();
        Thread t = serve(code, log, "rig", "serve", "--scenario", "bench-4", "--tcp", "127.0.0.1:" + port, "--once");
        RigClient c = null;
        for (int i = 0; i < 100 && c == null; i++) {
            try {
                c = RigClient.open("tcp:127.0.0.1:" + port);
            } catch (org.lodestep.rig.RigException e) {
                Thread.sleep(50); // still starting
            }
        }
        if (c == null) {
            fail("rig serve did not listen: " + log);
        }
        try (RigClient client = c) {
            assertEquals(4, client.info().leads());
            // bench-4: two phases of two 0.75 ohm halves in series, leads as labelled (scenarios.toml)
            assertEquals(1.5, client.resistance(1, 2).resistanceOhm(), 0.01);
        }
        t.join(5000);
        assertFalse(t.isAlive(), "--once ends after the session");
        assertEquals(0, code.get(), log.toString());
        assertTrue(log.toString().contains("listening on tcp:127.0.0.1:" + port), log.toString());
    }

    @Test
    void servedRigAnswersThroughJSerialCommOverAPseudoTerminalPair(@TempDir Path dir) throws Exception {
        boolean haveSocat = java.util.Arrays.stream(System.getenv().getOrDefault("PATH", "/usr/bin:/bin")
                .split(java.io.File.pathSeparator)).anyMatch(d -> !d.isEmpty() && Files.isExecutable(Path.of(d, "socat")));
        if (!haveSocat) {
            if ("true".equals(System.getenv("CI"))) {
                fail("socat is required on CI (.ci/run installs it) for the serial-path test");
            }
            Assumptions.abort("socat not installed: serial-path test skipped (apt-get install socat to run it)");
        }
        Path a = dir.resolve("rig-end");
        Path b = dir.resolve("host-end");
        Process socat = new ProcessBuilder("socat", "pty,raw,echo=0,link=" + a, "pty,raw,echo=0,link=" + b)
                .redirectErrorStream(true).redirectOutput(ProcessBuilder.Redirect.DISCARD).start();
        try {
            for (int i = 0; i < 250 && !(Files.exists(a) && Files.exists(b)); i++) {
                Thread.sleep(20);
            }
            assertTrue(Files.exists(a) && Files.exists(b), "socat made no pseudo-terminal pair");
            AtomicInteger code = new AtomicInteger(-1);
            StringWriter log = new StringWriter();
            Thread t = serve(code, log, "rig", "serve", "--scenario", "salvage-8", "--serial",
                    a.toRealPath().toString(), "--once");
            try (RigClient c = RigClient.open("serial:" + b.toRealPath() + "?baud=921600")) {
                assertEquals(8, c.info().leads());
                int conducting = 0;
                for (int j = 2; j <= 8; j++) {
                    ResistanceReading r = c.resistance(1, j);
                    if (!r.open()) {
                        conducting++;
                    }
                }
                // an 8-lead motor: each lead belongs to exactly one isolated half-winding (common practice, from the
                // circuit topology, references §4)
                assertEquals(1, conducting);
                RigCapture cap = c.sweep(new SweepPlan(50, 150, 0.5, 2, 5000), RigClient.Progress.NONE);
                assertEquals(2500, cap.signal().length());
                assertEquals(0, c.stats().damagedFrames(), "a pseudo-terminal does not damage bytes");
            }
            t.join(15000);
            assertFalse(t.isAlive(), "--once ends after BYE: " + log);
            assertEquals(0, code.get(), log.toString());
        } finally {
            socat.destroy();
            socat.waitFor(2, TimeUnit.SECONDS);
        }
    }
}
