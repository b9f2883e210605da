package org.lodestep.wiring;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;

class LeadPairTest {

    @Test
    void orderDoesNotMatter() {
        assertEquals(LeadPair.of("red", "blue"), LeadPair.of("blue", "red"));
        assertEquals("blue-red", LeadPair.of("red", "blue").toString());
        assertEquals("red", LeadPair.of("red", "blue").other("blue"));
    }

    @Test
    void rejectsSelfPairsAndBlankLabels() {
        assertThrows(IllegalArgumentException.class, () -> LeadPair.of("a", "a"));
        assertThrows(IllegalArgumentException.class, () -> LeadPair.of("a", " "));
        assertThrows(IllegalArgumentException.class, () -> ResistanceMatrix.builder().reading("a", "b", -1));
        assertThrows(IllegalArgumentException.class, () -> ResistanceMatrix.builder().reading("a", "b", Double.NaN));
    }
}
