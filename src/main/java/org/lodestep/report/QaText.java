package org.lodestep.report;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import org.lodestep.qa.CaptureRef;
import org.lodestep.qa.CheckResult;
import org.lodestep.qa.Histogram;
import org.lodestep.wiring.InsulationReading;
import org.lodestep.qa.LotStatistics;
import org.lodestep.qa.StoredRecord;
import org.lodestep.qa.Tally;
import org.lodestep.qa.Submission;
import org.lodestep.qa.Verdict;

/** Plain-text rendering of QA verdicts, lot reports and certificates. Computes nothing. */
public final class QaText {
    private QaText() {
    }

    /** The outcome of one {@code qa check}: verdict banner, every check, and where it was recorded. */
    public static String check(StoredRecord r, boolean created, String storeLocation) {
        Submission s = r.submission();
        StringBuilder b = new StringBuilder();
        String caption = "serial " + QaFormat.visible(s.serial()) + "  |  " + QaFormat.visible(s.partNumber())
                + " rev " + QaFormat.visible(s.partRevision()) + ", spec v" + s.specVersion();
        for (String line : QaBanner.lines(s.verdict(), caption)) {
            b.append(line).append('\n');
        }
        b.append(checkTable(s.checks()));
        if (created) {
            b.append(String.format(Locale.ROOT, "recorded as #%d%s in %s%n", r.id(),
                    r.retestOf() == null ? "" : " (re-test of #" + r.retestOf() + ")", storeLocation));
        } else {
            b.append(String.format(Locale.ROOT,
                    "already recorded as #%d (the same captures were submitted before); nothing new written%n", r.id()));
        }
        return b.toString();
    }

    /** One line per check: parameter, phase, measured, judged, limits, verdict and note. */
    static String checkTable(List<CheckResult> checks) {
        List<String[]> rows = new ArrayList<>();
        rows.add(new String[] {"check", "", "measured", "judged", "limits", "margin", "unit", "result"});
        for (CheckResult c : checks) {
            String p = c.parameter();
            String limits = (c.limit().hasLower() ? QaFormat.value(p, c.limit().lower()) : "")
                    + " .. " + (c.limit().hasUpper() ? QaFormat.value(p, c.limit().upper()) : "");
            String margin = c.decidingLimit().isEmpty() ? "-"
                    : QaLotPhrases.signed(p, c.margin()) + " " + c.decidingLimit();
            rows.add(new String[] {p.replace('_', ' '), QaFormat.visible(c.label()), QaFormat.value(p, c.measured()),
                    QaFormat.value(p, c.judged()), limits.trim(), margin, QaFormat.unit(p, c.limit().unit()),
                    c.verdict().name()});
        }
        StringBuilder b = new StringBuilder(table(rows));
        for (CheckResult c : checks) {
            if (!c.note().isEmpty()) {
                b.append("  ").append(c.parameter().replace('_', ' '));
                if (!c.label().isEmpty()) {
                    b.append(' ').append(QaFormat.visible(c.label()));
                }
                b.append(": ").append(c.note()).append('\n');
            }
        }
        return b.toString();
    }

    /**
     * Why a check did not pass, in one line: which check, the value judged against the limit it crossed, and by how
     * much ("phase resistance A: 2.31 ohm, above the upper limit 2.09 ohm by 0.22 ohm (10.5 %)"); for a value not
     * measured, the check's note.
     */
    public static String reason(CheckResult c) {
        String p = c.parameter();
        String what = p.replace('_', ' ') + (c.label().isEmpty() ? "" : " " + QaFormat.visible(c.label()));
        String unit = QaFormat.unit(p, c.limit().unit());
        if (Double.isNaN(c.judged())) {
            return what + ": not measured" + (c.note().isEmpty() ? "" : " (" + c.note() + ")");
        }
        if (Double.isInfinite(c.judged())) {
            return what + ": above the tester's range" + (c.note().isEmpty() ? "" : "; " + c.note());
        }
        double limit = c.limit().nearest(c.judged());
        double margin = c.limit().margin(c.judged());
        boolean upper = c.limit().hasUpper() && limit == c.limit().upper();
        String side = upper ? "upper" : "lower";
        String value = QaFormat.value(p, c.judged()) + " " + unit;
        String lim = QaFormat.value(p, limit) + " " + unit;
        // a share of a limit that is itself a percentage reads as nonsense ("5 % by 13 % (269 %)"): left out there
        String by = QaFormat.value(p, Math.abs(margin)) + " " + unit + (Double.isNaN(c.limit().marginFraction(
                c.judged())) || unit.equals("%") ? ""
                : " (" + QaFormat.pct(100 * Math.abs(c.limit().marginFraction(c.judged()))) + ")");
        String line = margin < 0
                ? what + ": " + value + ", " + (upper ? "above" : "below") + " the " + side + " limit " + lim + " by " + by
                : what + ": " + value + ", within the " + side + " limit " + lim + " by " + by;
        return line + (c.note().isEmpty() ? "" : "; " + c.note());
    }

