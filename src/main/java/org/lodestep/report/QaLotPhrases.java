package org.lodestep.report;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

import org.lodestep.qa.Capability;
import org.lodestep.qa.LotStatistics;
import org.lodestep.qa.Parameters;
import org.lodestep.qa.ValueScale;
import org.lodestep.qa.Verdict;

/**
 * The words of the lot report that text and HTML share: series titles, the no-variation line, capability with its
 * interval, the clipped lower limit, margins and re-test outcomes. Formats what {@code qa.LotStatistics} computed.
 */
final class QaLotPhrases {
    /** Where the interval comes from, named once for every report. */
    static final String CI_SOURCE = "capability indices with their 95 % interval (Bissell's normal approximation,"
            + " Applied Statistics 39, 1990); no figure below 10 motors";

    private QaLotPhrases() {
    }

    /** The parameter in words: "Phase resistance". */
    static String parameterTitle(String parameter) {
        return switch (parameter) {
            case Parameters.PHASE_RESISTANCE -> "Phase resistance";
            case Parameters.PHASE_IMBALANCE -> "Phase imbalance";
            case Parameters.PHASE_INDUCTANCE -> "Phase inductance";
            case Parameters.INSULATION_RESISTANCE -> "Insulation resistance";
            case Parameters.BACK_EMF_CONSTANT -> "Back-EMF constant";
            case Parameters.STEP_ANGLE -> "Step angle";
            default -> parameter.replace('_', ' ');
        };
    }

    /** The parameter and its phase or pair: "Phase resistance A", "Insulation resistance a-frame". */
    static String title(String parameter, String label) {
        return label.isEmpty() ? parameterTitle(parameter) : parameterTitle(parameter) + " " + QaFormat.visible(label);
    }

    static String title(LotStatistics.ParameterStatistics p) {
        return title(p.parameter(), p.label());
    }

    static String unit(LotStatistics.ParameterStatistics p) {
        return QaFormat.unit(p.parameter(), p.unit());
    }

    /** "no variation (all 12 values = 1.8 deg)". */
    static String noVariation(LotStatistics.ParameterStatistics p) {
        return "no variation (all " + p.n() + " values = " + QaFormat.value(p.parameter(), p.mean()) + " " + unit(p)
                + ")";
    }

    /** "Cpu 0.19 (0.05 to 0.33), n = 12", or why there is none. */
    static String capability(Capability c) {
        return c.index() + (c.refusal() != null ? ": " : " ") + capabilityFigure(c, true);
    }

    /**
     * The figure without its name: "0.19 (0.05 to 0.33), n = 12" ({@code withN}; else without the n shown beside it),
     * the refusal, or "-" when undefined.
     */
    static String capabilityFigure(Capability c, boolean withN) {
        if (c.refusal() != null) {
            return c.refusal();
        }
        if (!c.known()) {
            return "-";
        }
        return QaFormat.index(c.value()) + " (" + QaFormat.index(c.lower()) + " to " + QaFormat.index(c.upper())
                + ")" + (withN ? ", n = " + c.n() : "");
    }

    /** The lower control limit, with the clip stated: "0 (computed −9.43, clipped at zero)". */
    static String lowerControlLimit(LotStatistics.ParameterStatistics p) {
        String v = QaFormat.value(p.parameter(), p.chart().lowerX());
        return p.chart().clippedAtZero() ? v + " (computed " + QaFormat.value(p.parameter(), p.chart().computedLowerX())
                + ", clipped at zero: the quantity cannot be negative)" : v;
    }

    /** What the chart's scale means for the reader, or "" on the plain linear scale. */
    static String scaleNote(LotStatistics.ParameterStatistics p) {
        return p.chart().scale() == ValueScale.LOG ? "limits and capability computed on ln R and transformed back"
                + " (centre line = geometric mean), moving ranges of ln R" : "";
    }

    /** A moving-range figure: on the log scale a number on ln x (no unit), else in the parameter's display unit. */
    static String movingRange(LotStatistics.ParameterStatistics p, double v) {
        return p.chart().scale() == ValueScale.LOG ? QaFormat.num(v) : QaFormat.value(p.parameter(), v);
    }

    /** The unit of moving ranges: "of ln R" (a pure number) on the log scale. */
    static String movingRangeUnit(LotStatistics.ParameterStatistics p) {
        return p.chart().scale() == ValueScale.LOG ? "of ln R" : unit(p);
    }

    /** A spec window: "1.71 .. 2.09", "<= 5", ">= 100". */
    static String spec(String parameter, double lsl, double usl) {
        if (Double.isNaN(lsl)) {
            return "<= " + QaFormat.value(parameter, usl);
        }
        if (Double.isNaN(usl)) {
            return ">= " + QaFormat.value(parameter, lsl);
        }
        return QaFormat.value(parameter, lsl) + " .. " + QaFormat.value(parameter, usl);
    }

    /** A value with its sign always written ("+0.12", "−0.19"), in the parameter's display unit. */
    static String signed(String parameter, double si) {
        if (Double.isNaN(si)) {
            return "-";
        }
        String s = QaFormat.value(parameter, Math.abs(si));
        return (si < 0 ? "\u2212" : "+") + s;
    }

    /** The limit a failed value is outside: "USL 2.09", or "-" when the check was not judged. */
    static String limit(LotStatistics.FailedCheck f) {
        return f.limitName().isEmpty() ? "-" : f.limitName() + " " + QaFormat.value(f.parameter(), f.limit());
    }

    /** "#13: PASS" or "not re-tested". */
    static String retest(LotStatistics.FailedCheck f) {
        return f.retestRecordId() == null ? "not re-tested" : "#" + f.retestRecordId() + ": " + f.retestVerdict();
    }

    /**
     * The lot's answer in one line: yield, the failed serials and the re-tested ones with their outcome.
     */
    static String answer(LotStatistics.Summary sum) {
        LotStatistics.Counts c = sum.counts();
        StringBuilder b = new StringBuilder(String.format(Locale.ROOT, "final yield %s (%d of %d motors pass),"
                + " first-pass yield %s", QaFormat.pct(c.finalYieldPct()), c.passed(), c.motors(),
                QaFormat.pct(c.firstPassYieldPct())));
        List<String> failed = sum.failedSerials();
        b.append("; failed: ").append(failed.isEmpty() ? "none" : QaFormat.visible(String.join(", ", failed)));
        Map<String, Verdict> retested = new LinkedHashMap<>();
        for (LotStatistics.FailedCheck f : sum.failedChecks()) {
            if (f.retestVerdict() != null) {
                retested.put(f.serial(), f.retestVerdict()); // a later re-test of the same motor overrides
            }
        }
        if (!retested.isEmpty()) {
            b.append("; re-tested: ");
            b.append(String.join(", ", retested.entrySet().stream()
                    .map(e -> QaFormat.visible(e.getKey()) + " " + e.getValue()).toList()));
        }
        int incomplete = c.incomplete();
        if (incomplete > 0) {
            b.append("; ").append(incomplete).append(" incomplete");
        }
        return b.toString();
    }
}
