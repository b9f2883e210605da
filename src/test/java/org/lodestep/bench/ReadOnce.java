package org.lodestep.bench;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.Locale;

import org.lodestep.capture.Captures;
import org.lodestep.sample.InputFormatException;
import org.lodestep.sample.SampleStream;
import org.lodestep.capture.TimeSeriesCsvReader;

/**
 * One read in a fresh JVM, for process-to-process timing and the bounded-memory check.
 *
 * <p>{@code ReadOnce FILE} reads a file through {@code Captures.open} and prints frames, seconds and samples/s.
 * {@code ReadOnce --generated-hours H} streams H hours of one channel at 51.2 kS/s of CSV generated on the fly
 * (nothing on disk), so running it with {@code -Xmx256m} shows that memory does not grow with the input.
 */
public final class ReadOnce {
    private ReadOnce() {
    }

    public static void main(String[] args) throws IOException, InputFormatException {
        long t0 = System.nanoTime();
        long frames;
        if (args[0].equals("--generated-hours")) {
            long n = Math.round(Double.parseDouble(args[1]) * 3600 * BenchData.RATE_HZ);
            try (SampleStream s = TimeSeriesCsvReader.open(new GeneratedCsv(n), "generated.csv")) {
                frames = count(s);
            }
            if (frames != n) {
                throw new IllegalStateException("read " + frames + " frames of " + n);
            }
        } else {
            try (SampleStream s = Captures.open(Path.of(args[0]))) {
                frames = count(s);
            }
        }
        double seconds = (System.nanoTime() - t0) / 1e9;
        Runtime rt = Runtime.getRuntime();
        System.out.printf(Locale.ROOT, "frames=%d seconds=%.3f samples_per_s=%.0f max_heap_mib=%d used_heap_mib=%d%n",
                frames, seconds, frames / seconds, rt.maxMemory() >> 20, (rt.totalMemory() - rt.freeMemory()) >> 20);
    }

    static long count(SampleStream s) throws IOException, InputFormatException {
        double[][] block = new double[s.channels().size()][8192];
        long n = 0;
        int got;
        while ((got = s.read(block, 0, 8192)) >= 0) {
            n += got;
        }
        return n;
    }

    /**
     * CSV text of a 1 kHz tone at 51.2 kS/s, produced as it is read: {@code time_s,accel_g} with 8 and 6 decimals.
     * The tone repeats every 256 samples (5 periods), so its texts are formatted once.
     */
    static final class GeneratedCsv extends InputStream {
        private static final int TABLE = 256;
        private final long frames;
        private final byte[][] values = new byte[TABLE][];
        private long next;
        private byte[] chunk = "# sample_rate_hz=51200\ntime_s,accel_g\n".getBytes(StandardCharsets.US_ASCII);
        private int len = chunk.length;
        private int pos;

        GeneratedCsv(long frames) {
            this.frames = frames;
            for (int i = 0; i < TABLE; i++) {
                double v = 0.5 * Math.sin(2 * Math.PI * 1000.0 * i / BenchData.RATE_HZ);
                values[i] = String.format(Locale.ROOT, ",%.6f\n", v).getBytes(StandardCharsets.US_ASCII);
            }
        }

        private boolean refill() {
            if (next >= frames) {
                return false;
            }
            if (chunk.length < 1 << 16) {
                chunk = new byte[1 << 16];
            }
            int p = 0;
            while (p < chunk.length - 64 && next < frames) {
                // 1 / 51200 s = 1953.125 units of 1e-8 s: exact in long arithmetic, rounded to 8 decimals.
                long units = (next * 1953125 + 500) / 1000;
                long whole = units / 100_000_000;
                long frac = units % 100_000_000;
                String w = Long.toString(whole);
                for (int i = 0; i < w.length(); i++) {
                    chunk[p++] = (byte) w.charAt(i);
                }
                chunk[p++] = '.';
                for (long d = 10_000_000; d > 0; d /= 10) {
                    chunk[p++] = (byte) ('0' + frac / d % 10);
                }
                byte[] v = values[(int) (next % TABLE)];
                System.arraycopy(v, 0, chunk, p, v.length);
                p += v.length;
                next++;
            }
            len = p;
            pos = 0;
            return true;
        }

        @Override
        public int read() {
            if (pos >= len && !refill()) {
                return -1;
            }
            return chunk[pos++] & 0xFF;
        }

        @Override
        public int read(byte[] b, int off, int n) {
            if (n == 0) {
                return 0;
            }
            if (pos >= len && !refill()) {
                return -1;
            }
            int k = Math.min(n, len - pos);
            System.arraycopy(chunk, pos, b, off, k);
            pos += k;
            return k;
        }
    }
}
