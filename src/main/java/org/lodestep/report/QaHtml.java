package org.lodestep.report;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

import org.lodestep.qa.CheckResult;
import org.lodestep.qa.Histogram;
import org.lodestep.qa.LotStatistics;
import org.lodestep.qa.Parameters;
import org.lodestep.qa.StoredRecord;
import org.lodestep.qa.Submission;
import org.lodestep.qa.Tally;
import org.lodestep.qa.Verdict;
import org.lodestep.report.html.Cell;
import org.lodestep.report.html.ControlChart;
import org.lodestep.report.html.HistogramChart;
import org.lodestep.report.html.HtmlReport;
import org.lodestep.report.html.HtmlTable;
import org.lodestep.report.html.SafetyNote;
import org.lodestep.report.html.Status;

/**
 * HTML reports of incoming QA: the verdict table of each checked motor, and the lot report with, per parameter,
 * the statistics, a histogram against the spec limits and the individuals and moving-range charts.
 */
public final class QaHtml {
    private QaHtml() {
    }

    /**
     * The report of one {@code qa check} run: one motor, or every motor of a lot in the order tested.
     *
     * @param title          heading (the serial, or "lot L-...")
     * @param records        the records written or found, in test order
     * @param testVoltageV   the insulation test voltage of the spec, V, or NaN when the spec has no insulation check
     * @param notRecorded    serials that could not be checked, with the reason; may be empty
     */
    public static HtmlReport check(String title, List<StoredRecord> records, double testVoltageV,
                                   Map<String, String> notRecorded) {
        HtmlReport.Builder b = HtmlReport.builder("Incoming QA check", title);
        Tally tally = Tally.of(records);
        long unrecordedMotors = notRecorded.keySet().stream()
                .filter(sn -> records.stream().noneMatch(r -> r.submission().serial().equals(sn))).count();
        tally = new Tally(tally.passed(), tally.failed(), tally.incomplete() + (int) unrecordedMotors);
        if (!records.isEmpty()) {
            Submission s = records.get(0).submission();
            b.meta("Part", s.partNumber() + " rev " + s.partRevision() + ", spec v" + s.specVersion())
                    .meta("Lot", s.lot()).meta("Operator", s.operator()).meta("Station", s.station());
        }
        int tested = tally.tested();
        Status overall = tally.failed() > 0 ? Status.FAIL : tally.incomplete() > 0 ? Status.WARN : Status.PASS;
        if (tested == 1 && records.size() == 1) {
            Submission s = records.get(0).submission();
            b.verdict(status(s.verdict()), s.verdict().name() + ": serial " + s.serial(), failing(s));
        } else {
            b.verdict(overall, String.format(Locale.ROOT, "%d tested: %d pass, %d fail, %d incomplete", tested,
                    tally.passed(), tally.failed(), tally.incomplete()), null);
        }
        if (!Double.isNaN(testVoltageV)) {
            b.safety(SafetyNote.INSULATION_TEST);
        }
        if (records.size() > 1 || !notRecorded.isEmpty()) {
            b.section("Verdicts");
            HtmlTable.Builder t = HtmlTable.builder(null, "Serial", "Verdict", "Failed or unjudged checks",
                    "Record");
            for (StoredRecord r : records) {
                Submission s = r.submission();
                t.row(s.verdict() == Verdict.PASS ? null : status(s.verdict()), Cell.text(s.serial()),
                        Cell.status(status(s.verdict()), s.verdict().name().toLowerCase(Locale.ROOT)),
                        Cell.text(failing(s) == null ? "\u2014" : failing(s)), Cell.text(recordText(r)));
            }
            for (Map.Entry<String, String> e : notRecorded.entrySet()) {
                t.row(Status.WARN, Cell.text(e.getKey()), Cell.status(Status.WARN, "not recorded"),
                        Cell.text(e.getValue()), Cell.text("\u2014"));
            }
            b.table(t.build());
        }
        for (StoredRecord r : records) {
            Submission s = r.submission();
            b.section("Serial " + s.serial());
            b.table(checkTable(s.checks()));
            List<HtmlReport.Finding> notes = new ArrayList<>();
            for (CheckResult c : s.checks()) {
                if (!c.note().isEmpty()) {
                    notes.add(new HtmlReport.Finding(status(c.verdict()), name(c) + ": " + c.note()));
                }
            }
            if (!notes.isEmpty()) {
                b.findings(notes);
            }
            Map<String, String> facts = new LinkedHashMap<>();
            facts.put("Record", recordText(r));
            facts.put("Tested", s.startedAtUtc() + " \u2013 " + s.finishedAtUtc());
            facts.put("Ambient", Double.isNaN(s.ambientC()) ? "not given"
                    : String.format(Locale.ROOT, "%.1f \u00B0C", s.ambientC()));
            facts.put("Spec SHA-256", s.specSha256().substring(0, Math.min(16, s.specSha256().length())) + "\u2026");
            facts.put("Body SHA-256", r.bodySha256().substring(0, Math.min(16, r.bodySha256().length())) + "\u2026"
                    + (r.intact() ? "" : " (no longer matches)"));
            b.facts(facts);
        }
        return b.build();
    }

