package org.lodestep.motor;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Map;

import org.junit.jupiter.api.Test;

class SampleCaptureGeneratorTest {

    @Test
    void committedSampleCapturesMatchTheGenerator() throws IOException {
        Path dir = Path.of("sample-captures/motor");
        for (Map.Entry<String, String> e : SampleCaptureGenerator.files().entrySet()) {
            assertEquals(e.getValue(), Files.readString(dir.resolve(e.getKey())),
                    e.getKey() + " differs from the generator's output: rerun SampleCaptureGenerator");
        }
    }
}
