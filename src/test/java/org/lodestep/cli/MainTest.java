package org.lodestep.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.NoSuchFileException;
import java.util.concurrent.Callable;

import org.junit.jupiter.api.Test;
import org.lodestep.sample.InputFormatException;
import org.lodestep.qa.StoreException;
import org.lodestep.rig.RigException;

import picocli.CommandLine;
import picocli.CommandLine.Command;

class MainTest {

    /** Runs Main in-process; returns {exit code, stdout, stderr}. */
    static Object[] run(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int code = Main.run(new PrintWriter(out, true), new PrintWriter(err, true), args);
        return new Object[] {code, out.toString(), err.toString()};
    }

    @Test
    void helpListsEveryCommandGroupAndTheExitCodes() {
        Object[] r = run("--help");
        assertEquals(ExitCode.OK, r[0]);
        String out = (String) r[1];
        for (String group : new String[] {"demo", "leads", "motor", "resonance", "qa", "rig"}) {
            assertTrue(out.contains("  " + group + " "), "help lists " + group + ":\n" + out);
        }
        assertTrue(out.contains("5  database failure"), out);
    }

    @Test
    void versionNamesTheTool() {
        Object[] r = run("--version");
        assertEquals(ExitCode.OK, r[0]);
        assertTrue(((String) r[1]).startsWith("lodestep "), (String) r[1]);
    }

    @Test
    void unknownOptionIsAUsageError() {
        Object[] r = run("leads", "--no-such-option");
        assertEquals(ExitCode.USAGE, r[0]);
        assertTrue(((String) r[2]).contains("--no-such-option"), (String) r[2]);
    }

    @Command(name = "boom")
    static final class Boom implements Callable<Integer> {
        private final Exception ex;

        Boom(Exception ex) {
            this.ex = ex;
        }

        @Override
        public Integer call() throws Exception {
            throw ex;
        }
    }

    private static Object[] failWith(Exception ex, String... extra) {
        CommandLine cl = Main.commandLine();
        cl.addSubcommand("boom", new Boom(ex));
        StringWriter err = new StringWriter();
        cl.setErr(new PrintWriter(err, true));
        cl.setOut(new PrintWriter(new StringWriter(), true));
        String[] args = new String[extra.length + 1];
        System.arraycopy(extra, 0, args, 1, extra.length);
        args[0] = "boom";
        int code = cl.execute(args);
        return new Object[] {code, err.toString()};
    }

    @Test
    void badInputMapsToTwoWithTheReadersOneLineMessage() {
        Object[] r = failWith(new InputFormatException("pairs.csv", 7, "resistance_ohm", "abc", "is not a number (ohms expected)"));
        assertEquals(ExitCode.USAGE, r[0]);
        String err = (String) r[1];
        assertEquals("lodestep boom: pairs.csv line 7, column resistance_ohm: 'abc' is not a number (ohms expected)",
                err.strip());
        assertFalse(err.contains("\tat "), "no stack trace without --verbose");
    }

    @Test
    void missingFileMapsToTwo() {
        Object[] r = failWith(new NoSuchFileException("nowhere.csv"));
        assertEquals(ExitCode.USAGE, r[0]);
        assertTrue(((String) r[1]).contains("nowhere.csv: no such file"));
    }

    @Test
    void rigFailureMapsToFour() {
        assertEquals(ExitCode.RIG_OR_IO, failWith(new RigException("no answer after 3 tries"))[0]);
    }

    @Test
    void databaseFailureMapsToFive() {
        assertEquals(ExitCode.DATABASE, failWith(new StoreException("cannot connect"))[0]);
    }

    @Test
    void unexpectedExceptionMapsToOneAndHidesTheStackUnlessVerbose() {
        Object[] quiet = failWith(new IllegalStateException("bug"));
        assertEquals(ExitCode.INTERNAL, quiet[0]);
        assertTrue(((String) quiet[1]).contains("--verbose"));
        assertFalse(((String) quiet[1]).contains("\tat "));
        Object[] loud = failWith(new IllegalStateException("bug"), "--verbose");
        assertEquals(ExitCode.INTERNAL, loud[0]);
        assertTrue(((String) loud[1]).contains("\tat "), "stack trace with --verbose");
    }

    @Test
    void inputFormatMessageFoldsControlCharactersAndLongText() {
        InputFormatException e = new InputFormatException("x.csv", 3, null, "a\u0007b" + "z".repeat(100), "expected");
        assertTrue(e.getMessage().startsWith("x.csv line 3: 'a?bzz"), e.getMessage());
        assertTrue(e.getMessage().contains("...' expected"), e.getMessage());
        assertEquals(3, e.line());
    }
}
