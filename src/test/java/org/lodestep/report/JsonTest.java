package org.lodestep.report;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;

import com.fasterxml.jackson.databind.JsonNode;
import org.junit.jupiter.api.Test;

class JsonTest {

    record Winding(List<String> ends, String tap, double resistanceOhm, Double inductanceH) {
    }

    @Test
    void recordComponentsBecomeSnakeCaseKeys() throws Exception {
        JsonNode n = Json.mapper().readTree(Json.write(new Winding(List.of("red", "blue"), null, 2.4, 0.004)));
        assertEquals(2.4, n.get("resistance_ohm").asDouble());
        assertEquals(0.004, n.get("inductance_h").asDouble());
        assertEquals("red", n.get("ends").get(0).asText());
        assertEquals(true, n.get("tap").isNull());
    }

    @Test
    void nonFiniteNumbersAreWrittenAsNull() throws Exception {
        JsonNode n = Json.mapper().readTree(Json.write(new Winding(List.of("a", "b"), "c", Double.NaN,
                Double.POSITIVE_INFINITY)));
        assertEquals(true, n.get("resistance_ohm").isNull());
        assertEquals(true, n.get("inductance_h").isNull());
    }
}
