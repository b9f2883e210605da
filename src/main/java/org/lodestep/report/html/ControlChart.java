package org.lodestep.report.html;

import java.awt.BasicStroke;
import java.awt.Color;
import java.util.Objects;

import org.jfree.chart.JFreeChart;
import org.jfree.chart.annotations.XYPointerAnnotation;
import org.jfree.chart.axis.LogAxis;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.axis.NumberTickUnit;
import org.jfree.chart.axis.SymbolAxis;
import org.jfree.chart.axis.ValueAxis;
import org.jfree.chart.plot.SeriesRenderingOrder;
import org.jfree.chart.plot.ValueMarker;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.chart.ui.Layer;
import org.jfree.chart.ui.RectangleAnchor;
import org.jfree.chart.ui.TextAnchor;
import org.jfree.chart.util.ShapeUtils;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;

/**
 * A control chart in run order: the individuals chart or the moving-range chart of an I-MR pair. Centre line and
 * limits come from the caller (the {@code qa} package computes them); points beyond a limit, or flagged by the caller,
 * are drawn as large hollow diamonds and labelled, so they stand out without colour. Spec limits (LSL, USL) are drawn
 * as solid labelled lines, distinct from the dashed control limits, and points the caller marks as failed get a
 * cross and a label of their own. The x axis names the motors (their serials when there are few enough to read) and
 * the value axis may be logarithmic.
 */
public final class ControlChart {
    /** Most run positions named on the x axis; beyond that the axis counts. */
    public static final int MAX_NAMED_RUNS = 30;

    private ControlChart() {
    }

    /**
     * Starts a chart of {@code values} in run order (x = 1, 2, ...); NaN values leave a gap.
     *
     * @param pointLabels one label per value (serial numbers), used to name marked points; may be null
     */
    public static Builder builder(String title, String valueLabel, double[] values, String[] pointLabels) {
        return new Builder(title, valueLabel, values, pointLabels);
    }

    /** Collects the run, the centre line and the limits. */
    public static final class Builder {
        private final String title;
        private final String valueLabel;
        private final double[] values;
        private final String[] pointLabels;
        private double centre = Double.NaN;
        private double upper = Double.NaN;
        private double lower = Double.NaN;
        private String centreLabel = "CL";
        private String upperLabel = "UCL";
        private String lowerLabel = "LCL";
        private boolean[] flagged;
        private boolean[] failed;
        private String[] failedNotes;
        private double lowerSpec = Double.NaN;
        private double upperSpec = Double.NaN;
        private String lowerSpecLabel;
        private String upperSpecLabel;
        private String runLabel = "run order";
        private String[] runNames;
        private boolean log;
        private int firstIndex = 1;
        private int widthPx = 760;
        private int heightPx = 300;
        private String description;

        private Builder(String title, String valueLabel, double[] values, String[] pointLabels) {
            this.title = Html.clean(title);
            this.valueLabel = Html.clean(valueLabel);
            this.values = Objects.requireNonNull(values, "values").clone();
            if (values.length == 0) {
                throw new IllegalArgumentException("control chart '" + title + "' has no values");
            }
            if (pointLabels != null && pointLabels.length != values.length) {
                throw new IllegalArgumentException(pointLabels.length + " point labels for " + values.length
                        + " values");
            }
            this.pointLabels = pointLabels == null ? null : pointLabels.clone();
        }

        /** The centre line (mean, or mean moving range) and its label, e.g. "x̄ 2.015 Ω". */
        public Builder centre(double value, String label) {
            this.centre = finite(value, "centre line");
            this.centreLabel = Html.clean(label);
            return this;
        }

        /** The upper control limit and its label. */
        public Builder upperLimit(double value, String label) {
            this.upper = finite(value, "upper control limit");
            this.upperLabel = Html.clean(label);
            return this;
        }

        /** The lower control limit and its label (omit for a moving-range chart, whose LCL is zero). */
        public Builder lowerLimit(double value, String label) {
            this.lower = finite(value, "lower control limit");
            this.lowerLabel = Html.clean(label);
            return this;
        }

