package org.lodestep.wiring;

import java.util.List;
import java.util.Objects;

/**
 * One winding (or half-winding) as seen from its leads.
 *
 * @param ends                 the two end leads
 * @param tap                  the centre-tap lead, or null when the winding has none
 * @param resistanceOhm        end-to-end resistance in ohms (as measured, or the sum of the halves when the end-to-end
 *                             pair was not measured)
 * @param halfResistancesOhm   tap-to-first-end and tap-to-second-end resistances in ohms; empty without a tap
 * @param halfWinding          true for one half of a phase (8-lead coils, 5-lead coils from the common lead)
 * @param resistanceMeasured   true when {@code resistanceOhm} is a reading, false when it follows from other readings
 *                             by the series relation (and so carries their contact resistance)
 * @param halvesMeasured       for each of {@code halfResistancesOhm}, true when it is a reading, false when it was
 *                             inferred (the whole less the other half, or the fitted coil); empty without a tap
 */
public record Winding(List<String> ends, String tap, double resistanceOhm, List<Double> halfResistancesOhm,
                      boolean halfWinding, boolean resistanceMeasured, List<Boolean> halvesMeasured) {
    public Winding {
        ends = List.copyOf(ends);
        if (ends.size() != 2) {
            throw new IllegalArgumentException("a winding has two ends, got " + ends);
        }
        if (!(resistanceOhm >= 0) || Double.isInfinite(resistanceOhm)) {
            throw new IllegalArgumentException("winding resistance must be finite and >= 0 ohm: " + resistanceOhm);
        }
        halfResistancesOhm = List.copyOf(halfResistancesOhm);
        if (tap == null && !halfResistancesOhm.isEmpty()) {
            throw new IllegalArgumentException("half resistances without a tap");
        }
        halvesMeasured = List.copyOf(halvesMeasured);
        if (halvesMeasured.size() != halfResistancesOhm.size()) {
            throw new IllegalArgumentException("one measured flag per half resistance: " + halvesMeasured);
        }
        Objects.requireNonNull(ends.get(0));
    }

    /** A winding without a tap: read or inferred as a whole. */
    public Winding(List<String> ends, double resistanceOhm, boolean halfWinding, boolean resistanceMeasured) {
        this(ends, null, resistanceOhm, List.of(), halfWinding, resistanceMeasured, List.of());
    }

    /**
     * Whether its resistance comes from readings of its own coils alone: the whole read, or (centre-tapped) both
     * halves read, the whole being their series sum.
     */
    public boolean readDirectly() {
        return resistanceMeasured || (!halvesMeasured.isEmpty() && !halvesMeasured.contains(false));
    }

    /** Every lead of the winding, ends first. */
    public List<String> leads() {
        return tap == null ? ends : List.of(ends.get(0), ends.get(1), tap);
    }
}
