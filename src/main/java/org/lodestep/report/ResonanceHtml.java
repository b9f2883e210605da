package org.lodestep.report;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

import org.lodestep.report.html.Cell;
import org.lodestep.report.html.HeatMapChart;
import org.lodestep.report.html.HtmlReport;
import org.lodestep.report.html.HtmlTable;
import org.lodestep.report.html.Status;
import org.lodestep.report.html.XyChart;
import org.lodestep.resonance.AvoidList;
import org.lodestep.resonance.AvoidRange;
import org.lodestep.resonance.BandClass;
import org.lodestep.resonance.RateUnits;
import org.lodestep.resonance.ResonanceBand;
import org.lodestep.resonance.ResponsePoint;
import org.lodestep.resonance.RingDownResult;
import org.lodestep.resonance.RingSpectrum;
import org.lodestep.resonance.Stall;
import org.lodestep.resonance.SweepResult;
import org.lodestep.resonance.WatchPoint;
import org.lodestep.safety.Cautions;
import org.lodestep.safety.Hazard;
import org.lodestep.signal.Spectrogram;
import org.lodestep.signal.SpectrumScaling;
import org.lodestep.workflow.ResonanceRingdown;

/**
 * HTML reports of the resonance commands: a sweep (response curve with its bands shaded and labelled in the user's
 * units, the spectrogram against step rate, the avoid-list) and a ring-down (the fitted decay over the data).
 */
public final class ResonanceHtml {
    /** Levels shown in the spectrogram: this many dB below its strongest cell, darker for stronger. */
    static final double SPECTROGRAM_RANGE_DB = 60;

    private ResonanceHtml() {
    }

