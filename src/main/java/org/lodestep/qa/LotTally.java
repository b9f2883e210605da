package org.lodestep.qa;

import java.util.LinkedHashMap;
import java.util.Map;

/**
 * The running tally of a lot scanned motor by motor, counting motors, not scans: a serial number scanned again
 * (a re-test, or the same barcode read twice) replaces its earlier verdict instead of adding a motor.
 *
 * <p>Not thread-safe: one lot run owns one instance.
 */
public final class LotTally {
    private final Map<String, Verdict> latest = new LinkedHashMap<>();

    /** Records the latest verdict of {@code serial} (a motor not recorded counts as incomplete); returns the tally. */
    public Tally add(String serial, Verdict verdict) {
        latest.remove(serial);
        latest.put(serial, verdict);
        return tally();
    }

    /** Each motor scanned so far, counted once with its latest verdict. */
    public Tally tally() {
        Tally t = Tally.NONE;
        for (Verdict v : latest.values()) {
            t = t.plus(v);
        }
        return t;
    }
}
