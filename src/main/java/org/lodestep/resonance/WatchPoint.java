package org.lodestep.resonance;

/**
 * A bump of the response at a sub-multiple f_n/k of the natural frequency that stays under the band threshold:
 * not a band to avoid, but a rate to keep an eye on (a heavier load or less damping can raise it over the threshold).
 *
 * @param subharmonic       k: the bump sits at f_n/k
 * @param rateFullStepsPerS rate of the bump's highest point, full steps/s
 * @param excessDb          its level over the running baseline, dB (below the band threshold)
 * @param levelDb           its level, dB re 1 channel unit
 */
public record WatchPoint(int subharmonic, double rateFullStepsPerS, double excessDb, double levelDb) {
    public WatchPoint {
        if (subharmonic < 1) {
            throw new IllegalArgumentException("subharmonic must be at least 1, got " + subharmonic);
        }
        Require.positive(rateFullStepsPerS, "watch rate", "full steps/s");
        if (!Double.isFinite(excessDb)) {
            throw new IllegalArgumentException("watch excess must be finite, got " + excessDb + " dB");
        }
    }
}
