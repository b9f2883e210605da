package org.lodestep.motor;

import java.util.ArrayList;
import java.util.List;

import org.lodestep.motor.PhaseAssignment.OrientedCoil;
import org.lodestep.wiring.Connection;
import org.lodestep.wiring.Finding;

/**
 * Turns two oriented phases into driver terminals for one connection (REFERENCE-CHECKS item 5): series aiding joins
 * the end of the first coil to the start of the second; parallel joins starts together and ends together; half uses
 * the first coil of each phase; unipolar takes the joint (or centre tap) as the common.
 */
final class WiringPlanner {
    private WiringPlanner() {
    }

    /** The wiring, or null with an explanation added to {@code findings} when the connection is impossible. */
    static Wiring plan(Connection connection, List<OrientedCoil> a, List<OrientedCoil> b, List<Finding> findings) {
        List<Terminal> terminals = new ArrayList<>();
        List<List<String>> joins = new ArrayList<>();
        List<String> insulate = new ArrayList<>();
        for (int k = 0; k < 2; k++) {
            String p = k == 0 ? "A" : "B";
            List<OrientedCoil> ph = k == 0 ? a : b;
            if (ph.isEmpty() || ph.size() > 2) {
                return null;
            }
            OrientedCoil c1 = ph.get(0);
            OrientedCoil c2 = ph.size() == 2 ? ph.get(1) : null;
            boolean tapped = c2 != null && c1.end().equals(c2.start());
            switch (connection) {
                case SERIES, WHOLE -> {
                    if (c2 == null) {
                        terminals.add(new Terminal(p + "+", List.of(c1.start())));
                        terminals.add(new Terminal(p + "-", List.of(c1.end())));
                    } else {
                        terminals.add(new Terminal(p + "+", List.of(c1.start())));
                        terminals.add(new Terminal(p + "-", List.of(c2.end())));
                        if (tapped) {
                            insulate.add(c1.end());
                        } else {
                            joins.add(List.of(c1.end(), c2.start()));
                        }
                    }
                }
                case PARALLEL -> {
                    if (c2 == null || tapped) {
                        findings.add(Finding.error(MotorFindingCode.CONNECTION_IMPOSSIBLE, "a parallel connection needs two "
                                + "separate coils per phase (an 8-lead motor)"));
                        return null;
                    }
                    terminals.add(new Terminal(p + "+", List.of(c1.start(), c2.start())));
                    terminals.add(new Terminal(p + "-", List.of(c1.end(), c2.end())));
                }
                case HALF -> {
                    terminals.add(new Terminal(p + "+", List.of(c1.start())));
                    terminals.add(new Terminal(p + "-", List.of(c1.end())));
                    if (c2 != null) {
                        if (!tapped) {
                            insulate.add(c2.start());
                        }
                        insulate.add(c2.end());
                    }
                }
                case UNIPOLAR -> {
                    if (c2 == null) {
                        findings.add(Finding.error(MotorFindingCode.CONNECTION_IMPOSSIBLE, "a unipolar connection needs a centre "
                                + "tap or two coils per phase (5-, 6- or 8-lead motor)"));
                        return null;
                    }
                    terminals.add(new Terminal(p, List.of(c1.start())));
                    terminals.add(new Terminal(p + "/", List.of(c2.end())));
                    terminals.add(new Terminal(p + " COM", tapped ? List.of(c1.end()) : List.of(c1.end(), c2.start())));
                }
                default -> throw new IllegalStateException("unhandled connection " + connection);
            }
        }
        return new Wiring(connection.name().toLowerCase(java.util.Locale.ROOT), order(terminals), joins, insulate);
    }

    /** A+, A-, B+, B- (or A, A/, A COM, B, ...) in that order. */
    private static List<Terminal> order(List<Terminal> ts) {
        List<Terminal> out = new ArrayList<>();
        for (String name : List.of("A+", "A-", "B+", "B-", "A", "A/", "A COM", "B", "B/", "B COM")) {
            ts.stream().filter(t -> t.terminal().equals(name)).forEach(out::add);
        }
        return out;
    }
}
