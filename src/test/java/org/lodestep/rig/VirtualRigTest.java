package org.lodestep.rig;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/** The firmware side, driven frame by frame. */
class VirtualRigTest {

    private static final class Host {
        final Transports.SimLink link;
        final FrameReader in;

        Host(String address) throws Exception {
            link = Transports.openSim(address);
            in = new FrameReader(link.host());
            // a session starts with HELLO (firmware-protocol.md, section 3); tag 254 stays clear of the tests' tags
            assertEquals(Frame.REPLY, ask(254, "HELLO 1").type());
        }

        Frame ask(int tag, String text) throws Exception {
            link.host().write(FrameCodec.encode(Frame.text(Frame.COMMAND, tag, text)));
            while (true) {
                Frame f = in.next(2000);
                assertNotNull(f, "no answer to " + text);
                if (f.tag() == tag) {
                    return f;
                }
            }
        }
    }

    @Test
    void retriedCommandWithTheSameTagIsAnsweredAgainNotMeasuredAgain() throws Exception {
        Host h = new Host("sim:bench-4");
        String first = h.ask(5, "RES 1 2").text();
        assertEquals(first, h.ask(5, "RES 1 2").text());
        // a new tag is a new measurement: the meter noise draws again
        assertNotEquals(first, h.ask(6, "RES 1 2").text());
    }

    @Test
    void insulationFiresOnlyWithTheTokenOfTheArm() throws Exception {
        Host h = new Host("sim:bench-4");
        Frame noArm = h.ask(1, "INS FIRE token=0000");
        assertEquals(Frame.ERROR, noArm.type());
        assertTrue(noArm.text().startsWith("4 NOT_ARMED"), noArm.text());
        Fields arm = Fields.parse(h.ask(2, "INS ARM lead=1 volts=500").text());
        Frame wrong = h.ask(3, "INS FIRE token=" + (arm.get("token").equals("ABCD") ? "ABCE" : "ABCD"));
        assertTrue(wrong.text().startsWith("4 NOT_ARMED"), wrong.text());
        // the wrong token disarmed it: arm again, then fire properly
        Fields arm2 = Fields.parse(h.ask(4, "INS ARM lead=1 volts=500").text());
        Fields fired = Fields.parse(h.ask(5, "INS FIRE token=" + arm2.get("token")).text());
        assertEquals("500", fired.get("volts"));
        // bench-4 phase insulation 5e9 ohm, tester noise 3 % (scenarios.toml)
        assertEquals(5e9, fired.number("ohm"), 5e9 * 0.15);
        assertFalse(h.link.rig().energised());
    }

    @Test
    void anyOtherCommandCancelsTheArm() throws Exception {
        Host h = new Host("sim:bench-4");
        Fields arm = Fields.parse(h.ask(1, "INS ARM lead=2 volts=250").text());
        h.ask(2, "RES 1 2");
        assertTrue(h.ask(3, "INS FIRE token=" + arm.get("token")).text().startsWith("4 NOT_ARMED"));
    }

    @Test
    void silentHostTripsTheWatchdogWhichDisarmsAndReports() throws Exception {
        Host h = new Host("sim:bench-4");
        Fields arm = Fields.parse(h.ask(1, "INS ARM lead=1 volts=500").text());
        // say nothing for longer than the watchdog
        Frame f = h.in.next(VirtualRig.WATCHDOG_MS + 1500);
        assertNotNull(f, "the rig reports the watchdog");
        assertEquals(Frame.ERROR, f.type());
        assertEquals(0, f.tag());
        assertTrue(f.text().startsWith("8 WATCHDOG"), f.text());
        assertEquals("watchdog", h.link.rig().lastSafeReason());
        assertTrue(h.ask(2, "INS FIRE token=" + arm.get("token")).text().startsWith("4 NOT_ARMED"));
    }

    @Test
    void stepDriveAboveTheCurrentLimitIsRefusedBeforeEnergising() throws Exception {
        Host h = new Host("sim:bench-4");
        // 24 V into 1.5 + 0.1 ohm would be 15 A, above the 5 A limit
        Frame f = h.ask(1, "STEP 1 2 volts=24 ms=10 rate_hz=10000");
        assertTrue(f.text().startsWith("7 OVER_LIMIT"), f.text());
        assertFalse(h.link.rig().energised());
    }

