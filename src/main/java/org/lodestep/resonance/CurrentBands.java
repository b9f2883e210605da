package org.lodestep.resonance;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;

/**
 * Bands from a phase current recorded through a sweep. The rotor's speed oscillation ω̃ modulates the back-EMF
 * e = K·ω·sin(N_r·θ) and so the current. At a low-speed resonance at f_n/k the oscillation is locked to the step
 * rate at k × the full-step rate = 4k × the electrical frequency f_e; its product with the EMF's sin(N_r·θ) at f_e
 * lands on the current's harmonics 4k − 1 and 4k + 1 of f_e (the 3rd and 5th for k = 1, the 7th and 9th for k = 2)
 * instead of forming a separate line. Each harmonic's level relative to the fundamental is tracked through the sweep
 * and bands are found where one of them rises over its running baseline ({@link BandDetector}); overlapping bands of
 * different harmonics are one band, named by its lowest-k harmonic (peak, excess, implied vibration frequency
 * k × the peak rate). Rates whose electrical frequency is within {@link SweepAnalyzer#MIN_ELECTRICAL_BINS} spectral
 * bins of zero are left out: their harmonics are not resolved.
 *
 * <p>Physics: the electrical equation L·di/dt = v − R·i − e with the hybrid motor's back-EMF (P. P. Acarnley,
 * <i>Stepping Motors</i>, 4th ed., IEE 2002, ch. 5, from memory); the sidebands of an amplitude-modulated carrier sit at
 * the carrier ± the modulating frequency (any signals text). A band's level in the result is the ratio of its
 * harmonic to the fundamental.
 */
final class CurrentBands {
    private CurrentBands() {
    }

    /**
     * @param rates     response-curve rates, full steps/s
     * @param harmonics amplitudes [h][point] of the harmonics {@link SweepAnalyzer#CURRENT_HARMONICS}, first the
     *                  fundamental
     */
    static List<ResonanceBand> find(double[] rates, double[][] harmonics, BandSettings settings) {
        List<ResonanceBand> found = new ArrayList<>();
        double[] fundamental = harmonics[0];
        for (int h = 1; h < harmonics.length; h++) {
            int order = SweepAnalyzer.CURRENT_HARMONICS[h];
            int k = (order + 1) / 4;
            List<Integer> keep = new ArrayList<>();
            for (int i = 0; i < rates.length; i++) {
                if (harmonics[h][i] > 0 && fundamental[i] > 0) {
                    keep.add(i);
                }
            }
            if (keep.size() < settings.minPoints()) {
                continue;
            }
            double[] r = new double[keep.size()];
            double[] level = new double[keep.size()];
            for (int j = 0; j < r.length; j++) {
                int i = keep.get(j);
                r[j] = rates[i];
                level[j] = 20 * Math.log10(harmonics[h][i] / fundamental[i]);
            }
            BandSettings relative = new BandSettings(settings.thresholdDb(), Double.NaN, settings.hysteresisDb(),
                    settings.baselineHalfWidth(), settings.baselineQuantile(), settings.mergeGap(),
                    settings.minPoints(), settings.edgeDropDb());
            for (BandDetector.Span sp : BandDetector.detect(r, level, relative)) {
                double peakRate = r[sp.peak()];
                double ratio = Math.pow(10, level[sp.peak()] / 20);
                found.add(new ResonanceBand(r[sp.first()], r[sp.last()], peakRate, ratio, level[sp.peak()],
                        sp.excessDb(), k * peakRate, BandClass.UNCLASSIFIED, 0));
            }
        }
        found.sort(Comparator.comparingDouble(ResonanceBand::startFullStepsPerS));
        List<ResonanceBand> merged = new ArrayList<>();
        for (ResonanceBand b : found) {
            ResonanceBand last = merged.isEmpty() ? null : merged.get(merged.size() - 1);
            if (last != null && b.startFullStepsPerS() <= last.endFullStepsPerS()) {
                // the lowest k (the 3rd and 5th harmonics: the rotor oscillating at the step rate) names the peak
                int kb = (int) Math.round(b.mechanicalFrequencyHz() / b.peakFullStepsPerS());
                int kl = (int) Math.round(last.mechanicalFrequencyHz() / last.peakFullStepsPerS());
                ResonanceBand strong = kb < kl || kb == kl && b.excessDb() > last.excessDb() ? b : last;
                merged.set(merged.size() - 1, new ResonanceBand(last.startFullStepsPerS(),
                        Math.max(last.endFullStepsPerS(), b.endFullStepsPerS()), strong.peakFullStepsPerS(),
                        strong.peakLevel(), strong.peakLevelDb(), strong.excessDb(), strong.mechanicalFrequencyHz(),
                        BandClass.UNCLASSIFIED, 0));
            } else {
                merged.add(b);
            }
        }
        return merged;
    }

    /** What a current capture can and cannot show, one paragraph; empty for vibration. */
    static String note(ResponseChannel kind) {
        return switch (kind) {
            case VIBRATION -> "";
            case CURRENT_CONSTANT_VOLTAGE -> "Bands from phase current are indirect evidence: the rotor's oscillation"
                    + " shows only through its back-EMF, as a change of the current's harmonics of the electrical"
                    + " frequency. On simulated constant-voltage sweeps the same band stands out by about as many dB"
                    + " as on an accelerometer, but its edges are less certain, a band under a few dB is lost in the"
                    + " drive's own harmonics, and a lightly loaded or well damped rotor leaves little trace: confirm"
                    + " with an accelerometer before relying on a clear range.";
            case CURRENT_CHOPPER -> "No bands reported: a current-regulating chopper holds the phase current to its"
                    + " setting, so the rotor's oscillation hardly reaches it; this capture cannot support bands."
                    + " Record an accelerometer or microphone, or sweep through a constant-voltage drive.";
        };
    }
}
