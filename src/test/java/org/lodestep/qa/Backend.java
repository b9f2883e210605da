package org.lodestep.qa;

import static org.junit.jupiter.api.Assertions.fail;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.SQLException;
import java.util.Comparator;
import java.util.Map;
import java.util.UUID;
import java.util.stream.Stream;

import org.junit.jupiter.api.Assumptions;

/**
 * A fresh, empty store location for one test: a SQLite file in a temporary folder, or a PostgreSQL schema of its
 * own on 127.0.0.1:5432/test (so parallel runs never share tables). With CI=true an unreachable PostgreSQL fails
 * the test; elsewhere the test is skipped with a message.
 */
abstract class Backend implements AutoCloseable {
    static final String PG_BASE = "jdbc:postgresql://127.0.0.1:5432/test?user=postgres&connectTimeout=3";

    abstract String location();

    RecordStore open() throws StoreException {
        return RecordStores.open(location(), Map.of());
    }

    /** Both backends, for {@code @MethodSource}. */
    static Stream<String> names() {
        return Stream.of("sqlite", "postgresql");
    }

    static Backend create(String name) throws IOException {
        return name.equals("sqlite") ? new Sqlite() : new Postgres();
    }

    @Override
    public abstract void close() throws Exception;

    static final class Sqlite extends Backend {
        private final Path dir;

        Sqlite() throws IOException {
            dir = Files.createTempDirectory("lodestep-qa-test");
        }

        @Override
        String location() {
            return dir.resolve("records.sqlite").toString();
        }

        @Override
        public void close() throws IOException {
            try (Stream<Path> s = Files.walk(dir)) {
                for (Path p : s.sorted(Comparator.reverseOrder()).toList()) {
                    Files.deleteIfExists(p);
                }
            }
        }

        @Override
        public String toString() {
            return "sqlite";
        }
    }

    static final class Postgres extends Backend {
        private final String schema = "lodestep_qa_" + UUID.randomUUID().toString().replace("-", "").substring(0, 16);

        Postgres() {
            try (Connection c = DriverManager.getConnection(PG_BASE)) {
                c.isValid(2);
            } catch (SQLException e) {
                String why = "PostgreSQL at 127.0.0.1:5432/test is not reachable (" + e.getMessage() + ")";
                if ("true".equalsIgnoreCase(System.getenv("CI"))) {
                    fail(why + ": required in CI");
                }
                Assumptions.abort(why + ": PostgreSQL store tests skipped");
            }
        }

        @Override
        String location() {
            return PG_BASE + "&currentSchema=" + schema;
        }

        @Override
        public void close() throws SQLException {
            try (Connection c = DriverManager.getConnection(PG_BASE); var st = c.createStatement()) {
                st.execute("DROP SCHEMA IF EXISTS " + schema + " CASCADE");
            }
        }

        @Override
        public String toString() {
            return "postgresql";
        }
    }
}
