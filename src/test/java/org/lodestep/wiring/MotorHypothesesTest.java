package org.lodestep.wiring;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

class MotorHypothesesTest {

    @Test
    void layoutCountsMatchCombinatorics() {
        // Perfect matchings of 2m items: (2m − 1)!! (any combinatorics text): 4 leads 3, 8 leads 105.
        assertEquals(3, MotorHypotheses.forLeads(4).size());
        assertEquals(105, MotorHypotheses.forLeads(8).size());
        // 5 leads: one common lead of five. 6 leads: C(6,3)/2 = 10 splits × 3 × 3 taps = 90.
        assertEquals(5, MotorHypotheses.forLeads(5).size());
        assertEquals(90, MotorHypotheses.forLeads(6).size());
        assertEquals(0, MotorHypotheses.forLeads(7).size());
    }

    @Test
    void sixLeadLayoutsReadTwoCoilsEndToEndAndOneTapToEnd() {
        for (int[][] k : MotorHypotheses.forLeads(6)) {
            int ones = 0;
            int twos = 0;
            for (int i = 0; i < 6; i++) {
                for (int j = i + 1; j < 6; j++) {
                    ones += k[i][j] == 1 ? 1 : 0;
                    twos += k[i][j] == 2 ? 1 : 0;
                    assertEquals(k[i][j], k[j][i]);
                }
            }
            // common practice, from the circuit topology, references §4: per phase two end-to-CT pairs and one
            // end-to-end pair; 9 cross pairs open.
            assertEquals(4, ones);
            assertEquals(2, twos);
        }
    }
}
