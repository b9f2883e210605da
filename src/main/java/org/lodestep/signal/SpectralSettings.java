package org.lodestep.signal;

import java.util.Objects;

/**
 * How a stream is cut into segments for spectra: segment length, overlap, window and detrending. Immutable.
 *
 * @param segmentLength  samples per segment (at least 8); a power of two is fastest
 * @param overlapSamples samples shared by consecutive segments, 0 ... segmentLength - 1
 * @param window         data window applied to each segment
 * @param detrend        what is removed from each segment before windowing
 */
public record SpectralSettings(int segmentLength, int overlapSamples, Window window, Detrend detrend) {
    public SpectralSettings {
        Objects.requireNonNull(window, "window");
        Objects.requireNonNull(detrend, "detrend");
        if (segmentLength < 8) {
            throw new IllegalArgumentException("segment length must be at least 8 samples, got " + segmentLength);
        }
        if (overlapSamples < 0 || overlapSamples >= segmentLength) {
            throw new IllegalArgumentException("overlap must be 0 ... " + (segmentLength - 1) + " samples, got "
                    + overlapSamples);
        }
    }

    /** Hann window, 50 % overlap, mean removed: the common Welch defaults (SciPy {@code welch} documentation). */
    public static SpectralSettings hann(int segmentLength) {
        return new SpectralSettings(segmentLength, segmentLength / 2, Window.HANN, Detrend.MEAN);
    }

    /** Samples between the starts of consecutive segments. */
    public int hopSamples() {
        return segmentLength - overlapSamples;
    }

    /** Number of one-sided bins, segmentLength / 2 + 1. */
    public int binCount() {
        return segmentLength / 2 + 1;
    }
}
