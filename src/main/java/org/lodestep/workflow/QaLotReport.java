package org.lodestep.workflow;

import java.util.List;
import java.util.Objects;

import org.lodestep.qa.LotStatistics;
import org.lodestep.qa.RecordQuery;
import org.lodestep.qa.RecordStore;
import org.lodestep.qa.StoreException;
import org.lodestep.qa.StoredRecord;

/**
 * The lot report: the records a query selects (a lot, a part, a date range) and their {@link LotStatistics} (counts,
 * yield, per-parameter statistics, control charts, histograms), ready for any renderer.
 */
public final class QaLotReport {
    private QaLotReport() {
    }

    /**
     * @param records  the selected records, oldest first
     * @param summary  their statistics
     */
    public record Result(List<StoredRecord> records, LotStatistics.Summary summary) {
        public Result {
            records = List.copyOf(records);
            Objects.requireNonNull(summary, "summary");
        }
    }

    /** Selects and summarises. */
    public static Result run(RecordQuery query, RecordStore store, Progress progress) throws StoreException {
        progress.step("reading records");
        List<StoredRecord> records = store.find(query);
        progress.step("summarising " + records.size() + " records");
        return new Result(records, LotStatistics.of(records));
    }
}
