package org.lodestep.workflow;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.lodestep.capture.LeadPairReading;
import org.lodestep.sample.InputFormatException;
import org.lodestep.wiring.CopperTemperature;
import org.lodestep.wiring.Topology;

class LeadsFromReadingsTest {

    @Test
    void looseReadingsAloneIdentifyAFourLeadMotor() throws Exception {
        LeadsFromReadings.Result r = LeadsFromReadings.run(new LeadsFromReadings.Settings(List.of(), List.of(
                new LeadPairReading("red", "blue", 2.4, 0), new LeadPairReading("green", "black", 2.5, 0),
                new LeadPairReading("red", "green", Double.POSITIVE_INFINITY, 0)), LeadsSettings.DEFAULT),
                Progress.NONE);
        assertEquals(1, r.motors().size());
        assertNull(r.motors().get(0).source());
        assertEquals(Topology.FOUR_LEAD, r.motors().get(0).identification().topology());
        assertFalse(r.hasError());
    }

    @Test
    void aLooseReadingReplacesTheFilesValueOfThatPair(@TempDir Path dir) throws Exception {
        Path f = dir.resolve("m.csv");
        Files.writeString(f, "lead_a,lead_b,resistance_ohm\n1,2,2.4\n3,4,2.4\n1,3,OL\n");
        LeadsFromReadings.Result r = LeadsFromReadings.run(new LeadsFromReadings.Settings(List.of(f),
                List.of(new LeadPairReading("2", "1", 2.6, 0)), LeadsSettings.DEFAULT),
                Progress.NONE);
        // the winding 1-2 reads the loose 2.6 Ω, not the file's 2.4 Ω, whichever way round the pair is written
        assertTrue(r.motors().get(0).identification().windings().stream()
                .anyMatch(w -> w.ends().contains("1") && Math.abs(w.resistanceOhm() - 2.6) < 1e-9),
                r.motors().get(0).identification().windings().toString());
    }

    @Test
    void aFileTemperatureBelowCopperZeroIsRefusedNamingTheFile(@TempDir Path dir) throws Exception {
        Path f = dir.resolve("cold.csv");
        // IEC 60034-1: k = 235 °C for copper, so -240 °C lies below the correction's zero resistance
        Files.writeString(f, "# temperature_c=-240\nlead_a,lead_b,resistance_ohm\n1,2,2.4\n3,4,2.4\n1,3,OL\n");
        InputFormatException e = assertThrows(InputFormatException.class, () -> LeadsFromReadings.run(
                new LeadsFromReadings.Settings(List.of(f), List.of(), new LeadsSettings(Double.NaN, 20,
                        CopperTemperature.Constant.IEC_60034_1, 0.1, 0.3)), Progress.NONE));
        assertTrue(e.getMessage().contains("cold.csv"), e.getMessage());
    }
}
