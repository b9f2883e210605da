package org.lodestep.motor;

import java.util.List;
import java.util.Objects;

/** A driver terminal ({@code A+}, {@code A-}, {@code B+}, {@code B-}, or for unipolar {@code A}, {@code A/},
 *  {@code A COM}) and the motor leads that go to it. */
public record Terminal(String terminal, List<String> leads) {
    public Terminal {
        Objects.requireNonNull(terminal, "terminal");
        leads = List.copyOf(leads);
    }
}