    /**
     * The report of a sweep.
     *
     * @param columnRatesFullStepsPerS the step rate at each spectrogram column (from the sweep law), or null when the
     *                                 rate is known only per segment (step-pulse channel): the map is then drawn over
     *                                 time
     */
    public static HtmlReport sweep(ResonanceText.SweepHeader h, SweepResult r, RateUnits u, AvoidList avoid,
                                   double[] columnRatesFullStepsPerS) {
        String unit = h.unit() == null || h.unit().isBlank() ? "channel unit" : h.unit();
        HtmlReport.Builder b = HtmlReport.builder("Resonance sweep", h.source())
                .meta("Channel", h.channel() + " (" + unit + ")")
                .meta("Step rate", h.rateLaw())
                .meta("Units", u.microsteps() + " pulses per full step, " + u.fullStepsPerRev() + " full steps/rev"
                        + (u.hasTravel() ? String.format(Locale.ROOT, ", %s mm/rev", num(u.travelMmPerRev())) : ""))
                .meta("Natural frequency", Double.isNaN(r.naturalFrequencyHz()) ? "unknown"
                        : String.format(Locale.ROOT, "%.1f Hz (%s)", r.naturalFrequencyHz(), r.naturalFrequencySource()))
                .meta("Analysed", String.format(Locale.ROOT, "%.1f s at %s Hz, %d segments", r.durationS(),
                        num(h.sampleRateHz()), r.segments()));
        Stall stall = r.stall();
        String answer = avoidLine(u, avoid);
        if (stall.lostSynchronism()) {
            // lost position: a warning that stands out over everything the bands say (a fault of the set-up,
            // not of the motor, and nothing here measured a limit it failed)
            b.verdict(Status.WARN, "Lost synchronism from " + rateText(u, stall.firstSlipFullStepsPerS()), answer,
                    (Double.isNaN(stall.relockFullStepsPerS()) ? "It did not re-lock before the end of the sweep. "
                            : "Re-locked from " + rateText(u, stall.relockFullStepsPerS()) + ". ")
                            + stall.advice() + " Evidence: " + stall.evidence() + "." + bandsCount(r));
        } else if (r.responseChannel() == org.lodestep.resonance.ResponseChannel.CURRENT_CHOPPER) {
            b.verdict(Status.INFO, "No bands from this capture", r.evidenceNote());
        } else if (r.bands().isEmpty()) {
            b.verdict(Status.INFO, "No resonance band found in the swept range", null,
                    "No band rises over the running baseline of the response; the rotor kept synchronism."
                            + watchLine(r, u));
        } else {
            // finding bands is the normal outcome of a sweep: say what was found, not a failure
            ResonanceBand worst = r.strongestBand();
            b.verdict(Status.INFO, r.bands().size() + (r.bands().size() == 1 ? " resonance band" : " resonance bands")
                    + " found; synchronism kept", answer,
                    "Strongest at " + rateText(u, worst.peakFullStepsPerS()) + String.format(Locale.ROOT,
                            ", %.1f dB over the baseline.", worst.excessDb()) + watchLine(r, u));
        }
        if (!r.evidenceNote().isEmpty()) {
            b.meta("Evidence", r.evidenceNote());
        }
        if (!avoid.ranges().isEmpty()) {
            b.section("Rates to avoid or cross quickly");
            HtmlTable.Builder t = HtmlTable.builder(null, "Full steps/s", programUnit(u), "rpm",
                    u.hasTravel() ? "mm/s" : "Oscillates at", "Cross at least at", "Advice");
            for (AvoidRange a : avoid.ranges()) {
                t.row(Cell.number(range(a.fromFullStepsPerS(), a.toFullStepsPerS())),
                        Cell.number(range(a.fromPulsesPerS(), a.toPulsesPerS())),
                        Cell.number(range(a.fromRpm(), a.toRpm())),
                        Cell.number(u.hasTravel() ? range(a.fromMmPerS(), a.toMmPerS())
                                : Double.isNaN(a.oscillationHz()) ? "\u2014"
                                : String.format(Locale.ROOT, "%.1f Hz", a.oscillationHz())),
                        Cell.number(Double.isNaN(a.minAccelerationFullStepsPerS2()) ? "\u2014"
                                : sig(a.minAccelerationFullStepsPerS2()) + " full steps/s\u00B2"),
                        Cell.text(a.advice()));
            }
            b.table(t.build());
            List<HtmlReport.Finding> notes = new ArrayList<>();
            for (String n : avoid.notes()) {
                notes.add(new HtmlReport.Finding(Status.INFO, n));
            }
            if (!notes.isEmpty()) {
                b.findings(notes);
            }
        }
        b.safety(Cautions.motion());

        b.section("Response against step rate");
        b.figure(responseChart(r, u, unit).toSvg(), "RMS vibration against full-step rate (bottom axis) and "
                + (u.microsteps() > 1 ? programUnit(u) : "rpm") + " (top axis); each band is shaded and"
                + " labelled with its range in the units you program (" + programUnit(u) + ", rpm"
                + (u.hasTravel() ? ", mm/s" : "") + "). A band opens where the response rises over the detection"
                + " threshold, drawn above the running baseline it is measured from. Dashed edges: resonance or"
                + " mid-band instability; dotted: unclassified.");
        if (r.spectrogram() != null && r.spectrogram().columnCount() >= 2) {
            b.figure(spectrogram(r, unit, columnRatesFullStepsPerS).toSvg(), columnRatesFullStepsPerS != null
                    ? "Spectrogram of the sweep against step rate: ridges rising with the rate are the stepping"
                    + " orders, a horizontal ridge is a fixed mechanical resonance. Pale is quiet, dark is loud."
                    : "Spectrogram of the sweep over time (the rate came from step pulses, known per segment only)."
                    + " Pale is quiet, dark is loud.");
        }

        if (!r.bands().isEmpty()) {
            b.section("Bands");
            HtmlTable.Builder t = HtmlTable.builder(null, "#", "Kind", "Full steps/s", programUnit(u), "rpm",
                    "Peak level", "Over baseline", "Vibrates at");
            int i = 1;
            for (ResonanceBand band : r.bands()) {
                t.row(Status.WARN,
                        Cell.text("R" + i++), Cell.status(status(band.bandClass()), kind(band)),
                        Cell.number(range(band.startFullStepsPerS(), band.endFullStepsPerS())),
                        Cell.number(range(u.pulsesPerS(band.startFullStepsPerS()), u.pulsesPerS(band.endFullStepsPerS()))),
                        Cell.number(range(u.rpm(band.startFullStepsPerS()), u.rpm(band.endFullStepsPerS()))),
                        Cell.number(sig(band.peakLevel()) + " " + unit),
                        Cell.number(String.format(Locale.ROOT, "%.1f dB", band.excessDb())),
                        Cell.number(Double.isNaN(band.mechanicalFrequencyHz()) ? "\u2014"
                                : String.format(Locale.ROOT, "%.1f Hz", band.mechanicalFrequencyHz())));
            }
            b.table(t.build());
        }
        return b.build();
    }

