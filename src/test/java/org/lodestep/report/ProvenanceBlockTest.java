package org.lodestep.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.List;

import com.fasterxml.jackson.databind.JsonNode;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.lodestep.report.html.HtmlReport;
import org.lodestep.report.html.Status;
import org.lodestep.workflow.Provenance;
import org.w3c.dom.Document;
import org.w3c.dom.Element;
import org.w3c.dom.NodeList;

class ProvenanceBlockTest {

    private static Provenance provenance(Path dir) throws Exception {
        Path f = dir.resolve("readings.csv");
        Files.writeString(f, "abc");
        return Provenance.of("0.1.0", List.of("lodestep", "leads", "identify", f.toString()),
                Instant.parse("2026-12-02T10:15:30Z")).withInput("readings", f).withRig("virtual rig, firmware 0.1.0");
    }

    @Test
    void textBlockNamesToolCommandTimeRigAndEveryInputHash(@TempDir Path dir) throws Exception {
        Provenance p = provenance(dir);
        String t = ProvenanceBlock.text(p);
        assertTrue(t.startsWith("Provenance: report " + p.reportId() + ", lodestep 0.1.0, run 2026-12-02T10:15:30Z"), t);
        assertTrue(t.contains("command  lodestep leads identify " + dir.resolve("readings.csv")), t);
        assertTrue(t.contains("rig      virtual rig, firmware 0.1.0"), t);
        // references §24: NIST FIPS 180-2, Appendix B.1, SHA-256("abc")
        assertTrue(t.contains("sha256 ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad  readings  "
                + dir.resolve("readings.csv")), t);
    }

    @Test
    void jsonGetsAProvenanceObjectFirstInAnObjectAndInEachElementOfAnArray(@TempDir Path dir) throws Exception {
        Provenance p = provenance(dir);
        JsonNode o = Json.mapper().readTree(ProvenanceBlock.json("{\"a\": 1, \"b\": [2]}", p));
        assertEquals("provenance", o.fieldNames().next());
        assertEquals(1, o.get("a").asInt());
        JsonNode prov = o.get("provenance");
        assertEquals(p.reportId(), prov.get("report_id").asText());
        assertEquals("2026-12-02T10:15:30Z", prov.get("run_at_utc").asText());
        assertEquals("ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad",
                prov.get("inputs").get(0).get("sha256").asText());
        assertEquals(3, prov.get("inputs").get(0).get("bytes").asInt());
        assertEquals("identify", prov.get("command_line").get(2).asText());
        JsonNode a = Json.mapper().readTree(ProvenanceBlock.json("[{\"m\": 1}, {\"m\": 2}]", p));
        assertEquals(2, a.size());
        for (JsonNode e : a) {
            assertEquals(p.reportId(), e.get("provenance").get("report_id").asText());
        }
    }

    @Test
    void htmlStampHasHeaderLineClosingSectionFooterAndPrintMargins(@TempDir Path dir) throws Exception {
        Provenance p = provenance(dir);
        HtmlReport r = HtmlReport.builder("Lead identification", "Motor 7").verdict(Status.PASS, "4-lead", null)
                .section("Windings").paragraph("two").build();
        String html = ProvenanceBlock.html(r, p).html();
        Document d = ReportCli.parse(html);
        String header = d.getElementsByTagNameNS(ReportCli.XHTML, "header").item(0).getTextContent();
        assertTrue(header.contains("Report " + p.reportId()), header);
        Element last = lastSection(d);
        assertEquals("provenance", last.getAttribute("id"));
        String prov = last.getTextContent();
        assertTrue(prov.contains("ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad"), prov);
        assertTrue(prov.contains("lodestep leads identify"), prov);
        assertTrue(prov.contains("virtual rig, firmware 0.1.0"), prov);
        String footer = d.getElementsByTagNameNS(ReportCli.XHTML, "footer").item(0).getTextContent();
        assertTrue(footer.contains(p.reportId()), footer);
        // page numbers and the report ID in the bottom margin of every printed page (CSS paged media margin boxes)
        assertTrue(html.contains("@bottom-left{content:\"Lodestep report " + p.reportId() + "\""), html);
        assertTrue(html.contains("counter(page)") && html.contains("counter(pages)"), html);
        // the verdict still comes before everything the provenance adds to the body
        assertTrue(html.indexOf("class=\"verdict") < html.indexOf("id=\"provenance\""));
    }

    private static Element lastSection(Document d) {
        NodeList s = d.getElementsByTagNameNS(ReportCli.XHTML, "section");
        return (Element) s.item(s.getLength() - 1);
    }
}
