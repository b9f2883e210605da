package org.lodestep.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Path;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class LeadsDemoTest {

    @Test
    void identifiesEveryBundledMotorAndReplaysOneThroughTheProbe(@TempDir Path out) throws Exception {
        StringWriter o = new StringWriter();
        StringWriter e = new StringWriter();
        int code = new LeadsDemo().run(Path.of("sample-captures"), out, new PrintWriter(o, true),
                new PrintWriter(e, true));
        assertEquals(ExitCode.OK, code, e.toString());
        String text = o.toString();
        for (String motor : new String[] {"KL-01: 4-lead", "KL-02: 5-lead", "KL-03: 6-lead", "KL-04: 8-lead",
            "KL-05: 6-lead", "KL-06: 4-lead"}) {
            assertTrue(text.contains(motor), motor + " in\n" + text);
        }
        assertTrue(text.contains("6 motors sorted, 1 rejected"), text);
        assertTrue(text.contains("Guided probe on KL-03"), text);
        assertTrue(text.lines().count() < 40, "compact: " + text.lines().count() + " lines");
    }
}
