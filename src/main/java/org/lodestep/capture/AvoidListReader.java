package org.lodestep.capture;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import com.fasterxml.jackson.databind.JsonNode;

import org.lodestep.sample.InputFormatException;

/** Reads the avoid-list JSON that {@code resonance sweep --avoid-list} writes; complaints name file and line. */
public final class AvoidListReader {
    static final String FORMAT = "lodestep-avoid-list";

    private AvoidListReader() {
    }

    public static AvoidListFile read(Path file) throws IOException, InputFormatException {
        JsonDocument doc = JsonDocument.read(file);
        JsonNode root = doc.root;
        String format = doc.text(root, "", "format", "\"" + FORMAT + "\"", true);
        if (!FORMAT.equals(format)) {
            throw doc.error("/format", format, "is not an avoid-list: expected format \"" + FORMAT + "\"");
        }
        Double version = doc.number(root, "", "version", "1", true);
        if (version != 1) {
            throw doc.error("/version", String.valueOf(version), "is an avoid-list version this Lodestep does not"
                    + " read: expected 1");
        }
        Double micro = doc.number(root, "", "microsteps", "pulses per full step", false);
        Double teeth = doc.number(root, "", "rotor_teeth", "rotor teeth", false);
        JsonNode ranges = root.get("ranges");
        if (ranges == null || !ranges.isArray()) {
            throw doc.error("", null, "has no ranges list: expected \"ranges\": [ ... ]");
        }
        List<AvoidListFile.Range> out = new ArrayList<>();
        for (int k = 0; k < ranges.size(); k++) {
            String ptr = "/ranges/" + k;
            JsonNode r = ranges.get(k);
            if (!r.isObject()) {
                throw doc.error(ptr, r.toString(), "is not a range: expected {from_full_steps_per_s, ...}");
            }
            double from = doc.number(r, ptr, "from_full_steps_per_s", "the lower edge in full steps/s", true);
            double to = doc.number(r, ptr, "to_full_steps_per_s", "the upper edge in full steps/s", true);
            if (!(from >= 0) || !(to > from)) {
                throw doc.error(ptr + "/to_full_steps_per_s", from + " ... " + to, "is not a rising range: expected"
                        + " 0 <= from_full_steps_per_s < to_full_steps_per_s");
            }
            Double a = doc.number(r, ptr, "min_acceleration_full_steps_per_s2", "full steps/s²", false);
            if (a != null && a < 0) {
                throw doc.error(ptr + "/min_acceleration_full_steps_per_s2", String.valueOf(a),
                        "is negative: expected a crossing acceleration of 0 or more full steps/s²");
            }
            out.add(new AvoidListFile.Range(doc.lineOf(ptr), from, to, a == null ? Double.NaN : a,
                    doc.text(r, ptr, "class", "the band class", false)));
        }
        return new AvoidListFile(doc.source, micro == null ? 1 : (int) Math.round(micro),
                teeth == null ? 50 : (int) Math.round(teeth), out);
    }
}
