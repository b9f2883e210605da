package org.lodestep.rig;

import java.nio.ByteBuffer;
import java.nio.ByteOrder;

/**
 * One binary block of a stream. Payload layout (little-endian): u32 sequence number (0, 1, 2, ...), u16 frame count,
 * u8 channel count, u8 sample format (1 = signed 16-bit), then the samples interleaved frame by frame. A sample's
 * value is its count times the channel's lsb from the {@link StreamSpec}.
 */
record SampleBlock(int seq, int frames, int channels, short[] samples) {
    static final int HEADER_BYTES = 8;
    static final int FORMAT_INT16 = 1;

    SampleBlock {
        if (seq < 0 || frames < 1 || channels < 1 || samples.length != frames * channels) {
            throw new IllegalArgumentException("inconsistent block: seq " + seq + ", " + frames + " frames x "
                    + channels + " channels, " + samples.length + " samples");
        }
    }

    byte[] encode() {
        ByteBuffer b = ByteBuffer.allocate(HEADER_BYTES + 2 * samples.length).order(ByteOrder.LITTLE_ENDIAN);
        b.putInt(seq).putShort((short) frames).put((byte) channels).put((byte) FORMAT_INT16);
        for (short s : samples) {
            b.putShort(s);
        }
        return b.array();
    }

    /** Decodes a block payload; throws when the payload is inconsistent with itself. */
    static SampleBlock decode(byte[] payload) throws RigException {
        if (payload.length < HEADER_BYTES) {
            throw new RigException("sample block of " + payload.length + " bytes is shorter than its header");
        }
        ByteBuffer b = ByteBuffer.wrap(payload).order(ByteOrder.LITTLE_ENDIAN);
        long seq = b.getInt() & 0xFFFFFFFFL;
        int frames = b.getShort() & 0xFFFF;
        int channels = b.get() & 0xFF;
        int format = b.get() & 0xFF;
        if (format != FORMAT_INT16) {
            throw new RigException("sample block format " + format + " is not 1 (signed 16-bit)");
        }
        if (seq > Integer.MAX_VALUE || frames == 0 || channels == 0
                || payload.length != HEADER_BYTES + 2 * frames * channels) {
            throw new RigException("sample block header (seq " + seq + ", " + frames + " frames x " + channels
                    + " channels) does not match its " + payload.length + " bytes");
        }
        short[] s = new short[frames * channels];
        b.asShortBuffer().get(s);
        return new SampleBlock((int) seq, frames, channels, s);
    }
}
