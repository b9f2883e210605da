package org.lodestep.motor;

import java.util.Objects;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Two lead labels in a stated order, {@code +} on {@link #first()}: a coil with its start and end, or one voltage
 * measured across two leads (a back-EMF channel named {@code emf_1_2_v} measures lead 1 against lead 2). Unlike
 * {@link org.lodestep.wiring.LeadPair}, which is the unordered pair a resistance is read across, the order matters.
 */
public record OrientedLeads(String first, String second) {
    private static final Pattern EMF_NAME = Pattern.compile("(?i)emf_([A-Za-z0-9]+)_([A-Za-z0-9]+)(?:_v)?");

    public OrientedLeads {
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
    public static OrientedLeads fromChannelName(String name) {
        Matcher m = EMF_NAME.matcher(name);
        if (!m.matches()) {
            return null;
        }
        return new OrientedLeads(m.group(1), m.group(2));
    }

    /** The same pair with the other lead positive. */
    public OrientedLeads reversed() {
        return new OrientedLeads(second, first);
    }

    @Override
    public String toString() {
        return first + "-" + second;
    }
}
