package org.lodestep.qa;

import java.util.Collection;
import java.util.List;

/**
 * The running count of a check run (a lot scanned motor by motor): a motor that could not be recorded counts as
 * incomplete, since a motor is not accepted on missing data.
 *
 * @param passed     motors that passed
 * @param failed     motors that failed
 * @param incomplete motors not judged on every check, or not recorded at all
 */
public record Tally(int passed, int failed, int incomplete) {

    /** Nothing tested yet. */
    public static final Tally NONE = new Tally(0, 0, 0);

    public Tally {
        if (passed < 0 || failed < 0 || incomplete < 0) {
            throw new IllegalArgumentException("a tally counts 0 or more motors, got " + passed + "/" + failed + "/"
                    + incomplete);
        }
    }

    /** The tally of records in test order: each serial number counted once, with its latest record's verdict. */
    public static Tally of(List<StoredRecord> records) {
        return of(records, List.of());
    }

    /**
     * As {@link #of(List)}, with the serial numbers that could not be recorded counted as incomplete motors, each once
     * and only when no record of it exists.
     */
    public static Tally of(List<StoredRecord> records, Collection<String> notRecorded) {
        LotTally t = new LotTally();
        for (String serial : notRecorded) {
            t.add(serial, Verdict.INCOMPLETE); // a record of the same serial below replaces it
        }
        for (StoredRecord r : records) {
            t.add(r.submission().serial(), r.submission().verdict());
        }
        return t.tally();
    }

    /** Motors counted. */
    public int tested() {
        return passed + failed + incomplete;
    }

    /** True when every motor counted passed. */
    public boolean allPassed() {
        return failed + incomplete == 0;
    }

    /** With one more motor of that verdict. */
    public Tally plus(Verdict v) {
        return switch (v) {
            case PASS -> new Tally(passed + 1, failed, incomplete);
            case FAIL -> new Tally(passed, failed + 1, incomplete);
            case INCOMPLETE -> new Tally(passed, failed, incomplete + 1);
        };
    }
}
