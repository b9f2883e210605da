package org.lodestep.qa;

/**
 * Which records to read; every null criterion matches everything. Dates compare with the test start time.
 *
 * @param serial      exact serial number
 * @param lot         exact lot
 * @param partNumber  exact part number
 * @param fromUtc     start time at or after this ISO-8601 UTC instant
 * @param toUtc       start time before this ISO-8601 UTC instant
 */
public record RecordQuery(String serial, String lot, String partNumber, String fromUtc, String toUtc) {
    public RecordQuery {
        if (fromUtc != null) {
            Timestamps.parse(fromUtc);
        }
        if (toUtc != null) {
            Timestamps.parse(toUtc);
        }
    }

    static RecordQuery all() {
        return new RecordQuery(null, null, null, null, null);
    }

    static RecordQuery serial(String serial) {
        return new RecordQuery(serial, null, null, null, null);
    }

    static RecordQuery lot(String lot) {
        return new RecordQuery(null, lot, null, null, null);
    }
}
