package org.lodestep.report;

import java.io.PrintWriter;
import java.util.List;
import java.util.Locale;

import org.lodestep.resonance.AvoidList;
import org.lodestep.resonance.AvoidRange;
import org.lodestep.resonance.BandClass;
import org.lodestep.resonance.Prediction;
import org.lodestep.resonance.RateUnits;
import org.lodestep.resonance.ResonanceBand;
import org.lodestep.resonance.RingDownResult;
import org.lodestep.resonance.Stall;
import org.lodestep.resonance.SweepResult;
import org.lodestep.resonance.WatchPoint;
import org.lodestep.safety.Cautions;
import org.lodestep.signal.LoneSamples;
import org.lodestep.workflow.ResonanceRingdown;

/** Plain-text rendering of sweep, ring-down and prediction results, for a terminal; computes nothing. */
public final class ResonanceText {
    private ResonanceText() {
    }

    /** What the sweep was and where it came from: the reader's description, shown as the first lines. */
    public record SweepHeader(String source, String channel, String unit, double sampleRateHz, String rateLaw) {
    }

    public static void sweep(PrintWriter out, SweepHeader h, SweepResult r, RateUnits u, AvoidList avoid) {
        stall(out, r.stall(), u);
        // the answer first: what to avoid, then how it was found
        avoidList(out, avoid, u);
        out.println();
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
        if (r.responseChannel() == org.lodestep.resonance.ResponseChannel.CURRENT_CHOPPER) {
            out.println("No bands reported: a chopper's regulated current cannot support them (see Evidence below).");
        } else if (r.bands().isEmpty()) {
            out.println("No band rises over the baseline: no resonance found in the swept range.");
        } else {
            out.println(r.responseChannel().isCurrent()
                    ? "Bands from phase current (level: harmonic over fundamental; over: dB above the running"
                    + " baseline; vib. Hz: implied by the harmonic):"
                    : "Bands (level: RMS vibration in the channel's unit; over: dB above the running baseline):");
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
        for (WatchPoint w : r.watch()) {
            out.printf(Locale.ROOT, "Watch: %s full steps/s = %s pulses/s = %s rpm (f_n/%d): a bump %.1f dB over the"
                    + " baseline, under the band threshold; not a band to avoid, but keep an eye on it.%n",
                    num(w.rateFullStepsPerS()), num(u.pulsesPerS(w.rateFullStepsPerS())),
                    num(u.rpm(w.rateFullStepsPerS())), w.subharmonic(), w.excessDb());
        }
        if (!r.evidenceNote().isEmpty()) {
            out.println();
            out.println("Evidence: " + r.evidenceNote());
        }
        out.println();
        safety(out);
    }

    /** The synchronism verdict: the first thing a sweep's text says. */
    public static void stall(PrintWriter out, Stall s, RateUnits u) {
        if (!s.lostSynchronism()) {
            out.println((s.evidence().startsWith("not judged") ? "Synchronism: " : "Synchronism: kept; ")
                    + s.evidence() + ".");
            return;
        }
        out.printf(Locale.ROOT, "WARNING: LOST SYNCHRONISM from %s full steps/s = %s pulses/s = %s rpm%s.%n",
                num(s.firstSlipFullStepsPerS()), num(u.pulsesPerS(s.firstSlipFullStepsPerS())),
                num(u.rpm(s.firstSlipFullStepsPerS())), Double.isNaN(s.relockFullStepsPerS())
                        ? "; it did not re-lock before the end of the sweep"
                        : String.format(Locale.ROOT, "; re-locked from %s full steps/s = %s pulses/s = %s rpm",
                        num(s.relockFullStepsPerS()), num(u.pulsesPerS(s.relockFullStepsPerS())),
                        num(u.rpm(s.relockFullStepsPerS()))));
        out.println("  Evidence: " + s.evidence() + ".");
        if (!Double.isNaN(s.stepsLost())) {
            out.printf(Locale.ROOT, "  Steps lost: about %.0f full steps.%n", s.stepsLost());
        }
        out.println("  " + s.advice());
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

    public static void ringDown(PrintWriter out, ResonanceRingdown.Result w) {
        RingDownResult r = w.fit();
        out.printf(Locale.ROOT, "Ring-down: %s, channel %s%n", w.source(), w.channel());
        String glitches = bridgedSamples(w);
        if (glitches != null) {
            out.println("  " + glitches);
        }
        boolean bb = !r.backbone().isEmpty();
        out.printf(Locale.ROOT, "  natural frequency   %10.1f Hz%s%n", r.naturalFrequencyHz(), bb
                ? String.format(Locale.ROOT, " ± %.1f  (small-signal, extrapolated to zero swing)",
                r.naturalFrequencyErrorHz()) : "");
        out.printf(Locale.ROOT, "  damped frequency    %10.1f Hz%s%n", r.dampedFrequencyHz(), "");
        out.printf(Locale.ROOT, "  damping ratio       %10.4f%s   (%s)%n", r.dampingRatio(), bb
                ? String.format(Locale.ROOT, " ± %.4f", r.dampingRatioError()) : "", quality(r));
        if (bb) {
            out.printf(Locale.ROOT, "  large-swing freq.   %10.1f Hz   (first cycle; %d cycles measured; one sinusoid"
                    + " over the whole ring would say %.1f Hz, R² %.3f)%n", r.largeSwingFrequencyHz(),
                    r.backbone().size(), r.wholeRingFrequencyHz(), r.wholeRingRSquared());
            out.println("  Backbone (cycle amplitude -> frequency): " + backbone(r));
            out.println("  A large swing rings slower: the torque-angle curve is sinusoidal, so stiffness falls with"
                    + " amplitude.");
            out.println("  A microstepped sweep may resonate a little below this: at a full-step rest the detent adds"
                    + " its stiffness, between full steps it partly cancels.");
        }
        out.printf(Locale.ROOT, "  decay rate          %10.1f 1/s%n", r.decayRatePerS());
        out.printf(Locale.ROOT, "  fit quality R²      %10.4f   (RMS residual %s, %.1f periods from t = %.4f s)%n",
                r.rSquared(), sig(r.rmsResidual()), r.periodsFitted(), r.startTimeS());
        out.println(r.rSquared() < 0.9 ? "  The fit is poor (criterion R² ≥ 0.9 for a single damped oscillation):"
                + " treat the figures as rough." : "  Fit criterion: R² ≥ 0.9 for a single damped oscillation: met."
                + " (A ring-down measures; it has no limit to pass.)");
        out.println("  Low-speed resonance is expected near full-step rates of f_n, f_n/2, f_n/3:");
        java.util.List<Double> risky = r.riskyRatesFullStepsPerS(3);
        out.printf(Locale.ROOT, "  %.1f, %.1f, %.1f full steps/s%n", risky.get(0), risky.get(1), risky.get(2));
    }

    /** Q, or why there is none: a damping ratio of zero (no decay measured) gives no finite Q. */
    static String quality(RingDownResult r) {
        return Double.isFinite(r.qualityFactor()) ? String.format(Locale.ROOT, "Q = %.1f", r.qualityFactor())
                : "Q not determined: no decay measured";
    }

    /** The samples bridged as glitches, in a sentence, or null when there were none. */
    static String bridgedSamples(ResonanceRingdown.Result w) {
        return w.bridged().isEmpty() ? null : LoneSamples.describe(w.bridged(), w.timeS(), w.unit());
    }

    /** Up to six cycles from the largest swing to the smallest, evenly spread. */
    private static String backbone(RingDownResult r) {
        java.util.List<org.lodestep.resonance.BackbonePoint> c = r.backbone();
        StringBuilder b = new StringBuilder();
        int shown = Math.min(6, c.size());
        for (int i = 0; i < shown; i++) {
            org.lodestep.resonance.BackbonePoint p = c.get(shown == 1 ? 0 : i * (c.size() - 1) / (shown - 1));
            b.append(i == 0 ? "" : ", ").append(sig(p.amplitude())).append(" -> ")
                    .append(String.format(Locale.ROOT, "%.2f Hz", p.frequencyHz()));
        }
        return b.toString();
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
        for (String s : Cautions.sentences(Cautions.motion())) {
            out.println("- " + s);
        }
    }

    static String className(ResonanceBand b) {
        return className(b.bandClass(), b.subharmonic());
    }

    /** A band's kind in words ("low-speed resonance f_n/2"). */
    public static String className(BandClass c, int subharmonic) {
        if (c == BandClass.LOW_SPEED_RESONANCE) {
            return subharmonic == 1 ? "low-speed resonance f_n" : "low-speed resonance f_n/" + subharmonic;
        }
        if (c == BandClass.PARAMETRIC_RESONANCE) {
            return subharmonic == 1 ? "parametric resonance 2f_n" : "parametric resonance 2f_n/" + subharmonic;
        }
        return c == BandClass.MID_BAND_INSTABILITY ? "mid-band instability" : "unclassified";
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
