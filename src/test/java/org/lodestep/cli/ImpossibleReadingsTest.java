package org.lodestep.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Readings no ohmmeter gives are refused with the file and line; a winding that reads 0 Ω is a finding, not a healthy
 * winding. Limits (common practice): a bench meter resolves 1 mΩ, and no meter reads above 1 TΩ.
 */
class ImpossibleReadingsTest {
    @TempDir
    Path dir;

    private CliRun identify(String... rows) throws Exception {
        Path f = dir.resolve("m.csv");
        Files.writeString(f, "lead_a,lead_b,resistance_ohm\n" + String.join("\n", rows) + "\n");
        return CliRun.of("leads", "identify", "--json", f.toString());
    }

    @Test
    void readingsBelowTheMetersResolutionOrAboveOneTeraohmAreRefused() throws Exception {
        for (String v : new String[] {"1e-12", "4.9e-324", "0.0009", "1e308", "2e12"}) {
            CliRun r = identify("1,2," + v, "3,4,2.5", "1,3,OL");
            assertEquals(2, r.code(), v + ": " + r.err());
            assertTrue(r.err().contains("m.csv") && r.err().contains("line 2"), r.err());
            assertTrue(r.err().contains("1 mΩ") || r.err().contains("1 TΩ"), r.err());
        }
    }

    @Test
    void pairOptionRefusesTheSameValues() {
        CliRun r = CliRun.of("leads", "identify", "--pair", "1-2=1e-12", "--pair", "3-4=2.5");
        assertEquals(2, r.code(), r.err());
        assertTrue(r.err().contains("1 mΩ"), r.err());
    }

    @Test
    void zeroOhmWindingsAreShortsNotHealthyWindings() throws Exception {
        CliRun r = identify("1,2,0", "3,4,0", "1,3,OL", "1,4,OL", "2,3,OL", "2,4,OL");
        assertEquals(3, r.code(), r.out() + r.err());
        assertTrue(r.out().contains("shorted-winding"), r.out());
        CliRun one = identify("1,2,0", "3,4,2.5", "1,3,OL", "1,4,OL", "2,3,OL", "2,4,OL");
        assertEquals(3, one.code(), one.out() + one.err());
        // the healthy winding is still a winding: the short must not turn it into leakage
        assertTrue(one.out().contains("shorted-winding") && !one.out().contains("phase-leakage"), one.out());
    }
}
