package org.lodestep.report.html;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.image.BufferedImage;
import java.util.ArrayList;
import java.util.List;
import java.util.Objects;

import org.jfree.chart.JFreeChart;
import org.jfree.chart.annotations.XYDataImageAnnotation;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.plot.IntervalMarker;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.LookupPaintScale;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.chart.title.PaintScaleLegend;
import org.jfree.chart.ui.Layer;
import org.jfree.chart.ui.RectangleAnchor;
import org.jfree.chart.ui.RectangleEdge;
import org.jfree.chart.ui.RectangleInsets;
import org.jfree.chart.ui.TextAnchor;
import org.jfree.data.xy.XYSeriesCollection;

/**
 * A heat map of a level over two axes: the spectrogram of a step-rate sweep (x = step rate, y = frequency, colour =
 * level). The grid becomes one raster image inside the SVG, so a large spectrogram stays a small file; axes, bands
 * and the colour scale stay vector.
 *
 * <p>The palette runs from pale to dark with steadily falling lightness, so the order of levels survives grey-scale
 * printing and does not depend on telling hues apart; the colour scale beside the plot gives the values.
 */
public final class HeatMapChart {
    /** Palette stops, pale (low) to dark (high): our own sand, sage, teal, blue and ink. */
    private static final Color[] STOPS = {
        new Color(0xfbf8ef), new Color(0xe9dfa8), new Color(0x9cc49a), new Color(0x3f8f8a),
        new Color(0x2a5b82), new Color(0x1b2440)
    };

    private HeatMapChart() {
    }

    /**
     * Starts a heat map.
     *
     * @param x     column positions (step rates), strictly increasing
     * @param y     row positions (frequencies), strictly increasing
     * @param level level[i][j] at (x[i], y[j]); NaN cells are left blank
     */
    public static Builder builder(String title, String xLabel, double[] x, String yLabel, double[] y,
                                  String levelLabel, double[][] level) {
        return new Builder(title, xLabel, x, yLabel, y, levelLabel, level);
    }

    /** The palette colour of a fraction {@code t} in [0, 1] of the level range. */
    static Color colorAt(double t) {
        double u = Math.max(0, Math.min(1, t)) * (STOPS.length - 1);
        int i = Math.min((int) u, STOPS.length - 2);
        double f = u - i;
        Color a = STOPS[i];
        Color b = STOPS[i + 1];
        return new Color((int) Math.round(a.getRed() + f * (b.getRed() - a.getRed())),
                (int) Math.round(a.getGreen() + f * (b.getGreen() - a.getGreen())),
                (int) Math.round(a.getBlue() + f * (b.getBlue() - a.getBlue())));
    }

    private record Band(double from, double to, String label, Status status) {
    }

    /** Collects the grid, the level range and overlay bands. */
    public static final class Builder {
        private final String title;
        private final String xLabel;
        private final String yLabel;
        private final String levelLabel;
        private final double[] x;
        private final double[] y;
        private final double[][] level;
        private double levelMin = Double.NaN;
        private double levelMax = Double.NaN;
        private final List<Band> bands = new ArrayList<>();
        private int widthPx = 760;
        private int heightPx = 420;
        private String description;

        private Builder(String title, String xLabel, double[] x, String yLabel, double[] y, String levelLabel,
                        double[][] level) {
            this.title = Html.clean(title);
            this.xLabel = Html.clean(xLabel);
            this.yLabel = Html.clean(yLabel);
            this.levelLabel = Html.clean(levelLabel);
            this.x = increasing(Objects.requireNonNull(x, "x"), "x");
            this.y = increasing(Objects.requireNonNull(y, "y"), "y");
            Objects.requireNonNull(level, "level");
            if (level.length != x.length) {
                throw new IllegalArgumentException("level has " + level.length + " columns, x has " + x.length);
            }
            this.level = new double[level.length][];
            for (int i = 0; i < level.length; i++) {
                if (level[i].length != y.length) {
                    throw new IllegalArgumentException("level column " + i + " has " + level[i].length
                            + " values, y has " + y.length);
                }
                this.level[i] = level[i].clone();
            }
        }