    /** The running tally printed after each motor in lot mode. */
    public static String tally(Tally t) {
        return String.format(Locale.ROOT, "tally: %d tested, %d PASS, %d FAIL, %d INCOMPLETE", t.tested(), t.passed(),
                t.failed(), t.incomplete());
    }

    /**
     * The lot (or part, or date-range) report: the answer first (yield, failed and re-tested serials), the failed
     * checks with their margins, then each series (a parameter of one phase or pair).
     */
    public static String lotReport(String title, LotStatistics.Summary sum) {
        StringBuilder b = new StringBuilder();
        b.append(QaFormat.visible(title)).append('\n');
        LotStatistics.Counts c = sum.counts();
        b.append(QaLotPhrases.answer(sum)).append('\n');
        b.append(String.format(Locale.ROOT, "motors %d (records %d, re-tests %d): %d PASS, %d FAIL, %d INCOMPLETE%n",
                c.motors(), c.records(), c.retests(), c.passed(), c.failed(), c.incomplete()));
        if (c.notIntact() > 0) {
            b.append(String.format(Locale.ROOT, "WARNING: %d record(s) no longer match their SHA-256: the database "
                    + "was changed outside Lodestep; see qa certificate for each%n", c.notIntact()));
        }
        if (!sum.failedChecks().isEmpty()) {
            b.append("\nfailed and re-tested:\n").append(failedTable(sum.failedChecks()));
        }
        if (!sum.parameters().isEmpty()) {
            b.append("\nevery series at a glance:\n").append(overview(sum.parameters()));
            b.append(QaLotPhrases.CI_SOURCE).append('\n');
        }
        for (LotStatistics.ParameterStatistics p : sum.parameters()) {
            b.append('\n').append(parameter(p));
        }
        if (sum.parameters().isEmpty()) {
            b.append("no measured values to summarise\n");
        }
        return b.toString();
    }

    /** One row per check that did not pass: serial, record, check, value, limit, margin, re-test. */
    private static String failedTable(List<LotStatistics.FailedCheck> failed) {
        List<String[]> rows = new ArrayList<>();
        rows.add(new String[] {"serial", "record", "check", "verdict", "value", "limit", "margin", "unit", "re-test"});
        for (LotStatistics.FailedCheck f : failed) {
            rows.add(new String[] {QaFormat.visible(f.serial()), "#" + f.recordId(),
                    QaLotPhrases.title(f.parameter(), f.label()), f.verdict().name(),
                    QaFormat.value(f.parameter(), f.value()), QaLotPhrases.limit(f),
                    QaLotPhrases.signed(f.parameter(), f.margin()), QaFormat.unit(f.parameter(), f.unit()),
                    QaLotPhrases.retest(f)});
        }
        return table(rows);
    }

    /** One line per series: n, mean, spec, values outside it, capability and points out of control. */
    private static String overview(List<LotStatistics.ParameterStatistics> all) {
        List<String[]> rows = new ArrayList<>();
        rows.add(new String[] {"series", "n", "mean", "spec", "unit", "outside spec", "capability (95 % CI)",
                "out of control"});
        for (LotStatistics.ParameterStatistics p : all) {
            String name = p.parameter();
            rows.add(new String[] {QaLotPhrases.title(p), Integer.toString(p.n()),
                    (p.constant() ? "all " : "") + QaFormat.value(name, p.mean()),
                    QaLotPhrases.spec(name, p.lsl(), p.usl()), QaLotPhrases.unit(p), Integer.toString(p.outOfSpec()),
                    p.constant() ? "no variation" : p.cpk().index() + " "
                            + QaLotPhrases.capabilityFigure(p.cpk(), false),
                    p.constant() ? "-" : Integer.toString(p.outOfControl().size())});
        }
        return table(rows);
    }

