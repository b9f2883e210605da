package org.lodestep.report;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;

import org.junit.jupiter.api.Test;
import org.lodestep.wiring.IdentifySettings;
import org.lodestep.wiring.Identification;
import org.lodestep.wiring.LeadIdentifier;
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
}
