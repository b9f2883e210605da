package org.lodestep.wiring;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Random;
import java.util.Set;
import java.util.stream.Collectors;

import org.junit.jupiter.api.Test;

/**
 * Engine tests. Expected layouts follow from series circuits (common practice, from the circuit topology, references
 * §4, "follows from circuit
 * topology; no standard", common practice): coil r, two coils in series 2r, separate windings open.
 */
class LeadIdentifierTest {
    private static final List<String> COLOURS8 = List.of("red", "blue", "green", "black", "white", "yellow",
            "orange", "brown");

    private static Identification identify(ResistanceMatrix m) {
        return LeadIdentifier.identify(m, IdentifySettings.DEFAULT);
    }

    private static Set<String> codes(Identification id) {
        return id.findings().stream().map(f -> f.code().code()).collect(Collectors.toSet());
    }

    /** Every layout of a lead count, labels shuffled, full matrix with contact resistance and noise. */
    private static void identifiesEveryLayout(int n, Topology expected, double coilOhm) {
        int layouts = MotorHypotheses.forLeads(n).size();
        for (int k = 0; k < layouts; k++) {
            List<String> labels = SimulatedMotor.shuffled(COLOURS8.subList(0, n), k);
            SimulatedMotor motor = SimulatedMotor.layout(labels, k, coilOhm);
            Identification id = identify(motor.matrix(new Random(k), List.of()));
            assertEquals(expected, id.topology(), "layout " + k + " " + labels);
            assertTrue(id.determined());
            assertEquals(Signatures.of(motor), Signatures.of(id), "layout " + k);
            assertTrue(id.findings().isEmpty(), "layout " + k + ": " + id.findings());
        }
    }

    @Test
    void identifiesEveryFourLeadLayoutWithContactResistanceAndNoise() {
        // 2.4 Ω phases: common practice, from the circuit topology, references §4 (r = 1.20 Ω, phase 2.40 Ω).
        identifiesEveryLayout(4, Topology.FOUR_LEAD, 2.40);
    }

    @Test
    void identifiesEveryFiveLeadLayoutWithContactResistanceAndNoise() {
        identifiesEveryLayout(5, Topology.FIVE_LEAD, 1.20);
    }

    @Test
    void identifiesEverySixLeadLayoutWithContactResistanceAndNoise() {
        identifiesEveryLayout(6, Topology.SIX_LEAD, 1.20);
    }

    @Test
    void identifiesEveryEightLeadLayoutWithContactResistanceAndNoise() {
        identifiesEveryLayout(8, Topology.EIGHT_LEAD, 1.20);
    }

    @Test
    void sixLeadWindingCarriesHalvesAndEndToEndOfItem4() {
        // common practice, from the circuit topology, references §4: r = 1.20 Ω → A1–A2 2.40, A1–Acom 1.20, A1–B1
        // open (ideal meter, no contact).
        ResistanceMatrix m = ResistanceMatrix.builder()
                .reading("A1", "A2", 2.40).reading("A1", "Acom", 1.20).reading("A2", "Acom", 1.20)
                .reading("B1", "B2", 2.40).reading("B1", "Bcom", 1.20).reading("B2", "Bcom", 1.20)
                .open("A1", "B1").build();
        Identification id = identify(m);
        assertEquals(Topology.SIX_LEAD, id.topology());
        Winding a = id.windings().get(0);
        assertEquals("Acom", a.tap());
        assertEquals(2.40, a.resistanceOhm(), 1e-12);
        assertEquals(List.of(1.20, 1.20), a.halfResistancesOhm());
        assertTrue(id.determined(), "7 of 15 pairs: the two windings need one open reading between them");
        assertEquals(7, id.measuredPairs());
        assertEquals(15, id.totalPairs());
    }

    @Test
    void fourLeadFromThreeReadingsIsDetermined() {
        ResistanceMatrix m = ResistanceMatrix.builder().reading("1", "2", 2.5).reading("3", "4", 2.45).open("1", "3")
                .build();
        Identification id = identify(m);
        assertEquals(Topology.FOUR_LEAD, id.topology());
        assertTrue(id.determined());
        assertTrue(id.missingPairs().isEmpty());
    }

    @Test
    void undecidedGroupsListThePairsToMeasureNext() {
        ResistanceMatrix m = ResistanceMatrix.builder().reading("1", "2", 2.5).reading("3", "4", 2.45).lead("5")
                .lead("6").build();
        Identification id = identify(m);
        assertFalse(id.determined());
        assertEquals(Topology.UNKNOWN, id.topology());
        assertTrue(id.missingPairs().contains(LeadPair.of("1", "3")), id.missingPairs().toString());
        assertTrue(id.missingPairs().contains(LeadPair.of("5", "6")), id.missingPairs().toString());
    }

