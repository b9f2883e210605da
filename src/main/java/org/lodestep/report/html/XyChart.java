package org.lodestep.report.html;

import java.awt.BasicStroke;
import java.awt.Color;
import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.function.DoubleUnaryOperator;

import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.AxisLocation;
import org.jfree.chart.axis.AxisState;
import org.jfree.chart.axis.LogarithmicAxis;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.axis.ValueAxis;
import org.jfree.chart.plot.CombinedDomainXYPlot;
import org.jfree.chart.plot.IntervalMarker;
import org.jfree.chart.plot.PlotRenderingInfo;
import org.jfree.chart.plot.PlotOrientation;
import org.jfree.chart.plot.SeriesRenderingOrder;
import org.jfree.chart.plot.ValueMarker;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.chart.ui.Layer;
import org.jfree.chart.ui.LengthAdjustmentType;
import org.jfree.chart.ui.RectangleAnchor;
import org.jfree.chart.ui.RectangleEdge;
import org.jfree.chart.ui.RectangleInsets;
import org.jfree.chart.ui.TextAnchor;
import org.jfree.data.Range;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;

/**
 * Line and point charts over a numeric x axis, with shaded, labelled bands (resonance bands against step rate),
 * vertical and horizontal reference lines, and fitted curves drawn over measured points; optionally a second x axis
 * along the top in another unit of the same quantity ({@link Builder#topAxis}), and further panels stacked under the
 * first on the same x axis ({@link Builder#panel}: residuals under a fit).
 *
 * <pre>{@code
 * Chart c = XyChart.builder("Response vs step rate", "step rate (full steps/s)", "vibration (m/s² RMS)")
 *         .line("response", rates, levels)
 *         .band(118, 131, "R1 118–131 steps/s", Status.FAIL)
 *         .build();
 * }</pre>
 */
public final class XyChart {
    /** Above this many points a marker series is drawn as a thin line. */
    static final int MAX_MARKERS = 200;

    private XyChart() {
    }

    /** Starts a chart with its title and axis labels (put the unit in each label). */
    public static Builder builder(String title, String xLabel, String yLabel) {
        return new Builder(title, xLabel, yLabel);
    }

    /** Measured points with a fitted curve drawn over them (ring-down, RL step response). */
    public static Chart fitOverData(String title, String xLabel, String yLabel, String dataLabel, double[] xData,
                                    double[] yData, String fitLabel, double[] xFit, double[] yFit) {
        return builder(title, xLabel, yLabel).points(dataLabel, xData, yData).line(fitLabel, xFit, yFit)
                .describe(title + ": " + dataLabel + " as points, " + fitLabel + " as a line.").build();
    }

    /**
     * One series; {@code styleOf} is the index of the series whose look it shares (its own index otherwise),
     * {@code reference} draws it in plain ink outside the series styles (a model curve every series is compared with).
     */
    private record Series(String name, double[] x, double[] y, boolean lines, boolean shapes, int styleOf,
                          boolean reference) {
        Series(String name, double[] x, double[] y, boolean lines, boolean shapes, int styleOf) {
            this(name, x, y, lines, shapes, styleOf, false);
        }
    }

    /** A panel: its y label, its series and its horizontal lines; every panel shares the x axis. */
    private static final class Panel {
        final String yLabel;
        final List<Series> series = new ArrayList<>();
        final List<Line> lines = new ArrayList<>();

        Panel(String yLabel) {
            this.yLabel = yLabel;
        }
    }

    private record Band(double from, double to, String label, Status status) {
    }

    private record Line(boolean vertical, double at, String label, Status status) {
    }

    /** Collects series, bands and reference lines. */
    public static final class Builder {
        private final String title;
        private final String xLabel;
        private final String yLabel;
        private final List<Series> first = new ArrayList<>();
        /** The panel series go into: the first, or the latest {@link #panel}. */
        private List<Series> series = first;
        private final List<Panel> lower = new ArrayList<>();
        private String topLabel;
        private DoubleUnaryOperator topMap;
        private double topTick = Double.NaN;
        private final List<Band> bands = new ArrayList<>();
        private final List<Band> yBands = new ArrayList<>();
        private final List<Line> lines = new ArrayList<>();
        private boolean logY;
        private boolean yFromZero;
        private int widthPx = 760;
        private int heightPx = 380;
        private String description;

