-- QA records, append-only. One row per check of one motor; the whole submission is kept verbatim in body_json with
-- its SHA-256, and the columns repeat what queries filter on.
CREATE TABLE qa_record (
    id             INTEGER PRIMARY KEY AUTOINCREMENT,
    submission_key TEXT    NOT NULL UNIQUE,
    serial         TEXT    NOT NULL,
    lot            TEXT    NOT NULL,
    part_number    TEXT    NOT NULL,
    part_revision  TEXT    NOT NULL,
    spec_version   INTEGER NOT NULL,
    spec_sha256    TEXT    NOT NULL,
    verdict        TEXT    NOT NULL CHECK (verdict IN ('PASS', 'FAIL', 'INCOMPLETE')),
    operator       TEXT    NOT NULL,
    station        TEXT    NOT NULL,
    started_at     TEXT    NOT NULL,
    finished_at    TEXT    NOT NULL,
    recorded_at    TEXT    NOT NULL,
    tool_version   TEXT    NOT NULL,
    retest_of      INTEGER REFERENCES qa_record (id),
    body_json      TEXT    NOT NULL,
    body_sha256    TEXT    NOT NULL
);
CREATE INDEX qa_record_serial ON qa_record (serial);
CREATE INDEX qa_record_lot ON qa_record (lot);
CREATE INDEX qa_record_part ON qa_record (part_number, part_revision, spec_version);
CREATE INDEX qa_record_started ON qa_record (started_at);

-- The raw captures each record came from, by SHA-256: find every record that used a given file.
CREATE TABLE qa_capture (
    record_id INTEGER NOT NULL REFERENCES qa_record (id),
    position  INTEGER NOT NULL,
    name      TEXT    NOT NULL,
    kind      TEXT    NOT NULL,
    sha256    TEXT    NOT NULL,
    PRIMARY KEY (record_id, position)
);
CREATE INDEX qa_capture_sha256 ON qa_capture (sha256);

CREATE TRIGGER qa_record_no_update BEFORE UPDATE ON qa_record
BEGIN
    SELECT RAISE(ABORT, 'QA records are append-only: UPDATE refused on qa_record');
END;
CREATE TRIGGER qa_record_no_delete BEFORE DELETE ON qa_record
BEGIN
    SELECT RAISE(ABORT, 'QA records are append-only: DELETE refused on qa_record');
END;
CREATE TRIGGER qa_capture_no_update BEFORE UPDATE ON qa_capture
BEGIN
    SELECT RAISE(ABORT, 'QA records are append-only: UPDATE refused on qa_capture');
END;
CREATE TRIGGER qa_capture_no_delete BEFORE DELETE ON qa_capture
BEGIN
    SELECT RAISE(ABORT, 'QA records are append-only: DELETE refused on qa_capture');
END;
