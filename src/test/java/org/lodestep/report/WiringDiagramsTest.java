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
                // Every lead the identification knows is on the drawing, each once.
                // every lead on a coil that conducts is drawn (the leads of an open coil are named in the findings)
                Set<String> onCoils = new HashSet<>();
                id.windings().forEach(w -> onCoils.addAll(w.leads()));
                assertEquals(onCoils, new HashSet<>(d.leads()), csv + " " + c.name());
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