        private static double[] increasing(double[] v, String name) {
            if (v.length < 2) {
                throw new IllegalArgumentException(name + " needs at least 2 values, got " + v.length);
            }
            for (int i = 0; i < v.length; i++) {
                if (!Double.isFinite(v[i]) || (i > 0 && !(v[i] > v[i - 1]))) {
                    throw new IllegalArgumentException(name + " must be finite and strictly increasing; value "
                            + i + " is " + v[i]);
                }
            }
            return v.clone();
        }

        /** Fixes the level range of the palette (default: the finite minimum and maximum of the grid). */
        public Builder levelRange(double min, double max) {
            if (!Double.isFinite(min) || !Double.isFinite(max) || !(max > min)) {
                throw new IllegalArgumentException("level range needs finite min < max, got " + min + " .. " + max);
            }
            this.levelMin = min;
            this.levelMax = max;
            return this;
        }

        /** A band over the x axis, outlined and labelled over the map (a resonance band). */
        public Builder band(double fromX, double toX, String label, Status status) {
            if (!Double.isFinite(fromX) || !Double.isFinite(toX) || toX < fromX) {
                throw new IllegalArgumentException("band needs finite from <= to, got " + fromX + " .. " + toX);
            }
            bands.add(new Band(fromX, toX, Html.clean(label), Objects.requireNonNull(status, "status")));
            return this;
        }

        /** Design size in CSS pixels (default 760 x 420). */
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

        public Chart build() {
            double lo = levelMin;
            double hi = levelMax;
            if (Double.isNaN(lo)) {
                lo = Double.POSITIVE_INFINITY;
                hi = Double.NEGATIVE_INFINITY;
                for (double[] col : level) {
                    for (double v : col) {
                        if (Double.isFinite(v)) {
                            lo = Math.min(lo, v);
                            hi = Math.max(hi, v);
                        }
                    }
                }
                if (!Double.isFinite(lo)) {
                    throw new IllegalArgumentException("heat map '" + title + "' has no finite level");
                }
                if (hi == lo) {
                    hi = lo + 1;
                }
            }
            // Cell edges halfway between grid positions; the outer cells extend by half their neighbour's pitch.
            double x0 = x[0] - (x[1] - x[0]) / 2;
            double x1 = x[x.length - 1] + (x[x.length - 1] - x[x.length - 2]) / 2;
            double y0 = y[0] - (y[1] - y[0]) / 2;
            double y1 = y[y.length - 1] + (y[y.length - 1] - y[y.length - 2]) / 2;
            BufferedImage img = raster(x0, x1, y0, y1, lo, hi);

            NumberAxis xa = new NumberAxis(xLabel);
            xa.setAutoRangeIncludesZero(false);
            xa.setRange(x0, x1);
            NumberAxis ya = new NumberAxis(yLabel);
            ya.setAutoRangeIncludesZero(false);
            ya.setRange(y0, y1);
            XYLineAndShapeRenderer r = new XYLineAndShapeRenderer(false, false);
            XYPlot plot = new XYPlot(new XYSeriesCollection(), xa, ya, r);
            plot.setDomainGridlinesVisible(false);
            plot.setRangeGridlinesVisible(false);
            r.addAnnotation(new XYDataImageAnnotation(img, x0, y0, x1 - x0, y1 - y0, true), Layer.BACKGROUND);
            for (int i = 0; i < bands.size(); i++) {
                plot.addDomainMarker(bandMarker(bands.get(i), i), Layer.FOREGROUND);
            }
            JFreeChart chart = new JFreeChart(title.isEmpty() ? null : title, ChartStyle.TITLE, plot, false);

            LookupPaintScale scale = new LookupPaintScale(lo, hi, Color.WHITE);
            int steps = 64;
            for (int k = 0; k < steps; k++) {
                scale.add(lo + (hi - lo) * k / steps, colorAt((k + 0.5) / steps));
            }
            NumberAxis la = new NumberAxis(levelLabel);
            la.setRange(lo, hi);
            ChartStyle.axis(la);
            PaintScaleLegend legend = new PaintScaleLegend(scale, la);
            legend.setPosition(RectangleEdge.RIGHT);
            legend.setMargin(new RectangleInsets(8, 12, 8, 4));
            legend.setStripWidth(14);
            legend.setStripOutlineVisible(true);
            legend.setSubdivisionCount(steps);
            legend.setBackgroundPaint(Color.WHITE);
            chart.addSubtitle(legend);
            String desc = description != null ? description
                    : (title.isEmpty() ? "Heat map" : title) + ": " + levelLabel + " over " + xLabel + " and "
                    + yLabel + ", pale for low and dark for high.";
            return new Chart(chart, widthPx, heightPx, desc);
        }

