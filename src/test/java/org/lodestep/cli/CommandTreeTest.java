package org.lodestep.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.util.ArrayList;
import java.util.List;

import org.junit.jupiter.api.Test;

import picocli.CommandLine;

/** The tree built for one command line answers every command line exactly as the whole tree does. */
class CommandTreeTest {

    /** Every path from the root, the root's own (empty) path first. */
    private static List<List<String>> paths(CommandTree node, List<String> prefix, List<List<String>> into) {
        into.add(prefix);
        for (CommandTree child : node.children()) {
            List<String> p = new ArrayList<>(prefix);
            p.add(child.name());
            paths(child, p, into);
        }
        return into;
    }

    /** {exit code, stdout, stderr} of the whole tree. */
    private static List<Object> full(String... args) {
        CommandLine cl = Main.commandLine();
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        cl.setOut(new PrintWriter(out, true));
        cl.setErr(new PrintWriter(err, true));
        int code = cl.execute(args);
        return List.of(code, out.toString(), err.toString());
    }

    /** {exit code, stdout, stderr} of the launch path (the tree built for these arguments). */
    private static List<Object> lazy(String... args) {
        Object[] r = MainTest.run(args);
        return List.of(r[0], r[1], r[2]);
    }

    private static void same(String... args) {
        List<Object> expected = full(args);
        assertEquals(expected, lazy(args), String.join(" ", args));
    }

    @Test
    void helpOfEveryCommandIsTheWholeTreesHelp() {
        List<List<String>> all = paths(Main.TREE, List.of(), new ArrayList<>());
        assertTrue(all.size() > 20, "the tree has every command: " + all);
        for (List<String> p : all) {
            List<String> args = new ArrayList<>(p);
            args.add("--help");
            same(args.toArray(String[]::new));
            List<String> viaHelp = new ArrayList<>(List.of("help"));
            viaHelp.addAll(p);
            same(viaHelp.toArray(String[]::new));
        }
    }

    @Test
    void groupsWithoutASubcommandListTheirSubcommands() {
        for (CommandTree group : Main.TREE.children()) {
            if (!group.children().isEmpty()) {
                same(group.name());
                String out = (String) lazy(group.name()).get(1);
                for (CommandTree leaf : group.children()) {
                    assertTrue(out.contains("  " + leaf.name() + " "), group.name() + " lists " + leaf.name() + ":\n" + out);
                }
            }
        }
    }

    @Test
    void errorsVersionAndInheritedOptionsMatchTheWholeTree() {
        same();
        same("--version");
        same("-V");
        same("--verbose", "leads", "identify", "--help");
        same("leads", "identify", "--verbose", "--help");
        same("nosuch");
        same("lead");
        same("leads", "identyfy");
        same("leads", "identify");
        same("resonance", "sweep", "--no-such-option", "x.csv");
        same("help", "nosuch");
        same("--", "leads");
    }

    @Test
    void standInsAreLeftOutOnlyOffThePath() {
        CommandLine root = Main.TREE.buildFor(new Main(), new String[] {});
        assertFalse(root.getSubcommands().get("qa").getCommand() instanceof QaCommand, "qa is a stand-in");
        CommandLine cl = Main.TREE.buildFor(new Main(), new String[] {"leads"});
        CommandLine leads = cl.getSubcommands().get("leads");
        assertTrue(leads.getCommand() instanceof LeadsCommand, "the invoked group has its full model");
        assertFalse(leads.getSubcommands().get("probe").getCommand() instanceof LeadsProbeCommand,
                "probe is a stand-in");
    }

    @Test
    void aLineGoingStraightToACommandBuildsOnlyItsPath() {
        CommandLine cl = Main.TREE.buildFor(new Main(), new String[] {"--verbose", "leads", "identify", "x.tsv"});
        assertEquals(List.of("leads"), List.copyOf(cl.getSubcommands().keySet()), "no siblings, no help command");
        CommandLine leads = cl.getSubcommands().get("leads");
        assertFalse(leads.getCommand() instanceof LeadsCommand, "the group passed through is a stand-in");
        assertEquals(List.of("identify"), List.copyOf(leads.getSubcommands().keySet()));
        assertTrue(leads.getSubcommands().get("identify").getCommand() instanceof LeadsIdentifyCommand,
                "the invoked command has its full model");
    }

    @Test
    void optionsBeforeASubcommandKeepItsSiblings() {
        same("--help", "leads");
        same("-h", "leads", "identify");
        same("leads", "--help", "identify");
        same("leads", "--verbose", "identify", "--no-such-option");
        same("leads", "--verbose", "identify", "--help");
        same("--verbose", "help", "leads");
        same("help");
        same("help", "leads", "identify");
        same("help", "leads", "--verbose");
    }
}