    static org.lodestep.report.html.Chart responseChart(SweepResult r, RateUnits u, String unit) {
        double[] x = new double[r.response().size()];
        double[] y = new double[x.length];
        for (int i = 0; i < x.length; i++) {
            ResponsePoint p = r.response().get(i);
            x[i] = p.rateFullStepsPerS();
            y[i] = p.rms();
        }
        double[] base = new double[x.length];
        double[] thr = new double[x.length];
        boolean detected = !r.response().isEmpty();
        for (int i = 0; i < x.length; i++) {
            base[i] = r.response().get(i).baselineRms();
            thr[i] = r.response().get(i).thresholdRms();
            detected &= Double.isFinite(thr[i]);
        }
        XyChart.Builder c = XyChart.builder("", "step rate (full steps/s)", "vibration (" + unit + " RMS)")
                .lineWithPoints("response", x, y).yFromZero(true);
        if (detected) {
            c.line("baseline (running low quantile)", x, base).line("detection threshold", x, thr);
        }
        if (u.microsteps() > 1) {
            c.topAxis("pulse rate (pulses/s at " + u.microsteps() + "\u00D7)", u::pulsesPerS);
        } else {
            c.topAxis("speed (rpm)", u::rpm);
        }
        int i = 1;
        for (ResonanceBand band : r.bands()) {
            c.band(band.startFullStepsPerS(), band.endFullStepsPerS(), "R" + i++ + " " + bandLabel(u, band),
                    status(band.bandClass()));
        }
        if (!Double.isNaN(r.naturalFrequencyHz())) {
            c.verticalLine(r.naturalFrequencyHz(), String.format(Locale.ROOT, "f\u2099 %.0f Hz", r.naturalFrequencyHz()),
                    Status.INFO);
        }
        return c.describe("Response against step rate with " + r.bands().size() + " band(s) marked"
                + (detected ? ", the baseline and the detection threshold drawn." : ".")).build();
    }

    private static org.lodestep.report.html.Chart spectrogram(SweepResult r, String unit, double[] rates) {
        Spectrogram s = r.spectrogram();
        int cols = s.columnCount();
        double[] first = s.column(0, SpectrumScaling.POWER);
        int rows = first.length;
        double[] freq = new double[rows];
        for (int k = 0; k < rows; k++) {
            freq[k] = k * s.binHz();
        }
        // Columns ordered by increasing x (a sweep may run downwards).
        Integer[] order = new Integer[cols];
        double[] xs = new double[cols];
        for (int c = 0; c < cols; c++) {
            order[c] = c;
            xs[c] = rates != null ? rates[c] : s.columnTimeS(c);
        }
        java.util.Arrays.sort(order, (a, b2) -> Double.compare(xs[a], xs[b2]));
        List<Integer> keep = new ArrayList<>();
        for (int idx : order) {
            if (Double.isFinite(xs[idx]) && (keep.isEmpty() || xs[idx] > xs[keep.get(keep.size() - 1)])) {
                keep.add(idx);
            }
        }
        double[] x = new double[keep.size()];
        double[][] level = new double[keep.size()][];
        double max = Double.NEGATIVE_INFINITY;
        for (int i = 0; i < keep.size(); i++) {
            x[i] = xs[keep.get(i)];
            double[] p = s.column(keep.get(i), SpectrumScaling.POWER);
            level[i] = new double[rows];
            for (int k = 0; k < rows; k++) {
                // 10·log10 of the mean square: dB re 1 unit RMS.
                level[i][k] = p[k] > 0 ? 10 * Math.log10(p[k]) : Double.NaN;
                if (Double.isFinite(level[i][k])) {
                    max = Math.max(max, level[i][k]);
                }
            }
        }
        HeatMapChart.Builder h = HeatMapChart.builder("", rates != null ? "step rate (full steps/s)" : "time (s)", x,
                "frequency (Hz)", freq, "level (dB re 1 " + unit + " RMS)", level);
        if (Double.isFinite(max)) {
            h.levelRange(max - SPECTROGRAM_RANGE_DB, max);
        }
        if (rates != null) {
            int i = 1;
            for (ResonanceBand band : r.bands()) {
                h.band(band.startFullStepsPerS(), band.endFullStepsPerS(), "R" + i++, status(band.bandClass()));
            }
        }
        return h.build();
    }

