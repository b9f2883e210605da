package org.lodestep.qa;

import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.util.ArrayList;
import java.util.List;
import java.util.Properties;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.PropertyNamingStrategies;
import com.fasterxml.jackson.databind.json.JsonMapper;

/**
 * The record store on one JDBC connection, SQLite or PostgreSQL: the SQL is the same for both (the schemas differ
 * only in identity columns and trigger syntax, see the per-vendor migrations).
 *
 * <p>One append is one transaction: the record row and its capture rows commit together or not at all. The body is
 * the submission as JSON, kept verbatim with its SHA-256; on reading, the hash and the indexed columns are checked
 * against it, so an edit made behind the tool's back shows as a record that is not intact.
 */
final class JdbcRecordStore implements RecordStore {

    /** Storage JSON: NaN kept as "NaN" so it reads back as NaN (not 0), snake_case like every other JSON. */
    private static final ObjectMapper BODY = JsonMapper.builder()
            .propertyNamingStrategy(PropertyNamingStrategies.SNAKE_CASE)
            .build();

    private static final String COLUMNS = "id, retest_of, recorded_at, body_sha256, body_json, serial, verdict, "
            + "spec_sha256, lot, part_number";

    private final Connection connection;
    private final String location;

    private JdbcRecordStore(Connection connection, String location) {
        this.connection = connection;
        this.location = location;
    }

    static JdbcRecordStore connect(String url, Properties props, String location) throws StoreException {
        try {
            // Autocommit between appends: an idle station (waiting for the next barcode) must hold no lock, so a
            // transaction is opened only inside append().
            Connection c = DriverManager.getConnection(url, props);
            c.setAutoCommit(true);
            return new JdbcRecordStore(c, location);
        } catch (SQLException e) {
            throw new StoreException("cannot connect to " + location + ": " + oneLine(e), e);
        }
    }

    @Override
    public String location() {
        return location;
    }

    @Override
    public synchronized Appended append(Submission s) throws StoreException {
        String key = s.submissionKey();
        String body;
        try {
            body = BODY.writeValueAsString(s);
        } catch (JsonProcessingException e) {
            throw new IllegalStateException("cannot serialise a submission: " + e.getMessage(), e);
        }
        String bodySha = Hashes.sha256(body);
        try {
            // SQLite (transaction_mode=IMMEDIATE) takes the write lock here, waiting up to the busy timeout.
            connection.setAutoCommit(false);
            refuseChangedSpec(s);
            Long retestOf = previous(s.serial(), s.partNumber());
            String recordedAt = Timestamps.now();
            Long id = null;
            try (PreparedStatement p = connection.prepareStatement(
                    "INSERT INTO qa_record (submission_key, serial, lot, part_number, part_revision, spec_version, "
                            + "spec_sha256, verdict, operator, station, started_at, finished_at, recorded_at, "
                            + "tool_version, retest_of, body_json, body_sha256) "
                            + "VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?) "
                            + "ON CONFLICT (submission_key) DO NOTHING RETURNING id")) {
                int i = 1;
                p.setString(i++, key);
                p.setString(i++, s.serial());
                p.setString(i++, s.lot());
                p.setString(i++, s.partNumber());
                p.setString(i++, s.partRevision());
                p.setInt(i++, s.specVersion());
                p.setString(i++, s.specSha256());
                p.setString(i++, s.verdict().name());
                p.setString(i++, s.operator());
                p.setString(i++, s.station());
                p.setString(i++, s.startedAtUtc());
                p.setString(i++, s.finishedAtUtc());
                p.setString(i++, recordedAt);
                p.setString(i++, s.toolVersion());
                if (retestOf == null) {
                    p.setNull(i++, java.sql.Types.BIGINT);
                } else {
                    p.setLong(i++, retestOf);
                }
                p.setString(i++, body);
                p.setString(i, bodySha);
                try (ResultSet rs = p.executeQuery()) {
                    if (rs.next()) {
                        id = rs.getLong(1);
                    }
                }
            }
            if (id == null) {
                connection.rollback();
                connection.setAutoCommit(true);
                List<StoredRecord> existing = select(" WHERE submission_key = ?", List.of(key));
                if (existing.isEmpty()) {
                    throw new StoreException("record with key " + key + " vanished in " + location);
                }
                return new Appended(existing.get(0), false);
            }
            try (PreparedStatement p = connection.prepareStatement(
                    "INSERT INTO qa_capture (record_id, position, name, kind, sha256) VALUES (?, ?, ?, ?, ?)")) {
                int pos = 0;
                for (CaptureRef c : s.measurements().captures()) {
                    p.setLong(1, id);
                    p.setInt(2, pos++);
                    p.setString(3, c.name());
                    p.setString(4, c.kind());
                    p.setString(5, c.sha256());
                    p.addBatch();
                }
                if (pos > 0) {
                    p.executeBatch();
                }
            }
            connection.commit();
            connection.setAutoCommit(true);
            return new Appended(new StoredRecord(id, retestOf, recordedAt, bodySha, true, s), true);
        } catch (SQLException e) {
            rollbackQuietly();
            throw new StoreException("cannot record " + s.serial().replaceAll("\\p{Cntrl}", "?") + " in " + location
                    + ": " + oneLine(e), e);
        } catch (StoreException | RuntimeException e) {
            rollbackQuietly();
            throw e;
        }
    }

