package org.lodestep.workflow;

import java.util.List;

import org.lodestep.qa.RecordQuery;
import org.lodestep.qa.RecordStore;
import org.lodestep.qa.StoreException;
import org.lodestep.qa.StoredRecord;

/** The records an export covers, and how many check rows they give (one per check result). */
public final class QaExport {
    private QaExport() {
    }

    /**
     * @param records the selected records, oldest first
     * @param rows    check results in them: the rows a per-check export writes
     */
    public record Result(List<StoredRecord> records, int rows) {
        public Result {
            records = List.copyOf(records);
        }
    }

    /** Selects the records. */
    public static Result run(RecordQuery query, RecordStore store, Progress progress) throws StoreException {
        progress.step("reading records");
        List<StoredRecord> records = store.find(query);
        return new Result(records, records.stream().mapToInt(r -> r.submission().checks().size()).sum());
    }
}
