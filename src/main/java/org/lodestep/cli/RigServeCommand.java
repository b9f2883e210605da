package org.lodestep.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.net.InetAddress;
import java.net.InetSocketAddress;
import java.net.ServerSocket;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.Callable;
import java.util.concurrent.TimeUnit;

import org.lodestep.rig.RigException;
import org.lodestep.rig.RigServer;
import org.lodestep.rig.Scenario;
import org.lodestep.rig.Scenarios;
import org.lodestep.rig.Transport;
import org.lodestep.rig.Transports;
import org.lodestep.rig.VirtualRig;

import picocli.CommandLine.ArgGroup;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/** {@code lodestep rig serve}: the virtual rig as a separate process, on a TCP port or a serial line. */
@Command(name = "serve", mixinStandardHelpOptions = true,
        description = {"Run the virtual rig as a separate process speaking the rig protocol (firmware-protocol.md), "
                + "on a TCP port (loopback unless you name another address), on a serial device, or on a "
                + "pseudo-terminal pair made with socat. Serves one session at a time until stopped (Ctrl-C): on TCP "
                + "another host is answered BUSY at once, and a host silent for 2 s before HELLO or 30 s after it is "
                + "disconnected."},
        footer = {"%nExamples:",
                "  lodestep rig serve --scenario gantry-axis --tcp 127.0.0.1:7070",
                "      then: lodestep rig info tcp:127.0.0.1:7070",
                "  socat -d -d pty,raw,echo=0,link=/tmp/rig-a pty,raw,echo=0,link=/tmp/rig-b &",
                "  lodestep rig serve --scenario salvage-8 --serial /tmp/rig-a",
                "      then: lodestep rig info serial:/tmp/rig-b",
                "  lodestep rig serve --scenario salvage-8 --pty      (starts socat itself, prints the host end)"})
final class RigServeCommand implements Callable<Integer> {
    @Option(names = "--scenario", paramLabel = "NAME", required = true,
            description = "Virtual-rig scenario (`lodestep rig info sim:` lists them).")
    String scenarioName;

    @Option(names = "--seed", paramLabel = "N", description = "Override the scenario's seed (lead shuffle, noise).")
    Long seed;

    static final class Where {
        @Option(names = "--tcp", paramLabel = "HOST:PORT", description = "Listen on this TCP address "
                + "(e.g. 127.0.0.1:7070; port 0 picks a free one).")
        String tcp;

        @Option(names = "--serial", paramLabel = "DEVICE", description = "Serve on this serial device, e.g. one end "
                + "of a socat pseudo-terminal pair.")
        String serial;

        @Option(names = "--pty", description = "Start socat to make a pseudo-terminal pair, serve on one end and "
                + "print the other for the host.")
        boolean pty;
    }

    @ArgGroup(exclusive = true, multiplicity = "0..1")
    Where where = new Where();

    @Option(names = "--baud", paramLabel = "BPS", defaultValue = "921600",
            description = "Serial line speed, bit/s (default ${DEFAULT-VALUE}).")
    int baud;

    @Option(names = "--real-time", description = "Send sample blocks no faster than they would be sampled.")
    boolean realTime;

    @Option(names = "--once", description = "Exit after the first session ends (the host says BYE or hangs up).")
    boolean once;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() throws Exception {
        Scenario s;
        try {
            s = Scenarios.get(scenarioName);
        } catch (RigException e) {
            throw new UsageException(e.getMessage());
        }
        if (seed != null) {
            s = s.withSeed(seed);
        }
        PrintWriter out = spec.commandLine().getOut();
        if (where.serial != null) {
            serveSerial(s, where.serial, out);
        } else if (where.pty) {
            servePty(s, out);
        } else {
            serveTcp(s, where.tcp == null ? "127.0.0.1:7070" : where.tcp, out);
        }
        return ExitCode.OK;
    }

    private void serveTcp(Scenario s, String hostPort, PrintWriter out) throws IOException {
        int colon = hostPort.lastIndexOf(':');
        int port;
        try {
            port = Integer.parseInt(hostPort.substring(colon + 1));
        } catch (NumberFormatException | StringIndexOutOfBoundsException e) {
            throw new UsageException("--tcp '" + hostPort + "' is not HOST:PORT");
        }
        String host = colon <= 0 ? "127.0.0.1" : hostPort.substring(0, colon);
        InetAddress bind = InetAddress.getByName(host);
        try (ServerSocket server = new ServerSocket()) {
            server.bind(new InetSocketAddress(bind, port));
            if (!bind.isLoopbackAddress()) {
                out.println("Note: serving on " + host + ", reachable from the network; anyone who can reach it can "
                        + "drive this virtual rig.");
            }
            out.println("virtual rig '" + scenarioName + "' listening on tcp:" + host + ":" + server.getLocalPort()
                    + " (Ctrl-C to stop)");
            out.flush();
            RigServer.serve(server, scenarioName, s, realTime, once, line -> {
                synchronized (out) {
                    out.println(line);
                    out.flush();
                }
            });
        }
    }

    private void serveSerial(Scenario s, String device, PrintWriter out) throws RigException {
        out.println("virtual rig '" + scenarioName + "' on serial:" + device + " at " + baud + " bit/s (Ctrl-C to stop)");
        out.flush();
        do {
            Transport t = Transports.openSerialDevice(device, baud);
            new VirtualRig(scenarioName, s, t, realTime).run();
            out.println("session ended");
            out.flush();
        } while (!once);
    }

    private void servePty(Scenario s, PrintWriter out) throws IOException, RigException, InterruptedException {
        Path dir = Files.createTempDirectory("lodestep-pty");
        Path rigEnd = dir.resolve("rig");
        Path hostEnd = dir.resolve("host");
        Process socat;
        try {
            socat = new ProcessBuilder("socat", "pty,raw,echo=0,link=" + rigEnd, "pty,raw,echo=0,link=" + hostEnd)
                    .redirectErrorStream(true).redirectOutput(ProcessBuilder.Redirect.DISCARD).start();
        } catch (IOException e) {
            throw new UsageException("--pty needs socat (Debian: apt-get install socat): " + e.getMessage());
        }
        try {
            long deadline = System.nanoTime() + TimeUnit.SECONDS.toNanos(5);
            while (!(Files.exists(rigEnd) && Files.exists(hostEnd)) && System.nanoTime() < deadline) {
                Thread.sleep(20);
            }
            if (!Files.exists(hostEnd)) {
                throw new RigException("socat did not create the pseudo-terminal pair in " + dir);
            }
            out.println("host end: serial:" + hostEnd.toRealPath() + "  (also reachable as serial:" + hostEnd + ")");
            serveSerial(s, rigEnd.toRealPath().toString(), out);
        } finally {
            socat.destroy();
            socat.waitFor(2, TimeUnit.SECONDS);
            Files.deleteIfExists(rigEnd);
            Files.deleteIfExists(hostEnd);
            Files.deleteIfExists(dir);
        }
    }
}
