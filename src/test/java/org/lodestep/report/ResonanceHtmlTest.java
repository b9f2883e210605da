package org.lodestep.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import java.util.Locale;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.w3c.dom.Document;

import com.fasterxml.jackson.databind.JsonNode;

import org.lodestep.resonance.ResponsePoint;
import org.lodestep.workflow.Progress;
import org.lodestep.workflow.ResonanceRingdown;
import org.lodestep.workflow.ResonanceSweep;

class ResonanceHtmlTest {
    private static final Path DIR = Path.of("sample-captures", "resonance");

    @Test
    void sweepReportShadesEveryBandAndDrawsTheSpectrogramAgainstStepRate(@TempDir Path tmp) throws Exception {
        Path html = tmp.resolve("sweep.html");
        String[] common = {"resonance", "sweep", DIR.resolve("belt-axis-sweep.csv").toString(), "--microsteps", "16",
            "--travel-mm-per-rev", "40", "--natural-hz", "116", "--damping-ratio", "0.084"};
        Document d = ReportCli.report(html, 0, concat(common, "--report", html.toString()));
        JsonNode json = Json.mapper().readTree(ReportCli.run(concat(common, "--json")).out());
        int bands = json.get("bands").size();
        assertTrue(bands >= 1, "the sample sweep has resonance bands");
        // Two charts: the response curve and the spectrogram (one embedded raster).
        assertEquals(2, ReportCli.count(d, ReportCli.SVG, "svg"));
        assertEquals(1, ReportCli.count(d, ReportCli.SVG, "image"));
        List<String> svgText = ReportCli.texts(d, ReportCli.SVG, "text");
        for (int i = 1; i <= bands; i++) {
            String label = "R" + i;
            assertTrue(svgText.stream().anyMatch(t -> t.contains(label + " ")), label + " on the response: " + svgText);
        }
        assertTrue(svgText.contains("step rate (full steps/s)"), svgText.toString());
        // The band table gives each band's range in pulses/s at 16 microsteps, as the analysis computed it.
        String cells = String.join("|", ReportCli.texts(d, ReportCli.XHTML, "td"));
        JsonNode first = json.get("bands").get(0);
        String from = ResonanceHtml.sig(first.get("start_full_steps_per_s").asDouble() * 16);
        assertTrue(cells.contains(from), from + " in " + cells);
        // Finding bands is the normal result of a sweep: the banner informs, it does not fail (no slip here).
        assertTrue(ReportCli.verdictClass(d).contains("st-info"), ReportCli.verdictClass(d));
        assertTrue(String.join(" ", ReportCli.texts(d, ReportCli.XHTML, "aside")).contains("licensed practice"));
    }

    @Test
    void ringDownReportDrawsTheFitOverTheDataAndStatesItsNumbers(@TempDir Path tmp) throws Exception {
        Path html = tmp.resolve("ringdown.html");
        String csv = DIR.resolve("belt-axis-ringdown.csv").toString();
        Document d = ReportCli.report(html, 0, "resonance", "ringdown", csv, "--report", html.toString());
        JsonNode json = Json.mapper().readTree(ReportCli.run("resonance", "ringdown", csv, "--json").out());
        double fn = json.get("natural_frequency_hz").asDouble();
        String dd = String.join("|", ReportCli.texts(d, ReportCli.XHTML, "dd"));
        // to the tenth of a hertz shown (the fit's own uncertainty is about 1 Hz)
        assertTrue(dd.contains(String.format(Locale.ROOT, "%.1f Hz", fn)), fn + " in " + dd);
        List<String> svgText = ReportCli.texts(d, ReportCli.SVG, "text");
        assertTrue(svgText.contains("measured"), svgText.toString());
        assertTrue(svgText.stream().anyMatch(t -> t.startsWith("fitted envelope")), svgText.toString());
    }

