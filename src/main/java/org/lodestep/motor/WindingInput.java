package org.lodestep.motor;

import java.util.List;
import java.util.Objects;

import org.lodestep.wiring.Topology;
import org.lodestep.wiring.Finding;

/**
 * What a resistance matrix told about the windings, in the terms this package needs: the topology, every lead
 * label, the coils, and the findings of that analysis (an open winding arrives here as an error finding).
 */
public record WindingInput(Topology topology, List<String> leads, List<CoilResistance> coils,
                           List<Finding> findings) {
    public WindingInput {
        Objects.requireNonNull(topology, "topology");
        leads = List.copyOf(leads);
        coils = List.copyOf(coils);
        findings = List.copyOf(findings);
    }
}
