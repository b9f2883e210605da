package org.lodestep.report;

import java.io.PrintWriter;
import java.util.List;
import java.util.Locale;

import org.lodestep.drive.BandCrossing;
import org.lodestep.drive.DriveMode;
import org.lodestep.drive.Driver;
import org.lodestep.drive.Load;
import org.lodestep.drive.PhaseModel;
import org.lodestep.drive.Profile;
import org.lodestep.drive.SpeedAnswer;
import org.lodestep.drive.Suggestion;
import org.lodestep.drive.TorqueCurve;
import org.lodestep.drive.TorquePoint;
import org.lodestep.resonance.RateUnits;
import org.lodestep.safety.Cautions;
import org.lodestep.workflow.DriveCurve;
import org.lodestep.workflow.DrivePlan;

/** Text output of {@code drive curve} and {@code drive plan}. */
public final class DriveText {
    /** What the model is and what it ignores, in one sentence. */
    public static final String MODEL = "Steady-state phasor model of each phase (V = (R + jX)·I + E, back-EMF"
            + " E = Ke·ω) under the drive's current and supply limits (Acarnley, Stepping Motors, 4th ed., steady-state"
            + " characteristics); it ignores chopper ripple, saturation, iron losses and detent torque, and cannot"
            + " see low-speed resonance or mid-band instability, where a motor can stall below this curve.";

    private DriveText() {
    }

    public static void curve(PrintWriter out, DriveCurve.Result r) {
        header(out, r);
        TorqueCurve c = r.curve();
        if (r.answer() != null) {
            // the answer with its margin first, the curve it comes from after
            out.println();
            answer(out, r.answer(), r.units(), r.load());
        }
        out.println();
        double margin = r.answer() != null ? r.answer().requiredMargin() : org.lodestep.drive.Margin.DEFAULT;
        out.println("Pull-out torque curve:");
        out.printf(Locale.ROOT, "  %12s %10s %8s %s %12s %10s %10s%n", "full steps/s", "pulses/s", "rpm",
                r.units().hasTravel() ? String.format(Locale.ROOT, "%8s", "mm/s") : "", "torque N·m",
                "with " + pct(margin).replace(" ", ""), "power W");
        List<TorquePoint> pts = c.points();
        int stride = Math.max(1, (pts.size() - 1) / 16);
        for (int k = 0; k < pts.size(); k += stride) {
            TorquePoint p = pts.get(k);
            out.printf(Locale.ROOT, "  %12.0f %10.0f %8.0f %s %12.4f %10.4f %10.2f%n", p.rateFullStepsPerS(),
                    r.units().pulsesPerS(p.rateFullStepsPerS()), p.speedRpm(), r.units().hasTravel()
                            ? String.format(Locale.ROOT, "%8.1f", r.units().mmPerS(p.rateFullStepsPerS())) : "",
                    p.pullOutTorqueNm(), org.lodestep.drive.Margin.usableNm(p.pullOutTorqueNm(), margin), p.powerW());
        }
        if (r.dynamometer() != null) {
            out.println();
            out.printf(Locale.ROOT, "Virtual dynamometer (phase circuits with back-EMF, this drive; damping ratio %.2f"
                    + " added back as c·ω):%n", org.lodestep.workflow.DriveSimulation.DAMPING_RATIO);
            out.printf(Locale.ROOT, "  %12s %12s %12s %8s%n", "full steps/s", "predicted", "simulated", "ratio");
            for (var p : r.dynamometer()) {
                out.printf(Locale.ROOT, "  %12.0f %12.4f %12s %8s%n", p.rateFullStepsPerS(), p.predictedNm(),
                        p.lostWithoutLoad() ? "lost" : String.format(Locale.ROOT, "%.4f", p.simulatedNm()),
                        p.lostWithoutLoad() ? "—" : String.format(Locale.ROOT, "%.3f", p.ratio()));
            }
            out.println("  (lost: the rotor slipped with no load, a resonance or instability of the simulated drive)");
        }
        notes(out, r.notes(), r.midBandCentreFullStepsPerS(), r.units());
    }

