package org.lodestep.report.html;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.lodestep.safety.Hazard;

/**
 * Reports built from synthetic data with known shapes, for the structural and browser tests. The scenario (workshop,
 * part and serial numbers) is invented.
 */
final class SampleReports {
    /** A string that would break markup if it were not escaped. */
    static final String HOSTILE = "<script>alert('x')</script> & \"quoted\" \u0001</svg>";

    private SampleReports() {
    }

    static double[] range(double from, double to, int n) {
        double[] v = new double[n];
        for (int i = 0; i < n; i++) {
            v[i] = from + (to - from) * i / (n - 1);
        }
        return v;
    }

    /** Response against step rate with a main resonance near 306 steps/s and a sub-multiple near 153 steps/s. */
    static Chart responseCurve() {
        double[] rate = range(50, 1000, 191);
        double[] level = new double[rate.length];
        for (int i = 0; i < rate.length; i++) {
            level[i] = 0.4 + 2.6 / (1 + Math.pow((rate[i] - 306) / 14, 2))
                    + 0.9 / (1 + Math.pow((rate[i] - 153) / 9, 2)) + 0.0004 * rate[i];
        }
        return XyChart.builder("Vibration against step rate", "step rate (full steps/s)", "vibration (m/s\u00B2 RMS)")
                .line("measured response", rate, level)
                .band(288, 326, "R1 288\u2013326 steps/s: avoid", Status.FAIL)
                .band(146, 161, "R2 146\u2013161 steps/s: cross quickly", Status.WARN)
                .verticalLine(306.29, "predicted f\u2099: 306 steps/s", Status.INFO)
                .yFromZero(true)
                .build();
    }

    /** A spectrogram of a sweep: the step-rate line and its harmonics, and a fixed resonance near 306 Hz. */
    static Chart spectrogram() {
        double[] rate = range(50, 1000, 96);
        double[] freq = range(0, 2000, 129);
        double[][] level = new double[rate.length][freq.length];
        for (int i = 0; i < rate.length; i++) {
            for (int j = 0; j < freq.length; j++) {
                double f = freq[j];
                double v = -80;
                for (int h = 1; h <= 4; h++) {
                    v = Math.max(v, -20 - 6 * h - Math.pow((f - h * rate[i]) / 18, 2));
                }
                double res = -30 - Math.pow((f - 306) / 25, 2) + 20 / (1 + Math.pow((rate[i] - 306) / 15, 2));
                level[i][j] = Math.max(v, Math.max(res, -80));
            }
        }
        return HeatMapChart.builder("Spectrogram of the sweep", "step rate (full steps/s)", rate, "frequency (Hz)",
                        freq, "level (dB re 1 m/s\u00B2)", level)
                .levelRange(-80, 0)
                .band(288, 326, "R1", Status.FAIL)
                .build();
    }

    /** A ring-down, f_n = 300 Hz and zeta = 0.05, sampled at 10 kHz, with its fitted envelope curve. */
    static Chart ringDown() {
        int n = 300;
        double[] t = new double[n];
        double[] x = new double[n];
        double fn = 300;
        double zeta = 0.05;
        double wn = 2 * Math.PI * fn;
        double wd = wn * Math.sqrt(1 - zeta * zeta);
        java.util.Random rnd = new java.util.Random(7);
        for (int i = 0; i < n; i++) {
            t[i] = i / 10_000.0;
            x[i] = Math.exp(-zeta * wn * t[i]) * Math.cos(wd * t[i]) + 0.02 * rnd.nextGaussian();
        }
        double[] tf = range(0, t[n - 1], 600);
        double[] xf = new double[tf.length];
        for (int i = 0; i < tf.length; i++) {
            xf[i] = Math.exp(-zeta * wn * tf[i]) * Math.cos(wd * tf[i]);
        }
        return XyChart.fitOverData("Ring-down after a single step", "time (s)", "acceleration (normalised)",
                "measured", t, x, "fit: f\u2099 300.0 Hz, \u03B6 0.050", tf, xf);
    }