    @Test
    void ambiguousTapAsksForTheThirdReading() {
        // 1.0 and 1.3 Ω with up to 0.3 Ω contact per reading: halves 1.0 and 1.3 (tap a) or half 0.7-1.0 and whole
        // 1.3 (tap b) both fit equal coils, so only the third reading b-c can decide.
        ResistanceMatrix m = ResistanceMatrix.builder().reading("a", "b", 1.0).reading("a", "c", 1.3)
                .reading("d", "e", 1.0).reading("d", "f", 2.0).reading("e", "f", 1.0).open("a", "d").build();
        Identification id = identify(m);
        assertFalse(id.determined());
        assertEquals(List.of(LeadPair.of("b", "c")), id.missingPairs());
    }

    @Test
    void openHalfWindingOfSixLeadIsAnErrorNamingTheLead() {
        List<String> labels = List.of("black", "green", "yellow", "red", "blue", "white");
        ResistanceMatrix.Builder b = ResistanceMatrix.builder();
        labels.forEach(b::lead);
        b.reading("black", "yellow", 1.25).reading("red", "white", 1.22).reading("blue", "white", 1.27)
                .reading("red", "blue", 2.45);
        for (int i = 0; i < 6; i++) {
            for (int j = i + 1; j < 6; j++) {
                LeadPair p = LeadPair.of(labels.get(i), labels.get(j));
                if (!Set.of(LeadPair.of("black", "yellow"), LeadPair.of("red", "white"), LeadPair.of("blue", "white"),
                        LeadPair.of("red", "blue")).contains(p)) {
                    b.open(p.a(), p.b());
                }
            }
        }
        Identification id = identify(b.build());
        // The lead count and the healthy windings leave one reading: a 6-lead motor whose half green-tap is open.
        assertEquals(Topology.SIX_LEAD, id.topology());
        assertTrue(id.hasError());
        Finding f = id.findings().get(0);
        assertEquals(FindingCode.OPEN_WINDING, f.code());
        assertEquals(List.of("green", "black", "yellow"), f.leads());
        assertTrue(f.message().contains("black") && f.message().contains("yellow"), f.message());
    }

    @Test
    void phaseImbalanceBeyondTenPercentIsAWarning() {
        // Common practice: ±10 % phase-resistance tolerance (references §4).
        ResistanceMatrix m = ResistanceMatrix.builder().reading("1", "2", 10.0).reading("3", "4", 12.0)
                .open("1", "3").build();
        Identification id = identify(m);
        assertEquals(Set.of("phase-imbalance"), codes(id));
        assertEquals(Severity.WARNING, id.findings().get(0).severity());
        assertFalse(id.hasError());
        // (12 − 10)/11 = 18.2 %
        assertTrue(id.findings().get(0).message().contains("18.2 %"), id.findings().get(0).message());
    }

    @Test
    void imbalanceWithinToleranceOrContactAllowanceIsNotReported() {
        ResistanceMatrix m = ResistanceMatrix.builder().reading("1", "2", 10.0).reading("3", "4", 10.9)
                .open("1", "3").build();
        assertTrue(identify(m).findings().isEmpty());
        // 1.0 vs 1.2 Ω is 18 %, but 0.2 Ω is within what probe contact alone can add.
        ResistanceMatrix low = ResistanceMatrix.builder().reading("1", "2", 1.0).reading("3", "4", 1.2)
                .open("1", "3").build();
        assertTrue(identify(low).findings().isEmpty());
    }

    @Test
    void imbalanceFractionMatchesItem4() {
        // common practice, from the circuit topology, references §4: coils 1.20 and 1.26 Ω → 4.878 % (abs 1e-3 %).
        assertEquals(4.878, PhaseImbalance.percent(1.20, 1.26), 1e-3);
    }

    @Test
    void unequalHalvesThatAddUpAreTapAsymmetry() {
        // Shorted turns: halves 6.0 and 4.5 Ω add up to the 10.5 Ω end-to-end reading (series relation holds).
        ResistanceMatrix m = sixLead(6.0, 4.5, 10.5);
        Identification id = identify(m);
        assertEquals(Topology.SIX_LEAD, id.topology());
        assertTrue(codes(id).contains("tap-asymmetry"), id.findings().toString());
        assertFalse(codes(id).contains("contact-resistance"));
    }

    @Test
    void endToEndFarAboveItsHalvesIsContactResistance() {
        ResistanceMatrix m = sixLead(6.0, 6.0, 13.2);
        Identification id = identify(m);
        assertEquals(Set.of("contact-resistance"), codes(id));
        assertTrue(id.findings().get(0).leads().containsAll(List.of("a1", "a2")));
    }

