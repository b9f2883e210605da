package org.lodestep.qa;

import org.lodestep.wiring.InsulationReading;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.sql.SQLException;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.TimeUnit;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/** Every store behaviour, on SQLite and on PostgreSQL. */
class JdbcRecordStoreTest {

    static List<String> backends() {
        return Backend.names().toList();
    }

    @ParameterizedTest
    @MethodSource("backends")
    void appendedRecordReadsBackEqualAndIntact(String name) throws Exception {
        try (Backend b = Backend.create(name); RecordStore store = b.open()) {
            Submission s = Fixtures.submission("KV-000101", "L-2026-07", Fixtures.motor(2.02, 2.05, 23.0,
                    Fixtures.sha("a")), "2026-07-01T08:00:00.000Z");
            RecordStore.Appended a = store.append(s);
            assertTrue(a.created());
            List<StoredRecord> back = store.find(RecordQuery.serial("KV-000101"));
            assertEquals(1, back.size());
            assertEquals(s, back.get(0).submission());
            assertTrue(back.get(0).intact());
            assertNull(back.get(0).retestOf());
            // NaN (back-EMF not measured) must survive the round trip, not turn into 0.
            assertTrue(Double.isNaN(back.get(0).submission().measurements().backEmfConstantVsPerRad()));
        }
    }

    @ParameterizedTest
    @MethodSource("backends")
    void aSpecChangedUnderTheSameVersionIsRefusedAndNothingIsWritten(String name) throws Exception {
        try (Backend b = Backend.create(name); RecordStore store = b.open()) {
            Measurements m = Fixtures.motor(2.02, 2.05, 23.0, Fixtures.sha("a"));
            store.append(Fixtures.submission("KV-1", "L1", m, "2026-07-01T08:00:00.000Z"));
            PartSpec widened = Fixtures.spec(Fixtures.SPEC.replace("tolerance_pct = 10", "tolerance_pct = 15"));
            Submission s = Submission.of("KV-2", "L1", widened, Inspection.judge(widened, m), m, 22.0, "inspector",
                    "bench-1", "2026-07-01T08:05:00.000Z", "2026-07-01T08:05:00.000Z", "test");
            SpecChangedException e = assertThrows(SpecChangedException.class, () -> store.append(s));
            // the message says which version is next: one above the highest recorded for the part (2 here)
            assertTrue(e.getMessage().startsWith("spec_version 2 of ") && e.getMessage().contains(
                    "expected a new spec_version, 3 or more, whenever a limit changes"), e.getMessage());
            assertEquals(1, e.getMessage().lines().count(), e.getMessage());
            assertEquals(1, store.find(RecordQuery.all()).size(), "the refused record is not written");
            PartSpec next = Fixtures.spec(Fixtures.SPEC.replace("tolerance_pct = 10", "tolerance_pct = 15")
                    .replace("spec_version = 2", "spec_version = 3"));
            store.append(Submission.of("KV-2", "L1", next, Inspection.judge(next, m), m, 22.0, "inspector",
                    "bench-1", "2026-07-01T08:06:00.000Z", "2026-07-01T08:06:00.000Z", "test"));
            assertEquals(2, store.find(RecordQuery.all()).size(), "with a new spec_version it is recorded");
        }
    }

    @ParameterizedTest
    @MethodSource("backends")
    void overRangeInsulationSurvivesTheRoundTrip(String name) throws Exception {
        try (Backend b = Backend.create(name); RecordStore store = b.open()) {
            Measurements m = new Measurements(List.of(2.0, 2.0), 20.0, List.of(3.2e-3, 3.2e-3),
                    List.of(new InsulationReading("A-frame", Double.POSITIVE_INFINITY, 500)), Double.NaN, 1.8,
                    List.of(new CaptureRef("rig sim", "rig", Fixtures.sha("rig"))));
            Submission s = Fixtures.submission("KV-inf", "L1", m, "2026-07-01T08:00:00.000Z");
            store.append(s);
            StoredRecord back = store.find(RecordQuery.serial("KV-inf")).get(0);
            assertEquals(s, back.submission());
            assertTrue(back.intact());
        }
    }

