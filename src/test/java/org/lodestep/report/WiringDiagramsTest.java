package org.lodestep.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.Set;
import java.util.List;
import java.util.Map;
import java.util.OptionalDouble;
import java.util.stream.Stream;

import org.junit.jupiter.api.Test;
import org.lodestep.capture.LeadPairReading;
import org.lodestep.capture.ResistanceCsvReader;
import org.lodestep.capture.ResistanceReadings;
import org.lodestep.report.html.DriverTerminal;
import org.lodestep.report.html.WiringDiagram;
import org.lodestep.wiring.DriverWiring;
import org.lodestep.wiring.IdentifySettings;
import org.lodestep.wiring.Identification;
import org.lodestep.wiring.LeadIdentifier;
import org.lodestep.wiring.ResistanceMatrix;
import org.lodestep.wiring.Topology;

class WiringDiagramsTest {

    static Identification identify(Path csv) throws Exception {
        ResistanceReadings r = ResistanceCsvReader.read(csv);
        ResistanceMatrix.Builder b = ResistanceMatrix.builder();
        r.leads().forEach(b::lead);
        for (LeadPairReading p : r.readings()) {
            b.reading(p.leadA(), p.leadB(), p.open() ? OptionalDouble.empty() : OptionalDouble.of(p.resistanceOhm()));
        }
        return LeadIdentifier.identify(b.build(), IdentifySettings.DEFAULT);
    }

    static List<Path> sampleCaptures() throws Exception {
        try (Stream<Path> s = Files.list(Path.of("sample-captures", "leads"))) {
            return s.filter(p -> p.toString().matches(".*\\.(csv|tsv)")).sorted().toList();
        }
    }

    @Test
    void everyConnectionOfEverySampleMotorMapsOntoADiagram() throws Exception {
        int drawn = 0;
        for (Path csv : sampleCaptures()) {
            Identification id = identify(csv);
            for (DriverWiring c : id.connections()) {
                WiringDiagram d = WiringDiagrams.of(id, c);
                drawn++;
                // Every lead on a coil that conducts is drawn, and so is each lead of an open coil (on its broken
                // coil, insulated); a broken-off tap lead is named in the findings only.
                Set<String> onCoils = new HashSet<>();
                id.windings().forEach(w -> onCoils.addAll(w.leads()));
                id.openCoils().forEach(o -> {
                    onCoils.add(o.end());
                    if (o.otherEnd().size() == 1) {
                        onCoils.addAll(o.otherEnd());
                    }
                });
                assertEquals(onCoils, new HashSet<>(d.leads()), csv + " " + c.name());
                assertEquals(id.openCoils().size(), d.brokenCoils().size());
                Set<String> insulated = new HashSet<>(c.insulate());
                insulated.retainAll(onCoils);
                for (Map.Entry<String, List<String>> e : c.terminals().entrySet()) {
                    assertEquals(e.getValue(), d.leadsAt(DriverTerminal.parse(e.getKey())).stream()
                            .sorted((x, y) -> e.getValue().indexOf(x) - e.getValue().indexOf(y)).toList(),
                            csv + " " + c.name() + " " + e.getKey());
                }
                assertEquals(insulated, new HashSet<>(d.insulated()));
                assertEquals(c.jumpers().size(), d.ties().size());
                assertTrue(d.toSvg().markup().startsWith("<svg"));
            }
        }
        assertTrue(drawn >= 6, "sample motors gave only " + drawn + " connections");
    }

    @Test
    void fiveLeadHalvesBecomeTwoTappedCoilsOnTheCommon() throws Exception {
        Path five = sampleCaptures().stream().filter(p -> p.toString().contains("5lead")).findFirst().orElseThrow();
        Identification id = identify(five);
        assertEquals(Topology.FIVE_LEAD, id.topology());
        WiringDiagram d = WiringDiagrams.of(id, id.connections().get(0));
        assertEquals(2, d.coils().size());
        String com = d.leadsAt(DriverTerminal.COMMON).get(0);
        assertTrue(d.coils().stream().allMatch(c -> com.equals(c.tapLead())));
        assertEquals(List.of("A", "B"), d.coils().stream().map(WiringDiagram.Coil::phase).toList());
    }

    @Test
    void eightLeadSeriesTiesTheInnerEndsOfEachPhase() throws Exception {
        Path eight = sampleCaptures().stream().filter(p -> p.toString().contains("8lead")).findFirst().orElseThrow();
        Identification id = identify(eight);
        DriverWiring series = id.connections().stream().filter(c -> c.name().equals("bipolar-series")).findFirst()
                .orElseThrow();
        WiringDiagram d = WiringDiagrams.of(id, series);
        assertEquals(2, d.ties().size());
        List<String> phases = new ArrayList<>();
        d.coils().forEach(c -> phases.add(c.phase()));
        assertEquals(List.of("A", "A", "B", "B"), phases);
        assertEquals("Bipolar series, 8-lead", d.connection());
        assertFalse(d.summary().isEmpty());
    }

