package org.lodestep.rig;

import java.io.ByteArrayOutputStream;
import java.util.List;
import java.util.Random;
import java.util.concurrent.TimeUnit;

import org.lodestep.sample.Channel;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;

/**
 * Host decode throughput: frames found and CRC-checked, sample blocks decoded and scaled to doubles, from a byte
 * stream of 3-channel sweep blocks as the virtual rig sends them. One operation decodes {@link #BLOCKS} blocks
 * (BLOCKS x 2058 bytes). Run: see the README's benchmark section.
 */
@State(Scope.Thread)
@BenchmarkMode(Mode.Throughput)
@OutputTimeUnit(TimeUnit.SECONDS)
@Warmup(iterations = 3, time = 1)
@Measurement(iterations = 5, time = 1)
@Fork(1)
public class RigDecodeBenchmark {
    static final int BLOCKS = 500;
    private byte[] wire;
    private StreamSpec spec;

    /** Reads a fixed byte array in 64 KiB pieces, like a fast line. */
    static final class ArrayTransport implements Transport {
        private final byte[] data;
        private int pos;

        ArrayTransport(byte[] data) {
            this.data = data;
        }

        @Override
        public String address() {
            return "bench:";
        }

        @Override
        public void write(byte[] b, int o, int l) {
        }

        @Override
        public int read(byte[] d, int o, int l, int timeoutMs) {
            if (pos >= data.length) {
                return -1;
            }
            int n = Math.min(Math.min(l, 65536), data.length - pos);
            System.arraycopy(data, pos, d, o, n);
            pos += n;
            return n;
        }

        @Override
        public void close() {
        }
    }

    @Setup
    public void setup() {
        spec = new StreamSpec(List.of(new Channel("accel", "g"), new Channel("current", "a"), new Channel("step", "v")),
                new double[] {0.001, 0.0005, 0.001}, 5000, 340 * BLOCKS, 340);
        Random r = new Random(1);
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        for (int s = 0; s < BLOCKS; s++) {
            short[] v = new short[340 * 3];
            for (int i = 0; i < v.length; i++) {
                v[i] = (short) r.nextInt(65535);
            }
            out.writeBytes(FrameCodec.encode(new Frame(Frame.BLOCK, 8, new SampleBlock(s, 340, 3, v).encode())));
        }
        wire = out.toByteArray();
    }

    /** Bytes per operation, for converting operations/s into MB/s. */
    public static long bytesPerOperation() {
        return BLOCKS * (FrameCodec.OVERHEAD_BYTES + SampleBlock.HEADER_BYTES + 340L * 3 * 2);
    }

    @Benchmark
    public double decodeBlocks() throws Exception {
        FrameReader reader = new FrameReader(new ArrayTransport(wire));
        double[][] samples = new double[3][340];
        double sum = 0;
        for (int s = 0; s < BLOCKS; s++) {
            SampleBlock b = SampleBlock.decode(reader.next(0).payload());
            short[] v = b.samples();
            for (int i = 0; i < b.frames(); i++) {
                for (int c = 0; c < 3; c++) {
                    samples[c][i] = v[i * 3 + c] * spec.lsb()[c];
                }
            }
            sum += samples[0][0];
        }
        return sum;
    }
}
