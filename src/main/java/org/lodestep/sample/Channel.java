package org.lodestep.sample;

import java.util.Objects;

/**
 * One recorded channel: its name as written in the source ({@code accel_x}, {@code emf_1_2}) and its unit
 * ({@code g}, {@code a}, {@code v}, or {@code ""} for a dimensionless or unknown unit, such as WAV audio).
 */
public record Channel(String name, String unit) {
    public Channel {
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(unit, "unit");
        if (name.isBlank()) {
            throw new IllegalArgumentException("channel name is blank");
        }
    }

    /** The canonical column header, {@code <name>_<unit>}, or the bare name when the unit is unknown. */
    public String header() {
        return unit.isEmpty() ? name : name + "_" + unit;
    }
}
