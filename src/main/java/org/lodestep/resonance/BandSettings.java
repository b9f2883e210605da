package org.lodestep.resonance;

/**
 * How bands are found in a response curve: a robust baseline (a running low quantile over a rate window), an entry
 * threshold over it (or an absolute level), hysteresis for the exit, and merging of close bands. Immutable.
 *
 * @param thresholdDb        entry level over the baseline, dB (used when {@code absoluteLevel} is NaN), positive
 * @param absoluteLevel      entry level as an RMS in the channel's unit, or NaN to use the relative threshold
 * @param hysteresisDb       a band ends when the level falls this far below the entry level, dB, 0 ... threshold
 * @param baselineHalfWidth  the baseline at rate r is taken over r/(1+w) ... r·(1+w), 0.05 ... 2
 * @param baselineQuantile   which quantile of that window is the baseline, 0.05 ... 0.5 (0.5 = running median)
 * @param mergeGap           bands closer than this fraction of the rate are merged, 0 ... 0.5
 * @param minPoints          response-curve points a band needs, at least 1
 * @param edgeDropDb         a band's edges are where the level has fallen this far below its peak, dB, positive
 *                           (3 dB: the half-power points of a resonance, S. S. Rao, <i>Mechanical Vibrations</i>,
 *                           5th ed., 2011, ch. 3, from memory)
 */
public record BandSettings(double thresholdDb, double absoluteLevel, double hysteresisDb, double baselineHalfWidth,
                           double baselineQuantile, double mergeGap, int minPoints, double edgeDropDb) {
    public BandSettings {
        Require.positive(thresholdDb, "threshold over baseline", "dB");
        if (!Double.isNaN(absoluteLevel) && !(absoluteLevel > 0 && Double.isFinite(absoluteLevel))) {
            throw new IllegalArgumentException("absolute level must be a positive RMS, got " + absoluteLevel);
        }
        if (!(hysteresisDb >= 0 && hysteresisDb <= thresholdDb)) {
            throw new IllegalArgumentException("hysteresis must be 0 ... " + thresholdDb + " dB (the threshold), got "
                    + hysteresisDb + " dB");
        }
        if (!(baselineHalfWidth >= 0.05 && baselineHalfWidth <= 2)) {
            throw new IllegalArgumentException("baseline half-width must be 0.05 ... 2 (fraction of the rate), got "
                    + baselineHalfWidth);
        }
        if (!(baselineQuantile >= 0.05 && baselineQuantile <= 0.5)) {
            throw new IllegalArgumentException("baseline quantile must be 0.05 ... 0.5, got " + baselineQuantile);
        }
        if (!(mergeGap >= 0 && mergeGap <= 0.5)) {
            throw new IllegalArgumentException("merge gap must be 0 ... 0.5 (fraction of the rate), got " + mergeGap);
        }
        Require.positive(edgeDropDb, "band edge drop", "dB");
        if (minPoints < 1) {
            throw new IllegalArgumentException("a band needs at least 1 point, got " + minPoints);
        }
    }

    /**
     * 3 dB over the running 20th percentile from r/2 to 2·r, 1.5 dB hysteresis, merge within 5 %, at least 2 points,
     * edges at the half-power points (3 dB below the peak). A low quantile rather than the median, because a lightly
     * damped low-speed resonance can span a third of the window and would lift a median. Chosen on simulated sweeps
     * (ours and the virtual rig's): common practice (no published source).
     */
    public static BandSettings defaults() {
        return new BandSettings(3.0, Double.NaN, 1.5, 1.0, 0.2, 0.05, 2, 3.0);
    }
}
