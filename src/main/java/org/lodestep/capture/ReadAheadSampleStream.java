package org.lodestep.capture;

import org.lodestep.sample.Channel;

import org.lodestep.sample.InputFormatException;
import org.lodestep.sample.SampleStream;
import java.io.IOException;
import java.io.InterruptedIOException;
import java.io.UncheckedIOException;
import java.util.List;
import java.util.Map;
import java.util.concurrent.ArrayBlockingQueue;
import java.util.concurrent.BlockingQueue;

/**
 * Reads another stream ahead on a background thread, so parsing a file overlaps the caller's analysis on a second
 * core. Same frames, in the same order; an error met by the wrapped stream is raised by {@link #read} after every
 * frame the wrapped stream delivered before it.
 */
final class ReadAheadSampleStream implements SampleStream {
    /** A filled block; {@code frames} is -1 at the end, and {@code error} set when the reader failed there. */
    private record Block(double[][] data, int frames, Exception error) {
    }

    private final SampleStream in;
    private final BlockingQueue<Block> full;
    private final BlockingQueue<double[][]> free;
    private final Thread worker;
    private Block current;
    private int position;
    private boolean ended;
    private volatile boolean closed;

    ReadAheadSampleStream(SampleStream in, int blockFrames, int depth) {
        this.in = in;
        this.full = new ArrayBlockingQueue<>(depth + 1);
        this.free = new ArrayBlockingQueue<>(depth);
        int nc = in.channels().size();
        for (int i = 0; i < depth; i++) {
            free.add(new double[nc][blockFrames]);
        }
        this.worker = new Thread(this::fill, "read-ahead " + in.source());
        worker.setDaemon(true);
        worker.start();
    }

    private void fill() {
        try {
            while (!closed) {
                double[][] buf = free.take();
                int n = 0;
                int got = 0;
                Exception error = null;
                try {
                    while (n < buf[0].length && (got = in.read(buf, n, buf[0].length - n)) >= 0) {
                        n += got;
                    }
                } catch (IOException | InputFormatException | RuntimeException e) {
                    error = e;
                }
                if (n > 0) {
                    full.put(new Block(buf, n, null));
                }
                if (error != null || got < 0) {
                    full.put(new Block(null, -1, error));
                    return;
                }
            }
        } catch (InterruptedException e) {
            // closed by the consumer
        }
    }

    @Override
    public int read(double[][] dest, int offset, int maxFrames) throws IOException, InputFormatException {
        if (closed) {
            throw new IOException(source() + ": read after close");
        }
        if (maxFrames <= 0) {
            return 0;
        }
        if (ended) {
            return -1;
        }
        if (current == null || position == current.frames()) {
            if (current != null) {
                free.add(current.data());
            }
            try {
                current = full.take();
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
                throw new InterruptedIOException(source() + ": interrupted while reading");
            }
            position = 0;
            if (current.frames() < 0) {
                ended = true;
                Exception error = current.error();
                if (error instanceof InputFormatException ife) {
                    throw ife;
                } else if (error instanceof IOException io) {
                    throw io;
                } else if (error instanceof RuntimeException re) {
                    throw re;
                }
                return -1;
            }
        }
        int n = Math.min(maxFrames, current.frames() - position);
        for (int c = 0; c < dest.length && c < current.data().length; c++) {
            System.arraycopy(current.data()[c], position, dest[c], offset, n);
        }
        position += n;
        return n;
    }

    @Override
    public long knownFrameCount() {
        return in.knownFrameCount();
    }

    @Override
    public String source() {
        return in.source();
    }

    @Override
    public List<Channel> channels() {
        return in.channels();
    }

    @Override
    public double sampleRateHz() {
        return in.sampleRateHz();
    }

    @Override
    public double startTimeS() {
        return in.startTimeS();
    }

    @Override
    public Map<String, String> metadata() {
        return in.metadata();
    }

    /** Stops the background reader and closes the wrapped stream. */
    @Override
    public void close() throws IOException {
        if (closed) {
            return;
        }
        closed = true;
        worker.interrupt();
        try {
            worker.join(10_000);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
        }
        try {
            in.close();
        } catch (UncheckedIOException e) {
            throw e.getCause();
        }
    }

    /** Whether the background thread has stopped (for tests). */
    boolean workerStopped() {
        return !worker.isAlive();
    }
}