    @ParameterizedTest
    @MethodSource("backends")
    void sameCaptureSubmittedTwiceIsOneRecord(String name) throws Exception {
        try (Backend b = Backend.create(name); RecordStore store = b.open()) {
            Measurements m = Fixtures.motor(2.02, 2.05, 23.0, Fixtures.sha("capture-1"));
            RecordStore.Appended first = store.append(Fixtures.submission("KV-1", "L1", m, "2026-07-01T08:00:00.000Z"));
            // Same files, same spec, resubmitted a minute later by another station.
            RecordStore.Appended again = store.append(Fixtures.submission("KV-1", "L1", m, "2026-07-01T08:01:00.000Z"));
            assertTrue(first.created());
            assertFalse(again.created());
            assertEquals(first.record().id(), again.record().id());
            assertEquals(1, store.find(RecordQuery.all()).size());
        }
    }

    @ParameterizedTest
    @MethodSource("backends")
    void sameCaptureWithOtherTypedReadingsIsANewRecord(String name) throws Exception {
        try (Backend b = Backend.create(name); RecordStore store = b.open()) {
            String sha = Fixtures.sha("capture-1");
            Measurements first = Fixtures.motor(2.02, 2.05, 23.0, sha);
            Measurements again = new Measurements(first.phaseResistancesOhm(), 23.0, first.phaseInductancesH(),
                    java.util.List.of(new InsulationReading("A-frame", 1200e6, 500)), Double.NaN, 1.8, first.captures());
            store.append(Fixtures.submission("KV-1", "L1", first, "2026-07-01T08:00:00.000Z"));
            RecordStore.Appended second = store.append(Fixtures.submission("KV-1", "L1", again,
                    "2026-07-02T08:00:00.000Z"));
            assertTrue(second.created());
            assertEquals(2, store.find(RecordQuery.all()).size());
        }
    }

    @ParameterizedTest
    @MethodSource("backends")
    void retestIsNewRecordLinkedToTheEarlierOne(String name) throws Exception {
        try (Backend b = Backend.create(name); RecordStore store = b.open()) {
            long first = store.append(Fixtures.submission("KV-7", "L1",
                    Fixtures.motor(2.40, 2.05, 20.0, Fixtures.sha("run-1")), "2026-07-01T08:00:00.000Z")).record().id();
            long second = store.append(Fixtures.submission("KV-7", "L1",
                    Fixtures.motor(2.03, 2.05, 20.0, Fixtures.sha("run-2")), "2026-07-01T09:00:00.000Z")).record().id();
            List<StoredRecord> all = store.find(RecordQuery.serial("KV-7"));
            assertEquals(2, all.size());
            assertEquals(Verdict.FAIL, all.get(0).submission().verdict());
            assertEquals(Verdict.PASS, all.get(1).submission().verdict());
            assertNotEquals(first, second);
            assertEquals(first, all.get(1).retestOf());
        }
    }

    @ParameterizedTest
    @MethodSource("backends")
    void specChangedWithoutNewVersionIsRefused(String name) throws Exception {
        try (Backend b = Backend.create(name); RecordStore store = b.open()) {
            store.append(Fixtures.submission("KV-8", "L1", Fixtures.motor(2.0, 2.0, 20.0, Fixtures.sha("x")),
                    "2026-07-01T08:00:00.000Z"));
            PartSpec edited = Fixtures.spec(Fixtures.SPEC.replace("tolerance_pct = 10", "tolerance_pct = 15"));
            Measurements m = Fixtures.motor(2.0, 2.0, 20.0, Fixtures.sha("y"));
            Submission s = Submission.of("KV-9", "L1", edited, Inspection.judge(edited, m), m, 20.0, "", "",
                    "2026-07-01T08:00:00.000Z", "2026-07-01T08:00:00.000Z", "test");
            StoreException e = assertThrows(StoreException.class, () -> store.append(s));
            // the message says which version is next: one above the highest recorded for the part (2 here)
            assertTrue(e.getMessage().startsWith("spec_version 2 of ") && e.getMessage().contains(
                    "expected a new spec_version, 3 or more, whenever a limit changes"), e.getMessage());
            assertEquals(1, e.getMessage().lines().count(), e.getMessage());
            assertEquals(1, store.find(RecordQuery.all()).size());
        }
    }

