package org.lodestep.resonance;

/**
 * Classifies a band against the natural frequency f_n, and estimates f_n from the bands when it is not given.
 *
 * <p>Low-speed resonance occurs at step rates near f_n and its sub-multiples f_n/k (P. P. Acarnley, <i>Stepping
 * Motors</i>, 4th ed., IEE 2002, section 4.3); instability well above f_n is the mid-band kind (ibid., section 5.5).
 * The ±15 % tolerance, k up to 4, and the 10 % match of a band's vibration frequency to k × its step rate are
 * common practice (no published source).
 */
final class BandClassifier {
    static final double TOLERANCE = 0.15;
    static final int MAX_SUBHARMONIC = 4;
    private static final double ESTIMATE_MATCH = 0.10;

    private BandClassifier() {
    }

    static ResonanceBand classify(ResonanceBand b, double naturalHz) {
        if (Double.isNaN(naturalHz)) {
            return b.classified(BandClass.UNCLASSIFIED, 0);
        }
        double q = b.peakFullStepsPerS() / naturalHz;
        for (int k = 1; k <= MAX_SUBHARMONIC; k++) {
            // The band itself is evidence too: a band that straddles f_n/k counts even if its peak is off-centre.
            if (Math.abs(q * k - 1) <= TOLERANCE || b.contains(naturalHz / k)) {
                return b.classified(BandClass.LOW_SPEED_RESONANCE, k);
            }
        }
        if (q > 1 + TOLERANCE) {
            return b.classified(BandClass.MID_BAND_INSTABILITY, 0);
        }
        return b.classified(BandClass.UNCLASSIFIED, 0);
    }

    /**
     * f_n estimated from the bands whose vibration frequency is k × their peak step rate (k = 1 ... 4), the signature
     * of a step-excited ring-down: of those, the one with the lowest peak level, because the sinusoidal torque-angle
     * curve softens with amplitude (Acarnley 2002, ch. 4) and the weakest oscillation is nearest the small-signal f_n.
     * NaN when no band shows the signature.
     */
    static double estimateNaturalHz(java.util.List<ResonanceBand> bands) {
        ResonanceBand best = null;
        for (ResonanceBand b : bands) {
            double f = b.mechanicalFrequencyHz();
            if (!(f > 0)) {
                continue;
            }
            long k = Math.round(f / b.peakFullStepsPerS());
            if (k >= 1 && k <= MAX_SUBHARMONIC
                    && Math.abs(f - k * b.peakFullStepsPerS()) <= ESTIMATE_MATCH * f
                    && (best == null || b.peakLevelDb() < best.peakLevelDb())) {
                best = b;
            }
        }
        return best == null ? Double.NaN : best.mechanicalFrequencyHz();
    }
}