    private static String parameter(LotStatistics.ParameterStatistics p) {
        String name = p.parameter();
        String unit = QaLotPhrases.unit(p);
        StringBuilder b = new StringBuilder();
        String specLine = String.format(Locale.ROOT, "  spec %s %s%s, outside spec: %d%n",
                QaLotPhrases.spec(name, p.lsl(), p.usl()), unit,
                p.limitsVaried() ? " (limits of the latest spec version; earlier records used others)" : "",
                p.outOfSpec());
        if (p.constant()) {
            b.append(String.format(Locale.ROOT, "%s [%s]  n=%d: %s%n", QaLotPhrases.title(p), unit, p.n(),
                    QaLotPhrases.noVariation(p)));
            b.append(specLine);
            return b.toString();
        }
        b.append(String.format(Locale.ROOT, "%s [%s]  n=%d  mean %s  s %s  min %s  max %s%n", QaLotPhrases.title(p),
                unit, p.n(), QaFormat.value(name, p.mean()), QaFormat.value(name, p.stdDev()),
                QaFormat.value(name, p.min()), QaFormat.value(name, p.max())));
        b.append(specLine);
        b.append(String.format(Locale.ROOT, "  %s;  Cp %s%n", QaLotPhrases.capability(p.cpk()), QaFormat.index(p.cp())));
        b.append(String.format(Locale.ROOT, "  %s;  Pp %s%n", QaLotPhrases.capability(p.ppk()),
                QaFormat.index(p.pp())));
        if (Double.isFinite(p.chart().upperX())) {
            b.append(String.format(Locale.ROOT, "  I chart: centre %s, LCL %s, UCL %s;  MR chart %s: MRbar %s, UCL %s%n",
                    QaFormat.value(name, p.chart().centre()), QaLotPhrases.lowerControlLimit(p),
                    QaFormat.value(name, p.chart().upperX()), "(" + QaLotPhrases.movingRangeUnit(p) + ")",
                    QaLotPhrases.movingRange(p, p.chart().movingRangeMean()),
                    QaLotPhrases.movingRange(p, p.chart().upperMr())));
            if (!QaLotPhrases.scaleNote(p).isEmpty()) {
                b.append("  ").append(QaLotPhrases.scaleNote(p)).append('\n');
            }
        }
        if (p.outOfControl().isEmpty()) {
            b.append("  no point outside the control limits\n");
        } else {
            for (LotStatistics.OutOfControl o : p.outOfControl()) {
                boolean mr = o.chart().equals("MR");
                b.append(String.format(Locale.ROOT, "  outside %s-chart limits: motor %d, serial %s, %s %s%n",
                        o.chart(), o.index() + 1, QaFormat.visible(o.serial()),
                        mr ? QaLotPhrases.movingRange(p, o.value()) : QaFormat.value(name, o.value()),
                        mr ? QaLotPhrases.movingRangeUnit(p) : unit));
            }
        }
        b.append(histogram(name, p.histogram(), p.lsl(), p.usl()));
        return b.toString();
    }

    /** Bars of '#', one per value (scaled down past 50), with the spec limits marked. */
    static String histogram(String parameter, List<Histogram.Bin> bins, double lsl, double usl) {
        int max = bins.stream().mapToInt(Histogram.Bin::count).max().orElse(0);
        double per = max > 50 ? max / 50.0 : 1.0;
        StringBuilder b = new StringBuilder();
        for (Histogram.Bin bin : bins) {
            String mark = "";
            if (!Double.isNaN(lsl) && lsl >= bin.lower() && lsl < bin.upper()) {
                mark += " <LSL";
            }
            if (!Double.isNaN(usl) && usl > bin.lower() && usl <= bin.upper()) {
                mark += " <USL";
            }
            b.append(String.format(Locale.ROOT, "  %10s .. %-10s |%-4d %s%s%n", QaFormat.value(parameter, bin.lower()),
                    QaFormat.value(parameter, bin.upper()), bin.count(), "#".repeat((int) Math.round(bin.count() / per)),
                    mark));
        }
        return b.toString();
    }

