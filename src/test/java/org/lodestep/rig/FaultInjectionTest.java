package org.lodestep.rig;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/** A damaged line ends in retries and a whole capture, or in a clear error and a rig with every output off. */
class FaultInjectionTest {
    private static final SweepPlan PROFILE = new SweepPlan(40, 160, 1.0, 4, 5000);
    private static final RigClient.Settings FAST = new RigClient.Settings(300, 5, 100);

    private static RigCapture cleanSweep() throws Exception {
        Transports.SimLink link = Transports.openSim("sim:gantry-axis");
        try (RigClient c = RigClient.connect(link.host(), FAST)) {
            return c.sweep(PROFILE, RigClient.Progress.NONE);
        }
    }

    private static void assertSameSamples(RigCapture expected, RigCapture actual) {
        for (int ch = 0; ch < expected.signal().channels().size(); ch++) {
            assertArrayEquals(expected.signal().channel(ch), actual.signal().channel(ch), 0.0,
                    "channel " + expected.signal().channels().get(ch).name());
        }
    }

    @Test
    void flippedBitsAreReRequestedAndNoDamagedSampleIsAccepted() throws Exception {
        RigCapture clean = cleanSweep();
        Transports.SimLink link = Transports.openSim("sim:gantry-axis");
        // about one byte in 20000 flipped: roughly one block in ten damaged
        FaultyTransport line = new FaultyTransport(link.host(), 11, 5e-5, 0, 0, Long.MAX_VALUE);
        try (RigClient c = RigClient.connect(line, FAST)) {
            RigCapture got = c.sweep(PROFILE, RigClient.Progress.NONE);
            assertTrue(c.stats().damagedFrames() > 0, "the test must actually damage frames");
            assertTrue(c.stats().resendRequests() > 0);
            assertSameSamples(clean, got);
        }
    }

    @Test
    void liveSamplesArriveInStreamOrderThroughResentBlocks() throws Exception {
        RigCapture clean = cleanSweep();
        Transports.SimLink link = Transports.openSim("sim:gantry-axis");
        FaultyTransport line = new FaultyTransport(link.host(), 11, 5e-5, 0, 0, Long.MAX_VALUE);
        java.util.List<double[]> heard = new java.util.ArrayList<>();
        try (RigClient c = RigClient.connect(line, FAST)) {
            c.sweep(PROFILE, RigClient.Progress.NONE, new RigClient.Samples() {
                @Override
                public void started(java.util.List<org.lodestep.sample.Channel> channels, double sampleRateHz) {
                    assertEquals(3, channels.size());
                }

                @Override
                public void frames(double[][] samples) {
                    heard.add(samples[0].clone());
                }
            });
            assertTrue(c.stats().resendRequests() > 0, "the test must make the rig send blocks again");
        }
        // heard in order, every frame once: the live view sees exactly the capture, damaged blocks never
        double[] accel = clean.signal().channel(0);
        int at = 0;
        for (double[] block : heard) {
            for (double v : block) {
                assertEquals(accel[at++], v, 0.0);
            }
        }
        assertEquals(accel.length, at);
    }

    @Test
    void droppedBytesAreReRequestedAndNoDamagedSampleIsAccepted() throws Exception {
        RigCapture clean = cleanSweep();
        Transports.SimLink link = Transports.openSim("sim:gantry-axis");
        FaultyTransport line = new FaultyTransport(link.host(), 12, 0, 5e-5, 0, Long.MAX_VALUE);
        try (RigClient c = RigClient.connect(line, FAST)) {
            RigCapture got = c.sweep(PROFILE, RigClient.Progress.NONE);
            assertTrue(c.stats().damagedFrames() > 0);
            assertSameSamples(clean, got);
        }
    }

    @Test
    void smallDelaysOnlySlowTheCaptureDown() throws Exception {
        RigCapture clean = cleanSweep();
        Transports.SimLink link = Transports.openSim("sim:gantry-axis");
        FaultyTransport line = new FaultyTransport(link.host(), 13, 0, 0, 2, Long.MAX_VALUE);
        try (RigClient c = RigClient.connect(line, FAST)) {
            assertSameSamples(clean, c.sweep(PROFILE, RigClient.Progress.NONE));
        }
    }

    @Test
    void disconnectMidBlockGivesClearErrorAndRigSwitchesOff() throws Exception {
        Transports.SimLink link = Transports.openSim("sim:gantry-axis");
        // handshake is a few hundred bytes; cut the line in the middle of the stream
        FaultyTransport line = new FaultyTransport(link.host(), 14, 0, 0, 0, 20_000);
        RigClient c = RigClient.connect(line, FAST);
        RigException e = assertThrows(RigException.class, () -> c.sweep(PROFILE, RigClient.Progress.NONE));
        assertTrue(e.getMessage().contains("capture discarded"), e.getMessage());
        link.thread().join(5000);
        assertFalse(link.thread().isAlive(), "the virtual rig ends its session when the line drops");
        assertFalse(link.rig().energised());
        // the rig hears the drop as end of input while reading, or as a failed write while it streams a block:
        // which one depends on where its thread is when the line goes (a race, not a fault)
        assertTrue(java.util.Set.of("line closed", "line failed").contains(link.rig().lastSafeReason()),
                link.rig().lastSafeReason());
    }

    @Test
    void lineGoingBadMidStreamEndsInErrorAfterReRequestsWithOutputsOff() throws Exception {
        Transports.SimLink link = Transports.openSim("sim:gantry-axis");
        FaultyTransport line = new FaultyTransport(link.host(), 15, 0, 0, 0, Long.MAX_VALUE);
        RigClient c = RigClient.connect(line, FAST);
        line.corruptAfter(20_000 + c.stats().bytesReceived());
        RigException e = assertThrows(RigException.class, () -> c.sweep(PROFILE, RigClient.Progress.NONE));
        assertTrue(e.getMessage().contains("still damaged or missing after 5 requests"), e.getMessage());
        assertTrue(e.getMessage().contains("outputs switched off"), e.getMessage());
        assertTrue(c.stats().resendRequests() >= 5);
        // the host's SAFE reaches the rig (only the rig-to-host direction is damaged): the stream stops, coil off
        for (int i = 0; i < 50 && link.rig().energised(); i++) {
            Thread.sleep(20);
        }
        assertFalse(link.rig().energised());
        c.close();
    }

    @Test
    void commandsOnADeadLineEndInErrorAfterRetries() throws Exception {
        Transports.SimLink link = Transports.openSim("sim:bench-4");
        FaultyTransport line = new FaultyTransport(link.host(), 16, 0, 0, 0, Long.MAX_VALUE);
        RigClient c = RigClient.connect(line, FAST);
        line.corruptEverything();
        RigException e = assertThrows(RigException.class, () -> c.resistance(1, 2));
        assertTrue(e.getMessage().contains("no answer from the rig at sim:bench-4 to 'RES 1 2' after 5 attempts"),
                e.getMessage());
        assertEquals(4, c.stats().commandRetries());
        assertFalse(link.rig().energised());
        c.close();
    }
}
