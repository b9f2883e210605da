package org.lodestep.cli;

import java.time.Instant;
import java.util.ArrayList;
import java.util.List;

import org.lodestep.workflow.Provenance;

import picocli.CommandLine;

/** The {@link Provenance} of one command-line run: this tool's version, the arguments as typed, the time now. */
final class RunProvenance {
    private RunProvenance() {
    }

    /**
     * Sets up, on a daemon thread, what the run's provenance will need: the runtime's SHA-256 provider and its
     * formatting of times, cold code that a run would otherwise do on its own thread after its analysis (it saved
     * {@code leads identify} 10 to 18 ms); started before the analysis, it runs meanwhile on the other core.
     * Nothing waits for it or sees its result. Called once the command model is built, when picocli has set up the
     * time classes it probes, so the two never initialise those classes at once.
     */
    static void prepareMeanwhile() {
        Thread t = new Thread(() -> Provenance.of(VersionProvider.version(), List.of(), Instant.now()),
                "lodestep-provenance-setup");
        t.setDaemon(true);
        t.start();
    }

    /** The run of the command whose spec is {@code spec}, no inputs yet. */
    static Provenance of(CommandLine.Model.CommandSpec spec) {
        List<String> cmd = new ArrayList<>();
        cmd.add("lodestep");
        CommandLine.ParseResult root = spec.root().commandLine().getParseResult();
        CommandLine.ParseResult own = spec.commandLine().getParseResult();
        CommandLine.ParseResult pr = root != null ? root : own;
        if (pr != null) {
            cmd.addAll(pr.originalArgs());
        }
        return Provenance.of(VersionProvider.version(), cmd, Instant.now());
    }

    /** A run a demo makes on the user's behalf: the command it prints, as if typed. */
    static Provenance ofDemo(String... args) {
        List<String> cmd = new ArrayList<>();
        cmd.add("lodestep");
        cmd.addAll(List.of(args));
        return Provenance.of(VersionProvider.version(), cmd, Instant.now());
    }

    /** {@code p} with the rig a capture's metadata names (rig, id, firmware, address), when it names one. */
    static Provenance withCaptureRig(Provenance p, java.util.Map<String, String> meta) {
        if (!meta.containsKey("rig")) {
            return p;
        }
        return p.withRig(meta.get("rig") + ", id " + meta.getOrDefault("rig_id", "?") + ", firmware "
                + meta.getOrDefault("firmware", "?") + (meta.containsKey("address") ? ", at " + meta.get("address")
                : ""));
    }

    /** The rig line of a provenance: name, id, firmware, protocol, address. */
    static String rig(org.lodestep.rig.RigInfo info) {
        return info.rig() + ", id " + info.id() + ", firmware " + info.firmware() + ", protocol "
                + info.protocolVersion() + ", at " + info.address();
    }
}
