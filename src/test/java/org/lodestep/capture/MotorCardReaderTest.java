package org.lodestep.capture;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.lodestep.sample.InputFormatException;

class MotorCardReaderTest {
    @TempDir
    Path dir;

    static final String CARD = """
            {
              "topology" : "8-lead",
              "connection" : "series",
              "phases" : [ {
                "name" : "A",
                "resistance_ohm" : 2.43,
                "inductance_h" : 0.0082
              }, {
                "name" : "B",
                "resistance_ohm" : 2.45,
                "inductance_h" : 0.0084
              } ],
              "rotor_teeth" : 50,
              "kt_nm_per_a" : 0.18,
              "phase_current_a" : 1.2,
              "supply_v" : 24.0,
              "inertia_kg_m2" : null
            }
            """;

    @Test
    void readsTheMeanPhaseValuesAndTheConstants() throws Exception {
        Path f = dir.resolve("card.json");
        Files.writeString(f, CARD);
        MotorCardFile c = MotorCardReader.read(f);
        assertEquals("8-lead", c.topology());
        assertEquals("series", c.connection());
        assertEquals(50, c.rotorTeeth());
        assertEquals(2.44, c.phaseResistanceOhm(), 1e-12);
        assertEquals(0.0083, c.phaseInductanceH(), 1e-15);
        assertEquals(0.18, c.ktNmPerA(), 1e-15);
        assertEquals(1.2, c.phaseCurrentA(), 1e-15);
        assertNull(c.inertiaKgM2());
    }

    @Test
    void negativeInductanceNamesFileLineAndWhatWasExpected() throws Exception {
        Path f = dir.resolve("bad.json");
        Files.writeString(f, CARD.replace("0.0084", "-0.0084"));
        InputFormatException e = assertThrows(InputFormatException.class, () -> MotorCardReader.read(f));
        assertEquals(11, e.line(), e.getMessage());
        assertTrue(e.getMessage().startsWith(f + " line 11: '-0.0084' is not positive"), e.getMessage());
        assertTrue(e.getMessage().contains("H"), e.getMessage());
    }

    @Test
    void textWhereANumberBelongsAndBrokenJsonAreOneLineErrors() throws Exception {
        Path f = dir.resolve("text.json");
        Files.writeString(f, CARD.replace("\"kt_nm_per_a\" : 0.18", "\"kt_nm_per_a\" : \"0.18 Nm/A\""));
        InputFormatException e = assertThrows(InputFormatException.class, () -> MotorCardReader.read(f));
        assertEquals(14, e.line());
        Path g = dir.resolve("broken.json");
        Files.writeString(g, "{\n  \"phases\" : [ \n");
        e = assertThrows(InputFormatException.class, () -> MotorCardReader.read(g));
        assertTrue(e.getMessage().contains("is not valid JSON") && !e.getMessage().contains("\n"), e.getMessage());
        // the parser's note of its own settings is not the user's business
        assertTrue(!e.getMessage().contains("Source:") && !e.getMessage().contains("REDACTED"), e.getMessage());
        Path h = dir.resolve("other.json");
        Files.writeString(h, "{ \"format\" : \"something else\" }");
        e = assertThrows(InputFormatException.class, () -> MotorCardReader.read(h));
        assertTrue(e.getMessage().contains("is not a motor card"), e.getMessage());
    }
}
