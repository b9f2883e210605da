package org.lodestep.cli;

import java.io.FileNotFoundException;
import java.io.IOException;
import java.io.PrintWriter;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.AccessDeniedException;
import java.nio.file.NoSuchFileException;

import org.lodestep.sample.InputFormatException;
import org.lodestep.sample.InputLimits;
import org.lodestep.qa.DatabaseUrls;
import org.lodestep.qa.SpecChangedException;
import org.lodestep.qa.StoreException;
import org.lodestep.rig.RigException;
import org.lodestep.workflow.InputDigests;

import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;

/**
 * Entry point: builds the command tree (only the invoked path in full, {@link CommandTree}) and maps every failure to
 * one documented exit code.
 */
@Command(name = "lodestep",
        mixinStandardHelpOptions = true,
        versionProvider = VersionProvider.class,
        description = "Bench test-data analyzer for two-phase hybrid stepper motors.",
        footerHeading = "%nExit codes:%n",
        footer = {
            "  0  done",
            "  1  internal error (rerun with --verbose and report it)",
            "  2  usage error or unreadable input",
            "  3  the analysis found an error-severity fault, or a QA check failed",
            "  4  rig or I/O failure",
            "  5  database failure",
            "  6  not yet determined: a probe ended early, or the readings leave the answer open"
        })
public final class Main implements Runnable {
    /** picocli's documented switch that turns off its support for Groovy closures in annotations. */
    private static final String PICOCLI_NO_CLOSURES = "picocli.disable.closures";

    static {
        // No command here is written in Groovy. Unless told so, picocli's first command model looks for Groovy's
        // closure class, and that one failed lookup makes the class loader open and index the whole jar (12,000
        // entries, about 13 ms of a small command's start), a jar the class-data archive otherwise spares opening.
        if (System.getProperty(PICOCLI_NO_CLOSURES) == null) {
            System.setProperty(PICOCLI_NO_CLOSURES, "true");
        }
    }

    /** Every command, in the order help lists them. */
    static final CommandTree TREE = CommandTree.group(Main.class,
            CommandTree.leaf(DemoCommand.class),
            CommandTree.group(LeadsCommand.class,
                    CommandTree.leaf(LeadsIdentifyCommand.class),
                    CommandTree.leaf(LeadsProbeCommand.class)),
            CommandTree.group(MotorCommand.class,
                    CommandTree.leaf(MotorIdentifyCommand.class)),
            CommandTree.group(ResonanceCommand.class,
                    CommandTree.leaf(ResonanceSweepCommand.class),
                    CommandTree.leaf(ResonanceRingdownCommand.class),
                    CommandTree.leaf(ResonancePredictCommand.class)),
            CommandTree.group(QaCommand.class,
                    CommandTree.leaf(QaCheckCommand.class),
                    CommandTree.leaf(QaReportCommand.class),
                    CommandTree.leaf(QaExportCommand.class),
                    CommandTree.leaf(QaCertificateCommand.class)),
            CommandTree.group(RigCommand.class,
                    CommandTree.leaf(RigPortsCommand.class),
                    CommandTree.leaf(RigInfoCommand.class),
                    CommandTree.leaf(RigMeasureCommand.class),
                    CommandTree.leaf(RigCaptureCommand.class),
                    CommandTree.leaf(RigServeCommand.class),
                    CommandTree.leaf(RigConformanceCommand.class)),
            CommandTree.group(DriveCommand.class,
                    CommandTree.leaf(DriveCurveCommand.class),
                    CommandTree.leaf(DrivePlanCommand.class)),
            CommandTree.leaf(StationCommand.class),
            CommandTree.leaf(CommandLine.HelpCommand.class));

    @Option(names = "--verbose", scope = CommandLine.ScopeType.INHERIT,
            description = "Show stack traces and extra detail when something fails.")
    boolean verbose;

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    @Override
    public void run() {
        spec.commandLine().usage(spec.commandLine().getOut());
    }

    public static void main(String[] args) {
        PrintWriter out = new PrintWriter(System.out, true, StandardCharsets.UTF_8);
        PrintWriter err = new PrintWriter(System.err, true, StandardCharsets.UTF_8);
        int code = run(out, err, args, true);
        out.flush();
        err.flush();
        System.exit(code);
    }

    /** Runs one command line in-process, writing to the given streams; returns the exit code. */
    public static int run(PrintWriter out, PrintWriter err, String... args) {
        return run(out, err, args, false);
    }

    /** @param launch whether this is the process's own command line (main), not one run in-process */
    private static int run(PrintWriter out, PrintWriter err, String[] args, boolean launch) {
        if (args.length == 1 && (args[0].equals("--version") || args[0].equals("-V"))) {
            // The one command that needs no command model: what picocli would print (tested), without building it.
            for (String line : new VersionProvider().getVersion()) {
                out.println(line);
            }
            out.flush();
            return ExitCode.OK;
        }
        String help = HelpTexts.forArgs(args);
        if (help != null) {
            // picocli's own text, rendered when the jar was built (HelpTexts): no command model to build
            out.print(help);
            out.flush();
            return ExitCode.OK;
        }
        // Large input files are hashed for the report's provenance while the command works on them.
        InputDigests.start(java.util.Arrays.asList(args));
        CommandLine cl = configure(TREE.buildFor(new Main(), args));
        if (launch) {
            RunProvenance.prepareMeanwhile();   // on the other core while the command runs
        }
        cl.setOut(out);
        PrintWriter redacted = new PrintWriter(new RedactingWriter(err), true);
        cl.setErr(redacted);
        try {
            return cl.execute(args);
        } finally {
            redacted.flush();
        }
    }

