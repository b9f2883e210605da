package org.lodestep.capture;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.lodestep.sample.InputFormatException;

class AvoidListReaderTest {
    @TempDir
    Path dir;

    static final String LIST = """
            {
              "format" : "lodestep-avoid-list",
              "version" : 1,
              "microsteps" : 16,
              "rotor_teeth" : 50,
              "ranges" : [ {
                "from_full_steps_per_s" : 49.1,
                "to_full_steps_per_s" : 69.8,
                "class" : "low_speed_resonance",
                "min_acceleration_full_steps_per_s2" : 482.9
              }, {
                "from_full_steps_per_s" : 89.4,
                "to_full_steps_per_s" : 157.4,
                "min_acceleration_full_steps_per_s2" : null
              } ],
              "notes" : [ ]
            }
            """;

    @Test
    void readsRangesWithTheirLinesAndAnUnknownCrossingAcceleration() throws Exception {
        Path f = dir.resolve("avoid.json");
        Files.writeString(f, LIST);
        AvoidListFile a = AvoidListReader.read(f);
        assertEquals(16, a.microsteps());
        assertEquals(2, a.ranges().size());
        assertEquals(6, a.ranges().get(0).line());
        assertEquals(482.9, a.ranges().get(0).minAccelerationFullStepsPerS2(), 1e-12);
        assertTrue(Double.isNaN(a.ranges().get(1).minAccelerationFullStepsPerS2()));
        assertEquals("low_speed_resonance", a.ranges().get(0).bandClass());
    }

    @Test
    void fallingRangeAndWrongFormatAreRefusedNamingTheLine() throws Exception {
        Path f = dir.resolve("falling.json");
        Files.writeString(f, LIST.replace("157.4", "57.4"));
        InputFormatException e = assertThrows(InputFormatException.class, () -> AvoidListReader.read(f));
        assertEquals(13, e.line(), e.getMessage());
        assertTrue(e.getMessage().contains("is not a rising range"), e.getMessage());
        Path g = dir.resolve("card.json");
        Files.writeString(g, LIST.replace("lodestep-avoid-list", "lodestep-capture"));
        e = assertThrows(InputFormatException.class, () -> AvoidListReader.read(g));
        assertEquals(2, e.line());
        assertTrue(e.getMessage().contains("is not an avoid-list"), e.getMessage());
    }
}
