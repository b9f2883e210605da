package org.lodestep.signal;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;

import org.junit.jupiter.api.Test;

/**
 * Transforming segments on several threads must not change a single bit: the same segments reach the listeners in the
 * same order with the same spectra as on one thread (the serial path is the definition, Welch 1967).
 */
class SegmentSpectraParallelTest {
    private static final int N = 64;
    private static final int HOP = 32;
    /** Samples held by one batch of the segmenter (32 segments of N with hop HOP). */
    private static final int BATCH_SAMPLES = N + HOP * 31;

    /** Lengths at the edges: nothing, one sample, one segment ±1, segment and batch boundaries ±1, odd lengths. */
    private static int[] awkwardLengths(SplittableRandom r) {
        List<Integer> l = new ArrayList<>(List.of(0, 1, N - 1, N, N + 1, N + HOP - 1, N + HOP, N + HOP + 1,
                N + 3 * HOP, N + 4 * HOP - 1, N + 4 * HOP + 1, BATCH_SAMPLES - 1, BATCH_SAMPLES, BATCH_SAMPLES + 1,
                BATCH_SAMPLES + HOP - 1, BATCH_SAMPLES + HOP, BATCH_SAMPLES + HOP + 1, 2 * BATCH_SAMPLES + 1));
        for (int i = 0; i < 6; i++) {
            l.add(1 + r.nextInt(20 * BATCH_SAMPLES));
        }
        return l.stream().mapToInt(Integer::intValue).toArray();
    }

    /** Everything a listener sees, as raw bits. */
    private static final class Recorder implements SegmentSpectra.Listener {
        final List<Long> firsts = new ArrayList<>();
        final List<long[]> spectra = new ArrayList<>();
        final List<Long> meanSquares = new ArrayList<>();

        @Override
        public void segment(long firstSample, double[] magnitudeSquared, double meanSquare) {
            firsts.add(firstSample);
            long[] bits = new long[magnitudeSquared.length];
            for (int k = 0; k < bits.length; k++) {
                bits[k] = Double.doubleToRawLongBits(magnitudeSquared[k]);
            }
            spectra.add(bits);
            meanSquares.add(Double.doubleToRawLongBits(meanSquare));
        }
    }

    /** One run: a segmenter with {@code lanes} threads and its Welch, spectrogram and recorder, fed in random blocks. */
    private static final class Run {
        final SegmentSpectra framer;
        final Welch welch;
        final Spectrogram spectrogram;
        final Recorder recorder = new Recorder();

        Run(SpectralSettings settings, int lanes) {
            framer = new SegmentSpectra(settings, 1000, lanes);
            welch = new Welch(framer);
            spectrogram = new Spectrogram(framer, 4);
            framer.addListener(recorder);
        }

        void feed(double[] x, SplittableRandom blocks) {
            int i = 0;
            while (i < x.length) {
                int len = Math.min(x.length - i, 1 + blocks.nextInt(3 * BATCH_SAMPLES));
                framer.feed(x, i, len);
                i += len;
            }
        }
    }

    private static void assertSame(Run serial, Run parallel, String what) {
        assertEquals(serial.framer.segmentCount(), parallel.framer.segmentCount(), what + ": segment count");
        assertEquals(serial.recorder.firsts, parallel.recorder.firsts, what + ": segment starts");
        assertEquals(serial.recorder.meanSquares, parallel.recorder.meanSquares, what + ": mean squares");
        for (int s = 0; s < serial.recorder.spectra.size(); s++) {
            assertArrayEquals(serial.recorder.spectra.get(s), parallel.recorder.spectra.get(s),
                    what + ": spectrum of segment " + s);
        }
        if (serial.welch.segmentCount() > 0) {
            assertArrayEquals(bits(serial.welch.spectrum(SpectrumScaling.DENSITY)),
                    bits(parallel.welch.spectrum(SpectrumScaling.DENSITY)), what + ": Welch PSD");
        }
        assertEquals(serial.spectrogram.columnCount(), parallel.spectrogram.columnCount(), what + ": columns");
        for (int c = 0; c < serial.spectrogram.columnCount(); c++) {
            assertEquals(serial.spectrogram.columnTimeS(c), parallel.spectrogram.columnTimeS(c), what + ": time");
            assertArrayEquals(serial.spectrogram.column(c, SpectrumScaling.POWER),
                    parallel.spectrogram.column(c, SpectrumScaling.POWER), what + ": spectrogram column " + c);
        }
    }

    private static long[] bits(Spectrum s) {
        long[] b = new long[s.size()];
        for (int k = 0; k < b.length; k++) {
            b[k] = Double.doubleToRawLongBits(s.value(k));
        }
        return b;
    }

