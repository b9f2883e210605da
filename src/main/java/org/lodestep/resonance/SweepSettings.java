package org.lodestep.resonance;

import java.util.Objects;

import org.lodestep.signal.SpectralSettings;

/**
 * How a sweep capture is analysed: the spectral segments, the width of the step-rate bins of the response curve, and
 * the spectrogram's column limit. Immutable.
 *
 * @param spectral           segment length, overlap, window and detrending of every spectrum
 * @param rateResolution     relative width of a response-curve bin (0.01 = 1 % of the rate), 0.001 ... 0.2
 * @param spectrogramColumns column limit of the bounded spectrogram, at least 2
 */
public record SweepSettings(SpectralSettings spectral, double rateResolution, int spectrogramColumns) {
    public SweepSettings {
        Objects.requireNonNull(spectral, "spectral");
        if (!(rateResolution >= 0.001 && rateResolution <= 0.2)) {
            throw new IllegalArgumentException("rate resolution must be 0.001 ... 0.2 (0.1 % ... 20 % of the rate),"
                    + " got " + rateResolution);
        }
        if (spectrogramColumns < 2) {
            throw new IllegalArgumentException("spectrogram needs at least 2 columns, got " + spectrogramColumns);
        }
    }

    /**
     * Defaults for a sample rate: Hann segments of about 0.1 s (a power of two, 256 samples at least), 50 % overlap,
     * 1 % rate bins, 400 spectrogram columns.
     */
    public static SweepSettings forSampleRate(double sampleRateHz) {
        int n = 256;
        while (n * 2 <= sampleRateHz * 0.1) {
            n *= 2;
        }
        return new SweepSettings(SpectralSettings.hann(n), 0.01, 400);
    }

    /**
     * Defaults for a phase-current capture: as {@link #forSampleRate}, but segments of about 0.4 s, so that the
     * harmonics of a low electrical frequency (a quarter of the full-step rate) fall in separate bins.
     */
    public static SweepSettings forCurrent(double sampleRateHz) {
        int n = 1024;
        while (n * 2 <= sampleRateHz * 0.4) {
            n *= 2;
        }
        return new SweepSettings(SpectralSettings.hann(n), 0.01, 400);
    }
}
