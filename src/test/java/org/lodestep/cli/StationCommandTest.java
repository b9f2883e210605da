package org.lodestep.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/** {@code lodestep station} only parses and starts the station: its usage errors and its help. */
class StationCommandTest {

    @Test
    void aPortOutOfRangeIsAUsageError() {
        CliRun r = CliRun.of("station", "--port", "70000");
        assertEquals(ExitCode.USAGE, r.code(), r.err());
        assertTrue(r.err().contains("port 70000"), r.err());
    }

    @Test
    void helpNamesTheTokenAndTheCautions() {
        CliRun r = CliRun.of("station", "--help");
        assertEquals(ExitCode.OK, r.code());
        assertTrue(r.out().contains("LODESTEP_STATION_TOKEN"), r.out());
        assertTrue(r.out().replaceAll("\\s+", " ").contains("hundreds of volts DC"), r.out());
    }
}
