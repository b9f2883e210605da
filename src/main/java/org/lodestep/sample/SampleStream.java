package org.lodestep.sample;

import java.io.Closeable;
import java.io.IOException;
import java.util.List;
import java.util.Map;

/**
 * A uniformly sampled, multi-channel signal read block by block, so a capture of any length analyses in bounded
 * memory. Implementations: CSV and WAV readers, rig captures, in-memory arrays.
 *
 * <p>Frame {@code i} is at time {@code startTimeS() + i / sampleRateHz()}.
 */
public interface SampleStream extends Closeable {

    /** The file name or other label used in error messages. */
    String source();

    /** The channels, in the order of {@link #read}'s first index. */
    List<Channel> channels();

    /** Samples per second per channel, positive and finite. */
    double sampleRateHz();

    /** Time of the first frame, in seconds. */
    default double startTimeS() {
        return 0.0;
    }

    /**
     * The number of frames when the source states it before any read (a WAV header, a capture sidecar, arrays in
     * memory), so a caller can skip a counting pass; -1 when only reading to the end tells (a plain CSV).
     */
    default long knownFrameCount() {
        return -1;
    }

    /** Metadata from the source ({@code # key=value} comments, WAV info, capture sidecar), keys in lower case. */
    Map<String, String> metadata();

    /**
     * Reads up to {@code maxFrames} frames into {@code dest[channel][offset ...]}.
     *
     * @return the number of frames read, or -1 at the end of the signal
     * @throws InputFormatException when the source turns out to be malformed part-way (the message names the line)
     */
    int read(double[][] dest, int offset, int maxFrames) throws IOException, InputFormatException;
}
