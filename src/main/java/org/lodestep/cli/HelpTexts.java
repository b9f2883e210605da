package org.lodestep.cli;

import java.io.IOException;
import java.io.InputStream;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.ArrayList;
import java.util.List;

import picocli.CommandLine;
import picocli.CommandLine.Help.Ansi;
import picocli.CommandLine.Model.UsageMessageSpec;

/**
 * The usage help of every command, rendered by picocli from the whole command tree when the jar is built
 * ({@link #main}, in Maven's {@code process-classes} phase) and printed by a launch asking for it. Building a
 * command's model by reflection and laying out its help cost {@code qa check --help} about 0.15 s of its 0.24 s;
 * reading the text is a lookup in the jar. The texts are picocli's rendering at the width and colours a launch
 * gets when its output is not a terminal (80 columns, no ANSI styles); any other launch (a terminal, where picocli
 * colours the text and fits it to the window, or {@code -Dpicocli.usage.width}) renders it with picocli as
 * before. {@code HelpTextsTest} and {@code CommandTreeTest} hold every command's text to picocli's rendering from the
 * whole tree.
 */
final class HelpTexts {
    /** The resources' folder, beside this class. */
    private static final String FOLDER = "help/";
    /** The width the texts are rendered at: picocli's own when it has no terminal to fit. */
    private static final int WIDTH = UsageMessageSpec.DEFAULT_USAGE_WIDTH;

    private HelpTexts() {
    }

    /**
     * The help {@code args} ask for, as picocli would print it in this launch, or null where picocli must render it:
     * {@code args} are not a command's names followed by {@code --help} or {@code -h}, the text was not built, or
     * picocli would render with colours or at another width.
     */
    static String forArgs(String[] args) {
        if (args.length == 0 || !(args[args.length - 1].equals("--help") || args[args.length - 1].equals("-h"))) {
            return null;
        }
        List<String> path = new ArrayList<>();
        for (int i = 0; i < args.length - 1; i++) {
            if (!isName(args[i])) {
                return null;
            }
            path.add(args[i]);
        }
        String text = read(resource(path));
        if (text == null || Ansi.AUTO.enabled() || new UsageMessageSpec().autoWidth(true).width() != WIDTH) {
            return null;
        }
        return "\n".equals(System.lineSeparator()) ? text : text.replace("\n", System.lineSeparator());
    }

    /** Lower-case letters only, as every command's name: never a file, a path or an option. */
    private static boolean isName(String arg) {
        if (arg.isEmpty()) {
            return false;
        }
        for (int i = 0; i < arg.length(); i++) {
            if (arg.charAt(i) < 'a' || arg.charAt(i) > 'z') {
                return false;
            }
        }
        return true;
    }

    /** The resource of the command at {@code path} from the root (empty: the root). */
    static String resource(List<String> path) {
        return FOLDER + (path.isEmpty() ? "lodestep" : String.join(".", path)) + ".txt";
    }

    /** picocli's usage help of {@code cl} at the build's width without styles, line breaks as {@code \n}. */
    static String render(CommandLine cl) {
        StringWriter w = new StringWriter();
        cl.usage(new PrintWriter(w), Ansi.OFF);
        return w.toString().replace(System.lineSeparator(), "\n");
    }

    private static String read(String name) {
        try (InputStream in = HelpTexts.class.getResourceAsStream(name)) {
            return in == null ? null : new String(in.readAllBytes(), StandardCharsets.UTF_8);
        } catch (IOException e) {
            return null;   // picocli renders it instead
        }
    }

    /**
     * Writes every command's help under {@code args[0]} (the classes folder), replacing the texts of an earlier
     * build (a command since removed must not keep one); the build calls it.
     */
    public static void main(String[] args) throws IOException {
        Path here = Path.of(args[0]).resolve(HelpTexts.class.getPackageName().replace('.', '/'));
        Path folder = here.resolve(FOLDER);
        Files.createDirectories(folder);
        try (var old = Files.newDirectoryStream(folder, "*.txt")) {
            for (Path f : old) {
                Files.delete(f);
            }
        }
        CommandLine root = Main.commandLine();
        root.setUsageHelpAutoWidth(false);
        root.setUsageHelpWidth(WIDTH);   // the build's own terminal, if any, must not shape the texts
        write(Main.TREE, root, new ArrayList<>(), here);
    }

    private static void write(CommandTree node, CommandLine cl, List<String> path, Path here) throws IOException {
        Path file = here.resolve(resource(path));
        Path tmp = file.resolveSibling(file.getFileName() + ".tmp");
        Files.writeString(tmp, render(cl), StandardCharsets.UTF_8);
        Files.move(tmp, file, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
        for (CommandTree child : node.children()) {
            List<String> p = new ArrayList<>(path);
            p.add(child.name());
            write(child, cl.getSubcommands().get(child.name()), p, here);
        }
    }
}
