package org.lodestep.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.util.ArrayList;
import java.util.HexFormat;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import com.fasterxml.jackson.databind.JsonNode;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.w3c.dom.Document;
import org.w3c.dom.Element;
import org.w3c.dom.NodeList;

/**
 * Every report kind, run as a user runs it: its verdict is honest (provisional where the tool guessed, information
 * where nothing is judged), its answer comes first, and its text, JSON and HTML say what produced it. The SHA-256
 * values are computed here with the JDK's own digest, independently of the code under test.
 */
class ReportsAnswerFirstTest {
    private static final Path LEADS = Path.of("sample-captures/leads");
    private static final Path MOTOR = Path.of("sample-captures/motor");
    private static final Path RESONANCE = Path.of("sample-captures/resonance");

    static String sha256(Path f) throws Exception {
        return HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256").digest(Files.readAllBytes(f)));
    }

    @Test
    void eightLeadWiringIsProvisionalWithItsWiringInOneLineFirst(@TempDir Path tmp) throws Exception {
        Path csv = LEADS.resolve("kl-04-autosampler-8lead.csv");
        ReportCli.Run text = ReportCli.run("leads", "identify", csv.toString());
        List<String> lines = text.out().lines().toList();
        // the sample's own pairs: 1-5, 2-7, 3-8, 4-6 (sample-captures/leads/README.md)
        assertEquals("PROVISIONAL: bipolar series: A+ = 1, A\u2212 = 7, B+ = 3, B\u2212 = 6; join 5 + 2, 8 + 4",
                lines.get(1));
        assertTrue(text.out().contains("Provenance: report "), text.out());
        assertTrue(text.out().contains("sha256 " + sha256(csv) + "  readings  " + csv), text.out());

        Path html = tmp.resolve("kl-04.html");
        Document d = ReportCli.report(html, 0, "leads", "identify", csv.toString(), "--report", html.toString());
        assertTrue(ReportCli.verdictClass(d).contains("st-provisional"), ReportCli.verdictClass(d));
        assertEquals("bipolar series: A+ = 1, A\u2212 = 7, B+ = 3, B\u2212 = 6; join 5 + 2, 8 + 4", answer(d));
        // every coil start of every drawing is drawn as unknown: 4 coils and the legend's mark in each of 3 drawings
        assertEquals(3 * (4 + 1), byClass(d, ReportCli.SVG, "g", "start-unknown").size());
        assertTrue(provenanceText(d).contains(sha256(csv)), provenanceText(d));

        JsonNode j = Json.mapper().readTree(ReportCli.run("leads", "identify", csv.toString(), "--json").out());
        assertEquals(sha256(csv), j.get("provenance").get("inputs").get(0).get("sha256").asText());
        assertEquals(csv.toString(), j.get("provenance").get("inputs").get(0).get("path").asText());
    }

    @Test
    void fiveLeadIsProvisionalAndSixLeadPassesWithKnownStarts(@TempDir Path tmp) throws Exception {
        Path five = tmp.resolve("five.html");
        Document d5 = ReportCli.report(five, 0, "leads", "identify", LEADS.resolve("kl-02-syringe-pump-5lead.csv")
                .toString(), "--report", five.toString());
        assertTrue(ReportCli.verdictClass(d5).contains("st-provisional"), ReportCli.verdictClass(d5));
        Path six = tmp.resolve("six.html");
        Document d6 = ReportCli.report(six, 0, "leads", "identify", LEADS.resolve("kl-03-microscope-stage-6lead.tsv")
                .toString(), "--report", six.toString());
        assertTrue(ReportCli.verdictClass(d6).contains("st-pass"), ReportCli.verdictClass(d6));
        assertTrue(answer(d6).startsWith("bipolar series: A+ = black, A\u2212 = green, B+ = red, B\u2212 = blue"),
                answer(d6));
        assertEquals(0, byClass(d6, ReportCli.SVG, "g", "start-unknown").size());
    }

