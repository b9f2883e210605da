package org.lodestep.workflow;

import java.util.List;
import java.util.Objects;

import org.lodestep.qa.RecordQuery;
import org.lodestep.qa.RecordStore;
import org.lodestep.qa.StoreException;
import org.lodestep.qa.StoredRecord;
import org.lodestep.qa.Verdict;

/** The test certificate of one motor: its latest record, its earlier records, and whether it certifies the motor. */
public final class QaCertificate {
    private QaCertificate() {
    }

    /**
     * @param serial     the serial number asked for
     * @param latest     the latest record
     * @param earlier    earlier records of the same motor, oldest first
     * @param certifies  true when the latest record passed and its stored body still matches its SHA-256
     */
    public record Result(String serial, StoredRecord latest, List<StoredRecord> earlier, boolean certifies) {
        public Result {
            Objects.requireNonNull(latest, "latest");
            earlier = List.copyOf(earlier);
        }

        /** Every record, oldest first, the latest last. */
        public List<StoredRecord> history() {
            List<StoredRecord> all = new java.util.ArrayList<>(earlier);
            all.add(latest);
            return List.copyOf(all);
        }
    }

    /**
     * @param part the part number, or null when the serial number is unique across parts
     * @throws SettingsException no record of the serial, or records of several parts without {@code part}
     */
    public static Result run(String serial, String part, RecordStore store, Progress progress) throws StoreException {
        progress.step("reading the records of " + serial);
        List<StoredRecord> history = store.find(new RecordQuery(serial, null, part, null, null));
        if (history.isEmpty()) {
            throw new SettingsException("no record of serial '" + serial.replaceAll("\\p{Cntrl}", "?") + "'"
                    + (part == null ? "" : " for part " + part) + " in " + store.location());
        }
        List<String> parts = history.stream().map(r -> r.submission().partNumber()).distinct().toList();
        if (parts.size() > 1) {
            throw new SettingsException("serial '" + serial + "' was tested as several parts " + parts + ": name the part");
        }
        StoredRecord latest = history.get(history.size() - 1);
        return new Result(serial, latest, history.subList(0, history.size() - 1),
                latest.submission().verdict() == Verdict.PASS && latest.intact());
    }
}
