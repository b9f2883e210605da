package org.lodestep.motor;

import java.util.List;
import java.util.Objects;

/**
 * A fitted step response and where it was taken: across {@code leads}, with {@code joinedLeads} (zero or two labels)
 * connected together during the test, as when the two coils of an 8-lead phase are measured in series.
 */
public record StepInput(OrientedLeads leads, List<String> joinedLeads, StepResponseFit fit) {
    public StepInput {
        Objects.requireNonNull(leads, "leads");
        joinedLeads = List.copyOf(joinedLeads);
        if (!joinedLeads.isEmpty() && joinedLeads.size() != 2) {
            throw new IllegalArgumentException("joined leads must be two labels, got " + joinedLeads);
        }
        Objects.requireNonNull(fit, "fit");
    }
}
