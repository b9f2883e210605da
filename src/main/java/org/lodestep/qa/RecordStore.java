package org.lodestep.qa;

import java.util.List;

/**
 * The append-only store of QA records. Implementations: {@link JdbcRecordStore} on SQLite or PostgreSQL, opened by
 * {@link RecordStores#open}.
 *
 * <p>Guarantees: each append is one transaction (a crash leaves the record whole or absent); records are never
 * updated or deleted (the schema refuses it); the same submission twice yields the first record again.
 */
public interface RecordStore extends AutoCloseable {

    /** The result of an append: the stored record and whether this call created it. */
    record Appended(StoredRecord record, boolean created) {
    }

    /**
     * Appends a record, linking it to the previous record of the same serial number and part as a re-test.
     * Refuses a spec whose part, revision and version were already used with different file content.
     */
    Appended append(Submission submission) throws StoreException;

    /** Records matching the query, oldest first. */
    List<StoredRecord> find(RecordQuery query) throws StoreException;

    /** Where the store is, without credentials, for messages. */
    String location();

    @Override
    void close() throws StoreException;
}
