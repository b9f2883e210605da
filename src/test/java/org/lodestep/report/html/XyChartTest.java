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

    @Test
    void topAxisShowsTheBottomAxisRangeInItsOwnUnit() throws Exception {
        double[] rate = {100, 400, 700, 1000};
        // 200 full steps per revolution: rpm = full steps/s × 60 / 200 (references §1)
        Chart c = XyChart.builder("", "step rate (full steps/s)", "vibration (g RMS)")
                .line("response", rate, new double[] {1, 3, 2, 1}).topAxis("speed (rpm)", v -> v * 60 / 200).build();
        List<String> texts = XmlCheck.texts(XmlCheck.parse(c.toSvg().markup()), XmlCheck.SVG, "text");
        assertTrue(texts.contains("speed (rpm)") && texts.contains("step rate (full steps/s)"), texts.toString());
        org.jfree.chart.plot.XYPlot p = (org.jfree.chart.plot.XYPlot) c.jfree().getPlot();
        assertEquals(p.getDomainAxis(0).getLowerBound() * 0.3, p.getDomainAxis(1).getLowerBound(), 1e-9);
        assertEquals(p.getDomainAxis(0).getUpperBound() * 0.3, p.getDomainAxis(1).getUpperBound(), 1e-9);
    }

    @Test
    void aFurtherPanelSharesTheXAxisAndTakesTheLooksOfTheFirstPanelsSeriesWithoutLegendEntries() throws Exception {
        double[] t = {0, 1, 2, 3};
        Chart c = XyChart.builder("", "t/\u03C4", "i/i\u221E")
                .referenceLine("model", t, new double[] {0, 0.63, 0.86, 0.95})
                .points("coil 1", t, new double[] {0, 0.6, 0.87, 0.95})
                .points("coil 2", t, new double[] {0, 0.65, 0.85, 0.96})
                .panel("residual").horizontalLine(0, "", Status.INFO)
                .line("coil 1", t, new double[] {0, -0.03, 0.01, 0})
                .line("coil 2", t, new double[] {0, 0.02, -0.01, 0.01}).build();
        List<String> texts = XmlCheck.texts(XmlCheck.parse(c.toSvg().markup()), XmlCheck.SVG, "text");
        assertEquals(1, texts.stream().filter("coil 1"::equals).count(), "one legend entry per series: " + texts);
        assertTrue(texts.contains("residual") && texts.contains("model"), texts.toString());
        org.jfree.chart.plot.CombinedDomainXYPlot p = (org.jfree.chart.plot.CombinedDomainXYPlot) c.jfree().getPlot();
        assertEquals(2, p.getSubplots().size());
        // the residual of coil 2 is drawn in coil 2's colour
        assertEquals(p.getSubplots().get(0).getRenderer().getSeriesPaint(2),
                p.getSubplots().get(1).getRenderer().getSeriesPaint(1));
        assertThrows(IllegalStateException.class, () -> XyChart.builder("", "x", "y").panel("r"));
    }
}
