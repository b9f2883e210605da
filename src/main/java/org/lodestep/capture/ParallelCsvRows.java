package org.lodestep.capture;

import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.channels.FileChannel;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import java.util.Arrays;

import org.lodestep.sample.InputFormatException;

/**
 * The rows of a large time-series CSV file after its first rows, parsed on one thread per core: the file is cut into
 * chunks of whole lines, each parsed by whichever thread is free with the reader's own row parser, and the rows are
 * handed on in file order. Time stamps are checked against the sample clock, and rows counted, by the consuming
 * thread in order, so every error names the same line, with the same words, as a serial read.
 *
 * <p>A chunk whose parse failed (a malformed row), or a line longer than a chunk, ends the parallel read: the
 * reader goes on serially from that chunk's first byte, and words the error as it always does. Memory is bounded
 * by a ring of chunk buffers, two per thread.
 */
final class ParallelCsvRows implements AutoCloseable {
    /** Bytes read per chunk (the last line cut at the last newline in it). */
    static final int CHUNK_BYTES = 1 << 21;
    /** Most parsing threads. */
    static final int MAX_THREADS = 4;
    /**
     * Rows parsed, or checked, per call of the per-row loop: with many short calls the optimising compiler compiles
     * each loop once, when the calls are many, instead of once while a long call runs (on-stack replacement) and
     * again for the calls after it.
     */
    private static final int ROWS_PER_CALL = 4096;

    private static final int FREE = 0;
    private static final int PARSING = 1;
    private static final int READY = 2;

    /** One chunk: its bytes, where it starts in the file, and what its parse gave. */
    private static final class Slot {
        final byte[] bytes;
        int state = FREE;
        long seq = -1;
        long fileOffset;
        int length;
        /** The chunk ends inside a line (a line longer than a chunk): read serially from here. */
        boolean lineTooLong;
        /** The parse met a row it could not take: read serially from here, so the error is worded as usual. */
        boolean failed;
        double[][] values;
        double[] timesS;
        int[] lines;
        int rows;
        int lineCount;
        int taken;
        /** Rows whose time stamps passed their check, counted from the chunk's first. */
        int checked;

        Slot(int chunkBytes) {
            bytes = new byte[chunkBytes];
        }
    }

    private final TimeSeriesCsvReader reader;
    private final FileChannel channel;
    private final Slot[] ring;
    private final Thread[] threads;
    private final int chunkBytes;
    // Guarded by this: the claim position, the ring's states, and the end.
    private long nextOffset;
    private long nextSeq;
    private boolean endOfFile;
    private boolean stopped;
    // The consuming thread's own.
    private long consumeSeq;

    /**
     * Starts parsing {@code file} from byte {@code fromOffset} (the start of a line) with {@code reader}'s columns.
     *
     * @param threads    parsing threads, 1 ... {@link #MAX_THREADS}
     * @param chunkBytes bytes read per chunk ({@link #CHUNK_BYTES}; tests use small chunks to cross many bounds)
     */
    ParallelCsvRows(TimeSeriesCsvReader reader, Path file, long fromOffset, int threads, int chunkBytes)
            throws IOException {
        this.reader = reader;
        this.chunkBytes = chunkBytes;
        this.channel = FileChannel.open(file, StandardOpenOption.READ);
        this.nextOffset = fromOffset;
        int n = Math.max(1, Math.min(MAX_THREADS, threads));
        this.ring = new Slot[2 * n];
        for (int i = 0; i < ring.length; i++) {
            ring[i] = new Slot(chunkBytes);
        }
        this.threads = new Thread[n];
        for (int i = 0; i < n; i++) {
            Thread t = new Thread(this::work, "csv-parse " + reader.source());
            t.setDaemon(true);
            this.threads[i] = t;
            t.start();
        }
    }

    /** What a parsing thread does: claim the next chunk, parse it, hand it over; until the file or the read ends. */
    private void work() {
        try {
            Slot s;
            while ((s = claim()) != null) {
                if (!s.lineTooLong) {
                    parse(s);
                }
                synchronized (this) {
                    s.state = READY;
                    notifyAll();
                }
            }
        } catch (InterruptedException e) {
            // closed
        }
    }

    /** The next chunk, read into a free slot (reading is sequential: it happens under the lock); null at the end. */
    private synchronized Slot claim() throws InterruptedException {
        while (true) {
            if (stopped || endOfFile) {
                return null;
            }
            Slot s = ring[(int) (nextSeq % ring.length)];
            if (s.state == FREE) {
                int n;
                try {
                    n = readAt(s.bytes, nextOffset);
                } catch (IOException e) {
                    n = -1;
                }
                if (n == 0) {
                    endOfFile = true;
                    notifyAll();
                    return null;
                }
                s.seq = nextSeq++;
                s.state = PARSING;
                s.fileOffset = nextOffset;
                s.failed = n < 0; // an I/O error: the serial read meets it again and reports it
                s.lineTooLong = false;
                s.length = Math.max(0, n);
                if (n == chunkBytes) {
                    int cut = lastNewline(s.bytes, n);
                    if (cut < 0) {
                        s.lineTooLong = true;
                    } else {
                        s.length = cut + 1;
                    }
                }
                if (n < chunkBytes || s.lineTooLong || s.failed) {
                    endOfFile = true; // the last chunk, or the serial read takes over from this one
                }
                nextOffset += s.length;
                return s;
            }
            wait();
        }
    }

