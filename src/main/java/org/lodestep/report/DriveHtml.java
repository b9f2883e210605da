package org.lodestep.report;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

import org.lodestep.drive.Band;
import org.lodestep.drive.BandCrossing;
import org.lodestep.drive.Margin;
import org.lodestep.drive.Profile;
import org.lodestep.drive.SpeedAnswer;
import org.lodestep.drive.StepRateTable;
import org.lodestep.drive.Suggestion;
import org.lodestep.drive.TorqueCurve;
import org.lodestep.drive.TorquePoint;
import org.lodestep.report.html.Cell;
import org.lodestep.report.html.Chart;
import org.lodestep.report.html.HtmlReport;
import org.lodestep.report.html.HtmlTable;
import org.lodestep.report.html.Status;
import org.lodestep.report.html.XyChart;
import org.lodestep.resonance.RateUnits;
import org.lodestep.safety.Cautions;
import org.lodestep.workflow.DriveCurve;
import org.lodestep.workflow.DrivePlan;

/**
 * HTML reports of {@code drive curve} (torque curve, torque with margin, load line, operating point) and
 * {@code drive plan} (the same with the bands on the speed axis, and the profile's rate against time with the bands
 * shaded).
 */
public final class DriveHtml {
    private DriveHtml() {
    }

    public static HtmlReport curve(DriveCurve.Result r) {
        HtmlReport.Builder b = start("Drive curve", r);
        b.section("Pull-out torque against speed");
        b.figure(torqueChart(r, List.of()).toSvg(), caption(r));
        answer(b, r);
        facts(b, r, List.of());
        return b.build();
    }

    public static HtmlReport plan(DrivePlan.Result p) {
        DriveCurve.Result r = p.curve();
        HtmlReport.Builder b = start("Drive profile", r);
        b.section("Pull-out torque against speed");
        b.figure(torqueChart(r, p.bands()).toSvg(), caption(r) + " Shaded: the bands of the avoid-list.");
        answer(b, r);
        b.section("Profile");
        b.figure(profileChart(p).toSvg(), "Planned step rate against time, from standstill to the target and back;"
                + " each band of the avoid-list is shaded across the time axis and crossed at no less than its"
                + " crossing acceleration.");
        Profile pr = p.profile();
        Map<String, String> f = new LinkedHashMap<>();
        f.put("Shape", p.table().shapeWord());
        f.put("Base acceleration", sig(pr.baseAccelerationFullStepsPerS2()) + " full steps/s²");
        f.put("Peak acceleration", sig(pr.peakAccelerationFullStepsPerS2()) + " full steps/s²");
        if (Double.isFinite(pr.jerkFullStepsPerS3())) {
            f.put("Jerk limit", sig(pr.jerkFullStepsPerS3()) + " full steps/s³");
        }
        f.put("Duration", String.format(Locale.ROOT, "%.3f s (%.3f s up, %.3f s cruise)", pr.durationS(),
                pr.accelerationS(), pr.settings().cruiseS()));
        f.put("Distance", String.format(Locale.ROOT, "%.1f full steps", pr.distanceFullSteps()));
        f.put("Step-rate table", p.table().rows().size() + " rows every " + pr.settings().tableStepS() + " s");
        if (p.simulation() != null) {
            f.put("Virtual rig, planned profile", p.simulation().planned().lostFullSteps() + " full steps lost");
            if (p.simulation().naive() != null) {
                f.put("Virtual rig, naive constant acceleration", p.simulation().naive().lostFullSteps()
                        + " full steps lost");
            }
        }
        b.facts(f);
        if (!pr.crossings().isEmpty()) {
            HtmlTable.Builder t = HtmlTable.builder(null, "Band (full steps/s)", "Needs", "Planned", "Torque allows",
                    "Time in band");
            for (BandCrossing c : pr.crossings()) {
                t.row(Status.PASS, Cell.number(String.format(Locale.ROOT, "%.1f – %.1f", c.band().fromFullStepsPerS(),
                                c.band().toFullStepsPerS())),
                        Cell.number(sig(c.band().minAccelerationFullStepsPerS2()) + " full steps/s²"),
                        Cell.number(sig(c.accelerationFullStepsPerS2()) + " full steps/s²"),
                        Cell.number(sig(c.allowedFullStepsPerS2()) + " full steps/s²"),
                        Cell.number(String.format(Locale.ROOT, "%.1f ms", 1000 * c.timeInBandS())));
            }
            b.table(t.build());
        }
        facts(b, r, p.notes());
        return b.build();
    }

