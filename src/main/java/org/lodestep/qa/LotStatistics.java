package org.lodestep.qa;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.apache.commons.math3.stat.descriptive.DescriptiveStatistics;

/**
 * Counts, yield and per-series statistics of a set of records (a lot, a part, a date range).
 *
 * <p>Each motor (serial number and part) counts once: its first record gives the first-pass yield, its latest the
 * final disposition and the values that enter the statistics, so a re-test replaces rather than doubles a motor.
 * A series is one parameter of one phase or insulation pair (phase resistance A, insulation a-frame): each has its
 * own statistics and charts, since phases or pairs interleaved on one chart would make every moving range a
 * difference between two different windings. Limits and capability are computed on the series' {@link ValueScale};
 * a series without variation ({@link IndividualsChart#noVariation}) is flagged {@code constant} and has neither.
 */
public final class LotStatistics {

    /**
     * How many motors passed.
     *
     * @param records          records read, re-tests included
     * @param motors           distinct motors (serial number and part)
     * @param retests          records that re-test an earlier one
     * @param passed           motors whose latest record passed
     * @param failed           motors whose latest record failed
     * @param incomplete       motors whose latest record is incomplete
     * @param firstPassYieldPct motors that passed on their first record, % of motors
     * @param finalYieldPct    motors whose latest record passed, % of motors
     * @param notIntact        records whose stored body no longer matches its SHA-256 or columns
     */
    public record Counts(int records, int motors, int retests, int passed, int failed, int incomplete,
                         double firstPassYieldPct, double finalYieldPct, int notIntact) {
    }

    /**
     * One value of a series, in production order.
     *
     * @param serial  serial number of the motor
     * @param label   phase or pair label, "" for a single value
     * @param value   the judged value, SI
     * @param verdict the check's verdict in that record (FAIL marks the point outside the spec it was judged by)
     */
    public record Point(String serial, String label, double value, Verdict verdict) {
    }

    /** One value that is outside a control limit. */
    public record OutOfControl(String chart, int index, String serial, String label, double value) {
    }

    /**
     * Statistics of one series: a parameter of one phase or pair.
     *
     * @param parameter   parameter key
     * @param label       phase or pair label ("A", "a-frame"), "" for a motor-wide value
     * @param unit        unit of every value
     * @param n           number of values
     * @param mean        mean
     * @param stdDev      sample standard deviation s (n − 1), NaN below 2 values
     * @param min         smallest value
     * @param max         largest value
     * @param lsl         lower specification limit, or NaN
     * @param usl         upper specification limit, or NaN
     * @param limitsVaried true when the records were judged with different limits (several spec versions);
     *                    lsl/usl are then those of the latest record
     * @param constant    true when two or more values do not vary (all equal, or a spread below the resolution of
     *                    {@link IndividualsChart#RESOLUTION}): no chart, no limits, no capability
     * @param cp          Cp with σ within (MR̄/d2), NaN for a one-sided spec or below {@link ProcessCapability#MIN_N}
     * @param cpk         Cpk (or the one-sided Cpu or Cpl) with σ within, and its interval
     * @param pp          Pp with s
     * @param ppk         Ppk (Ppu, Ppl) with s, and its interval
     * @param chart       individuals and moving-range limits, on {@code chart.scale()}
     * @param outOfControl points outside the chart limits, with their serial numbers
     * @param outOfSpec   values outside the specification limits
     * @param histogramFromZero true when the histogram spans from zero (a non-negative quantity with a maximum only)
     * @param histogram   equal-width bins spanning the data and the limits ({@link Histogram}); one bin of zero width
     *                    for a constant series
     * @param points      the values behind the statistics: the latest record of each motor, production order
     */
    public record ParameterStatistics(String parameter, String label, String unit, int n, double mean, double stdDev,
                                      double min, double max, double lsl, double usl, boolean limitsVaried,
                                      boolean constant, double cp, Capability cpk, double pp, Capability ppk,
                                      IndividualsChart.Limits chart, List<OutOfControl> outOfControl, int outOfSpec,
                                      boolean histogramFromZero, List<Histogram.Bin> histogram, List<Point> points) {
        public ParameterStatistics {
            outOfControl = List.copyOf(outOfControl);
            histogram = List.copyOf(histogram);
            points = List.copyOf(points);
        }

        /** The individuals, production order (the X chart's points), in the parameter's unit. */
        public double[] individuals() {
            return points.stream().mapToDouble(Point::value).toArray();
        }

        /**
         * The moving ranges |x_i − x_(i−1)| for i = 1..n−1 on the chart's scale (ln x for a log scale): the MR
         * chart's points, element i−1 belonging to point i, as {@link IndividualsChart} computes its limits from them.
         */
        public double[] movingRanges() {
            return IndividualsChart.movingRanges(chart.scale().transform(individuals()));
        }
    }

