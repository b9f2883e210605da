package org.lodestep.qa;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

/** The lot tally counts motors: a serial scanned again replaces its verdict instead of adding a motor. */
class LotTallyTest {

    @Test
    void aRescannedSerialCountsOnceWithItsLatestVerdict() {
        LotTally t = new LotTally();
        t.add("SN-1", Verdict.FAIL);
        t.add("SN-2", Verdict.PASS);
        Tally after = t.add("SN-1", Verdict.PASS);
        assertEquals(new Tally(2, 0, 0), after);
        assertEquals(2, after.tested());
    }

    @Test
    void aMotorNotRecordedOnItsLastScanCountsAsIncomplete() {
        LotTally t = new LotTally();
        t.add("SN-1", Verdict.PASS);
        assertEquals(new Tally(0, 0, 1), t.add("SN-1", Verdict.INCOMPLETE));
    }
}