    private static HtmlReport.Builder start(String kind, DriveCurve.Result r) {
        HtmlReport.Builder b = HtmlReport.builder(kind, r.motorSource())
                .meta("Drive", DriveText.driveText(r.curve().drive()))
                .meta("Motor", String.format(Locale.ROOT, "R %.3g Ω, L %.3g mH, Kt %.3g N·m/A, %d rotor teeth",
                        r.motor().phaseResistanceOhm(), 1000 * r.motor().phaseInductanceH(), r.motor().ktNmPerA(),
                        r.motor().rotorTeeth()));
        SpeedAnswer a = r.answer();
        if (a == null) {
            b.verdict(Status.INFO, "Torque curve", String.format(Locale.ROOT, "Holding torque %.3f N·m; the set"
                    + " current is reached up to %s.", r.curve().holdingTorqueNm(),
                    DriveText.rate(r.units(), r.curve().fullCurrentRateFullStepsPerS())));
        } else {
            Status s = switch (a.verdict()) {
                case REACHABLE -> Status.PASS;
                case MARGIN_SHORT -> Status.WARN;
                case NOT_REACHABLE -> Status.FAIL;
            };
            String head = switch (a.verdict()) {
                case REACHABLE -> "Reaches the target with margin";
                case MARGIN_SHORT -> "Reaches the target, with less margin than asked";
                case NOT_REACHABLE -> "Does not reach the target";
            };
            // the answer with its margin in one line; what would do, when the margin falls short
            String answer = "Target " + DriveText.rate(r.units(), a.target().fullStepsPerS()) + ": margin "
                    + (Double.isFinite(a.marginAtTarget()) ? DriveText.pct(a.marginAtTarget()) : "none")
                    + " (asked " + DriveText.pct(a.requiredMargin()) + ")";
            String detail = a.verdict() == SpeedAnswer.Verdict.REACHABLE ? null
                    : (Double.isFinite(a.maxRateWithMarginFullStepsPerS()) && a.maxRateWithMarginFullStepsPerS() > 0
                    ? "Highest speed with that margin: " + DriveText.rate(r.units(), a.maxRateWithMarginFullStepsPerS())
                    + ". " : "") + (a.suggestions().isEmpty() ? "" : "To reach it: " + a.suggestions().get(0).text()
                    + (a.suggestions().size() > 1 ? " (more below)" : ""));
            b.verdict(s, head, answer, detail);
        }
        b.safety(Cautions.motion());
        return b;
    }

    private static String caption(DriveCurve.Result r) {
        return "Pull-out torque (solid) and the torque with margin kept in reserve (dashed) against full-step rate"
                + " (bottom axis) and shaft speed (top axis); the load line is the torque the load needs at constant"
                + " speed, the marker the operating point at the target and the vertical stroke over it the margin"
                + " left there. Left of the line marked \u201Ccurrent limit | voltage limit\u201D the drive holds"
                + " its set current; right of it the supply voltage, against the winding's inductance and back-EMF,"
                + " is the binding limit. " + DriveText.MODEL;
    }

