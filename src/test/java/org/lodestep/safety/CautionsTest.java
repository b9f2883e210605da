package org.lodestep.safety;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

import org.junit.jupiter.api.Test;

/** The cautions read whole, defer to local codes where they are the last word, and fit a terminal. */
class CautionsTest {

    @Test
    void everyHazardHasATitleAndWholeSentences() {
        for (Hazard h : Hazard.values()) {
            assertFalse(h.title().isBlank(), h.name());
            for (String s : h.sentences()) {
                assertTrue(Character.isUpperCase(s.charAt(0)) && s.endsWith("."), h.name() + ": " + s);
            }
            assertTrue(h.text().startsWith(String.join(" ", h.sentences())), h.name());
        }
    }

    @Test
    void theCautionsBeforeLiveWorkDeferToLocalCodesAndLicensedPractice() {
        // insulation tests, energised windings and a moving axis: the work a bench tool must not seem to authorise
        for (Hazard h : List.of(Hazard.INSULATION_TEST, Hazard.ENERGISED_WINDING, Hazard.MOVING_AXIS)) {
            String deferral = h.deferral();
            assertTrue(deferral.contains("licensed practice") && deferral.contains("precedence"), h.name());
            assertTrue(h.text().endsWith(deferral), h.name());
        }
        assertTrue(Cautions.insulationTestLine(500).contains("take precedence"));
        assertTrue(Cautions.leadMeasurementLine("with --ambient-c").contains("local codes"));
    }

    @Test
    void aRigCautionNamesTheActionAndKeepsEveryWordWithinTheTerminalWidth() {
        String situation = "the rig applies 500 V DC between the chosen lead and the motor frame.";
        String block = Cautions.beforeRigAction("insulation test", situation, Hazard.INSULATION_TEST,
                Hazard.HOT_MOTOR);
        String[] lines = block.split(System.lineSeparator());
        assertTrue(lines[0].startsWith("CAUTION - insulation test: the rig applies 500 V DC"), lines[0]);
        assertTrue(lines.length > 3, block);
        for (int i = 0; i < lines.length; i++) {
            assertTrue(lines[i].length() <= 110, "line " + i + " is " + lines[i].length() + " columns");
            assertFalse(lines[i].endsWith(" "), "line " + i + " ends in a space");
            if (i > 0) {
                assertTrue(lines[i].startsWith("  ") && !lines[i].startsWith("   "), "line " + i + ": " + lines[i]);
            }
        }
        List<String> expected = new ArrayList<>(List.of(("CAUTION - insulation test: " + situation).split(" ")));
        for (String s : Cautions.sentences(Hazard.INSULATION_TEST, Hazard.HOT_MOTOR)) {
            expected.addAll(List.of(s.split(" ")));
        }
        assertEquals(expected, Arrays.asList(block.trim().split("\\s+")));
    }

    @Test
    void sentencesComeHazardByHazardAndTheDeferralsLastEachOnce() {
        List<String> both = Cautions.sentences(Hazard.MOVING_AXIS, Hazard.HOT_MOTOR);
        List<String> expected = new ArrayList<>(Hazard.MOVING_AXIS.sentences());
        expected.addAll(Hazard.HOT_MOTOR.sentences());
        expected.add(Hazard.MOVING_AXIS.deferral());
        assertEquals(expected, both);
        // two hazards with the same deferral: it closes the list once
        List<String> electrical = Cautions.sentences(Hazard.INSULATION_TEST, Hazard.ENERGISED_WINDING);
        assertEquals(1, electrical.stream().filter(Hazard.INSULATION_TEST.deferral()::equals).count());
        assertEquals(Hazard.INSULATION_TEST.deferral(), electrical.get(electrical.size() - 1));
    }

    @Test
    void theInsulationLineGivesTheTestVoltageInWholeVolts() {
        assertTrue(Cautions.insulationTestLine(499.6).startsWith("Caution: the insulation test applies 500 V DC."));
    }
}
