package org.lodestep.qa;

import java.util.Collection;

/** The outcome of one check, or of a whole motor. */
public enum Verdict {
    /** Measured and inside the limits. */
    PASS,
    /** Measured and outside the limits. */
    FAIL,
    /** Not measured, or measured in a way the spec does not accept (wrong test voltage): no judgement possible. */
    INCOMPLETE;

    /** The overall verdict: any failure fails the motor; otherwise anything unjudged leaves it incomplete. */
    static Verdict overall(Collection<Verdict> checks) {
        if (checks.contains(FAIL)) {
            return FAIL;
        }
        if (checks.isEmpty() || checks.contains(INCOMPLETE)) {
            return INCOMPLETE;
        }
        return PASS;
    }
}
