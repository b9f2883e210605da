package org.lodestep.report;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;
import org.lodestep.qa.CheckResult;
import org.lodestep.qa.Limit;
import org.lodestep.qa.Verdict;

/** The one-line reason of a check that did not pass. */
class QaTextTest {
    // the sample spec kv-4218-m.toml: phase resistance 1.90 ohm +- 10 % -> 1.71 .. 2.09 ohm
    static final Limit PHASE = new Limit("phase_resistance", "ohm", 1.90, 1.71, 2.09);

    @Test
    void aFailNamesTheCheckTheValueTheLimitAndTheMargin() {
        CheckResult c = new CheckResult("phase_resistance", "A", 2.31, 2.31, PHASE, Verdict.FAIL, "");
        // 2.31 - 2.09 = 0.22 ohm beyond the upper limit, 0.22 / 2.09 = 10.5 % of it
        assertEquals("phase resistance A: 2.31 \u03A9, above the upper limit 2.09 \u03A9 by 0.22 \u03A9 (10.5 %)",
                QaText.reason(c));
    }

    @Test
    void aPercentageLimitGetsNoShareOfItself() {
        Limit imbalance = new Limit("phase_imbalance", "%", Double.NaN, Double.NaN, 5);
        CheckResult c = new CheckResult("phase_imbalance", "", 18.44, 18.44, imbalance, Verdict.FAIL, "");
        assertEquals("phase imbalance: 18.44 %, above the upper limit 5 % by 13.44 %", QaText.reason(c));
    }

    @Test
    void aValueNotMeasuredSaysSo() {
        CheckResult c = new CheckResult("phase_resistance", "B", Double.NaN, Double.NaN, PHASE, Verdict.INCOMPLETE,
                "phase B not measured");
        assertEquals("phase resistance B: not measured (phase B not measured)", QaText.reason(c));
    }
}
