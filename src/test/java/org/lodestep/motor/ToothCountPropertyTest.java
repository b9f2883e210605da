package org.lodestep.motor;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;

import org.junit.jupiter.api.Test;

/**
 * The tooth count of hand-turned captures from rest to rest ({@link HandTurn}: the physics is stated there) is the
 * exact integer or an honest refusal, never a wrong number. Seeded; the case count bounds the run time.
 */
class ToothCountPropertyTest {
    private static final double FS = 10_000;
    private static final int CASES = 60;

    // An 8-lead motor: phase A on 1-2 and 5-6, phase B on 3-4 and 7-8, with mixed ends.
    private static final List<SyntheticMotor.Coil> EIGHT_LEAD = List.of(
            new SyntheticMotor.Coil("1", "2", true, false),
            new SyntheticMotor.Coil("3", "4", false, true),
            new SyntheticMotor.Coil("5", "6", true, true),
            new SyntheticMotor.Coil("7", "8", false, false));

    @Test
    void toothCountIsExactOrRefusedOnRandomHandTurns() throws IOException {
        Random rnd = new Random(20261202L);
        int exact = 0;
        int refused = 0;
        List<String> wrong = new ArrayList<>();
        StringBuilder log = new StringBuilder();
        for (int k = 0; k < CASES; k++) {
            HandTurn.Profile p = HandTurn.randomProfile(rnd);
            HandTurn.Capture c = HandTurn.generate(p, EIGHT_LEAD, FS, 1000L + k);
            BackEmfResult r = new BackEmfAnalyzer(FS).analyze(c.channels(), c.statedRevolutions(), null, 1);
            log.append(String.format("%s -> cycles %.2f teeth %s %s%n", p, r.electricalCycles(), r.rotorTeeth(), r.toothCount()));
            if (r.rotorTeeth() == null) {
                refused++;
            } else if (r.rotorTeeth() == p.rotorTeeth()) {
                exact++;
            } else {
                wrong.add(p + " gave " + r.rotorTeeth());
            }
        }
        log.append(String.format("exact %d, refused %d, wrong %d of %d%n", exact, refused, wrong.size(), CASES));
        Files.createDirectories(Path.of("target"));
        Files.writeString(Path.of("target/tooth-count-property.txt"), log.toString());
        assertTrue(wrong.isEmpty(), String.join("\n", wrong));
        // A capture within the stated physics should rarely need a refusal.
        assertTrue(refused <= CASES / 10, "refused " + refused + " of " + CASES);
        assertEquals(CASES, exact + refused);
    }

    @Test
    void wrongRevolutionCountIsRefusedNotRounded() {
        // 2.3 turns of a 50-tooth rotor stated as 2: 115 cycles / 2 = 57.5 teeth lies between whole numbers.
        HandTurn.Profile p = new HandTurn.Profile(2.3, 50, 0.5, false, false, 0, 0.003, 0.005, 0.02, true);
        HandTurn.Capture c = HandTurn.generate(p, EIGHT_LEAD, FS, 7);
        BackEmfResult r = new BackEmfAnalyzer(FS).analyze(c.channels(), 2.0, null, 1);
        assertEquals(null, r.rotorTeeth(), r.toothCount().toString());
        assertTrue(r.findings().stream().anyMatch(f -> f.code().code().startsWith("teeth_")), r.findings().toString());
    }

    @Test
    void unusualCountIsNotSnappedToACommonOne() {
        // A 90-tooth rotor (our invented case): 3 turns give 270 cycles; 90 is far from 50 and 100, so it stays 90.
        HandTurn.Profile p = new HandTurn.Profile(3, 90, 0.5, false, false, 0.5, 0.003, 0.005, 0.02, false);
        HandTurn.Capture c = HandTurn.generate(p, EIGHT_LEAD, FS, 8);
        BackEmfResult r = new BackEmfAnalyzer(FS).analyze(c.channels(), 3.0, null, 1);
        assertEquals(90, r.rotorTeeth());
        assertEquals(ToothCount.Confidence.EXACT, r.toothCount().confidence());
        assertTrue(r.findings().stream().anyMatch(f -> f.code() == MotorFindingCode.UNUSUAL_TEETH));
    }

    @Test
    void heavyNoiseGivesCandidatesInsteadOfAWrongCount() {
        // Noise of 6 % of the EMF peak (each channel): the slow stretches cannot be followed, so the bound widens.
        Random rnd = new Random(5);
        for (int k = 0; k < 6; k++) {
            HandTurn.Profile p = new HandTurn.Profile(1.5, 100, 0.5, true, k % 2 == 0, 0, 0.06, 0.02, 0.03, true);
            HandTurn.Capture c = HandTurn.generate(p, EIGHT_LEAD, FS, rnd.nextLong());
            BackEmfResult r = new BackEmfAnalyzer(FS).analyze(c.channels(), 1.5, null, 1);
            assertTrue(r.rotorTeeth() == null || r.rotorTeeth() == 100, r.toothCount().toString());
        }
    }
}
