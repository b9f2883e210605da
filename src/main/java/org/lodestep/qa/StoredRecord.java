package org.lodestep.qa;

import java.util.Objects;

/**
 * A record as read back from the store.
 *
 * @param id             the store's sequence number for it
 * @param retestOf       id of the previous record of the same serial number and part, or null for a first test
 * @param recordedAtUtc  when the store committed it, ISO-8601 UTC
 * @param bodySha256     SHA-256 of the stored JSON body
 * @param intact         true when the body still matches its SHA-256 and the indexed columns match the body
 * @param submission     what was submitted
 */
public record StoredRecord(long id, Long retestOf, String recordedAtUtc, String bodySha256, boolean intact,
                           Submission submission) {
    public StoredRecord {
        Objects.requireNonNull(recordedAtUtc, "recordedAtUtc");
        Objects.requireNonNull(bodySha256, "bodySha256");
        Objects.requireNonNull(submission, "submission");
    }
}
