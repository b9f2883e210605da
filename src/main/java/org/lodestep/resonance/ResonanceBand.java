package org.lodestep.resonance;

/**
 * A range of step rates where the vibration rises over its baseline.
 *
 * @param startFullStepsPerS   lowest rate of the band, full steps/s
 * @param endFullStepsPerS     highest rate of the band, full steps/s
 * @param peakFullStepsPerS    rate of the strongest point, full steps/s
 * @param peakLevel            RMS vibration at the peak, channel unit
 * @param peakLevelDb          20·log10(peakLevel), dB re 1 channel unit
 * @param excessDb             peak level over the baseline there, dB
 * @param mechanicalFrequencyHz strongest vibration frequency inside the band, Hz (NaN if none stood out)
 * @param bandClass            low-speed resonance, mid-band instability, or unclassified
 * @param subharmonic          k when the band sits at f_n/k (1 = at f_n), 0 otherwise
 */
public record ResonanceBand(double startFullStepsPerS, double endFullStepsPerS, double peakFullStepsPerS,
                            double peakLevel, double peakLevelDb, double excessDb, double mechanicalFrequencyHz,
                            BandClass bandClass, int subharmonic) {
    public ResonanceBand {
        Require.positive(startFullStepsPerS, "band start", "full steps/s");
        if (!(endFullStepsPerS >= startFullStepsPerS)) {
            throw new IllegalArgumentException("band ends (" + endFullStepsPerS + " full steps/s) before it starts ("
                    + startFullStepsPerS + " full steps/s)");
        }
        if (!(peakFullStepsPerS >= startFullStepsPerS && peakFullStepsPerS <= endFullStepsPerS)) {
            throw new IllegalArgumentException("band peak " + peakFullStepsPerS + " full steps/s lies outside "
                    + startFullStepsPerS + " ... " + endFullStepsPerS);
        }
        if (bandClass == null) {
            throw new IllegalArgumentException("band class is missing");
        }
    }

    /** Whether a rate (full steps/s) lies within the band. */
    public boolean contains(double rateFullStepsPerS) {
        return rateFullStepsPerS >= startFullStepsPerS && rateFullStepsPerS <= endFullStepsPerS;
    }

    ResonanceBand classified(BandClass c, int k) {
        return new ResonanceBand(startFullStepsPerS, endFullStepsPerS, peakFullStepsPerS, peakLevel, peakLevelDb,
                excessDb, mechanicalFrequencyHz, c, k);
    }
}