    @Test
    void parallelTransformsAreBitIdenticalToSerialOnAwkwardLengthsAndOneToEightChannels() {
        SplittableRandom r = new SplittableRandom(20261202L);
        SpectralSettings settings = new SpectralSettings(N, N - HOP, Window.HANN, Detrend.MEAN);
        for (int length : awkwardLengths(r)) {
            for (int channels = 1; channels <= 8; channels++) {
                // Each channel of a capture gets its own segmenter, as a per-channel analysis would.
                for (int c = 0; c < channels; c++) {
                    double[] x = new double[length];
                    double offset = r.nextDouble(-5, 5);
                    for (int i = 0; i < length; i++) {
                        x[i] = offset + r.nextGaussian() * Math.pow(10, r.nextInt(-3, 4));
                    }
                    long blockSeed = r.nextLong();
                    Run serial = new Run(settings, 1);
                    serial.feed(x, new SplittableRandom(blockSeed));
                    for (int lanes : new int[] {2, 3, 8}) {
                        Run parallel = new Run(settings, lanes);
                        parallel.feed(x, new SplittableRandom(blockSeed));
                        assertSame(serial, parallel, length + " samples, channel " + c + " of " + channels + ", "
                                + lanes + " lanes");
                    }
                }
            }
        }
    }

    @Test
    void oddSegmentLengthsAndOtherWindowsMatchToo() {
        SplittableRandom r = new SplittableRandom(7);
        for (SpectralSettings s : new SpectralSettings[] {
            new SpectralSettings(63, 0, Window.RECTANGULAR, Detrend.NONE),
            new SpectralSettings(100, 99, Window.FLAT_TOP, Detrend.MEAN),
            new SpectralSettings(33, 11, Window.HANN, Detrend.NONE),
            // long enough that a batch holds two segments only
            new SpectralSettings(1 << 18, 1 << 17, Window.HANN, Detrend.MEAN)}) {
            double[] x = new double[Math.max(5000 + r.nextInt(5000), 6 * (s.segmentLength() - s.overlapSamples()) + 3)];
            for (int i = 0; i < x.length; i++) {
                x[i] = r.nextGaussian();
            }
            Run serial = new Run(s, 1);
            serial.feed(x, new SplittableRandom(3));
            Run parallel = new Run(s, 4);
            parallel.feed(x, new SplittableRandom(3));
            assertSame(serial, parallel, s.toString());
        }
    }

    @Test
    void aNonFiniteSampleIsReportedAtTheSameIndexAfterTheSameSegments() {
        SpectralSettings settings = new SpectralSettings(N, N - HOP, Window.HANN, Detrend.MEAN);
        double[] x = new double[10 * BATCH_SAMPLES];
        SplittableRandom r = new SplittableRandom(9);
        for (int i = 0; i < x.length; i++) {
            x[i] = r.nextGaussian();
        }
        x[3 * BATCH_SAMPLES + 17] = Double.NaN;
        List<String> messages = new ArrayList<>();
        List<Long> counts = new ArrayList<>();
        for (int lanes : new int[] {1, 2, 5}) {
            SegmentSpectra f = new SegmentSpectra(settings, 1000, lanes);
            IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> f.feed(x, 0, x.length));
            messages.add(e.getMessage());
            counts.add(f.segmentCount());
        }
        assertEquals(List.of("sample " + (3 * BATCH_SAMPLES + 17) + " is not a finite number"),
                messages.stream().distinct().toList());
        assertEquals(1, counts.stream().distinct().count(), "segments before the error: " + counts);
    }

    @Test
    void batchedSegmentsEqualSegmentBySegmentTransforms() {
        // The definition, one segment at a time: mean removed (summed in four interleaved partial sums, as the
        // segmenter documents), periodic Hann applied, |X_k|² of the real DFT.
        SpectralSettings settings = new SpectralSettings(N, N - HOP, Window.HANN, Detrend.MEAN);
        SplittableRandom r = new SplittableRandom(13);
        double[] x = new double[3 * BATCH_SAMPLES + 5];
        for (int i = 0; i < x.length; i++) {
            x[i] = 2 + r.nextGaussian();
        }
        Run run = new Run(settings, 2);
        run.feed(x, new SplittableRandom(1));
        double[] w = Window.HANN.periodic(N);
        RealFft fft = new RealFft(N);
        assertEquals((x.length - N) / HOP + 1, run.recorder.firsts.size());
        for (int s = 0; s < run.recorder.firsts.size(); s++) {
            int from = s * HOP;
            assertEquals(from, run.recorder.firsts.get(s));
            double[] part = new double[4];
            for (int i = 0; i < N; i++) {
                part[i < N - N % 4 ? i % 4 : 0] += x[from + i];
            }
            double mean = ((part[0] + part[1]) + (part[2] + part[3])) / N;
            double naive = 0;
            for (int i = 0; i < N; i++) {
                naive += x[from + i];
            }
            assertEquals(naive / N, mean, 1e-14 * Math.abs(mean), "the partial sums give the mean");
            double[] seg = new double[N];
            for (int i = 0; i < N; i++) {
                seg[i] = (x[from + i] - mean) * w[i];
            }
            double[] mag2 = new double[N / 2 + 1];
            fft.magnitudeSquared(seg, mag2);
            long[] expected = new long[mag2.length];
            for (int k = 0; k < mag2.length; k++) {
                expected[k] = Double.doubleToRawLongBits(mag2[k]);
            }
            assertArrayEquals(expected, run.recorder.spectra.get(s), "segment " + s);
        }
    }
}
