package org.lodestep.resonance;

import java.util.Arrays;

import org.lodestep.signal.Detrend;
import org.lodestep.signal.Spectrum;
import org.lodestep.signal.SpectrumScaling;
import org.lodestep.signal.Window;

/**
 * The amplitude spectrum of a ring-down's decay, in dB below its strongest bin, from 0 Hz to a few times the natural
 * frequency: the line a reader checks the fitted natural frequency against.
 *
 * <p>The decay from its largest excursion is its own window (it starts at its peak and dies into the noise), so it
 * is transformed with a rectangular window after the settled value is taken off, and zero-padded to at least
 * {@link #PADDING} times its length so the drawn curve follows the continuous spectrum between bins. A decaying
 * sinusoid e^(-σt)·cos(ω_d·t) has a Lorentzian line at ω_d of half-power half-width σ (A. V. Oppenheim and
 * R. W. Schafer, <i>Discrete-Time Signal Processing</i>, 3rd ed., 2010, on the DTFT of a one-sided exponential;
 * references §23).
 *
 * @param frequencyHz bin frequencies, Hz, increasing from 0
 * @param levelDb     20·log10 of each bin's amplitude over the strongest bin's, dB (0 at the peak)
 * @param peakHz      frequency of the strongest bin above the lowest bins, refined by a parabola through its
 *                    neighbours' levels, Hz
 */
public record RingSpectrum(double[] frequencyHz, double[] levelDb, double peakHz) {
    /** The decay is zero-padded to at least this many times its length. */
    static final int PADDING = 8;
    /** Levels are kept down to this far below the peak, dB; lower ones are clipped to it. */
    static final double FLOOR_DB = -80;

    public RingSpectrum {
        if (frequencyHz.length != levelDb.length || frequencyHz.length < 2) {
            throw new IllegalArgumentException("a ring spectrum needs matching frequencies and levels, got "
                    + frequencyHz.length + " and " + levelDb.length);
        }
        frequencyHz = frequencyHz.clone();
        levelDb = levelDb.clone();
    }

    @Override
    public double[] frequencyHz() {
        return frequencyHz.clone();
    }

    @Override
    public double[] levelDb() {
        return levelDb.clone();
    }

    /**
     * @param decay        the decay, from the ring's largest excursion to where it has fallen into the noise
     * @param settled      the settled value the ring decays to, same unit
     * @param sampleRateHz samples per second
     * @param upToHz       highest frequency kept (clipped to the Nyquist frequency), Hz
     */
    public static RingSpectrum of(double[] decay, double settled, double sampleRateHz, double upToHz) {
        Require.positive(sampleRateHz, "sample rate", "Hz");
        Require.positive(upToHz, "highest frequency", "Hz");
        if (decay.length < 8) {
            throw new IllegalArgumentException("a ring spectrum needs at least 8 samples of decay, got "
                    + decay.length);
        }
        int n = Integer.highestOneBit(decay.length * PADDING - 1) << 1;
        double[] x = new double[n];
        for (int i = 0; i < decay.length; i++) {
            x[i] = decay[i] - settled;
        }
        double[] a = Spectrum.of(x, sampleRateHz, Window.RECTANGULAR, Detrend.NONE, SpectrumScaling.AMPLITUDE)
                .values();
        double binHz = sampleRateHz / n;
        int keep = (int) Math.min(a.length, Math.floor(upToHz / binHz) + 1);
        // the strongest bin clear of DC (a settled value a little off leaves a low-frequency bump)
        int from = Math.min(keep - 2, PADDING);
        int peak = from;
        for (int k = from; k < keep - 1; k++) {
            if (a[k] > a[peak]) {
                peak = k;
            }
        }
        if (!(a[peak] > 0)) {
            throw new IllegalArgumentException("the decay is flat: no spectrum to draw");
        }
        double[] f = new double[keep];
        double[] db = new double[keep];
        for (int k = 0; k < keep; k++) {
            f[k] = k * binHz;
            db[k] = Math.max(FLOOR_DB, 20 * Math.log10(Math.max(a[k], Double.MIN_NORMAL) / a[peak]));
        }
        double delta = 0;
        if (peak > 0 && peak + 1 < a.length) {
            double l = Math.log(Math.max(a[peak - 1], Double.MIN_NORMAL));
            double c = Math.log(a[peak]);
            double r = Math.log(Math.max(a[peak + 1], Double.MIN_NORMAL));
            double den = l - 2 * c + r;
            delta = den < 0 ? Math.max(-0.5, Math.min(0.5, 0.5 * (l - r) / den)) : 0;
        }
        return new RingSpectrum(f, db, (peak + delta) * binHz);
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof RingSpectrum r && Arrays.equals(frequencyHz, r.frequencyHz)
                && Arrays.equals(levelDb, r.levelDb) && peakHz == r.peakHz;
    }

    @Override
    public int hashCode() {
        return 31 * Arrays.hashCode(frequencyHz) + Arrays.hashCode(levelDb);
    }

    @Override
    public String toString() {
        return "RingSpectrum[" + frequencyHz.length + " bins, peak " + peakHz + " Hz]";
    }
}