    /** The whole configured command tree, every command with its full model (tests, documentation). */
    static CommandLine commandLine() {
        return configure(TREE.buildFull(new Main()));
    }

    /** Settings for the whole tree; picocli applies them to the subcommands present, so call it once they are. */
    private static CommandLine configure(CommandLine cl) {
        cl.setCaseInsensitiveEnumValuesAllowed(true);
        cl.setUsageHelpAutoWidth(true);
        Handlers handlers = new Handlers();
        cl.setExecutionExceptionHandler(handlers);
        cl.setParameterExceptionHandler(handlers);
        cl.registerConverter(Double.class, handlers);
        cl.registerConverter(Double.TYPE, handlers);
        return cl;
    }

    /**
     * Main's hooks into picocli as one named class, not lambdas: picocli ships its interfaces as Java 5 class files,
     * and a lambda implementing one made the class-data archive leave out that interface and every picocli class
     * implementing it (its type converters). The build now rewrites them as Java 6 class files
     * ({@code org.lodestep.build.ClassFileUpgrade}); a named class keeps the archive independent of that.
     */
    private static final class Handlers implements CommandLine.IExecutionExceptionHandler,
            CommandLine.IParameterExceptionHandler, CommandLine.ITypeConverter<Double> {
        @Override
        public int handleExecutionException(Exception ex, CommandLine cmd, CommandLine.ParseResult parseResult) {
            return handle(ex, cmd, isVerbose(parseResult));
        }

        @Override
        public int handleParseException(CommandLine.ParameterException ex, String[] args) {
            return badParameter(ex, args);
        }

        @Override
        public Double convert(String text) {
            return plausibleNumber(text);
        }
    }

    /**
     * Every number typed on the command line: finite and no larger in magnitude than any bench quantity can be
     * ({@link InputLimits#MAX_SAMPLE_MAGNITUDE}), so {@code 1e308} or {@code NaN} never reaches a formula; a bad value
     * is the one-line parameter error of {@link #badParameter}.
     */
    static Double plausibleNumber(String text) {
        double v;
        try {
            v = Double.parseDouble(text.strip());
        } catch (NumberFormatException e) {
            throw new CommandLine.TypeConversionException("'" + text + "' is not a number");
        }
        if (!InputLimits.plausibleMagnitude(v)) {
            throw new CommandLine.TypeConversionException("'" + text + "' is not a plausible value: expected a finite"
                    + " number of magnitude at most " + InputLimits.MAX_SAMPLE_MAGNITUDE);
        }
        return v;
    }

    /**
     * A bad option or value: one line naming it and where help is, instead of the whole usage (which buries the
     * reason under 60 lines); exit 2.
     */
    static int badParameter(CommandLine.ParameterException ex, String[] args) {
        CommandLine cmd = ex.getCommandLine();
        String name = cmd.getCommandSpec().qualifiedName();
        String reason = String.valueOf(ex.getMessage()).strip().lines().findFirst().orElse("bad option")
                .replaceAll("\\p{Cntrl}", "?");
        PrintWriter err = cmd.getErr();
        err.println(name + ": " + DatabaseUrls.redact(reason) + " (see '" + name + " --help')");
        err.flush();
        return ExitCode.USAGE;
    }

    private static boolean isVerbose(CommandLine.ParseResult parseResult) {
        CommandLine.ParseResult p = parseResult;
        while (p != null) {
            if (p.hasMatchedOption("--verbose")) {
                return true;
            }
            p = p.hasSubcommand() ? p.subcommand() : null;
        }
        return false;
    }

    private static String stackTrace(Throwable t) {
        java.io.StringWriter w = new java.io.StringWriter();
        t.printStackTrace(new PrintWriter(w));
        return w.toString();
    }

    /** The one table from failure kinds to exit codes. */
    static int handle(Exception ex, CommandLine cmd, boolean verbose) {
        PrintWriter err = cmd.getErr();
        Throwable t = ex instanceof UncheckedIOException u ? u.getCause() : ex;
        int code;
        String message;
        if (t instanceof InputFormatException) {
            code = ExitCode.USAGE;
            message = t.getMessage();
        } else if (t instanceof NoSuchFileException || t instanceof FileNotFoundException) {
            code = ExitCode.USAGE;
            message = t.getMessage() + ": no such file";
        } else if (t instanceof AccessDeniedException) {
            code = ExitCode.USAGE;
            message = t.getMessage() + ": permission denied";
        } else if (t instanceof org.lodestep.report.html.OutputFile.NotWritten) {
            code = ExitCode.USAGE;
            message = t.getMessage();
        } else if (t instanceof UsageException || t instanceof org.lodestep.workflow.SettingsException) {
            code = ExitCode.USAGE;
            message = t.getMessage();
        } else if (t instanceof RigException) {
            code = ExitCode.RIG_OR_IO;
            message = "rig: " + t.getMessage();
        } else if (t instanceof IOException) {
            code = ExitCode.RIG_OR_IO;
            message = "I/O: " + t.getMessage();
        } else if (t instanceof SpecChangedException) {
            code = ExitCode.USAGE; // the spec file is at fault, not the store
            message = t.getMessage();
        } else if (t instanceof StoreException) {
            code = ExitCode.DATABASE;
            message = "database: " + t.getMessage();
        } else {
            code = ExitCode.INTERNAL;
            message = "internal error: " + t + (verbose ? "" : " (rerun with --verbose for details)");
        }
        // no error line ever shows a database password, whichever layer wrote the message
        err.println(cmd.getCommandSpec().qualifiedName() + ": " + DatabaseUrls.redact(message));
        if (verbose) {
            err.println(DatabaseUrls.redact(stackTrace(t)));
        }
        err.flush();
        return code;
    }
}