    private void refuseChangedSpec(Submission s) throws SQLException, StoreException {
        String recordedSha;
        try (PreparedStatement p = connection.prepareStatement(
                "SELECT spec_sha256 FROM qa_record WHERE part_number = ? AND part_revision = ? AND spec_version = ? "
                        + "AND spec_sha256 <> ? LIMIT 1")) {
            p.setString(1, s.partNumber());
            p.setString(2, s.partRevision());
            p.setInt(3, s.specVersion());
            p.setString(4, s.specSha256());
            try (ResultSet rs = p.executeQuery()) {
                if (!rs.next()) {
                    return;
                }
                recordedSha = rs.getString(1);
            }
        }
        int highest;
        try (PreparedStatement p = connection.prepareStatement(
                "SELECT MAX(spec_version) FROM qa_record WHERE part_number = ? AND part_revision = ?")) {
            p.setString(1, s.partNumber());
            p.setString(2, s.partRevision());
            try (ResultSet rs = p.executeQuery()) {
                rs.next();
                highest = rs.getInt(1);
            }
        }
        throw new SpecChangedException(("spec_version " + s.specVersion() + " of " + s.partNumber() + " rev "
                + s.partRevision() + " was already used with different content (recorded spec SHA-256 "
                + recordedSha.substring(0, 12) + "..., this one " + s.specSha256().substring(0, 12)
                + "...): expected a new spec_version, " + (highest + 1) + " or more, whenever a limit changes")
                .replaceAll("\\p{Cntrl}", "?"));
    }

    private Long previous(String serial, String partNumber) throws SQLException {
        try (PreparedStatement p = connection.prepareStatement(
                "SELECT MAX(id) FROM qa_record WHERE serial = ? AND part_number = ?")) {
            p.setString(1, serial);
            p.setString(2, partNumber);
            try (ResultSet rs = p.executeQuery()) {
                rs.next();
                long v = rs.getLong(1);
                return rs.wasNull() ? null : v;
            }
        }
    }

    @Override
    public synchronized List<StoredRecord> find(RecordQuery q) throws StoreException {
        StringBuilder where = new StringBuilder();
        List<String> args = new ArrayList<>();
        add(where, args, "serial = ?", q.serial());
        add(where, args, "lot = ?", q.lot());
        add(where, args, "part_number = ?", q.partNumber());
        add(where, args, "started_at >= ?", q.fromUtc() == null ? null : Timestamps.format(Timestamps.parse(q.fromUtc())));
        add(where, args, "started_at < ?", q.toUtc() == null ? null : Timestamps.format(Timestamps.parse(q.toUtc())));
        try {
            return select(where.toString(), args);
        } catch (SQLException e) {
            throw new StoreException("cannot read records from " + location + ": " + oneLine(e), e);
        }
    }

    private static void add(StringBuilder where, List<String> args, String condition, String value) {
        if (value != null) {
            where.append(where.length() == 0 ? " WHERE " : " AND ").append(condition);
            args.add(value);
        }
    }

    private List<StoredRecord> select(String where, List<String> args) throws SQLException, StoreException {
        List<StoredRecord> out = new ArrayList<>();
        try (PreparedStatement p = connection.prepareStatement(
                "SELECT " + COLUMNS + " FROM qa_record" + where + " ORDER BY id")) {
            for (int i = 0; i < args.size(); i++) {
                p.setString(i + 1, args.get(i));
            }
            try (ResultSet rs = p.executeQuery()) {
                while (rs.next()) {
                    out.add(row(rs));
                }
            }
        }
        return out;
    }

    private StoredRecord row(ResultSet rs) throws SQLException, StoreException {
        long id = rs.getLong("id");
        long r = rs.getLong("retest_of");
        Long retestOf = rs.wasNull() ? null : r;
        String body = rs.getString("body_json");
        String sha = rs.getString("body_sha256");
        Submission s;
        try {
            s = BODY.readValue(body, Submission.class);
        } catch (JsonProcessingException | RuntimeException e) {
            throw new StoreException("record " + id + " in " + location + " has an unreadable body: "
                    + RecordStores.rootMessage(e), e);
        }
        boolean intact = Hashes.sha256(body).equals(sha)
                && s.serial().equals(rs.getString("serial"))
                && s.verdict().name().equals(rs.getString("verdict"))
                && s.specSha256().equals(rs.getString("spec_sha256"))
                && s.lot().equals(rs.getString("lot"))
                && s.partNumber().equals(rs.getString("part_number"));
        return new StoredRecord(id, retestOf, rs.getString("recorded_at"), sha, intact, s);
    }

    /** Number of capture rows stored for a record (the crash test checks it against the body). */
    synchronized int captureRows(long recordId) throws StoreException {
        try (PreparedStatement p = connection.prepareStatement("SELECT COUNT(*) FROM qa_capture WHERE record_id = ?")) {
            p.setLong(1, recordId);
            try (ResultSet rs = p.executeQuery()) {
                rs.next();
                return rs.getInt(1);
            }
        } catch (SQLException e) {
            throw new StoreException("cannot count captures in " + location + ": " + oneLine(e), e);
        }
    }

    /** Runs one statement in its own transaction; for tests that try to change records behind the store's back. */
    synchronized void executeRaw(String sql) throws SQLException {
        try (var st = connection.createStatement()) {
            st.execute(sql);
        }
    }

    private void rollbackQuietly() {
        try {
            if (!connection.getAutoCommit()) {
                connection.rollback();
                connection.setAutoCommit(true);
            }
        } catch (SQLException ignored) {
            // The connection is broken; the original error is the one to report.
        }
    }

    @Override
    public synchronized void close() throws StoreException {
        try {
            connection.close();
        } catch (SQLException e) {
            throw new StoreException("cannot close " + location + ": " + oneLine(e), e);
        }
    }

    private static String oneLine(SQLException e) {
        String msg = e.getMessage() == null ? e.toString() : e.getMessage();
        return DatabaseUrls.redact(msg.replaceAll("\\s+", " ").trim());
    }
}