    private static Chart torqueChart(DriveCurve.Result r, List<Band> bands) {
        TorqueCurve c = r.curve();
        // draw the working range (the curve's tail falls as 1/ω for a long way): up to 3 × the target or the corner
        double corner = Double.isFinite(c.fullCurrentRateFullStepsPerS()) ? c.fullCurrentRateFullStepsPerS()
                : c.endRateFullStepsPerS() / 4;
        double top = Math.max(3 * corner, r.answer() != null ? 3 * r.answer().target().fullStepsPerS() : 0);
        List<TorquePoint> pts = c.points().stream().filter(p -> p.rateFullStepsPerS() <= top).toList();
        if (pts.size() < 20) {
            pts = c.points();
        }
        double[] x = new double[pts.size()];
        double[] t = new double[pts.size()];
        double[] tm = new double[pts.size()];
        double margin = r.answer() != null ? r.answer().requiredMargin() : Margin.DEFAULT;
        for (int k = 0; k < x.length; k++) {
            x[k] = pts.get(k).rateFullStepsPerS();
            t[k] = pts.get(k).pullOutTorqueNm();
            tm[k] = Margin.usableNm(t[k], margin);
        }
        XyChart.Builder b = XyChart.builder("Pull-out torque", "step rate (full steps/s)", "torque (N·m)")
                .line("pull-out torque", x, t)
                .line("with " + DriveText.pct(margin) + " margin", x, tm)
                .yFromZero(true);
        if (r.dynamometer() != null) {
            List<double[]> kept = new ArrayList<>();
            for (var p : r.dynamometer()) {
                if (!p.lostWithoutLoad() && p.rateFullStepsPerS() <= x[x.length - 1]) {
                    kept.add(new double[] {p.rateFullStepsPerS(), p.simulatedNm()});
                }
            }
            if (!kept.isEmpty()) {
                b.points("virtual dynamometer", kept.stream().mapToDouble(d -> d[0]).toArray(),
                        kept.stream().mapToDouble(d -> d[1]).toArray());
            }
        }
        if (r.answer() != null) {
            SpeedAnswer a = r.answer();
            double need = a.requiredAtTargetNm();
            double at = a.target().fullStepsPerS();
            b.line("load at constant speed", new double[] {0, x[x.length - 1]}, new double[] {need, need});
            b.points("operating point", new double[] {at}, new double[] {need});
            if (Double.isFinite(a.marginAtTarget()) && a.pullOutAtTargetNm() > need) {
                // the margin drawn where it is taken: from the load up to the pull-out torque at the target
                b.line("margin at the target: " + DriveText.pct(a.marginAtTarget()), new double[] {at, at},
                        new double[] {need, a.pullOutAtTargetNm()});
            }
            b.verticalLine(at, "target", Status.INFO);
            if (a.maxRateWithMarginFullStepsPerS() > 0 && a.maxRateWithMarginFullStepsPerS() < x[x.length - 1]) {
                b.verticalLine(a.maxRateWithMarginFullStepsPerS(), "highest with margin", Status.WARN);
            }
        }
        if (Double.isFinite(c.fullCurrentRateFullStepsPerS()) && c.fullCurrentRateFullStepsPerS() < x[x.length - 1]) {
            // where the binding limit changes from the drive's set current to the supply voltage
            b.verticalLine(c.fullCurrentRateFullStepsPerS(), "current limit | voltage limit", Status.INFO);
        }
        b.topAxis("shaft speed (rpm)", r.units()::rpm);
        for (Band band : bands) {
            if (band.fromFullStepsPerS() < x[x.length - 1]) {
                b.band(band.fromFullStepsPerS(), Math.min(band.toFullStepsPerS(), x[x.length - 1]),
                        String.format(Locale.ROOT, "%.0f–%.0f full steps/s", band.fromFullStepsPerS(), band.toFullStepsPerS()),
                        Status.WARN);
            }
        }
        return b.describe("Pull-out torque and the torque with margin against full-step rate"
                + (r.answer() != null ? ", with the load line and the operating point at the target" : "")
                + (bands.isEmpty() ? "." : ", with " + bands.size() + " avoid bands shaded.")).build();
    }

    private static Chart profileChart(DrivePlan.Result p) {
        StepRateTable tb = p.table();
        List<StepRateTable.Row> rows = tb.rows();
        double[] t = new double[rows.size()];
        double[] v = new double[rows.size()];
        for (int k = 0; k < t.length; k++) {
            t[k] = rows.get(k).timeS();
            v[k] = rows.get(k).rateFullStepsPerS();
        }
        XyChart.Builder b = XyChart.builder("Profile", "time (s)", "step rate (full steps/s)")
                .line(tb.shapeWord() + " profile", t, v).yFromZero(true);
        double top = p.profile().settings().targetFullStepsPerS();
        for (Band band : p.bands()) {
            if (band.fromFullStepsPerS() < top) {
                b.bandY(band.fromFullStepsPerS(), band.toFullStepsPerS(), String.format(Locale.ROOT,
                        "%.0f–%.0f full steps/s", band.fromFullStepsPerS(), band.toFullStepsPerS()), Status.WARN);
            }
        }
        return b.describe("Step rate against time of the planned move" + (p.bands().isEmpty() ? "."
                : ", with the avoid bands shaded across the time axis.")).build();
    }