    /**
     * A motor whose latest record did not pass, with the checks that did not.
     *
     * @param serial   serial number
     * @param recordId its latest record
     * @param verdict  FAIL or INCOMPLETE
     * @param checks   {@code parameter label} of each check that did not pass
     */
    public record NotPassed(String serial, long recordId, Verdict verdict, List<String> checks) {
        public NotPassed {
            checks = List.copyOf(checks);
        }
    }

    /**
     * One check that did not pass in one record, with what became of the motor.
     *
     * @param serial         serial number
     * @param recordId       the record
     * @param parameter      parameter key
     * @param label          phase or pair, "" for a motor-wide value
     * @param verdict        FAIL or INCOMPLETE
     * @param value          the judged value (SI, {@code unit}), NaN when not judged
     * @param unit           unit of value, limit and margin
     * @param limitName      "LSL" or "USL": the limit the value is outside ({@link CheckResult#decidingLimit});
     *                       "" when not judged
     * @param limit          that limit, or NaN
     * @param margin         signed distance inside that limit ({@link CheckResult#margin}): negative outside, NaN
     *                       when not judged
     * @param retestRecordId the record that re-tested this one, or null when the motor was not re-tested after it
     * @param retestVerdict  that record's verdict, or null
     */
    public record FailedCheck(String serial, long recordId, String parameter, String label, Verdict verdict,
                              double value, String unit, String limitName, double limit, double margin,
                              Long retestRecordId, Verdict retestVerdict) {
    }

    /** The whole summary. */
    public record Summary(Counts counts, List<NotPassed> notPassed, List<FailedCheck> failedChecks,
                          List<ParameterStatistics> parameters) {
        public Summary {
            notPassed = List.copyOf(notPassed);
            failedChecks = List.copyOf(failedChecks);
            parameters = List.copyOf(parameters);
        }

        /** Serial numbers of the motors whose latest record failed, in production order. */
        public List<String> failedSerials() {
            return notPassed.stream().filter(n -> n.verdict() == Verdict.FAIL).map(NotPassed::serial).toList();
        }
    }

    private LotStatistics() {
    }

    /** Summarises records given oldest first (as {@link RecordStore#find} returns them). */
    public static Summary of(List<StoredRecord> records) {
        Map<String, StoredRecord> first = new LinkedHashMap<>();
        Map<String, StoredRecord> latest = new LinkedHashMap<>();
        int retests = 0;
        int notIntact = 0;
        for (StoredRecord r : records) {
            String motor = r.submission().partNumber() + "\u0000" + r.submission().serial();
            first.putIfAbsent(motor, r);
            latest.remove(motor); // keep production order of the latest test
            latest.put(motor, r);
            if (r.retestOf() != null) {
                retests++;
            }
            if (!r.intact()) {
                notIntact++;
            }
        }
        int passed = 0;
        int failed = 0;
        int incomplete = 0;
        for (StoredRecord r : latest.values()) {
            switch (r.submission().verdict()) {
                case PASS -> passed++;
                case FAIL -> failed++;
                default -> incomplete++;
            }
        }
        long firstPass = first.values().stream().filter(r -> r.submission().verdict() == Verdict.PASS).count();
        int motors = latest.size();
        Counts counts = new Counts(records.size(), motors, retests, passed, failed, incomplete,
                motors == 0 ? Double.NaN : 100.0 * firstPass / motors,
                motors == 0 ? Double.NaN : 100.0 * passed / motors, notIntact);
        List<NotPassed> notPassed = new ArrayList<>();
        for (StoredRecord r : latest.values()) {
            if (r.submission().verdict() != Verdict.PASS) {
                notPassed.add(new NotPassed(r.submission().serial(), r.id(), r.submission().verdict(),
                        r.submission().checks().stream().filter(c -> c.verdict() != Verdict.PASS)
                                .map(c -> (c.parameter() + " " + c.label()).strip()).toList()));
            }
        }
        return new Summary(counts, notPassed, failedChecks(records), parameters(List.copyOf(latest.values())));
    }

    /** Every check that did not pass, record by record, with the record that re-tested it (the motor's next one). */
    private static List<FailedCheck> failedChecks(List<StoredRecord> records) {
        Map<Long, StoredRecord> retestOf = new LinkedHashMap<>();
        for (StoredRecord r : records) {
            if (r.retestOf() != null) {
                retestOf.put(r.retestOf(), r);
            }
        }
        List<FailedCheck> out = new ArrayList<>();
        for (StoredRecord r : records) {
            StoredRecord next = retestOf.get(r.id());
            for (CheckResult c : r.submission().checks()) {
                if (c.verdict() == Verdict.PASS) {
                    continue;
                }
                out.add(new FailedCheck(r.submission().serial(), r.id(), c.parameter(), c.label(), c.verdict(),
                        c.judged(), c.limit().unit(), c.decidingLimit(), c.decidingLimitValue(), c.margin(),
                        next == null ? null : next.id(), next == null ? null : next.submission().verdict()));
            }
        }
        return out;
    }

