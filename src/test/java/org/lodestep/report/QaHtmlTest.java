package org.lodestep.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;

import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.w3c.dom.Document;

import com.fasterxml.jackson.databind.JsonNode;

class QaHtmlTest {
    private static final Path DIR = Path.of("sample-captures", "qa");
    @TempDir
    static Path tmp;
    private static Path db;
    private static Document lotCheck;

    @BeforeAll
    static void checkTheSampleLot() throws Exception {
        db = tmp.resolve("qa.sqlite");
        Path html = tmp.resolve("check.html");
        // The sample lot has failing motors: exit code 3, as the QA demo expects.
        lotCheck = ReportCli.report(html, 3, "qa", "check", "--spec", DIR.resolve("kv-4218-m.toml").toString(),
                "--lot", "L2607", "--serials", DIR.resolve("lot-L2607-serials.txt").toString(),
                "--resistance-pattern", DIR.resolve("{serial}.csv").toString(),
                "--meter-log", DIR.resolve("lot-L2607-meter-log.csv").toString(), "--ambient-c", "22",
                "--operator", "R. <Okafor> & co", "--station", "hf-2", "--db", db.toString(),
                "--report", html.toString());
    }

    @Test
    void lotCheckListsEveryMotorWithItsVerdictAndEveryCheck() {
        List<String> serials = new java.util.ArrayList<>();
        for (int i = 117; i <= 128; i++) {
            serials.add("KV24-00" + i);
        }
        String cells = String.join("|", ReportCli.texts(lotCheck, ReportCli.XHTML, "td"));
        serials.forEach(s -> assertTrue(cells.contains(s), s));
        assertTrue(ReportCli.verdictClass(lotCheck).contains("st-fail"));
        assertTrue(cells.contains("\u2716 fail") && cells.contains("\u2714 pass"), cells);
        // The operator's name is shown as typed, markup characters and all.
        assertTrue(ReportCli.texts(lotCheck, ReportCli.XHTML, "dd").contains("R. <Okafor> & co"));
        assertTrue(String.join(" ", ReportCli.texts(lotCheck, ReportCli.XHTML, "aside"))
                .contains("Local electrical codes"));
    }

    // The lot's check page is compact: a motor that passed is one collapsed line, one that failed shows its checks
    // with the margin to the deciding limit; notes and the caution sit collapsed (the page was 11 090 px tall at
    // 1280 px before, measured in Chromium).
    @Test
    void lotCheckPageCollapsesPassedMotorsAndShowsMargins() throws Exception {
        org.w3c.dom.NodeList details = lotCheck.getElementsByTagNameNS(ReportCli.XHTML, "details");
        int open = 0;
        int closedPass = 0;
        for (int i = 0; i < details.getLength(); i++) {
            org.w3c.dom.Element e = (org.w3c.dom.Element) details.item(i);
            String summary = e.getElementsByTagNameNS(ReportCli.XHTML, "summary").item(0).getTextContent();
            if (e.hasAttribute("open")) {
                open++;
                assertTrue(summary.contains(": fail"), summary);
            } else if (summary.matches("KV24-\\d+: pass, \\d+ checks")) {
                closedPass++;
            }
        }
        // sample lot: 00121, 00124 and 00126 fail, nine pass
        assertEquals(3, open);
        assertEquals(9, closedPass);
        assertTrue(ReportCli.texts(lotCheck, ReportCli.XHTML, "th").contains("Margin"));
        String cells = String.join("|", ReportCli.texts(lotCheck, ReportCli.XHTML, "td"));
        String ohm = QaFormat.unit("phase_resistance", "ohm");
        assertTrue(cells.contains("2.28 " + ohm + "|1.71 \u2013 2.09 " + ohm + "|\u22120.1897 (USL)"), cells);
        Chromium.require();
        Chromium.Page page = Chromium.render(tmp.resolve("check.html"), 1280);
        // scrollHeight is at least the window's; the report's white column ends where its content does
        java.awt.image.BufferedImage shot = page.screenshot();
        int bottom = 0;
        for (int y = 0; y < shot.getHeight(); y++) {
            if ((shot.getRGB(shot.getWidth() / 2, y) & 0xffffff) == 0xffffff) {
                bottom = y;
            }
        }
        assertTrue(bottom > 1000 && bottom < 4000, "lot check page is " + bottom + " px tall");
        assertTrue(page.scrollWidth() <= page.viewportWidth());
    }

    @Test
    void lotReportHasAHistogramAndIndividualsAndMovingRangeChartsPerParameter(@TempDir Path out) throws Exception {
        Path html = out.resolve("lot.html");
        Document d = ReportCli.report(html, 0, "qa", "report", "--lot", "L2607", "--db", db.toString(),
                "--report", html.toString());
        JsonNode json = Json.mapper().readTree(ReportCli.run("qa", "report", "--lot", "L2607", "--db",
                db.toString(), "--json").out());
        JsonNode params = json.at("/summary/parameters");
        int charted = 0;
        for (JsonNode p : params) {
            // a series without variation has no chart at all
            charted += p.get("constant").asBoolean() ? 0 : p.get("n").asInt() >= 2 ? 3 : 1;
        }
        assertEquals(charted, ReportCli.count(d, ReportCli.SVG, "svg"));
        List<String> svgText = ReportCli.texts(d, ReportCli.SVG, "text");
        // Every serial the statistics put outside a control limit is named on its chart.
        for (JsonNode p : params) {
            for (JsonNode o : p.get("out_of_control")) {
                String serial = o.get("serial").asText();
                assertTrue(svgText.stream().anyMatch(t -> t.startsWith(serial)), serial + " named on a chart");
            }
        }
        // One histogram rule: the HTML draws the bins of the JSON (and text) report, value for value.
        List<String> figures = new java.util.ArrayList<>();
        org.w3c.dom.NodeList fs = d.getElementsByTagNameNS(ReportCli.XHTML, "figure");
        for (int i = 0; i < fs.getLength(); i++) {
            figures.add(((org.w3c.dom.Element) fs.item(i)).getAttribute("aria-label"));
        }
        for (JsonNode p : params) {
            if (p.get("constant").asBoolean()) {
                continue;
            }
            int bins = p.get("histogram").size();
            int n = p.get("n").asInt();
            assertTrue(figures.stream().anyMatch(f -> f.contains(n + " values of ")
                    && f.contains(" in " + bins + (bins == 1 ? " bin," : " bins,"))), p.get("parameter") + " " + figures);
        }
        assertTrue(svgText.stream().anyMatch(t -> t.startsWith("USL ")), svgText.toString());
        assertTrue(svgText.stream().anyMatch(t -> t.startsWith("UCL ")), svgText.toString());
    }
}
