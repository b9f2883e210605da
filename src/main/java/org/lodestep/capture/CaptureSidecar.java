package org.lodestep.capture;

import org.lodestep.sample.SampleStream;

import org.lodestep.sample.Channel;
import org.lodestep.sample.InputFormatException;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.time.format.DateTimeParseException;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;

/**
 * The JSON file written beside a capture's CSV ({@code <name>.json} beside {@code <name>.csv}): where the data came
 * from, whether it is complete, and the SHA-256 of the data file so any later change to it is detected.
 *
 * <p>Shape ({@code format_version} 1):
 * <pre>{@code
 * { "format": "lodestep-capture", "format_version": 1, "data_file": "sweep.csv", "complete": true,
 *   "interruption": null, "rig": "...", "firmware_version": "...", "scenario": "...", "serial_number": "...",
 *   "tool_version": "...", "started_at": "2026-12-01T10:00:00Z", "ended_at": "...", "sample_rate_hz": 51200.0,
 *   "start_time_s": 0.0, "frames": 512000,
 *   "channels": [ { "name": "accel", "unit": "g", "column": "accel_g" } ],
 *   "sweep": { "law": "linear", "start_full_steps_per_s": 50.0, "end_full_steps_per_s": 1500.0,
 *              "duration_s": 20.0, "microsteps": 16 },
 *   "metadata": { "axis": "x" }, "sha256": "<64 hex digits>" }
 * }</pre>
 *
 * @param dataFile     file name of the CSV, in the sidecar's folder
 * @param complete     false when the capture was interrupted and kept
 * @param interruption why the capture stopped early, or null when complete
 * @param frames       number of data rows
 * @param sha256       lower-case hex SHA-256 of the CSV's bytes
 */