        /** One pixel per grid cell where the grid is even; nearest cell on a finer raster where it is not. */
        private BufferedImage raster(double x0, double x1, double y0, double y1, double lo, double hi) {
            int w = even(x) ? x.length : Math.min(1600, Math.max(400, 2 * x.length));
            int h = even(y) ? y.length : Math.min(1200, Math.max(300, 2 * y.length));
            BufferedImage img = new BufferedImage(w, h, BufferedImage.TYPE_INT_ARGB);
            for (int px = 0; px < w; px++) {
                int i = nearest(x, x0 + (px + 0.5) * (x1 - x0) / w);
                for (int py = 0; py < h; py++) {
                    // Image rows run top-down, the y axis bottom-up.
                    int j = nearest(y, y1 - (py + 0.5) * (y1 - y0) / h);
                    double v = level[i][j];
                    img.setRGB(px, py, Double.isFinite(v) ? colorAt((v - lo) / (hi - lo)).getRGB() : 0);
                }
            }
            return img;
        }

        private static boolean even(double[] v) {
            double pitch = (v[v.length - 1] - v[0]) / (v.length - 1);
            for (int i = 1; i < v.length; i++) {
                if (Math.abs(v[i] - v[i - 1] - pitch) > 1e-6 * Math.abs(pitch)) {
                    return false;
                }
            }
            return true;
        }

        private static int nearest(double[] v, double at) {
            int k = java.util.Arrays.binarySearch(v, at);
            if (k >= 0) {
                return k;
            }
            int ins = -k - 1;
            if (ins == 0) {
                return 0;
            }
            if (ins == v.length) {
                return v.length - 1;
            }
            return at - v[ins - 1] <= v[ins] - at ? ins - 1 : ins;
        }

        private IntervalMarker bandMarker(Band b, int index) {
            Color c = ChartStyle.statusColor(b.status());
            IntervalMarker m = new IntervalMarker(b.from(), b.to());
            // Over a heat map a fill would hide the data: outline the band and label it instead.
            m.setPaint(new Color(255, 255, 255, 0));
            m.setOutlinePaint(b.status() == Status.FAIL ? new Color(0xd2452f) : new Color(0xe0a020));
            m.setOutlineStroke(b.status() == Status.FAIL ? new BasicStroke(2f) : ChartStyle.dashed(2f, 6f, 4f));
            m.setLabel(b.status().symbol() + " " + b.label());
            m.setLabelFont(ChartStyle.NOTE);
            m.setLabelPaint(c.darker());
            m.setLabelBackgroundColor(new Color(255, 255, 255, 225));
            m.setLabelAnchor(RectangleAnchor.TOP_LEFT);
            m.setLabelTextAnchor(TextAnchor.TOP_LEFT);
            m.setLabelOffset(new RectangleInsets(4 + (index % 3) * 18, 3, 2, 2));
            return m;
        }
    }
}
