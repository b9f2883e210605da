package org.lodestep.bench;

import java.io.IOException;
import java.nio.file.Path;
import java.util.Locale;

import org.lodestep.capture.Captures;
import org.lodestep.sample.InputFormatException;
import org.lodestep.sample.SampledSignal;
import org.lodestep.signal.SegmentSpectra;
import org.lodestep.signal.SpectralSettings;
import org.lodestep.signal.Spectrogram;
import org.lodestep.signal.Welch;

/**
 * The spectral work of a sweep analysis alone, in a fresh JVM: reads a capture into memory, then times feeding its
 * first channel through one segmenter with a Welch estimator and a spectrogram (periodic Hann, 50 % overlap), as
 * {@code resonance sweep} does. Prints the effective rate counting 2.5·N·log2 N floating-point operations per real
 * transform of N points (the usual convention for FFT benchmarks), for the first pass (what one command gets, JIT
 * compilation included) and for the best of REPEAT further passes.
 *
 * <p>Usage: {@code SpectralOnce FILE [SEGMENT] [REPEAT]}
 */
public final class SpectralOnce {
    private SpectralOnce() {
    }

    public static void main(String[] args) throws IOException, InputFormatException {
        SampledSignal s = Captures.readAll(Path.of(args[0]));
        int n = args.length > 1 ? Integer.parseInt(args[1]) : 4096;
        int repeat = args.length > 2 ? Integer.parseInt(args[2]) : 0;
        double[] x = s.channel(0);
        double first = pass(x, s.sampleRateHz(), n);
        double best = Double.POSITIVE_INFINITY;
        for (int i = 0; i < repeat; i++) {
            best = Math.min(best, pass(x, s.sampleRateHz(), n));
        }
        long segments = (x.length - n) / (n / 2) + 1;
        double flops = segments * 2.5 * n * (Math.log(n) / Math.log(2));
        System.out.printf(Locale.ROOT, "segments=%d segment=%d flop=%.3g first_s=%.3f first_gflops=%.2f",
                segments, n, flops, first, flops / first / 1e9);
        if (repeat > 0) {
            System.out.printf(Locale.ROOT, " best_s=%.3f best_gflops=%.2f", best, flops / best / 1e9);
        }
        System.out.println();
    }

    private static double pass(double[] x, double rateHz, int n) {
        long t0 = System.nanoTime();
        SegmentSpectra framer = new SegmentSpectra(SpectralSettings.hann(n), rateHz);
        Welch welch = new Welch(framer);
        new Spectrogram(framer, 512);
        for (int i = 0; i < x.length; i += 1 << 16) {
            framer.feed(x, i, Math.min(1 << 16, x.length - i));
        }
        if (welch.segmentCount() == 0) {
            throw new IllegalStateException("no segment");
        }
        return (System.nanoTime() - t0) / 1e9;
    }
}
