package org.lodestep.qa;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Map;

import org.junit.jupiter.api.Test;
import org.lodestep.sample.InputFormatException;

class MeterLogTest {

    private static final String LOG = """
            # lot L-2607, insulation tester at 500 V DC
            serial,insulation_a_frame_mohm,insulation_b_frame_mohm,insulation_test_v,inductance_a_mh,inductance_b_mh
            KV-1,850,910,500,2.81,2.84
            KV-2,,640,500,,
            """;

    @Test
    void readsRowsByExactSerialWithEmptyCellsAsNotMeasured() throws Exception {
        MeterLog log = MeterLog.parse("log.csv", LOG);
        MeterLog.Row r = log.row("KV-1").orElseThrow();
        assertEquals(3, r.line());
        assertEquals(Map.of("a_frame", 850.0, "b_frame", 910.0), r.insulationMohm());
        assertEquals(2.81, r.get("inductance_a_mh"));
        MeterLog.Row r2 = log.row("KV-2").orElseThrow();
        assertEquals(Map.of("b_frame", 640.0), r2.insulationMohm());
        assertTrue(Double.isNaN(r2.get("inductance_a_mh")));
        assertTrue(log.row("KV-3").isEmpty());
        MeterLog over = MeterLog.parse("log.csv", LOG.replace("KV-2,,640", "KV-2,,OL"));
        assertEquals(Double.POSITIVE_INFINITY, over.row("KV-2").orElseThrow().get("insulation_b_frame_mohm"));
    }

    @Test
    void rowHashDoesNotChangeWhenTheLogGrows() throws Exception {
        String a = MeterLog.parse("log.csv", LOG).row("KV-1").orElseThrow().sha256();
        String b = MeterLog.parse("log.csv", LOG + "KV-3,700,700,500,2.8,2.8\n").row("KV-1").orElseThrow().sha256();
        String c = MeterLog.parse("log.csv", LOG.replace("KV-1,850", "KV-1,851")).row("KV-1").orElseThrow().sha256();
        assertEquals(a, b);
        assertNotEquals(a, c);
    }

    @Test
    void textInNumberCellNamesLineColumnAndUnit() {
        InputFormatException e = assertThrows(InputFormatException.class,
                () -> MeterLog.parse("log.csv", LOG.replace("KV-2,,640", "KV-2,,>2000")));
        assertEquals(4, e.line());
        assertEquals("insulation_b_frame_mohm", e.column());
        assertTrue(e.getMessage().contains("megohms expected"), e.getMessage());
    }

    @Test
    void duplicateSerialAndUnknownColumnAreRefused() {
        InputFormatException dup = assertThrows(InputFormatException.class,
                () -> MeterLog.parse("log.csv", LOG + "KV-1,1,1,500,1,1\n"));
        assertEquals(5, dup.line());
        assertTrue(dup.getMessage().contains("also line 3"), dup.getMessage());
        InputFormatException col = assertThrows(InputFormatException.class,
                () -> MeterLog.parse("log.csv", "serial,torque_nm\nA,1\n"));
        assertEquals("torque_nm", col.column());
        assertEquals(1, col.line());
    }
}
