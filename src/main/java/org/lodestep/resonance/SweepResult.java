package org.lodestep.resonance;

import java.util.List;
import java.util.Objects;

import org.lodestep.signal.Spectrogram;
import org.lodestep.signal.Spectrum;

/**
 * Everything a sweep analysis found: the response curve, the bands, the natural frequency used to classify them,
 * the whole-capture power spectral density and the bounded spectrogram.
 *
 * @param response              response-curve points, by increasing rate
 * @param bands                 bands, by increasing rate
 * @param naturalFrequencyHz    f_n used for classification, Hz, or NaN when neither given nor estimated
 * @param naturalFrequencySource "given", "estimated" (from a band's vibration frequency) or "none"
 * @param rateSource            "law" (programmed sweep) or "pulses" (recorded step-pulse channel)
 * @param psd                   Welch PSD of the whole capture (DENSITY scaling)
 * @param spectrogram           short-time spectra over the capture
 * @param segments              spectral segments analysed
 * @param segmentsOutsideSweep  segments without a defined step rate (before/after the sweep, no pulses)
 * @param durationS             length of the capture analysed, s
 * @param responseChannel       what the analysed channel measures (vibration, or a phase current and its drive)
 * @param stall                 whether and where the rotor lost synchronism with the step command
 * @param watch                 near-threshold bumps at f_n/k, below the band threshold
 * @param evidenceNote          for a current capture, how far its evidence goes; empty for vibration
 */
public record SweepResult(List<ResponsePoint> response, List<ResonanceBand> bands, double naturalFrequencyHz,
                          String naturalFrequencySource, String rateSource, Spectrum psd, Spectrogram spectrogram,
                          long segments, long segmentsOutsideSweep, double durationS,
                          ResponseChannel responseChannel, Stall stall, List<WatchPoint> watch, String evidenceNote) {
    public SweepResult {
        Objects.requireNonNull(responseChannel, "responseChannel");
        Objects.requireNonNull(stall, "stall");
        watch = List.copyOf(watch);
        Objects.requireNonNull(evidenceNote, "evidenceNote");
        response = List.copyOf(response);
        bands = List.copyOf(bands);
        Objects.requireNonNull(naturalFrequencySource, "naturalFrequencySource");
        Objects.requireNonNull(rateSource, "rateSource");
    }

    /** The band with the highest peak level (the loudest vibration), or null when there is none. */
    public ResonanceBand strongestBand() {
        ResonanceBand best = null;
        for (ResonanceBand b : bands) {
            if (best == null || b.peakLevel() > best.peakLevel()) {
                best = b;
            }
        }
        return best;
    }

    /** Frequency of the whole-capture PSD's strongest bin above twice the bin width (clear of DC), Hz. */
    public double psdPeakHz() {
        return psd.frequencyHz(psd.peakBin(psd.binHz() * 2));
    }
}
