package org.lodestep.resonance;

/**
 * One point of the response curve: the vibration averaged over every segment whose step rate fell in one rate bin.
 * Amplitudes are peak amplitudes of the equivalent sine, RMS-averaged over the segments, in the channel's unit.
 *
 * @param rateFullStepsPerS   centre of the rate bin (mean rate of its segments), full steps/s
 * @param rms                 RMS of the vibration (mean removed), channel unit
 * @param levelDb             20·log10(rms), dB re 1 channel unit
 * @param electricalAmplitude component at the electrical frequency (rate/4)
 * @param order1Amplitude     component at 1× the full-step rate
 * @param order2Amplitude     component at 2× the full-step rate
 * @param order4Amplitude     component at 4× the full-step rate
 * @param segments            spectral segments averaged
 * @param baselineRms         the running baseline bands are measured from at this rate ({@link BandDetector}),
 *                            channel unit RMS; NaN where bands are not found on this curve (a current capture)
 * @param thresholdRms        the level a band must reach here to open (baseline plus the threshold, or the absolute
 *                            level), channel unit RMS; NaN like the baseline
 */
public record ResponsePoint(double rateFullStepsPerS, double rms, double levelDb, double electricalAmplitude,
                            double order1Amplitude, double order2Amplitude, double order4Amplitude, int segments,
                            double baselineRms, double thresholdRms) {
    public ResponsePoint {
        Require.positive(rateFullStepsPerS, "rate", "full steps/s");
        if (!(rms >= 0)) {
            throw new IllegalArgumentException("RMS must be non-negative, got " + rms);
        }
        if (segments < 1) {
            throw new IllegalArgumentException("a response point needs at least one segment, got " + segments);
        }
    }

    /** This point with the band detection's baseline and entry level at it, both in dB re 1 channel unit. */
    ResponsePoint withDetection(double baselineDb, double thresholdDb) {
        return new ResponsePoint(rateFullStepsPerS, rms, levelDb, electricalAmplitude, order1Amplitude,
                order2Amplitude, order4Amplitude, segments, Math.pow(10, baselineDb / 20), Math.pow(10, thresholdDb / 20));
    }
}
