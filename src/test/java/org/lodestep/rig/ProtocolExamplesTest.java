package org.lodestep.rig;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.HexFormat;
import java.util.List;

import org.junit.jupiter.api.Test;

/**
 * The worked examples of firmware-protocol.md 1.1 against the virtual rig: the frames it sends carry the texts the
 * specification shows, and those texts encode to the bytes shown there, which were computed independently with
 * Python's zlib.crc32 and struct.pack, not with this codec.
 */
class ProtocolExamplesTest {

    private static String hex(Frame f) {
        return HexFormat.ofDelimiter(" ").withUpperCase().formatHex(FrameCodec.encode(f));
    }

    private static final class Host {
        final Transports.SimLink link;
        final FrameReader in;

        Host(String address) throws Exception {
            link = Transports.openSim(address);
            in = new FrameReader(link.host());
        }

        void send(int tag, String text) throws Exception {
            link.host().write(FrameCodec.encode(Frame.text(Frame.COMMAND, tag, text)));
        }

        Frame ask(int tag, String text) throws Exception {
            send(tag, text);
            return until(tag, 3000);
        }

        Frame until(int tag, int ms) throws Exception {
            while (true) {
                Frame f = in.next(ms);
                assertNotNull(f, "nothing tagged " + tag);
                if (f.tag() == tag) {
                    return f;
                }
            }
        }
    }

    @Test
    void crcResidueOfAnIntactFrameIsTheCataloguesResidueAfterTheFinalXor() {
        // G. Cook, Catalogue of parametrised CRC algorithms, CRC-32/ISO-HDLC: residue 0xDEBB20E3 before the final
        // XOR; a finished CRC over an intact frame's bytes 2.. (its CRC included) gives it XOR 0xFFFFFFFF
        byte[] ping = FrameCodec.encode(Frame.text(Frame.COMMAND, 1, "PING"));
        assertEquals(0xDEBB20E3L ^ 0xFFFFFFFFL, FrameCodec.crc32(ping, 2, ping.length - 2));
        assertEquals(0x2144DF1CL, FrameCodec.crc32(ping, 2, ping.length - 2));
    }

    @Test
    void handshakeAndRefusalBeforeHelloMatchExampleTwo() throws Exception {
        Host h = new Host("sim:salvage-8");
        Frame refused = h.ask(1, "CAPS");
        // firmware-protocol.md, example 2; bytes from Python's zlib.crc32
        assertEquals("A5 3C 45 01 29 00 31 30 20 56 45 52 53 49 4F 4E 20 6E 6F 20 73 65 73 73 69 6F 6E 3A 20 73 65 6E"
                + " 64 20 48 45 4C 4C 4F 20 31 20 66 69 72 73 74 F4 17 15 AE", hex(refused));
        Frame hello = h.ask(2, "HELLO 1 minor=1");
        assertEquals("OK proto=1 minor=1 rig=lodestep-virtual-rig fw=0.1.0 id=VR-KL-SALV-0417", hello.text());
        assertTrue(hex(hello).endsWith("34 31 37 04 05 FC 2F"), hex(hello));
        assertEquals("A5 3C 43 02 0F 00 48 45 4C 4C 4F 20 31 20 6D 69 6E 6F 72 3D 31 B5 F6 79 03",
                hex(Frame.text(Frame.COMMAND, 2, "HELLO 1 minor=1")));
    }

    @Test
    void stopDuringAStreamAndTheReRequestsMatchExamplesSevenAndEight() throws Exception {
        Host h = new Host("sim:salvage-8?realtime=1");
        h.ask(2, "HELLO 1 minor=1");
        Frame header = h.ask(10, "EMF pairs=1-2 seconds=1.5 rate_hz=2000");
        assertEquals("OK stream rate_hz=2000 frames=3000 block_frames=1020 blocks=3 channels=emf_1_2:v:0.001",
                header.text());
        Frame b0 = h.until(10, 3000);
        assertEquals(Frame.BLOCK, b0.type());
        h.send(11, "STOP");
        List<Frame> after = new ArrayList<>();
        while (after.stream().noneMatch(f -> f.type() == Frame.END)) {
            Frame f = h.in.next(3000);
            assertNotNull(f);
            if (f.tag() != 0) {
                after.add(f);
            }
        }
        // the STOP's answer first, then the end; bytes of example 7 from Python's zlib.crc32
        assertEquals("A5 3C 52 0B 07 00 4F 4B 20 73 61 66 65 9F 64 29 FF", hex(after.get(0)));
        Frame end = after.get(1);
        assertEquals("END status=stopped blocks=3 frames=3000 sent=1", end.text());
        assertTrue(hex(end).endsWith("BD C5 DA 4B"), hex(end));
        assertEquals("2 BAD_ARGUMENT seq=x7 is not an integer", h.ask(16, "RESEND seq=x7").text());
        h.send(17, "RESEND seq=3");
        assertEquals(end.text(), h.until(10, 2000).text());
        assertEquals("6 BLOCK_GONE block 2 has not been sent", h.ask(18, "RESEND seq=2").text());
    }

    @Test
    void insulationDwellCutShortMatchesExampleNine() throws Exception {
        Host h = new Host("sim:bench-4?realtime=1");
        h.ask(2, "HELLO 1 minor=1");
        String token = Fields.parse(h.ask(12, "INS ARM lead=1 volts=100").text()).get("token");
        h.send(13, "INS FIRE token=" + token + " seconds=60");
        assertEquals("OK busy", h.ask(0, "PING").text());
        assertEquals("3 BUSY an insulation test is running; only PING, RESEND, STOP and SAFE",
                h.ask(14, "RES 1 2").text());
        assertTrue(h.link.rig().energised(), "the test voltage is on during the dwell");
        assertEquals("OK safe", h.ask(15, "STOP").text());
        Frame fire = h.until(13, 3000);
        assertEquals("11 STOPPED insulation test cut short (stopped); supply off, winding discharged; no reading",
                fire.text());
        assertTrue(!h.link.rig().energised());
        // example 9's bytes for this answer, from Python's zlib.crc32
        assertTrue(hex(fire).endsWith("6E 6F 20 72 65 61 64 69 6E 67 2B 6F 26 EE"), hex(fire));
    }

    @Test
    void aDamagedLengthIsDroppedAndTheRetryIsAnsweredAsInExampleTwelve() throws Exception {
        Host h = new Host("sim:bench-4");
        h.ask(2, "HELLO 1");
        h.link.host().write(HexFormat.ofDelimiter(" ").parseHex("A5 3C 43 13 07 10 52 45 53 20 31 20 32 C1 1A 71 C0"));
        // the length was 3847 instead of 7: the rig gives the frame up after its timeouts and hears the retry
        h.link.host().write(HexFormat.ofDelimiter(" ").parseHex("A5 3C 43 13 07 0F 52 45 53 20 31 20 32 C1 1A 71 C0"));
        Thread.sleep(FrameCodec.FRAME_TIMEOUT_MS + 200L); // the host's reply timeout before its retry
        Frame f = h.ask(19, "RES 1 2");
        assertTrue(f.text().startsWith("OK ohm="), f.text());
    }
}
