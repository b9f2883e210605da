package org.lodestep.qa;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;

import org.apache.commons.math3.distribution.NormalDistribution;
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
        // Bissell, Applied Statistics 39 (1990), normal approximation (references §26), z from Commons Math's normal
        // quantile: Cpk ± z·sqrt(1/(9n) + Cpk²/(2(n − 1))) with n = 10.
        double z = new NormalDistribution().inverseCumulativeProbability(0.975);
        double h = z * Math.sqrt(1.0 / 90 + p.cpk().value() * p.cpk().value() / 18);
        assertEquals("Cpk", p.cpk().index());
        assertEquals(p.cpk().value() - h, p.cpk().lower(), 1e-9);
        assertEquals(p.cpk().value() + h, p.cpk().upper(), 1e-9);
        assertEquals(10, p.cpk().n());
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

    /** A record of one motor with the given checks (each a parameter, label, judged value, limit). */
    private static StoredRecord motor(long id, Long retestOf, String serial, CheckResult... checks) {
        Verdict v = Verdict.overall(java.util.Arrays.stream(checks).map(CheckResult::verdict).toList());
        Submission s = new Submission(serial, "L1", "KV-4218-M", "B", 2, Fixtures.sha("spec"), v, List.of(checks),
                Measurements.none(), Double.NaN, "", "", "2026-07-01T08:00:00.000Z", "2026-07-01T08:00:00.000Z", "t");
        return new StoredRecord(id, retestOf, "2026-07-01T08:00:00.000Z", Fixtures.sha("b" + id), true, s);
    }

    private static CheckResult check(Limit limit, String label, double value) {
        return new CheckResult(limit.parameter(), label, value, value, limit,
                limit.contains(value) ? Verdict.PASS : Verdict.FAIL, "");
    }

    private static final Limit STEP = new Limit(Parameters.STEP_ANGLE, "deg", 1.8, 1.71, 1.89);
    private static final Limit RESISTANCE = new Limit(Parameters.PHASE_RESISTANCE, "ohm", 1.9, 1.71, 2.09);
    private static final Limit IMBALANCE = new Limit(Parameters.PHASE_IMBALANCE, "%", Double.NaN, Double.NaN, 5);
    private static final Limit INSULATION = new Limit(Parameters.INSULATION_RESISTANCE, "ohm", Double.NaN, 100e6,
            Double.NaN);

    private static LotStatistics.ParameterStatistics series(LotStatistics.Summary sum, String parameter, String label) {
        return sum.parameters().stream().filter(p -> p.parameter().equals(parameter) && p.label().equals(label))
                .findFirst().orElseThrow();
    }

    // Every step angle 1.8°, one of them two rounding steps above (1.8000000000000007, as a computed angle may be):
    // no variation, so no limits and no capability figure (common practice: a chart of a constant says nothing).
    @Test
    void constantSeriesIsFlaggedAndHasNoLimitsOrCapability() {
        List<StoredRecord> rs = new ArrayList<>();
        for (int i = 0; i < 12; i++) {
            rs.add(motor(i + 1, null, "S" + i, check(STEP, "", i == 5 ? Math.nextUp(Math.nextUp(1.8)) : 1.8)));
        }
        LotStatistics.ParameterStatistics p = series(LotStatistics.of(rs), Parameters.STEP_ANGLE, "");
        assertTrue(p.constant());
        assertEquals(12, p.n());
        assertTrue(Double.isNaN(p.chart().upperX()) && Double.isNaN(p.chart().lowerX())
                && Double.isNaN(p.chart().upperMr()));
        assertTrue(p.outOfControl().isEmpty());
        assertFalse(p.cpk().known());
        assertNull(p.cpk().refusal());
        assertEquals(1, p.histogram().size());
        assertEquals(12, p.histogram().get(0).count());
        // a single motor is not "no variation", and a real spread of 0.01° is not constant either
        assertFalse(series(LotStatistics.of(rs.subList(0, 1)), Parameters.STEP_ANGLE, "").constant());
        rs.set(3, motor(4, null, "S3", check(STEP, "", 1.81)));
        assertFalse(series(LotStatistics.of(rs), Parameters.STEP_ANGLE, "").constant());
    }

    // Phase A and B are separate series, each with its own moving ranges (Montgomery 7th ed., section 6.4:
    // MR_i = |x_i − x_(i−1)| within one series; references §20): A = 1.90, 1.95, 1.92 -> MR 0.05, 0.03;
    // B = 2.00, 1.96, 2.01 -> MR 0.04, 0.05.
    @Test
    void phasesAreSeparateSeriesWithTheirOwnMovingRanges() {
        double[][] ab = {{1.90, 2.00}, {1.95, 1.96}, {1.92, 2.01}};
        List<StoredRecord> rs = new ArrayList<>();
        for (int i = 0; i < ab.length; i++) {
            rs.add(motor(i + 1, null, "S" + i, check(RESISTANCE, "A", ab[i][0]), check(RESISTANCE, "B", ab[i][1])));
        }
        LotStatistics.Summary sum = LotStatistics.of(rs);
        assertEquals(2, sum.parameters().size());
        LotStatistics.ParameterStatistics a = series(sum, Parameters.PHASE_RESISTANCE, "A");
        LotStatistics.ParameterStatistics b = series(sum, Parameters.PHASE_RESISTANCE, "B");
        assertEquals(3, a.n());
        assertEquals(0.05, a.movingRanges()[0], 1e-12);
        assertEquals(0.03, a.movingRanges()[1], 1e-12);
        assertEquals(0.04, b.movingRanges()[0], 1e-12);
        assertEquals(0.05, b.movingRanges()[1], 1e-12);
        assertEquals((1.90 + 1.95 + 1.92) / 3, a.mean(), 1e-12);
        // below ten motors no capability figure, and the refusal says so
        assertFalse(a.cpk().known());
        assertTrue(a.cpk().refusal().contains("too few motors"), a.cpk().refusal());
        assertTrue(Double.isNaN(a.cp()));
    }

    // Phase imbalance of the sample lot (twelve motors, a maximum of 5 % only). Independent computation with the
    // table constant d2 = 1.128 (Montgomery 7th ed., Appendix VI; references §20): the computed lower limit
    // x̄ − 3·MR̄/d2 is negative, so it is clipped at zero (references §25); the one-sided index is
    // Cpu = (USL − x̄)/(3·MR̄/d2) (references §19); the histogram starts at zero.
    @Test
    void oneSidedNonNegativeQuantityHasItsLowerLimitClippedAtZero() {
        double[] x = {1.034, 0.880, 0.262, 0.356, 18.977, 1.600, 0.510, 0.700, 6.281, 0.500, 0.300, 0.585};
        List<StoredRecord> rs = new ArrayList<>();
        for (int i = 0; i < x.length; i++) {
            rs.add(motor(i + 1, null, "S" + i, check(IMBALANCE, "", x[i])));
        }
        LotStatistics.ParameterStatistics p = series(LotStatistics.of(rs), Parameters.PHASE_IMBALANCE, "");
        double mean = java.util.Arrays.stream(x).average().orElseThrow();
        double mr = 0;
        for (int i = 1; i < x.length; i++) {
            mr += Math.abs(x[i] - x[i - 1]) / (x.length - 1);
        }
        double sigma = mr / 1.128;
        assertTrue(mean - 3 * sigma < 0);
        assertTrue(p.chart().clippedAtZero());
        assertEquals(0.0, p.chart().lowerX());
        assertEquals(mean - 3 * sigma, p.chart().computedLowerX(), Math.abs(mean - 3 * sigma) * 1e-3);
        assertEquals(mean + 3 * sigma, p.chart().upperX(), (mean + 3 * sigma) * 1e-3);
        assertEquals("Cpu", p.cpk().index());
        assertEquals((5 - mean) / (3 * sigma), p.cpk().value(), 1e-3);
        assertTrue(Double.isNaN(p.cp()));
        assertTrue(p.histogramFromZero());
        assertEquals(0.0, p.histogram().get(0).lower());
        assertEquals(2, p.outOfSpec());
        // the phase resistance, with both limits, is not clipped (its LCL is far above zero)
        assertFalse(p.chart().scale() == ValueScale.LOG);
    }

    // Insulation resistance: limits on ln R (Montgomery 7th ed., section 6.4 on transforming non-normal individuals;
    // references §25), computed independently here with d2 = 1.128 (table): centre exp(mean ln R), limits
    // exp(mean ± 3·MR̄/d2) of ln R, and the one-sided Cpl = (mean ln R − ln LSL)/(3·MR̄/d2).
    @Test
    void insulationLimitsAndCapabilityAreComputedOnLnR() {
        double[] mohm = {1074, 1910, 1390, 1860, 1640, 1550, 1472, 1800, 1639, 1310, 1185, 1710};
        List<StoredRecord> rs = new ArrayList<>();
        for (int i = 0; i < mohm.length; i++) {
            rs.add(motor(i + 1, null, "S" + i, check(INSULATION, "a-b", mohm[i] * 1e6)));
        }
        LotStatistics.ParameterStatistics p = series(LotStatistics.of(rs), Parameters.INSULATION_RESISTANCE, "a-b");
        assertEquals(ValueScale.LOG, p.chart().scale());
        double[] y = java.util.Arrays.stream(mohm).map(v -> Math.log(v * 1e6)).toArray();
        double mean = java.util.Arrays.stream(y).average().orElseThrow();
        double mr = 0;
        for (int i = 1; i < y.length; i++) {
            mr += Math.abs(y[i] - y[i - 1]) / (y.length - 1);
        }
        double sigma = mr / 1.128;
        assertEquals(Math.exp(mean), p.chart().centre(), Math.exp(mean) * 1e-9);
        assertEquals(Math.exp(mean + 3 * sigma), p.chart().upperX(), Math.exp(mean + 3 * sigma) * 1e-3);
        assertEquals(Math.exp(mean - 3 * sigma), p.chart().lowerX(), Math.exp(mean - 3 * sigma) * 1e-3);
        assertFalse(p.chart().clippedAtZero());
        assertEquals(mr, p.chart().movingRangeMean(), 1e-12);
        assertEquals("Cpl", p.cpk().index());
        assertEquals((mean - Math.log(100e6)) / (3 * sigma), p.cpk().value(), p.cpk().value() * 1e-3);
        // a dead short has no logarithm: that series falls back to the linear, clipped chart
        rs.set(0, motor(1, null, "S0", check(INSULATION, "a-b", 0.0)));
        assertEquals(ValueScale.LINEAR, series(LotStatistics.of(rs), Parameters.INSULATION_RESISTANCE, "a-b")
                .chart().scale());
    }

    // A failure is listed with its value, the limit it broke and the signed margin (value − LSL, USL − value;
    // negative outside), and with the record that re-tested it and that record's verdict.
    @Test
    void failedChecksCarryValueLimitMarginAndRetestOutcome() {
        List<StoredRecord> rs = List.of(
                motor(1, null, "S1", check(RESISTANCE, "A", 1.90), check(RESISTANCE, "B", 2.30)),
                motor(2, null, "S2", check(RESISTANCE, "A", 1.65), check(RESISTANCE, "B", 1.90)),
                motor(3, null, "S3", check(RESISTANCE, "A", 1.90), check(RESISTANCE, "B", 1.91)),
                motor(4, 1L, "S1", check(RESISTANCE, "A", 1.90), check(RESISTANCE, "B", 2.05)));
        LotStatistics.Summary sum = LotStatistics.of(rs);
        assertEquals(2, sum.failedChecks().size());
        LotStatistics.FailedCheck high = sum.failedChecks().get(0);
        assertEquals("S1", high.serial());
        assertEquals(1, high.recordId());
        assertEquals("B", high.label());
        assertEquals(2.30, high.value(), 0);
        assertEquals("USL", high.limitName());
        assertEquals(2.09, high.limit(), 0);
        assertEquals(2.09 - 2.30, high.margin(), 1e-12);
        assertEquals(4L, high.retestRecordId());
        assertEquals(Verdict.PASS, high.retestVerdict());
        LotStatistics.FailedCheck low = sum.failedChecks().get(1);
        assertEquals("LSL", low.limitName());
        assertEquals(1.65 - 1.71, low.margin(), 1e-12);
        assertNull(low.retestRecordId());
        assertEquals(List.of("S2"), sum.failedSerials());
        // the re-tested motor's chart point is its latest value and verdict
        LotStatistics.ParameterStatistics b = series(sum, Parameters.PHASE_RESISTANCE, "B");
        assertEquals(List.of("S2", "S3", "S1"), b.points().stream().map(LotStatistics.Point::serial).toList());
        assertEquals(Verdict.PASS, b.points().get(2).verdict());
        LotStatistics.ParameterStatistics a = series(sum, Parameters.PHASE_RESISTANCE, "A");
        assertEquals(Verdict.FAIL, a.points().get(0).verdict());
    }
}