    /** A lot of 40 winding resistances around 2.0 ohm, three of them out of a 1.80-2.20 ohm spec. */
    static Chart histogram() {
        double[] r = new double[40];
        java.util.Random rnd = new java.util.Random(11);
        for (int i = 0; i < r.length; i++) {
            r[i] = 2.0 + 0.06 * rnd.nextGaussian();
        }
        r[5] = 2.27;
        r[17] = 1.74;
        r[30] = 2.24;
        List<org.lodestep.qa.Histogram.Bin> bins = org.lodestep.qa.Histogram.of(r, 1.80, 2.20);
        double[] edges = new double[bins.size() + 1];
        int[] inside = new int[bins.size()];
        int[] outside = new int[bins.size()];
        for (int i = 0; i < bins.size(); i++) {
            edges[i] = bins.get(i).lower();
            edges[i + 1] = bins.get(i).upper();
            inside[i] = bins.get(i).insideSpec();
            outside[i] = bins.get(i).outsideSpec();
        }
        return HistogramChart.builder("Winding resistance, lot L-2207", "resistance at 20 \u00B0C (\u03A9)", edges,
                        inside, outside)
                .lowerLimit(1.80, "LSL 1.80 \u03A9").upperLimit(2.20, "USL 2.20 \u03A9")
                .reference(2.00, "nominal 2.00 \u03A9")
                .build();
    }

    /** Reference-check item 20 data (I-MR), with one extra high value to mark. */
    static final double[] IMR = {2.02, 2.05, 1.98, 2.01, 2.04, 2.00, 1.97, 2.03, 2.06, 1.99, 2.16};

    static Chart individuals() {
        String[] serials = new String[IMR.length];
        for (int i = 0; i < serials.length; i++) {
            serials[i] = "QX-" + (4410 + i);
        }
        return ControlChart.builder("Individuals", "resistance (\u03A9)", IMR, serials)
                .centre(2.015, "x\u0304 2.015").upperLimit(2.13027, "UCL 2.130").lowerLimit(1.89973, "LCL 1.900")
                .build();
    }

    static Chart movingRange() {
        double[] mr = new double[IMR.length - 1];
        for (int i = 1; i < IMR.length; i++) {
            mr[i - 1] = Math.abs(IMR[i] - IMR[i - 1]);
        }
        return ControlChart.builder("Moving range", "moving range (\u03A9)", mr, null)
                .firstIndex(2).centre(0.043333, "MR\u0304 0.043").upperLimit(0.14157, "UCL 0.142")
                .build();
    }

    static WiringDiagram sixLeadSeries() {
        return WiringDiagram.builder("Bipolar series, 6-lead")
                .coil("A", "Black", "Green", "Yellow").coil("B", "Red", "Blue", "White")
                .connect("Black", DriverTerminal.A_PLUS).connect("Green", DriverTerminal.A_MINUS)
                .connect("Red", DriverTerminal.B_PLUS).connect("Blue", DriverTerminal.B_MINUS)
                .insulate("Yellow").insulate("White")
                .build();
    }

    static WiringDiagram eightLeadParallel() {
        return WiringDiagram.builder("Bipolar parallel, 8-lead")
                .coil("A", "Black", "Green").coil("A", "Orange", "Red/White")
                .coil("B", "Red", "Blue").coil("B", "Yellow", "Brown")
                .connect("Black", DriverTerminal.A_PLUS).connect("Orange", DriverTerminal.A_PLUS)
                .connect("Green", DriverTerminal.A_MINUS).connect("Red/White", DriverTerminal.A_MINUS)
                .connect("Red", DriverTerminal.B_PLUS).connect("Yellow", DriverTerminal.B_PLUS)
                .connect("Blue", DriverTerminal.B_MINUS).connect("Brown", DriverTerminal.B_MINUS)
                .build();
    }

