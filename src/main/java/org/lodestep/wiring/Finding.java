package org.lodestep.wiring;

import java.util.List;
import java.util.Objects;

/**
 * One observation about the motor or the measurement, with what to do next.
 *
 * @param code     stable code
 * @param severity how serious it is
 * @param message  one or two sentences: what was seen and what to do next
 * @param leads    the leads concerned (may be empty)
 */
public record Finding(FindingCode code, Severity severity, String message, List<String> leads) {
    public Finding {
        Objects.requireNonNull(code, "code");
        Objects.requireNonNull(severity, "severity");
        Objects.requireNonNull(message, "message");
        leads = List.copyOf(leads);
    }
}