        /** Points the caller marks as out of control (e.g. by run rules); default: beyond a drawn limit. */
        public Builder flagged(boolean[] marks) {
            if (marks.length != values.length) {
                throw new IllegalArgumentException(marks.length + " flags for " + values.length + " values");
            }
            this.flagged = marks.clone();
            return this;
        }

        /** The lower specification limit, a solid line labelled on the left (e.g. "LSL 1.71 Ω"). */
        public Builder lowerSpec(double value, String label) {
            this.lowerSpec = finite(value, "lower spec limit");
            this.lowerSpecLabel = Html.clean(label);
            return this;
        }

        /** The upper specification limit, a solid line labelled on the left. */
        public Builder upperSpec(double value, String label) {
            this.upperSpec = finite(value, "upper spec limit");
            this.upperSpecLabel = Html.clean(label);
            return this;
        }

        /**
         * Points that failed their spec: drawn as a cross (besides any out-of-control diamond) and labelled with
         * {@code notes[i]} (e.g. "KV24-00121 2.28 > USL").
         */
        public Builder failed(boolean[] marks, String[] notes) {
            if (marks.length != values.length || notes.length != values.length) {
                throw new IllegalArgumentException(marks.length + " failure marks and " + notes.length + " notes for "
                        + values.length + " values");
            }
            this.failed = marks.clone();
            this.failedNotes = notes.clone();
            return this;
        }

        /**
         * What the x axis counts, and optionally the name of every run position from 1 (serial numbers): with at most
         * {@link #MAX_NAMED_RUNS} names they replace the numbers, written upright.
         */
        public Builder runs(String label, String[] names) {
            this.runLabel = Html.clean(label);
            this.runNames = names == null ? null : names.clone();
            return this;
        }

        /** A logarithmic value axis (for values that span decades; every value and line must be positive). */
        public Builder logScale() {
            this.log = true;
            return this;
        }

        /** The run number of the first value (2 for a moving-range chart, whose first range needs two values). */
        public Builder firstIndex(int index) {
            this.firstIndex = index;
            return this;
        }

        /** Design size in CSS pixels (default 760 x 300). */
        public Builder size(int widthPx, int heightPx) {
            this.widthPx = widthPx;
            this.heightPx = heightPx;
            return this;
        }

        /** The text alternative of the chart. */
        public Builder describe(String text) {
            this.description = text;
            return this;
        }

        private static double finite(double v, String what) {
            if (!Double.isFinite(v)) {
                throw new IllegalArgumentException(what + " must be finite, got " + v);
            }
            return v;
        }

        private boolean isMarked(int i) {
            double v = values[i];
            if (!Double.isFinite(v)) {
                return false;
            }
            if (flagged != null) {
                return flagged[i];
            }
            return (!Double.isNaN(upper) && v > upper) || (!Double.isNaN(lower) && v < lower);
        }

        private boolean labelled(int i) {
            return isMarked(i) || failed != null && failed[i] && Double.isFinite(values[i]);
        }

