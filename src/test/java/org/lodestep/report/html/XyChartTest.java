package org.lodestep.report.html;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;
import org.w3c.dom.Document;

class XyChartTest {

    @Test
    void bandsAreLabelledWithStatusSymbolAndText() throws Exception {
        Document d = XmlCheck.parse(SampleReports.responseCurve().toSvg().markup());
        List<String> texts = XmlCheck.texts(d, XmlCheck.SVG, "text");
        assertTrue(texts.contains("\u2716 R1 288\u2013326 steps/s: avoid"), texts.toString());
        assertTrue(texts.contains("\u25B2 R2 146\u2013161 steps/s: cross quickly"), texts.toString());
        assertTrue(texts.contains("step rate (full steps/s)"), texts.toString());
        assertTrue(texts.contains("vibration (m/s\u00B2 RMS)"), "y label is text, not outlines: " + texts);
    }

    @Test
    void describesBandsForReadersWhoCannotSeeTheChart() {
        String desc = SampleReports.responseCurve().toSvg().description();
        assertTrue(desc.contains("fail band R1 288\u2013326 steps/s: avoid"), desc);
        assertTrue(desc.contains("warning band"), desc);
    }

    @Test
    void fitOverDataNamesBothSeriesInTheLegend() throws Exception {
        Document d = XmlCheck.parse(SampleReports.ringDown().toSvg().markup());
        List<String> texts = XmlCheck.texts(d, XmlCheck.SVG, "text");
        assertTrue(texts.contains("measured"), texts.toString());
        assertTrue(texts.contains("fit: f\u2099 300.0 Hz, \u03B6 0.050"), texts.toString());
    }

    @Test
    void longTraceStaysSmallInSvg() {
        // 200 000 samples of a 50 Hz sine at 10 kHz: far more points than pixels across.
        int n = 200_000;
        double[] t = new double[n];
        double[] y = new double[n];
        for (int i = 0; i < n; i++) {
            t[i] = i / 10_000.0;
            y[i] = Math.sin(2 * Math.PI * 50 * t[i]);
        }
        String svg = XyChart.builder("", "time (s)", "x").line("trace", t, y).build().toSvg().markup();
        assertTrue(svg.length() < 200_000, "SVG is " + svg.length() + " characters");
    }

    @Test
    void rejectsMismatchedSeriesAndBackwardBand() {
        XyChart.Builder b = XyChart.builder("t", "x", "y");
        assertThrows(IllegalArgumentException.class, () -> b.line("s", new double[3], new double[2]));
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> b.band(5, 4, "b", Status.FAIL));
        assertTrue(e.getMessage().contains("5.0 .. 4.0"), e.getMessage());
        assertThrows(IllegalStateException.class, b::build);
    }

    @Test
    void logAxisSkipsNonPositiveValuesInsteadOfFailing() throws Exception {
        Chart c = XyChart.builder("PSD", "frequency (Hz)", "PSD (V\u00B2/Hz)").logY(true)
                .line("psd", new double[] {1, 2, 3, 4}, new double[] {1e-3, 0, 1e-5, 1e-6}).build();
        assertEquals("svg", XmlCheck.parse(c.toSvg().markup()).getDocumentElement().getLocalName());
    }

    @Test
    void secondHalfOfAnEnvelopeSharesTheLegendEntryOfTheFirst() throws Exception {
        double[] t = {0, 1, 2, 3};
        Chart c = XyChart.builder("", "t (s)", "x").points("measured", t, new double[] {1, -0.5, 0.25, -0.1})
                .line("envelope", t, new double[] {1, 0.5, 0.25, 0.12})
                .sameAsPrevious(t, new double[] {-1, -0.5, -0.25, -0.12}).build();
        java.util.List<String> texts = XmlCheck.texts(XmlCheck.parse(c.toSvg().markup()), XmlCheck.SVG, "text");
        assertEquals(1, texts.stream().filter("envelope"::equals).count(), texts.toString());
        assertThrows(IllegalStateException.class, () -> XyChart.builder("", "x", "y").sameAsPrevious(t, t));
    }

    @Test
    void aSeriesThatDrawsNothingGetsNoLegendEntry() throws Exception {
        double[] t = {0, 1, 2, 3};
        double nan = Double.NaN;
        Chart c = XyChart.builder("", "t (s)", "x").line("measured", t, new double[] {1, 2, 3, 4})
                .line("crossings", t, new double[] {nan, nan, nan, nan})
                .line("one point", t, new double[] {nan, 5, nan, nan}).build();
        java.util.List<String> texts = XmlCheck.texts(XmlCheck.parse(c.toSvg().markup()), XmlCheck.SVG, "text");
        assertTrue(texts.contains("measured"), texts.toString());
        assertFalse(texts.contains("crossings"), texts.toString());
        assertFalse(texts.contains("one point"), "a line through one point draws nothing: " + texts);
    }
}
