package org.lodestep.capture;

import org.lodestep.sample.Channel;
import java.time.Instant;
import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Objects;
import java.util.Set;

/**
 * What a capture writer records about a capture before the first sample: where it came from and how it was taken.
 *
 * @param rig             rig identity as the rig reports it (model and serial, or {@code sim:<scenario>})
 * @param firmwareVersion the rig firmware's version string
 * @param scenario        the virtual rig's scenario name, or null for a real rig
 * @param serialNumber    serial number of the motor under test, or null
 * @param toolVersion     the Lodestep version that wrote the capture
 * @param startedAt       when the first sample was taken
 * @param sampleRateHz    samples per second per channel
 * @param startTimeS      time of the first frame, in seconds (usually 0)
 * @param channels        the recorded channels, in column order
 * @param sweep           the sweep law, or null when the capture is not a sweep
 * @param metadata        further {@code key=value} pairs (keys lower case: letters, digits, underscores)
 */
public record CaptureInfo(String rig, String firmwareVersion, String scenario, String serialNumber, String toolVersion,
                          Instant startedAt, double sampleRateHz, double startTimeS, List<Channel> channels,
                          SweepProfile sweep, Map<String, String> metadata) {

    /** Keys the writer sets itself; callers may not pass them in {@code metadata}. */
    static final Set<String> RESERVED_KEYS = Set.of("lodestep_capture", "rig", "firmware_version", "scenario",
            "serial_number", "tool_version", "started_at", "ended_at", "sample_rate_hz", "start_time_s", "complete",
            "sha256", "frames", "interruption", "sweep", "sweep_start_full_steps_per_s", "sweep_end_full_steps_per_s",
            "sweep_duration_s", "microsteps");

    public CaptureInfo {
        requireText(rig, "rig");
        requireText(firmwareVersion, "firmwareVersion");
        requireText(toolVersion, "toolVersion");
        if (scenario != null) {
            requireText(scenario, "scenario");
        }
        if (serialNumber != null) {
            requireText(serialNumber, "serialNumber");
        }
        Objects.requireNonNull(startedAt, "startedAt");
        if (!(sampleRateHz > 0) || !Double.isFinite(sampleRateHz)) {
            throw new IllegalArgumentException("sample rate must be positive and finite, got " + sampleRateHz + " Hz");
        }
        if (!Double.isFinite(startTimeS)) {
            throw new IllegalArgumentException("start time must be finite, got " + startTimeS + " s");
        }
        channels = List.copyOf(channels);
        if (channels.isEmpty()) {
            throw new IllegalArgumentException("a capture needs at least one channel");
        }
        Set<String> headers = new HashSet<>();
        for (Channel c : channels) {
            String h = c.header();
            if (!h.matches("[A-Za-z][A-Za-z0-9_]*")) {
                throw new IllegalArgumentException("channel header '" + h
                        + "' must be letters, digits and underscores, starting with a letter");
            }
            if (!CsvColumns.channelOf(h).equals(c)) {
                throw new IllegalArgumentException("channel " + c + " would read back as " + CsvColumns.channelOf(h)
                        + ": use a lower-case known unit (g, a, v, mps2, pa) or a name whose last '_' part is not a "
                        + "word");
            }
            if (h.toLowerCase(Locale.ROOT).startsWith("time_") || !headers.add(h.toLowerCase(Locale.ROOT))) {
                throw new IllegalArgumentException("channel header '" + h + "' is repeated or clashes with time_s");
            }
        }
        metadata = Map.copyOf(metadata);
        for (Map.Entry<String, String> e : metadata.entrySet()) {
            if (!e.getKey().matches("[a-z][a-z0-9_]*")) {
                throw new IllegalArgumentException("metadata key '" + e.getKey()
                        + "' must be lower-case letters, digits and underscores");
            }
            if (RESERVED_KEYS.contains(e.getKey())) {
                throw new IllegalArgumentException("metadata key '" + e.getKey()
                        + "' is set by the capture writer itself");
            }
            requireText(e.getValue(), "metadata " + e.getKey());
        }
    }

    private static void requireText(String value, String what) {
        Objects.requireNonNull(value, what);
        if (value.isBlank() || value.chars().anyMatch(ch -> ch == '\n' || ch == '\r')) {
            throw new IllegalArgumentException(what + " must be one non-blank line, got '" + value + "'");
        }
    }
}
