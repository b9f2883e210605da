package org.lodestep.sample;

import java.io.IOException;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Map;

/**
 * A whole multi-channel signal held in memory: for short captures (step responses, hand-turned back-EMF, ring-downs)
 * where random access is simpler than streaming. Immutable; accessors return copies.
 */
public final class SampledSignal {
    private final String source;
    private final List<Channel> channels;
    private final double sampleRateHz;
    private final double startTimeS;
    private final Map<String, String> metadata;
    private final double[][] samples;

    public SampledSignal(String source, List<Channel> channels, double sampleRateHz, double startTimeS,
                         Map<String, String> metadata, double[][] samples) {
        if (!(sampleRateHz > 0) || !Double.isFinite(sampleRateHz)) {
            throw new IllegalArgumentException("sample rate must be positive and finite, got " + sampleRateHz + " Hz");
        }
        if (samples.length != channels.size()) {
            throw new IllegalArgumentException(channels.size() + " channels but " + samples.length + " sample rows");
        }
        int n = samples.length == 0 ? 0 : samples[0].length;
        this.samples = new double[samples.length][];
        for (int c = 0; c < samples.length; c++) {
            if (samples[c].length != n) {
                throw new IllegalArgumentException("channel " + channels.get(c).name() + " has " + samples[c].length
                        + " samples, expected " + n);
            }
            this.samples[c] = samples[c].clone();
        }
        this.source = source;
        this.channels = List.copyOf(channels);
        this.sampleRateHz = sampleRateHz;
        this.startTimeS = startTimeS;
        this.metadata = Map.copyOf(metadata);
    }

    /** Reads a whole stream into memory; for short captures only. */
    public static SampledSignal readAll(SampleStream in) throws IOException, InputFormatException {
        int nc = in.channels().size();
        if (nc == 0) {
            throw new InputFormatException(in.source(), InputFormatException.NO_LINE, null, null,
                    "has no data channels");
        }
        double[][] buf = new double[nc][8192];
        int n = 0;
        while (true) {
            if (n == buf[0].length) {
                for (int c = 0; c < nc; c++) {
                    buf[c] = Arrays.copyOf(buf[c], buf[c].length * 2);
                }
            }
            int got = in.read(buf, n, buf[0].length - n);
            if (got < 0) {
                break;
            }
            n += got;
        }
        double[][] exact = new double[nc][];
        for (int c = 0; c < nc; c++) {
            exact[c] = Arrays.copyOf(buf[c], n);
        }
        return new SampledSignal(in.source(), in.channels(), in.sampleRateHz(), in.startTimeS(), in.metadata(), exact);
    }

    public String source() { return source; }

    public List<Channel> channels() { return channels; }

    public double sampleRateHz() { return sampleRateHz; }

    public double startTimeS() { return startTimeS; }

    public Map<String, String> metadata() { return metadata; }

    /** Number of frames. */
    public int length() {
        return samples.length == 0 ? 0 : samples[0].length;
    }

    /** A copy of one channel's samples. */
    public double[] channel(int index) {
        return samples[index].clone();
    }

    /** The index of the channel with this name, or -1. */
    public int indexOf(String name) {
        for (int c = 0; c < channels.size(); c++) {
            if (channels.get(c).name().equals(name)) {
                return c;
            }
        }
        return -1;
    }

    /** This signal as a stream, for code that reads block by block. */
    public SampleStream stream() {
        return ArraySampleStream.of(this);
    }

    /** Channel names, in order; convenient for error messages. */
    public List<String> channelNames() {
        List<String> names = new ArrayList<>();
        for (Channel c : channels) {
            names.add(c.name());
        }
        return names;
    }
}
