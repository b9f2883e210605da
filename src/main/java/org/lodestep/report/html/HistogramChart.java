package org.lodestep.report.html;

import java.awt.BasicStroke;
import java.awt.Color;
import java.util.ArrayList;
import java.util.List;
import java.util.Objects;

import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.plot.ValueMarker;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.StackedXYBarRenderer;
import org.jfree.chart.renderer.xy.StandardXYBarPainter;
import org.jfree.chart.ui.Layer;
import org.jfree.chart.ui.RectangleAnchor;
import org.jfree.chart.ui.RectangleInsets;
import org.jfree.chart.ui.TextAnchor;
import org.jfree.data.xy.DefaultTableXYDataset;
import org.jfree.data.xy.XYSeries;

/**
 * A histogram of one measured quantity over a lot, with the spec limits drawn as labelled lines. Values outside the
 * limits are counted in their own darker, outlined bars and named in the legend, so they stand out without colour.
 */
public final class HistogramChart {
    private HistogramChart() {
    }

    /** Starts a histogram of {@code values} (non-finite values are ignored). */
    public static Builder builder(String title, String valueLabel, double[] values) {
        return new Builder(title, valueLabel, values);
    }

    private record Limit(double at, String label, boolean spec) {
    }

    /** Equal-width bins from {@code start}; counts within and outside the limits, kept apart. */
    record Bins(double start, double width, int[] inside, int[] outside) {
        int outsideCount() {
            int c = 0;
            for (int o : outside) {
                c += o;
            }
            return c;
        }
    }

    /**
     * Bins the finite values into about {@code k} bins. With both limits given, the limits fall on bin edges (no bar
     * straddles a limit) and a value exactly at a limit is counted inside; NaN limits mean none.
     */
    static Bins bins(double[] values, double lower, double upper, int k) {
        double lo = Double.POSITIVE_INFINITY;
        double hi = Double.NEGATIVE_INFINITY;
        for (double v : values) {
            if (Double.isFinite(v)) {
                lo = Math.min(lo, v);
                hi = Math.max(hi, v);
            }
        }
        double width = hi > lo ? (hi - lo) / k : Math.max(Math.abs(lo) * 0.01, 1e-9);
        double start = hi > lo ? lo : lo - width * k / 2.0;
        if (!Double.isNaN(lower) && !Double.isNaN(upper) && upper > lower) {
            double span = Math.max(hi, upper) - Math.min(lo, lower);
            int within = Math.max(2, (int) Math.round(k * (upper - lower) / span));
            width = (upper - lower) / within;
            start = lower - Math.ceil((lower - Math.min(lo, lower)) / width - 1e-9) * width;
            k = Math.min(500, (int) Math.ceil((Math.max(hi, upper) - start) / width - 1e-9));
            if (start + k * width <= hi) {
                k = Math.min(500, k + 1);
            }
        }
        int[] inside = new int[k];
        int[] outside = new int[k];
        for (double v : values) {
            if (!Double.isFinite(v)) {
                continue;
            }
            int b = Math.min(k - 1, Math.max(0, (int) Math.floor((v - start) / width + 1e-9)));
            if ((!Double.isNaN(lower) && v < lower) || (!Double.isNaN(upper) && v > upper)) {
                outside[b]++;
            } else {
                if (!Double.isNaN(upper) && b > 0 && start + b * width >= upper - 1e-9 * width) {
                    b--; // a value exactly at the upper limit is in spec: keep it left of the line
                }
                inside[b]++;
            }
        }
        return new Bins(start, width, inside, outside);
    }

    /** Collects the values, the limits and the bin count. */
    public static final class Builder {
        private final String title;
        private final String valueLabel;
        private final double[] values;
        private double lower = Double.NaN;
        private double upper = Double.NaN;
        private String lowerLabel;
        private String upperLabel;
        private final List<Limit> lines = new ArrayList<>();
        private int bins;
        private int widthPx = 760;
        private int heightPx = 340;
        private String description;

        private Builder(String title, String valueLabel, double[] values) {
            this.title = Html.clean(title);
            this.valueLabel = Html.clean(valueLabel);
            this.values = Objects.requireNonNull(values, "values").clone();
        }

        /** The lower spec limit, drawn and labelled (e.g. "LSL 1.80 Ω"). */
        public Builder lowerLimit(double value, String label) {
            this.lower = finite(value, "lower limit");
            this.lowerLabel = Html.clean(label);
            return this;
        }

        /** The upper spec limit, drawn and labelled. */
        public Builder upperLimit(double value, String label) {
            this.upper = finite(value, "upper limit");
            this.upperLabel = Html.clean(label);
            return this;
        }

        /** Another labelled reference line (nominal, lot mean). */
        public Builder reference(double value, String label) {
            lines.add(new Limit(finite(value, "reference"), Html.clean(label), false));
            return this;
        }