        private Builder(String title, String xLabel, String yLabel) {
            this.title = Html.clean(title);
            this.xLabel = Html.clean(xLabel);
            this.yLabel = Html.clean(yLabel);
        }

        /** A series drawn as a line without markers. */
        public Builder line(String name, double[] x, double[] y) {
            series.add(checked(name, x, y, true, false));
            return this;
        }

        /**
         * A line in plain ink, outside the series colours and dashes: the one model curve several measured series
         * are compared with. It has its own legend entry.
         */
        public Builder referenceLine(String name, double[] x, double[] y) {
            Series s = checked(name, x, y, true, false);
            series.add(new Series(s.name(), s.x(), s.y(), true, false, -1, true));
            return this;
        }

        /**
         * A second x axis along the top, in another unit of the same quantity: {@code map} turns an x value into the
         * top axis's unit and must be linear and increasing (full steps/s to rpm or pulses/s).
         */
        public Builder topAxis(String label, DoubleUnaryOperator map) {
            return topAxis(label, map, Double.NaN);
        }

        /** As {@link #topAxis(String, DoubleUnaryOperator)}, with a tick every {@code tickUnit} (90° electrical). */
        public Builder topAxis(String label, DoubleUnaryOperator map, double tickUnit) {
            this.topLabel = Html.clean(label);
            this.topMap = Objects.requireNonNull(map, "map");
            if (!Double.isNaN(tickUnit) && !(tickUnit > 0 && Double.isFinite(tickUnit))) {
                throw new IllegalArgumentException("tick unit must be positive, got " + tickUnit);
            }
            this.topTick = tickUnit;
            return this;
        }

        /**
         * Starts a further panel under the ones before, sharing their x axis (a fit's residuals under the fit). Series
         * and horizontal lines added after this go into the new panel; its series take the looks of the first panel's
         * series in order (the residual of series k looks like series k) and have no legend entry of their own.
         * Bands and vertical lines are drawn across every panel.
         */
        public Builder panel(String yLabel) {
            if (series.isEmpty()) {
                throw new IllegalStateException("a further panel needs series in the first");
            }
            Panel p = new Panel(Html.clean(yLabel));
            lower.add(p);
            series = p.series;
            return this;
        }

        /** A series drawn as markers only (measured samples). */
        public Builder points(String name, double[] x, double[] y) {
            series.add(checked(name, x, y, false, true));
            return this;
        }

        /**
         * A second line drawn exactly like the previous series, without its own legend entry: the lower half of an
         * envelope, a band's other edge.
         */
        public Builder sameAsPrevious(double[] x, double[] y) {
            if (series.isEmpty()) {
                throw new IllegalStateException("sameAsPrevious needs a series before it");
            }
            Series prev = series.get(series.size() - 1);
            Series s = checked(prev.name(), x, y, prev.lines(), prev.shapes());
            int style = prev.styleOf() >= 0 ? prev.styleOf() : series.size() - 1;
            series.add(new Series(s.name(), s.x(), s.y(), s.lines(), s.shapes(), style, prev.reference()));
            return this;
        }

        /** A series drawn as a line with a marker at each point. */
        public Builder lineWithPoints(String name, double[] x, double[] y) {
            series.add(checked(name, x, y, true, true));
            return this;
        }

        /**
         * A shaded band from {@code fromX} to {@code toX} on the x axis, labelled at its top. The status sets the
         * fill and the edge pattern (solid for fail, dashed for warning, dotted otherwise) and prefixes its symbol.
         */
        public Builder band(double fromX, double toX, String label, Status status) {
            if (!Double.isFinite(fromX) || !Double.isFinite(toX) || toX < fromX) {
                throw new IllegalArgumentException("band needs finite from <= to, got " + fromX + " .. " + toX);
            }
            bands.add(new Band(fromX, toX, Html.clean(label), Objects.requireNonNull(status, "status")));
            return this;
        }

        /**
         * A shaded band from {@code fromY} to {@code toY} on the y axis (a step-rate band across a rate-against-time
         * chart), drawn and labelled like {@link #band}.
         */
        public Builder bandY(double fromY, double toY, String label, Status status) {
            if (!Double.isFinite(fromY) || !Double.isFinite(toY) || toY < fromY) {
                throw new IllegalArgumentException("band needs finite from <= to, got " + fromY + " .. " + toY);
            }
            yBands.add(new Band(fromY, toY, Html.clean(label), Objects.requireNonNull(status, "status")));
            return this;
        }

