package org.lodestep.resonance;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;

import java.nio.file.Files;
import java.nio.file.Path;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class SampleCaptureGeneratorTest {

    @Test
    void committedSampleCapturesEqualAFreshRunOfTheGenerator(@TempDir Path tmp) throws Exception {
        // Set LODESTEP_WRITE_SAMPLES=1 to regenerate the committed files in place.
        Path committed = Path.of("sample-captures", "resonance");
        if ("1".equals(System.getenv("LODESTEP_WRITE_SAMPLES"))) {
            SampleCaptureGenerator.writeAll(committed);
        }
        SampleCaptureGenerator.writeAll(tmp);
        for (String name : new String[] {"belt-axis-sweep.csv", "belt-axis-phone.wav", "belt-axis-ringdown.csv"}) {
            assertArrayEquals(Files.readAllBytes(committed.resolve(name)), Files.readAllBytes(tmp.resolve(name)),
                    name + " differs from the generator's output; regenerate with LODESTEP_WRITE_SAMPLES=1");
        }
    }
}
