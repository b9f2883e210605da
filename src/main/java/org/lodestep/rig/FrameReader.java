package org.lodestep.rig;

import java.io.EOFException;
import java.io.IOException;

/**
 * Decodes frames from a {@link Transport}, resynchronising on the sync bytes after any damage: a frame whose length
 * field is impossible or whose CRC does not match is counted and skipped, never returned.
 */
final class FrameReader {
    /** What {@link #next} found. */
    enum Kind { FRAME, TIMEOUT }

    private final Transport transport;
    private byte[] buf = new byte[16384];
    private int start;
    private int end;
    private long damagedFrames;
    private long bytesRead;

    FrameReader(Transport transport) {
        this.transport = transport;
    }

    /** Frames dropped so far because their CRC or length was wrong. */
    long damagedFrames() {
        return damagedFrames;
    }

    /** Bytes received so far. */
    long bytesRead() {
        return bytesRead;
    }

    /**
     * The next intact frame, or null when {@code timeoutMs} passed without one.
     *
     * @throws EOFException when the far end closed the line
     */
    Frame next(int timeoutMs) throws IOException {
        long deadline = System.nanoTime() + timeoutMs * 1_000_000L;
        boolean looked = false;
        while (true) {
            Frame f = tryDecode();
            if (f != null) {
                return f;
            }
            long leftMs = (deadline - System.nanoTime()) / 1_000_000L;
            if (leftMs <= 0 && looked) {
                return null;
            }
            fill((int) Math.max(0, leftMs));
            looked = true;
        }
    }

    /** Returns a frame already buffered, without waiting, or null. */
    Frame poll() throws IOException {
        Frame f = tryDecode();
        if (f != null) {
            return f;
        }
        fill(0);
        return tryDecode();
    }

    private void fill(int timeoutMs) throws IOException {
        if (end == buf.length) {
            if (start > 0) {
                System.arraycopy(buf, start, buf, 0, end - start);
                end -= start;
                start = 0;
            } else {
                byte[] bigger = new byte[buf.length * 2];
                System.arraycopy(buf, 0, bigger, 0, end);
                buf = bigger;
            }
        }
        int n = transport.read(buf, end, buf.length - end, timeoutMs);
        if (n < 0) {
            throw new EOFException(transport.address() + ": the line was closed");
        }
        end += n;
        bytesRead += n;
    }

    private Frame tryDecode() {
        while (true) {
            // find sync
            int s = start;
            while (s + 1 < end && !((buf[s] & 0xFF) == FrameCodec.SYNC0 && (buf[s + 1] & 0xFF) == FrameCodec.SYNC1)) {
                s++;
            }
            if (s + 1 >= end) {
                // keep a trailing SYNC0 that may start a frame
                start = (s < end && (buf[s] & 0xFF) == FrameCodec.SYNC0) ? s : end;
                if (start == end) {
                    start = 0;
                    end = 0;
                }
                return null;
            }
            start = s;
            if (end - start < FrameCodec.HEADER_BYTES) {
                return null;
            }
            byte type = buf[start + 2];
            int tag = buf[start + 3] & 0xFF;
            int n = (buf[start + 4] & 0xFF) | (buf[start + 5] & 0xFF) << 8;
            if (n > FrameCodec.MAX_PAYLOAD_BYTES || !knownType(type)) {
                damaged();
                continue;
            }
            int total = FrameCodec.OVERHEAD_BYTES + n;
            if (end - start < total) {
                return null;
            }
            int c = start + FrameCodec.HEADER_BYTES + n;
            long got = (buf[c] & 0xFFL) | (buf[c + 1] & 0xFFL) << 8 | (buf[c + 2] & 0xFFL) << 16
                    | (buf[c + 3] & 0xFFL) << 24;
            long want = FrameCodec.crc32(buf, start + 2, FrameCodec.HEADER_BYTES - 2 + n);
            if (got != want) {
                damaged();
                continue;
            }
            byte[] payload = new byte[n];
            System.arraycopy(buf, start + FrameCodec.HEADER_BYTES, payload, 0, n);
            start += total;
            return new Frame(type, tag, payload);
        }
    }

    private void damaged() {
        damagedFrames++;
        start += 1; // resynchronise on the next sync pair after this one
    }

    private static boolean knownType(byte t) {
        return t == Frame.COMMAND || t == Frame.REPLY || t == Frame.ERROR || t == Frame.BLOCK || t == Frame.END;
    }
}