    /** The per-motor test certificate: the latest record in full, earlier records listed. */
    public static String certificate(List<StoredRecord> history) {
        StoredRecord r = history.get(history.size() - 1);
        Submission s = r.submission();
        StringBuilder b = new StringBuilder();
        b.append("INCOMING INSPECTION CERTIFICATE\n");
        b.append("===============================\n");
        row(b, "serial number", QaFormat.visible(s.serial()));
        row(b, "part", QaFormat.visible(s.partNumber()) + " rev " + QaFormat.visible(s.partRevision()));
        row(b, "spec", "version " + s.specVersion() + ", SHA-256 " + s.specSha256());
        row(b, "lot", QaFormat.visible(s.lot()));
        row(b, "result", s.verdict().name());
        row(b, "tested", s.startedAtUtc() + " to " + s.finishedAtUtc() + " (UTC)");
        row(b, "operator", QaFormat.visible(s.operator()));
        row(b, "station", QaFormat.visible(s.station()));
        row(b, "ambient", Double.isNaN(s.ambientC()) ? "not given" : QaFormat.num(s.ambientC()) + " °C");
        row(b, "winding temperature", Double.isNaN(s.measurements().windingTemperatureC()) ? "not given"
                : QaFormat.num(s.measurements().windingTemperatureC()) + " °C");
        row(b, "tool", "lodestep " + QaFormat.visible(s.toolVersion()));
        row(b, "record", "#" + r.id() + (r.retestOf() == null ? "" : ", re-test of #" + r.retestOf())
                + ", recorded " + r.recordedAtUtc());
        row(b, "record SHA-256", r.bodySha256() + (r.intact() ? " (verified)"
                : " (DOES NOT MATCH: changed outside Lodestep)"));
        b.append('\n').append(checkTable(s.checks()));
        if (!s.measurements().insulation().isEmpty()) {
            b.append("insulation readings:");
            for (InsulationReading i : s.measurements().insulation()) {
                b.append(String.format(Locale.ROOT, "  %s %s M\u03A9 at %s V DC;", QaFormat.visible(i.label()),
                        QaFormat.num(i.resistanceOhm() / 1e6), QaFormat.num(i.testVoltageV())));
            }
            b.append('\n');
        }
        if (!s.measurements().captures().isEmpty()) {
            b.append("\nraw captures (SHA-256):\n");
            for (CaptureRef c : s.measurements().captures()) {
                b.append("  ").append(c.sha256()).append("  ").append(QaFormat.visible(c.kind())).append("  ")
                        .append(QaFormat.visible(c.name())).append('\n');
            }
        }
        if (history.size() > 1) {
            b.append("\nearlier records of this motor:\n");
            for (StoredRecord e : history.subList(0, history.size() - 1)) {
                b.append(String.format(Locale.ROOT, "  #%d  %s  %-10s  %s, spec v%d%s%n", e.id(),
                        e.submission().startedAtUtc(), e.submission().verdict(),
                        QaFormat.visible(e.submission().station()), e.submission().specVersion(),
                        e.intact() ? "" : "  (NOT INTACT)"));
            }
        }
        return b.toString();
    }

    private static void row(StringBuilder b, String key, String value) {
        b.append(String.format(Locale.ROOT, "%-20s %s%n", key, value));
    }

    private static String table(List<String[]> rows) {
        int[] w = new int[rows.get(0).length];
        for (String[] r : rows) {
            for (int i = 0; i < r.length; i++) {
                w[i] = Math.max(w[i], r[i].length());
            }
        }
        StringBuilder b = new StringBuilder();
        for (String[] r : rows) {
            StringBuilder line = new StringBuilder(" ");
            for (int i = 0; i < r.length; i++) {
                line.append(' ').append(r[i]).append(" ".repeat(w[i] - r[i].length())).append(' ');
            }
            b.append(line.toString().stripTrailing()).append('\n');
        }
        return b.toString();
    }

    /** The title of a lot report naming its selection (lot, part, date range), "all records" when there is none. */
    public static String selectionTitle(String lot, String part, String from, String to) {
        StringBuilder b = new StringBuilder("QA report");
        if (lot != null) {
            b.append(", lot ").append(lot);
        }
        if (part != null) {
            b.append(", part ").append(part);
        }
        if (from != null) {
            b.append(", from ").append(from);
        }
        if (to != null) {
            b.append(", to ").append(to);
        }
        if (lot == null && part == null && from == null && to == null) {
            b.append(", all records");
        }
        return b.toString();
    }
}