    @Test
    void halfFarAboveWhatTheWholeAllowsIsContactResistanceOnThatHalf() {
        ResistanceMatrix m = sixLead(7.2, 6.0, 12.1);
        Identification id = identify(m);
        assertTrue(codes(id).contains("contact-resistance"), id.findings().toString());
        assertTrue(id.findings().get(0).message().contains("at-a1"), id.findings().get(0).message());
    }

    @Test
    void wholeBelowAHalfIsAnInconsistentMatrix() {
        // The fit still finds the tap (the largest reading is end to end), but 5.0 < 6.0 breaks the series relation.
        ResistanceMatrix m = ResistanceMatrix.builder()
                .reading("a1", "at", 6.0).reading("a2", "at", 4.9).reading("a1", "a2", 6.4)
                .reading("b1", "bt", 6.0).reading("b2", "bt", 6.0).reading("b1", "b2", 12.0)
                .open("a1", "b1").build();
        Identification id = identify(m);
        assertTrue(codes(id).contains("inconsistent-matrix") || codes(id).contains("contact-resistance"),
                id.findings().toString());
        ResistanceMatrix worse = ResistanceMatrix.builder()
                .reading("a1", "at", 6.0).reading("a2", "at", 6.0).reading("a1", "a2", 3.0)
                .reading("b1", "bt", 6.0).reading("b2", "bt", 6.0).reading("b1", "b2", 12.0)
                .open("a1", "b1").build();
        Identification w = identify(worse);
        assertTrue(codes(w).contains("inconsistent-matrix"), w.findings().toString());
    }

    @Test
    void endsReadingOpenWhileBothHalvesConductIsAnInconsistentMatrixError() {
        // Series relation of a tapped winding (circuit topology, common practice, from the circuit topology,
        // references §4): end-end = end-CT + CT-end,
        // so both halves conducting forces the ends to conduct. Before this check the open end-end reading was taken
        // as "not measured" and the winding was drawn with a computed 4.90 ohm and no finding.
        ResistanceMatrix m = ResistanceMatrix.builder()
                .reading("red", "blue", 2.4).reading("red", "black", 2.5).open("blue", "black")
                .open("green", "black").open("red", "green").open("blue", "green").build();
        Identification id = identify(m);
        assertTrue(codes(id).contains("inconsistent-matrix"), id.findings().toString());
        assertTrue(id.hasError(), id.findings().toString());

        // The same holds in any layout: a 5-lead common group (item 4: COM-end = r, end-end = 2r) with one end-end
        // pair recorded open.
        ResistanceMatrix.Builder five = ResistanceMatrix.builder();
        for (String e : List.of("1", "2", "3", "4")) {
            five.reading("c", e, 1.2);
        }
        five.open("1", "2").reading("1", "3", 2.4).reading("1", "4", 2.4).reading("2", "3", 2.4)
                .reading("2", "4", 2.4).reading("3", "4", 2.4);
        Identification f = identify(five.build());
        assertTrue(f.findings().stream().anyMatch(x -> x.code().code().equals("inconsistent-matrix")
                && x.message().startsWith("1-2 reads open")), f.findings().toString());
    }

    @Test
    void fourLeadsAllJoinedIsAnInconsistentMatrixError() {
        ResistanceMatrix.Builder b = ResistanceMatrix.builder();
        String[] l = {"1", "2", "3", "4"};
        for (int i = 0; i < 4; i++) {
            for (int j = i + 1; j < 4; j++) {
                b.reading(l[i], l[j], 2.4);
            }
        }
        Identification id = identify(b.build());
        assertEquals(Topology.UNKNOWN, id.topology());
        assertTrue(id.hasError());
        assertEquals(Set.of("inconsistent-matrix"), codes(id));
    }

    @Test
    void highFiniteReadingBetweenPhasesIsLeakage() {
        ResistanceMatrix m = ResistanceMatrix.builder().reading("1", "2", 2.4).reading("3", "4", 2.45)
                .reading("1", "3", 48_000).open("1", "4").open("2", "3").open("2", "4").build();
        Identification id = identify(m);
        assertEquals(Topology.FOUR_LEAD, id.topology(), "leakage must not merge the phases");
        assertEquals(Set.of("phase-leakage"), codes(id));
        assertTrue(id.hasError());
        assertEquals(List.of("1", "3"), id.findings().get(0).leads());
    }

