package org.lodestep.capture;

import org.lodestep.sample.InputFormatException;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class LeadPairArgumentTest {

    @Test
    void parsesLabelsValueAndOpen() throws Exception {
        LeadPairReading r = LeadPairArgument.parse("red-blue=2.4", "--pair");
        assertEquals("red", r.leadA());
        assertEquals("blue", r.leadB());
        assertEquals(2.4, r.resistanceOhm());
        assertTrue(LeadPairArgument.parse("1-3=OL", "--pair").open());
        assertEquals(1200.0, LeadPairArgument.parse("A-1:B-2=1.2k", "--pair").resistanceOhm(), 1e-9);
        assertEquals("A-1", LeadPairArgument.parse("A-1:B-2=1.2k", "--pair").leadA());
        assertEquals(0.85, LeadPairArgument.parse("a-b=850m", "--pair").resistanceOhm(), 1e-12);
        assertEquals(2.4, LeadPairArgument.parse("a-b=2,4", "--pair").resistanceOhm(), 1e-12);
    }

    @Test
    void rejectsMalformedArguments() {
        for (String bad : new String[] {"red-blue", "red=2.4", "red-red=1", "red-blue=", "red-blue=abc",
            "a-b-c=1"}) {
            InputFormatException e = assertThrows(InputFormatException.class,
                    () -> LeadPairArgument.parse(bad, "--pair"), bad);
            assertEquals("--pair", e.source());
        }
    }

    @Test
    void parsesPromptAnswers() {
        assertEquals(2.4, LeadPairArgument.parseValue(" 2.4 ").getAsDouble());
        assertTrue(Double.isInfinite(LeadPairArgument.parseValue("OL").getAsDouble()));
        assertEquals(3.3, LeadPairArgument.parseValue("3.3 ohm").getAsDouble(), 1e-12);
        assertTrue(LeadPairArgument.parseValue("").isEmpty());
        assertTrue(LeadPairArgument.parseValue("undo").isEmpty());
    }
}
