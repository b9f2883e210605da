package org.lodestep.report;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

import org.lodestep.qa.CheckResult;
import org.lodestep.qa.Histogram;
import org.lodestep.qa.LotStatistics;
import org.lodestep.qa.StoredRecord;
import org.lodestep.qa.Submission;
import org.lodestep.qa.Tally;
import org.lodestep.qa.ValueScale;
import org.lodestep.qa.Verdict;
import org.lodestep.report.html.Cell;
import org.lodestep.report.html.ControlChart;
import org.lodestep.report.html.HistogramChart;
import org.lodestep.report.html.HtmlReport;
import org.lodestep.report.html.HtmlTable;
import org.lodestep.report.html.Status;
import org.lodestep.safety.Cautions;
import org.lodestep.safety.Hazard;

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
        Tally tally = Tally.of(records, notRecorded.keySet());
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
            List<String> notPassed = new ArrayList<>();
            for (StoredRecord r : records) {
                if (r.submission().verdict() != Verdict.PASS) {
                    notPassed.add(r.submission().serial() + " (" + r.submission().verdict().name()
                            .toLowerCase(Locale.ROOT) + ")");
                }
            }
            notPassed.addAll(notRecorded.keySet().stream().map(k -> k + " (not recorded)").toList());
            b.verdict(overall, String.format(Locale.ROOT, "%d tested: %d pass, %d fail, %d incomplete", tested,
                    tally.passed(), tally.failed(), tally.incomplete()), notPassed.isEmpty() ? "Every motor passed."
                    : "Not passed: " + String.join("; ", notPassed) + ".", null);
        }
        boolean lot = records.size() > 1 || !notRecorded.isEmpty();
        if (lot) {
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
        // Compact: a motor that did not pass shows its checks; one that passed only its summary line, which opens on
        // a click. Notes, record facts and the safety caution sit collapsed under their own one-line summaries.
        if (lot) {
            b.section("Checks of each motor");
        }
        for (StoredRecord r : records) {
            Submission s = r.submission();
            if (lot) {
                b.collapsed(s.serial() + ": " + s.verdict().name().toLowerCase(Locale.ROOT) + ", " + s.checks().size()
                        + " checks" + (failing(s) == null ? "" : " (" + failing(s) + ")"), s.verdict() != Verdict.PASS);
            } else {
                b.section("Serial " + s.serial());
            }
            b.table(checkTable(s.checks()));
            List<HtmlReport.Finding> notes = new ArrayList<>();
            for (CheckResult c : s.checks()) {
                if (!c.note().isEmpty()) {
                    // A note explains a value (correction applied, what is missing); it is not a verdict.
                    notes.add(new HtmlReport.Finding(c.verdict() == Verdict.PASS ? Status.INFO : status(c.verdict()),
                            name(c) + ": " + c.note()));
                }
            }
            Map<String, String> facts = new LinkedHashMap<>();
            facts.put("Record", recordText(r));
            facts.put("Tested", s.startedAtUtc() + " \u2013 " + s.finishedAtUtc());
            facts.put("Ambient", Double.isNaN(s.ambientC()) ? "not given"
                    : String.format(Locale.ROOT, "%.1f \u00B0C", s.ambientC()));
            facts.put("Spec SHA-256", s.specSha256().substring(0, Math.min(16, s.specSha256().length())) + "\u2026");
            facts.put("Body SHA-256", r.bodySha256().substring(0, Math.min(16, r.bodySha256().length())) + "\u2026"
                    + (r.intact() ? "" : " (no longer matches)"));
            b.collapsed((notes.isEmpty() ? "" : notes.size() + " notes (corrections, how each value was judged) and ")
                    + "record details");
            if (!notes.isEmpty()) {
                b.findings(notes);
            }
            b.facts(facts);
            b.endCollapsed();
            if (lot) {
                b.endCollapsed();
            }
        }
        if (!Double.isNaN(testVoltageV)) {
            b.collapsed("\u26A0 " + Cautions.insulationTestLine(testVoltageV) + " (Open for the full caution.)");
            b.safety(Hazard.INSULATION_TEST);
            b.endCollapsed();
        }
        return b.build();
    }

    /**
     * The lot (part, date range) report: every number, series and bin comes from {@code sum}. The answer (yield,
     * failed and re-tested serials) opens it, the failed checks follow in a table, then one section per series (a
     * parameter of one phase or pair) with its statistics, histogram and individuals and moving-range charts, or the
     * statement that it does not vary.
     */
    public static HtmlReport lot(String title, LotStatistics.Summary sum) {
        LotStatistics.Counts c = sum.counts();
        HtmlReport.Builder b = HtmlReport.builder("Incoming QA lot report", title)
                .meta("Motors", c.motors() + " (" + c.records() + " records, " + c.retests() + " re-tests)")
                .meta("First-pass yield", QaFormat.pct(c.firstPassYieldPct()))
                .meta("Final yield", QaFormat.pct(c.finalYieldPct()));
        Status st = c.notIntact() > 0 || c.failed() > 0 ? Status.FAIL : c.incomplete() > 0 ? Status.WARN : Status.PASS;
        // the answer a quality engineer acts on, in its own line: yield, failed and re-tested serials
        b.verdict(st, String.format(Locale.ROOT, "%d pass, %d fail, %d incomplete", c.passed(), c.failed(),
                c.incomplete()), QaLotPhrases.answer(sum), c.notIntact() > 0 ? c.notIntact()
                + " record(s) no longer match their SHA-256: the database was changed outside Lodestep." : null);
        if (!sum.failedChecks().isEmpty()) {
            b.section("Failed and re-tested motors");
            b.table(failedTable(sum.failedChecks()));
        }
        if (!sum.parameters().isEmpty()) {
            b.section("Every series at a glance");
            b.table(overview(sum.parameters()));
            b.paragraph(capitalised(QaLotPhrases.CI_SOURCE) + ".");
        }
        for (LotStatistics.ParameterStatistics p : sum.parameters()) {
            series(b, p);
        }
        if (sum.parameters().isEmpty()) {
            b.paragraph("No measured values to summarise.");
        }
        return b.build();
    }

    /** Narrow enough for a phone: the unit rides with each number, the record with the serial. */
    private static HtmlTable failedTable(List<LotStatistics.FailedCheck> failed) {
        HtmlTable.Builder t = HtmlTable.builder(null, "Serial (record)", "Check", "Value", "Limit", "Margin",
                "Re-test");
        for (LotStatistics.FailedCheck f : failed) {
            Status retest = f.retestVerdict() == null ? Status.WARN : status(f.retestVerdict());
            String unit = " " + QaFormat.unit(f.parameter(), f.unit());
            t.row(status(f.verdict()), Cell.text(f.serial() + " (#" + f.recordId() + ")"),
                    Cell.status(status(f.verdict()), QaLotPhrases.title(f.parameter(), f.label())),
                    Cell.number(QaFormat.value(f.parameter(), f.value()) + unit), Cell.number(QaLotPhrases.limit(f)),
                    Cell.number(QaLotPhrases.signed(f.parameter(), f.margin()) + unit),
                    Cell.status(retest, QaLotPhrases.retest(f)));
        }
        return t.build();
    }

    /** One row per series: where it sits against its spec, its capability and how many points left the limits. */
    private static HtmlTable overview(List<LotStatistics.ParameterStatistics> all) {
        HtmlTable.Builder t = HtmlTable.builder(null, "Series", "n", "Mean", "Spec", "Outside spec",
                "Capability (95 % CI)", "Out of control");
        for (LotStatistics.ParameterStatistics p : all) {
            String name = p.parameter();
            String unit = " " + QaLotPhrases.unit(p);
            t.row(p.outOfSpec() > 0 ? Status.FAIL : null, Cell.text(QaLotPhrases.title(p)),
                    Cell.number(Integer.toString(p.n())),
                    Cell.number(p.constant() ? "all " + QaFormat.value(name, p.mean()) + unit
                            : QaFormat.value(name, p.mean()) + unit),
                    Cell.number(spec(name, p.lsl(), p.usl()) + unit),
                    p.outOfSpec() > 0 ? Cell.status(Status.FAIL, Integer.toString(p.outOfSpec()))
                            : Cell.number("0"),
                    Cell.text(p.constant() ? "no variation" : p.cpk().index() + " "
                            + QaLotPhrases.capabilityFigure(p.cpk(), false)),
                    Cell.number(p.constant() ? "\u2014" : Integer.toString(p.outOfControl().size())));
        }
        return t.build();
    }

    /** One series: its facts, then histogram, individuals and moving-range charts, or "no variation". */
    private static void series(HtmlReport.Builder b, LotStatistics.ParameterStatistics p) {
        String name = p.parameter();
        String unit = QaLotPhrases.unit(p);
        String what = QaLotPhrases.title(p);
        b.section(what + " (" + unit + ")");
        Map<String, String> facts = new LinkedHashMap<>();
        facts.put("n", Integer.toString(p.n()));
        facts.put("Spec", spec(name, p.lsl(), p.usl()) + " " + unit + (p.limitsVaried() ? " (latest spec)" : ""));
        facts.put("Outside spec", Integer.toString(p.outOfSpec()));
        if (p.constant()) {
            b.facts(facts);
            b.paragraph(capitalised(QaLotPhrases.noVariation(p)) + ": no chart, no control limits and no capability"
                    + " figure (a spread below a part in 10⁹ of the value counts as none).");
            return;
        }
        facts.put("Mean", QaFormat.value(name, p.mean()) + " " + unit);
        facts.put("s", QaFormat.value(name, p.stdDev()) + " " + unit);
        facts.put("Min \u2013 max", QaFormat.value(name, p.min()) + " \u2013 " + QaFormat.value(name, p.max()));
        facts.put(p.cpk().index() + " (95 % CI)", QaLotPhrases.capabilityFigure(p.cpk(), false));
        facts.put(p.ppk().index() + " (95 % CI)", QaLotPhrases.capabilityFigure(p.ppk(), false));
        facts.put("Cp / Pp", QaFormat.index(p.cp()) + " / " + QaFormat.index(p.pp()));
        b.facts(facts);
        double k = QaFormat.scale(name);
        histogram(b, p, what, unit, k);
        if (p.n() >= 2 && Double.isFinite(p.chart().upperX())) {
            individuals(b, p, what, unit, k);
            movingRange(b, p, what, unit, k);
        }
    }

    private static void histogram(HtmlReport.Builder b, LotStatistics.ParameterStatistics p, String what,
                                  String unit, double k) {
        List<Histogram.Bin> bins = p.histogram();
        if (bins.isEmpty()) {
            return;
        }
        String name = p.parameter();
        double[] edges = new double[bins.size() + 1];
        int[] inside = new int[bins.size()];
        int[] outside = new int[bins.size()];
        List<String> listed = new ArrayList<>();
        for (int i = 0; i < bins.size(); i++) {
            Histogram.Bin bin = bins.get(i);
            edges[i] = bin.lower() * k;
            edges[i + 1] = bin.upper() * k;
            inside[i] = bin.insideSpec();
            outside[i] = bin.outsideSpec();
            listed.add(QaFormat.value(name, bin.lower()) + " .. " + QaFormat.value(name, bin.upper()) + ": "
                    + bin.count());
        }
        HistogramChart.Builder h = HistogramChart.builder("", what + " (" + unit + ")", edges, inside, outside);
        if (!Double.isNaN(p.lsl())) {
            h.lowerLimit(p.lsl() * k, "LSL " + QaFormat.value(name, p.lsl()) + " " + unit);
        }
        if (!Double.isNaN(p.usl())) {
            h.upperLimit(p.usl() * k, "USL " + QaFormat.value(name, p.usl()) + " " + unit);
        }
        // The bins in words, exactly as the text report lists them: one rule for every rendering.
        h.describe("Histogram of " + what + ": " + p.n() + " values of " + what + " (" + unit + ") in " + bins.size()
                + (bins.size() == 1 ? " bin, " : " bins, ") + p.outOfSpec() + " outside the limits; bins "
                + String.join("; ", listed) + ".");
        b.figure(h.size(760, 280).build().toSvg(), "Histogram of " + sentence(what) + " with the spec limits (solid lines), "
                + bins.size() + " equal bins by Sturges' rule" + (p.histogramFromZero() ? ", from zero (the quantity"
                + " cannot be negative)" : "") + "; values outside the limits are counted in their own dark bars.");
    }

    private static void individuals(HtmlReport.Builder b, LotStatistics.ParameterStatistics p, String what,
                                    String unit, double k) {
        String name = p.parameter();
        double[] x = scaled(p.individuals(), k);
        List<LotStatistics.Point> pts = p.points();
        String[] serials = pts.stream().map(LotStatistics.Point::serial).toArray(String[]::new);
        boolean[] outX = new boolean[x.length];
        for (int i : p.chart().outsideX()) {
            outX[i] = true;
        }
        boolean[] failed = new boolean[x.length];
        String[] notes = new String[x.length];
        for (int i = 0; i < x.length; i++) {
            failed[i] = pts.get(i).verdict() == Verdict.FAIL;
            double v = pts.get(i).value();
            String side = !Double.isNaN(p.usl()) && v > p.usl() ? " > USL" : !Double.isNaN(p.lsl()) && v < p.lsl()
                    ? " < LSL" : " failed";
            notes[i] = serials[i] + " " + QaFormat.value(name, v) + side;
        }
        ControlChart.Builder cc = ControlChart.builder("", what + " (" + unit + ")", x, serials)
                .runs("motor serial, in order of its latest test", serials)
                .centre(p.chart().centre() * k, (p.chart().scale() == ValueScale.LOG ? "geometric mean " : "x\u0304 ")
                        + QaFormat.value(name, p.chart().centre()))
                .upperLimit(p.chart().upperX() * k, "UCL " + QaFormat.value(name, p.chart().upperX()))
                // A clipped limit lies on the axis floor, where a label would cover points: the caption names it.
                .lowerLimit(p.chart().lowerX() * k, p.chart().clippedAtZero() ? ""
                        : "LCL " + QaFormat.value(name, p.chart().lowerX()))
                .flagged(outX).failed(failed, notes);
        if (!Double.isNaN(p.lsl())) {
            cc.lowerSpec(p.lsl() * k, "LSL " + QaFormat.value(name, p.lsl()) + " " + unit);
        }
        if (!Double.isNaN(p.usl())) {
            cc.upperSpec(p.usl() * k, "USL " + QaFormat.value(name, p.usl()) + " " + unit);
        }
        if (p.chart().scale() == ValueScale.LOG) {
            cc.logScale();
        }
        String caption = "Individuals chart of " + sentence(what) + ", one point per motor in the order of its latest test."
                + " Solid lines: spec limits; dashed: control limits x\u0304 \u00B1 3\u00B7MR\u0304/d\u2082. A cross"
                + " marks a motor that failed the spec, a hollow diamond a point outside the control limits.";
        if (p.chart().clippedAtZero()) {
            caption += " The lower control limit is clipped at zero, the chart's floor (computed "
                    + QaFormat.value(name, p.chart().computedLowerX()) + " " + unit + "): the quantity cannot be"
                    + " negative.";
        }
        if (p.chart().scale() == ValueScale.LOG) {
            caption += " Log scale: " + QaLotPhrases.scaleNote(p) + ".";
        }
        cc.describe("Individuals chart of " + what + ": " + x.length + " values (" + unit + ") in run order, "
                + p.chart().outsideX().size() + " outside the control limits, " + p.outOfSpec() + " outside the spec.");
        b.figure(cc.build().toSvg(), caption);
    }

    private static void movingRange(HtmlReport.Builder b, LotStatistics.ParameterStatistics p, String what,
                                    String unit, double k) {
        boolean log = p.chart().scale() == ValueScale.LOG;
        double mk = log ? 1.0 : k;
        double[] mr = scaled(p.movingRanges(), mk);
        String[] serials = p.points().stream().map(LotStatistics.Point::serial).toArray(String[]::new);
        boolean[] outMr = new boolean[mr.length];
        for (int i : p.chart().outsideMr()) {
            outMr[i - 1] = true;
        }
        String mrUnit = QaLotPhrases.movingRangeUnit(p);
        b.figure(ControlChart.builder("", log ? "moving range of ln R" : "moving range (" + mrUnit + ")", mr,
                        java.util.Arrays.copyOfRange(serials, 1, serials.length)).firstIndex(2)
                        .runs("motor serial, in order of its latest test", serials)
                        .centre(p.chart().movingRangeMean() * mk, "MR\u0304 "
                                + QaLotPhrases.movingRange(p, p.chart().movingRangeMean()))
                        .upperLimit(p.chart().upperMr() * mk, "UCL " + QaLotPhrases.movingRange(p, p.chart().upperMr()))
                        .flagged(outMr).size(760, 230)
                        .describe("Moving-range chart of " + what + ": " + mr.length + " moving ranges ("
                                + mrUnit + ") in run order, " + p.chart().outsideMr().size() + " above the limit.")
                        .build().toSvg(),
                "Moving-range chart of " + sentence(what) + " (|x\u1D62 \u2212 x\u1D62\u208B\u2081|" + (log ? " of ln R" : "")
                        + ", each at the later motor of its pair); its lower limit is zero.");
    }

    /** A title inside a sentence: "phase resistance A". */
    private static String sentence(String title) {
        return title.isEmpty() ? title : Character.toLowerCase(title.charAt(0)) + title.substring(1);
    }

    private static String capitalised(String s) {
        return s.isEmpty() ? s : Character.toUpperCase(s.charAt(0)) + s.substring(1);
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

    /**
     * The checks of one motor: the verdict next to the check's name (so a phone shows both before the table scrolls),
     * the judged value with its unit, the limits and the signed margin inside the deciding limit.
     */
    private static HtmlTable checkTable(List<CheckResult> checks) {
        HtmlTable.Builder t = HtmlTable.builder(null, "Check", "Result", "Value", "Limits", "Margin");
        for (CheckResult c : checks) {
            String p = c.parameter();
            String unit = " " + QaFormat.unit(p, c.limit().unit());
            String limits = spec(p, c.limit().lower(), c.limit().upper());
            String margin = c.decidingLimit().isEmpty() ? "\u2014"
                    : QaLotPhrases.signed(p, c.margin()) + " (" + c.decidingLimit() + ")";
            t.row(c.verdict() == Verdict.PASS ? null : status(c.verdict()), Cell.text(name(c)),
                    Cell.status(status(c.verdict()), c.verdict().name().toLowerCase(Locale.ROOT)),
                    Cell.number(Double.isNaN(c.judged()) ? "\u2014" : QaFormat.value(p, c.judged()) + unit),
                    Cell.number(limits.trim() + unit), Cell.number(margin));
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
        return QaLotPhrases.parameterTitle(c.parameter()) + (c.label().isEmpty() ? "" : " " + c.label());
    }

    private static String recordText(StoredRecord r) {
        return "#" + r.id() + (r.retestOf() == null ? "" : " (re-test of #" + r.retestOf() + ")") + ", "
                + r.recordedAtUtc();
    }

    static Status status(Verdict v) {
        return switch (v) {
            case PASS -> Status.PASS;
            case FAIL -> Status.FAIL;
            case INCOMPLETE -> Status.WARN;
        };
    }
}
