package org.lodestep.qa;

import java.util.Objects;

/**
 * One capability index of a series with its approximate 95 % confidence interval, or the reason it is not given.
 *
 * @param index   its name: {@code Cpk} for a two-sided spec, {@code Cpu} for a maximum only, {@code Cpl} for a
 *                minimum only (σ within, MR̄/d2); {@code Ppk}, {@code Ppu}, {@code Ppl} with the overall s
 * @param value   the index, NaN when refused or undefined (no spread)
 * @param lower   lower end of the 95 % interval (Bissell's normal approximation, {@link ProcessCapability}), or NaN
 * @param upper   upper end, or NaN
 * @param n       values behind it
 * @param refusal why no figure is given ("too few motors ..."), or null when there is one
 */
public record Capability(String index, double value, double lower, double upper, int n, String refusal) {
    public Capability {
        Objects.requireNonNull(index, "index");
        if (refusal != null && !Double.isNaN(value)) {
            throw new IllegalArgumentException(index + " " + value + " given although refused: " + refusal);
        }
    }

    /** True when a figure is given. */
    public boolean known() {
        return !Double.isNaN(value);
    }
}
