package org.lodestep.capture;

import java.io.IOException;
import java.nio.file.Path;

import com.fasterxml.jackson.databind.JsonNode;

import org.lodestep.sample.InputFormatException;

/** Reads the motor card JSON that {@code motor identify --json} writes; complaints name the file and the line. */
public final class MotorCardReader {
    private MotorCardReader() {
    }

    public static MotorCardFile read(Path file) throws IOException, InputFormatException {
        JsonDocument doc = JsonDocument.read(file);
        JsonNode root = doc.root;
        if (!root.has("phases") && !root.has("kt_nm_per_a")) {
            throw doc.error("", null, "is not a motor card: expected the JSON of 'lodestep motor identify --json'"
                    + " (keys phases, kt_nm_per_a, rotor_teeth)");
        }
        String topology = doc.text(root, "", "topology", "the lead layout", false);
        String connection = doc.text(root, "", "connection", "series, parallel, half or unipolar", false);
        Double teeth = doc.number(root, "", "rotor_teeth", "a whole number of rotor teeth", false);
        if (teeth != null && (teeth < 1 || teeth != Math.rint(teeth))) {
            throw doc.error("/rotor_teeth", String.valueOf(teeth), "is not a rotor tooth count: expected a whole"
                    + " number of at least 1");
        }
        Double kt = positive(doc, root, "", "kt_nm_per_a", "the torque constant in N·m/A");
        Double current = positive(doc, root, "", "phase_current_a", "the phase current in A");
        Double supply = positive(doc, root, "", "supply_v", "the supply voltage in V");
        Double inertia = positive(doc, root, "", "inertia_kg_m2", "the inertia in kg·m²");
        double rSum = 0;
        double lSum = 0;
        int rN = 0;
        int lN = 0;
        JsonNode phases = root.get("phases");
        if (phases != null && !phases.isNull()) {
            if (!phases.isArray()) {
                throw doc.error("/phases", null, "is not a list: expected phases as a JSON array");
            }
            for (int k = 0; k < phases.size(); k++) {
                String ptr = "/phases/" + k;
                JsonNode p = phases.get(k);
                if (!p.isObject()) {
                    throw doc.error(ptr, p.toString(), "is not a phase: expected {name, resistance_ohm, ...}");
                }
                Double r = positive(doc, p, ptr, "resistance_ohm", "the phase resistance in ohm");
                Double l = positive(doc, p, ptr, "inductance_h", "the phase inductance in H");
                if (r != null) {
                    rSum += r;
                    rN++;
                }
                if (l != null) {
                    lSum += l;
                    lN++;
                }
            }
        }
        return new MotorCardFile(doc.source, topology == null ? "unknown" : topology,
                connection == null ? "series" : connection, teeth == null ? null : (int) Math.round(teeth),
                rN == 0 ? null : rSum / rN, lN == 0 ? null : lSum / lN, kt, current, supply, inertia);
    }

    private static Double positive(JsonDocument doc, JsonNode parent, String ptr, String key, String what)
            throws InputFormatException {
        Double v = doc.number(parent, ptr, key, what, false);
        if (v != null && !(v > 0)) {
            throw doc.error(ptr + "/" + key, String.valueOf(v), "is not positive: expected " + key + " as " + what);
        }
        return v;
    }
}