public record CaptureSidecar(String dataFile, boolean complete, String interruption, String rig,
                             String firmwareVersion, String scenario, String serialNumber, String toolVersion,
                             Instant startedAt, Instant endedAt, double sampleRateHz, double startTimeS, long frames,
                             List<Channel> channels, SweepProfile sweep, Map<String, String> metadata,
                             String sha256) {
    static final String FORMAT = "lodestep-capture";
    static final int FORMAT_VERSION = 1;

    public CaptureSidecar {
        Objects.requireNonNull(dataFile, "dataFile");
        Objects.requireNonNull(rig, "rig");
        Objects.requireNonNull(startedAt, "startedAt");
        Objects.requireNonNull(endedAt, "endedAt");
        if (!(sampleRateHz > 0) || !Double.isFinite(sampleRateHz)) {
            throw new IllegalArgumentException("sample rate must be positive and finite, got " + sampleRateHz + " Hz");
        }
        if (frames < 0) {
            throw new IllegalArgumentException("frames must not be negative, got " + frames);
        }
        if (sha256 == null || !sha256.matches("[0-9a-f]{64}")) {
            throw new IllegalArgumentException("sha256 must be 64 lower-case hex digits, got " + sha256);
        }
        channels = List.copyOf(channels);
        metadata = Map.copyOf(metadata);
    }

    /** Every field as flat {@code key=value} metadata, the way a {@link SampleStream} reports it. */
    public Map<String, String> toMetadata() {
        Map<String, String> m = new LinkedHashMap<>(metadata);
        m.put("rig", rig);
        putIf(m, "firmware_version", firmwareVersion);
        putIf(m, "scenario", scenario);
        putIf(m, "serial_number", serialNumber);
        putIf(m, "tool_version", toolVersion);
        m.put("started_at", startedAt.toString());
        m.put("ended_at", endedAt.toString());
        m.put("sample_rate_hz", Double.toString(sampleRateHz));
        m.put("start_time_s", Double.toString(startTimeS));
        m.put("frames", Long.toString(frames));
        m.put("complete", Boolean.toString(complete));
        putIf(m, "interruption", interruption);
        m.put("sha256", sha256);
        if (sweep != null) {
            m.putAll(sweep.toMetadata());
        }
        return m;
    }

    private static void putIf(Map<String, String> m, String key, String value) {
        if (value != null) {
            m.put(key, value);
        }
    }

    private static ObjectMapper mapper() {
        return new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);
    }

    /** The sidecar as JSON text. */
    String toJson() {
        ObjectMapper om = mapper();
        ObjectNode o = om.createObjectNode();
        o.put("format", FORMAT);
        o.put("format_version", FORMAT_VERSION);
        o.put("data_file", dataFile);
        o.put("complete", complete);
        o.put("interruption", interruption);
        o.put("rig", rig);
        o.put("firmware_version", firmwareVersion);
        o.put("scenario", scenario);
        o.put("serial_number", serialNumber);
        o.put("tool_version", toolVersion);
        o.put("started_at", startedAt.toString());
        o.put("ended_at", endedAt.toString());
        o.put("sample_rate_hz", sampleRateHz);
        o.put("start_time_s", startTimeS);
        o.put("frames", frames);
        ArrayNode chs = o.putArray("channels");
        for (Channel c : channels) {
            chs.addObject().put("name", c.name()).put("unit", c.unit()).put("column", c.header());
        }
        if (sweep == null) {
            o.putNull("sweep");
        } else {
            ObjectNode s = o.putObject("sweep");
            s.put("law", sweep.shape().word());
            s.put("start_full_steps_per_s", sweep.startFullStepsPerS());
            s.put("end_full_steps_per_s", sweep.endFullStepsPerS());
            if (sweep.durationS().isPresent()) {
                s.put("duration_s", sweep.durationS().getAsDouble());
            } else {
                s.putNull("duration_s");
            }
            if (sweep.microsteps().isPresent()) {
                s.put("microsteps", sweep.microsteps().getAsInt());
            } else {
                s.putNull("microsteps");
            }
        }
        ObjectNode meta = o.putObject("metadata");
        metadata.entrySet().stream().sorted(Map.Entry.comparingByKey()).forEach(e -> meta.put(e.getKey(), e.getValue()));
        o.put("sha256", sha256);
        try {
            return om.writeValueAsString(o) + "\n";
        } catch (JsonProcessingException e) {
            throw new IllegalStateException("cannot write sidecar JSON: " + e.getMessage(), e);
        }
    }

    /**
     * Reads a sidecar file.
     *
     * @throws InputFormatException when it is not JSON, not a capture sidecar, or a field is missing or malformed;
     *                              the message names the key
     */
    public static CaptureSidecar read(Path path) throws IOException, InputFormatException {
        String source = path.toString();
        JsonNode o;
        try {
            o = mapper().readTree(Files.readAllBytes(path));
        } catch (JsonProcessingException e) {
            int line = e.getLocation() == null ? InputFormatException.NO_LINE : e.getLocation().getLineNr();
            throw new InputFormatException(source, line, null, null,
                    "is not valid JSON (" + JsonDocument.problem(e) + "): expected a capture sidecar");
        }
        if (o == null || !o.isObject() || !FORMAT.equals(o.path("format").asText(null))) {
            throw new InputFormatException(source, InputFormatException.NO_LINE, "format",
                    o == null ? null : o.path("format").asText(null), "expected \"" + FORMAT + "\" (a capture sidecar)");
        }
        if (o.path("format_version").asInt(-1) != FORMAT_VERSION) {
            throw new InputFormatException(source, InputFormatException.NO_LINE, "format_version",
                    o.path("format_version").toString(), "expected " + FORMAT_VERSION
                    + " (written by another Lodestep version?)");
        }
        List<Channel> channels = new ArrayList<>();
        JsonNode chs = o.path("channels");
        if (!chs.isArray() || chs.isEmpty()) {
            throw field(source, "channels", chs, "expected a non-empty list of {name, unit}");
        }
        for (JsonNode c : chs) {
            String name = c.path("name").asText("");
            if (name.isBlank() || !c.path("unit").isTextual()) {
                throw field(source, "channels", c, "expected {\"name\": ..., \"unit\": ...}");
            }
            channels.add(new Channel(name, c.path("unit").asText()));
        }
        SweepProfile sweep = null;
        JsonNode s = o.path("sweep");
        if (s.isObject()) {
            Map<String, String> sm = new LinkedHashMap<>();
            sm.put("sweep", s.path("law").asText(""));
            copyNumber(s, "start_full_steps_per_s", "sweep_start_full_steps_per_s", sm);
            copyNumber(s, "end_full_steps_per_s", "sweep_end_full_steps_per_s", sm);
            copyNumber(s, "duration_s", "sweep_duration_s", sm);
            copyNumber(s, "microsteps", "microsteps", sm);
            sweep = SweepProfile.fromMetadata(sm, source);
        }
        Map<String, String> meta = new LinkedHashMap<>();
        JsonNode m = o.path("metadata");
        if (m.isObject()) {
            for (Iterator<Map.Entry<String, JsonNode>> it = m.fields(); it.hasNext();) {
                Map.Entry<String, JsonNode> e = it.next();
                meta.put(e.getKey(), e.getValue().asText());
            }
        }
        try {
            return new CaptureSidecar(text(source, o, "data_file", true), bool(source, o, "complete"),
                    text(source, o, "interruption", false), text(source, o, "rig", true),
                    text(source, o, "firmware_version", false), text(source, o, "scenario", false),
                    text(source, o, "serial_number", false), text(source, o, "tool_version", false),
                    instant(source, o, "started_at"), instant(source, o, "ended_at"),
                    number(source, o, "sample_rate_hz"), number(source, o, "start_time_s"),
                    (long) number(source, o, "frames"), channels, sweep, meta, text(source, o, "sha256", true));
        } catch (IllegalArgumentException e) {
            throw new InputFormatException(source, InputFormatException.NO_LINE, null, null,
                    "is not a usable capture sidecar: " + e.getMessage());
        }
    }

    private static void copyNumber(JsonNode s, String from, String to, Map<String, String> out) {
        JsonNode v = s.path(from);
        if (v.isNumber()) {
            out.put(to, v.isIntegralNumber() ? Long.toString(v.asLong()) : Double.toString(v.asDouble()));
        } else if (!v.isMissingNode() && !v.isNull()) {
            out.put(to, v.asText());
        }
    }

    private static InputFormatException field(String source, String key, JsonNode value, String expected) {
        return new InputFormatException(source, InputFormatException.NO_LINE, key,
                value == null || value.isMissingNode() ? null : value.toString(), expected);
    }

    private static String text(String source, JsonNode o, String key, boolean required) throws InputFormatException {
        JsonNode v = o.path(key);
        if (v.isTextual() && !v.asText().isBlank()) {
            return v.asText();
        }
        if (!required && (v.isMissingNode() || v.isNull())) {
            return null;
        }
        throw field(source, key, v, required ? "expected a non-empty string" : "expected a string or null");
    }

    private static boolean bool(String source, JsonNode o, String key) throws InputFormatException {
        JsonNode v = o.path(key);
        if (!v.isBoolean()) {
            throw field(source, key, v, "expected true or false");
        }
        return v.asBoolean();
    }

    private static double number(String source, JsonNode o, String key) throws InputFormatException {
        JsonNode v = o.path(key);
        if (!v.isNumber()) {
            throw field(source, key, v, "expected a number");
        }
        return v.asDouble();
    }

    private static Instant instant(String source, JsonNode o, String key) throws InputFormatException {
        String t = text(source, o, key, true);
        try {
            return Instant.parse(t);
        } catch (DateTimeParseException e) {
            throw field(source, key, o.path(key), "expected an ISO-8601 UTC time such as 2026-12-01T10:00:00Z");
        }
    }
}