    /**
     * The report of a ring-down fit: the decay from its largest excursion to where it has fallen into the noise,
     * with the fitted damped oscillation and its envelope around the settled value as the fit result evaluates them
     * ({@link RingDownResult#fittedAt}, {@link RingDownResult#upperEnvelopeAt}, {@link RingDownResult#lowerEnvelopeAt});
     * the backbone (cycle frequency against amplitude) where the fit measured one; and the decay's spectrum with the
     * fitted natural frequency marked.
     */
    public static HtmlReport ringDown(ResonanceRingdown.Result w) {
        RingDownResult r = w.fit();
        String channel = w.channel();
        String u = w.unit() == null || w.unit().isBlank() ? "channel unit" : w.unit();
        HtmlReport.Builder b = HtmlReport.builder("Ring-down", w.source())
                .meta("Channel", channel + " (" + u + ")")
                .meta("Fitted from", String.format(Locale.ROOT, "t = %.4f s, %.1f periods", r.startTimeS(),
                        r.periodsFitted()));
        boolean good = r.rSquared() >= 0.9;
        List<Double> risky = r.riskyRatesFullStepsPerS(3);
        // A ring-down measures; it has no limit to pass. The one judgement is the fit's quality, with its criterion.
        String criterion = String.format(Locale.ROOT, "Fit quality R\u00B2 %.3f (criterion for a single damped"
                + " oscillation: R\u00B2 \u2265 0.9).", r.rSquared());
        b.verdict(good ? Status.INFO : Status.WARN, String.format(Locale.ROOT,
                "Natural frequency %.1f Hz, damping ratio %.3f", r.naturalFrequencyHz(), r.dampingRatio()),
                String.format(Locale.ROOT, "Low-speed resonance expected near %.0f, %.0f and %.0f full steps/s.",
                        risky.get(0), risky.get(1), risky.get(2)),
                good ? criterion : criterion + " This fit is poor: the response is not a single damped oscillation,"
                        + " so these figures are rough.");
        String glitches = ResonanceText.bridgedSamples(w);
        if (glitches != null) {
            b.findings(List.of(new HtmlReport.Finding(Status.WARN, glitches)));
        }
        b.safety(Hazard.ENERGISED_WINDING);
        b.section("Decay and fit");
        b.figure(decayChart(w, u).toSvg(), String.format(Locale.ROOT, "The decay from its largest excursion"
                + " (t = %.4f s) to where the fitted envelope has fallen to %.0f \u00D7 the noise RMS (%s %s): the"
                + " measured response, the fitted damped oscillation and its envelope, fitted from t = %.4f s on."
                + " Logarithmic decrement \u03B4 = ln(x\u2099/x\u2099\u208A\u2081) = %.4f, damping ratio"
                + " \u03B6 = \u03B4/\u221A(4\u03C0\u00B2 + \u03B4\u00B2) = %.4f.", r.ringStartTimeS(),
                RingDownResult.NOISE_MULTIPLE, sig(r.noiseRms()), u, r.startTimeS(), r.logDecrement(),
                r.dampingRatio()));
        if (!r.backbone().isEmpty()) {
            b.figure(backboneChart(r, u).toSvg(), "Backbone: the frequency of each cycle against its swing amplitude,"
                    + " largest swing first. A softening backbone (larger swings ring slower) is why the natural"
                    + " frequency and damping ratio are the small-signal values extrapolated to zero swing.");
        }
        RingSpectrum sp = w.spectrum();
        b.figure(XyChart.builder("", "frequency (Hz)", "level (dB re peak)")
                .line("spectrum of the decay", sp.frequencyHz(), sp.levelDb())
                .verticalLine(r.naturalFrequencyHz(), String.format(Locale.ROOT, "f\u2099 %.1f Hz (fit)",
                        r.naturalFrequencyHz()), Status.INFO)
                .size(760, 300)
                .describe("Amplitude spectrum of the decay with the fitted natural frequency marked.").build().toSvg(),
                String.format(Locale.ROOT, "Amplitude spectrum of the decay (rectangular window, zero-padded), in dB"
                        + " below its peak at %.1f Hz; the dashed line is the fitted natural frequency, %.1f Hz.",
                        sp.peakHz(), r.naturalFrequencyHz()));
        Map<String, String> facts = new LinkedHashMap<>();
        boolean bb = !r.backbone().isEmpty();
        facts.put(bb ? "Natural frequency (small-signal)" : "Natural frequency", bb
                ? String.format(Locale.ROOT, "%.1f Hz (\u00B1 %.1f)", r.naturalFrequencyHz(), r.naturalFrequencyErrorHz())
                : String.format(Locale.ROOT, "%.1f Hz", r.naturalFrequencyHz()));
        facts.put("Damped frequency", String.format(Locale.ROOT, "%.1f Hz", r.dampedFrequencyHz()));
        facts.put(bb ? "Damping ratio \u03B6 (small-signal)" : "Damping ratio \u03B6", bb
                ? String.format(Locale.ROOT, "%.4f \u00B1 %.4f", r.dampingRatio(), r.dampingRatioError())
                : String.format(Locale.ROOT, "%.4f", r.dampingRatio()));
        facts.put("Logarithmic decrement \u03B4", String.format(Locale.ROOT, "%.4f", r.logDecrement()));
        if (bb) {
            facts.put("Large-swing frequency (first cycle)", String.format(Locale.ROOT, "%.1f Hz",
                    r.largeSwingFrequencyHz()));
            facts.put("One sinusoid over the whole ring", String.format(Locale.ROOT, "%.1f Hz, R\u00B2 %.3f",
                    r.wholeRingFrequencyHz(), r.wholeRingRSquared()));
            facts.put("Cycles measured", Integer.toString(r.backbone().size()));
        }
        facts.put("Quality factor Q", Double.isFinite(r.qualityFactor())
                ? String.format(Locale.ROOT, "%.1f", r.qualityFactor()) : "not determined (no decay measured)");
        facts.put("Decay rate \u03C3", String.format(Locale.ROOT, "%.1f 1/s", r.decayRatePerS()));
        facts.put("Fit quality R\u00B2", String.format(Locale.ROOT, "%.3f", r.rSquared()));
        facts.put("RMS residual", sig(r.rmsResidual()) + " " + u);
        b.facts(facts);
        return b.build();
    }