        /** A labelled vertical line at {@code x} (a predicted frequency, a limit). */
        public Builder verticalLine(double x, String label, Status status) {
            requireFinite(x, "line position");
            lines.add(new Line(true, x, Html.clean(label), Objects.requireNonNull(status, "status")));
            return this;
        }

        /** A labelled horizontal line at {@code y} (a threshold). */
        public Builder horizontalLine(double y, String label, Status status) {
            requireFinite(y, "line position");
            Line l = new Line(false, y, Html.clean(label), Objects.requireNonNull(status, "status"));
            (lower.isEmpty() ? lines : lower.get(lower.size() - 1).lines).add(l);
            return this;
        }

        /** A logarithmic y axis (all y values must be positive). */
        public Builder logY(boolean on) {
            this.logY = on;
            return this;
        }

        /** Makes the y axis start at zero. */
        public Builder yFromZero(boolean on) {
            this.yFromZero = on;
            return this;
        }

        /** Design size in CSS pixels (default 760 x 380). */
        public Builder size(int widthPx, int heightPx) {
            this.widthPx = widthPx;
            this.heightPx = heightPx;
            return this;
        }

        /** The text alternative of the chart (default: title and series names). */
        public Builder describe(String text) {
            this.description = text;
            return this;
        }

        private static Series checked(String name, double[] x, double[] y, boolean lines, boolean shapes) {
            Objects.requireNonNull(x, "x");
            Objects.requireNonNull(y, "y");
            if (x.length != y.length) {
                throw new IllegalArgumentException("series '" + name + "' has " + x.length + " x values but "
                        + y.length + " y values");
            }
            return new Series(Html.clean(name), x.clone(), y.clone(), lines, shapes, -1);
        }

        private static void requireFinite(double v, String what) {
            if (!Double.isFinite(v)) {
                throw new IllegalArgumentException(what + " must be finite, got " + v);
            }
        }

        public Chart build() {
            if (first.isEmpty() || lower.stream().anyMatch(p -> p.series.isEmpty())) {
                throw new IllegalStateException("chart '" + title + "' has a panel without series");
            }
            NumberAxis x = new NumberAxis(xLabel);
            x.setAutoRangeIncludesZero(false);
            XYPlot main = panelPlot(first, yAxis(), lines, false);
            XYPlot plot = main;
            if (!lower.isEmpty()) {
                CombinedDomainXYPlot combined = new CombinedDomainXYPlot(x);
                combined.setGap(8);
                // the first panel carries the data; each further one (residuals) a third of its height
                combined.add(main, 3);
                for (Panel p : lower) {
                    NumberAxis ya = new NumberAxis(p.yLabel);
                    ya.setAutoRangeIncludesZero(false);
                    combined.add(panelPlot(p.series, ya, p.lines, true), 1);
                }
                plot = combined;
            } else {
                main.setDomainAxis(x);
            }
            if (topMap != null) {
                LinkedAxis top = new LinkedAxis(topLabel, x, topMap);
                if (!Double.isNaN(topTick)) {
                    top.setTickUnit(new org.jfree.chart.axis.NumberTickUnit(topTick,
                            new java.text.DecimalFormat("0")), false, true);
                }
                plot.setDomainAxis(1, top);
                plot.setDomainAxisLocation(1, AxisLocation.TOP_OR_LEFT);
            }
            long legendEntries = first.stream().filter(s -> s.styleOf() < 0).count();
            JFreeChart chart = new JFreeChart(title.isEmpty() ? null : title, ChartStyle.TITLE, plot,
                    legendEntries > 1);
            String desc = description != null ? description : defaultDescription();
            return new Chart(chart, widthPx, heightPx, desc);
        }

        private ValueAxis yAxis() {
            if (logY) {
                LogarithmicAxis la = new LogarithmicAxis(yLabel);
                la.setAllowNegativesFlag(false);
                la.setStrictValuesFlag(false);
                return la;
            }
            NumberAxis na = new NumberAxis(yLabel);
            na.setAutoRangeIncludesZero(yFromZero);
            return na;
        }

