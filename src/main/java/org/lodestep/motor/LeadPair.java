package org.lodestep.motor;

import java.util.Objects;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Two lead labels measured as one voltage, {@code +} on {@link #first()}: a back-EMF channel named
 * {@code emf_1_2_v} measures lead 1 against lead 2.
 */
public record LeadPair(String first, String second) {
    private static final Pattern EMF_NAME = Pattern.compile("(?i)emf_([A-Za-z0-9]+)_([A-Za-z0-9]+)(?:_v)?");

    public LeadPair {
        Objects.requireNonNull(first, "first");
        Objects.requireNonNull(second, "second");
        if (first.isBlank() || second.isBlank() || first.equals(second)) {
            throw new IllegalArgumentException("a lead pair needs two different lead labels, got '" + first
                    + "' and '" + second + "'");
        }
    }

    /**
     * Reads a channel name {@code emf_<lead>_<lead>} (with or without the {@code _v} unit suffix); null when the name
     * does not follow that pattern.
     */
    public static LeadPair fromChannelName(String name) {
        Matcher m = EMF_NAME.matcher(name);
        if (!m.matches()) {
            return null;
        }
        return new LeadPair(m.group(1), m.group(2));
    }

    /** The same pair with the other lead positive. */
    public LeadPair reversed() {
        return new LeadPair(second, first);
    }

    @Override
    public String toString() {
        return first + "-" + second;
    }
}
