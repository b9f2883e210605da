package org.lodestep.wiring;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;

/** Tap finding (common practice, from the circuit topology, references §4: tap-to-end r, end-to-end 2r). */
class HubFitTest {

    @Test
    void twoEqualReadingsPutTheTapAtTheSharedLead() {
        ResistanceMatrix m = ResistanceMatrix.builder().reading("x", "t", 1.3).reading("y", "t", 1.25).build();
        assertEquals("t", new HubFit(List.of("x", "t", "y"), m, 0.3).best.hub());
    }

    @Test
    void halfAndWholePutTheTapAtTheFarEndOfTheHalf() {
        // x-t = 1.2 + contact, x-y = 2.4 + contact: the tap is t.
        ResistanceMatrix m = ResistanceMatrix.builder().reading("x", "t", 1.45).reading("x", "y", 2.55).build();
        HubFit f = new HubFit(List.of("x", "t", "y"), m, 0.3);
        assertEquals("t", f.best.hub());
        assertEquals(1.10, f.best.coilOhm()[1], 1e-9, "y-t follows from the series relation: 2.55 − 1.45");
    }

    @Test
    void threeEqualReadingsFitNoTap() {
        ResistanceMatrix m = ResistanceMatrix.builder().reading("x", "t", 2.0).reading("x", "y", 2.0)
                .reading("y", "t", 2.0).build();
        HubFit f = new HubFit(List.of("x", "t", "y"), m, 0.3);
        assertNull(f.best);
        assertTrue(f.nothingFits);
    }

    @Test
    void commonLeadOfFiveFromAStarOfReadings() {
        // Readings from one end a: a-c (common) 1.2, a-b, a-d, a-e 2.4 each: only c as common gives equal coils.
        ResistanceMatrix m = ResistanceMatrix.builder().reading("a", "c", 1.25).reading("a", "b", 2.45)
                .reading("a", "d", 2.42).reading("a", "e", 2.47).build();
        assertEquals("c", new HubFit(List.of("a", "b", "c", "d", "e"), m, 0.3).best.hub());
    }
}
