package org.lodestep.capture;

import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.OptionalDouble;

/**
 * The lead-pair resistances of one motor from one source, with the source's metadata.
 *
 * @param source       file name or other label, for messages
 * @param leads        lead labels in the order they first appear
 * @param readings     the measured pairs (a pair appears once)
 * @param metadata     {@code # key=value} metadata, keys in lower case
 * @param notes        free comment lines, without the leading {@code #}
 */
public record ResistanceReadings(String source, List<String> leads, List<LeadPairReading> readings,
                                 Map<String, String> metadata, List<String> notes) {
    public ResistanceReadings {
        Objects.requireNonNull(source, "source");
        leads = List.copyOf(leads);
        readings = List.copyOf(readings);
        metadata = Map.copyOf(metadata);
        notes = List.copyOf(notes);
    }

    /** The winding temperature from {@code # temperature_c=...}, checked to be a number when read. */
    public OptionalDouble temperatureC() {
        String t = metadata.get("temperature_c");
        return t == null ? OptionalDouble.empty() : OptionalDouble.of(Double.parseDouble(t));
    }

    /** The motor tag from {@code # motor=...}, or null. */
    public String motor() {
        return metadata.get("motor");
    }
}
