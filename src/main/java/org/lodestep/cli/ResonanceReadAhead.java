package org.lodestep.cli;

import java.io.IOException;
import java.util.concurrent.ArrayBlockingQueue;
import java.util.concurrent.BlockingQueue;

import org.lodestep.capture.InputFormatException;
import org.lodestep.capture.SampleStream;

/**
 * Reads a {@link SampleStream} on a second thread, a few blocks ahead of the analysis, so parsing (which dominates on
 * large CSVs) and the spectra run at the same time on a multi-core machine. Memory is bounded: a fixed pool of
 * blocks circulates between the two threads. A reader failure is rethrown on the consuming thread.
 */
final class ResonanceReadAhead implements AutoCloseable {
    private static final int POOL = 3;

    /** One block of frames: {@code data[channel][0 ... frames)}; frames &lt; 0 marks the end. */
    static final class Block {
        final double[][] data;
        int frames;

        Block(int channels, int size) {
            data = new double[channels][size];
        }
    }

    private final BlockingQueue<Block> free = new ArrayBlockingQueue<>(POOL);
    private final BlockingQueue<Block> full = new ArrayBlockingQueue<>(POOL + 1);
    private final Thread thread;
    private volatile Exception failure;
    private volatile boolean stopped;

    ResonanceReadAhead(SampleStream in, int blockFrames) {
        int nc = in.channels().size();
        for (int i = 0; i < POOL; i++) {
            free.add(new Block(nc, blockFrames));
        }
        thread = new Thread(() -> pump(in, blockFrames), "lodestep-read-ahead");
        thread.setDaemon(true);
        thread.start();
    }

    private void pump(SampleStream in, int blockFrames) {
        Block end = new Block(0, 0);
        end.frames = -1;
        try {
            while (!stopped) {
                Block b = free.take();
                b.frames = in.read(b.data, 0, blockFrames);
                if (b.frames < 0) {
                    break;
                }
                full.put(b);
            }
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
        } catch (Exception e) {
            failure = e;
        } finally {
            full.offer(end);
        }
    }

    /**
     * The next block, or null at the end of the stream.
     *
     * @throws InputFormatException, IOException as the reader threw them
     */
    Block next() throws IOException, InputFormatException, InterruptedException {
        Block b = full.take();
        if (b.frames < 0) {
            Exception e = failure;
            if (e instanceof InputFormatException ife) {
                throw ife;
            }
            if (e instanceof IOException io) {
                throw io;
            }
            if (e instanceof RuntimeException re) {
                throw re;
            }
            if (e != null) {
                throw new IllegalStateException(e);
            }
            return null;
        }
        return b;
    }

    /** Hands a block back for reuse once its frames have been consumed. */
    void recycle(Block b) {
        free.offer(b);
    }

    @Override
    public void close() throws InterruptedException {
        stopped = true;
        thread.interrupt();
        thread.join(5000);
    }
}
