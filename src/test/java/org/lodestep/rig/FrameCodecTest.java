package org.lodestep.rig;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;

import java.io.ByteArrayOutputStream;
import java.nio.charset.StandardCharsets;
import java.util.HexFormat;

import org.junit.jupiter.api.Test;

class FrameCodecTest {

    private static byte[] ascii(String s) {
        return s.getBytes(StandardCharsets.US_ASCII);
    }

    /** A reader over fixed bytes, fed in pieces of {@code chunk} bytes. */
    private static FrameReader readerOf(byte[] bytes, int chunk) {
        PipeTransport[] p = PipeTransport.pair("test:", bytes.length + 16);
        try {
            for (int i = 0; i < bytes.length; i += chunk) {
                p[1].write(bytes, i, Math.min(chunk, bytes.length - i));
            }
        } catch (java.io.IOException e) {
            throw new AssertionError(e);
        }
        return new FrameReader(p[0]);
    }

    @Test
    void crcIsTheIsoHdlcVariantWithItsCatalogueCheckValue() {
        // G. Cook, Catalogue of parametrised CRC algorithms: CRC-32/ISO-HDLC check over "123456789" = 0xCBF43926
        // (Cook, Catalogue of parametrised CRC algorithms, references §21)
        assertEquals(0xCBF43926L, FrameCodec.crc32(ascii("123456789"), 0, 9));
        // same catalogue conventions: CRC of the empty input is 0x00000000 (item 21, computed)
        assertEquals(0x00000000L, FrameCodec.crc32(new byte[0], 0, 0));
    }

    @Test
    void crcOverMessageAndItsCrcGivesTheFixedResidue() {
        // item 21: CRC-32 over "123456789" + 26 39 F4 CB = 0x2144DF1C (bitwise NOT of residue 0xDEBB20E3)
        byte[] m = {'1', '2', '3', '4', '5', '6', '7', '8', '9', 0x26, 0x39, (byte) 0xF4, (byte) 0xCB};
        assertEquals(0x2144DF1CL, FrameCodec.crc32(m, 0, m.length));
    }

    @Test
    void pingFrameHasTheBytesOfTheWorkedExample() {
        // firmware-protocol.md, worked example 1; bytes computed independently with Python's zlib.crc32 (the same
        // CRC-32/ISO-HDLC variant), not with this codec
        byte[] b = FrameCodec.encode(Frame.text(Frame.COMMAND, 1, "PING"));
        assertEquals("a53c4301040050494e47905cd2cd", HexFormat.of().formatHex(b));
    }

    @Test
    void sampleBlockOfTheWorkedExampleDecodes() throws Exception {
        // firmware-protocol.md, worked example of a sample block; bytes from Python's struct + zlib.crc32
        byte[] wire = HexFormat.of().parseHex("a53c420814000000000002000301" + "0c00b7f28813f9ffbaf28813" + "a144c4c3");
        Frame f = readerOf(wire, 5).next(100);
        SampleBlock b = SampleBlock.decode(f.payload());
        assertEquals(0, b.seq());
        assertArrayEquals(new short[] {12, -3401, 5000, -7, -3398, 5000}, b.samples());
        assertArrayEquals(wire, FrameCodec.encode(f));
    }

    @Test
    void everyFrameTypeRoundTripsIncludingEmptyAndLargestPayloads() throws Exception {
        ByteArrayOutputStream all = new ByteArrayOutputStream();
        Frame[] frames = {
            Frame.text(Frame.COMMAND, 0, "PING"),
            Frame.text(Frame.REPLY, 255, "OK ohm=1.2500"),
            Frame.text(Frame.ERROR, 7, "2 BAD_ARGUMENT lead '9' is not 1..8"),
            new Frame(Frame.BLOCK, 8, new byte[FrameCodec.MAX_PAYLOAD_BYTES]),
            new Frame(Frame.END, 9, new byte[0]),
        };
        for (Frame f : frames) {
            all.writeBytes(FrameCodec.encode(f));
        }
        FrameReader r = readerOf(all.toByteArray(), 7);
        for (Frame f : frames) {
            Frame g = r.next(100);
            assertEquals(f.type(), g.type());
            assertEquals(f.tag(), g.tag());
            assertArrayEquals(f.payload(), g.payload());
        }
        assertNull(r.next(10));
        assertEquals(0, r.damagedFrames());
    }

    @Test
    void frameWithBadCrcIsSkippedAndTheNextOneIsFound() throws Exception {
        byte[] bad = FrameCodec.encode(Frame.text(Frame.REPLY, 1, "OK ohm=1.25"));
        bad[8] ^= 0x10;
        byte[] good = FrameCodec.encode(Frame.text(Frame.REPLY, 2, "OK ohm=2.50"));
        FrameReader r = readerOf(concat(bad, good), 64);
        Frame f = r.next(100);
        assertEquals(2, f.tag());
        assertEquals(1, r.damagedFrames());
    }

    @Test
    void impossibleLengthIsTreatedAsDamageNotAsAHugeWait() throws Exception {
        byte[] bogus = {(byte) 0xA5, 0x3C, 'R', 1, (byte) 0xFF, (byte) 0xFF, 1, 2, 3};
        byte[] good = FrameCodec.encode(Frame.text(Frame.REPLY, 3, "OK"));
        FrameReader r = readerOf(concat(bogus, good), 5);
        assertEquals(3, r.next(100).tag());
        assertEquals(1, r.damagedFrames());
    }

    @Test
    void unknownTypeAndLineNoiseBeforeAFrameAreSkipped() throws Exception {
        byte[] noise = {0x00, (byte) 0xA5, 0x11, (byte) 0xA5, 0x3C, 'Q', 0, 0, 0, 0x41, 0x42};
        byte[] good = FrameCodec.encode(Frame.text(Frame.REPLY, 4, "OK"));
        FrameReader r = readerOf(concat(noise, good), 3);
        assertEquals(4, r.next(100).tag());
    }

    @Test
    void truncatedFrameYieldsTimeoutNotAFrame() throws Exception {
        byte[] f = FrameCodec.encode(Frame.text(Frame.REPLY, 5, "OK ohm=1.25"));
        byte[] cut = java.util.Arrays.copyOf(f, f.length - 3);
        FrameReader r = readerOf(cut, 4);
        assertNull(r.next(30));
    }

    @Test
    void frameRejectsOversizePayloadAndUnknownType() {
        org.junit.jupiter.api.Assertions.assertThrows(IllegalArgumentException.class,
                () -> new Frame(Frame.BLOCK, 1, new byte[FrameCodec.MAX_PAYLOAD_BYTES + 1]));
        org.junit.jupiter.api.Assertions.assertThrows(IllegalArgumentException.class,
                () -> new Frame((byte) 'X', 1, new byte[0]));
        org.junit.jupiter.api.Assertions.assertThrows(IllegalArgumentException.class,
                () -> new Frame(Frame.REPLY, 256, new byte[0]));
    }

    private static byte[] concat(byte[] a, byte[] b) {
        byte[] c = java.util.Arrays.copyOf(a, a.length + b.length);
        System.arraycopy(b, 0, c, a.length, b.length);
        return c;
    }
}