    @Test
    void motorCardNamesWhatIsUnknownAndCarriesEveryInputHash(@TempDir Path tmp) throws Exception {
        List<String> args = new ArrayList<>(List.of("motor", "identify", "--resistance",
                MOTOR.resolve("resistance.csv").toString()));
        List<Path> inputs = new ArrayList<>(List.of(MOTOR.resolve("resistance.csv")));
        for (String s : List.of("step-1-7.csv", "step-2-5.csv", "step-3-8.csv", "step-4-6.csv",
                "step-7-6-joined-1-4.csv")) {
            args.addAll(List.of("--step-response", MOTOR.resolve(s).toString()));
            inputs.add(MOTOR.resolve(s));
        }
        args.addAll(List.of("--back-emf", MOTOR.resolve("back-emf.csv").toString(), "--supply-v", "24"));
        inputs.add(MOTOR.resolve("back-emf.csv"));
        Path html = tmp.resolve("card.html");
        List<String> withReport = new ArrayList<>(args);
        withReport.addAll(List.of("--report", html.toString()));
        ReportCli.Run text = ReportCli.run(withReport.toArray(String[]::new));
        assertEquals(0, text.code(), text.err());
        // the sample's coupling is measured on phase A only (a step across 1+4 joined): B's is named as unknown
        assertTrue(text.out().lines().limit(5).anyMatch(l -> l.equals("Unknown: coupling of phase B (the other"
                + " phase's used)")), text.out());
        Document d = ReportCli.parse(Files.readString(html));
        String verdict = section0(d).getTextContent();
        assertTrue(verdict.contains("Still unknown: coupling of phase B"), verdict);
        assertFalse(verdict.contains("value(s)"), verdict);
        List<String> jsonArgs = new ArrayList<>(args);
        jsonArgs.add("--json");
        JsonNode j = Json.mapper().readTree(ReportCli.run(jsonArgs.toArray(String[]::new)).out());
        JsonNode in = j.get("provenance").get("inputs");
        assertEquals(inputs.size(), in.size());
        for (int i = 0; i < inputs.size(); i++) {
            assertEquals(sha256(inputs.get(i)), in.get(i).get("sha256").asText(), inputs.get(i).toString());
        }
        // the key figures on top are the card's own, to the three figures shown
        double r = j.get("phases").get(0).get("resistance_ohm").asDouble();
        assertTrue(verdict.contains("phase " + MotorCardText.num(r, 3) + " \u03A9"), verdict + " vs " + r);
    }

    @Test
    void sweepPutsEveryAvoidRangeFirstAndFindingBandsIsInformation(@TempDir Path tmp) throws Exception {
        Path html = tmp.resolve("sweep.html");
        Path avoid = tmp.resolve("avoid.json");
        Path csv = RESONANCE.resolve("belt-axis-sweep.csv");
        ReportCli.Run text = ReportCli.run("resonance", "sweep", csv.toString(), "--microsteps", "16",
                "--travel-mm-per-rev", "40", "--natural-hz", "116", "--avoid-list", avoid.toString(), "--report",
                html.toString());
        assertEquals(0, text.code(), text.err());
        Document d = ReportCli.parse(Files.readString(html));
        assertTrue(ReportCli.verdictClass(d).contains("st-info"), ReportCli.verdictClass(d));
        // the first section after the banner is the avoid-list
        assertEquals("Rates to avoid or cross quickly", d.getElementsByTagNameNS(ReportCli.XHTML, "h2").item(0)
                .getTextContent());
        // numbers shown against the avoid-list JSON written by the same run, to the three figures shown
        JsonNode ranges = Json.mapper().readTree(Files.readString(avoid)).get("ranges");
        List<Double> shown = numbers(answer(d).replaceAll("\\(.*", ""));
        assertEquals(2 * ranges.size(), shown.size(), answer(d));
        for (int i = 0; i < ranges.size(); i++) {
            near(ranges.get(i).get("from_full_steps_per_s").asDouble(), shown.get(2 * i), answer(d));
            near(ranges.get(i).get("to_full_steps_per_s").asDouble(), shown.get(2 * i + 1), answer(d));
        }
        assertEquals(sha256(csv), Json.mapper().readTree(Files.readString(avoid)).get("provenance").get("inputs")
                .get(0).get("sha256").asText());
        // text: the recommendations come before the analysis header
        assertTrue(text.out().indexOf("Recommendations") < text.out().indexOf("Resonance sweep:"), text.out());
    }

    @Test
    void lostSynchronismIsAWarningNotAFailure(@TempDir Path tmp) throws Exception {
        Path cap = tmp.resolve("gantry.csv");
        assertEquals(0, ReportCli.run("rig", "capture", "sim:gantry-axis", "sweep", "--from", "20", "--to", "400",
                "--seconds", "20", "--out", cap.toString(), "--quiet").code());
        Path html = tmp.resolve("g.html");
        Document d = ReportCli.report(html, 3, "resonance", "sweep", cap.toString(), "--report", html.toString());
        assertTrue(ReportCli.verdictClass(d).contains("st-warn"), ReportCli.verdictClass(d));
        assertTrue(section0(d).getTextContent().contains("Lost synchronism"), section0(d).getTextContent());
    }

