package org.lodestep.wiring;

import java.util.List;
import java.util.Map;

/**
 * One way to wire the motor to a driver.
 *
 * @param name                 e.g. {@code bipolar-series}
 * @param terminals            driver terminal (A+, A−, B+, B−, or COM, A, A', B, B' for unipolar) to the lead labels
 *                             that go there
 * @param jumpers              groups of leads to join to each other and to nothing else
 * @param insulate             leads to insulate and leave unconnected
 * @param phaseResistanceOhm   effective resistance per phase, ohms (NaN when unknown)
 * @param resistanceFactor     phase resistance relative to one half-winding
 * @param inductanceFactor     phase inductance relative to one half-winding (full coupling: an upper bound)
 * @param currentFactor        phase current rating relative to the unipolar (one half-winding) rating
 * @param tradeoff             torque versus speed, one line
 * @param verified             false when resistance cannot settle the mapping (phase pairing or polarity)
 * @param note                 what remains to check, or empty
 */
public record DriverWiring(String name, Map<String, List<String>> terminals, List<List<String>> jumpers,
                         List<String> insulate, double phaseResistanceOhm, double resistanceFactor,
                         double inductanceFactor, double currentFactor, String tradeoff, boolean verified,
                         String note) {
    public DriverWiring {
        terminals = java.util.Collections.unmodifiableMap(new java.util.LinkedHashMap<>(terminals));
        jumpers = List.copyOf(jumpers);
        insulate = List.copyOf(insulate);
    }
}