    static WiringDiagram eightLeadSeries() {
        return WiringDiagram.builder("Bipolar series, 8-lead")
                .coil("A", "Black", "Green").coil("A", "Orange", "Red/White")
                .coil("B", "Red", "Blue").coil("B", "Yellow", "Brown")
                .connect("Black", DriverTerminal.A_PLUS).tie("Green", "Orange")
                .connect("Red/White", DriverTerminal.A_MINUS)
                .connect("Red", DriverTerminal.B_PLUS).tie("Blue", "Yellow")
                .connect("Brown", DriverTerminal.B_MINUS)
                .build();
    }

    static WiringDiagram fiveLeadUnipolar() {
        return WiringDiagram.builder("Unipolar, 5-lead")
                .coil("A", "Black", "Green", "Red").coil("B", "Blue", "White", "Red")
                .connect("Black", DriverTerminal.A_PLUS).connect("Green", DriverTerminal.A_MINUS)
                .connect("Blue", DriverTerminal.B_PLUS).connect("White", DriverTerminal.B_MINUS)
                .connect("Red", DriverTerminal.COMMON)
                .build();
    }

    private static final Map<String, HtmlReport> EVERYTHING = new java.util.concurrent.ConcurrentHashMap<>();

    /** Everything the module draws, in one document, with hostile strings in every user field (built once each). */
    static HtmlReport everything(String hostile) {
        return EVERYTHING.computeIfAbsent(hostile, SampleReports::buildEverything);
    }

    private static HtmlReport buildEverything(String hostile) {
        Map<String, String> card = new LinkedHashMap<>();
        card.put("Step angle", "1.8\u00B0 (200 steps/rev)");
        card.put("Winding resistance", "2.00 \u03A9");
        card.put("Winding inductance", "4.00 mH");
        card.put("Lead label " + hostile, hostile);
        return HtmlReport.builder("Sample report", "Motor " + hostile)
                .subtitle("Bench 3, Harrowgate Motion Repair (invented)")
                .meta("Serial", hostile).meta("Operator", hostile).meta("Source", "captures/" + hostile + ".csv")
                .verdict(Status.WARN, "Two resonance bands found", "Avoid 288\u2013326 steps/s. " + hostile)
                .safety(Hazard.MOVING_AXIS)
                .section("Wiring")
                .figure(sixLeadSeries().toSvg(), "Six-lead motor in bipolar series.")
                .figure(WiringDiagram.builder("Custom " + hostile).coil("A", hostile, "B" + hostile)
                        .coil("B", "Red", "Blue").connect(hostile, DriverTerminal.A_PLUS)
                        .connect("B" + hostile, DriverTerminal.A_MINUS).connect("Red", DriverTerminal.B_PLUS)
                        .connect("Blue", DriverTerminal.B_MINUS).build().toSvg(), "Leads named " + hostile)
                .findings(List.of(new HtmlReport.Finding(Status.PASS, "Windings balanced within 1.2 %"),
                        new HtmlReport.Finding(Status.FAIL, "Lead " + hostile + " shorted to frame")))
                .section("Motor card")
                .facts(card)
                .section("Resonance " + hostile)
                .figure(responseCurve().toSvg(), "Response against step rate.")
                .figure(spectrogram().toSvg(), "Spectrogram.")
                .figure(ringDown().toSvg(), "Ring-down.")
                .section("Lot")
                .table(HtmlTable.builder("Verdicts " + hostile, "Serial", "R (\u03A9)", "Verdict")
                        .row(Cell.text("QX-4410"), Cell.number("2.02"), Cell.status(Status.PASS))
                        .row(Status.FAIL, Cell.text(hostile), Cell.number("2.27"), Cell.status(Status.FAIL, hostile))
                        .build())
                .figure(histogram().toSvg(), "Histogram.")
                .figure(individuals().toSvg(), "Individuals chart.")
                .figure(movingRange().toSvg(), "Moving-range chart.")
                .footer("Lodestep test " + hostile)
                .build();
    }
}
