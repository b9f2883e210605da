package org.lodestep.report;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;

import org.junit.jupiter.api.Test;
import org.lodestep.wiring.IdentifySettings;
import org.lodestep.wiring.Identification;
import org.lodestep.wiring.LeadIdentifier;
import org.lodestep.wiring.ProbeSession;
import org.lodestep.wiring.ResistanceMatrix;

/** Text rendering; matrices follow common practice, from the circuit topology, references §4 (r = 1.20 Ω, end to end
/** 2.40 Ω). */
class LeadsTextReportTest {

    private static String render(ResistanceMatrix m, IdentifySettings s) {
        Identification id = LeadIdentifier.identify(m, s);
        StringWriter w = new StringWriter();
        LeadsTextReport.write(new PrintWriter(w, true), "M-1", id);
        return w.toString();
    }

    @Test
    void schematicShowsTapBelowTheWindingWithLabelsAndValues() {
        ResistanceMatrix m = ResistanceMatrix.builder()
                .reading("A1", "A2", 2.40).reading("A1", "Ac", 1.20).reading("A2", "Ac", 1.20)
                .reading("B1", "B2", 2.40).reading("B1", "Bc", 1.20).reading("B2", "Bc", 1.20)
                .open("A1", "B1").build();
        String t = render(m, IdentifySettings.DEFAULT);
        assertTrue(t.contains("A1 o--[ 1.20 Ω ]--+--[ 1.20 Ω ]--o A2   end to end 2.40 Ω"), t);
        String[] lines = t.split("\n");
        int row = -1;
        for (int i = 0; i < lines.length; i++) {
            if (lines[i].contains("A1 o--")) {
                row = i;
            }
        }
        int plus = lines[row].indexOf('+');
        assertTrue(lines[row + 1].indexOf('|') == plus, "tap line under the junction:\n" + t);
        assertTrue(lines[row + 2].indexOf("o Ac (centre tap)") == plus, t);
        assertTrue(t.contains("bipolar-series"));
        assertTrue(t.contains("insulate Ac, Bc"), t);
    }

    @Test
    void missingPairsAndTemperatureAreStated() {
        ResistanceMatrix m = ResistanceMatrix.builder().reading("1", "2", 2.4).reading("3", "4", 2.4).build();
        String t = render(m, IdentifySettings.DEFAULT.withTemperatures(30, 20));
        assertTrue(t.contains("Measure next: 1-3"), t);
        assertTrue(t.contains("not yet certain"), t);
        assertTrue(t.contains("IEC 60034-1"), t);
    }

    @Test
    void fiveLeadDrawsTheCommonLead() {
        ResistanceMatrix.Builder b = ResistanceMatrix.builder();
        String[] ends = {"p", "q", "r", "s"};
        for (String e : ends) {
            b.reading("c", e, 1.2);
        }
        for (int i = 0; i < 4; i++) {
            for (int j = i + 1; j < 4; j++) {
                b.reading(ends[i], ends[j], 2.4);
            }
        }
        String t = render(b.build(), IdentifySettings.DEFAULT);
        assertTrue(t.contains("c o--+--[ 1.20 Ω ]--o p"), t);
        assertTrue(t.contains("c is the common lead"), t);
        assertTrue(t.contains("[PROVISIONAL]"), t);
    }

    @Test
    void inferredValuesAreMarkedNextToTheReadOnes() {
        // Issue 11's case: black-green read whole (4.00 Ω) and black-tap read 2.16 Ω; green-tap was not read, so its
        // 1.84 Ω is the whole less the read half (series relation, references §4) and is marked inferred.
        ResistanceMatrix m = ResistanceMatrix.builder()
                .reading("black", "green", 4.00).reading("black", "yellow", 2.16)
                .reading("red", "blue", 4.00).reading("red", "white", 2.00).reading("blue", "white", 2.00)
                .open("black", "red").build();
        String t = render(m, IdentifySettings.DEFAULT);
        assertTrue(t.contains("black o--[ 2.16 Ω ]--+--[ 1.84 Ω inferred ]--o green   end to end 4.00 Ω\n")
                || t.contains("green o--[ 1.84 Ω inferred ]--+--[ 2.16 Ω ]--o black   end to end 4.00 Ω\n"), t);
        assertTrue(t.contains("red o--[ 2.00 Ω ]--+--[ 2.00 Ω ]--o blue   end to end 4.00 Ω\n"), t);
        assertTrue(t.contains("Values marked inferred were not read"), t);
    }

    @Test
    void aProbeThatStoppedOnceCertainShowsThePairsItInferred() {
        ProbeSession s = new ProbeSession(java.util.List.of("a", "b", "c", "d"), IdentifySettings.DEFAULT);
        // a-b is a winding; c-d must be the other one: read for its resistance, the cross pairs inferred open
        s.record(s.nextPair().orElseThrow(), java.util.OptionalDouble.of(2.41));
        s.record(s.nextPair().orElseThrow(), java.util.OptionalDouble.of(2.45));
        StringWriter w = new StringWriter();
        LeadsTextReport.write(new PrintWriter(w, true), "M-2", s.result());
        String t = w.toString();
        assertTrue(t.contains("M-2: 4 leads, 2 of 6 pairs measured"), t);
        assertTrue(t.contains("Inferred, not read: a-c, a-d, b-c, b-d open"), t);
        assertTrue(t.contains("a o--[ 2.41 Ω ]--o b"), t);
    }

    @Test
    void anOpenCoilIsDrawnBrokenNotHealthy() {
        ResistanceMatrix m = ResistanceMatrix.builder().reading("black", "orange", 2.4).open("black", "red")
                .open("black", "blue").open("orange", "red").open("orange", "blue").open("red", "blue").build();
        String t = render(m, IdentifySettings.DEFAULT);
        assertTrue(t.contains("open coil:      red o--/ OPEN /--o blue"), t);
        assertTrue(!t.contains("red o--["), "the open coil has no value:\n" + t);
        // 5 leads: common c with three coils read, the coil to e open
        ResistanceMatrix.Builder b = ResistanceMatrix.builder();
        for (String x : new String[] {"p", "q", "r"}) {
            b.reading("c", x, 1.2);
            b.open(x, "e");
        }
        b.reading("p", "q", 2.4).reading("p", "r", 2.4).reading("q", "r", 2.4).open("c", "e");
        String five = render(b.build(), IdentifySettings.DEFAULT);
        assertTrue(five.contains("+--/ OPEN /--o e"), five);
        assertTrue(five.contains("c is the common lead"), five);
    }
}
