package org.lodestep.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class DriveDemoTest {

    @Test
    void demoSectionAnswersTheGantryAndRunsItsProfileWithoutLosingAStep(@TempDir Path tmp) throws Exception {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int code = new DriveDemo().run(Path.of("sample-captures"), tmp, new PrintWriter(out), new PrintWriter(err));
        String text = out.toString();
        assertEquals(0, code, err.toString() + text);
        assertTrue(text.contains("reached, but with LESS margin than asked"), text);
        assertTrue(text.contains("REACHED with margin"), text);
        assertTrue(text.contains("the planned profile lost 0 full steps"), text);
        assertTrue(text.matches("(?s).*to the same peak lost [1-9][0-9]* full steps.*"), text);
        Path dir = tmp.resolve("drive");
        assertTrue(Files.readString(dir.resolve("hv420-y-profile.csv")).startsWith("# format=lodestep-step-rate-table"));
        for (String report : new String[] {"drive-curve-24v.html", "drive-curve-48v.html", "drive-plan.html"}) {
            assertTrue(Files.size(dir.resolve(report)) > 1000, report);
        }
    }
}
