package org.lodestep.workflow;

import java.io.IOException;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.List;
import java.util.Objects;

import org.lodestep.capture.Captures;
import org.lodestep.resonance.RingDownFit;
import org.lodestep.resonance.RingDownResult;
import org.lodestep.resonance.RingSpectrum;
import org.lodestep.sample.InputFormatException;
import org.lodestep.sample.SampledSignal;
import org.lodestep.signal.LoneSamples;
import org.lodestep.signal.LoneSamples.LoneSample;

/**
 * Fits a damped oscillation to a single-step (or tap) response: picks the channel, cuts the time window, bridges
 * lone glitch samples ({@link LoneSamples}), runs {@link RingDownFit} and hands back the fitted stretch with the fit,
 * so a report draws both without refitting.
 *
 * <p>Errors: a window that selects no samples is an {@link IllegalArgumentException} (the caller's setting); a
 * capture that holds no ring-down is an {@link InputFormatException} naming the source and channel.
 */
public final class ResonanceRingdown {
    /** The ring's spectrum is kept up to this many times its natural frequency. */
    public static final double SPECTRUM_SPAN = 4;

    private ResonanceRingdown() {
    }

    /**
     * @param channel channel to fit by name or header, or null for the first
     * @param fromS   ignore samples before this time, s, or null
     * @param toS     ignore samples after this time, s, or null
     */
    public record Settings(String channel, Double fromS, Double toS) {
        public static final Settings DEFAULT = new Settings(null, null, null);
    }

    /**
     * @param source  the capture's name
     * @param channel the fitted channel's name
     * @param unit    its unit ("" when none)
     * @param timeS   time of each sample of the analysed window, s
     * @param values  the analysed window, in the channel's unit
     * @param fit     the fitted ring-down; its {@link RingDownResult#fittedAt} and envelope methods give the curves
     * @param decayFrom index of the ring's largest excursion in {@code timeS}, where the decay worth drawing starts
     * @param decayTo   index after the last sample of the decay: where the envelope has fallen into the noise
     *                  ({@link RingDownResult#decayEndTimeS}), or the end of the window
     * @param spectrum  the decay's spectrum ({@link RingSpectrum}), up to {@link #SPECTRUM_SPAN} times f_n
     * @param bridged   samples taken for glitches ({@link LoneSamples}): in {@code values} and in the fit each
     *                  stands bridged by its neighbours' mean; indices into {@code timeS}
     */
    public record Result(String source, String channel, String unit, double[] timeS, double[] values,
                         RingDownResult fit, int decayFrom, int decayTo, RingSpectrum spectrum,
                         List<LoneSample> bridged) {
        public Result {
            Objects.requireNonNull(fit, "fit");
            Objects.requireNonNull(spectrum, "spectrum");
            bridged = List.copyOf(bridged);
            if (timeS.length != values.length) {
                throw new IllegalArgumentException("time and values differ in length: " + timeS.length + " and "
                        + values.length + " samples");
            }
            if (!(decayFrom >= 0 && decayFrom < decayTo && decayTo <= timeS.length)) {
                throw new IllegalArgumentException("decay " + decayFrom + " ... " + decayTo + " lies outside the "
                        + timeS.length + " samples");
            }
            timeS = timeS.clone();
            values = values.clone();
        }

        /** Sample times of the decay, s. */
        public double[] decayTimeS() {
            return Arrays.copyOfRange(timeS, decayFrom, decayTo);
        }

        /** The decay, in the channel's unit. */
        public double[] decayValues() {
            return Arrays.copyOfRange(values, decayFrom, decayTo);
        }

        @Override
        public double[] timeS() {
            return timeS.clone();
        }

        @Override
        public double[] values() {
            return values.clone();
        }
    }

    /** Reads a capture file (CSV, WAV or rig capture) and fits it. */
    public static Result fit(Path file, Settings settings, Progress progress) throws IOException, InputFormatException {
        progress.step("reading " + file);
        return fit(Captures.readAll(file), settings, progress);
    }

    /** Fits a capture held in memory. */
    public static Result fit(SampledSignal sig, Settings settings, Progress progress) throws InputFormatException {
        String source = sig.source();
        if (sig.channels().isEmpty()) {
            throw new InputFormatException(source, InputFormatException.NO_LINE, null, null, "has no data channels");
        }
        int c = settings.channel() == null ? 0
                : ResonanceSweep.index(sig.channels(), settings.channel(), source, "channel");
        String name = sig.channels().get(c).name();
        double[] x = sig.channel(c);
        double fs = sig.sampleRateHz();
        int from = settings.fromS() == null ? 0
                : (int) Math.max(0, Math.ceil((settings.fromS() - sig.startTimeS()) * fs));
        int to = settings.toS() == null ? x.length
                : (int) Math.min(x.length, Math.floor((settings.toS() - sig.startTimeS()) * fs) + 1);
        if (to <= from) {
            throw new IllegalArgumentException("the time window (from-s/to-s) selects no samples of " + source
                    + " (it runs from " + sig.startTimeS() + " s for " + x.length / fs + " s)");
        }
        // One bad sample would otherwise be the ring's largest excursion and its fit's worst residual.
        double[] read = Arrays.copyOfRange(x, from, to);
        List<LoneSample> lone = LoneSamples.find(read);
        double[] part = LoneSamples.bridged(read, lone);
        double t0 = sig.startTimeS() + from / fs;
        progress.step("fitting the ring-down of channel " + name);
        RingDownResult r;
        try {
            r = RingDownFit.fit(part, fs, t0);
        } catch (IllegalArgumentException e) {
            throw ResonanceSweep.cannot(source, name, e);
        }
        double[] t = new double[part.length];
        for (int i = 0; i < t.length; i++) {
            t[i] = t0 + i / fs;
        }
        int decayFrom = (int) Math.max(0, Math.min(part.length - 1, Math.round((r.ringStartTimeS() - t0) * fs)));
        double end = r.decayEndTimeS();
        int decayTo = Double.isFinite(end) ? (int) Math.min(part.length, Math.ceil((end - t0) * fs) + 1)
                : part.length;
        // at least two fitted periods, so a ring that starts near the noise still shows its shape
        int twoPeriods = (int) Math.ceil((r.startTimeS() - t0 + 2 / r.dampedFrequencyHz()) * fs);
        decayTo = Math.max(decayTo, Math.min(part.length, Math.max(decayFrom + 8, twoPeriods)));
        RingSpectrum spectrum = RingSpectrum.of(Arrays.copyOfRange(part, decayFrom, decayTo), r.offset(), fs,
                SPECTRUM_SPAN * r.naturalFrequencyHz());
        return new Result(source, name, sig.channels().get(c).unit(), t, part, r, decayFrom, decayTo, spectrum, lone);
    }
}