        public Chart build() {
            XYSeries run = new XYSeries("values in run order", false, true);
            XYSeries marked = new XYSeries(flagged == null ? "beyond a limit" : "marked out of control", false, true);
            XYSeries outside = new XYSeries("failed the spec", false, true);
            XYLineAndShapeRenderer r = new XYLineAndShapeRenderer(true, true);
            boolean named = runNames != null && runNames.length <= MAX_NAMED_RUNS
                    && runNames.length >= firstIndex - 1 + values.length;
            // Named runs sit on a symbol axis, whose positions count from 0.
            int offset = named ? firstIndex - 1 : firstIndex;
            int markedCount = 0;
            int failedCount = 0;
            for (int i = 0; i < values.length; i++) {
                double xi = offset + i;
                run.add(xi, Double.isFinite(values[i]) ? values[i] : null);
                boolean isFailed = failed != null && failed[i] && Double.isFinite(values[i]);
                if (isFailed) {
                    outside.add(xi, values[i]);
                    failedCount++;
                }
                if (isMarked(i)) {
                    marked.add(xi, values[i]);
                    markedCount++;
                }
                if (isFailed || isMarked(i)) {
                    String name = isFailed ? Html.clean(failedNotes[i])
                            : pointLabels != null ? Html.clean(pointLabels[i]) : "#" + (firstIndex + i);
                    // Labels of neighbouring points lean apart (up-left, up-right) so they do not overprint.
                    boolean before = i > 0 && labelled(i - 1);
                    boolean after = i + 1 < values.length && labelled(i + 1);
                    double lean = before ? 1 : after ? -1 : 0;
                    r.addAnnotation(pointer(name, xi, values[i], -Math.PI / 2 + lean * Math.PI / 5));
                }
            }
            XYSeriesCollection data = new XYSeriesCollection();
            data.addSeries(run);
            data.addSeries(marked);
            data.addSeries(outside);
            r.setSeriesPaint(0, ChartStyle.SERIES[0]);
            r.setSeriesStroke(0, new BasicStroke(1.5f));
            r.setSeriesShape(0, ChartStyle.seriesShape(0));
            r.setSeriesLinesVisible(1, false);
            r.setSeriesShapesVisible(1, true);
            r.setSeriesShapesFilled(1, false);
            r.setSeriesShape(1, ShapeUtils.createDiamond(8f));
            r.setSeriesPaint(1, ChartStyle.FAIL);
            r.setUseOutlinePaint(false);
            r.setSeriesOutlineStroke(1, new BasicStroke(2.5f));
            r.setDrawOutlines(true);
            r.setSeriesStroke(1, new BasicStroke(2.5f));
            r.setSeriesVisibleInLegend(1, markedCount > 0);
            r.setSeriesLinesVisible(2, false);
            r.setSeriesShapesVisible(2, true);
            r.setSeriesShapesFilled(2, true);
            r.setSeriesShape(2, ShapeUtils.createDiagonalCross(6f, 1.6f));
            r.setSeriesPaint(2, ChartStyle.FAIL);
            r.setSeriesVisibleInLegend(2, failedCount > 0);

            ValueAxis xa;
            if (named) {
                String[] ticks = new String[runNames.length];
                for (int i = 0; i < ticks.length; i++) {
                    ticks[i] = Html.clean(runNames[i]);
                }
                SymbolAxis sa = new SymbolAxis(runLabel, ticks);
                sa.setVerticalTickLabels(true);
                sa.setGridBandsVisible(false);
                sa.setRange(-0.5, ticks.length - 0.5);
                xa = sa;
            } else {
                NumberAxis na = new NumberAxis(runLabel);
                na.setStandardTickUnits(NumberAxis.createIntegerTickUnits());
                na.setAutoRangeIncludesZero(false);
                na.setRange(firstIndex - 0.5, firstIndex + values.length - 0.5);
                xa = na;
            }
            double lo = Double.POSITIVE_INFINITY;
            double hi = Double.NEGATIVE_INFINITY;
            for (double v : new double[] {centre, upper, lower, lowerSpec, upperSpec}) {
                if (Double.isFinite(v)) {
                    lo = Math.min(lo, v);
                    hi = Math.max(hi, v);
                }
            }
            for (double v : values) {
                if (Double.isFinite(v)) {
                    lo = Math.min(lo, v);
                    hi = Math.max(hi, v);
                }
            }
            ValueAxis ya;
            if (log) {
                if (!(lo > 0)) {
                    throw new IllegalArgumentException("a logarithmic axis needs positive values and lines, got " + lo);
                }
                LogAxis la = new LogAxis(valueLabel);
                la.setBase(10);
                la.setNumberFormatOverride(new java.text.DecimalFormat("#,##0.###"));
                la.setTickUnit(new NumberTickUnit(1)); // one tick per decade, labelled 10, 100, 1,000
                la.setMinorTickCount(9);
                la.setMinorTickMarksVisible(true);
                double span = Math.log10(hi / lo);
                double pad = Math.max(span * 0.12, 0.05);
                la.setRange(lo / Math.pow(10, pad), hi * Math.pow(10, pad * 2.5));
                ya = la;
            } else {
                NumberAxis na = new NumberAxis(valueLabel);
                na.setAutoRangeIncludesZero(false);
                double pad = hi > lo ? (hi - lo) * 0.12 : Math.max(Math.abs(hi) * 0.05, 1e-9);
                // A chart of non-negative values (ranges, imbalance) never shows a negative axis: zero is its floor.
                double from = lo >= 0 ? Math.max(0, lo - pad) : lo - pad;
                na.setRange(Double.isNaN(lower) && lo >= 0 ? 0 : from, hi + pad * 2.5);
                ya = na;
            }
            XYPlot plot = new XYPlot(data, xa, ya, r);
            plot.setSeriesRenderingOrder(SeriesRenderingOrder.FORWARD);
            if (!Double.isNaN(centre)) {
                plot.addRangeMarker(line(centre, centreLabel, false), Layer.BACKGROUND);
            }
            if (!Double.isNaN(upper)) {
                plot.addRangeMarker(line(upper, upperLabel, true), Layer.BACKGROUND);
            }
            if (!Double.isNaN(lower)) {
                plot.addRangeMarker(line(lower, lowerLabel, true), Layer.BACKGROUND);
            }
            if (!Double.isNaN(lowerSpec)) {
                plot.addRangeMarker(specLine(lowerSpec, lowerSpecLabel, false), Layer.BACKGROUND);
            }
            if (!Double.isNaN(upperSpec)) {
                plot.addRangeMarker(specLine(upperSpec, upperSpecLabel, true), Layer.BACKGROUND);
            }
            JFreeChart chart = new JFreeChart(title.isEmpty() ? null : title, ChartStyle.TITLE, plot, true);
            String desc = description != null ? description
                    : (title.isEmpty() ? "Control chart" : title) + ": " + values.length + " values of " + valueLabel
                    + " in run order, " + markedCount + " marked beyond a limit"
                    + (failed == null ? "" : ", " + failedCount + " failed the spec") + ".";
            int h = named ? heightPx + 70 : heightPx;
            return new Chart(chart, widthPx, h, desc);
        }

