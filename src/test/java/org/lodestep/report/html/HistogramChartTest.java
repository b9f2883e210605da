package org.lodestep.report.html;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;
import org.w3c.dom.Document;

class HistogramChartTest {

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
        Chart c = HistogramChart.builder("", "R (\u03A9)", new double[] {2, 2}, new int[] {3}, new int[] {0}).build();
        assertEquals("svg", XmlCheck.parse(c.toSvg().markup()).getDocumentElement().getLocalName());
    }

    // Bins of a non-negative quantity from zero (phase imbalance, 0..20 %): the axis starts at zero, not below it.
    @Test
    void nonNegativeBinsNeverShowANegativeAxis() throws Exception {
        Chart c = HistogramChart.builder("", "imbalance (%)", new double[] {0, 5, 10, 15, 20}, new int[] {9, 1, 0, 1},
                new int[] {0, 1, 0, 1}).upperLimit(5, "USL 5 %").build();
        List<String> texts = XmlCheck.texts(XmlCheck.parse(c.toSvg().markup()), XmlCheck.SVG, "text");
        assertTrue(texts.contains("0"), texts.toString());
        assertTrue(texts.stream().noneMatch(t -> t.strip().matches("-\\d.*")), texts.toString());
    }
}