    public static void plan(PrintWriter out, DrivePlan.Result r) {
        DriveCurve.Result c = r.curve();
        header(out, c);
        out.println();
        answer(out, c.answer(), c.units(), c.load());
        Profile p = r.profile();
        RateUnits u = c.units();
        out.println();
        out.printf(Locale.ROOT, "Profile (%s): 0 -> %s -> 0%n", r.table().shapeWord(),
                rate(u, p.settings().targetFullStepsPerS()));
        out.printf(Locale.ROOT, "  base acceleration %s full steps/s² (%s pulses/s²%s), peak %s full steps/s²%n",
                sig(p.baseAccelerationFullStepsPerS2()), sig(u.pulsesPerS(p.baseAccelerationFullStepsPerS2())),
                u.hasTravel() ? ", " + sig(u.mmPerS(p.baseAccelerationFullStepsPerS2())) + " mm/s²" : "",
                sig(p.peakAccelerationFullStepsPerS2()));
        if (Double.isFinite(p.jerkFullStepsPerS3())) {
            out.printf(Locale.ROOT, "  jerk limit %s full steps/s³%n", sig(p.jerkFullStepsPerS3()));
        }
        out.printf(Locale.ROOT, "  accelerate %.3f s, cruise %.3f s, decelerate %.3f s; %.3f s, %.1f full steps"
                        + "%s in all%n", p.accelerationS(), p.settings().cruiseS(), p.accelerationS(),
                p.durationS(), p.distanceFullSteps(), u.hasTravel()
                        ? String.format(Locale.ROOT, " (%.1f mm)", p.distanceFullSteps() / u.fullStepsPerRev()
                        * u.travelMmPerRev()) : "");
        if (r.bands().isEmpty()) {
            out.println("  no avoid-list: no bands to cross");
        }
        for (BandCrossing b : p.crossings()) {
            out.printf(Locale.ROOT, "  band %.1f ... %.1f full steps/s: crossed at >= %s full steps/s² (needs %s,"
                            + " torque allows %s)%s in %.1f ms%n", b.band().fromFullStepsPerS(),
                    b.band().toFullStepsPerS(), sig(b.accelerationFullStepsPerS2()),
                    sig(b.band().minAccelerationFullStepsPerS2()), sig(b.allowedFullStepsPerS2()),
                    b.raised() ? ", raised" : "", 1000 * b.timeInBandS());
        }
        out.printf(Locale.ROOT, "  step-rate table: %d rows every %.4g s%n", r.table().rows().size(),
                p.settings().tableStepS());
        if (r.simulation() != null) {
            var s = r.simulation();
            out.printf(Locale.ROOT, "Virtual rig (phase circuits with back-EMF, this drive and load, damping ratio"
                    + " %.2f): the planned profile lost %d full steps (largest lag %.2f full steps)%n",
                    org.lodestep.workflow.DriveSimulation.DAMPING_RATIO, s.planned().lostFullSteps(),
                    s.planned().maxLagFullSteps());
            if (s.naive() != null) {
                out.printf(Locale.ROOT, "  a naive constant acceleration of %s full steps/s² (sized on the low-speed"
                        + " torque, no margin) to the same peak lost %d full steps%n",
                        sig(s.naiveAccelerationFullStepsPerS2()), s.naive().lostFullSteps());
            }
        }
        notes(out, r.notes(), c.midBandCentreFullStepsPerS(), u);
    }

    private static void header(PrintWriter out, DriveCurve.Result r) {
        PhaseModel m = r.motor();
        TorqueCurve c = r.curve();
        Driver d = c.drive();
        out.printf(Locale.ROOT, "Motor (%s): R %.3g Ω, L %.3g mH, Kt %.3g N·m/A, %d rotor teeth (%d full steps/rev),"
                        + " rotor inertia %.3g kg·m²%n", r.motorSource(), m.phaseResistanceOhm(),
                m.phaseInductanceH() * 1000, m.ktNmPerA(), m.rotorTeeth(), m.fullStepsPerRev(), m.rotorInertiaKgM2());
        out.println("Drive: " + driveText(d));
        out.println("Model: " + MODEL);
        out.printf(Locale.ROOT, "Holding torque %.3f N·m; running pull-out torque at low speed %.3f N·m%n",
                c.holdingTorqueNm(), c.lowSpeedTorqueNm());
        if (d.mode() == DriveMode.CHOPPER) {
            out.println("Set current reached up to " + rate(r.units(), c.fullCurrentRateFullStepsPerS())
                    + "; above it the supply limits the current");
        }
        out.println("Torque " + (Double.isFinite(c.zeroTorqueRateFullStepsPerS())
                ? "reaches zero at " + rate(r.units(), c.zeroTorqueRateFullStepsPerS())
                : "falls to 10 % of its low-speed value at " + rate(r.units(), c.endRateFullStepsPerS())
                + " (in this model it only tends to zero)"));
        out.printf(Locale.ROOT, "Mechanical power at pull-out reaches %.1f W from %s on%n", c.maxPowerW(),
                rate(r.units(), c.maxPowerRateFullStepsPerS()));
    }