    private int readAt(byte[] b, long offset) throws IOException {
        ByteBuffer buf = ByteBuffer.wrap(b);
        long at = offset;
        while (buf.hasRemaining()) {
            int got = channel.read(buf, at);
            if (got < 0) {
                break;
            }
            at += got;
        }
        return buf.position();
    }

    private static int lastNewline(byte[] b, int n) {
        for (int i = n - 1; i >= 0; i--) {
            if (b[i] == '\n') {
                return i;
            }
        }
        return -1;
    }

    /** Parses a whole chunk into the slot's arrays, line numbers counted from the chunk's start. */
    private void parse(Slot s) {
        if (s.failed) {
            return;
        }
        int channels = reader.channels().size();
        int capacity = s.timesS == null ? Math.max(16, chunkBytes / 16) : s.timesS.length;
        if (s.values == null) {
            s.values = new double[channels][capacity];
            s.timesS = new double[capacity];
            s.lines = new int[capacity];
        }
        s.rows = 0;
        s.taken = 0;
        try {
            TimeSeriesCsvReader.ChunkParser p = reader.chunkParser(s.bytes, s.length, s.timesS, s.lines);
            int got;
            while ((got = p.readRows(s.values, s.rows, Math.min(ROWS_PER_CALL, s.timesS.length - s.rows))) > 0) {
                s.rows += got;
                if (s.rows == s.timesS.length) {
                    int grown = s.timesS.length * 2;
                    for (int c = 0; c < channels; c++) {
                        s.values[c] = Arrays.copyOf(s.values[c], grown);
                    }
                    s.timesS = Arrays.copyOf(s.timesS, grown);
                    s.lines = Arrays.copyOf(s.lines, grown);
                    p.recordInto(s.timesS, s.lines);
                }
            }
            s.lineCount = p.lineNumber();
        } catch (InputFormatException | IOException | RuntimeException e) {
            s.failed = true;
        }
    }

    /**
     * The next chunk in file order, waiting for its parse; null after the last. A chunk that failed or ends inside
     * a line is returned too: the caller reads serially from its {@link #serialFrom} offset.
     */
    private Slot current() throws IOException {
        Slot s = ring[(int) (consumeSeq % ring.length)];
        synchronized (this) {
            while (!(s.seq == consumeSeq && s.state == READY)) {
                if (stopped) {
                    throw new IOException(reader.source() + ": read after close");
                }
                if (endOfFile && consumeSeq >= nextSeq) {
                    return null;
                }
                try {
                    wait();
                } catch (InterruptedException e) {
                    Thread.currentThread().interrupt();
                    throw new java.io.InterruptedIOException("interrupted while reading " + reader.source());
                }
            }
        }
        return s;
    }

    /**
     * Copies up to {@code max} rows into {@code dest[*][at ...]}, checking each row's time stamp in order through
     * {@code check}; returns the rows copied (0 at the end, or when the next chunk must be read serially: see
     * {@link #serialFrom}). A time stamp that fails its check is thrown after the rows before it are copied.
     */
    int read(double[][] dest, int at, int max, RowCheck check) throws IOException, InputFormatException {
        int k = 0;
        while (k < max) {
            Slot s = current();
            if (s == null || s.failed || s.lineTooLong) {
                break;
            }
            int end = s.taken + Math.min(max - k, s.rows - s.taken);
            s.checked = s.taken;
            try {
                while (s.checked < end) {
                    checkRows(s, Math.min(end, s.checked + ROWS_PER_CALL), check);
                }
            } finally {
                int done = s.checked - s.taken;
                for (int c = 0; c < dest.length; c++) {
                    System.arraycopy(s.values[c], s.taken, dest[c], at + k, done);
                }
                s.taken += done;
                k += done;
            }
            if (s.taken == s.rows) {
                check.linesPassed(s.lineCount);
                synchronized (this) {
                    s.state = FREE;
                    s.seq = -1;
                    consumeSeq++;
                    notifyAll();
                }
            }
        }
        return k;
    }

    /** Checks the rows of {@code s} from {@code s.checked} to {@code to}, in order; a failing row stops it there. */
    private static void checkRows(Slot s, int to, RowCheck check) throws InputFormatException {
        int i = s.checked;
        try {
            for (; i < to; i++) {
                check.row(s.timesS[i], s.lines[i]);
            }
        } finally {
            s.checked = i;
        }
    }

    /**
     * Where a serial read must take over, or -1: the file offset of the next chunk when its parse failed or it ends
     * inside a line. The parallel read is stopped.
     */
    long serialFrom() throws IOException {
        Slot s = current();
        if (s == null || !(s.failed || s.lineTooLong)) {
            return -1;
        }
        long from = s.fileOffset;
        stop();
        return from;
    }

    /** Receives each row in file order: its time stamp (seconds) and its line within its chunk. */
    interface RowCheck {
        void row(double timeS, int lineInChunk) throws InputFormatException;

        /** A chunk of {@code lines} lines is done. */
        void linesPassed(int lines);
    }

    private synchronized void stop() {
        stopped = true;
        notifyAll();
    }

    @Override
    public void close() throws IOException {
        stop();
        for (Thread t : threads) {
            t.interrupt();
        }
        channel.close();
    }
}
