package org.lodestep.qa;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Map;
import java.util.Properties;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import org.flywaydb.core.Flyway;
import org.flywaydb.core.api.FlywayException;

/**
 * Opens the record store a location names, migrating its schema first.
 *
 * <ul>
 *   <li>nothing: the SQLite file {@value #DEFAULT_FILE} in the working folder (zero setup);</li>
 *   <li>a path, or {@code jdbc:sqlite:PATH}: that SQLite file, created on first use;</li>
 *   <li>{@code jdbc:postgresql://HOST:PORT/DB[?currentSchema=S]}: a shared PostgreSQL database. The user and
 *       password come from the environment ({@code LODESTEP_DB_USER}/{@code LODESTEP_DB_PASSWORD}, else
 *       {@code PGUSER}/{@code PGPASSWORD}) or the driver's {@code ~/.pgpass}; a password written in the URL is
 *       refused, so it never appears on a command line or in a shell history.</li>
 * </ul>
 */
public final class RecordStores {

    /** The default SQLite file name. */
    public static final String DEFAULT_FILE = "lodestep-qa.sqlite";

    /** How long a SQLite writer waits for another station's transaction, ms. */
    static final int SQLITE_BUSY_TIMEOUT_MS = 30_000;

    private static final Pattern SCHEMA = Pattern.compile("[?&]currentSchema=([A-Za-z_][A-Za-z0-9_]*)");

    private RecordStores() {
    }

    /**
     * Opens (creating and migrating as needed) the store at {@code location}.
     *
     * @param location null or blank for the default file, a path, or a JDBC URL
     * @param env      the environment to take credentials from (normally {@code System.getenv()})
     * @throws IllegalArgumentException when the location carries a password or names an unsupported database
     */
    public static RecordStore open(String location, Map<String, String> env) throws StoreException {
        String loc = location == null || location.isBlank() ? DEFAULT_FILE : location.trim();
        if (loc.startsWith("jdbc:") || loc.contains("://")) {
            DatabaseUrls.refusePassword(loc);
        }
        if (loc.startsWith("jdbc:postgresql:")) {
            return openPostgres(loc, env);
        }
        if (loc.startsWith("jdbc:") && !loc.startsWith("jdbc:sqlite:")) {
            throw new IllegalArgumentException("unsupported database URL " + DatabaseUrls.redact(loc)
                    + ": expected a file path, jdbc:sqlite:PATH or jdbc:postgresql://HOST/DB");
        }
        String path = loc.startsWith("jdbc:sqlite:") ? loc.substring("jdbc:sqlite:".length()) : loc;
        return openSqlite(Path.of(path));
    }

    /** The SQLite file a location names, or empty for a PostgreSQL (or other JDBC) location. */
    public static java.util.Optional<Path> sqliteFile(String location) {
        String loc = location == null || location.isBlank() ? DEFAULT_FILE : location.trim();
        if (loc.startsWith("jdbc:sqlite:")) {
            return java.util.Optional.of(Path.of(loc.substring("jdbc:sqlite:".length())));
        }
        return loc.startsWith("jdbc:") ? java.util.Optional.empty() : java.util.Optional.of(Path.of(loc));
    }

    private static RecordStore openSqlite(Path file) throws StoreException {
        // A mistyped folder must not silently become a new, empty store next to the real one: the folder must exist.
        Path parent = file.toAbsolutePath().getParent();
        if (parent != null && !Files.isDirectory(parent)) {
            throw new IllegalArgumentException(file + ": the folder " + parent
                    + " does not exist: expected the path of a SQLite file in an existing folder");
        }
        if (Files.isDirectory(file)) {
            throw new IllegalArgumentException(file + " is a folder: expected the path of a SQLite file");
        }
        // WAL lets stations read while one writes; IMMEDIATE takes the write lock at BEGIN so two writers queue
        // instead of failing on a lock upgrade; the busy timeout is how long they queue.
        String url = "jdbc:sqlite:" + file + "?journal_mode=WAL&busy_timeout=" + SQLITE_BUSY_TIMEOUT_MS
                + "&transaction_mode=IMMEDIATE&foreign_keys=true";
        migrate(url, null, null, null, "sqlite", file.toString());
        return JdbcRecordStore.connect(url, new Properties(), file.toString());
    }

    private static RecordStore openPostgres(String url, Map<String, String> env) throws StoreException {
        String user = first(env, "LODESTEP_DB_USER", "PGUSER");
        String password = first(env, "LODESTEP_DB_PASSWORD", "PGPASSWORD");
        Properties props = new Properties();
        if (user != null) {
            props.setProperty("user", user);
        }
        if (password != null) {
            props.setProperty("password", password);
        }
        Matcher m = SCHEMA.matcher(url);
        String schema = m.find() ? m.group(1) : null;
        String shown = url.replaceAll("[?].*$", "") + (schema == null ? "" : " (schema " + schema + ")");
        migrate(url, user, password, schema, "postgresql", shown);
        return JdbcRecordStore.connect(url, props, shown);
    }

    private static String first(Map<String, String> env, String a, String b) {
        String v = env.get(a);
        if (v == null || v.isEmpty()) {
            v = env.get(b);
        }
        return v == null || v.isEmpty() ? null : v;
    }

    private static void migrate(String url, String user, String password, String schema, String vendor, String shown)
            throws StoreException {
        try {
            var config = Flyway.configure(RecordStores.class.getClassLoader())
                    .dataSource(url, user, password)
                    .locations("classpath:org/lodestep/qa/migration/" + vendor)
                    .table("qa_schema_history");
            if (schema != null) {
                config = config.schemas(schema).defaultSchema(schema);
            }
            config.load().migrate();
        } catch (FlywayException e) {
            throw new StoreException(DatabaseUrls.redact("cannot open or migrate " + shown + ": " + rootMessage(e)), e);
        }
    }

    static String rootMessage(Throwable t) {
        Throwable c = t;
        while (c.getCause() != null && c.getCause() != c) {
            c = c.getCause();
        }
        String msg = c.getMessage() == null ? c.toString() : c.getMessage();
        return msg.replaceAll("\\s+", " ").trim();
    }
}
