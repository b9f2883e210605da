package org.lodestep.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.lodestep.qa.LotStatistics;
import org.w3c.dom.Document;
import org.w3c.dom.Element;
import org.w3c.dom.NodeList;

import com.fasterxml.jackson.databind.JsonNode;

/**
 * The lot report's chart rules on the constructed lot of {@link QaLots}, rendered as text, HTML and JSON from one
 * summary: every number the text and HTML show is checked against the JSON of the same summary.
 */
class QaLotRenderingTest {
    /** The display units, as the reports write them (one spelling everywhere). */
    private static final String OHM = QaFormat.unit("phase_resistance", "ohm");
    private static final String MOHM = QaFormat.unit("insulation_resistance", "ohm");
    private static final String DEG = QaFormat.unit("step_angle", "deg");
    private static LotStatistics.Summary sum;
    private static String text;
    private static Document html;
    private static JsonNode json;
    private static List<String> svgText;

    @BeforeAll
    static void render() throws Exception {
        sum = QaLots.lot();
        text = QaText.lotReport("QA report, lot L1", sum);
        html = ReportCli.parse(QaHtml.lot("QA report, lot L1", sum).html());
        json = Json.mapper().readTree(Json.write(sum));
        svgText = ReportCli.texts(html, ReportCli.SVG, "text");
    }

    private static JsonNode series(String parameter, String label) {
        for (JsonNode p : json.get("parameters")) {
            if (p.get("parameter").asText().equals(parameter) && p.get("label").asText().equals(label)) {
                return p;
            }
        }
        throw new AssertionError("no series " + parameter + " " + label);
    }

    private static List<String> figureLabels() {
        List<String> out = new ArrayList<>();
        NodeList fs = html.getElementsByTagNameNS(ReportCli.XHTML, "figure");
        for (int i = 0; i < fs.getLength(); i++) {
            out.add(((Element) fs.item(i)).getAttribute("aria-label"));
        }
        return out;
    }

    private static List<String> captions() {
        return ReportCli.texts(html, ReportCli.XHTML, "figcaption");
    }

    @Test
    void constantSeriesSaysNoVariationInsteadOfAChart() {
        assertTrue(series("step_angle", "").get("constant").asBoolean());
        assertFalse(series("phase_resistance", "A").get("constant").asBoolean());
        assertTrue(text.contains("Step angle [" + DEG + "]  n=12: no variation (all 12 values = 1.8 " + DEG + ")"), text);
        assertTrue(ReportCli.texts(html, ReportCli.XHTML, "p").stream()
                .anyMatch(p -> p.startsWith("No variation (all 12 values = 1.8 " + DEG + ")")));
        assertTrue(figureLabels().stream().noneMatch(f -> f.contains("Step angle")), figureLabels().toString());
        // no axis in engineering notation anywhere (the old constant chart's "1.8E0", "2.5E-9")
        assertTrue(svgText.stream().noneMatch(t -> t.matches(".*\\dE-?\\d.*")), svgText.toString());
    }

    @Test
    void eachPhaseAndPairHasItsOwnChartsOnASerialAxis() {
        List<String> f = figureLabels();
        for (String s : List.of("Phase resistance A", "Phase resistance B", "Insulation resistance a-frame",
                "Insulation resistance b-frame")) {
            // histogram, individuals and moving range, each of that series alone
            assertEquals(3, f.stream().filter(x -> x.contains(" of " + s + ":")).count(), s + " in " + f);
        }
        assertTrue(svgText.contains("motor serial, in order of its latest test"), svgText.toString());
        assertTrue(svgText.stream().noneMatch(t -> t.contains("motor number")));
        assertTrue(svgText.contains("S01") && svgText.contains("S12"), svgText.toString());
    }

    @Test
    void individualsChartsCarryTheSpecLimitsAndMarkTheFailedMotor() {
        assertTrue(svgText.contains("USL 2.09 " + OHM) && svgText.contains("LSL 1.71 " + OHM), svgText.toString());
        // S05's phase B, 2.30 ohm against USL 2.09: a cross and its own label
        assertTrue(svgText.contains("S05 2.3 > USL"), svgText.toString());
        assertTrue(svgText.contains("failed the spec"), svgText.toString());
        // a one-sided spec draws only its one limit
        assertTrue(svgText.contains("USL 5 %"), svgText.toString());
        assertTrue(svgText.stream().noneMatch(t -> t.startsWith("LSL") && t.endsWith("%")), svgText.toString());
    }