    @ParameterizedTest
    @MethodSource("backends")
    void schemaRefusesUpdateAndDelete(String name) throws Exception {
        try (Backend b = Backend.create(name); JdbcRecordStore store = (JdbcRecordStore) b.open()) {
            store.append(Fixtures.submission("KV-10", "L1", Fixtures.motor(2.0, 2.0, 20.0, Fixtures.sha("z")),
                    "2026-07-01T08:00:00.000Z"));
            SQLException up = assertThrows(SQLException.class, () -> store.executeRaw("UPDATE qa_record SET verdict = 'PASS'"));
            assertTrue(up.getMessage().contains("append-only"), up.getMessage());
            SQLException del = assertThrows(SQLException.class, () -> store.executeRaw("DELETE FROM qa_capture"));
            assertTrue(del.getMessage().contains("append-only"), del.getMessage());
            assertEquals(1, store.find(RecordQuery.all()).size());
            assertEquals(1, store.captureRows(store.find(RecordQuery.all()).get(0).id()));
        }
    }

    @ParameterizedTest
    @MethodSource("backends")
    void editBehindTheStoresBackShowsAsNotIntact(String name) throws Exception {
        try (Backend b = Backend.create(name); JdbcRecordStore store = (JdbcRecordStore) b.open()) {
            store.append(Fixtures.submission("KV-11", "L1", Fixtures.motor(2.5, 2.0, 20.0, Fixtures.sha("w")),
                    "2026-07-01T08:00:00.000Z"));
            // Someone with database rights drops the guard and flips the verdict column.
            store.executeRaw(name.equals("sqlite") ? "DROP TRIGGER qa_record_no_update"
                    : "DROP TRIGGER qa_record_append_only ON qa_record");
            store.executeRaw("UPDATE qa_record SET verdict = 'PASS'");
            StoredRecord r = store.find(RecordQuery.all()).get(0);
            assertFalse(r.intact());
            assertEquals(Verdict.FAIL, r.submission().verdict());
        }
    }

    @ParameterizedTest
    @MethodSource("backends")
    void hostileTextIsStoredVerbatimAndHarmless(String name) throws Exception {
        String serial = "KV-1'; DROP TABLE qa_record; --";
        String operator = "O'Brien \"Bob\" \u001b[2J\r\n\t\u0007 <script>alert(1)</script> ; DELETE FROM qa_capture";
        String lot = "L-1\\' OR '1'='1";
        try (Backend b = Backend.create(name); RecordStore store = b.open()) {
            Measurements m = Fixtures.motor(2.0, 2.0, 20.0, Fixtures.sha("h"));
            PartSpec spec = Fixtures.spec();
            Submission s = Submission.of(serial, lot, spec, Inspection.judge(spec, m), m, 20.0, operator, "st\u0000x"
                    .replace("\u0000", "\u0001"), "2026-07-01T08:00:00.000Z", "2026-07-01T08:00:00.000Z", "test");
            store.append(s);
            store.append(Fixtures.submission("KV-2", "L2", Fixtures.motor(2.0, 2.0, 20.0, Fixtures.sha("h2")),
                    "2026-07-01T08:00:00.000Z"));
            List<StoredRecord> bySerial = store.find(RecordQuery.serial(serial));
            assertEquals(1, bySerial.size());
            assertEquals(operator, bySerial.get(0).submission().operator());
            assertEquals(lot, bySerial.get(0).submission().lot());
            assertEquals(1, store.find(RecordQuery.lot(lot)).size());
            assertEquals(2, store.find(RecordQuery.all()).size());
        }
    }

