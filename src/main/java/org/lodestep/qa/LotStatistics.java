package org.lodestep.qa;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.apache.commons.math3.stat.descriptive.DescriptiveStatistics;

/**
 * Counts, yield and per-parameter statistics of a set of records (a lot, a part, a date range).
 *
 * <p>Each motor (serial number and part) counts once: its first record gives the first-pass yield, its latest the
 * final disposition and the values that enter the statistics, so a re-test replaces rather than doubles a motor.
 * Per-phase values (phase resistance A and B) are individual points in production order.
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
     * One value of a parameter, in production order.
     *
     * @param serial serial number of the motor
     * @param label  phase or pair label, "" for a single value
     * @param value  the judged value, SI
     */
    public record Point(String serial, String label, double value) {
    }

    /** One value that is outside a control limit. */
    public record OutOfControl(String chart, int index, String serial, String label, double value) {
    }

    /**
     * Statistics of one parameter.
     *
     * @param parameter   parameter key
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
     * @param cp          Cp with σ within (MR̄/d2)
     * @param cpk         Cpk with σ within
     * @param pp          Pp with s
     * @param ppk         Ppk with s
     * @param chart       individuals and moving-range limits
     * @param outOfControl points outside the chart limits, with their serial numbers
     * @param outOfSpec   values outside the specification limits
     * @param histogram   equal-width bins spanning the data and the limits ({@link Histogram})
     * @param points      the values behind the statistics: the latest record of each motor, production order
     */
    public record ParameterStatistics(String parameter, String unit, int n, double mean, double stdDev, double min,
                                      double max, double lsl, double usl, boolean limitsVaried, double cp, double cpk,
                                      double pp, double ppk, IndividualsChart.Limits chart,
                                      List<OutOfControl> outOfControl, int outOfSpec, List<Histogram.Bin> histogram,
                                      List<Point> points) {
        public ParameterStatistics {
            outOfControl = List.copyOf(outOfControl);
            histogram = List.copyOf(histogram);
            points = List.copyOf(points);
        }

        /** The individuals, production order (the X chart's points). */
        public double[] individuals() {
            return points.stream().mapToDouble(Point::value).toArray();
        }

        /**
         * The moving ranges |x_i − x_(i−1)| for i = 1..n−1 (the MR chart's points; element i−1 belongs to point i),
         * as {@link IndividualsChart} computes its limits from them.
         */
        public double[] movingRanges() {
            return IndividualsChart.movingRanges(individuals());
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

    /** The whole summary. */
    public record Summary(Counts counts, List<NotPassed> notPassed, List<ParameterStatistics> parameters) {
        public Summary {
            notPassed = List.copyOf(notPassed);
            parameters = List.copyOf(parameters);
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
        return new Summary(counts, notPassed, parameters(List.copyOf(latest.values())));
    }

    private static List<ParameterStatistics> parameters(List<StoredRecord> motors) {
        Map<String, List<Point>> points = new LinkedHashMap<>();
        Map<String, Limit> limits = new LinkedHashMap<>();
        Map<String, Boolean> varied = new LinkedHashMap<>();
        for (StoredRecord r : motors) {
            for (CheckResult c : r.submission().checks()) {
                if (!Double.isFinite(c.judged())) {
                    continue;
                }
                points.computeIfAbsent(c.parameter(), k -> new ArrayList<>())
                        .add(new Point(r.submission().serial(), c.label(), c.judged()));
                Limit before = limits.put(c.parameter(), c.limit());
                if (before != null && !sameLimits(before, c.limit())) {
                    varied.put(c.parameter(), true);
                }
            }
        }
        List<ParameterStatistics> out = new ArrayList<>();
        for (Map.Entry<String, List<Point>> e : points.entrySet()) {
            out.add(parameter(e.getKey(), limits.get(e.getKey()), varied.getOrDefault(e.getKey(), false),
                    e.getValue()));
        }
        return out;
    }

    private static boolean sameLimits(Limit a, Limit b) {
        return Double.compare(a.lower(), b.lower()) == 0 && Double.compare(a.upper(), b.upper()) == 0;
    }

    private static ParameterStatistics parameter(String name, Limit limit, boolean varied, List<Point> pts) {
        double[] x = pts.stream().mapToDouble(Point::value).toArray();
        DescriptiveStatistics d = new DescriptiveStatistics(x);
        double s = x.length < 2 ? Double.NaN : d.getStandardDeviation();
        IndividualsChart.Limits chart = IndividualsChart.of(x);
        ProcessCapability.Indices within = ProcessCapability.of(d.getMean(), chart.sigmaWithin(), limit.lower(),
                limit.upper());
        ProcessCapability.Indices overall = ProcessCapability.of(d.getMean(), s, limit.lower(), limit.upper());
        List<OutOfControl> ooc = new ArrayList<>();
        for (int i : chart.outsideX()) {
            ooc.add(new OutOfControl("X", i, pts.get(i).serial(), pts.get(i).label(), x[i]));
        }
        for (int i : chart.outsideMr()) {
            ooc.add(new OutOfControl("MR", i, pts.get(i).serial(), pts.get(i).label(),
                    IndividualsChart.movingRange(x, i)));
        }
        int outOfSpec = 0;
        for (double v : x) {
            if (!limit.contains(v)) {
                outOfSpec++;
            }
        }
        return new ParameterStatistics(name, limit.unit(), x.length, d.getMean(), s, d.getMin(), d.getMax(),
                limit.lower(), limit.upper(), varied, within.potential(), within.actual(), overall.potential(),
                overall.actual(), chart, ooc, outOfSpec, Histogram.of(x, limit.lower(), limit.upper()), pts);
    }
}
