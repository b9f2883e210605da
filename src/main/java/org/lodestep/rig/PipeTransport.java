package org.lodestep.rig;

import java.io.IOException;
import java.util.concurrent.locks.Condition;
import java.util.concurrent.locks.ReentrantLock;

/** One end of an in-process byte pipe pair; what {@code sim:} addresses use to reach the virtual rig. */
final class PipeTransport implements Transport {
    private final String address;
    private final Buffer in;
    private final Buffer out;

    private PipeTransport(String address, Buffer in, Buffer out) {
        this.address = address;
        this.in = in;
        this.out = out;
    }

    /** Two connected ends: bytes written to one are read from the other. */
    static PipeTransport[] pair(String address, int capacityBytes) {
        Buffer a = new Buffer(capacityBytes);
        Buffer b = new Buffer(capacityBytes);
        return new PipeTransport[] {new PipeTransport(address, a, b), new PipeTransport(address + " (rig side)", b, a)};
    }

    @Override
    public String address() {
        return address;
    }

    @Override
    public void write(byte[] bytes, int offset, int length) throws IOException {
        out.put(bytes, offset, length, address);
    }

    @Override
    public int read(byte[] dest, int offset, int length, int timeoutMs) throws IOException {
        return in.take(dest, offset, length, timeoutMs);
    }

    @Override
    public void close() {
        in.close();
        out.close();
    }

    /** A bounded ring buffer; a writer blocks while it is full, as a line with flow control would. */
    private static final class Buffer {
        private final byte[] ring;
        private int head;
        private int size;
        private boolean closed;
        private final ReentrantLock lock = new ReentrantLock();
        private final Condition changed = lock.newCondition();

        Buffer(int capacity) {
            ring = new byte[capacity];
        }

        void put(byte[] b, int off, int len, String address) throws IOException {
            lock.lock();
            try {
                int i = 0;
                while (i < len) {
                    if (closed) {
                        throw new IOException(address + ": the line was closed");
                    }
                    if (size == ring.length) {
                        changed.await();
                        continue;
                    }
                    int tail = (head + size) % ring.length;
                    int n = Math.min(len - i, Math.min(ring.length - size, ring.length - tail));
                    System.arraycopy(b, off + i, ring, tail, n);
                    size += n;
                    i += n;
                    changed.signalAll();
                }
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
                throw new IOException(address + ": interrupted while writing", e);
            } finally {
                lock.unlock();
            }
        }

        int take(byte[] d, int off, int len, int timeoutMs) throws IOException {
            lock.lock();
            try {
                long nanos = timeoutMs * 1_000_000L;
                while (size == 0) {
                    if (closed) {
                        return -1;
                    }
                    if (nanos <= 0) {
                        return 0;
                    }
                    nanos = changed.awaitNanos(nanos);
                }
                int n = Math.min(len, Math.min(size, ring.length - head));
                System.arraycopy(ring, head, d, off, n);
                head = (head + n) % ring.length;
                size -= n;
                changed.signalAll();
                return n;
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
                throw new IOException("interrupted while reading", e);
            } finally {
                lock.unlock();
            }
        }

        void close() {
            lock.lock();
            try {
                closed = true;
                changed.signalAll();
            } finally {
                lock.unlock();
            }
        }
    }
}
