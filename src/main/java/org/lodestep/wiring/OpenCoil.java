package org.lodestep.wiring;

import java.util.List;

/**
 * A coil that reads open on a motor whose layout is still known (the {@code open-winding} finding of a 4-, 6- or
 * 8-lead motor), as a schematic draws it: broken, between the lead at one end and the lead at the other.
 *
 * @param end      the lead at the open coil's one known end
 * @param otherEnd the lead at its other end when known (4-, 8-lead: one lead); for an open half of a 6-lead winding
 *                 the tap candidates, one of which it runs to
 */
public record OpenCoil(String end, List<String> otherEnd) {
    public OpenCoil {
        otherEnd = List.copyOf(otherEnd);
        if (end == null || otherEnd.isEmpty()) {
            throw new IllegalArgumentException("an open coil needs a lead at each end: " + end + ", " + otherEnd);
        }
    }
}
