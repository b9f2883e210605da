package org.lodestep.rig;

import java.nio.charset.StandardCharsets;
import java.util.Objects;

/**
 * One protocol frame: a type, the tag of the command it belongs to, and a payload (ASCII text for commands, replies,
 * errors and stream ends; binary for sample blocks). Layout on the wire: {@link FrameCodec}.
 */
record Frame(byte type, int tag, byte[] payload) {
    /** Host to rig: a command line in ASCII. */
    static final byte COMMAND = 'C';
    /** Rig to host: the answer to a command, ASCII {@code OK ...}. */
    static final byte REPLY = 'R';
    /** Rig to host: a refusal or failure, ASCII {@code <code> <NAME> <text>}. */
    static final byte ERROR = 'E';
    /** Rig to host: a binary sample block of a stream. */
    static final byte BLOCK = 'B';
    /** Rig to host: the end of a stream, ASCII {@code END ...}. */
    static final byte END = 'Z';

    Frame {
        Objects.requireNonNull(payload, "payload");
        if (tag < 0 || tag > 255) {
            throw new IllegalArgumentException("tag must be 0..255, got " + tag);
        }
        if (payload.length > FrameCodec.MAX_PAYLOAD_BYTES) {
            throw new IllegalArgumentException("payload of " + payload.length + " bytes exceeds "
                    + FrameCodec.MAX_PAYLOAD_BYTES);
        }
        if (type != COMMAND && type != REPLY && type != ERROR && type != BLOCK && type != END) {
            throw new IllegalArgumentException("unknown frame type 0x" + Integer.toHexString(type & 0xFF));
        }
    }

    static Frame text(byte type, int tag, String text) {
        return new Frame(type, tag, text.getBytes(StandardCharsets.US_ASCII));
    }

    /** The payload as ASCII text (for every type except {@link #BLOCK}). */
    String text() {
        return new String(payload, StandardCharsets.US_ASCII);
    }

    @Override
    public String toString() {
        return (char) type + "#" + tag + (type == BLOCK ? " [" + payload.length + " bytes]" : " " + text());
    }
}
