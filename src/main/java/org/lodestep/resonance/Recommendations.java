package org.lodestep.resonance;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * Turns bands into an avoid-list in the user's units, with the least acceleration to cross each band and whether
 * finer microstepping or more damping should help.
 *
 * <p>Reasoning (P. P. Acarnley, <i>Stepping Motors</i>, 4th ed., IEE 2002, sections 4.3 and 5.5): low-speed
 * resonance is excited by the discrete torque impulse of each full step, so microstepping, which splits that impulse
 * into smaller ones, weakens it, and so does damping; mid-band instability is an interaction of the rotor's
 * oscillation with the winding currents, which microstepping barely changes while mechanical damping (or a drive's
 * compensation) suppresses it. A parametric resonance is driven by the detent's stiffness modulation at the step
 * rate (A. H. Nayfeh, D. T. Mook, Nonlinear Oscillations, Wiley 1979, ch. 5; from memory), which microstepping
 * does not remove while damping raises its threshold. The widening margin is common practice (no published source).
 */
public final class Recommendations {
    /** Damping ratio below which a resonance is called lightly damped: common practice (no published source). */
    static final double LIGHT_DAMPING = 0.05;

    private Recommendations() {
    }

    /**
     * @param bands           bands from a sweep
     * @param units           the user's microstep setting, rotor teeth and axis travel
     * @param naturalHz       natural frequency (Hz) or NaN
     * @param dampingRatio    damping ratio from a ring-down, or NaN
     * @param crossingPeriods oscillation periods allowed for crossing a band (positive)
     * @param margin          fraction to widen each band by on both sides, 0 ... 0.5
     */
    public static AvoidList avoidList(List<ResonanceBand> bands, RateUnits units, double naturalHz,
                                      double dampingRatio, double crossingPeriods, double margin) {
        if (!(margin >= 0 && margin <= 0.5)) {
            throw new IllegalArgumentException("margin must be 0 ... 0.5 (fraction of the rate), got " + margin);
        }
        Require.positive(crossingPeriods, "crossing periods", "");
        List<AvoidRange> ranges = new ArrayList<>();
        for (ResonanceBand b : bands) {
            double from = b.startFullStepsPerS() * (1 - margin);
            double to = b.endFullStepsPerS() * (1 + margin);
            double osc = b.mechanicalFrequencyHz() > 0 ? b.mechanicalFrequencyHz()
                    : naturalHz > 0 ? naturalHz : b.peakFullStepsPerS();
            double accel = CrossingAcceleration.minimumFullStepsPerS2(to - from, osc, crossingPeriods);
            boolean micro = b.bandClass() == BandClass.LOW_SPEED_RESONANCE;
            ranges.add(new AvoidRange(from, to, units.pulsesPerS(from), units.pulsesPerS(to), units.rpm(from),
                    units.rpm(to), units.mmPerS(from), units.mmPerS(to), b.bandClass(), b.subharmonic(), osc,
                    accel, units.pulsesPerS(accel), units.mmPerS(accel), micro, true, advice(b, naturalHz)));
        }
        List<String> notes = new ArrayList<>();
        if (dampingRatio < LIGHT_DAMPING) {
            notes.add(String.format(Locale.ROOT, "Lightly damped (damping ratio %.3f): bands will be sharp and"
                    + " strong; added damping (a viscous inertia damper, a compliant coupling with loss) helps most.",
                    dampingRatio));
        }
        if (units.microsteps() == 1 && ranges.stream().anyMatch(AvoidRange::microsteppingHelps)) {
            notes.add("Running full steps: a microstepping drive (8 or more pulses per full step) weakens the"
                    + " low-speed bands.");
        }
        if (Double.isNaN(naturalHz) && !bands.isEmpty()) {
            notes.add("Natural frequency unknown: run a ring-down or a prediction and pass --natural-hz to classify"
                    + " the bands.");
        }
        return new AvoidList(AvoidList.FORMAT, AvoidList.VERSION, units.microsteps(), units.rotorTeeth(),
                units.fullStepsPerRev(), units.travelMmPerRev(), naturalHz, crossingPeriods, margin, dampingRatio,
                ranges, notes);
    }

    private static String advice(ResonanceBand b, double naturalHz) {
        switch (b.bandClass()) {
            case LOW_SPEED_RESONANCE:
                return (b.subharmonic() == 1 ? "Low-speed resonance at the natural frequency"
                        : "Low-speed resonance at 1/" + b.subharmonic() + " of the natural frequency")
                        + ": do not dwell here; finer microstepping and more damping both weaken it.";
            case PARAMETRIC_RESONANCE:
                return "Parametric resonance (vibration at the natural frequency, step rate near "
                        + (b.subharmonic() == 1 ? "2" : "2/" + b.subharmonic()) + " × it): the detent modulates"
                        + " the stiffness; more damping helps, finer microstepping does not remove the detent"
                        + " modulation; cross it quickly.";
            case MID_BAND_INSTABILITY:
                return "Mid-band instability: accelerate through it; more load damping or a drive's mid-band"
                        + " compensation helps, finer microstepping barely does.";
            default:
                return Double.isNaN(naturalHz)
                        ? "Unclassified (natural frequency unknown): do not dwell here; cross it quickly."
                        : "Unclassified: neither at a sub-multiple of the natural frequency nor well above it;"
                        + " do not dwell here.";
        }
    }
}
