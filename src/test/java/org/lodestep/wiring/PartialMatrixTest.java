package org.lodestep.wiring;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;

import org.junit.jupiter.api.Test;

/**
 * Missing pairs: whenever the identifier says "determined" on a random subset of readings, its answer must be the
 * true layout; when it is not, every pair it asks for must be unmeasured. Series-circuit values (common practice,
 * from the circuit topology, references §4) with contact resistance and noise.
 */
class PartialMatrixTest {

    private static void checkSubsets(int n, double coilOhm, int trialsPerLayout) {
        List<String> labels = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            labels.add(Character.toString('a' + i));
        }
        int layouts = MotorHypotheses.forLeads(n).size();
        int determined = 0;
        int total = 0;
        for (int k = 0; k < layouts; k++) {
            for (int t = 0; t < trialsPerLayout; t++) {
                Random rnd = new Random(31L * k + t);
                List<String> shuffled = SimulatedMotor.shuffled(labels, rnd.nextLong());
                SimulatedMotor motor = SimulatedMotor.layout(shuffled, k, coilOhm);
                List<LeadPair> skip = new ArrayList<>();
                double dropFraction = rnd.nextDouble() * 0.7;
                for (int i = 0; i < n; i++) {
                    for (int j = i + 1; j < n; j++) {
                        if (rnd.nextDouble() < dropFraction) {
                            skip.add(LeadPair.of(shuffled.get(i), shuffled.get(j)));
                        }
                    }
                }
                ResistanceMatrix m = motor.matrix(rnd, skip);
                Identification id = LeadIdentifier.identify(m, IdentifySettings.DEFAULT);
                total++;
                if (id.determined()) {
                    determined++;
                    assertEquals(Signatures.of(motor), Signatures.of(id), "layout " + k + " trial " + t + " skip " + skip);
                    assertFalse(id.hasError(), id.findings().toString());
                } else {
                    assertFalse(id.missingPairs().isEmpty());
                    for (LeadPair p : id.missingPairs()) {
                        assertFalse(m.isMeasured(p), p + " is already measured");
                    }
                }
            }
        }
        assertTrue(determined > 0 && determined < total, determined + " of " + total + " determined");
    }

    @Test
    void fourLeadSubsetsAreRightWhenDetermined() {
        checkSubsets(4, 2.4, 200);
    }

    @Test
    void fiveLeadSubsetsAreRightWhenDetermined() {
        checkSubsets(5, 1.2, 100);
    }

    @Test
    void sixLeadSubsetsAreRightWhenDetermined() {
        checkSubsets(6, 1.2, 10);
    }

    @Test
    void lowResistanceSixLeadSubsetsAreRightWhenDetermined() {
        // 0.6 Ω coils: contact resistance (up to 0.3 Ω) is half a coil, the hardest case for finding taps.
        checkSubsets(6, 0.6, 10);
    }

    @Test
    void lowResistanceFiveLeadSubsetsAreRightWhenDetermined() {
        checkSubsets(5, 0.6, 100);
    }

    @Test
    void eightLeadSubsetsAreRightWhenDetermined() {
        checkSubsets(8, 1.2, 8);
    }
}
