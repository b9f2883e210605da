package org.lodestep.report.html;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;
import org.w3c.dom.Document;

class ControlChartTest {

    @Test
    void marksAndNamesOnlyThePointBeyondTheLimits() throws Exception {
        // Limits of the individuals chart from Montgomery, Introduction to Statistical Quality Control, 7th ed.,
        // ch. 6 (x-bar +/- 2.66 MR-bar), as worked for these ten values in Montgomery, Statistical Quality Control,
        // 7th ed., ch. 6, references §20:
        // UCL 2.13027, LCL 1.89973. The sample adds an eleventh value, 2.16, above the UCL.
        Document d = XmlCheck.parse(SampleReports.individuals().toSvg().markup());
        List<String> texts = XmlCheck.texts(d, XmlCheck.SVG, "text");
        assertTrue(texts.contains("QX-4420"), texts.toString());
        for (int i = 0; i < 10; i++) {
            assertFalse(texts.contains("QX-" + (4410 + i)), "QX-" + (4410 + i) + " is within the limits");
        }
        assertTrue(texts.contains("beyond a limit"), texts.toString());
        assertTrue(texts.contains("UCL 2.130"), texts.toString());
    }

    @Test
    void movingRangeChartMarksTheLargeRange() throws Exception {
        // MR chart UCL = D4 * MR-bar = 3.267 * 0.043333 = 0.14157 (Montgomery, Statistical Quality Control, 7th ed.,
        // ch. 6, references §20, n = 2 constants);
        // the range from 1.99 to 2.16 (0.17) lies above it and is run number 11.
        Document d = XmlCheck.parse(SampleReports.movingRange().toSvg().markup());
        assertTrue(XmlCheck.texts(d, XmlCheck.SVG, "text").contains("#11"));
    }

    @Test
    void callerFlagsOverrideTheLimitTest() throws Exception {
        double[] v = {1, 2, 3};
        Chart c = ControlChart.builder("", "x", v, new String[] {"a", "b", "c"})
                .centre(2, "CL").upperLimit(10, "UCL").lowerLimit(-10, "LCL")
                .flagged(new boolean[] {false, true, false}).build();
        List<String> texts = XmlCheck.texts(XmlCheck.parse(c.toSvg().markup()), XmlCheck.SVG, "text");
        assertTrue(texts.contains("b"));
        assertFalse(texts.contains("a"));
        assertTrue(texts.contains("marked out of control"), texts.toString());
    }

    @Test
    void rejectsLabelsThatDoNotMatchTheValues() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> ControlChart.builder("", "x", new double[] {1, 2}, new String[] {"a"}));
        assertTrue(e.getMessage().contains("1 point labels for 2 values"), e.getMessage());
        assertThrows(IllegalArgumentException.class,
                () -> ControlChart.builder("", "x", new double[] {1}, null).upperLimit(Double.NaN, "UCL"));
    }

    // Spec limits are their own labelled lines; a failed point gets the caller's note and the "failed the spec"
    // legend entry; named runs replace the run numbers on the x axis.
    @Test
    void specLimitsAndTheFailedPointAreDrawnAndNamed() throws Exception {
        double[] v = {1.90, 1.92, 2.30, 1.91};
        String[] serials = {"S1", "S2", "S3", "S4"};
        Chart c = ControlChart.builder("", "R (ohm)", v, serials).centre(2.0, "CL").upperLimit(2.4, "UCL 2.4")
                .lowerLimit(1.6, "LCL 1.6").lowerSpec(1.71, "LSL 1.71 ohm").upperSpec(2.09, "USL 2.09 ohm")
                .failed(new boolean[] {false, false, true, false}, new String[] {"", "", "S3 2.3 > USL", ""})
                .runs("motor serial", serials).build();
        List<String> texts = XmlCheck.texts(XmlCheck.parse(c.toSvg().markup()), XmlCheck.SVG, "text");
        assertTrue(texts.containsAll(List.of("LSL 1.71 ohm", "USL 2.09 ohm", "S3 2.3 > USL", "failed the spec",
                "motor serial", "S1", "S4")), texts.toString());
        assertFalse(texts.contains("run order (motor number)"), texts.toString());
    }

    @Test
    void logScaleRefusesValuesThatHaveNoLogarithm() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> ControlChart.builder("", "R", new double[] {0, 1e9}, null).centre(1e8, "CL").logScale().build());
        assertTrue(e.getMessage().contains("logarithmic axis needs positive values"), e.getMessage());
    }
}