        /**
         * One panel's plot. In a further panel ({@code below}) series k takes the look of the first panel's k-th
         * styled series and has no legend entry; bands and vertical lines are drawn there unlabelled.
         */
        private XYPlot panelPlot(List<Series> list, ValueAxis y, List<Line> hLines, boolean below) {
            boolean log = logY && !below;
            XYSeriesCollection data = new XYSeriesCollection();
            XYLineAndShapeRenderer r = new XYLineAndShapeRenderer();
            // each series' look: a series of its own takes the next look (a reference line takes none), a
            // series drawn like an earlier one takes that one's
            int[] looks = new int[list.size()];
            int styled = 0;
            for (int i = 0; i < list.size(); i++) {
                Series s = list.get(i);
                looks[i] = s.styleOf() >= 0 ? looks[s.styleOf()] : s.reference() ? 0 : styled++;
            }
            for (int i = 0; i < list.size(); i++) {
                Series s = list.get(i);
                // Hundreds of markers bury each other and bloat the SVG: a dense measured trace becomes a thin line.
                boolean dense = s.shapes() && s.x().length > MAX_MARKERS;
                // Two series may share a name; JFreeChart needs unique keys, the legend shows the name.
                XYSeries xs = new XYSeries(new SeriesKey(i, s.name()), false, true);
                double[][] xy = s.shapes() && !dense ? new double[][] {s.x(), s.y()}
                        : Decimate.minMax(s.x(), s.y(), widthPx);
                for (int k = 0; k < xy[0].length; k++) {
                    if (Double.isFinite(xy[0][k]) && Double.isFinite(xy[1][k]) && (!log || xy[1][k] > 0)) {
                        xs.add(xy[0][k], xy[1][k], false);
                    }
                }
                data.addSeries(xs);
                int look = looks[i];
                r.setSeriesLinesVisible(i, s.lines() || dense);
                r.setSeriesShapesVisible(i, s.shapes() && !dense);
                if (s.reference()) {
                    r.setSeriesPaint(i, ChartStyle.INK);
                    r.setSeriesStroke(i, new BasicStroke(1.5f));
                } else {
                    r.setSeriesPaint(i, ChartStyle.seriesPaint(look));
                    r.setSeriesStroke(i, dense ? new BasicStroke(1f) : ChartStyle.seriesStroke(look));
                }
                r.setSeriesShape(i, s.x().length > 60 ? ChartStyle.smallShape(look) : ChartStyle.seriesShape(look));
                r.setSeriesShapesFilled(i, look % 2 == 0);
                // no legend entry for a series that draws nothing (no point, or a lone point of a line without markers)
                boolean draws = xs.getItemCount() >= (s.shapes() && !dense ? 1 : 2);
                r.setSeriesVisibleInLegend(i, s.styleOf() < 0 && !below && draws);
            }
            r.setDrawSeriesLineAsPath(true);
            XYPlot plot = new XYPlot(data, null, y, r);
            plot.setOrientation(PlotOrientation.VERTICAL);
            // Later series on top: a fitted curve is drawn over the data it was fitted to.
            plot.setSeriesRenderingOrder(SeriesRenderingOrder.FORWARD);
            if (!bands.isEmpty() && !below) {
                // Head room for the band labels above the data.
                y.setUpperMargin(0.08 + 0.07 * Math.min(bands.size(), 3));
            }
            for (int i = 0; i < bands.size(); i++) {
                IntervalMarker m = bandMarker(bands.get(i), i);
                if (below) {
                    m.setLabel(null);
                }
                plot.addDomainMarker(m, Layer.BACKGROUND);
            }
            if (!below) {
                for (int i = 0; i < yBands.size(); i++) {
                    plot.addRangeMarker(bandMarker(yBands.get(i), i), Layer.BACKGROUND);
                }
            }
            int vertical = 0;
            for (Line l : lines) {
                if (l.vertical()) {
                    ValueMarker m = lineMarker(l);
                    m.setLabelAnchor(RectangleAnchor.BOTTOM_RIGHT);
                    m.setLabelTextAnchor(TextAnchor.BOTTOM_LEFT);
                    // stagger the labels of neighbouring lines so they do not print over each other
                    m.setLabelOffset(new RectangleInsets(4, 4, 18 + 17 * (vertical++ % 3), 4));
                    if (below) {
                        m.setLabel(null);
                    }
                    plot.addDomainMarker(m, Layer.FOREGROUND);
                }
            }
            for (Line l : hLines) {
                if (!l.vertical()) {
                    ValueMarker m = lineMarker(l);
                    m.setLabelAnchor(RectangleAnchor.TOP_RIGHT);
                    m.setLabelTextAnchor(TextAnchor.BOTTOM_RIGHT);
                    plot.addRangeMarker(m, Layer.FOREGROUND);
                }
            }
            return plot;
        }

