package org.lodestep.rig;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.lodestep.sample.Channel;
import org.lodestep.sample.SampledSignal;

/**
 * A whole stream received from a rig, every block present and CRC-checked: channels in SI units (g for
 * acceleration), the sample rate, and what is known about where it came from (rig identity, firmware, command,
 * scenario or motor serial, UTC start and end).
 */
public final class RigCapture {
    private final String kind;
    private final SampledSignal signal;
    private final Map<String, String> metadata;
    private final long wireBytes;
    private final long sampleBytes;

    RigCapture(String kind, String source, List<Channel> channels, double rateHz, double[][] samples,
               Map<String, String> metadata, long wireBytes, long sampleBytes) {
        this.kind = kind;
        this.metadata = Map.copyOf(new LinkedHashMap<>(metadata));
        this.signal = new SampledSignal(source, channels, rateHz, 0.0, this.metadata, samples);
        this.wireBytes = wireBytes;
        this.sampleBytes = sampleBytes;
    }

    /** What was captured: {@code sweep}, {@code step-response} or {@code back-emf}. */
    public String kind() {
        return kind;
    }

    /** The samples, channels named as on the wire ({@code accel} in g, {@code current} in A, ...). */
    public SampledSignal signal() {
        return signal;
    }

    /** Provenance: rig, firmware, rig id, address, command, scenario, motor serial, started/finished UTC. */
    public Map<String, String> metadata() {
        return metadata;
    }

    /** Bytes of every frame received for this stream (header, blocks, resent blocks), on the wire. */
    public long wireBytes() {
        return wireBytes;
    }

    /** Bytes of sample payload among them (2 per sample, each block counted once). */
    public long sampleBytes() {
        return sampleBytes;
    }
}
