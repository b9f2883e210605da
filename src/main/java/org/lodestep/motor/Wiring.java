package org.lodestep.motor;

import java.util.List;
import java.util.Objects;

/**
 * A complete connection of the motor to a driver.
 *
 * @param connection  {@code series}, {@code parallel}, {@code half} or {@code unipolar}
 * @param terminals   each driver terminal and its leads
 * @param joinTogether groups of leads to join to each other only (not to the driver); insulate each joint
 * @param insulate    leads that stay unconnected; insulate them separately
 */
public record Wiring(String connection, List<Terminal> terminals, List<List<String>> joinTogether,
                     List<String> insulate) {
    public Wiring {
        Objects.requireNonNull(connection, "connection");
        terminals = List.copyOf(terminals);
        joinTogether = joinTogether.stream().map(List::copyOf).toList();
        insulate = List.copyOf(insulate);
    }
}