    @ParameterizedTest
    @MethodSource("backends")
    void queriesFilterByLotPartAndStartTime(String name) throws Exception {
        try (Backend b = Backend.create(name); RecordStore store = b.open()) {
            store.append(Fixtures.submission("A1", "L1", Fixtures.motor(2.0, 2.0, 20, Fixtures.sha("1")), "2026-07-01T08:00:00.000Z"));
            store.append(Fixtures.submission("A2", "L1", Fixtures.motor(2.0, 2.0, 20, Fixtures.sha("2")), "2026-07-02T08:00:00.000Z"));
            store.append(Fixtures.submission("B1", "L2", Fixtures.motor(2.0, 2.0, 20, Fixtures.sha("3")), "2026-07-03T08:00:00.000Z"));
            assertEquals(2, store.find(RecordQuery.lot("L1")).size());
            assertEquals(3, store.find(new RecordQuery(null, null, "KV-4218-M", null, null)).size());
            assertEquals(0, store.find(new RecordQuery(null, null, "OTHER", null, null)).size());
            List<StoredRecord> window = store.find(new RecordQuery(null, null, null, "2026-07-02T00:00:00Z",
                    "2026-07-03T00:00:00Z"));
            assertEquals(List.of("A2"), window.stream().map(r -> r.submission().serial()).toList());
        }
    }

    @ParameterizedTest
    @MethodSource("backends")
    void idleStationHoldsNoLockThatBlocksAnother(String name) throws Exception {
        try (Backend b = Backend.create(name); RecordStore waiting = b.open(); RecordStore other = b.open()) {
            // Station 1 recorded a motor and now waits for the next barcode with its store open.
            waiting.append(Fixtures.submission("IDLE-1", "L1", Fixtures.motor(2, 2, 20, Fixtures.sha("i1")),
                    "2026-07-01T08:00:00.000Z"));
            waiting.find(RecordQuery.all());
            // Station 2 must be able to write meanwhile (a held lock would make this wait out the busy timeout and fail).
            assertTrue(other.append(Fixtures.submission("IDLE-2", "L1", Fixtures.motor(2, 2, 20, Fixtures.sha("i2")),
                    "2026-07-01T08:01:00.000Z")).created());
            assertEquals(2, waiting.find(RecordQuery.all()).size());
        }
    }

    @ParameterizedTest
    @MethodSource("backends")
    void twoStationsWritingAtOnceLoseNothing(String name) throws Exception {
        int perStation = 40;
        try (Backend b = Backend.create(name)) {
            b.open().close(); // the schema exists before the stations start, as after a first run
            ExecutorService pool = Executors.newFixedThreadPool(2);
            List<Future<List<Long>>> futures = new ArrayList<>();
            for (String station : List.of("bench-1", "bench-2")) {
                futures.add(pool.submit(() -> {
                    List<Long> ids = new ArrayList<>();
                    try (RecordStore store = b.open()) {
                        for (int i = 0; i < perStation; i++) {
                            Measurements m = Fixtures.motor(2.0 + i * 1e-3, 2.0, 20, Fixtures.sha(station + i));
                            ids.add(store.append(Fixtures.submission(station + "-" + i, "L1", m,
                                    "2026-07-01T08:00:00.000Z")).record().id());
                        }
                    }
                    return ids;
                }));
            }
            Set<Long> ids = new HashSet<>();
            for (Future<List<Long>> f : futures) {
                ids.addAll(f.get(120, TimeUnit.SECONDS));
            }
            pool.shutdown();
            assertEquals(2 * perStation, ids.size());
            try (RecordStore store = b.open()) {
                List<StoredRecord> all = store.find(RecordQuery.all());
                assertEquals(2 * perStation, all.size());
                assertTrue(all.stream().allMatch(StoredRecord::intact));
            }
        }
    }
}
