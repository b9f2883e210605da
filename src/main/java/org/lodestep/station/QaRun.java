package org.lodestep.station;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;

import org.lodestep.qa.LotTally;
import org.lodestep.qa.StoredRecord;
import org.lodestep.qa.Tally;
import org.lodestep.qa.Verdict;
import org.lodestep.workflow.QaCheck;

/**
 * One inspector's run at the QA station: the settings every motor shares, the motors scanned so far with the
 * running tally, and the insulation arming. Arming is single-use and held by the page that armed it: a second tab,
 * which never saw the arming key, cannot fire the test voltage.
 */
final class QaRun {
    /** How long an arming stays valid, ms: long enough to connect the clips and scan, short enough to be deliberate. */
    static final long ARM_VALID_MS = 120_000;

    /** One scanned motor: its record, or the reason it was not recorded. */
    record Row(String serial, StoredRecord record, boolean created, String notRecorded) {
        Row {
            Objects.requireNonNull(serial, "serial");
        }

        Verdict verdict() {
            return record == null ? Verdict.INCOMPLETE : record.submission().verdict();
        }
    }

    final String id;
    final QaCheck.Settings settings;
    final String specName;
    final String sourceText;
    final boolean rigInsulation;
    /** Readings typed per motor at the meter (no rig, no capture files). */
    final boolean typed;
    private final List<Row> rows = new ArrayList<>();
    private final LotTally tally = new LotTally();
    private String armKey;
    private long armExpiresMs;

    QaRun(String id, QaCheck.Settings settings, String specName, String sourceText, boolean rigInsulation,
          boolean typed) {
        this.id = id;
        this.typed = typed;
        this.settings = settings;
        this.specName = specName;
        this.sourceText = sourceText;
        this.rigInsulation = rigInsulation;
    }

    synchronized void add(Row row) {
        rows.add(row);
        tally.add(row.serial(), row.verdict());
    }

    synchronized List<Row> rows() {
        return List.copyOf(rows);
    }

    synchronized Tally tally() {
        return tally.tally();
    }

    /** Arms the insulation test for the next motor; any earlier arming is void. Returns the page's key. */
    synchronized String arm(long nowMs) {
        armKey = Access.random();
        armExpiresMs = nowMs + ARM_VALID_MS;
        return armKey;
    }

    /** Takes the arming if {@code key} is the current, unexpired one; it cannot be used again. */
    synchronized boolean takeArm(String key, long nowMs) {
        boolean ok = Access.same(key, armKey) && nowMs <= armExpiresMs;
        if (ok) {
            armKey = null;
        }
        return ok;
    }
}
