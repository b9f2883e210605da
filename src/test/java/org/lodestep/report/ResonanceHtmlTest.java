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

    private static String[] concat(String[] a, String... b) {
        String[] out = java.util.Arrays.copyOf(a, a.length + b.length);
        System.arraycopy(b, 0, out, a.length, b.length);
        return out;
    }
}
