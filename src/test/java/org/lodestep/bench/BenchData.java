package org.lodestep.bench;

import java.io.BufferedOutputStream;
import java.io.IOException;
import java.io.OutputStream;
import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.SplittableRandom;

/**
 * Writes the benchmark inputs: a vibration-like signal (a swept tone plus noise, as an accelerometer records during a
 * step-rate sweep) as a canonical CSV and as a 16-bit PCM WAV. Generated on the fly, never committed.
 *
 * <p>Usage: {@code BenchData DIR [FRAMES]} writes {@code DIR/sweep.csv} and {@code DIR/sweep.wav} (default 10 million
 * frames of one channel at 51.2 kS/s); {@code BenchData --wav FILE SECONDS} streams a WAV of any length (one hour is
 * 368 MB) without holding the signal in memory.
 */
public final class BenchData {
    /** 51.2 kS/s: a common rate of vibration data acquisition. */
    public static final int RATE_HZ = 51_200;

    private BenchData() {
    }

    public static void main(String[] args) throws IOException {
        if (args[0].equals("--wav")) {
            wav(Path.of(args[1]), Math.toIntExact(Math.round(Double.parseDouble(args[2]) * RATE_HZ)));
            return;
        }
        Path dir = Path.of(args[0]);
        int frames = args.length > 1 ? Integer.parseInt(args[1]) : 10_000_000;
        Files.createDirectories(dir);
        csv(dir.resolve("sweep.csv"), frames);
        wav(dir.resolve("sweep.wav"), frames);
    }

    /** The test signal in g: a tone sweeping 20 Hz to 2 kHz over the record, amplitude 0.5 g, noise 0.05 g rms. */
    static double[] signal(int frames) {
        double[] x = new double[frames];
        Tone tone = new Tone(frames);
        for (int i = 0; i < frames; i++) {
            x[i] = tone.next();
        }
        return x;
    }

    /** The test signal sample by sample, so a file of any length can be written in constant memory. */
    static final class Tone {
        private final SplittableRandom rnd = new SplittableRandom(20261201L);
        private final double duration;
        private double phase;
        private long i;

        Tone(long frames) {
            this.duration = (double) frames / RATE_HZ;
        }

        double next() {
            double t = (double) i++ / RATE_HZ;
            double f = 20 + (2000 - 20) * t / duration;
            phase += 2 * Math.PI * f / RATE_HZ;
            return 0.5 * Math.sin(phase) + 0.05 * (rnd.nextDouble() + rnd.nextDouble() + rnd.nextDouble() - 1.5) * 2;
        }
    }

    /**
     * Canonical CSV as the capture writer lays it out: {@code # key=value} lines, {@code time_s,accel_g}, time with
     * 8 decimals and values with 6 decimals in g (a 24-bit accelerometer channel resolves about 1e-6 g).
     */
    public static void csv(Path path, int frames) throws IOException {
        double[] x = signal(frames);
        try (OutputStream out = new BufferedOutputStream(Files.newOutputStream(path), 1 << 20)) {
            out.write(("# sample_rate_hz=" + RATE_HZ + "\n# sweep=linear\n# sweep_start_full_steps_per_s=20\n"
                    + "# sweep_end_full_steps_per_s=2000\n# sweep_duration_s=" + (double) frames / RATE_HZ
                    + "\n# microsteps=1\ntime_s,accel_g\n")
                    .getBytes(StandardCharsets.US_ASCII));
            byte[] line = new byte[64];
            for (int i = 0; i < frames; i++) {
                int p = fixed(line, 0, (double) i / RATE_HZ, 8);
                line[p++] = ',';
                p = fixed(line, p, x[i], 6);
                line[p++] = '\n';
                out.write(line, 0, p);
            }
        }
    }

    private static int fixed(byte[] b, int p, double v, int decimals) {
        long scale = 1;
        for (int i = 0; i < decimals; i++) {
            scale *= 10;
        }
        long q = Math.round(Math.abs(v) * scale);
        if (v < 0 && q != 0) {
            b[p++] = '-';
        }
        String s = Long.toString(q / scale);
        for (int i = 0; i < s.length(); i++) {
            b[p++] = (byte) s.charAt(i);
        }
        b[p++] = '.';
        long f = q % scale;
        for (long d = scale / 10; d > 0; d /= 10) {
            b[p++] = (byte) ('0' + f / d % 10);
        }
        return p;
    }

    /** 16-bit mono PCM WAV of the same signal, full scale = 1 g. */
    public static void wav(Path path, int frames) throws IOException {
        Tone tone = new Tone(frames);
        try (OutputStream out = new BufferedOutputStream(Files.newOutputStream(path), 1 << 20)) {
            int dataBytes = frames * 2;
            ByteBuffer h = ByteBuffer.allocate(44).order(ByteOrder.LITTLE_ENDIAN);
            h.put("RIFF".getBytes(StandardCharsets.US_ASCII)).putInt(36 + dataBytes)
                    .put("WAVE".getBytes(StandardCharsets.US_ASCII)).put("fmt ".getBytes(StandardCharsets.US_ASCII))
                    .putInt(16).putShort((short) 1).putShort((short) 1).putInt(RATE_HZ).putInt(RATE_HZ * 2)
                    .putShort((short) 2).putShort((short) 16).put("data".getBytes(StandardCharsets.US_ASCII))
                    .putInt(dataBytes);
            out.write(h.array());
            ByteBuffer block = ByteBuffer.allocate(1 << 16).order(ByteOrder.LITTLE_ENDIAN);
            for (int i = 0; i < frames; i++) {
                if (!block.hasRemaining()) {
                    out.write(block.array(), 0, block.position());
                    block.clear();
                }
                block.putShort((short) Math.max(-32768, Math.min(32767, Math.round(tone.next() * 32768))));
            }
            out.write(block.array(), 0, block.position());
        }
    }
}