    /** The lot (part, date range) report: every number, series and bin comes from {@code sum}. */
    public static HtmlReport lot(String title, LotStatistics.Summary sum) {
        LotStatistics.Counts c = sum.counts();
        HtmlReport.Builder b = HtmlReport.builder("Incoming QA lot report", title)
                .meta("Motors", c.motors() + " (" + c.records() + " records, " + c.retests() + " re-tests)")
                .meta("First-pass yield", QaFormat.pct(c.firstPassYieldPct()))
                .meta("Final yield", QaFormat.pct(c.finalYieldPct()));
        Status st = c.notIntact() > 0 || c.failed() > 0 ? Status.FAIL : c.incomplete() > 0 ? Status.WARN : Status.PASS;
        b.verdict(st, String.format(Locale.ROOT, "%d pass, %d fail, %d incomplete", c.passed(), c.failed(),
                c.incomplete()), c.notIntact() > 0 ? c.notIntact() + " record(s) no longer match their SHA-256: the"
                + " database was changed outside Lodestep." : null);
        for (LotStatistics.ParameterStatistics p : sum.parameters()) {
            String name = p.parameter();
            String unit = QaFormat.unit(name, p.unit());
            double k = QaFormat.scale(name);
            b.section(title(name) + " (" + unit + ")");
            Map<String, String> facts = new LinkedHashMap<>();
            facts.put("n", Integer.toString(p.n()));
            facts.put("Mean", QaFormat.value(name, p.mean()) + " " + unit);
            facts.put("s", QaFormat.value(name, p.stdDev()) + " " + unit);
            facts.put("Min \u2013 max", QaFormat.value(name, p.min()) + " \u2013 " + QaFormat.value(name, p.max()));
            facts.put("Spec", spec(name, p.lsl(), p.usl()) + " " + unit + (p.limitsVaried() ? " (latest spec)" : ""));
            facts.put("Outside spec", Integer.toString(p.outOfSpec()));
            facts.put("Cp / Cpk", QaFormat.index(p.cp()) + " / " + QaFormat.index(p.cpk()));
            facts.put("Pp / Ppk", QaFormat.index(p.pp()) + " / " + QaFormat.index(p.ppk()));
            b.facts(facts);
            double[] x = scaled(p.individuals(), k);
            String[] labels = p.points().stream()
                    .map(pt -> pt.serial() + (pt.label().isEmpty() ? "" : " " + pt.label())).toArray(String[]::new);
            List<Histogram.Bin> bins = p.histogram();
            double[] edges = new double[bins.size() + 1];
            int[] inside = new int[bins.size()];
            int[] outside = new int[bins.size()];
            for (int i = 0; i < bins.size(); i++) {
                edges[i] = bins.get(i).lower() * k;
                edges[i + 1] = bins.get(i).upper() * k;
                inside[i] = bins.get(i).insideSpec();
                outside[i] = bins.get(i).outsideSpec();
            }
            if (!bins.isEmpty()) {
                HistogramChart.Builder h = HistogramChart.builder("", title(name) + " (" + unit + ")", edges, inside,
                        outside);
                if (!Double.isNaN(p.lsl())) {
                    h.lowerLimit(p.lsl() * k, "LSL " + QaFormat.value(name, p.lsl()) + " " + unit);
                }
                if (!Double.isNaN(p.usl())) {
                    h.upperLimit(p.usl() * k, "USL " + QaFormat.value(name, p.usl()) + " " + unit);
                }
                b.figure(h.build().toSvg(), "Histogram of " + title(name).toLowerCase(Locale.ROOT) + " with the spec"
                        + " limits (dashed); values outside them are counted in their own dark bars.");
            }
            if (x.length >= 2 && Double.isFinite(p.chart().upperX())) {
                boolean[] outX = new boolean[x.length];
                boolean[] outMr = new boolean[x.length - 1];
                for (int i : p.chart().outsideX()) {
                    outX[i] = true;
                }
                for (int i : p.chart().outsideMr()) {
                    outMr[i - 1] = true;
                }
                b.figure(ControlChart.builder("", title(name) + " (" + unit + ")", x, labels)
                        .centre(p.chart().centre() * k, "x\u0304 " + QaFormat.value(name, p.chart().centre()))
                        .upperLimit(p.chart().upperX() * k, "UCL " + QaFormat.value(name, p.chart().upperX()))
                        .lowerLimit(p.chart().lowerX() * k, "LCL " + QaFormat.value(name, p.chart().lowerX()))
                        .flagged(outX).build().toSvg(),
                        "Individuals chart in production order; points outside the control limits are hollow diamonds"
                        + " named by serial.");
                double[] mr = scaled(p.movingRanges(), k);
                String[] mrLabels = java.util.Arrays.copyOfRange(labels, 1, labels.length);
                b.figure(ControlChart.builder("", "moving range (" + unit + ")", mr, mrLabels).firstIndex(2)
                        .centre(p.chart().movingRangeMean() * k, "MR\u0304 "
                                + QaFormat.value(name, p.chart().movingRangeMean()))
                        .upperLimit(p.chart().upperMr() * k, "UCL " + QaFormat.value(name, p.chart().upperMr()))
                        .flagged(outMr).build().toSvg(),
                        "Moving-range chart (|x\u1D62 \u2212 x\u1D62\u208B\u2081|); its lower limit is zero.");
            }
        }
        if (sum.parameters().isEmpty()) {
            b.paragraph("No measured values to summarise.");
        }
        return b.build();
    }

