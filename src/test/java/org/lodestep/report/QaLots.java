package org.lodestep.report;

import java.util.ArrayList;
import java.util.List;

import org.lodestep.qa.CheckResult;
import org.lodestep.qa.Limit;
import org.lodestep.qa.LotStatistics;
import org.lodestep.qa.Measurements;
import org.lodestep.qa.Parameters;
import org.lodestep.qa.StoredRecord;
import org.lodestep.qa.Submission;
import org.lodestep.qa.Verdict;

/**
 * A constructed lot of twelve invented motors (serials S01..S12): phase resistance A and B (S05's phase B at 2.30 Ω
 * above its 2.09 Ω maximum), phase imbalance with a maximum only, every step angle 1.8°, insulation of two pairs with
 * S07's b-frame at 62 MΩ, below its 100 MΩ minimum, re-tested at 1150 MΩ and passing.
 */
final class QaLots {
    static final Limit RESISTANCE = new Limit(Parameters.PHASE_RESISTANCE, "ohm", 1.9, 1.71, 2.09);
    static final Limit IMBALANCE = new Limit(Parameters.PHASE_IMBALANCE, "%", Double.NaN, Double.NaN, 5);
    static final Limit STEP = new Limit(Parameters.STEP_ANGLE, "deg", 1.8, 1.71, 1.89);
    static final Limit INSULATION = new Limit(Parameters.INSULATION_RESISTANCE, "ohm", Double.NaN, 100e6, Double.NaN);

    private static final double[] A = {1.91, 1.93, 1.89, 1.92, 1.90, 1.94, 1.88, 1.91, 1.95, 1.90, 1.92, 1.89};
    private static final double[] B = {1.93, 1.92, 1.90, 1.94, 2.30, 1.93, 1.91, 1.90, 1.96, 1.92, 1.91, 1.90};
    private static final double[] AF = {1336, 734, 1520, 1610, 1290, 1480, 1271, 1190, 1566, 1420, 1350, 1700};
    private static final double[] BF = {1386, 1581, 1245, 1320, 1289, 1402, 62, 1500, 1443, 1380, 1290, 1610};

    private QaLots() {
    }

    static LotStatistics.Summary lot() {
        List<StoredRecord> rs = new ArrayList<>();
        for (int i = 0; i < A.length; i++) {
            rs.add(record(i + 1, null, i, BF[i]));
        }
        rs.add(record(13, 7L, 6, 1150));
        return LotStatistics.of(rs);
    }

    private static StoredRecord record(long id, Long retestOf, int i, double bFrameMohm) {
        double imbalance = 100 * Math.abs(A[i] - B[i]) / ((A[i] + B[i]) / 2);
        List<CheckResult> cs = List.of(check(RESISTANCE, "A", A[i]), check(RESISTANCE, "B", B[i]),
                check(IMBALANCE, "", imbalance), check(STEP, "", 1.8), check(INSULATION, "a-frame", AF[i] * 1e6),
                check(INSULATION, "b-frame", bFrameMohm * 1e6));
        Verdict v = cs.stream().anyMatch(c -> c.verdict() == Verdict.FAIL) ? Verdict.FAIL : Verdict.PASS;
        String serial = String.format("S%02d", i + 1);
        Submission s = new Submission(serial, "L1", "KV-4218-M", "C", 3, "0".repeat(64), v, cs,
                new Measurements(List.of(), Double.NaN, List.of(), List.of(), Double.NaN, Double.NaN, List.of()),
                Double.NaN, "", "", "2026-07-01T08:00:00.000Z", "2026-07-01T08:00:00.000Z", "t");
        return new StoredRecord(id, retestOf, "2026-07-01T08:00:00.000Z", "1".repeat(64), true, s);
    }

    private static CheckResult check(Limit limit, String label, double value) {
        return new CheckResult(limit.parameter(), label, value, value, limit,
                limit.contains(value) ? Verdict.PASS : Verdict.FAIL, "");
    }
}
