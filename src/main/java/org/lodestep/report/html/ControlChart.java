package org.lodestep.report.html;

import java.awt.BasicStroke;
import java.awt.Color;
import java.util.Objects;

import org.jfree.chart.JFreeChart;
import org.jfree.chart.annotations.XYPointerAnnotation;
import org.jfree.chart.axis.NumberAxis;
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
 * are drawn as large hollow diamonds and labelled, so they stand out without colour.
 */
public final class ControlChart {
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

        public Chart build() {
            XYSeries run = new XYSeries("values in run order", false, true);
            XYSeries marked = new XYSeries(flagged == null ? "beyond a limit" : "marked out of control", false, true);
            XYLineAndShapeRenderer r = new XYLineAndShapeRenderer(true, true);
            int markedCount = 0;
            for (int i = 0; i < values.length; i++) {
                double xi = firstIndex + i;
                run.add(xi, Double.isFinite(values[i]) ? values[i] : null);
                if (isMarked(i)) {
                    marked.add(xi, values[i]);
                    markedCount++;
                    String name = pointLabels != null ? Html.clean(pointLabels[i]) : "#" + (firstIndex + i);
                    // A short pointer from the name to the point keeps the label clear of the marker.
                    XYPointerAnnotation a = new XYPointerAnnotation(name, xi, values[i], -Math.PI / 2);
                    a.setFont(ChartStyle.NOTE);
                    a.setPaint(ChartStyle.FAIL);
                    a.setArrowPaint(ChartStyle.FAIL);
                    a.setTipRadius(9);
                    a.setBaseRadius(24);
                    a.setArrowLength(6);
                    a.setArrowWidth(3);
                    a.setLabelOffset(3);
                    a.setTextAnchor(TextAnchor.BOTTOM_CENTER);
                    a.setBackgroundPaint(new Color(255, 255, 255, 210));
                    r.addAnnotation(a);
                }
            }
            XYSeriesCollection data = new XYSeriesCollection();
            data.addSeries(run);
            data.addSeries(marked);
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

            NumberAxis xa = new NumberAxis("run order (motor number)");
            xa.setStandardTickUnits(NumberAxis.createIntegerTickUnits());
            xa.setAutoRangeIncludesZero(false);
            xa.setRange(firstIndex - 0.5, firstIndex + values.length - 0.5);
            NumberAxis ya = new NumberAxis(valueLabel);
            ya.setAutoRangeIncludesZero(false);
            ya.setUpperMargin(0.15);
            XYPlot plot = new XYPlot(data, xa, ya, r);
            plot.setSeriesRenderingOrder(SeriesRenderingOrder.FORWARD);
            double lo = Double.POSITIVE_INFINITY;
            double hi = Double.NEGATIVE_INFINITY;
            for (double v : new double[] {centre, upper, lower}) {
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
            double pad = hi > lo ? (hi - lo) * 0.12 : Math.max(Math.abs(hi) * 0.05, 1e-9);
            // A chart of ranges (no lower limit, nothing negative) starts at zero, its natural floor.
            boolean fromZero = Double.isNaN(lower) && lo >= 0;
            ya.setRange(fromZero ? 0 : lo - pad, hi + pad * 2.5);
            if (!Double.isNaN(centre)) {
                plot.addRangeMarker(line(centre, centreLabel, false), Layer.BACKGROUND);
            }
            if (!Double.isNaN(upper)) {
                plot.addRangeMarker(line(upper, upperLabel, true), Layer.BACKGROUND);
            }
            if (!Double.isNaN(lower)) {
                plot.addRangeMarker(line(lower, lowerLabel, true), Layer.BACKGROUND);
            }
            JFreeChart chart = new JFreeChart(title.isEmpty() ? null : title, ChartStyle.TITLE, plot, true);
            String desc = description != null ? description
                    : (title.isEmpty() ? "Control chart" : title) + ": " + values.length + " values of " + valueLabel
                    + " in run order, " + markedCount + " marked beyond a limit.";
            return new Chart(chart, widthPx, heightPx, desc);
        }

        private static ValueMarker line(double at, String label, boolean limit) {
            ValueMarker m = new ValueMarker(at);
            m.setPaint(limit ? ChartStyle.FAIL : ChartStyle.MUTED);
            m.setStroke(limit ? ChartStyle.dashed(1.8f, 9f, 5f) : new BasicStroke(1.2f));
            m.setLabel(label);
            m.setLabelFont(ChartStyle.TICK);
            m.setLabelPaint(limit ? ChartStyle.FAIL : ChartStyle.INK);
            m.setLabelBackgroundColor(new Color(255, 255, 255, 225));
            m.setLabelAnchor(RectangleAnchor.RIGHT);
            m.setLabelTextAnchor(TextAnchor.BOTTOM_RIGHT);
            return m;
        }
    }
}
