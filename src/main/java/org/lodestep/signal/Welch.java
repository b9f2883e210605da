package org.lodestep.signal;

/**
 * Welch's averaged modified periodogram, computed as samples arrive: memory is a few segments whatever the capture
 * length.
 *
 * <p>Source: P. D. Welch, "The use of fast Fourier transform for the estimation of power spectra: a method based on
 * time averaging over short, modified periodograms", IEEE Trans. Audio Electroacoust. 15(2), 1967, pp. 70-73.
 * Scaling per {@link SpectrumScaling}; a trailing partial segment is dropped, as in the paper's K whole segments.
 */
public final class Welch implements SegmentSpectra.Listener {
    private final SegmentSpectra framer;
    private final double[] sumMag2;
    private long count;

    /** A stand-alone estimator with its own segmenter; feed it with {@link #feed}. */
    public Welch(SpectralSettings settings, double sampleRateHz) {
        this(new SegmentSpectra(settings, sampleRateHz));
    }

    /** An estimator listening to a shared segmenter, so other analyses reuse the same FFTs. */
    public Welch(SegmentSpectra framer) {
        this.framer = framer;
        this.sumMag2 = new double[framer.settings().binCount()];
        framer.addListener(this);
    }

    /** Feeds samples to the segmenter; see {@link SegmentSpectra#feed}. */
    public void feed(double[] x, int off, int len) {
        framer.feed(x, off, len);
    }

    @Override
    public void segment(long firstSample, double[] magnitudeSquared, double meanSquare) {
        for (int k = 0; k < sumMag2.length; k++) {
            sumMag2[k] += magnitudeSquared[k];
        }
        count++;
    }

    /** Number of segments averaged so far. */
    public long segmentCount() {
        return count;
    }

    /**
     * The averaged spectrum so far.
     *
     * @throws IllegalStateException before one whole segment has arrived
     */
    public Spectrum spectrum(SpectrumScaling scaling) {
        if (count == 0) {
            throw new IllegalStateException("no whole segment of " + framer.settings().segmentLength()
                    + " samples yet");
        }
        double[] v = new double[sumMag2.length];
        for (int k = 0; k < v.length; k++) {
            v[k] = framer.scale(sumMag2[k] / count, k, scaling);
        }
        return new Spectrum(v, framer.binHz(), scaling, count);
    }
}