        private static ValueMarker lineMarker(Line l) {
            ValueMarker m = new ValueMarker(l.at());
            m.setPaint(ChartStyle.statusColor(l.status()));
            m.setStroke(ChartStyle.dashed(1.5f, 6f, 4f));
            m.setLabel(l.label().isEmpty() ? null : l.label());
            m.setLabelFont(ChartStyle.TICK);
            m.setLabelPaint(ChartStyle.INK);
            m.setLabelBackgroundColor(new Color(255, 255, 255, 220));
            return m;
        }

        private IntervalMarker bandMarker(Band b, int index) {
            Color c = ChartStyle.statusColor(b.status());
            IntervalMarker m = new IntervalMarker(b.from(), b.to());
            m.setPaint(new Color(c.getRed(), c.getGreen(), c.getBlue(), b.status() == Status.FAIL ? 60 : 45));
            m.setOutlinePaint(c);
            m.setOutlineStroke(switch (b.status()) {
                case FAIL -> new BasicStroke(1.5f);
                case WARN -> ChartStyle.dashed(1.5f, 6f, 4f);
                default -> ChartStyle.dashed(1.5f, 2f, 3f);
            });
            m.setLabel(b.status().symbol() + " " + b.label());
            m.setLabelFont(ChartStyle.NOTE);
            m.setLabelPaint(c.darker());
            m.setLabelBackgroundColor(new Color(255, 255, 255, 215));
            m.setLabelAnchor(RectangleAnchor.TOP_LEFT);
            m.setLabelTextAnchor(TextAnchor.TOP_LEFT);
            // Stagger labels of neighbouring bands so they do not print over each other.
            m.setLabelOffset(new RectangleInsets(4 + (index % 3) * 16, 3, 2, 2));
            m.setLabelOffsetType(LengthAdjustmentType.EXPAND);
            return m;
        }

        private String defaultDescription() {
            StringBuilder sb = new StringBuilder(title.isEmpty() ? "Chart" : title).append(": ").append(yLabel)
                    .append(" against ").append(xLabel);
            for (Band b : bands) {
                sb.append("; ").append(b.status().word()).append(" band ").append(b.label());
            }
            for (Band b : yBands) {
                sb.append("; ").append(b.status().word()).append(" band ").append(b.label());
            }
            return sb.append('.').toString();
        }
    }

    /**
     * A top axis that shows the bottom axis's range in another unit: its range is taken from the bottom axis each
     * time the chart is laid out or drawn, through a linear map.
     */
    static final class LinkedAxis extends NumberAxis {
        private final transient ValueAxis base;
        private final transient DoubleUnaryOperator map;

        LinkedAxis(String label, ValueAxis base, DoubleUnaryOperator map) {
            super(label);
            this.base = base;
            this.map = map;
            setAutoRange(false);
        }

        private void follow() {
            double lo = map.applyAsDouble(base.getLowerBound());
            double hi = map.applyAsDouble(base.getUpperBound());
            if (Double.isFinite(lo) && Double.isFinite(hi) && hi > lo) {
                setRange(new Range(lo, hi), true, false);
            }
        }

        @Override
        public org.jfree.chart.axis.AxisSpace reserveSpace(java.awt.Graphics2D g2, org.jfree.chart.plot.Plot plot,
                                                           java.awt.geom.Rectangle2D plotArea, RectangleEdge edge,
                                                           org.jfree.chart.axis.AxisSpace space) {
            follow();
            return super.reserveSpace(g2, plot, plotArea, edge, space);
        }

        @Override
        public AxisState draw(java.awt.Graphics2D g2, double cursor, java.awt.geom.Rectangle2D plotArea,
                              java.awt.geom.Rectangle2D dataArea, RectangleEdge edge, PlotRenderingInfo info) {
            follow();
            return super.draw(g2, cursor, plotArea, dataArea, edge, info);
        }
    }

    /** A series key that is unique per chart but shows only the name in the legend. */
    record SeriesKey(int index, String name) implements Comparable<SeriesKey> {
        @Override
        public int compareTo(SeriesKey o) {
            return Integer.compare(index, o.index);
        }

        @Override
        public String toString() {
            return name;
        }
    }
}
