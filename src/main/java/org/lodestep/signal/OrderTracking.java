package org.lodestep.signal;

/**
 * Amplitude of a component whose frequency moves with speed (an order of the step rate), read from one segment's
 * spectrum: the power of the bins within the window's main lobe around the expected frequency, summed and converted
 * to the peak amplitude of an equivalent sine.
 *
 * <p>Summing the main-lobe bins and dividing by the window's ENBW recovers a sine's power wherever it falls between
 * bins (Harris 1978, Proc. IEEE 66(1), section IV: ENBW and processing loss); this departs from reading the single
 * nearest bin, which would lose up to the window's scalloping loss.
 */
public final class OrderTracking {
    private OrderTracking() {
    }

    /**
     * @param magnitudeSquared |X_k|² of one segment (k = 0 ... n/2)
     * @param framer           the segmenter that produced it (for bin width and window sums)
     * @param frequencyHz      expected frequency of the component, in Hz
     * @return peak amplitude of the component, in signal units; NaN when the frequency is outside 0 ... Nyquist
     */
    public static double amplitudeAt(double[] magnitudeSquared, SegmentSpectra framer, double frequencyHz) {
        double binHz = framer.binHz();
        int last = magnitudeSquared.length - 1;
        double bin = frequencyHz / binHz;
        if (!(bin >= 0) || bin > last) {
            return Double.NaN;
        }
        int half = framer.settings().window().mainLobeHalfWidthBins();
        int centre = (int) Math.round(bin);
        double power = 0;
        for (int k = Math.max(1, centre - half); k <= Math.min(last - 1, centre + half); k++) {
            power += framer.scale(magnitudeSquared[k], k, SpectrumScaling.POWER);
        }
        double enbw = framer.enbwBins();
        // POWER scaling gives a bin-centred sine's mean square A²/2 in one bin; noise-like spreading over the lobe
        // sums to ENBW times that.
        return Math.sqrt(2 * power / enbw);
    }
}
