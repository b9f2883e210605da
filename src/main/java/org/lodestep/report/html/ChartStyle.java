package org.lodestep.report.html;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.awt.Paint;
import java.awt.Shape;
import java.awt.Stroke;
import java.awt.geom.Ellipse2D;
import java.awt.geom.Rectangle2D;

import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.ValueAxis;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.title.LegendTitle;
import org.jfree.chart.title.TextTitle;
import org.jfree.chart.ui.RectangleEdge;
import org.jfree.chart.ui.RectangleInsets;
import org.jfree.chart.util.ShapeUtils;

/**
 * The look shared by every chart: white ground, quiet grid, dark ink, and series that differ in dash pattern and
 * marker shape as well as colour, so a chart printed in grey still reads.
 */
final class ChartStyle {
    static {
        // Charts render off-screen; a server or CI has no display.
        if (System.getProperty("java.awt.headless") == null) {
            System.setProperty("java.awt.headless", "true");
        }
        // Rotated labels (the y axis) as SVG text, not glyph outlines: smaller, selectable, searchable.
        org.jfree.chart.text.TextUtils.setUseDrawRotatedStringWorkaround(false);
    }

    static final Color INK = new Color(0x1d2733);
    static final Color MUTED = new Color(0x5b6673);
    static final Color GRID = new Color(0xe2dfd6);
    static final Color FAIL = new Color(0x9e2a1e);
    static final Color WARN = new Color(0xb07800);
    static final Color PASS = new Color(0x2f6b3b);
    static final Color INFO = new Color(0x2b5d8a);
    static final Color PROVISIONAL = new Color(0x5a3d86);

    /** Series colours in order: deep blue, rust, moss, slate, plum. */
    static final Color[] SERIES = {
        new Color(0x2b5d8a), new Color(0xb5562b), new Color(0x4f7a35), new Color(0x5b6673), new Color(0x7a4a86)
    };

    static final Font TITLE = new Font(Font.SANS_SERIF, Font.BOLD, 15);
    static final Font LABEL = new Font(Font.SANS_SERIF, Font.PLAIN, 13);
    static final Font TICK = new Font(Font.SANS_SERIF, Font.PLAIN, 12);
    static final Font NOTE = new Font(Font.SANS_SERIF, Font.BOLD, 12);

    private ChartStyle() {
    }

    /** The dash pattern of series {@code i}: solid, dashed, dotted, dash-dot, long dash. */
    static Stroke seriesStroke(int i) {
        float w = 2.0f;
        return switch (i % 5) {
            case 0 -> new BasicStroke(w, BasicStroke.CAP_ROUND, BasicStroke.JOIN_ROUND);
            case 1 -> dashed(w, 8f, 5f);
            case 2 -> dashed(w, 2f, 4f);
            case 3 -> dashed(w, 10f, 4f, 2f, 4f);
            default -> dashed(w, 16f, 6f);
        };
    }

    /** The marker of series {@code i}: circle, square, triangle, diamond, cross. */
    static Shape seriesShape(int i) {
        double s = 7;
        return switch (i % 5) {
            case 0 -> new Ellipse2D.Double(-s / 2, -s / 2, s, s);
            case 1 -> new Rectangle2D.Double(-s / 2, -s / 2, s, s);
            case 2 -> ShapeUtils.createUpTriangle((float) (s / 2 + 0.5));
            case 3 -> ShapeUtils.createDiamond((float) (s / 2 + 0.5));
            default -> ShapeUtils.createDiagonalCross((float) (s / 2), 1f);
        };
    }

    /** A smaller, hollow-friendly marker for series with many points. */
    static Shape smallShape(int i) {
        double s = 4.5;
        return switch (i % 5) {
            case 0 -> new Ellipse2D.Double(-s / 2, -s / 2, s, s);
            case 1 -> new Rectangle2D.Double(-s / 2, -s / 2, s, s);
            case 2 -> ShapeUtils.createUpTriangle((float) (s / 2 + 0.5));
            case 3 -> ShapeUtils.createDiamond((float) (s / 2 + 0.5));
            default -> ShapeUtils.createDiagonalCross((float) (s / 2), 0.7f);
        };
    }

    static Paint seriesPaint(int i) {
        return SERIES[i % SERIES.length];
    }

    static BasicStroke dashed(float width, float... pattern) {
        return new BasicStroke(width, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 10f, pattern, 0f);
    }

    /** The colour of a status, for limit lines and bands. */
    static Color statusColor(Status s) {
        return switch (s) {
            case PASS -> PASS;
            case WARN -> WARN;
            case FAIL -> FAIL;
            case INFO -> INFO;
            case PROVISIONAL -> PROVISIONAL;
        };
    }

    /** Applies the shared look to a chart whose plot is an {@link XYPlot}. */
    static void apply(JFreeChart chart) {
        chart.setBackgroundPaint(Color.WHITE);
        chart.setAntiAlias(true);
        chart.setTextAntiAlias(true);
        chart.setPadding(new RectangleInsets(6, 6, 6, 12));
        TextTitle t = chart.getTitle();
        if (t != null) {
            t.setFont(TITLE);
            t.setPaint(INK);
            t.setHorizontalAlignment(org.jfree.chart.ui.HorizontalAlignment.LEFT);
            t.setPadding(new RectangleInsets(2, 4, 8, 4));
        }
        LegendTitle legend = chart.getLegend();
        if (legend != null) {
            legend.setItemFont(TICK);
            legend.setItemPaint(INK);
            legend.setFrame(org.jfree.chart.block.BlockBorder.NONE);
            legend.setBackgroundPaint(Color.WHITE);
            legend.setPosition(RectangleEdge.BOTTOM);
        }
        if (chart.getPlot() instanceof XYPlot p) {
            plot(p);
            if (p instanceof org.jfree.chart.plot.CombinedDomainXYPlot c) {
                for (XYPlot sub : c.getSubplots()) {
                    plot(sub);
                }
            }
        }
    }

    private static void plot(XYPlot p) {
        p.setBackgroundPaint(Color.WHITE);
        p.setOutlinePaint(MUTED);
        p.setDomainGridlinePaint(GRID);
        p.setRangeGridlinePaint(GRID);
        p.setDomainGridlineStroke(new BasicStroke(1f));
        p.setRangeGridlineStroke(new BasicStroke(1f));
        p.setAxisOffset(RectangleInsets.ZERO_INSETS);
        for (int i = 0; i < p.getDomainAxisCount(); i++) {
            axis(p.getDomainAxis(i));
        }
        for (int i = 0; i < p.getRangeAxisCount(); i++) {
            axis(p.getRangeAxis(i));
        }
    }

    static void axis(ValueAxis a) {
        if (a == null) {
            return;
        }
        a.setLabelFont(LABEL);
        a.setLabelPaint(INK);
        a.setTickLabelFont(TICK);
        a.setTickLabelPaint(INK);
        a.setAxisLinePaint(MUTED);
        a.setTickMarkPaint(MUTED);
    }
}