    static String driveText(Driver d) {
        String step = d.fullStep() ? "full steps, two phases on" : "1/" + d.microsteps() + " microsteps";
        return d.mode() == DriveMode.CHOPPER
                ? String.format(Locale.ROOT, "chopper, %.2f A per phase, %.3g V supply, %s", d.phaseCurrentA(),
                d.supplyV(), step)
                : String.format(Locale.ROOT, "constant voltage, %.3g V supply, %s", d.supplyV(), step);
    }

    private static void answer(PrintWriter out, SpeedAnswer a, RateUnits u, Load load) {
        out.printf(Locale.ROOT, "Load: %.3g kg·m² reflected inertia (%.3g kg·m² with the rotor), %.3g N·m at"
                + " constant speed (friction%s)%n", load.inertiaKgM2(), a.totalInertiaKgM2(),
                a.requiredAtTargetNm(), load.gravityForceN() > 0 ? " and gravity" : "");
        String verdict = switch (a.verdict()) {
            case REACHABLE -> "REACHED with margin";
            case MARGIN_SHORT -> "reached, but with LESS margin than asked";
            case NOT_REACHABLE -> "NOT REACHED: the load needs more than the pull-out torque";
        };
        out.println("Target " + rate(u, a.target().fullStepsPerS()) + ": " + verdict);
        out.printf(Locale.ROOT, "  pull-out torque there %.3f N·m, load %.3f N·m: margin %s (asked %s; common"
                        + " practice 30 to 50 %%)%n", a.pullOutAtTargetNm(), a.requiredAtTargetNm(),
                Double.isFinite(a.marginAtTarget()) ? pct(a.marginAtTarget()) : "none", pct(a.requiredMargin()));
        out.println("  highest speed with that margin: " + maxRateWithMarginText(u, a));
        out.printf(Locale.ROOT, "  acceleration left at the target with the margin: %s full steps/s²%n",
                sig(a.accelerationAtTargetFullStepsPerS2()));
        if (!a.suggestions().isEmpty()) {
            out.println("  To reach it with the margin (each alone):");
            for (Suggestion s : a.suggestions()) {
                out.println("    - " + s.text());
            }
        } else if (a.verdict() != SpeedAnswer.Verdict.REACHABLE) {
            out.println("  No single change tried (supply up to 4×, parallel, current up to 1.5×) gets there: a"
                    + " larger motor or a lower gear ratio is needed.");
        }
    }

    private static void notes(PrintWriter out, List<String> notes, double midBand, RateUnits u) {
        out.println();
        out.println("Mid-band instability is expected near " + rate(u, midBand) + " (4·(R/L)/2π, Acarnley"
                + " section 5.5): the model does not predict it; a sweep shows whether this motor has it.");
        for (String n : notes) {
            out.println("Note: " + n);
        }
        out.println();
        out.println("Safety:");
        for (String s : Cautions.sentences(Cautions.motion())) {
            out.println("  - " + s);
        }
    }

    /** A rate in full steps/s, pulses/s, rpm and (with a travel) mm/s. */
    static String rate(RateUnits u, double fullStepsPerS) {
        // about three figures: a rate of 1383.9 full steps/s is not known to a tenth
        StringBuilder b = new StringBuilder(String.format(Locale.ROOT, Math.abs(fullStepsPerS) >= 100 ? "%.0f full steps/s"
                : "%.1f full steps/s", fullStepsPerS));
        if (u.microsteps() > 1) {
            b.append(String.format(Locale.ROOT, " = %.0f pulses/s", u.pulsesPerS(fullStepsPerS)));
        }
        b.append(String.format(Locale.ROOT, " = %.0f rpm", u.rpm(fullStepsPerS)));
        if (u.hasTravel()) {
            b.append(String.format(Locale.ROOT, Math.abs(u.mmPerS(fullStepsPerS)) >= 100 ? " = %.0f mm/s"
                    : " = %.1f mm/s", u.mmPerS(fullStepsPerS)));
        }
        return b.toString();
    }

    static String pct(double f) {
        return String.format(Locale.ROOT, "%.0f %%", 100 * f);
    }

    static String sig(double v) {
        return Double.isFinite(v) ? MotorCardText.num(v, 3) : "—";
    }

    /** The highest rate with the margin, or why there is none or no bound; shared by the text and HTML reports. */
    static String maxRateWithMarginText(RateUnits u, SpeedAnswer a) {
        double r = a.maxRateWithMarginFullStepsPerS();
        if (Double.isInfinite(r)) {
            return "no bound in this model (the load needs no torque at constant speed); resonance and mid-band"
                    + " instability can still stall it";
        }
        return r > 0 ? rate(u, r) : "none (not even at standstill)";
    }
}
