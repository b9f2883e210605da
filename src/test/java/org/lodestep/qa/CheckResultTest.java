package org.lodestep.qa;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class CheckResultTest {
    private static final Limit WINDOW = new Limit(Parameters.PHASE_RESISTANCE, "ohm", 1.9, 1.71, 2.09);
    private static final Limit MAXIMUM = new Limit(Parameters.PHASE_IMBALANCE, "%", Double.NaN, Double.NaN, 5);
    private static final Limit MINIMUM = new Limit(Parameters.INSULATION_RESISTANCE, "ohm", Double.NaN, 100e6,
            Double.NaN);

    private static CheckResult judged(Limit l, double v) {
        return new CheckResult(l.parameter(), "", v, v, l, l.contains(v) ? Verdict.PASS : Verdict.FAIL, "");
    }

    // Margin = distance inside the deciding limit, by definition: USL − value or value − LSL, negative outside;
    // inside a window the nearer limit decides (common practice for a margin to spec).
    @Test
    void marginIsSignedDistanceInsideTheDecidingLimit() {
        assertEquals("USL", judged(WINDOW, 2.30).decidingLimit());
        assertEquals(2.09 - 2.30, judged(WINDOW, 2.30).margin(), 1e-12);
        assertEquals("LSL", judged(WINDOW, 1.65).decidingLimit());
        assertEquals(1.65 - 1.71, judged(WINDOW, 1.65).margin(), 1e-12);
        assertEquals("LSL", judged(WINDOW, 1.80).decidingLimit());
        assertEquals(1.80 - 1.71, judged(WINDOW, 1.80).margin(), 1e-12);
        assertEquals("USL", judged(WINDOW, 2.05).decidingLimit());
        assertEquals(5 - 6.28, judged(MAXIMUM, 6.28).margin(), 1e-12);
        assertEquals(2.09, judged(WINDOW, 2.30).decidingLimitValue(), 0);
        assertEquals(62e6 - 100e6, judged(MINIMUM, 62e6).margin(), 1e-3);
    }

    @Test
    void unjudgedCheckHasNoMargin() {
        CheckResult c = new CheckResult(Parameters.PHASE_RESISTANCE, "", Double.NaN, Double.NaN, WINDOW,
                Verdict.INCOMPLETE, "not measured");
        assertEquals("", c.decidingLimit());
        assertTrue(Double.isNaN(c.margin()) && Double.isNaN(c.decidingLimitValue()));
    }
}
