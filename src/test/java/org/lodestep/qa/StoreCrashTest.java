package org.lodestep.qa;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.BufferedReader;
import java.io.InputStreamReader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import java.util.concurrent.TimeUnit;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/** A station's JVM killed in the middle of a batch leaves every committed record whole and no partial one. */
class StoreCrashTest {

    static List<String> backends() {
        return Backend.names().toList();
    }

    @ParameterizedTest
    @MethodSource("backends")
    void killedWriterLeavesCommittedRecordsWholeAndNoPartialOne(String name) throws Exception {
        try (Backend b = Backend.create(name)) {
            b.open().close();
            String cp = System.getProperty("surefire.test.class.path", System.getProperty("java.class.path"));
            String java = Path.of(System.getProperty("java.home"), "bin", "java").toString();
            Process p = new ProcessBuilder(java, "-cp", cp, CrashWriter.class.getName(), b.location())
                    .redirectError(ProcessBuilder.Redirect.DISCARD)
                    .start();
            Set<Long> committed = new HashSet<>();
            try (BufferedReader in = new BufferedReader(new InputStreamReader(p.getInputStream(), StandardCharsets.UTF_8))) {
                String line;
                while (committed.size() < 10 && (line = in.readLine()) != null) {
                    if (line.startsWith("committed ")) {
                        committed.add(Long.parseLong(line.substring(10).trim()));
                    }
                }
                // Kill it while it is in the middle of its next appends.
                p.destroyForcibly();
                assertTrue(p.waitFor(30, TimeUnit.SECONDS));
            }
            assertEquals(10, committed.size(), "the writer should have committed 10 records before the kill");
            try (JdbcRecordStore store = (JdbcRecordStore) b.open()) {
                List<StoredRecord> all = store.find(RecordQuery.all());
                Set<Long> present = new HashSet<>();
                for (StoredRecord r : all) {
                    present.add(r.id());
                    assertTrue(r.intact(), "record " + r.id() + " is not intact");
                    assertEquals(r.submission().measurements().captures().size(), store.captureRows(r.id()),
                            "record " + r.id() + " has a partial set of capture rows");
                }
                assertTrue(present.containsAll(committed), "committed records missing: " + diff(committed, present));
                // The store is still writable after the crash.
                assertTrue(store.append(Fixtures.submission("AFTER", "L", Fixtures.motor(2, 2, 20, Fixtures.sha("after")),
                        "2026-07-01T09:00:00.000Z")).created());
            }
        }
    }

    private static List<Long> diff(Set<Long> a, Set<Long> b) {
        List<Long> d = new ArrayList<>(a);
        d.removeAll(b);
        return d;
    }
}