    private static void answer(HtmlReport.Builder b, DriveCurve.Result r) {
        SpeedAnswer a = r.answer();
        if (a == null) {
            return;
        }
        RateUnits u = r.units();
        b.section("The answer");
        HtmlTable.Builder t = HtmlTable.builder(null, "", "Full steps/s", "pulses/s", "rpm", "mm/s");
        t.row(Cell.text("Target"), Cell.number(f1(a.target().fullStepsPerS())), Cell.number(f0(a.target().pulsesPerS())),
                Cell.number(f0(a.target().rpm())), Cell.number(u.hasTravel() ? f1(a.target().mmPerS()) : "—"));
        if (Double.isFinite(a.maxRateWithMarginFullStepsPerS())) {
            t.row(Cell.text("Highest with margin"), Cell.number(f1(a.maxRateWithMargin().fullStepsPerS())),
                    Cell.number(f0(a.maxRateWithMargin().pulsesPerS())), Cell.number(f0(a.maxRateWithMargin().rpm())),
                    Cell.number(u.hasTravel() ? f1(a.maxRateWithMargin().mmPerS()) : "—"));
        }
        b.table(t.build());
        if (!Double.isFinite(a.maxRateWithMarginFullStepsPerS())) {
            b.paragraph("Highest speed with the margin: " + DriveText.maxRateWithMarginText(u, a) + ".");
        }
        Map<String, String> f = new LinkedHashMap<>();
        f.put("Pull-out torque at the target", String.format(Locale.ROOT, "%.3f N·m", a.pullOutAtTargetNm()));
        f.put("Load at constant speed", String.format(Locale.ROOT, "%.3f N·m", a.requiredAtTargetNm()));
        f.put("Margin at the target", (Double.isFinite(a.marginAtTarget()) ? DriveText.pct(a.marginAtTarget())
                : "none") + " (asked " + DriveText.pct(a.requiredMargin()) + "; common practice 30 to 50 %)");
        f.put("Acceleration left at the target", sig(a.accelerationAtTargetFullStepsPerS2()) + " full steps/s²");
        f.put("Inertia, rotor and load", String.format(Locale.ROOT, "%.3g kg·m²", a.totalInertiaKgM2()));
        b.facts(f);
        if (!a.suggestions().isEmpty()) {
            List<HtmlReport.Finding> s = new ArrayList<>();
            for (Suggestion g : a.suggestions()) {
                s.add(new HtmlReport.Finding(Status.INFO, g.text()));
            }
            b.findings(s);
        }
    }

    private static void facts(HtmlReport.Builder b, DriveCurve.Result r, List<String> extra) {
        b.section("Curve and model");
        TorqueCurve c = r.curve();
        Map<String, String> f = new LinkedHashMap<>();
        f.put("Holding torque", String.format(Locale.ROOT, "%.3f N·m", c.holdingTorqueNm()));
        f.put("Running pull-out torque at low speed", String.format(Locale.ROOT, "%.3f N·m", c.lowSpeedTorqueNm()));
        f.put("Set current reached up to", Double.isFinite(c.fullCurrentRateFullStepsPerS())
                ? DriveText.rate(r.units(), c.fullCurrentRateFullStepsPerS()) : "— (constant-voltage drive)");
        f.put("Peak power", String.format(Locale.ROOT, "%.1f W at %s", c.maxPowerW(),
                DriveText.rate(r.units(), c.maxPowerRateFullStepsPerS())));
        f.put("Mid-band instability expected near", DriveText.rate(r.units(), r.midBandCentreFullStepsPerS())
                + " (not in the model)");
        b.facts(f);
        b.paragraph(DriveText.MODEL);
        List<HtmlReport.Finding> notes = new ArrayList<>();
        for (String n : extra.isEmpty() ? r.notes() : extra) {
            notes.add(new HtmlReport.Finding(Status.INFO, n));
        }
        if (!notes.isEmpty()) {
            b.findings(notes);
        }
    }

    private static String sig(double v) {
        return DriveText.sig(v);
    }

    private static String f0(double v) {
        return String.format(Locale.ROOT, "%.0f", v);
    }

    private static String f1(double v) {
        return String.format(Locale.ROOT, "%.1f", v);
    }
}
