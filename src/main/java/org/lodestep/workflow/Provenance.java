package org.lodestep.workflow;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.time.temporal.ChronoUnit;
import java.util.ArrayList;
import java.util.List;
import java.util.Objects;

import org.lodestep.qa.Hashes;

/**
 * What produced a report, so that a report found in a folder a year later says exactly where it came from: the tool
 * and its version, the command line (or {@code station} for the bench station), the UTC time of the run, every input
 * file with its SHA-256, and the rig with its firmware where one was used.
 *
 * <p>A front end builds one per run ({@link #of}, then {@link #withInput} and {@link #withRig}); every report of
 * that run (text, JSON, HTML) renders the same record. The report ID is derived from the rest (first 12 hex digits
 * of a SHA-256 over tool, command, time, inputs and rig), so two runs differ in ID and a reprint of one run does not.
 *
 * @param reportId    twelve hex digits naming this run's reports
 * @param tool        "lodestep 0.1.0"
 * @param commandLine the command as typed (one element per argument), or {@code ["station"]}
 * @param runAtUtc    when the run started, to the second
 * @param inputs      each input file, in the order given
 * @param rig         the rig and its firmware ("lodestep-virtual-rig, id VR-1, firmware 0.1.0, at sim:x"), or null
 */
public record Provenance(String reportId, String tool, List<String> commandLine, Instant runAtUtc,
                         List<InputFile> inputs, String rig) {
    public Provenance {
        Objects.requireNonNull(reportId, "reportId");
        Objects.requireNonNull(tool, "tool");
        commandLine = List.copyOf(commandLine);
        Objects.requireNonNull(runAtUtc, "runAtUtc");
        inputs = List.copyOf(inputs);
    }

    /**
     * One input file.
     *
     * @param role   what the file was to the run ("resistance", "step response", "spec", "capture", "input")
     * @param path   the path as given
     * @param bytes  its size, or -1 when it could not be read again
     * @param sha256 its SHA-256 in hex, or null when it could not be read again (the reason is then in {@code note})
     * @param note   empty, or why the file has no hash
     */
    public record InputFile(String role, String path, long bytes, String sha256, String note) {
        public InputFile {
            Objects.requireNonNull(role, "role");
            Objects.requireNonNull(path, "path");
            note = note == null ? "" : note;
        }
    }

    /** A run started now by {@code commandLine}, no inputs yet. */
    public static Provenance of(String toolVersion, List<String> commandLine, Instant now) {
        return make("lodestep " + toolVersion, commandLine, now.truncatedTo(ChronoUnit.SECONDS), List.of(), null);
    }

    /**
     * This provenance with one more input file, hashed now or taken from the hash {@link InputDigests#start} began at
     * the start of the run (a file that cannot be read keeps a note instead).
     */
    public Provenance withInput(String role, Path file) {
        List<InputFile> more = new ArrayList<>(inputs);
        more.add(hash(role, file));
        return make(tool, commandLine, runAtUtc, more, rig);
    }

    /** This provenance with each of {@code files} added under one role. */
    public Provenance withInputs(String role, List<Path> files) {
        Provenance p = this;
        for (Path f : files) {
            p = p.withInput(role, f);
        }
        return p;
    }

    /** This provenance with an input given as bytes (an upload to the station), hashed now. */
    public Provenance withInput(String role, String name, byte[] content) {
        List<InputFile> more = new ArrayList<>(inputs);
        more.add(new InputFile(role, name, content.length, Hashes.sha256(content), ""));
        return make(tool, commandLine, runAtUtc, more, rig);
    }

    /** This provenance with the rig used (its name, id, firmware and address). */
    public Provenance withRig(String rigDescription) {
        return make(tool, commandLine, runAtUtc, inputs, Objects.requireNonNull(rigDescription, "rigDescription"));
    }

    /** The command line as one line, arguments with spaces or quotes quoted as a POSIX shell would read them. */
    public String commandText() {
        List<String> parts = new ArrayList<>();
        for (String a : commandLine) {
            parts.add(a.isEmpty() || !a.matches("[A-Za-z0-9_./:=+,@%^-]+") ? "'" + a.replace("'", "'\\''") + "'" : a);
        }
        return String.join(" ", parts);
    }

    private static InputFile hash(String role, Path file) {
        try {
            return new InputFile(role, file.toString(), Files.size(file), InputDigests.sha256(file), "");
        } catch (IOException | RuntimeException e) {
            return new InputFile(role, file.toString(), -1, null, "not readable when hashed: "
                    + e.getClass().getSimpleName());
        }
    }

    private static Provenance make(String tool, List<String> commandLine, Instant at, List<InputFile> inputs,
                                   String rig) {
        StringBuilder sb = new StringBuilder(tool).append('\n').append(String.join("\u0000", commandLine))
                .append('\n').append(at).append('\n');
        for (InputFile f : inputs) {
            sb.append(f.role()).append('\u0000').append(f.path()).append('\u0000').append(f.sha256()).append('\n');
        }
        sb.append(rig == null ? "" : rig);
        String id = Hashes.sha256(sb.toString().getBytes(StandardCharsets.UTF_8)).substring(0, 12);
        return new Provenance(id, tool, commandLine, at, inputs, rig);
    }
}
