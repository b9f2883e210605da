package org.lodestep.resonance;

/**
 * Classifies a band against the natural frequency f_n, and estimates f_n from the bands when it is not given.
 *
 * <p>Rules, in order:
 * <ol>
 * <li>Parametric resonance: the band's vibration frequency is within ±15 % of f_n and is a half-odd multiple
 * (k/2, k = 1, 3, 5, 7) of its peak step rate, so the rate is near 2·f_n/k. The stiffness of a hybrid stepper is
 * modulated at the full-step rate (the detent, and the torque ripple between microsteps); a Mathieu-type system
 * x'' + ω_0²(1 + ε·cos Ωt)x = 0 is unstable in tongues around Ω = 2ω_0/k and answers at ω_0 (A. H. Nayfeh,
 * D. T. Mook, <i>Nonlinear Oscillations</i>, Wiley 1979, ch. 5, parametrically excited systems; from memory).</li>
 * <li>Low-speed resonance: the peak step rate is within ±15 % of f_n/k (k = 1 ... 4), or the band straddles f_n/k:
 * each step re-excites the ring-down in phase (P. P. Acarnley, <i>Stepping Motors</i>, 4th ed., IEE 2002,
 * section 4.3).</li>
 * <li>Mid-band instability: the rate is above 1.15·f_n and the vibration is not at f_n nor at an integer or half
 * multiple of the rate that would make it one of the above (ibid., section 5.5).</li>
 * <li>Otherwise unclassified.</li>
 * </ol>
 * The ±15 % tolerance, k up to 4 (7 for the parametric tongues), and the 10 % match of a vibration frequency to a
 * multiple of the rate are common practice (no published source).
 */
final class BandClassifier {
    static final double TOLERANCE = 0.15;
    static final int MAX_SUBHARMONIC = 4;
    static final int MAX_PARAMETRIC_TONGUE = 7;
    private static final double ESTIMATE_MATCH = 0.10;

    private BandClassifier() {
    }

    static ResonanceBand classify(ResonanceBand b, double naturalHz) {
        if (Double.isNaN(naturalHz)) {
            return b.classified(BandClass.UNCLASSIFIED, 0);
        }
        double q = b.peakFullStepsPerS() / naturalHz;
        int tongue = parametricTongue(b, naturalHz);
        if (tongue > 0) {
            return b.classified(BandClass.PARAMETRIC_RESONANCE, tongue);
        }
        for (int k = 1; k <= MAX_SUBHARMONIC; k++) {
            // The band itself is evidence too: a band that straddles f_n/k counts even if its peak is off-centre.
            if (Math.abs(q * k - 1) <= TOLERANCE || b.contains(naturalHz / k)) {
                return b.classified(BandClass.LOW_SPEED_RESONANCE, k);
            }
        }
        // vibration at f_n far above it fits neither the ring-down nor the electro-mechanical instability
        boolean ringsAtNatural = b.mechanicalFrequencyHz() > 0
                && Math.abs(b.mechanicalFrequencyHz() / naturalHz - 1) <= TOLERANCE;
        if (q > 1 + TOLERANCE && !ringsAtNatural) {
            return b.classified(BandClass.MID_BAND_INSTABILITY, 0);
        }
        return b.classified(BandClass.UNCLASSIFIED, 0);
    }

    /**
     * k (1, 3, 5 or 7) when the band vibrates near f_n at k/2 times its peak step rate, else 0.
     */
    static int parametricTongue(ResonanceBand b, double naturalHz) {
        double f = b.mechanicalFrequencyHz();
        if (!(f > 0) || Math.abs(f / naturalHz - 1) > TOLERANCE) {
            return 0;
        }
        for (int k = 1; k <= MAX_PARAMETRIC_TONGUE; k += 2) {
            double expected = k * b.peakFullStepsPerS() / 2;
            if (Math.abs(f - expected) <= ESTIMATE_MATCH * f && Math.abs(2 * naturalHz / k / b.peakFullStepsPerS() - 1)
                    <= TOLERANCE) {
                return k;
            }
        }
        return 0;
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
