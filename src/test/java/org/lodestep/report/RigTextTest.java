package org.lodestep.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;
import org.lodestep.wiring.InsulationReading;
import org.lodestep.rig.ResistanceReading;

class RigTextTest {

    @Test
    void ohmsGetAnSiPrefixAndFourSignificantFigures() {
        assertEquals("1.250 \u03A9", RigText.ohm(1.25));
        assertEquals("47.00 k\u03A9", RigText.ohm(47_000));
        assertEquals("2.000 M\u03A9", RigText.ohm(2e6));
        assertEquals("5.256 G\u03A9", RigText.ohm(5.2561e9));
    }

    @Test
    void resistanceTableNamesLeadsByPositionAndLabelAndShowsOpenPairs() {
        String t = RigText.resistances(List.of(new ResistanceReading(1, 2, 1.5),
                new ResistanceReading(1, 3, Double.POSITIVE_INFINITY)), List.of("blk", "grn", "red"));
        assertTrue(t.contains("1 (blk)"), t);
        assertTrue(t.contains("2 (grn)"), t);
        assertTrue(t.lines().anyMatch(l -> l.contains("3 (red)") && l.endsWith("open")), t);
    }

    @Test
    void insulationAboveRangeIsSaidInWords() {
        String t = RigText.insulation(List.of(new InsulationReading("2-frame", Double.POSITIVE_INFINITY, 500)), List.of());
        assertTrue(t.contains("above range"), t);
        assertTrue(t.contains("500"), t);
    }
}
