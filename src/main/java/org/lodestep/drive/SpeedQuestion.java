package org.lodestep.drive;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import org.lodestep.resonance.RateUnits;

/** Answers "will this motor, on this drive, reach this speed with this load, with margin?". */
public final class SpeedQuestion {
    /** Highest supply the suggestion search tries, as a multiple of the present one. */
    static final double MAX_SUPPLY_FACTOR = 4;
    /** Highest current the suggestion search tries, as a multiple of the present setting. */
    static final double MAX_CURRENT_FACTOR = 1.5;

    private SpeedQuestion() {
    }

    /**
     * @param curve        the motor's torque curve on its drive
     * @param load         the load
     * @param targetFullStepsPerS target rate, full steps/s, positive
     * @param margin       margin to keep, 0 to below 1 (common practice 0.3 to 0.5)
     * @param units        the user's units
     * @param canParallel  true when the motor is now in bipolar series and has eight leads (parallel possible)
     */
    public static SpeedAnswer answer(TorqueCurve curve, Load load, double targetFullStepsPerS, double margin,
                                     RateUnits units, boolean canParallel) {
        Require.positive(targetFullStepsPerS, "target rate", "full steps/s");
        Margin.check(margin);
        PhaseModel m = curve.motor();
        Driver d = curve.drive();
        double need = load.steadyTorqueNm();
        double tp = curve.torqueNm(targetFullStepsPerS);
        double left = Margin.of(tp, need);
        SpeedAnswer.Verdict v = left >= margin ? SpeedAnswer.Verdict.REACHABLE
                : tp > need ? SpeedAnswer.Verdict.MARGIN_SHORT : SpeedAnswer.Verdict.NOT_REACHABLE;
        double maxRate = maxRateWithMargin(m, d, need, margin);
        double j = m.rotorInertiaKgM2() + load.inertiaKgM2();
        double accel = Math.max(0, Margin.usableNm(tp, margin) - need) / j / (2 * Math.PI / m.fullStepsPerRev());
        List<Suggestion> s = v == SpeedAnswer.Verdict.REACHABLE ? List.of()
                : suggestions(m, d, need, margin, targetFullStepsPerS, canParallel);
        return new SpeedAnswer(units.of(targetFullStepsPerS), v, tp, need, left, margin, maxRate,
                units.of(maxRate), accel, j, s);
    }

    /**
     * Highest rate, full steps/s, at which {@code (1 − margin)·T_po ≥ need}; 0 when not even at standstill; +inf when
     * the load needs no torque at constant speed (the model's pull-out torque only tends to zero, so no rate bounds it).
     */
    static double maxRateWithMargin(PhaseModel m, Driver d, double need, double margin) {
        double level = need / (1 - margin);
        if (!(level > 0)) {
            return Double.POSITIVE_INFINITY;
        }
        if (PhasorTorque.pullOutTorqueNm(m, d, 0) <= level) {
            return 0;
        }
        return TorqueCurves.rateWhereTorqueFalls(m, d, level);
    }

    private static boolean enough(PhaseModel m, Driver d, double need, double margin, double rate) {
        return Margin.usableNm(PhasorTorque.pullOutTorqueNm(m, d, m.radPerS(rate)), margin) > need;
    }

    private static List<Suggestion> suggestions(PhaseModel m, Driver d, double need, double margin,
                                                double rate, boolean canParallel) {
        List<Suggestion> out = new ArrayList<>();
        double vHi = d.supplyV() * MAX_SUPPLY_FACTOR;
        if (enough(m, d.withSupplyV(vHi), need, margin, rate)) {
            double lo = d.supplyV();
            double hi = vHi;
            for (int k = 0; k < 60; k++) {
                double mid = 0.5 * (lo + hi);
                if (enough(m, d.withSupplyV(mid), need, margin, rate)) {
                    hi = mid;
                } else {
                    lo = mid;
                }
            }
            double volts = Math.ceil(hi);
            out.add(new Suggestion("supply", volts, String.format(Locale.ROOT, "Raise the supply to about %.0f V"
                    + " (keep within the driver's and the motor's voltage ratings).", volts)));
        }
        if (canParallel && d.mode() == DriveMode.CHOPPER) {
            PhaseModel p = Reconnection.seriesToParallel(m);
            double ip = Reconnection.parallelCurrentA(d.phaseCurrentA());
            if (enough(p, d.withCurrentA(ip), need, margin, rate)) {
                out.add(new Suggestion("parallel", ip, String.format(Locale.ROOT, "Rewire the phases bipolar"
                        + " parallel and set the driver to %.2f A per phase (same copper loss; the driver must"
                        + " supply twice the current).", ip)));
            }
        }
        if (d.mode() == DriveMode.CHOPPER) {
            double iHi = d.phaseCurrentA() * MAX_CURRENT_FACTOR;
            if (enough(m, d.withCurrentA(iHi), need, margin, rate)) {
                double lo = d.phaseCurrentA();
                double hi = iHi;
                for (int k = 0; k < 60; k++) {
                    double mid = 0.5 * (lo + hi);
                    if (enough(m, d.withCurrentA(mid), need, margin, rate)) {
                        hi = mid;
                    } else {
                        lo = mid;
                    }
                }
                out.add(new Suggestion("current", hi, String.format(Locale.ROOT, "Raise the current setting to"
                        + " %.2f A per phase, only if the motor is rated for it (copper loss grows with the square"
                        + " of the current; check the case temperature).", hi)));
            }
        }
        return out;
    }
}
