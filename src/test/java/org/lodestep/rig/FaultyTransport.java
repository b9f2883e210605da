package org.lodestep.rig;

import java.io.IOException;
import java.util.Random;

/**
 * Test double: wraps the host's end of a line and damages what the host receives (flipped bits, dropped bytes,
 * delays, a disconnect after a byte count), reproducibly from a seed.
 */
final class FaultyTransport implements Transport {
    private final Transport inner;
    private final Random random;
    private final double flipPerByte;
    private final double dropPerByte;
    private final int delayMs;
    private final long disconnectAfterBytes;
    private long delivered;
    private volatile boolean corruptEverything;

    FaultyTransport(Transport inner, long seed, double flipPerByte, double dropPerByte, int delayMs,
                    long disconnectAfterBytes) {
        this.inner = inner;
        this.random = new Random(seed);
        this.flipPerByte = flipPerByte;
        this.dropPerByte = dropPerByte;
        this.delayMs = delayMs;
        this.disconnectAfterBytes = disconnectAfterBytes;
    }

    private long corruptAfterBytes = Long.MAX_VALUE;

    /** From now on, flip a bit in every byte received (a line gone bad). */
    void corruptEverything() {
        corruptEverything = true;
    }

    /** Flip a bit in every byte received after this many bytes (a line that goes bad mid-stream). */
    void corruptAfter(long bytes) {
        corruptAfterBytes = bytes;
    }

    @Override
    public String address() {
        return inner.address();
    }

    @Override
    public void write(byte[] bytes, int offset, int length) throws IOException {
        if (delivered >= disconnectAfterBytes) {
            throw new IOException("disconnected");
        }
        inner.write(bytes, offset, length);
    }

    @Override
    public int read(byte[] dest, int offset, int length, int timeoutMs) throws IOException {
        if (delivered >= disconnectAfterBytes) {
            inner.close(); // the far end sees the line drop
            return -1;
        }
        if (delayMs > 0) {
            try {
                Thread.sleep(delayMs);
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
                throw new IOException(e);
            }
        }
        byte[] tmp = new byte[(int) Math.min(length, Math.max(1, disconnectAfterBytes - delivered))];
        int n = inner.read(tmp, 0, tmp.length, timeoutMs);
        if (n <= 0) {
            return n;
        }
        delivered += n;
        int out = 0;
        for (int i = 0; i < n; i++) {
            if (random.nextDouble() < dropPerByte) {
                continue;
            }
            byte b = tmp[i];
            if (corruptEverything || delivered - n + i >= corruptAfterBytes || random.nextDouble() < flipPerByte) {
                b ^= (byte) (1 << random.nextInt(8));
            }
            dest[offset + out++] = b;
        }
        return out;
    }

    @Override
    public void close() throws IOException {
        inner.close();
    }
}
