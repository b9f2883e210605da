package org.lodestep.report.html;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;
import org.w3c.dom.Document;
import org.w3c.dom.Element;

class WiringDiagramTest {

    private static List<String> svgTexts(WiringDiagram d) throws Exception {
        return XmlCheck.texts(XmlCheck.parse(d.toSvg().markup()), XmlCheck.SVG, "text");
    }

    @Test
    void sixLeadSeriesDrawsBothEndsToTheDriverAndInsulatesTheTaps() throws Exception {
        WiringDiagram d = SampleReports.sixLeadSeries();
        assertEquals(List.of("Black"), d.leadsAt(DriverTerminal.A_PLUS));
        assertEquals(List.of("Green"), d.leadsAt(DriverTerminal.A_MINUS));
        assertEquals(List.of("Yellow", "White"), d.insulated());
        List<String> texts = svgTexts(d);
        for (String s : List.of("A+", "A\u2212", "B+", "B\u2212", "Black", "Yellow", "tap", "Driver")) {
            assertTrue(texts.contains(s), s + " in " + texts);
        }
        assertEquals(2, texts.stream().filter("insulate"::equals).count());
        assertTrue(texts.contains("Insulate, do not connect: Yellow, White"), texts.toString());
    }

    @Test
    void eightLeadParallelJoinsTwoLeadsAtEachTerminal() throws Exception {
        WiringDiagram d = SampleReports.eightLeadParallel();
        assertEquals(List.of("Black", "Orange"), d.leadsAt(DriverTerminal.A_PLUS));
        assertTrue(d.summary().contains("A+ \u2190 Black + Orange (joined)"), d.summary().toString());
        Document doc = XmlCheck.parse(d.toSvg().markup());
        // Junction dots: on each of four lanes, one per lead row plus one at the terminal.
        long dots = XmlCheck.elements(doc, XmlCheck.SVG, "circle").stream()
                .filter(c -> "4".equals(c.getAttribute("r"))).count();
        assertEquals(4 * 3, dots);
    }

    @Test
    void eightLeadSeriesTiesTheInnerEndsAndSaysSo() throws Exception {
        WiringDiagram d = SampleReports.eightLeadSeries();
        assertEquals(List.of(List.of("Green", "Orange"), List.of("Blue", "Yellow")), d.ties());
        List<String> texts = svgTexts(d);
        assertTrue(texts.contains("J1"));
        assertTrue(texts.contains("J2: Blue + Yellow tied together, insulated"), texts.toString());
        // Each phase has two coils, named A1, A2, B1, B2.
        assertTrue(texts.containsAll(List.of("A1", "A2", "B1", "B2")), texts.toString());
    }

    @Test
    void fiveLeadCommonIsOneLeadOnBothCoilsWiredToCommon() throws Exception {
        WiringDiagram d = SampleReports.fiveLeadUnipolar();
        assertEquals(List.of("Black", "Red", "Green", "Blue", "White"), d.leads());
        assertEquals(List.of("Red"), d.leadsAt(DriverTerminal.COMMON));
        assertTrue(svgTexts(d).contains("COM"));
    }

    @Test
    void halfCoilUsesOneEndAndTheTap() {
        WiringDiagram d = WiringDiagram.builder("Bipolar half-coil, 6-lead")
                .coil("A", "Black", "Green", "Yellow").coil("B", "Red", "Blue", "White")
                .connect("Black", DriverTerminal.A_PLUS).connect("Yellow", DriverTerminal.A_MINUS)
                .connect("Red", DriverTerminal.B_PLUS).connect("White", DriverTerminal.B_MINUS)
                .insulate("Green").insulate("Blue").build();
        assertEquals(List.of("Yellow"), d.leadsAt(DriverTerminal.A_MINUS));
        assertEquals(List.of("Green", "Blue"), d.insulated());
    }

    @Test
    void leadTagsShowASwatchOnlyForColourWords() {
        assertEquals("#c8322b", WiringDiagramSvg.swatch("Red"));
        assertEquals("#c8322b", WiringDiagramSvg.swatch("RED/wht"));
        assertEquals("#e8c619", WiringDiagramSvg.swatch("yel"));
        assertEquals(null, WiringDiagramSvg.swatch("lead 3"));
        assertEquals(null, WiringDiagramSvg.swatch("7"));
    }

    @Test
    void longLeadLabelIsSqueezedNotCut() throws Exception {
        String longLabel = "terminal-block-position-12";
        WiringDiagram d = WiringDiagram.builder("x").coil("A", longLabel, "b").coil("B", "c", "e")
                .connect(longLabel, DriverTerminal.A_PLUS).connect("b", DriverTerminal.A_MINUS)
                .connect("c", DriverTerminal.B_PLUS).connect("e", DriverTerminal.B_MINUS).build();
        Document doc = XmlCheck.parse(d.toSvg().markup());
        Element t = XmlCheck.elements(doc, XmlCheck.SVG, "text").stream()
                .filter(e -> longLabel.equals(e.getTextContent())).findFirst().orElseThrow();
        assertTrue(t.hasAttribute("textLength"));
    }

