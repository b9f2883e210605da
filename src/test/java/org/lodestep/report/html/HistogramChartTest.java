package org.lodestep.report.html;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.w3c.dom.Document;

class HistogramChartTest {

    @Test
    void limitsFallOnBinEdges() {
        double[] v = {1.74, 1.95, 2.0, 2.02, 2.05, 2.24, 2.27};
        HistogramChart.Bins b = HistogramChart.bins(v, 1.80, 2.20, 6);
        double lowEdge = (1.80 - b.start()) / b.width();
        double highEdge = (2.20 - b.start()) / b.width();
        assertEquals(Math.rint(lowEdge), lowEdge, 1e-9);
        assertEquals(Math.rint(highEdge), highEdge, 1e-9);
    }

    @Test
    void countsEveryValueOnceAndSeparatesOutOfSpec() {
        double[] v = {1.74, 1.95, 2.0, 2.02, 2.05, 2.24, 2.27, Double.NaN};
        HistogramChart.Bins b = HistogramChart.bins(v, 1.80, 2.20, 6);
        assertEquals(4, Arrays.stream(b.inside()).sum());
        assertEquals(3, b.outsideCount());
    }

    @Test
    void valuesExactlyAtTheLimitsCountAsInsideAndSitInsideTheLines() {
        double[] v = {1.80, 2.00, 2.20};
        HistogramChart.Bins b = HistogramChart.bins(v, 1.80, 2.20, 4);
        assertEquals(0, b.outsideCount());
        for (int i = 0; i < b.inside().length; i++) {
            double left = b.start() + i * b.width();
            double right = left + b.width();
            if (b.inside()[i] > 0) {
                assertTrue(left >= 1.80 - 1e-9 && right <= 2.20 + 1e-9, "bin " + left + ".." + right);
            }
        }
    }

    @Test
    void legendAndLimitLabelsNameTheCounts() throws Exception {
        Document d = XmlCheck.parse(SampleReports.histogram().toSvg().markup());
        List<String> texts = XmlCheck.texts(d, XmlCheck.SVG, "text");
        assertTrue(texts.contains("within limits (37)"), texts.toString());
        assertTrue(texts.contains("\u2716 outside limits (3)"), texts.toString());
        assertTrue(texts.contains("LSL 1.80 \u03A9"), texts.toString());
        assertTrue(texts.contains("USL 2.20 \u03A9"), texts.toString());
    }

    @Test
    void singleRepeatedValueStillDraws() throws Exception {
        Chart c = HistogramChart.builder("", "R (\u03A9)", new double[] {2, 2, 2}).build();
        assertEquals("svg", XmlCheck.parse(c.toSvg().markup()).getDocumentElement().getLocalName());
    }
}
