package org.lodestep.report.html;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;

import org.lodestep.safety.Hazard;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.w3c.dom.Document;
import org.w3c.dom.Element;

class HtmlReportTest {
    private static final String HOSTILE = SampleReports.HOSTILE;
    /** What the hostile string reads as after escaping and parsing: the control character becomes U+FFFD. */
    private static final String HOSTILE_READ = HOSTILE.replace('\u0001', '\uFFFD');

    @Test
    void wholeReportParsesAsXhtml() throws Exception {
        Document d = XmlCheck.parse(SampleReports.everything(HOSTILE).html());
        assertEquals("html", d.getDocumentElement().getLocalName());
        assertEquals(XmlCheck.XHTML, d.getDocumentElement().getNamespaceURI());
        // Six charts and two wiring diagrams, each in its own figure.
        assertEquals(8, XmlCheck.elements(d, XmlCheck.XHTML, "figure").size());
        assertEquals(8, XmlCheck.elements(d, XmlCheck.SVG, "svg").size());
    }

    @Test
    void hostileStringsStayTextEverywhere() throws Exception {
        String html = SampleReports.everything(HOSTILE).html();
        Document d = XmlCheck.parse(html);
        // No element the hostile text tried to open exists in either namespace.
        assertTrue(XmlCheck.elements(d, "*", "script").isEmpty());
        assertFalse(html.contains("<script"));
        // It is still shown, verbatim, where it was given: title, metadata, table cell, lead tag in the diagram.
        assertTrue(XmlCheck.texts(d, XmlCheck.XHTML, "h1").contains("Motor " + HOSTILE_READ));
        assertTrue(XmlCheck.texts(d, XmlCheck.XHTML, "dd").contains(HOSTILE_READ));
        assertTrue(XmlCheck.texts(d, XmlCheck.XHTML, "td").stream().anyMatch(t -> t.equals(HOSTILE_READ)));
        assertTrue(XmlCheck.texts(d, XmlCheck.SVG, "text").contains(HOSTILE_READ), "lead label in the diagram");
        assertTrue(XmlCheck.texts(d, XmlCheck.SVG, "text").stream().anyMatch(t -> t.contains("Custom " + HOSTILE_READ)));
    }

    @Test
    void reportHasNoScriptsAndLoadsNothingFromOutside() {
        String html = SampleReports.everything("plain").html();
        assertFalse(html.contains("<script"));
        assertFalse(html.contains("<link"));
        assertFalse(html.contains("src=\"http"));
        assertFalse(html.contains("url(http"));
        assertFalse(html.contains("@import"));
    }

    @Test
    void eachFigureSvgParsesOnItsOwn() throws Exception {
        Document d = XmlCheck.parse(SampleReports.everything(HOSTILE).html());
        for (Element svg : XmlCheck.elements(d, XmlCheck.SVG, "svg")) {
            javax.xml.transform.Transformer t = javax.xml.transform.TransformerFactory.newInstance().newTransformer();
            java.io.StringWriter w = new java.io.StringWriter();
            t.transform(new javax.xml.transform.dom.DOMSource(svg), new javax.xml.transform.stream.StreamResult(w));
            Document alone = XmlCheck.parse(w.toString());
            assertEquals("svg", alone.getDocumentElement().getLocalName());
            assertTrue(alone.getDocumentElement().hasAttribute("viewBox"), "scales with its container");
        }
    }

    @Test
    void chartIdsAreUniqueAcrossOneDocument() throws Exception {
        Document d = XmlCheck.parse(SampleReports.everything("x").html());
        java.util.Set<String> ids = new java.util.HashSet<>();
        for (String ns : new String[] {XmlCheck.XHTML, XmlCheck.SVG}) {
            for (Element e : XmlCheck.elements(d, ns, "*")) {
                if (e.hasAttribute("id")) {
                    assertTrue(ids.add(e.getAttribute("id")), "duplicate id " + e.getAttribute("id"));
                }
            }
        }
        assertTrue(ids.size() > 8);
    }

    @Test
    void verdictCarriesSymbolAndWordBesidesColour() throws Exception {
        String html = HtmlReport.builder("Kind", "T").verdict(Status.FAIL, "Lot rejected", "2 of 40 out").build()
                .html();
        Document d = XmlCheck.parse(html);
        Element verdict = XmlCheck.elements(d, XmlCheck.XHTML, "section").get(0);
        assertTrue(verdict.getAttribute("class").contains("st-fail"));
        String text = verdict.getTextContent();
        assertTrue(text.contains("\u2716"), text);
        assertTrue(text.contains("fail"), text);
        assertTrue(text.contains("Lot rejected"), text);
    }

