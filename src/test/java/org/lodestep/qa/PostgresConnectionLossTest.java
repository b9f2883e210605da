package org.lodestep.qa;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTimeoutPreemptively;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.sql.Connection;
import java.sql.DriverManager;
import java.time.Duration;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.UUID;

import org.junit.jupiter.api.Test;

/**
 * The PostgreSQL counterpart of a killed station that SQLite cannot have: the server ends the station's session in
 * the middle of a batch of appends (as a server restart or a dropped network does). Every committed record stays
 * whole, none is partial, the station's next append fails as a {@link StoreException} (exit 5 on the command line),
 * and a fresh station writes on. Runs where PostgreSQL answers at 127.0.0.1:5432/test; with {@code CI=true} an
 * unreachable server fails it, elsewhere it is skipped ({@link Backend}).
 */
class PostgresConnectionLossTest {

    @Test
    void sessionEndedByTheServerMidBatchLeavesCommittedRecordsWholeAndFailsAsAStoreError() throws Exception {
        try (Backend b = Backend.create("postgresql")) {
            b.open().close();
            // The application name singles out this test's own session; other sessions on the server are left alone.
            String app = "lodestep-loss-" + UUID.randomUUID().toString().substring(0, 8);
            String url = b.location() + "&ApplicationName=" + app;
            Set<Long> committed = new HashSet<>();
            List<Exception> failures = new ArrayList<>();
            assertTimeoutPreemptively(Duration.ofSeconds(60), () -> {
                try (RecordStore station = RecordStores.open(url, Map.of())) {
                    for (int i = 0; i < 10_000 && failures.isEmpty(); i++) {
                        if (committed.size() == 10) {
                            terminate(app);
                        }
                        try {
                            committed.add(station.append(Fixtures.submission("LOSS-" + i, "L-loss", Fixtures.motor(2,
                                    2, 20, Fixtures.sha("loss" + i)), "2026-07-01T08:00:00.000Z")).record().id());
                        } catch (StoreException e) {
                            failures.add(e);
                        }
                    }
                } catch (StoreException closing) {
                    // closing a store whose session the server ended may fail too; the records are what matter
                }
            });
            assertEquals(1, failures.size(), "the append after the session ended fails: " + failures);
            assertTrue(committed.size() >= 10, "committed before the loss: " + committed.size());
            assertFalse(failures.get(0).getMessage().contains("\n"), failures.get(0).getMessage());
            try (JdbcRecordStore store = (JdbcRecordStore) b.open()) {
                List<StoredRecord> all = store.find(RecordQuery.all());
                Set<Long> present = new HashSet<>();
                for (StoredRecord r : all) {
                    present.add(r.id());
                    assertTrue(r.intact(), "record " + r.id() + " is not intact");
                    assertEquals(r.submission().measurements().captures().size(), store.captureRows(r.id()),
                            "record " + r.id() + " has a partial set of capture rows");
                }
                assertTrue(present.containsAll(committed), "committed records missing");
                assertTrue(store.append(Fixtures.submission("AFTER", "L", Fixtures.motor(2, 2, 20,
                        Fixtures.sha("after-loss")), "2026-07-01T09:00:00.000Z")).created());
            }
        }
    }

    private static void terminate(String applicationName) throws Exception {
        try (Connection c = DriverManager.getConnection(Backend.PG_BASE);
             var st = c.prepareStatement("SELECT pg_terminate_backend(pid) FROM pg_stat_activity"
                     + " WHERE application_name = ? AND pid <> pg_backend_pid()")) {
            st.setString(1, applicationName);
            st.executeQuery().close();
        }
    }
}
