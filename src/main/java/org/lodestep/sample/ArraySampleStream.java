package org.lodestep.sample;

import java.util.List;
import java.util.Map;

/**
 * A {@link SampleStream} over arrays already in memory: for tests, for the virtual rig, and for handing a
 * {@link SampledSignal} to code that streams. The arrays are copied, so later changes by the caller do not show.
 */
public final class ArraySampleStream implements SampleStream {
    private final String source;
    private final List<Channel> channels;
    private final double sampleRateHz;
    private final double startTimeS;
    private final Map<String, String> metadata;
    private final double[][] samples;
    private final int length;
    private int position;

    /**
     * @param samples one array per channel, all of the same length: {@code samples[channel][frame]}
     * @throws IllegalArgumentException on a non-positive or non-finite rate, a channel count that does not match,
     *                                  arrays of unequal length, or a non-finite sample
     */
    public ArraySampleStream(String source, List<Channel> channels, double sampleRateHz, double startTimeS,
                             Map<String, String> metadata, double[][] samples) {
        if (!(sampleRateHz > 0) || !Double.isFinite(sampleRateHz)) {
            throw new IllegalArgumentException("sample rate must be positive and finite, got " + sampleRateHz + " Hz");
        }
        if (!Double.isFinite(startTimeS)) {
            throw new IllegalArgumentException("start time must be finite, got " + startTimeS + " s");
        }
        if (channels.isEmpty()) {
            throw new IllegalArgumentException("at least one channel is needed");
        }
        if (samples.length != channels.size()) {
            throw new IllegalArgumentException(channels.size() + " channels but " + samples.length + " sample rows");
        }
        int n = samples[0].length;
        this.samples = new double[samples.length][];
        for (int c = 0; c < samples.length; c++) {
            if (samples[c].length != n) {
                throw new IllegalArgumentException("channel " + channels.get(c).name() + " has " + samples[c].length
                        + " samples, expected " + n);
            }
            for (int i = 0; i < n; i++) {
                if (!Double.isFinite(samples[c][i])) {
                    throw new IllegalArgumentException("channel " + channels.get(c).name() + " sample " + i + " is "
                            + samples[c][i] + ": expected a finite value");
                }
            }
            this.samples[c] = samples[c].clone();
        }
        this.source = source;
        this.channels = List.copyOf(channels);
        this.sampleRateHz = sampleRateHz;
        this.startTimeS = startTimeS;
        this.metadata = Map.copyOf(metadata);
        this.length = n;
    }

    /** A stream over one channel starting at time zero, without metadata. */
    public static ArraySampleStream of(String source, Channel channel, double sampleRateHz, double[] samples) {
        return new ArraySampleStream(source, List.of(channel), sampleRateHz, 0.0, Map.of(), new double[][] {samples});
    }

    /** A stream over a whole signal held in memory. */
    public static ArraySampleStream of(SampledSignal signal) {
        double[][] s = new double[signal.channels().size()][];
        for (int c = 0; c < s.length; c++) {
            s[c] = signal.channel(c);
        }
        return new ArraySampleStream(signal.source(), signal.channels(), signal.sampleRateHz(), signal.startTimeS(),
                signal.metadata(), s);
    }

    /** Number of frames in the whole stream. */
    public int length() {
        return length;
    }

    @Override
    public long knownFrameCount() {
        return length;
    }

    @Override
    public String source() {
        return source;
    }

    @Override
    public List<Channel> channels() {
        return channels;
    }

    @Override
    public double sampleRateHz() {
        return sampleRateHz;
    }

    @Override
    public double startTimeS() {
        return startTimeS;
    }

    @Override
    public Map<String, String> metadata() {
        return metadata;
    }

    @Override
    public int read(double[][] dest, int offset, int maxFrames) {
        if (position >= length) {
            return maxFrames > 0 ? -1 : 0;
        }
        int n = Math.min(maxFrames, length - position);
        for (int c = 0; c < samples.length; c++) {
            System.arraycopy(samples[c], position, dest[c], offset, n);
        }
        position += n;
        return n;
    }

    @Override
    public void close() {
        position = length;
    }
}
