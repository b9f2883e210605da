package org.lodestep.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;

import javax.xml.parsers.DocumentBuilderFactory;

import org.junit.jupiter.api.Test;
import org.lodestep.report.html.HtmlReport;
import org.lodestep.wiring.Identification;
import org.w3c.dom.Document;
import org.w3c.dom.Element;
import org.w3c.dom.NodeList;

class LeadsHtmlTest {
    private static final String XHTML = "http://www.w3.org/1999/xhtml";

    static Document parse(String html) throws Exception {
        DocumentBuilderFactory f = DocumentBuilderFactory.newInstance();
        f.setNamespaceAware(true);
        f.setFeature("http://apache.org/xml/features/nonvalidating/load-external-dtd", false);
        return f.newDocumentBuilder().parse(new org.xml.sax.InputSource(new java.io.StringReader(html)));
    }

    @Test
    void everySampleMotorGetsAParsableReportWithOneDiagramPerConnection() throws Exception {
        for (Path csv : WiringDiagramsTest.sampleCaptures()) {
            Identification id = WiringDiagramsTest.identify(csv);
            HtmlReport r = LeadsHtml.report("Motor", csv.getFileName().toString(), id);
            Document d = parse(r.html());
            assertEquals(id.connections().size(),
                    d.getElementsByTagNameNS("http://www.w3.org/2000/svg", "svg").getLength(), csv.toString());
            Element verdict = (Element) d.getElementsByTagNameNS(XHTML, "section").item(0);
            String cls = verdict.getAttribute("class");
            if (id.hasError()) {
                assertTrue(cls.contains("st-fail"), csv + ": " + cls);
            } else if (!id.determined()) {
                assertTrue(cls.contains("st-warn"), csv + ": " + cls);
            }
            // Each winding's end-to-end resistance is in the windings table, as the text report prints it.
            String cells = String.join("|", texts(d, "td"));
            id.windings().forEach(w -> assertTrue(cells.contains(LeadsTextReport.ohm(w.resistanceOhm())),
                    csv + " misses " + w.resistanceOhm()));
        }
    }

    @Test
    void fourLeadSampleReadsAsTwoWindingsOnABipolarDriver() throws Exception {
        // kl-01: red-blue 2.48 ohm and green-black 2.52 ohm, every cross pair open (the capture's own readings).
        Path csv = WiringDiagramsTest.sampleCaptures().stream().filter(p -> p.toString().contains("kl-01"))
                .findFirst().orElseThrow();
        Document d = parse(LeadsHtml.report("KL-01", "kl-01.csv", WiringDiagramsTest.identify(csv)).html());
        List<String> svgText = texts(d, "http://www.w3.org/2000/svg", "text");
        assertTrue(svgText.containsAll(List.of("A+", "A\u2212", "B+", "B\u2212", "red", "blue", "green", "black")),
                svgText.toString());
        String cells = String.join("|", texts(d, "td"));
        assertTrue(cells.contains("2.48 \u03A9") && cells.contains("2.52 \u03A9"), cells);
    }

    private static List<String> texts(Document d, String tag) {
        return texts(d, XHTML, tag);
    }

    private static List<String> texts(Document d, String ns, String tag) {
        NodeList nl = d.getElementsByTagNameNS(ns, tag);
        java.util.ArrayList<String> out = new java.util.ArrayList<>();
        for (int i = 0; i < nl.getLength(); i++) {
            out.add(nl.item(i).getTextContent());
        }
        return out;
    }

    @Test
    void aProbeThatStoppedOnceCertainMarksItsInferredPairsAndValues() throws Exception {
        org.lodestep.wiring.ProbeSession s = new org.lodestep.wiring.ProbeSession(List.of("a", "b", "c", "d"),
                org.lodestep.wiring.IdentifySettings.DEFAULT);
        s.record(s.nextPair().orElseThrow(), java.util.OptionalDouble.of(2.41));
        s.record(s.nextPair().orElseThrow(), java.util.OptionalDouble.of(2.45));
        String html = LeadsHtml.report("Probed", null, s.result()).html();
        parse(html);
        assertTrue(html.contains("2 of 6"), "pairs measured counts readings only");
        assertTrue(html.contains("not read") && html.contains("open, inferred from the only healthy layout left"),
                html);
        // a 6-lead winding with one half not read: that half is inferred in the windings table
        Identification six = org.lodestep.wiring.LeadIdentifier.identify(org.lodestep.wiring.ResistanceMatrix.builder()
                .reading("black", "green", 4.00).reading("black", "yellow", 2.16)
                .reading("red", "blue", 4.00).reading("red", "white", 2.00).reading("blue", "white", 2.00)
                .open("black", "red").build(), org.lodestep.wiring.IdentifySettings.DEFAULT);
        String sixHtml = LeadsHtml.report("Six", null, six).html();
        assertTrue(sixHtml.contains("1.84 Ω inferred"), sixHtml);
        assertTrue(sixHtml.contains("2.16 Ω"), sixHtml);
    }
}
