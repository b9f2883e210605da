package org.lodestep.rig;

import java.util.List;
import java.util.Map;

/**
 * What a rig says about itself in the handshake ({@code HELLO}) and the capability listing ({@code CAPS}).
 *
 * @param address         the address it was reached at
 * @param protocolVersion protocol version it speaks
 * @param rig             rig model name
 * @param firmware        firmware version
 * @param id              the rig's own serial number
 * @param leads           relay positions (leads it can reach)
 * @param labels          lead labels per position when the rig knows them (the virtual rig does), else empty
 * @param measures        measurements it can make: res, ins, step, emf, sweep
 * @param capabilities    every key of the capability listing, as sent
 */
public record RigInfo(String address, int protocolVersion, String rig, String firmware, String id, int leads,
                      List<String> labels, List<String> measures, Map<String, String> capabilities) {
    public RigInfo {
        labels = List.copyOf(labels);
        measures = List.copyOf(measures);
        capabilities = java.util.Collections.unmodifiableMap(new java.util.TreeMap<>(capabilities));
        if (leads < 2 || leads > 64) {
            throw new IllegalArgumentException("a rig with " + leads + " leads is not plausible");
        }
    }

    /** The capability value for a key, or a fallback. */
    public String capability(String key, String fallback) {
        return capabilities.getOrDefault(key, fallback);
    }

    /**
     * The label of each relay position: the rig's own labels when it names every lead once, else the positions
     * {@code 1..leads}.
     */
    public List<String> leadLabels() {
        if (labels.size() == leads && labels.stream().distinct().count() == leads
                && labels.stream().noneMatch(String::isBlank)) {
            return labels;
        }
        List<String> out = new java.util.ArrayList<>();
        for (int i = 1; i <= leads; i++) {
            out.add(Integer.toString(i));
        }
        return out;
    }
}