    private static org.lodestep.report.html.Chart decayChart(ResonanceRingdown.Result w, String u) {
        RingDownResult r = w.fit();
        double[] t = w.decayTimeS();
        double[] env = new double[t.length];
        double[] envLow = new double[t.length];
        double[] curve = new double[t.length];
        for (int i = 0; i < t.length; i++) {
            env[i] = r.upperEnvelopeAt(t[i]);
            envLow[i] = r.lowerEnvelopeAt(t[i]);
            curve[i] = r.fittedAt(t[i]);
        }
        String fit = String.format(Locale.ROOT, "fitted envelope: f\u2099 %.1f Hz, \u03B6 %.3f, \u03B4 %.3f",
                r.naturalFrequencyHz(), r.dampingRatio(), r.logDecrement());
        return XyChart.builder("", "time (s)", w.channel() + " (" + u + ")")
                .points("measured", t, w.decayValues()).line(fit, t, env).sameAsPrevious(t, envLow)
                .line("fitted damped oscillation", t, curve)
                .describe("Measured decay with the fitted damped oscillation and its exponential envelope drawn"
                        + " over it.").build();
    }

    private static org.lodestep.report.html.Chart backboneChart(RingDownResult r, String u) {
        double[] a = new double[r.backbone().size()];
        double[] f = new double[a.length];
        for (int i = 0; i < a.length; i++) {
            a[i] = r.backbone().get(i).amplitude();
            f[i] = r.backbone().get(i).frequencyHz();
        }
        return XyChart.builder("", "cycle amplitude (" + u + ")", "cycle frequency (Hz)")
                .points("cycles", a, f)
                .horizontalLine(r.dampedFrequencyHz(), String.format(Locale.ROOT, "small-signal damped frequency %.1f Hz",
                        r.dampedFrequencyHz()), Status.INFO)
                .size(760, 300)
                .describe("Backbone: cycle frequency against cycle amplitude.").build();
    }