    @Test
    void tableShowsNumbersStatusesAndRowMarks() throws Exception {
        HtmlTable t = HtmlTable.builder("Lot", "Serial", "R (\u03A9)", "Verdict")
                .row(Cell.text("QX-1"), Cell.number("2.02"), Cell.status(Status.PASS))
                .row(Status.FAIL, Cell.text("QX-2"), Cell.number("2.27"), Cell.status(Status.FAIL))
                .build();
        Document d = XmlCheck.parse(HtmlReport.builder("k", "t").table(t).build().html());
        List<Element> rows = XmlCheck.elements(d, XmlCheck.XHTML, "tr");
        assertEquals(3, rows.size());
        assertEquals("row-st-fail", rows.get(2).getAttribute("class"));
        List<String> cells = XmlCheck.texts(d, XmlCheck.XHTML, "td");
        assertEquals(List.of("QX-1", "2.02", "\u2714 pass", "QX-2", "2.27", "\u2716 fail"), cells);
        assertEquals(2, t.rowCount());
    }

    @Test
    void rejectsRowWithWrongCellCount() {
        HtmlTable.Builder b = HtmlTable.builder(null, "a", "b");
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> b.row("only one"));
        assertTrue(e.getMessage().contains("1 cells"), e.getMessage());
    }

    @Test
    void safetyNotesDeferToLocalCodes() throws Exception {
        for (Hazard n : Hazard.values()) {
            Document d = XmlCheck.parse(HtmlReport.builder("k", "t").safety(n).build().html());
            Element aside = XmlCheck.elements(d, XmlCheck.XHTML, "aside").get(0);
            assertEquals("safety", aside.getAttribute("class"));
            assertTrue(aside.getTextContent().contains(n.title()));
        }
        assertTrue(Hazard.INSULATION_TEST.text().contains("Local electrical codes"));
        assertTrue(Hazard.MOVING_AXIS.text().contains("licensed practice"));
        assertTrue(Hazard.ENERGISED_WINDING.text().contains("licensed practice"));
    }

    @Test
    void factsKeepTheirOrder() throws Exception {
        java.util.Map<String, String> m = new java.util.LinkedHashMap<>();
        m.put("Step angle", "1.8\u00B0");
        m.put("Resistance", "2.00 \u03A9");
        Document d = XmlCheck.parse(HtmlReport.builder("k", "t").facts(m).build().html());
        assertEquals(List.of("Step angle", "Resistance"), XmlCheck.texts(d, XmlCheck.XHTML, "dt"));
        assertEquals(List.of("1.8\u00B0", "2.00 \u03A9"), XmlCheck.texts(d, XmlCheck.XHTML, "dd"));
    }

    @Test
    void writeLeavesOnlyTheFinishedFile(@TempDir Path dir) throws Exception {
        HtmlReport r = SampleReports.everything("w");
        Path target = dir.resolve("sub").resolve("report.html");
        r.write(target);
        r.write(target); // replacing an existing report works the same way
        assertEquals(r.html(), Files.readString(target, StandardCharsets.UTF_8));
        try (Stream<Path> files = Files.list(target.getParent())) {
            assertEquals(List.of(target), files.toList(), "no temporary file left behind");
        }
    }

    @Test
    void failedWriteLeavesTheOldFileUntouched(@TempDir Path dir) throws Exception {
        Path target = dir.resolve("report.html");
        Files.writeString(target, "old");
        Path blocker = dir.resolve("not-a-dir");
        Files.writeString(blocker, "x");
        HtmlReport r = HtmlReport.builder("k", "t").build();
        assertThrows(java.io.IOException.class, () -> r.write(blocker.resolve("report.html")));
        assertEquals("old", Files.readString(target));
    }

    @Test
    void provisionalHasItsOwnSymbolWordAndColourAndTheAnswerItsOwnLine() throws Exception {
        String html = HtmlReport.builder("Lead identification", "KL-04")
                .verdict(Status.PROVISIONAL, "8-lead motor: wiring provisional", "A+ = 1, A\u2212 = 7", "guessed")
                .build().html();
        Document d = XmlCheck.parse(html);
        Element verdict = (Element) d.getElementsByTagNameNS(XmlCheck.XHTML, "section").item(0);
        assertTrue(verdict.getAttribute("class").contains("st-provisional"), verdict.getAttribute("class"));
        assertTrue(verdict.getTextContent().contains("provisional"), verdict.getTextContent());
        assertTrue(verdict.getTextContent().contains("\u25D0"), verdict.getTextContent());
        assertTrue(html.contains("<p class=\"answer\">A+ = 1, A\u2212 = 7</p>"), html);
        assertTrue(html.contains(".verdict.st-provisional{") && html.contains("--prov:"), "a colour of its own");
        // every status differs from every other in symbol and in word, so grey print keeps the meaning
        assertEquals(Status.values().length, Stream.of(Status.values()).map(Status::symbol).distinct().count());
        assertEquals(Status.values().length, Stream.of(Status.values()).map(Status::word).distinct().count());
    }
}