    @Test
    void sweepResponseDrawsTheThresholdAndBaselineTheAnalysisUsedWithARateAxisInPulsesPerSecondOnTop(@TempDir Path tmp)
            throws Exception {
        Path html = tmp.resolve("sweep.html");
        String csv = DIR.resolve("belt-axis-sweep.csv").toString();
        Document d = ReportCli.report(html, 0, "resonance", "sweep", csv, "--microsteps", "16", "--report",
                html.toString());
        List<String> svgText = ReportCli.texts(d, ReportCli.SVG, "text");
        assertTrue(svgText.containsAll(List.of("step rate (full steps/s)", "pulse rate (pulses/s at 16\u00D7)",
                "vibration (g RMS)", "detection threshold", "baseline (running low quantile)")), svgText.toString());
        // the lines drawn are the sweep result's own threshold and baseline, point for point
        ResonanceSweep.Result r = ResonanceSweep.analyse(DIR.resolve("belt-axis-sweep.csv"),
                ResonanceSweep.Settings.defaults(), Progress.NONE);
        org.lodestep.report.html.Chart c = ResonanceHtml.responseChart(r.sweep(), r.units(), "g");
        double[][] thr = c.series("detection threshold");
        double[][] base = c.series("baseline (running low quantile)");
        List<ResponsePoint> pts = r.sweep().response();
        assertEquals(pts.size(), thr[0].length);
        for (int i = 0; i < pts.size(); i++) {
            assertEquals(pts.get(i).rateFullStepsPerS(), thr[0][i], 0);
            assertEquals(pts.get(i).thresholdRms(), thr[1][i], 0);
            assertEquals(pts.get(i).baselineRms(), base[1][i], 0);
            // the default rule (BandSettings.defaults, common practice): at least 3 dB over the baseline
            assertTrue(20 * Math.log10(thr[1][i] / base[1][i]) >= 3 - 1e-9, "threshold over baseline at " + i);
        }
        // and the JSON of the same run carries them too
        JsonNode json = Json.mapper().readTree(ReportCli.run("resonance", "sweep", csv, "--microsteps", "16", "--json",
                "--response").out());
        assertEquals(pts.get(0).thresholdRms(), json.get("response").get(0).get("threshold_rms").asDouble(), 1e-12);
    }

    @Test
    void ringDownReportZoomsToTheDecayAndDrawsTheBackboneAndTheSpectrumWithTheFittedFrequency(@TempDir Path tmp)
            throws Exception {
        Path html = tmp.resolve("ringdown.html");
        String csv = DIR.resolve("belt-axis-ringdown.csv").toString();
        Document d = ReportCli.report(html, 0, "resonance", "ringdown", csv, "--report", html.toString());
        JsonNode json = Json.mapper().readTree(ReportCli.run("resonance", "ringdown", csv, "--json").out());
        assertEquals(3, ReportCli.count(d, ReportCli.SVG, "svg"));
        List<String> svgText = ReportCli.texts(d, ReportCli.SVG, "text");
        assertTrue(svgText.containsAll(List.of("time (s)", "angle (deg)", "cycle amplitude (deg)",
                "cycle frequency (Hz)", "frequency (Hz)", "level (dB re peak)")), svgText.toString());
        double fn = json.get("natural_frequency_hz").asDouble();
        assertTrue(svgText.contains(String.format(Locale.ROOT, "f\u2099 %.1f Hz (fit)", fn)), svgText.toString());
        double delta = json.get("log_decrement").asDouble();
        String dd = String.join("|", ReportCli.texts(d, ReportCli.XHTML, "dd"));
        assertTrue(dd.contains(String.format(Locale.ROOT, "%.4f", delta)), delta + " in " + dd);
        String captions = String.join("|", ReportCli.texts(d, ReportCli.XHTML, "figcaption"));
        assertTrue(captions.contains(String.format(Locale.ROOT, "(t = %.4f s)", json.get("ring_start_time_s")
                .asDouble())), captions);
        // the decay drawn is the workflow's: from the ring's start to where its envelope reaches the noise
        ResonanceRingdown.Result w = ResonanceRingdown.fit(DIR.resolve("belt-axis-ringdown.csv"),
                ResonanceRingdown.Settings.DEFAULT, Progress.NONE);
        double[] t = w.decayTimeS();
        assertEquals(w.fit().ringStartTimeS(), t[0], 1e-9);
        assertTrue(t[t.length - 1] >= w.fit().decayEndTimeS() - 1e-9 || t.length == w.timeS().length,
                "the decay is drawn to its end");
    }

    private static String[] concat(String[] a, String... b) {
        String[] out = java.util.Arrays.copyOf(a, a.length + b.length);
        System.arraycopy(b, 0, out, a.length, b.length);
        return out;
    }
}