    @Test
    void oneSidedNonNegativeQuantityIsClippedAtZeroAndNeverDrawnBelowIt() {
        JsonNode p = series("phase_imbalance", "");
        JsonNode chart = p.get("chart");
        assertTrue(chart.get("clipped_at_zero").asBoolean());
        assertEquals(0.0, chart.get("lower_x").asDouble());
        assertTrue(chart.get("computed_lower_x").asDouble() < 0);
        assertEquals(0.0, p.at("/histogram/0/lower").asDouble());
        String computed = QaFormat.value("phase_imbalance", chart.get("computed_lower_x").asDouble());
        assertTrue(text.contains("LCL 0 (computed " + computed + ", clipped at zero"), text);
        assertTrue(captions().stream().anyMatch(c -> c.contains("clipped at zero") && c.contains(computed + " %")),
                captions().toString());
        // tick labels of the imbalance figures: none negative
        NodeList figures = html.getElementsByTagNameNS(ReportCli.XHTML, "figure");
        int checked = 0;
        for (int i = 0; i < figures.getLength(); i++) {
            Element fig = (Element) figures.item(i);
            if (!fig.getAttribute("aria-label").contains("Phase imbalance")) {
                continue;
            }
            NodeList ts = fig.getElementsByTagNameNS(ReportCli.SVG, "text");
            for (int t = 0; t < ts.getLength(); t++) {
                String s = ts.item(t).getTextContent().strip();
                assertFalse(s.matches("[-\u2212]\\d.*"), "negative tick " + s);
            }
            checked++;
        }
        assertEquals(3, checked);
    }

    @Test
    void insulationIsChartedOnALogScaleAndSaysSo() {
        assertEquals("LOG", series("insulation_resistance", "a-frame").at("/chart/scale").asText());
        assertTrue(captions().stream().anyMatch(c -> c.contains("Log scale") && c.contains("ln R")));
        assertTrue(text.contains("limits and capability computed on ln R"), text);
    }

    @Test
    void failedAndRetestedMotorsAreTabledWithValueLimitMarginAndOutcome() {
        JsonNode f = json.get("failed_checks");
        // S05 fails phase B and, through it, the balance; S07 its b-frame insulation
        assertEquals(3, f.size());
        assertEquals("S05", f.at("/0/serial").asText());
        assertEquals("USL", f.at("/0/limit_name").asText());
        assertEquals(2.09 - 2.30, f.at("/0/margin").asDouble(), 1e-12);
        assertEquals("phase_imbalance", f.at("/1/parameter").asText());
        assertEquals("S07", f.at("/2/serial").asText());
        assertEquals(13, f.at("/2/retest_record_id").asLong());
        assertEquals("PASS", f.at("/2/retest_verdict").asText());
        String cells = String.join("|", ReportCli.texts(html, ReportCli.XHTML, "td"));
        assertTrue(cells.contains("S05 (#5)|\u2716 Phase resistance B|2.3 " + OHM + "|USL 2.09|\u22120.21 " + OHM + "|"),
                cells);
        assertTrue(cells.contains("S07 (#7)|\u2716 Insulation resistance b-frame|62 " + MOHM + "|LSL 100|\u221238 "
                + MOHM + "|\u2714 #13: PASS"), cells);
        assertTrue(text.lines().anyMatch(l -> l.matches("\\s+S05\\s+#5\\s+Phase resistance B\\s+FAIL\\s+2\\.3\\s+USL 2\\.09"
                + "\\s+\u22120\\.21\\s+" + OHM + "\\s+not re-tested")), text);
        assertTrue(text.lines().anyMatch(l -> l.contains("S07") && l.contains("\u221238") && l.contains("#13: PASS")),
                text);
        // the answer comes first: yield, the failed serial and the re-tested one with its outcome
        String answer = "final yield 91.7 % (11 of 12 motors pass), first-pass yield 83.3 %; failed: S05; re-tested:"
                + " S07 PASS";
        assertEquals(answer, text.lines().skip(1).findFirst().orElseThrow());
        assertTrue(ReportCli.texts(html, ReportCli.XHTML, "p").contains(answer));
    }

    @Test
    void capabilityFiguresInTextAndHtmlAreThoseOfTheJson() {
        List<String> dd = ReportCli.texts(html, ReportCli.XHTML, "dd");
        for (JsonNode p : json.get("parameters")) {
            if (p.get("constant").asBoolean()) {
                continue;
            }
            JsonNode c = p.get("cpk");
            String figure = String.format(Locale.ROOT, "%.2f (%.2f to %.2f)", c.get("value").asDouble(),
                    c.get("lower").asDouble(), c.get("upper").asDouble());
            assertTrue(text.contains(c.get("index").asText() + " " + figure + ", n = " + p.get("n").asInt()),
                    figure + " in " + text);
            assertTrue(dd.contains(figure), figure + " in " + dd);
        }
        assertTrue(text.contains("Bissell"), text);
    }

    @Test
    void everyRenderingDrawsTheBinsOfTheJson() {
        List<String> f = figureLabels();
        for (JsonNode p : json.get("parameters")) {
            if (p.get("constant").asBoolean()) {
                continue;
            }
            String name = p.get("parameter").asText();
            List<String> bins = new ArrayList<>();
            for (JsonNode b : p.get("histogram")) {
                String lo = QaFormat.value(name, b.get("lower").asDouble());
                String hi = QaFormat.value(name, b.get("upper").asDouble());
                bins.add(lo + " .. " + hi + ": " + b.get("count").asInt());
                assertTrue(text.lines().anyMatch(l -> l.strip().startsWith(lo + " .. " + hi)
                        && l.contains("|" + b.get("count").asInt() + " ")), lo + " .. " + hi + " in " + text);
            }
            String listed = "bins " + String.join("; ", bins) + ".";
            assertTrue(f.stream().anyMatch(x -> x.endsWith(listed)), listed + " in " + f);
        }
    }
}