    /** The avoid-list in one line, or "". */
    /**
     * Every avoid range in one line, in full steps/s and in the pulses the controller is programmed in: "Avoid or
     * cross quickly: 49.1–69.8 and 89.4–157 full steps/s (786–1117 and 1431–2518 pulses/s)", or null.
     */
    static String avoidLine(RateUnits u, AvoidList avoid) {
        if (avoid.ranges().isEmpty()) {
            return null;
        }
        List<String> full = new ArrayList<>();
        List<String> pulses = new ArrayList<>();
        for (AvoidRange a : avoid.ranges()) {
            full.add(range(a.fromFullStepsPerS(), a.toFullStepsPerS()));
            pulses.add(range(a.fromPulsesPerS(), a.toPulsesPerS()));
        }
        String line = "Avoid or cross quickly: " + and(full) + " full steps/s";
        return u.microsteps() == 1 ? line : line + " (" + and(pulses) + " pulses/s at " + u.microsteps()
                + "\u00D7)";
    }

    private static String and(List<String> parts) {
        if (parts.size() == 1) {
            return parts.get(0);
        }
        return String.join(", ", parts.subList(0, parts.size() - 1)) + " and " + parts.get(parts.size() - 1);
    }

    private static String bandsCount(SweepResult r) {
        return r.bands().isEmpty() ? "" : " " + r.bands().size() + (r.bands().size() == 1 ? " resonance band" :
                " resonance bands") + " found besides.";
    }

    /** Near-threshold bumps in one line, or "". */
    private static String watchLine(SweepResult r, RateUnits u) {
        if (r.watch().isEmpty()) {
            return "";
        }
        StringBuilder sb = new StringBuilder(" Watch (under the threshold):");
        for (WatchPoint w : r.watch()) {
            sb.append(sb.charAt(sb.length() - 1) == ':' ? " " : "; ").append(rateText(u, w.rateFullStepsPerS()))
                    .append(String.format(Locale.ROOT, " (f\u2099/%d, %.1f dB)", w.subharmonic(), w.excessDb()));
        }
        return sb.append('.').toString();
    }

    private static Status status(BandClass c) {
        return switch (c) {
            case LOW_SPEED_RESONANCE, PARAMETRIC_RESONANCE, MID_BAND_INSTABILITY -> Status.WARN;
            case UNCLASSIFIED -> Status.INFO;
        };
    }

    private static String kind(ResonanceBand b) {
        return switch (b.bandClass()) {
            case LOW_SPEED_RESONANCE -> b.subharmonic() > 1 ? "low-speed resonance (f\u2099/" + b.subharmonic() + ")"
                    : "low-speed resonance";
            case PARAMETRIC_RESONANCE -> b.subharmonic() > 1 ? "parametric resonance (2f\u2099/" + b.subharmonic()
                    + ")" : "parametric resonance (2f\u2099)";
            case MID_BAND_INSTABILITY -> "mid-band instability";
            case UNCLASSIFIED -> "unclassified";
        };
    }

    private static String bandLabel(RateUnits u, ResonanceBand b) {
        String s = u.microsteps() > 1
                ? range(u.pulsesPerS(b.startFullStepsPerS()), u.pulsesPerS(b.endFullStepsPerS())) + " pulses/s"
                : range(b.startFullStepsPerS(), b.endFullStepsPerS()) + " steps/s";
        return s + ", " + range(u.rpm(b.startFullStepsPerS()), u.rpm(b.endFullStepsPerS())) + " rpm";
    }

    private static String rateText(RateUnits u, double fullStepsPerS) {
        return String.format(Locale.ROOT, "%s full steps/s (%s pulses/s, %s rpm%s)", sig(fullStepsPerS),
                sig(u.pulsesPerS(fullStepsPerS)), sig(u.rpm(fullStepsPerS)),
                u.hasTravel() ? ", " + sig(u.mmPerS(fullStepsPerS)) + " mm/s" : "");
    }

    private static String programUnit(RateUnits u) {
        return "pulses/s at " + u.microsteps() + "\u00D7";
    }

    private static String range(double a, double b) {
        return sig(a) + "\u2013" + sig(b);
    }

    static String sig(double v) {
        if (!Double.isFinite(v)) {
            return "\u2014";
        }
        double a = Math.abs(v);
        if (a >= 100) {
            return String.format(Locale.ROOT, "%.0f", v);
        }
        if (a >= 10) {
            return String.format(Locale.ROOT, "%.1f", v);
        }
        return String.format(Locale.ROOT, "%.3g", v);
    }

    private static String num(double v) {
        return v == Math.rint(v) ? String.format(Locale.ROOT, "%.0f", v) : String.format(Locale.ROOT, "%.4g", v);
    }
}
