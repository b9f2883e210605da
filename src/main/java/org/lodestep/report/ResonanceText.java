package org.lodestep.report;

import java.io.PrintWriter;
import java.util.Locale;

import org.lodestep.resonance.AvoidList;
import org.lodestep.resonance.AvoidRange;
import org.lodestep.resonance.BandClass;
import org.lodestep.resonance.Prediction;
import org.lodestep.resonance.RateUnits;
import org.lodestep.resonance.ResonanceBand;
import org.lodestep.resonance.RingDownResult;
import org.lodestep.resonance.SweepResult;

/** Plain-text rendering of sweep, ring-down and prediction results, for a terminal; computes nothing. */
public final class ResonanceText {
    private ResonanceText() {
    }

    /** What the sweep was and where it came from: the reader's description, shown as the first lines. */
    public record SweepHeader(String source, String channel, String unit, double sampleRateHz, String rateLaw) {
    }

    public static void sweep(PrintWriter out, SweepHeader h, SweepResult r, RateUnits u, AvoidList avoid) {
        out.printf(Locale.ROOT, "Resonance sweep: %s, channel %s%s, %s Hz, %.1f s analysed%n", h.source(),
                h.channel(), h.unit().isEmpty() ? "" : " (" + h.unit() + ")", num(h.sampleRateHz()), r.durationS());
        out.printf(Locale.ROOT, "Step rate: %s%n", h.rateLaw());
        out.printf(Locale.ROOT, "Units: %d step pulse%s per full step, %d full steps/rev%s%n", u.microsteps(),
                u.microsteps() == 1 ? "" : "s",
                u.fullStepsPerRev(), u.hasTravel() ? ", " + num(u.travelMmPerRev()) + " mm/rev" : "");
        if (Double.isNaN(r.naturalFrequencyHz())) {
            out.println("Natural frequency: unknown (give --natural-hz to classify the bands)");
        } else {
            out.printf(Locale.ROOT, "Natural frequency: %.1f Hz (%s)%n", r.naturalFrequencyHz(),
                    r.naturalFrequencySource().equals("given") ? "given"
                            : "estimated from the vibration frequency inside the bands");
        }
        out.printf(Locale.ROOT, "Response curve: %d points from %s to %s full steps/s, %d segments%s%n",
                r.response().size(), num(r.response().get(0).rateFullStepsPerS()),
                num(r.response().get(r.response().size() - 1).rateFullStepsPerS()), r.segments(),
                r.segmentsOutsideSweep() > 0 ? " (" + r.segmentsOutsideSweep() + " outside the sweep, skipped)" : "");
        out.println();
        if (r.bands().isEmpty()) {
            out.println("No band rises over the baseline: no resonance found in the swept range.");
        } else {
            out.println("Bands (level: RMS vibration in the channel's unit; over: dB above the running baseline):");
            out.printf(Locale.ROOT, "  %-3s %-26s %-19s %-19s %-15s %9s %9s %7s %9s%n", "#", "class", "full steps/s",
                    "pulses/s", "rpm", "peak", "level", "over", "vib. Hz");
            int i = 1;
            for (ResonanceBand b : r.bands()) {
                out.printf(Locale.ROOT, "  %-3d %-26s %-19s %-19s %-15s %9s %9s %6.1f %9s%n", i++, className(b),
                        range(b.startFullStepsPerS(), b.endFullStepsPerS()),
                        range(u.pulsesPerS(b.startFullStepsPerS()), u.pulsesPerS(b.endFullStepsPerS())),
                        range(u.rpm(b.startFullStepsPerS()), u.rpm(b.endFullStepsPerS())),
                        num(b.peakFullStepsPerS()), sig(b.peakLevel()), b.excessDb(), num(b.mechanicalFrequencyHz()));
            }
            if (u.hasTravel()) {
                out.println("  Axis speed (mm/s):");
                i = 1;
                for (ResonanceBand b : r.bands()) {
                    out.printf(Locale.ROOT, "  %-3d %s%n", i++, range(u.mmPerS(b.startFullStepsPerS()),
                            u.mmPerS(b.endFullStepsPerS())));
                }
            }
        }
        out.println();
        avoidList(out, avoid, u);
        out.println();
        safety(out);
    }

    public static void avoidList(PrintWriter out, AvoidList a, RateUnits u) {
        if (a.ranges().isEmpty()) {
            out.println("Recommendations: nothing to avoid in the swept range.");
        } else {
            out.printf(Locale.ROOT, "Recommendations (each band widened by %.0f %%; crossing within %s oscillation"
                    + " periods):%n", a.margin() * 100, plain(a.crossingPeriods()));
            for (AvoidRange r : a.ranges()) {
                out.printf(Locale.ROOT, "- Avoid %s full steps/s = %s pulses/s = %s rpm%s.%n",
                        range(r.fromFullStepsPerS(), r.toFullStepsPerS()), range(r.fromPulsesPerS(), r.toPulsesPerS()),
                        range(r.fromRpm(), r.toRpm()),
                        u.hasTravel() ? " = " + range(r.fromMmPerS(), r.toMmPerS()) + " mm/s" : "");
                out.printf(Locale.ROOT, "  To cross it, accelerate at %s full steps/s² (%s pulses/s²%s) or more.%n",
                        num(r.minAccelerationFullStepsPerS2()), num(r.minAccelerationPulsesPerS2()),
                        u.hasTravel() ? ", " + num(r.minAccelerationMmPerS2()) + " mm/s²" : "");
                out.printf(Locale.ROOT, "  %s%n", r.advice());
            }
        }
        for (String n : a.notes()) {
            out.println("- " + n);
        }
    }