    @Test
    void malformedCommandsGetTheirErrorCodes() throws Exception {
        Host h = new Host("sim:bench-4");
        assertTrue(h.ask(1, "FROB").text().startsWith("1 UNKNOWN_COMMAND"));
        assertTrue(h.ask(2, "SWEEP from=10 to=100 seconds=1 microsteps=3 rate_hz=1000").text()
                .startsWith("2 BAD_ARGUMENT microsteps=3"));
        assertTrue(h.ask(4, "RESEND seq=0").text().startsWith("6 BLOCK_GONE"));
        assertTrue(h.ask(3, "HELLO 2").text().startsWith("10 VERSION"));
    }

    @Test
    void aCommandAsLongAsAFrameAllowsGetsAnErrorThatFitsAndTheRigLivesOn() throws Exception {
        Host h = new Host("sim:bench-4");
        // one valid frame with a 4096-byte unknown command: the error may repeat only a little of it
        Frame f = h.ask(9, "X".repeat(FrameCodec.MAX_PAYLOAD_BYTES));
        assertEquals(Frame.ERROR, f.type());
        assertTrue(f.text().startsWith("1 UNKNOWN_COMMAND"), f.text());
        assertTrue(f.payload().length <= 256, f.payload().length + " bytes");
        assertEquals("OK", h.ask(10, "PING").text());
    }

    @Test
    void aStreamSlowerThanTheReplyTimeoutIsWaitedForNotGivenUp() throws Exception {
        Transports.SimLink link = Transports.openSim("sim:bench-4?realtime=1");
        try (RigClient c = RigClient.connect(link.host(), RigClient.Settings.DEFAULT)) {
            // 500 Hz, one channel: a 1020-frame block every 2 s, twice the host's 1 s reply timeout; the rig
            // answers an early re-request BLOCK_GONE (not sent yet), which is not a lost block
            RigCapture cap = c.backEmf(java.util.List.of(new int[] {1, 2}), 4.5, 500, RigClient.Progress.NONE);
            assertEquals(2250, cap.signal().length());
        }
    }

    @Test
    void clientSurfacesARefusalAsItsErrorCode() throws Exception {
        try (RigClient c = RigClient.open("sim:bench-4")) {
            RigRefusedException e = assertThrows(RigRefusedException.class,
                    () -> c.stepResponse(1, 2, 24, 10, 10000, RigClient.Progress.NONE));
            assertEquals(RigError.OVER_LIMIT, e.error());
        }
    }

    @Test
    void hostSilentDuringARealTimeSweepStopsItAndSwitchesOff() throws Exception {
        Host h = new Host("sim:gantry-axis?realtime=1");
        Frame header = h.ask(1, "SWEEP from=20 to=100 seconds=10 microsteps=1 rate_hz=1000");
        assertEquals(Frame.REPLY, header.type(), header.text());
        assertTrue(h.link.rig().energised(), "the sweep drives the motor");
        // the host stops talking (it keeps reading, as a host whose sender died would)
        Frame end = null;
        long deadline = System.nanoTime() + 6_000_000_000L;
        while (end == null && System.nanoTime() < deadline) {
            Frame f = h.in.next(100);
            if (f != null && f.type() == Frame.END) {
                end = f;
            }
        }
        assertNotNull(end, "the stream ends");
        assertTrue(end.text().contains("status=watchdog"), end.text());
        assertFalse(h.link.rig().energised());
        assertEquals("watchdog", h.link.rig().lastSafeReason());
    }

    @Test
    void keepAlivePingsCarryARealTimeSweepPastTheWatchdog() throws Exception {
        Transports.SimLink link = Transports.openSim("sim:gantry-axis?realtime=1");
        try (RigClient c = RigClient.connect(link.host(), RigClient.Settings.DEFAULT)) {
            // 2.6 s of real time, longer than the 2 s watchdog
            RigCapture cap = c.sweep(new SweepPlan(20, 60, 2.6, 1, 1000), RigClient.Progress.NONE);
            assertEquals(2600, cap.signal().length());
            assertEquals(0, link.rig().safeEvents());
        }
    }
}
