package org.lodestep.rig;

import java.util.zip.CRC32;

/**
 * Encodes frames for the wire. Layout (all multi-byte fields little-endian):
 *
 * <pre>
 * offset  size  field
 * 0       2     sync 0xA5 0x3C
 * 2       1     type ('C', 'R', 'E', 'B', 'Z')
 * 3       1     tag 0..255
 * 4       2     payload length n, 0..4096
 * 6       n     payload
 * 6+n     4     CRC-32/ISO-HDLC over bytes 2 .. 5+n (type, tag, length, payload)
 * </pre>
 *
 * <p>CRC-32/ISO-HDLC is the common CRC-32 (poly 0x04C11DB7, init and xorout 0xFFFFFFFF, reflected); its check value
 * over ASCII {@code 123456789} is 0xCBF43926 (G. Cook, Catalogue of parametrised CRC algorithms). The JDK's
 * {@link CRC32} implements exactly this variant.
 */
final class FrameCodec {
    static final int SYNC0 = 0xA5;
    static final int SYNC1 = 0x3C;
    static final int HEADER_BYTES = 6;
    static final int CRC_BYTES = 4;
    /** Bytes a frame adds around its payload. */
    static final int OVERHEAD_BYTES = HEADER_BYTES + CRC_BYTES;
    static final int MAX_PAYLOAD_BYTES = 4096;
    /**
     * A receiver abandons a partial frame when no byte of it has arrived for this long, ms (firmware-protocol.md,
     * section 2): a sender writes a frame's bytes back to back, so a gap means the rest is lost or the length is
     * damaged, and waiting for bytes that never come would stall the line.
     */
    static final int INTER_BYTE_TIMEOUT_MS = 100;
    /** A receiver abandons a partial frame this long after its first byte, ms, whatever arrives meanwhile. */
    static final int FRAME_TIMEOUT_MS = 500;

    private FrameCodec() {
    }

    static byte[] encode(Frame f) {
        int n = f.payload().length;
        byte[] out = new byte[OVERHEAD_BYTES + n];
        out[0] = (byte) SYNC0;
        out[1] = (byte) SYNC1;
        out[2] = f.type();
        out[3] = (byte) f.tag();
        out[4] = (byte) n;
        out[5] = (byte) (n >>> 8);
        System.arraycopy(f.payload(), 0, out, HEADER_BYTES, n);
        long crc = crc32(out, 2, HEADER_BYTES - 2 + n);
        int p = HEADER_BYTES + n;
        out[p] = (byte) crc;
        out[p + 1] = (byte) (crc >>> 8);
        out[p + 2] = (byte) (crc >>> 16);
        out[p + 3] = (byte) (crc >>> 24);
        return out;
    }

    /** CRC-32/ISO-HDLC of {@code length} bytes from {@code offset}. */
    static long crc32(byte[] b, int offset, int length) {
        CRC32 c = new CRC32();
        c.update(b, offset, length);
        return c.getValue();
    }
}
