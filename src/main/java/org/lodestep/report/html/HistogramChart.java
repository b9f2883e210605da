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

    /**
     * Starts a histogram of bins computed by the caller (the analysis packages bin; this chart only draws).
     *
     * @param edges   the k + 1 bin edges, ascending, equally spaced (a single bin may have zero width: every value
     *                equal)
     * @param inside  per bin, values within the limits
     * @param outside per bin, values outside the limits, drawn as their own darker bars
     */
    public static Builder builder(String title, String valueLabel, double[] edges, int[] inside, int[] outside) {
        return new Builder(title, valueLabel, edges, inside, outside);
    }

    private record Limit(double at, String label, boolean spec) {
    }

    /** Collects the bins and the limits. */
    public static final class Builder {
        private final String title;
        private final String valueLabel;
        private final double[] edges;
        private final int[] inside;
        private final int[] outside;
        private double lower = Double.NaN;
        private double upper = Double.NaN;
        private String lowerLabel;
        private String upperLabel;
        private final List<Limit> lines = new ArrayList<>();
        private int widthPx = 760;
        private int heightPx = 340;
        private String description;

        private Builder(String title, String valueLabel, double[] edges, int[] inside, int[] outside) {
            this.title = Html.clean(title);
            this.valueLabel = Html.clean(valueLabel);
            this.edges = Objects.requireNonNull(edges, "edges").clone();
            this.inside = Objects.requireNonNull(inside, "inside").clone();
            this.outside = Objects.requireNonNull(outside, "outside").clone();
            if (inside.length == 0 || edges.length != inside.length + 1 || outside.length != inside.length) {
                throw new IllegalArgumentException("histogram '" + title + "' needs k >= 1 bins, k + 1 edges and k"
                        + " outside counts; got " + edges.length + " edges, " + inside.length + " and "
                        + outside.length + " counts");
            }
            for (int b = 0; b < edges.length; b++) {
                finite(edges[b], "bin edge");
                if (b > 0 && edges[b] < edges[b - 1]) {
                    throw new IllegalArgumentException("histogram '" + title + "': bin edges must ascend");
                }
            }
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
            int k = inside.length;
            int n = 0;
            int outCount = 0;
            for (int b = 0; b < k; b++) {
                n += inside[b] + outside[b];
                outCount += outside[b];
            }
            if (n == 0) {
                throw new IllegalArgumentException("histogram '" + title + "' has no value");
            }
            double start = edges[0];
            double hi = edges[k];
            // Every value equal: one bin of zero width, drawn one percent of the value wide so it shows.
            double width = hi > start ? (hi - start) / k : Math.max(Math.abs(start) * 0.01, 1e-9);
            if (!(hi > start)) {
                start -= width / 2;
            }
            XYSeries in = new XYSeries("within limits (" + (n - outCount) + ")", false, false);
            XYSeries out = new XYSeries("\u2716 outside limits (" + outCount + ")", false, false);
            for (int b = 0; b < k; b++) {
                // Each bar on the caller's own edges, so the chart shows exactly the bins the text and JSON list.
                double centre = hi > edges[0] ? (edges[b] + edges[b + 1]) / 2 : start + (b + 0.5) * width;
                in.add(centre, inside[b]);
                out.add(centre, outside[b]);
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
            // Bins of a non-negative quantity never sit on a negative axis: zero is the floor.
            xa.setRange(xmin >= 0 ? Math.max(0, xmin - pad) : xmin - pad, xmax + pad);
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
                    : (title.isEmpty() ? "Histogram" : title) + ": " + n + " values of " + valueLabel + " in " + k
                    + (k == 1 ? " bin, " : " bins, ") + outCount + " outside the limits.";
            return new Chart(chart, widthPx, heightPx, desc);
        }

        private static ValueMarker limitMarker(double at, String label, boolean spec, boolean upperSide,
                                               boolean lowered) {
            ValueMarker m = new ValueMarker(at);
            // Spec limits solid and in ink, as on the control charts (whose dashed lines are control limits).
            m.setPaint(spec ? ChartStyle.INK : ChartStyle.MUTED);
            m.setStroke(spec ? new BasicStroke(2.2f) : ChartStyle.dashed(1.5f, 2f, 3f));
            m.setLabel(label);
            m.setLabelFont(ChartStyle.NOTE);
            m.setLabelPaint(ChartStyle.INK);
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
