package org.lodestep.bench;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Comparator;
import java.util.concurrent.TimeUnit;
import java.util.stream.Stream;

import org.lodestep.capture.Captures;
import org.lodestep.sample.InputFormatException;
import org.lodestep.sample.SampleStream;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Level;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.TearDown;
import org.openjdk.jmh.annotations.Warmup;

/**
 * Reader throughput: one whole pass over a generated 10-million-sample CSV and WAV (one channel at 51.2 kS/s) through
 * {@link Captures#open}, as an analysis reads them. Each operation is one full read; samples/s = frames / time.
 * Run by {@code bench/read-throughput.sh}.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.SingleShotTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Warmup(iterations = 2)
@Measurement(iterations = 7)
@Fork(value = 1, jvmArgs = {"-Xmx256m"})
public class ReaderThroughputBenchmark {

    @Param("10000000")
    public int frames;

    private Path dir;
    private Path csv;
    private Path wav;

    @Setup(Level.Trial)
    public void generate() throws IOException {
        dir = Files.createTempDirectory("lodestep-bench");
        csv = dir.resolve("sweep.csv");
        wav = dir.resolve("sweep.wav");
        BenchData.csv(csv, frames);
        BenchData.wav(wav, frames);
    }

    @TearDown(Level.Trial)
    public void remove() throws IOException {
        try (Stream<Path> s = Files.walk(dir)) {
            for (Path p : s.sorted(Comparator.reverseOrder()).toList()) {
                Files.delete(p);
            }
        }
    }

    @Benchmark
    public double readCsv() throws IOException, InputFormatException {
        return readAll(csv);
    }

    @Benchmark
    public double readWav() throws IOException, InputFormatException {
        return readAll(wav);
    }

    /** Reads every block and sums the samples, so the work cannot be optimised away. */
    static double readAll(Path path) throws IOException, InputFormatException {
        try (SampleStream s = Captures.open(path)) {
            double[][] block = new double[s.channels().size()][8192];
            double sum = 0;
            long n = 0;
            int got;
            while ((got = s.read(block, 0, block[0].length)) >= 0) {
                for (int i = 0; i < got; i++) {
                    sum += block[0][i];
                }
                n += got;
            }
            if (n == 0) {
                throw new IllegalStateException(path + " read no frames");
            }
            return sum;
        }
    }
}
