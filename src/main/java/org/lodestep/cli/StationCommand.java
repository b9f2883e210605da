package org.lodestep.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.concurrent.Callable;
import java.util.concurrent.CountDownLatch;

import org.lodestep.station.Station;

import picocli.CommandLine.Command;
import picocli.CommandLine.Option;

/** {@code lodestep station}: serves the bench station to a browser until interrupted. */
@Command(name = "station", mixinStandardHelpOptions = true,
        description = {"Serve the bench station: a browser interface for the guided lead probe, the motor card from "
                + "uploaded captures, the QA desk (scan serials, big verdicts, certificates), the records (lot yield, "
                + "capability, control charts, export) and rig sweeps.",
                "Listens on 127.0.0.1 unless --listen names another address, which needs the access token printed "
                        + "at start (or $LODESTEP_STATION_TOKEN). Stop with Ctrl-C."},
        footer = {"%nExamples:",
                "  lodestep station --specs sample-captures/qa --captures sample-captures/qa",
                "  LODESTEP_STATION_TOKEN=... lodestep station --listen 0.0.0.0 --port 8317 --db jdbc:postgresql://db/qa",
                "%nCautions: the QA station's insulation test through a rig applies hundreds of volts DC and needs its "
                        + "own arming for each motor; a sweep moves the axis. Local codes and licensed practice take "
                        + "precedence."})
final class StationCommand implements Callable<Integer> {
    static final String TOKEN_ENV = "LODESTEP_STATION_TOKEN";

    @Option(names = "--listen", paramLabel = "ADDR", defaultValue = "127.0.0.1",
            description = "Address to listen on (default ${DEFAULT-VALUE}); any other than loopback needs the token.")
    String listen;

    @Option(names = "--port", paramLabel = "N", defaultValue = "8317",
            description = "TCP port (default ${DEFAULT-VALUE}; 0 for any free one).")
    int port;

    @Option(names = "--rig", paramLabel = "ADDR", defaultValue = "sim:bench-4",
            description = "Bench rig for QA readings and sweeps (default ${DEFAULT-VALUE}, the virtual rig). "
                    + RigCli.ADDRESS_HELP)
    String rig;

    @Option(names = "--specs", paramLabel = "DIR", defaultValue = ".",
            description = "Folder of part specs (*.toml) offered on the QA station (default: the working folder).")
    Path specs;

    @Option(names = "--captures", paramLabel = "DIR",
            description = "Folder of lead-pair CSVs (SERIAL.csv) and meter logs (*meter*.csv) for the QA station.")
    Path captures;

    @Option(names = "--out", paramLabel = "DIR", defaultValue = "station-output",
            description = "Folder for sweep captures (default ${DEFAULT-VALUE}).")
    Path out;

    @picocli.CommandLine.Mixin
    QaStoreOption store = new QaStoreOption();

    @picocli.CommandLine.Spec
    picocli.CommandLine.Model.CommandSpec spec;

    @Override
    public Integer call() throws Exception {
        PrintWriter o = spec.commandLine().getOut();
        boolean loopback = Station.loopback(listen);
        String token = System.getenv(TOKEN_ENV);
        if (token != null && token.isBlank()) {
            token = null;
        }
        if (token == null && !loopback) {
            token = Station.newToken();
        }
        Station.Settings settings;
        try {
            settings = new Station.Settings(listen, port, token, store.db, rig, specs, captures, out,
                    VersionProvider.version());
        } catch (IllegalArgumentException e) {
            throw new UsageException(e.getMessage());
        }
        Station station;
        try {
            station = Station.start(settings);
        } catch (RuntimeException e) {
            throw new java.io.IOException("cannot listen on " + listen + ":" + port + ": " + rootMessage(e), e);
        }
        CountDownLatch stopped = new CountDownLatch(1);
        Runtime.getRuntime().addShutdownHook(new Thread(() -> {
            station.close();
            stopped.countDown();
        }, "station-stop"));
        o.println("Lodestep bench station: open " + station.address());
        if (token != null) {
            o.println("  the address carries the access token; share it only with people at this bench");
        }
        o.println("  rig " + rig + "; records " + (store.db == null ? org.lodestep.qa.RecordStores.DEFAULT_FILE : store.db));
        o.println("  cautions: insulation tests apply hundreds of volts DC (armed per motor); a sweep moves the axis");
        o.println("  Ctrl-C stops the station");
        o.flush();
        stopped.await();
        return ExitCode.OK;
    }

    private static String rootMessage(Throwable e) {
        Throwable t = e;
        while (t.getCause() != null) {
            t = t.getCause();
        }
        return t.getMessage() == null ? t.getClass().getSimpleName() : t.getMessage();
    }
}