    @Test
    void everyLeadMustGoSomewhereExactlyOnce() {
        WiringDiagram.Builder missing = WiringDiagram.builder("x").coil("A", "a", "b").coil("B", "c", "d")
                .connect("a", DriverTerminal.A_PLUS).connect("b", DriverTerminal.A_MINUS)
                .connect("c", DriverTerminal.B_PLUS);
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, missing::build);
        assertTrue(e.getMessage().contains("'d' has no destination"), e.getMessage());

        WiringDiagram.Builder twice = WiringDiagram.builder("x").coil("A", "a", "b").connect("a",
                DriverTerminal.A_PLUS);
        e = assertThrows(IllegalArgumentException.class, () -> twice.insulate("a"));
        assertTrue(e.getMessage().contains("two destinations"), e.getMessage());

        WiringDiagram.Builder stray = WiringDiagram.builder("x").coil("A", "a", "b")
                .connect("a", DriverTerminal.A_PLUS).connect("b", DriverTerminal.A_MINUS).insulate("zz");
        e = assertThrows(IllegalArgumentException.class, stray::build);
        assertTrue(e.getMessage().contains("'zz' is wired but is on no coil"), e.getMessage());
    }

    @Test
    void rejectsLeadSharedByCoilsUnlessItIsTheirTap() {
        WiringDiagram.Builder b = WiringDiagram.builder("x").coil("A", "a", "b").coil("B", "b", "c")
                .connect("a", DriverTerminal.A_PLUS).connect("b", DriverTerminal.A_MINUS)
                .connect("c", DriverTerminal.B_PLUS);
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, b::build);
        assertTrue(e.getMessage().contains("shared centre tap"), e.getMessage());
        assertThrows(IllegalArgumentException.class, () -> new WiringDiagram.Coil("C", "a", "b", null));
        assertThrows(IllegalArgumentException.class, () -> new WiringDiagram.Coil("A", "a", "a", null));
    }

    @Test
    void unipolarDiagramUsesUnipolarTerminalNames() throws Exception {
        // 6-lead unipolar: each winding's ends to A, A' (B, B'), both taps to the supply common.
        WiringDiagram d = WiringDiagram.builder("Unipolar, 6-lead")
                .coil("A", "Black", "Green", "Yellow").coil("B", "Red", "Blue", "White")
                .connect("Black", DriverTerminal.A).connect("Green", DriverTerminal.A_PRIME)
                .connect("Red", DriverTerminal.B).connect("Blue", DriverTerminal.B_PRIME)
                .connect("Yellow", DriverTerminal.COMMON).connect("White", DriverTerminal.COMMON).build();
        List<String> texts = svgTexts(d);
        assertTrue(texts.containsAll(List.of("A", "A\u2032", "B", "B\u2032", "COM")), texts.toString());
        assertTrue(!texts.contains("A+"), "no bipolar terminal drawn: " + texts);
        assertTrue(d.summary().contains("COM \u2190 Yellow + White (joined)"), d.summary().toString());
    }

    @Test
    void terminalNamesOfTheAnalysesParse() {
        assertEquals(DriverTerminal.A_MINUS, DriverTerminal.parse("A-"));
        assertEquals(DriverTerminal.A_MINUS, DriverTerminal.parse("A\u2212"));
        assertEquals(DriverTerminal.A_PRIME, DriverTerminal.parse("A'"));
        assertEquals(DriverTerminal.B_PRIME, DriverTerminal.parse("B/"));
        assertEquals(DriverTerminal.COMMON, DriverTerminal.parse("B COM"));
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> DriverTerminal.parse("C+"));
        assertTrue(e.getMessage().contains("'C+'"), e.getMessage());
    }

    @Test
    void guessedCoilStartsAreDrawnAsUnknownAndSaidSo() throws Exception {
        WiringDiagram.Builder b = WiringDiagram.builder("Bipolar series, 8-lead").startsUnknown()
                .coil("A", "1", "5").coil("A", "2", "7").coil("B", "3", "8").coil("B", "4", "6")
                .connect("1", DriverTerminal.A_PLUS).connect("7", DriverTerminal.A_MINUS)
                .connect("3", DriverTerminal.B_PLUS).connect("6", DriverTerminal.B_MINUS).tie("5", "2").tie("8", "4");
        WiringDiagram d = b.build();
        assertTrue(!d.startsKnown());
        SvgFragment svg = d.toSvg();
        Document doc = XmlCheck.parse(svg.markup());
        org.w3c.dom.NodeList groups = doc.getElementsByTagNameNS(XmlCheck.SVG, "g");
        int unknown = 0;
        for (int i = 0; i < groups.getLength(); i++) {
            unknown += ((Element) groups.item(i)).getAttribute("class").equals("start-unknown") ? 1 : 0;
        }
        assertEquals(4 + 1, unknown, "each coil's start and the legend's");
        assertTrue(XmlCheck.texts(doc, XmlCheck.SVG, "text").contains("coil start not known (guess)"));
        assertTrue(svg.description().contains("coil starts not known"), svg.description());
        // the same wiring with known starts draws filled dots only
        WiringDiagram known = WiringDiagram.builder("Bipolar, 4-lead").coil("A", "red", "blue")
                .coil("B", "green", "black").connect("red", DriverTerminal.A_PLUS)
                .connect("blue", DriverTerminal.A_MINUS).connect("green", DriverTerminal.B_PLUS)
                .connect("black", DriverTerminal.B_MINUS).build();
        assertTrue(!known.toSvg().markup().contains("start-unknown"));
    }
}
