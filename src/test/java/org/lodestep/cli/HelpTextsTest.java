package org.lodestep.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.util.ArrayList;
import java.util.List;

import org.junit.jupiter.api.Test;

import picocli.CommandLine;

/** The help texts built with the jar are picocli's rendering of every command, and are used only where it fits. */
class HelpTextsTest {

    private static void paths(CommandTree node, List<String> prefix, List<List<String>> into) {
        into.add(prefix);
        for (CommandTree child : node.children()) {
            List<String> p = new ArrayList<>(prefix);
            p.add(child.name());
            paths(child, p, into);
        }
    }

    /** What picocli prints for {@code args} from the whole tree. */
    private static String picocli(String... args) {
        CommandLine cl = Main.commandLine();
        StringWriter out = new StringWriter();
        cl.setOut(new PrintWriter(out, true));
        cl.setErr(new PrintWriter(new StringWriter(), true));
        assertEquals(ExitCode.OK, cl.execute(args), String.join(" ", args));
        return out.toString();
    }

    @Test
    void everyCommandHasItsTextAndItIsPicocliRendering() {
        List<List<String>> all = new ArrayList<>();
        paths(Main.TREE, List.of(), all);
        assertTrue(all.size() > 20, "every command: " + all);
        for (List<String> p : all) {
            for (String option : new String[] {"--help", "-h"}) {
                List<String> args = new ArrayList<>(p);
                args.add(option);
                String[] line = args.toArray(String[]::new);
                String text = HelpTexts.forArgs(line);
                assertNotNull(text, "a text was built for " + args);
                assertEquals(picocli(line), text, String.join(" ", args));
            }
        }
    }

    @Test
    void otherLinesAreLeftToPicocli() {
        assertNull(HelpTexts.forArgs(new String[] {}));
        assertNull(HelpTexts.forArgs(new String[] {"leads", "identify"}));
        assertNull(HelpTexts.forArgs(new String[] {"leads", "identify", "motor.csv", "--help"}), "a file");
        assertNull(HelpTexts.forArgs(new String[] {"--verbose", "leads", "--help"}), "an option");
        assertNull(HelpTexts.forArgs(new String[] {"help", "leads"}), "the help command renders itself");
        assertNull(HelpTexts.forArgs(new String[] {"nosuch", "--help"}), "no such command: picocli's error");
        assertNull(HelpTexts.forArgs(new String[] {"..", "--help"}));
    }

    @Test
    void aWidthAskedForIsPicocliRendering() {
        String old = System.getProperty("picocli.usage.width");
        System.setProperty("picocli.usage.width", "120");
        try {
            assertNull(HelpTexts.forArgs(new String[] {"qa", "check", "--help"}));
        } finally {
            if (old == null) {
                System.clearProperty("picocli.usage.width");
            } else {
                System.setProperty("picocli.usage.width", old);
            }
        }
    }
}
