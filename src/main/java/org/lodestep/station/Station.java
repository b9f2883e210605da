package org.lodestep.station;

import java.net.InetAddress;
import java.net.UnknownHostException;
import java.nio.file.Path;
import java.util.Objects;

import io.javalin.Javalin;
import io.javalin.config.SizeUnit;

/**
 * The bench station: a browser front end served by Lodestep itself on the bench computer. It calls the same
 * workflows as the command line ({@code org.lodestep.workflow}) and renders through {@code report}; it computes
 * nothing. Pages: Leads, Motor, the QA station, Records, Sweep.
 *
 * <p>Security: it listens on loopback unless told otherwise; on any other address every request must carry the
 * access token ({@link Access}); state-changing requests are refused from other sites; uploads are size-limited.
 */
public final class Station implements AutoCloseable {

    /** Largest upload (a part spec, a capture), bytes: a sweep capture of a minute at 5 kHz fits comfortably. */
    static final long MAX_UPLOAD_BYTES = 32L * 1024 * 1024;

    /**
     * How the station runs.
     *
     * @param host        address to listen on; loopback unless a token is given
     * @param port        TCP port, 0 for any free one
     * @param token       access token required on every request, or null (loopback only)
     * @param db          QA record store: a SQLite file or a jdbc:postgresql URL, as {@code qa} takes it
     * @param rig         default rig address ({@code sim:SCENARIO} for the virtual rig)
     * @param specs       folder of part specs (TOML) offered on the QA station
     * @param captures    folder of lead-pair CSVs ({@code SERIAL.csv}) and meter logs offered on the QA station
     * @param out         folder the station writes sweep captures to
     * @param toolVersion recorded with every QA record and capture
     */
    public record Settings(String host, int port, String token, String db, String rig, Path specs, Path captures,
                           Path out, String toolVersion) {
        public Settings {
            Objects.requireNonNull(host, "host");
            Objects.requireNonNull(out, "out");
            if (port < 0 || port > 65535) {
                throw new IllegalArgumentException("port " + port + " is not 0 to 65535");
            }
            if (token != null && token.length() < 16) {
                throw new IllegalArgumentException("the access token must be at least 16 characters");
            }
            if (token == null && !loopback(host)) {
                throw new IllegalArgumentException("listening on " + host + " needs an access token");
            }
            rig = rig == null || rig.isBlank() ? "sim:bench-4" : rig;
            toolVersion = toolVersion == null ? "" : toolVersion;
        }
    }

    private final Javalin app;
    private final Settings settings;
    private final Tasks tasks;

    private Station(Javalin app, Settings settings, Tasks tasks) {
        this.app = app;
        this.settings = settings;
        this.tasks = tasks;
    }

    /** Starts listening; the caller prints {@link #address()}. */
    public static Station start(Settings s) {
        Tasks tasks = new Tasks();
        Access access = new Access(s.token());
        Desk desk = new Desk(s, access, tasks);
        Javalin app = Javalin.create(config -> {
            config.startup.showJavalinBanner = false;
            config.startup.showOldJavalinVersionWarning = false;
            config.http.maxRequestSize = MAX_UPLOAD_BYTES;
            config.jetty.multipartConfig.maxFileSize(MAX_UPLOAD_BYTES, SizeUnit.BYTES);
            config.jetty.multipartConfig.maxTotalRequestSize(MAX_UPLOAD_BYTES, SizeUnit.BYTES);
            config.jetty.multipartConfig.maxInMemoryFileSize(1, SizeUnit.MB);
            config.routes.before(access::check);
            desk.routes(config.routes);
            new LeadsPages(desk).routes(config.routes);
            new MotorPages(desk).routes(config.routes);
            new QaPages(desk).routes(config.routes);
            new RecordsPages(desk).routes(config.routes);
            new SweepPages(desk).routes(config.routes);
            config.routes.exception(Exception.class, (e, ctx) -> Problems.respond(ctx, e));
        });
        app.start(s.host(), s.port());
        return new Station(app, s, tasks);
    }

    /** The port listened on (the chosen one when the settings asked for 0). */
    public int port() {
        return app.port();
    }

    /** The address to open in a browser; with a token it carries it once (the page then keeps it in a cookie). */
    public String address() {
        String host = settings.host();
        if (host.equals("0.0.0.0") || host.equals("::") || host.equals("[::]")) {
            try {
                host = InetAddress.getLocalHost().getHostName(); // "any address": name the machine others reach
            } catch (UnknownHostException e) {
                // keep the wildcard: the user knows the machine's name
            }
        }
        host = host.contains(":") ? "[" + host + "]" : host;
        return "http://" + host + ":" + port() + "/" + (settings.token() == null ? "" : "?token=" + settings.token());
    }

    @Override
    public void close() {
        tasks.close();
        app.stop();
    }

    /** A fresh access token: 128 random bits in hex. */
    public static String newToken() {
        return Access.random();
    }

    /** True for a loopback address (or a name that resolves only to one). */
    public static boolean loopback(String host) {
        if (host.equals("localhost")) {
            return true;
        }
        try {
            for (InetAddress a : InetAddress.getAllByName(host)) {
                if (!a.isLoopbackAddress()) {
                    return false;
                }
            }
            return true;
        } catch (UnknownHostException e) {
            return false;
        }
    }
}