    /** Values in display units (a pure change of unit, as every number shown). */
    private static double[] scaled(double[] si, double k) {
        double[] out = new double[si.length];
        for (int i = 0; i < si.length; i++) {
            out[i] = si[i] * k;
        }
        return out;
    }

    private static String spec(String name, double lsl, double usl) {
        if (Double.isNaN(lsl)) {
            return "\u2264 " + QaFormat.value(name, usl);
        }
        if (Double.isNaN(usl)) {
            return "\u2265 " + QaFormat.value(name, lsl);
        }
        return QaFormat.value(name, lsl) + " \u2013 " + QaFormat.value(name, usl);
    }

    private static HtmlTable checkTable(List<CheckResult> checks) {
        HtmlTable.Builder t = HtmlTable.builder(null, "Check", "Phase", "Measured", "Judged", "Limits", "Unit",
                "Result");
        for (CheckResult c : checks) {
            String p = c.parameter();
            String limits = spec(p, c.limit().lower(), c.limit().upper());
            t.row(c.verdict() == Verdict.PASS ? null : status(c.verdict()), Cell.text(title(p)),
                    Cell.text(c.label().isEmpty() ? "\u2014" : c.label()), Cell.number(QaFormat.value(p, c.measured())),
                    Cell.number(QaFormat.value(p, c.judged())), Cell.number(limits.trim()),
                    Cell.text(QaFormat.unit(p, c.limit().unit())),
                    Cell.status(status(c.verdict()), c.verdict().name().toLowerCase(Locale.ROOT)));
        }
        return t.build();
    }

    private static String failing(Submission s) {
        List<String> names = new ArrayList<>();
        for (CheckResult c : s.checks()) {
            if (c.verdict() != Verdict.PASS) {
                names.add(name(c) + " " + c.verdict().name().toLowerCase(Locale.ROOT));
            }
        }
        return names.isEmpty() ? null : String.join("; ", names);
    }

    private static String name(CheckResult c) {
        return title(c.parameter()) + (c.label().isEmpty() ? "" : " " + c.label());
    }

    private static String recordText(StoredRecord r) {
        return "#" + r.id() + (r.retestOf() == null ? "" : " (re-test of #" + r.retestOf() + ")") + ", "
                + r.recordedAtUtc();
    }

    private static String title(String parameter) {
        String s = switch (parameter) {
            case Parameters.PHASE_RESISTANCE -> "Phase resistance";
            case Parameters.PHASE_IMBALANCE -> "Phase imbalance";
            case Parameters.PHASE_INDUCTANCE -> "Phase inductance";
            case Parameters.INSULATION_RESISTANCE -> "Insulation resistance";
            case Parameters.BACK_EMF_CONSTANT -> "Back-EMF constant";
            case Parameters.STEP_ANGLE -> "Step angle";
            default -> parameter.replace('_', ' ');
        };
        return s;
    }

    static Status status(Verdict v) {
        return switch (v) {
            case PASS -> Status.PASS;
            case FAIL -> Status.FAIL;
            case INCOMPLETE -> Status.WARN;
        };
    }
}
