package org.lodestep.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class ResonanceDemoTest {

    @Test
    void demoSectionRunsOnTheSampleCapturesAndWritesTheAvoidList(@TempDir Path tmp) throws Exception {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int code = new ResonanceDemo().run(Path.of("sample-captures"), tmp, new PrintWriter(out),
                new PrintWriter(err));
        assertEquals(0, code, err.toString());
        assertTrue(out.toString().contains("low-speed resonance f_n"), out.toString());
        assertTrue(out.toString().contains("natural frequency"), out.toString());
        assertTrue(Files.readString(tmp.resolve("hv420-y-avoid-list.json")).contains("lodestep-avoid-list"));
        assertTrue(Files.exists(tmp.resolve("gantry-axis-sweep.csv")), "virtual-rig capture written");
        assertTrue(out.toString().contains("gantry-axis-sweep.csv, channel accel"), out.toString());
    }
}