    private static List<ParameterStatistics> parameters(List<StoredRecord> motors) {
        Map<String, List<Point>> points = new LinkedHashMap<>();
        Map<String, CheckResult> latest = new LinkedHashMap<>();
        Map<String, Boolean> varied = new LinkedHashMap<>();
        for (StoredRecord r : motors) {
            for (CheckResult c : r.submission().checks()) {
                if (!Double.isFinite(c.judged())) {
                    continue;
                }
                String series = c.parameter() + "\u0000" + c.label();
                points.computeIfAbsent(series, k -> new ArrayList<>())
                        .add(new Point(r.submission().serial(), c.label(), c.judged(), c.verdict()));
                CheckResult before = latest.put(series, c);
                if (before != null && !sameLimits(before.limit(), c.limit())) {
                    varied.put(series, true);
                }
            }
        }
        List<ParameterStatistics> out = new ArrayList<>();
        for (Map.Entry<String, List<Point>> e : points.entrySet()) {
            CheckResult c = latest.get(e.getKey());
            out.add(series(c.parameter(), c.label(), c.limit(), varied.getOrDefault(e.getKey(), false), e.getValue()));
        }
        return out;
    }

    private static boolean sameLimits(Limit a, Limit b) {
        return Double.compare(a.lower(), b.lower()) == 0 && Double.compare(a.upper(), b.upper()) == 0;
    }

    private static ParameterStatistics series(String name, String label, Limit limit, boolean varied,
                                              List<Point> pts) {
        double[] x = pts.stream().mapToDouble(Point::value).toArray();
        DescriptiveStatistics d = new DescriptiveStatistics(x);
        double s = x.length < 2 ? Double.NaN : d.getStandardDeviation();
        ValueScale scale = ValueScale.of(name, x);
        IndividualsChart.Limits chart = IndividualsChart.of(x, scale);
        boolean constant = x.length >= 2 && IndividualsChart.noVariation(x); // one value is not a "no variation"
        // Capability on the chart's scale: for a log scale, of ln x against ln LSL (Montgomery ch. 8 on
        // transformed data; references §25).
        double[] y = scale.transform(x);
        DescriptiveStatistics dy = new DescriptiveStatistics(y);
        double lsl = scale.transform(limit.lower());
        double usl = scale.transform(limit.upper());
        double sy = constant || y.length < 2 ? Double.NaN : dy.getStandardDeviation();
        ProcessCapability.Indices within = ProcessCapability.of(dy.getMean(), constant ? Double.NaN
                : chart.sigmaWithin(), lsl, usl);
        ProcessCapability.Indices overall = ProcessCapability.of(dy.getMean(), sy, lsl, usl);
        boolean enough = x.length >= ProcessCapability.MIN_N;
        List<OutOfControl> ooc = new ArrayList<>();
        for (int i : chart.outsideX()) {
            ooc.add(new OutOfControl("X", i, pts.get(i).serial(), pts.get(i).label(), x[i]));
        }
        for (int i : chart.outsideMr()) {
            ooc.add(new OutOfControl("MR", i, pts.get(i).serial(), pts.get(i).label(),
                    IndividualsChart.movingRange(y, i)));
        }
        int outOfSpec = 0;
        for (double v : x) {
            if (!limit.contains(v)) {
                outOfSpec++;
            }
        }
        boolean fromZero = limit.hasUpper() && !limit.hasLower() && d.getMin() >= 0;
        List<Histogram.Bin> bins = constant
                ? List.of(new Histogram.Bin(d.getMin(), d.getMax(), x.length, outOfSpec))
                : Histogram.of(x, limit.lower(), limit.upper(), fromZero);
        return new ParameterStatistics(name, label, limit.unit(), x.length, d.getMean(), s, d.getMin(), d.getMax(),
                limit.lower(), limit.upper(), varied, constant, enough ? within.potential() : Double.NaN,
                ProcessCapability.estimate("Cp", within.actual(), x.length, limit.lower(), limit.upper()),
                enough ? overall.potential() : Double.NaN,
                ProcessCapability.estimate("Pp", overall.actual(), x.length, limit.lower(), limit.upper()), chart,
                ooc, outOfSpec, fromZero, bins, pts);
    }
}
