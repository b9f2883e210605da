package org.lodestep.rig;

import java.io.EOFException;
import java.io.IOException;
import java.util.function.LongSupplier;

/**
 * Decodes frames from a {@link Transport}, resynchronising on the sync bytes after any damage: a frame whose length
 * field is impossible or whose CRC does not match is counted and skipped, never returned. A partial frame is
 * abandoned the same way when its bytes stop coming ({@link FrameCodec#INTER_BYTE_TIMEOUT_MS}) or when it is not
 * whole within {@link FrameCodec#FRAME_TIMEOUT_MS}, so a damaged length byte never makes the reader wait for bytes
 * that will not come.
 */
final class FrameReader {
    private final Transport transport;
    private final LongSupplier clockNanos;
    private byte[] buf = new byte[16384];
    private int start;
    private int end;
    private long damagedFrames;
    private long abandonedFrames;
    private long bytesRead;
    /** Whether the bytes at {@code start} are the beginning of a frame not yet whole. */
    private boolean pending;
    private long pendingSinceNanos;
    private long lastByteNanos;

    FrameReader(Transport transport) {
        this(transport, System::nanoTime);
    }

    /** With a clock of its own, so tests can step time instead of waiting for it. */
    FrameReader(Transport transport, LongSupplier clockNanos) {
        this.transport = transport;
        this.clockNanos = clockNanos;
    }

    /** Frames dropped so far because their CRC or length was wrong, or because they stayed incomplete. */
    long damagedFrames() {
        return damagedFrames;
    }

    /** Of {@link #damagedFrames()}, those dropped because their bytes stopped coming. */
    long abandonedFrames() {
        return abandonedFrames;
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
        long deadline = clockNanos.getAsLong() + timeoutMs * 1_000_000L;
        boolean looked = false;
        while (true) {
            Frame f = tryDecode();
            if (f != null) {
                return f;
            }
            long now = clockNanos.getAsLong();
            long leftMs = (deadline - now) / 1_000_000L;
            if (leftMs <= 0 && looked) {
                return null;
            }
            int wait = (int) Math.max(0, leftMs);
            if (pending) {
                wait = (int) Math.max(1, Math.min(wait, msUntilAbandon(now)));
            }
            int n = fill(wait);
            looked = true;
            if (n == 0) {
                abandonIfStale();
            }
        }
    }

    /** Returns a frame already buffered, without waiting, or null. */
    Frame poll() throws IOException {
        Frame f = tryDecode();
        if (f != null) {
            return f;
        }
        if (fill(0) == 0) {
            abandonIfStale();
        }
        return tryDecode();
    }

    private long msUntilAbandon(long now) {
        long byGap = lastByteNanos + FrameCodec.INTER_BYTE_TIMEOUT_MS * 1_000_000L - now;
        long byFrame = pendingSinceNanos + FrameCodec.FRAME_TIMEOUT_MS * 1_000_000L - now;
        return Math.max(0, Math.min(byGap, byFrame) / 1_000_000L + 1);
    }

    /** Drops the partial frame at the front once its time is up; judged only when the line has nothing more. */
    private void abandonIfStale() {
        long now = clockNanos.getAsLong();
        if (pending && (now - lastByteNanos >= FrameCodec.INTER_BYTE_TIMEOUT_MS * 1_000_000L
                || now - pendingSinceNanos >= FrameCodec.FRAME_TIMEOUT_MS * 1_000_000L)) {
            abandonedFrames++;
            damaged();
        }
    }

    private int fill(int timeoutMs) throws IOException {
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
        if (n > 0) {
            lastByteNanos = clockNanos.getAsLong();
        }
        end += n;
        bytesRead += n;
        return n;
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
                int keep = (s < end && (buf[s] & 0xFF) == FrameCodec.SYNC0) ? s : end;
                if (keep != start) {
                    pending = false;
                }
                markPending(keep < end);
                start = keep;
                if (start == end) {
                    start = 0;
                    end = 0;
                }
                return null;
            }
            if (s != start) {
                pending = false;
            }
            start = s;
            if (end - start < FrameCodec.HEADER_BYTES) {
                markPending(true);
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
                markPending(true);
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
            pending = false;
            return new Frame(type, tag, payload);
        }
    }

    /** Notes that the bytes at {@code start} begin a frame not yet whole (its clock starts once). */
    private void markPending(boolean partial) {
        if (!partial) {
            pending = false;
        } else if (!pending) {
            pending = true;
            pendingSinceNanos = lastByteNanos; // the fill that brought its first bytes
        }
    }

    private void damaged() {
        damagedFrames++;
        pending = false;
        start += 1; // resynchronise on the next sync pair after this one
    }

    private static boolean knownType(byte t) {
        return t == Frame.COMMAND || t == Frame.REPLY || t == Frame.ERROR || t == Frame.BLOCK || t == Frame.END;
    }
}
