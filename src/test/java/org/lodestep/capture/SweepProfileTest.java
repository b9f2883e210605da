package org.lodestep.capture;

import org.lodestep.sample.SweepShape;
import org.lodestep.sample.InputFormatException;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Map;
import java.util.OptionalDouble;
import java.util.OptionalInt;

import org.junit.jupiter.api.Test;

class SweepProfileTest {
    @Test
    void readsLawFromMetadataWithOptionalParts() throws Exception {
        SweepProfile p = SweepProfile.fromMetadata(Map.of("sweep", "LOG", "sweep_start_full_steps_per_s", "20",
                "sweep_end_full_steps_per_s", "2000,5"), "f.csv");
        assertEquals(new SweepProfile(SweepShape.LOG, 20, 2000.5, OptionalDouble.empty(), OptionalInt.empty()),
                p);
        assertNull(SweepProfile.fromMetadata(Map.of("microsteps", "8"), "f.csv"));
        assertEquals(p, SweepProfile.fromMetadata(p.toMetadata(), "f.csv"));
    }

    @Test
    void namesTheKeyThatIsMissingOrMalformed() {
        InputFormatException missing = assertThrows(InputFormatException.class,
                () -> SweepProfile.fromMetadata(Map.of("sweep", "linear", "sweep_start_full_steps_per_s", "1"), "f"));
        assertEquals("sweep_end_full_steps_per_s", missing.column());
        InputFormatException law = assertThrows(InputFormatException.class,
                () -> SweepProfile.fromMetadata(Map.of("sweep", "sine"), "f"));
        assertEquals("sweep", law.column());
        InputFormatException micro = assertThrows(InputFormatException.class, () -> SweepProfile.fromMetadata(
                Map.of("sweep", "linear", "sweep_start_full_steps_per_s", "1", "sweep_end_full_steps_per_s", "2",
                        "microsteps", "1/16"), "f"));
        assertEquals("microsteps", micro.column());
        InputFormatException logFromZero = assertThrows(InputFormatException.class, () -> SweepProfile.fromMetadata(
                Map.of("sweep", "log", "sweep_start_full_steps_per_s", "0", "sweep_end_full_steps_per_s", "2"), "f"));
        assertTrue(logFromZero.expected().contains("positive start"), logFromZero.getMessage());
    }
}