        /** A short pointer from the name to the point keeps the label clear of the marker. */
        private static XYPointerAnnotation pointer(String name, double x, double y, double angle) {
            XYPointerAnnotation a = new XYPointerAnnotation(name, x, y, angle);
            a.setFont(ChartStyle.NOTE);
            a.setPaint(ChartStyle.FAIL);
            a.setArrowPaint(ChartStyle.FAIL);
            a.setTipRadius(9);
            a.setBaseRadius(24);
            a.setArrowLength(6);
            a.setArrowWidth(3);
            a.setLabelOffset(3);
            a.setTextAnchor(angle < -Math.PI / 2 - 0.1 ? TextAnchor.BOTTOM_RIGHT
                    : angle > -Math.PI / 2 + 0.1 ? TextAnchor.BOTTOM_LEFT : TextAnchor.BOTTOM_CENTER);
            a.setBackgroundPaint(new Color(255, 255, 255, 210));
            return a;
        }

        /** A spec limit: solid, in ink, labelled at the left end so it never meets a control limit's label. */
        private static ValueMarker specLine(double at, String label, boolean upperSide) {
            ValueMarker m = new ValueMarker(at);
            m.setPaint(ChartStyle.INK);
            m.setStroke(new BasicStroke(2.2f));
            m.setLabel(label);
            m.setLabelFont(ChartStyle.NOTE);
            m.setLabelPaint(ChartStyle.INK);
            m.setLabelBackgroundColor(new Color(255, 255, 255, 225));
            m.setLabelAnchor(RectangleAnchor.LEFT);
            m.setLabelTextAnchor(upperSide ? TextAnchor.BOTTOM_LEFT : TextAnchor.TOP_LEFT);
            return m;
        }

        private static ValueMarker line(double at, String label, boolean limit) {
            ValueMarker m = new ValueMarker(at);
            m.setPaint(limit ? ChartStyle.FAIL : ChartStyle.MUTED);
            m.setStroke(limit ? ChartStyle.dashed(1.8f, 9f, 5f) : new BasicStroke(1.2f));
            if (!label.isEmpty()) {
                m.setLabel(label);
            }
            m.setLabelFont(ChartStyle.TICK);
            m.setLabelPaint(limit ? ChartStyle.FAIL : ChartStyle.INK);
            m.setLabelBackgroundColor(new Color(255, 255, 255, 225));
            m.setLabelAnchor(RectangleAnchor.RIGHT);
            m.setLabelTextAnchor(TextAnchor.BOTTOM_RIGHT);
            return m;
        }
    }
}