    @Test
    void ringDownShowsItsCriterionAndNoPass(@TempDir Path tmp) throws Exception {
        Path html = tmp.resolve("ring.html");
        Document d = ReportCli.report(html, 0, "resonance", "ringdown", RESONANCE.resolve("belt-axis-ringdown.csv")
                .toString(), "--report", html.toString());
        assertTrue(ReportCli.verdictClass(d).contains("st-info"), ReportCli.verdictClass(d));
        assertTrue(section0(d).getTextContent().contains("criterion for a single damped oscillation: R\u00B2 \u2265"
                + " 0.9"), section0(d).getTextContent());
        assertEquals(0, byClass(d, ReportCli.XHTML, "li", "st-pass").size());
    }

    @Test
    void driveAndQaReportsCarryProvenanceToo(@TempDir Path tmp) throws Exception {
        Path card = tmp.resolve("card.json");
        ReportCli.Run m = ReportCli.run("motor", "identify", "--resistance", MOTOR.resolve("resistance.csv")
                .toString(), "--step-response", MOTOR.resolve("step-1-7.csv").toString(), "--back-emf",
                MOTOR.resolve("back-emf.csv").toString(), "--json");
        Files.writeString(card, m.out());
        ReportCli.Run curve = ReportCli.run("drive", "curve", "--card", card.toString(), "--rotor-inertia-kgm2",
                "5.4e-6", "--phase-inductance-h", "8.2e-3", "--current-a", "1.2", "--supply-v", "24", "--json");
        assertEquals(0, curve.code(), curve.err());
        assertEquals(sha256(card), Json.mapper().readTree(curve.out()).get("provenance").get("inputs").get(0)
                .get("sha256").asText());

        Path out = tmp.resolve("demo");
        assertEquals(0, ReportCli.run("demo", "--out", out.toString()).code());
        Path db = out.resolve("qa/demo-qa.sqlite");
        ReportCli.Run lot = ReportCli.run("qa", "report", "--lot", "L-2607", "--db", db.toString());
        assertTrue(lot.out().contains("sha256 " + sha256(db) + "  record store  " + db), lot.out());
        Document qa = ReportCli.parse(Files.readString(out.resolve("qa/qa-check-L-2607.html")));
        assertTrue(provenanceText(qa).contains(sha256(Path.of("sample-captures/qa/kv-4218-m.toml"))),
                "the spec and its hash");
        // the lot banner says the yield and names the motors that did not pass
        String banner = section0(ReportCli.parse(Files.readString(out.resolve("qa/qa-report-L-2607.html"))))
                .getTextContent();
        assertTrue(banner.contains("final yield") && banner.contains("failed: KV24-"), banner);
        // a note explains a value; it is information, never "pass"
        for (Element li : byClass(qa, ReportCli.XHTML, "li", "st-pass")) {
            assertFalse(li.getTextContent().contains("IEC 60034-1"), li.getTextContent());
        }
    }

    private static void near(double expected, double shown, String context) {
        assertEquals(expected, shown, Math.abs(expected) * 0.006, context);
    }

    private static List<Double> numbers(String s) {
        List<Double> out = new ArrayList<>();
        Matcher m = Pattern.compile("\\d+(\\.\\d+)?").matcher(s);
        while (m.find()) {
            out.add(Double.parseDouble(m.group()));
        }
        return out;
    }

    static Element section0(Document d) {
        return (Element) d.getElementsByTagNameNS(ReportCli.XHTML, "section").item(0);
    }

    static String answer(Document d) {
        List<Element> a = byClass(d, ReportCli.XHTML, "p", "answer");
        return a.isEmpty() ? "" : a.get(0).getTextContent();
    }

    static String provenanceText(Document d) {
        NodeList s = d.getElementsByTagNameNS(ReportCli.XHTML, "section");
        for (int i = 0; i < s.getLength(); i++) {
            Element e = (Element) s.item(i);
            if (e.getAttribute("id").equals("provenance")) {
                return e.getTextContent();
            }
        }
        return "";
    }

    static List<Element> byClass(Document d, String ns, String tag, String cls) {
        NodeList nl = d.getElementsByTagNameNS(ns, tag);
        List<Element> out = new ArrayList<>();
        for (int i = 0; i < nl.getLength(); i++) {
            Element e = (Element) nl.item(i);
            if (List.of(e.getAttribute("class").split(" ")).contains(cls)) {
                out.add(e);
            }
        }
        return out;
    }
}