        /** The number of bins (default: about twice the square root of the count, 8 to 40). */
        public Builder bins(int count) {
            if (count < 1 || count > 500) {
                throw new IllegalArgumentException("bin count must be 1..500, got " + count);
            }
            this.bins = count;
            return this;
        }

        /** Design size in CSS pixels (default 760 x 340). */
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

        public Chart build() {
            double lo = Double.POSITIVE_INFINITY;
            double hi = Double.NEGATIVE_INFINITY;
            int n = 0;
            for (double v : values) {
                if (Double.isFinite(v)) {
                    lo = Math.min(lo, v);
                    hi = Math.max(hi, v);
                    n++;
                }
            }
            if (n == 0) {
                throw new IllegalArgumentException("histogram '" + title + "' has no finite value");
            }
            Bins h = HistogramChart.bins(values, lower, upper, bins > 0 ? bins
                    : Math.max(8, Math.min(40, (int) Math.ceil(2 * Math.sqrt(n)))));
            int k = h.inside().length;
            double start = h.start();
            double width = h.width();
            int outCount = h.outsideCount();
            XYSeries in = new XYSeries("within limits (" + (n - outCount) + ")", false, false);
            XYSeries out = new XYSeries("\u2716 outside limits (" + outCount + ")", false, false);
            for (int b = 0; b < k; b++) {
                double centre = start + (b + 0.5) * width;
                in.add(centre, h.inside()[b]);
                out.add(centre, h.outside()[b]);
            }
            DefaultTableXYDataset data = new DefaultTableXYDataset();
            data.addSeries(in);
            data.addSeries(out);
            data.setIntervalWidth(width);

            StackedXYBarRenderer r = new StackedXYBarRenderer(0.04);
            r.setBarPainter(new StandardXYBarPainter());
            r.setShadowVisible(false);
            r.setSeriesPaint(0, new Color(0x8fb3cf));
            r.setSeriesPaint(1, ChartStyle.FAIL);
            r.setDrawBarOutline(true);
            r.setSeriesOutlinePaint(0, new Color(0x2b5d8a));
            r.setSeriesOutlinePaint(1, ChartStyle.INK);
            r.setSeriesOutlineStroke(1, new BasicStroke(2f));

            NumberAxis xa = new NumberAxis(valueLabel);
            xa.setAutoRangeIncludesZero(false);
            double xmin = Math.min(start, Double.isNaN(lower) ? start : lower);
            double xmax = Math.max(start + k * width, Double.isNaN(upper) ? hi : upper);
            double pad = (xmax - xmin) * 0.08;
            xa.setRange(xmin - pad, xmax + pad);
            NumberAxis ya = new NumberAxis("count of motors");
            ya.setStandardTickUnits(NumberAxis.createIntegerTickUnits());
            ya.setUpperMargin(0.25);
            XYPlot plot = new XYPlot(data, xa, ya, r);
            if (!Double.isNaN(lower)) {
                plot.addDomainMarker(limitMarker(lower, lowerLabel, true, false, false), Layer.FOREGROUND);
            }
            if (!Double.isNaN(upper)) {
                plot.addDomainMarker(limitMarker(upper, upperLabel, true, true, false), Layer.FOREGROUND);
            }
            for (Limit l : lines) {
                plot.addDomainMarker(limitMarker(l.at(), l.label(), false, false, true), Layer.FOREGROUND);
            }
            JFreeChart chart = new JFreeChart(title.isEmpty() ? null : title, ChartStyle.TITLE, plot, true);
            String desc = description != null ? description
                    : (title.isEmpty() ? "Histogram" : title) + ": " + n + " values of " + valueLabel + ", "
                    + outCount + " outside the limits.";
            return new Chart(chart, widthPx, heightPx, desc);
        }

        private static ValueMarker limitMarker(double at, String label, boolean spec, boolean upperSide,
                                               boolean lowered) {
            ValueMarker m = new ValueMarker(at);
            m.setPaint(spec ? ChartStyle.FAIL : ChartStyle.MUTED);
            m.setStroke(spec ? ChartStyle.dashed(2.5f, 10f, 5f) : ChartStyle.dashed(1.5f, 2f, 3f));
            m.setLabel(label);
            m.setLabelFont(ChartStyle.NOTE);
            m.setLabelPaint(spec ? ChartStyle.FAIL : ChartStyle.INK);
            m.setLabelBackgroundColor(new Color(255, 255, 255, 225));
            // Lower limit labelled to its left, upper to its right, so the labels sit outside the spec window.
            // Labels sit inside the spec window (lower limit's to its right, upper's to its left), where there is
            // always room; outside, a limit near the plot edge would have its label cut off.
            m.setLabelAnchor(upperSide ? RectangleAnchor.TOP_LEFT : RectangleAnchor.TOP_RIGHT);
            m.setLabelTextAnchor(upperSide ? TextAnchor.TOP_RIGHT : TextAnchor.TOP_LEFT);
            m.setLabelOffset(new RectangleInsets(lowered ? 24 : 4, 4, 4, 4));
            return m;
        }
    }
}
