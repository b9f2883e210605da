package org.lodestep.report.html;

import java.awt.Graphics2D;
import java.awt.geom.Rectangle2D;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.concurrent.atomic.AtomicLong;

import org.jfree.chart.ChartUtils;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.plot.CombinedDomainXYPlot;
import org.jfree.chart.plot.XYPlot;
import org.jfree.data.xy.XYDataset;
import org.jfree.svg.SVGGraphics2D;
import org.jfree.svg.ViewBox;


/**
 * A finished chart, ready to render as inline SVG (through JFreeSVG) or as PNG at its design size.
 *
 * <p>Made by {@link XyChart}, {@link HeatMapChart}, {@link HistogramChart} and {@link ControlChart}.
 */
public final class Chart {
    /** Gives each SVG its own id prefix, so several charts can share one HTML document. */
    private static final AtomicLong SERIAL = new AtomicLong();

    private final JFreeChart chart;
    private final int widthPx;
    private final int heightPx;
    private final String description;

    Chart(JFreeChart chart, int widthPx, int heightPx, String description) {
        if (widthPx < 100 || heightPx < 80) {
            throw new IllegalArgumentException("chart size " + widthPx + " x " + heightPx
                    + " px is too small (at least 100 x 80 px)");
        }
        this.chart = Objects.requireNonNull(chart, "chart");
        this.widthPx = widthPx;
        this.heightPx = heightPx;
        this.description = description == null ? "" : description;
        ChartStyle.apply(chart);
    }

    /** The chart itself, for tests in this package that check axes and series after layout. */
    JFreeChart jfree() {
        return chart;
    }

    /**
     * The points drawn for the first series called {@code name}, after any thinning, as {x, y}; null when no series
     * has that name. For checking a chart against the records it was drawn from.
     */
    public double[][] series(String name) {
        List<XYPlot> plots = new ArrayList<>();
        if (chart.getPlot() instanceof CombinedDomainXYPlot c) {
            plots.addAll(c.getSubplots());
        } else if (chart.getPlot() instanceof XYPlot p) {
            plots.add(p);
        }
        for (XYPlot p : plots) {
            for (int d = 0; d < p.getDatasetCount(); d++) {
                XYDataset ds = p.getDataset(d);
                for (int s = 0; ds != null && s < ds.getSeriesCount(); s++) {
                    if (ds.getSeriesKey(s).toString().equals(name)) {
                        int n = ds.getItemCount(s);
                        double[][] xy = new double[2][n];
                        for (int i = 0; i < n; i++) {
                            xy[0][i] = ds.getXValue(s, i);
                            xy[1][i] = ds.getYValue(s, i);
                        }
                        return xy;
                    }
                }
            }
        }
        return null;
    }

    /** Design width in CSS pixels. */
    public int widthPx() {
        return widthPx;
    }

    /** Design height in CSS pixels. */
    public int heightPx() {
        return heightPx;
    }

    /** The chart as an {@code <svg>} element that scales to its container's width. */
    public SvgFragment toSvg() {
        SVGGraphics2D g = new SVGGraphics2D(widthPx, heightPx);
        String id = "ch" + SERIAL.incrementAndGet();
        g.setDefsKeyPrefix(id + "_");
        // Two decimals of a CSS pixel are finer than any screen or printer; full doubles triple the file size.
        g.setGeomDoubleConverter(Chart::twoDecimals);
        chart.draw(g, new Rectangle2D.Double(0, 0, widthPx, heightPx));
        String svg = g.getSVGElement(id, false, new ViewBox(0, 0, widthPx, heightPx), null, null);
        return new SvgFragment(svg, description);
    }

    static String twoDecimals(double v) {
        if (!Double.isFinite(v)) {
            return "0";
        }
        long scaled = Math.round(v * 100);
        if (scaled % 100 == 0) {
            return Long.toString(scaled / 100);
        }
        String sign = scaled < 0 ? "-" : "";
        long a = Math.abs(scaled);
        long frac = a % 100;
        return sign + (a / 100) + "." + (frac % 10 == 0 ? Long.toString(frac / 10) : (frac < 10 ? "0" : "") + frac);
    }

    /** The chart as PNG bytes at {@code scale} times its design size (2 for sharp printing). */
    public byte[] toPng(double scale) {
        if (!(scale > 0 && scale <= 8)) {
            throw new IllegalArgumentException("PNG scale must be in (0, 8], got " + scale);
        }
        int w = (int) Math.round(widthPx * scale);
        int h = (int) Math.round(heightPx * scale);
        java.awt.image.BufferedImage img = new java.awt.image.BufferedImage(w, h,
                java.awt.image.BufferedImage.TYPE_INT_RGB);
        Graphics2D g = img.createGraphics();
        try {
            g.scale(scale, scale);
            chart.draw(g, new Rectangle2D.Double(0, 0, widthPx, heightPx));
        } finally {
            g.dispose();
        }
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        try {
            ChartUtils.writeBufferedImageAsPNG(out, img);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return out.toByteArray();
    }

    /** Writes the chart as a PNG file, whole or not at all. */
    public void writePng(Path file, double scale) throws IOException {
        OutputFile.write(file, toPng(scale));
    }

    /** Writes the chart as a standalone SVG file, whole or not at all. */
    public void writeSvg(Path file) throws IOException {
        OutputFile.write(file, toSvg().asDocument().getBytes(StandardCharsets.UTF_8));
    }
}
