package org.lodestep.rig;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.InputStream;
import java.net.InetAddress;
import java.net.ServerSocket;
import java.net.Socket;

import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;

/** One session at a time on TCP (firmware-protocol.md, section 3). */
class RigServerTest {
    private ServerSocket server;
    private String address;

    @BeforeEach
    void start() throws Exception {
        server = new ServerSocket(0, 8, InetAddress.getLoopbackAddress());
        address = "tcp:127.0.0.1:" + server.getLocalPort();
        Thread t = new Thread(() -> {
            try {
                RigServer.serve(server, "bench-4", Scenarios.get("bench-4"), false, false, line -> { });
            } catch (Exception ignored) {
                // closed by the test
            }
        }, "rig server");
        t.setDaemon(true);
        t.start();
    }

    @AfterEach
    void stop() throws Exception {
        server.close();
    }

    @Test
    void aSecondHostIsToldBusyAtOnceNotLeftToTimeOut() throws Exception {
        try (RigClient first = RigClient.open(address)) {
            RigRefusedException e = assertThrows(RigRefusedException.class, () -> RigClient.open(address));
            assertEquals(RigError.BUSY, e.error());
            assertTrue(e.getMessage().contains("another host"), e.getMessage());
            // the first session is untouched
            assertEquals(1.5, first.resistance(1, 2).resistanceOhm(), 0.01);
        }
    }

    /** Reads until the far end closes; a bounded wait, not a timing check. */
    private static boolean closedByServer(Socket s) throws Exception {
        s.setSoTimeout(20_000);
        InputStream in = s.getInputStream();
        while (true) {
            if (in.read() < 0) {
                return true;
            }
        }
    }

    @Test
    void aSilentClientLosesTheRigAndTheNextHostGetsIt() throws Exception {
        try (Socket silent = new Socket(InetAddress.getLoopbackAddress(), server.getLocalPort())) {
            assertTrue(closedByServer(silent));
        }
        try (RigClient next = RigClient.open(address)) {
            assertEquals(4, next.info().leads());
        }
    }

    @Test
    void aClientThatSendsHalfAFrameLosesTheRig() throws Exception {
        try (Socket half = new Socket(InetAddress.getLoopbackAddress(), server.getLocalPort())) {
            // the first bytes of a HELLO frame whose length promises 7 bytes, then nothing
            half.getOutputStream().write(new byte[] {(byte) 0xA5, 0x3C, 0x43, 0x01, 0x07, 0x00, 'H', 'E'});
            assertTrue(closedByServer(half));
        }
        try (RigClient next = RigClient.open(address)) {
            assertEquals(4, next.info().leads());
        }
    }

    @Test
    void theKitPassesAgainstTheServedRigIncludingTheTwoHostCheck() throws Exception {
        RigConformance.Report r = RigConformance.run(address, new RigConformance.Settings(false), s -> { });
        assertTrue(r.passed(), r.checks().toString());
        assertTrue(r.checks().stream().anyMatch(c -> c.name().contains("second host")
                && c.verdict() == RigConformance.Verdict.PASS), r.checks().toString());
    }
}