    public static void ringDown(PrintWriter out, String source, String channel, RingDownResult r) {
        out.printf(Locale.ROOT, "Ring-down: %s, channel %s%n", source, channel);
        out.printf(Locale.ROOT, "  natural frequency   %10.2f Hz%n", r.naturalFrequencyHz());
        out.printf(Locale.ROOT, "  damped frequency    %10.2f Hz%n", r.dampedFrequencyHz());
        out.printf(Locale.ROOT, "  damping ratio       %10.4f   (Q = %.1f)%n", r.dampingRatio(), r.qualityFactor());
        out.printf(Locale.ROOT, "  decay rate          %10.2f 1/s%n", r.decayRatePerS());
        out.printf(Locale.ROOT, "  fit quality R²      %10.4f   (RMS residual %s, %.1f periods from t = %.4f s)%n",
                r.rSquared(), sig(r.rmsResidual()), r.periodsFitted(), r.startTimeS());
        if (r.rSquared() < 0.9) {
            out.println("  The fit is poor (R² below 0.9): the response is not a single damped oscillation; treat the"
                    + " figures as rough.");
        }
        out.println("  Low-speed resonance is expected near full-step rates of f_n, f_n/2, f_n/3:");
        java.util.List<Double> risky = r.riskyRatesFullStepsPerS(3);
        out.printf(Locale.ROOT, "  %.1f, %.1f, %.1f full steps/s%n", risky.get(0), risky.get(1), risky.get(2));
    }

    public static void prediction(PrintWriter out, Prediction p, RateUnits u) {
        out.printf(Locale.ROOT, "Natural frequency %s: f_n = (1/2π)·√(N_r·T_h/J)%n",
                p.inferred() ? "inverse (inertia from a measured f_n)" : "prediction");
        out.printf(Locale.ROOT, "  holding torque T_h   %s N·m, rotor teeth N_r %d, stiffness %s N·m/rad%n",
                num(p.holdingTorqueNm()), p.rotorTeeth(), num(p.stiffnessNmPerRad()));
        out.printf(Locale.ROOT, "  inertia: rotor %s, load %s, total %s kg·m²%n", sig(p.rotorInertiaKgm2()),
                sig(p.loadInertiaKgm2()), sig(p.totalInertiaKgm2()));
        if (p.inferred() && p.loadInertiaKgm2() < 0) {
            out.println("  The measured frequency implies less inertia than the rotor alone: check the holding torque"
                    + " (it falls with current and speed) and the rotor inertia.");
        }
        out.printf(Locale.ROOT, "  natural frequency    %.2f Hz%n", p.naturalFrequencyHz());
        out.println("  Risky full-step rates (low-speed resonance at f_n/k):");
        int k = 1;
        for (RateUnits.Rate r : p.riskyRates()) {
            out.printf(Locale.ROOT, "    k=%d  %s full steps/s = %s pulses/s = %s rpm%s%n", k++, num(r.fullStepsPerS()),
                    num(r.pulsesPerS()), num(r.rpm()), u.hasTravel() ? " = " + num(r.mmPerS()) + " mm/s" : "");
        }
        if (!Double.isNaN(p.midBandCentreFullStepsPerS())) {
            out.printf(Locale.ROOT, "  Mid-band instability centred near %s full steps/s (%s rpm), where the electrical"
                    + " angular frequency equals R/L%n", num(p.midBandCentreFullStepsPerS()),
                    num(u.rpm(p.midBandCentreFullStepsPerS())));
        }
    }

    public static void safety(PrintWriter out) {
        out.println("Safety:");
        for (String s : ResonanceSafety.lines()) {
            out.println("- " + s);
        }
    }

    static String className(ResonanceBand b) {
        if (b.bandClass() == BandClass.LOW_SPEED_RESONANCE) {
            return b.subharmonic() == 1 ? "low-speed resonance f_n" : "low-speed resonance f_n/" + b.subharmonic();
        }
        if (b.bandClass() == BandClass.PARAMETRIC_RESONANCE) {
            return b.subharmonic() == 1 ? "parametric resonance 2f_n" : "parametric resonance 2f_n/" + b.subharmonic();
        }
        return b.bandClass() == BandClass.MID_BAND_INSTABILITY ? "mid-band instability" : "unclassified";
    }

    private static String range(double a, double b) {
        return num(a) + "-" + num(b);
    }

    /** A rate or frequency with sensible digits: 0.1 resolution below 1000, whole numbers above. */
    static String num(double v) {
        if (Double.isNaN(v)) {
            return "-";
        }
        double a = Math.abs(v);
        return a >= 1000 ? String.format(Locale.ROOT, "%.0f", v) : a >= 10 ? String.format(Locale.ROOT, "%.1f", v)
                : String.format(Locale.ROOT, "%.3g", v);
    }

    /** A count-like value without trailing zeros: 5, 2.5. */
    static String plain(double v) {
        return v == Math.rint(v) ? String.format(Locale.ROOT, "%.0f", v) : String.valueOf(v);
    }

    /** Three significant figures for levels and inertias. */
    static String sig(double v) {
        return Double.isNaN(v) ? "-" : String.format(Locale.ROOT, "%.3g", v);
    }
}