    @Test
    void valuesBesideTheCoilsSayWhichWereInferred() {
        // 6 leads: black-green read whole and black-yellow one half; yellow-green was not read (the whole less the
        // read half, series relation, references §4).
        ResistanceMatrix m = ResistanceMatrix.builder()
                .reading("black", "green", 4.00).reading("black", "yellow", 2.16)
                .reading("red", "blue", 4.00).reading("red", "white", 2.00).reading("blue", "white", 2.00)
                .open("black", "red").build();
        Identification id = LeadIdentifier.identify(m, IdentifySettings.DEFAULT);
        WiringDiagram d = WiringDiagrams.of(id, id.connections().get(0));
        WiringDiagram.Coil black = d.coils().stream().filter(c -> List.of(c.startLead(), c.endLead()).contains("black") || "black".equals(c.tapLead())).findFirst()
                .orElseThrow();
        List<WiringDiagram.SegmentValue> v = d.valuesOf(black);
        assertEquals(2, v.size());
        int read = black.startLead().equals("black") ? 0 : 1;
        assertEquals(new WiringDiagram.SegmentValue("2.16 Ω", false), v.get(read));
        assertEquals(new WiringDiagram.SegmentValue("1.84 Ω", true), v.get(1 - read));
        String svg = d.toSvg().markup();
        assertTrue(svg.contains("1.84 Ω inferred</text>") && svg.contains("class=\"value inferred\""), svg);
        assertTrue(svg.contains(">2.16 Ω</text>"), svg);
    }

    @Test
    void anOpenCoilIsDrawnBrokenWithTheWordOpen() {
        // 8 leads, coil g-h open: the salvage connection draws it broken and insulated
        ResistanceMatrix.Builder b = ResistanceMatrix.builder();
        String[] l = {"a", "b", "c", "d", "e", "f", "g", "h"};
        for (int i = 0; i < 8; i++) {
            for (int j = i + 1; j < 8; j++) {
                if (j == i + 1 && i % 2 == 0 && i < 6) {
                    b.reading(l[i], l[j], 1.2);
                } else {
                    b.open(l[i], l[j]);
                }
            }
        }
        Identification id = LeadIdentifier.identify(b.build(), IdentifySettings.DEFAULT);
        assertEquals(Topology.EIGHT_LEAD, id.topology());
        WiringDiagram d = WiringDiagrams.of(id, id.connections().get(0));
        assertEquals(List.of(new WiringDiagram.BrokenCoil("g", "h", null)), d.brokenCoils());
        assertTrue(d.insulated().containsAll(List.of("g", "h")));
        String svg = d.toSvg().markup();
        assertTrue(svg.contains("<g class=\"coil open\">") && svg.contains("stroke-dasharray=\"5 3\""), svg);
        assertTrue(svg.contains(">open</text>"), svg);
        assertTrue(d.summary().contains("Open coil (drawn broken): g \u2013 h, no continuity"), d.summary().toString());
        // 4 leads, a phase open: no connection works, so the motor is drawn as found
        Identification four = LeadIdentifier.identify(ResistanceMatrix.builder().reading("a", "b", 2.4)
                .open("a", "c").open("a", "d").open("b", "c").open("b", "d").open("c", "d").build(),
                IdentifySettings.DEFAULT);
        assertTrue(four.connections().isEmpty());
        WiringDiagram found = WiringDiagrams.asFound(four).orElseThrow();
        assertEquals(List.of(new WiringDiagram.BrokenCoil("c", "d", null)), found.brokenCoils());
        assertTrue(found.toSvg().markup().contains(">open</text>"));
    }

    @Test
    void theWindingsFoundSoFarAreDrawnWiredToNothing() {
        // a six-lead motor part-probed: one centre-tapped winding 1-2-3 found (1.2 ohm a half, invented), the other
        // leads not measured yet
        ResistanceMatrix.Builder b = ResistanceMatrix.builder();
        for (String l : List.of("1", "2", "3", "4", "5", "6")) {
            b.lead(l);
        }
        b.reading("1", "2", OptionalDouble.of(1.2)).reading("2", "3", OptionalDouble.of(1.2))
                .reading("1", "3", OptionalDouble.of(2.4)).reading("1", "4", OptionalDouble.empty());
        Identification id = LeadIdentifier.identify(b.build(), IdentifySettings.DEFAULT);
        assertTrue(id.connections().isEmpty(), "not certain yet: no connection to draw");
        WiringDiagram d = WiringDiagrams.soFar(id);
        assertEquals(1, d.coils().size());
        assertEquals("2", d.coils().get(0).tapLead());
        assertEquals(List.of("Not wired yet: 1, 2, 3"), d.summary());
        String svg = d.toSvg().markup();
        assertFalse(svg.contains(">Driver<"), "nothing is wired: no driver drawn");
        assertTrue(svg.contains(">Phase A<"), svg);
    }
}
