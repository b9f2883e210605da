package org.lodestep.cli;

import java.util.ArrayList;
import java.util.List;

import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;

/**
 * The command tree, built for one command line: picocli builds a command's model by reflection over its fields and
 * their annotations, which for the whole tree costs most of a small command's start-up. So only the commands on the
 * invoked path (and {@code help}'s target) get their full model; every other command is a stand-in with its name and
 * description from its {@code @Command} annotation, which is all a listing of commands shows, and a command the line
 * goes straight through to a subcommand gets no stand-ins at all. The full tree gives the same help text and parse
 * results for every path (tested against it).
 *
 * @param type     the command class (a group's subcommands are listed here, not in its annotation)
 * @param children subcommands in the order help lists them
 */
record CommandTree(Class<?> type, List<CommandTree> children) {

    static CommandTree leaf(Class<?> type) {
        return new CommandTree(type, List.of());
    }

    static CommandTree group(Class<?> type, CommandTree... children) {
        return new CommandTree(type, List.of(children));
    }

    /** The command's name, from its annotation (reading one annotation does not build a model). */
    String name() {
        return annotation().name();
    }

    private Command annotation() {
        Command c = type.getAnnotation(Command.class);
        if (c == null) {
            throw new IllegalStateException(type.getName() + " has no @Command annotation");
        }
        return c;
    }

    /** Every command with its full model. */
    CommandLine buildFull(Object instance) {
        return build(instance, null, 0, true, true);
    }

    /** The commands {@code args} can reach with their full model, the others as stand-ins. */
    CommandLine buildFor(Object instance, String[] args) {
        return build(instance, args, 0, false, false);
    }

    /**
     * @param from index in {@code args} after this command's own name: the next positional argument names the
     *             subcommand (only the help options and the boolean {@code --verbose} come before it)
     * @param shown whether this command's usage may be printed ({@code help}'s target): it then lists every
     *             subcommand
     */
    private CommandLine build(Object instance, String[] args, int from, boolean full, boolean shown) {
        int at = full ? -1 : nextPositional(args, from);
        String wanted = at < 0 ? null : args[at];
        String helpTarget = null;
        int helpAt = -1;
        String help = CommandLine.HelpCommand.class.getAnnotation(Command.class).name();
        if (help.equals(wanted)) {
            // `help PATH`: PATH is a path from this command, so its first name is built as if it were invoked
            helpAt = nextPositional(args, at + 1);
            helpTarget = helpAt < 0 ? null : args[helpAt];
        }
        // Only this command's own usage lists its subcommands, and only its parse names them in an error. When the
        // line goes straight on to a subcommand (nothing but --verbose before it) neither happens here, so its
        // siblings are left out: each stand-in is still a CommandLine of its own, about a millisecond to make.
        boolean passThrough = !full && !shown && wanted != null && !help.equals(wanted)
                && onlyVerbose(args, from, at) && children.stream().anyMatch(c -> c.name().equals(wanted));
        // A group passed through with nothing before its subcommand is never run (picocli runs the last command),
        // shown or given an option: a stand-in serves. The root stays whole: its --verbose is inherited by every
        // command and its settings apply to the whole line.
        CommandLine cl = passThrough && instance == null && at == from ? new CommandLine(standIn())
                : new CommandLine(instance == null ? type : instance);
        for (CommandTree child : children) {
            String name = child.name();
            if (full) {
                cl.addSubcommand(name, child.build(null, null, 0, true, true));
            } else if (name.equals(wanted)) {
                cl.addSubcommand(name, child.build(null, args, at + 1, false, shown));
            } else if (name.equals(helpTarget)) {
                cl.addSubcommand(name, child.build(null, args, helpAt + 1, false, true));
            } else if (!passThrough) {
                cl.addSubcommand(name, child.standIn());
            }
        }
        return cl;
    }

    private static boolean onlyVerbose(String[] args, int from, int to) {
        for (int i = from; i < to; i++) {
            if (!args[i].equals("--verbose")) {
                return false;
            }
        }
        return true;
    }

    /** Name and description only: what a listing of subcommands shows. Never run (its name was not invoked). */
    private CommandSpec standIn() {
        Command c = annotation();
        CommandSpec spec = CommandSpec.create().name(c.name()).aliases(c.aliases());
        spec.usageMessage().description(c.description()).header(c.header()).hidden(c.hidden());
        return spec;
    }

    private static int nextPositional(String[] args, int from) {
        for (int i = from; i < args.length; i++) {
            if (!args[i].startsWith("-")) {
                return i;
            }
        }
        return -1;
    }

    /** All classes in the tree, depth first. */
    List<Class<?>> types() {
        List<Class<?>> all = new ArrayList<>();
        all.add(type);
        for (CommandTree c : children) {
            all.addAll(c.types());
        }
        return all;
    }
}