    /**
     * One leakage path of 56 Ω from a point 30 % along winding 1-2 to a point 80 % along winding 3-4. Series
     * resistances add (Ohm's law), so each cross reading is the path plus the copper from each lead to its point:
     * one fault, read four times, named once, nearest 1 and 4.
     */
    @Test
    void readingsBetweenTwoWindingsAreOneLeakageFaultNearestTheirLowestPair() {
        double r12 = 2.40;
        double r34 = 2.38;
        double pathOhm = 56.0;
        double x = 0.3;
        double y = 0.8;
        ResistanceMatrix m = ResistanceMatrix.builder().reading("1", "2", r12).reading("3", "4", r34)
                .reading("1", "3", x * r12 + pathOhm + y * r34)
                .reading("1", "4", x * r12 + pathOhm + (1 - y) * r34)
                .reading("2", "3", (1 - x) * r12 + pathOhm + y * r34)
                .reading("2", "4", (1 - x) * r12 + pathOhm + (1 - y) * r34).build();
        Identification id = identify(m);
        assertEquals(Topology.FOUR_LEAD, id.topology());
        assertEquals(1, id.findings().size(), id.findings().toString());
        Finding f = id.findings().get(0);
        assertEquals("phase-leakage", f.code().code());
        assertEquals(List.of("1", "2", "3", "4"), f.leads());
        assertTrue(f.message().contains("Windings 1-2 and 3-4 are not isolated"), f.message());
        assertTrue(f.message().contains("one leakage path of about 57.2 Ω nearest 1 and 4"), f.message());
    }

    /** Two paths far apart along the windings spread the readings wider than both windings' copper. */
    @Test
    void readingsSpreadWiderThanTheCopperTakeMoreThanOnePath() {
        ResistanceMatrix m = ResistanceMatrix.builder().reading("1", "2", 2.4).reading("3", "4", 2.4)
                .reading("1", "3", 40.0).reading("1", "4", 70.0).reading("2", "3", 65.0).reading("2", "4", 90.0)
                .build();
        Identification id = identify(m);
        assertEquals(1, id.findings().size(), id.findings().toString());
        assertTrue(id.findings().get(0).message().contains("more than one path"), id.findings().get(0).message());
    }

    @Test
    void loneKiloohmReadingIsLeakageNotAWinding() {
        ResistanceMatrix m = ResistanceMatrix.builder().reading("1", "2", 48_000).lead("3").lead("4").build();
        Identification id = identify(m);
        assertEquals("leakage", id.readings().get(0).kind());
        assertTrue(id.windings().isEmpty());
        assertEquals(Set.of("phase-leakage"), codes(id));
    }

    @Test
    void contactOutlierInFiveLeadGroupIsFound() {
        ResistanceMatrix.Builder b = ResistanceMatrix.builder();
        String com = "c";
        List<String> ends = List.of("p", "q", "r", "s");
        for (String e : ends) {
            b.reading(com, e, 5.0);
        }
        for (int i = 0; i < 4; i++) {
            for (int j = i + 1; j < 4; j++) {
                b.reading(ends.get(i), ends.get(j), i == 0 && j == 1 ? 12.0 : 10.0);
            }
        }
        Identification id = identify(b.build());
        assertEquals(Topology.FIVE_LEAD, id.topology());
        assertEquals(Set.of("contact-resistance"), codes(id));
        assertEquals(List.of("p", "q"), id.findings().get(0).leads());
    }

    @Test
    void threeLeadsWithATapAreHandledAsUnknownWithTheirWinding() {
        ResistanceMatrix m = ResistanceMatrix.builder().reading("x", "y", 2.4).reading("x", "t", 1.2)
                .reading("y", "t", 1.2).build();
        Identification id = identify(m);
        assertEquals(Topology.UNKNOWN, id.topology());
        assertEquals("t", id.windings().get(0).tap());
        assertTrue(id.connections().isEmpty());
    }

    @Test
    void temperatureCorrectionUsesTheChosenConstant() {
        // IEC 60034-1, references §3: 1.500 Ω at 25 °C → 1.47110 Ω at 20 °C (k = 234.5) / 1.47115 Ω (k = 235).
        ResistanceMatrix m = ResistanceMatrix.builder().reading("1", "2", 1.5).reading("3", "4", 1.5)
                .open("1", "3").build();
        Identification iec = LeadIdentifier.identify(m, IdentifySettings.DEFAULT.withTemperatures(25, 20));
        assertEquals(1.47115, iec.windingsAtReferenceOhm().get(0), 1.5e-5);
        assertEquals(235.0, iec.temperature().constantC());
        Identification ieee = LeadIdentifier.identify(m, IdentifySettings.DEFAULT.withTemperatures(25, 20)
                .withCopper(CopperTemperature.Constant.IEEE_234_5));
        assertEquals(1.47110, ieee.windingsAtReferenceOhm().get(0), 1.5e-5);
        assertTrue(identify(m).windingsAtReferenceOhm().isEmpty());
    }

    private static ResistanceMatrix sixLead(double h1, double h2, double whole) {
        return ResistanceMatrix.builder()
                .reading("a1", "at", h1).reading("a2", "at", h2).reading("a1", "a2", whole)
                .reading("b1", "bt", 6.0).reading("b2", "bt", 6.0).reading("b1", "b2", 12.0)
                .open("a1", "b1").build();
    }
}
