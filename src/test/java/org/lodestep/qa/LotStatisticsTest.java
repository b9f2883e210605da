package org.lodestep.qa;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;

import java.util.ArrayList;
import java.util.List;

import org.junit.jupiter.api.Test;

class LotStatisticsTest {

    private static StoredRecord record(long id, Long retestOf, String serial, double value, Verdict verdict) {
        Limit limit = new Limit(Parameters.PHASE_RESISTANCE, "ohm", 2.0, 1.80, 2.20);
        CheckResult c = new CheckResult(Parameters.PHASE_RESISTANCE, "A", value, value, limit, verdict, "");
        Submission s = new Submission(serial, "L1", "KV-4218-M", "B", 2, Fixtures.sha("spec"), verdict, List.of(c),
                Measurements.none(), Double.NaN, "", "", "2026-07-01T08:00:00.000Z", "2026-07-01T08:00:00.000Z", "t");
        return new StoredRecord(id, retestOf, "2026-07-01T08:00:00.000Z", Fixtures.sha("b" + id), true, s);
    }

    // Item 20 data as ten motors' phase-A resistance against LSL 1.80 / USL 2.20 (Montgomery, Statistical Quality
    // Control, 7th ed., ch. 8, references §19):
    // sigma within = MRbar/1.128 = 0.038416 -> Cp 1.7354, Cpk 1.6052; s = 0.030277 -> Pp 2.2019, Ppk 2.0368
    // (rel 1e-3: the source uses table d2 = 1.128, the code the exact 2/sqrt(pi)).
    @Test
    void capabilityOfWorkedExampleLot() {
        List<StoredRecord> rs = new ArrayList<>();
        for (int i = 0; i < IndividualsChartTest.X.length; i++) {
            rs.add(record(i + 1, null, "S" + i, IndividualsChartTest.X[i], Verdict.PASS));
        }
        LotStatistics.Summary sum = LotStatistics.of(rs);
        LotStatistics.ParameterStatistics p = sum.parameters().get(0);
        assertEquals(10, p.n());
        assertEquals(2.015, p.mean(), 1e-12);
        assertEquals(0.030277, p.stdDev(), 0.030277 * 1e-4);
        assertEquals(1.97, p.min(), 0);
        assertEquals(2.06, p.max(), 0);
        assertEquals(1.7354, p.cp(), 1.7354 * 1e-3);
        assertEquals(1.6052, p.cpk().value(), 1.6052 * 1e-3);
        assertEquals(2.2019, p.pp(), 2.2019 * 1e-4);
        assertEquals(2.0368, p.ppk().value(), 2.0368 * 1e-4);
        assertEquals(0, p.outOfSpec());
        assertEquals(10, p.histogram().stream().mapToInt(Histogram.Bin::count).sum());
        assertFalse(p.limitsVaried());
    }

    @Test
    void retestReplacesTheMotorsValueAndCountsBothYields() {
        List<StoredRecord> rs = List.of(
                record(1, null, "S1", 2.30, Verdict.FAIL),
                record(2, null, "S2", 2.00, Verdict.PASS),
                record(3, null, "S3", 2.25, Verdict.FAIL),
                record(4, 1L, "S1", 2.05, Verdict.PASS));
        LotStatistics.Summary sum = LotStatistics.of(rs);
        LotStatistics.Counts c = sum.counts();
        assertEquals(4, c.records());
        assertEquals(3, c.motors());
        assertEquals(1, c.retests());
        assertEquals(2, c.passed());
        assertEquals(1, c.failed());
        assertEquals(100.0 / 3, c.firstPassYieldPct(), 1e-9);
        assertEquals(200.0 / 3, c.finalYieldPct(), 1e-9);
        assertEquals(1, sum.notPassed().size());
        assertEquals("S3", sum.notPassed().get(0).serial());
        assertEquals(List.of("phase_resistance A"), sum.notPassed().get(0).checks());
        LotStatistics.ParameterStatistics p = sum.parameters().get(0);
        assertEquals(3, p.n());
        assertEquals(1, p.outOfSpec());
        assertEquals((2.00 + 2.25 + 2.05) / 3, p.mean(), 1e-12);
        // The series every chart draws: the latest record of each motor, in the order of those latest tests.
        assertEquals(List.of("S2", "S3", "S1"), p.points().stream().map(LotStatistics.Point::serial).toList());
        assertEquals(List.of(2.00, 2.25, 2.05), p.points().stream().map(LotStatistics.Point::value).toList());
        // Montgomery, Introduction to Statistical Quality Control, 7th ed., section 6.4: MR_i = |x_i - x_(i-1)|
        double[] mr = p.movingRanges();
        assertEquals(2, mr.length);
        assertEquals(0.25, mr[0], 1e-12);
        assertEquals(0.20, mr[1], 1e-12);
        assertEquals((0.25 + 0.20) / 2, p.chart().movingRangeMean(), 1e-12);
        // one value outside the spec (2.25 > 2.20), counted in its bin
        assertEquals(1, p.histogram().stream().mapToInt(Histogram.Bin::outsideSpec).sum());
    }
}
