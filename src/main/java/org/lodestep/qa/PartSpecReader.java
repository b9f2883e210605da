package org.lodestep.qa;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.regex.Pattern;

import org.lodestep.sample.InputFiles;
import org.lodestep.sample.InputFormatException;
import org.lodestep.sample.InputLimits;
import org.lodestep.sample.Utf8Text;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.dataformat.toml.TomlMapper;

/**
 * Reads and validates a part spec written in TOML; every error names the file, the line, the key and what was
 * expected.
 *
 * <p>Format (the README has the full description):
 * <pre>
 * [part]
 * number = "KV-4218-M"     # required
 * revision = "B"           # required
 * spec_version = 3         # required, 1 or more; increment on every change of a limit
 * description = "..."      # optional
 *
 * [resistance]             # phase resistance at reference_c
 * phase_nominal_ohm = 2.4
 * tolerance_pct = 10
 * reference_c = 20         # default 20 °C
 * max_imbalance_pct = 5    # optional: phase balance check
 *
 * [inductance]             # phase_nominal_mh, tolerance_pct
 * [back_emf]               # ke_nominal_v_s_per_rad, tolerance_pct
 * [step_angle]             # nominal_deg, tolerance_pct (default 5)
 * [insulation]             # minimum_mohm (default 100), test_voltage_v or rated_voltage_v (default 500 V)
 * </pre>
 * A section that is absent means that check is not part of the spec.
 */
public final class PartSpecReader {

    private static final Map<String, Set<String>> KEYS = new LinkedHashMap<>();

    static {
        KEYS.put("part", Set.of("number", "revision", "spec_version", "description"));
        KEYS.put("resistance", Set.of("phase_nominal_ohm", "tolerance_pct", "reference_c", "max_imbalance_pct"));
        KEYS.put("inductance", Set.of("phase_nominal_mh", "tolerance_pct"));
        KEYS.put("back_emf", Set.of("ke_nominal_v_s_per_rad", "tolerance_pct"));
        KEYS.put("step_angle", Set.of("nominal_deg", "tolerance_pct"));
        KEYS.put("insulation", Set.of("minimum_mohm", "test_voltage_v", "rated_voltage_v"));
    }

    /** Largest spec file read, bytes: a spec is a page of text. */
    static final int MAX_SPEC_BYTES = 1 << 20;

    private PartSpecReader() {
    }

    /** Reads a spec file. */
    public static PartSpec read(Path file) throws IOException, InputFormatException {
        InputFiles.requireFile(file, "a part spec in TOML");
        if (Files.size(file) > MAX_SPEC_BYTES) {
            throw new InputFormatException(file.toString(), InputFormatException.NO_LINE, null, null, "is "
                    + Files.size(file) + " bytes: expected a part spec in TOML of at most " + MAX_SPEC_BYTES + " bytes");
        }
        byte[] bytes = Files.readAllBytes(file);
        return parse(file.toString(), bytes);
    }

    /** Parses spec bytes; {@code source} names them in error messages. */
    public static PartSpec parse(String source, byte[] bytes) throws InputFormatException {
        if (bytes.length > MAX_SPEC_BYTES) {
            throw new InputFormatException(source, InputFormatException.NO_LINE, null, null, "is " + bytes.length
                    + " bytes: expected a part spec in TOML of at most " + MAX_SPEC_BYTES + " bytes");
        }
        String text = Utf8Text.decode(bytes, source, "a part spec in TOML");
        JsonNode root;
        try {
            root = new TomlMapper().readTree(text);
        } catch (JsonProcessingException e) {
            int line = e.getLocation() == null ? InputFormatException.NO_LINE : e.getLocation().getLineNr();
            throw new InputFormatException(source, Math.max(line, 0), null, null,
                    "is not valid TOML (" + oneLine(e.getOriginalMessage()) + ")");
        } catch (RuntimeException | StackOverflowError e) {
            // The TOML library's other failures (a number it cannot hold, nesting too deep) carry no line
            throw new InputFormatException(source, InputFormatException.NO_LINE, null, null,
                    "is not a TOML part spec this reader can hold: expected the sections and keys of the README");
        }
        return new Validator(source, text, root).spec(Hashes.sha256(bytes));
    }

    private static String oneLine(String s) {
        String t = String.valueOf(s).replaceAll("\\s+", " ").strip();
        return t.length() > 120 ? t.substring(0, 117) + "..." : t;
    }

    /**
     * The known name closest to a misspelt one (fewest single-character edits, V. I. Levenshtein, "Binary codes
     * capable of correcting deletions, insertions and reversals", Soviet Physics Doklady 10(8), 1966; references §28), or null when
     * none is within a third of the name's length.
     */
    static String nearest(String name, Iterable<String> known) {
        String best = null;
        int bestDistance = Integer.MAX_VALUE;
        for (String k : known) {
            int d = editDistance(name, k);
            if (d < bestDistance) {
                best = k;
                bestDistance = d;
            }
        }
        return bestDistance <= Math.max(2, name.length() / 3) ? best : null;
    }

    private static int editDistance(String a, String b) {
        int[] prev = new int[b.length() + 1];
        int[] cur = new int[b.length() + 1];
        for (int j = 0; j <= b.length(); j++) {
            prev[j] = j;
        }
        for (int i = 1; i <= a.length(); i++) {
            cur[0] = i;
            for (int j = 1; j <= b.length(); j++) {
                int cost = a.charAt(i - 1) == b.charAt(j - 1) ? 0 : 1;
                cur[j] = Math.min(Math.min(cur[j - 1] + 1, prev[j] + 1), prev[j - 1] + cost);
            }
            int[] t = prev;
            prev = cur;
            cur = t;
        }
        return prev[b.length()];
    }

    /** Walks the tree once, checking each key where it is read. */
    private static final class Validator {
        private final String source;
        private final String[] lines;
        private final JsonNode root;

        Validator(String source, String text, JsonNode root) {
            this.source = source;
            this.lines = text.split("\r?\n", -1);
            this.root = root;
        }

        PartSpec spec(String sha256) throws InputFormatException {
            checkKnownKeys();
            JsonNode part = section("part", true);
            String number = string(part, "part", "number", true);
            String revision = string(part, "part", "revision", true);
            int version = (int) number(part, "part", "spec_version", true, 1, 1_000_000, "a whole number, 1 or more");
            if (part.get("spec_version").isFloatingPointNumber()) {
                throw error("part", "spec_version", part.get("spec_version").asText(), "a whole number, 1 or more");
            }
            String description = part.has("description") ? string(part, "part", "description", false) : "";

            List<Limit> limits = new ArrayList<>();
            double referenceC = 20.0;
            JsonNode r = section("resistance", false);
            if (r != null) {
                double nominal = number(r, "resistance", "phase_nominal_ohm", true, 1e-6, 1e6, "ohms, positive");
                double tol = number(r, "resistance", "tolerance_pct", true, 1e-9, 99.999, "percent, above 0 and below 100");
                limits.add(Limit.percent(Parameters.PHASE_RESISTANCE, "ohm", nominal, tol));
                if (r.has("reference_c")) {
                    referenceC = number(r, "resistance", "reference_c", true, -59.999, 249.999, "°C, between -60 and 250");
                }
                if (r.has("max_imbalance_pct")) {
                    double max = number(r, "resistance", "max_imbalance_pct", true, 1e-9, 100, "percent, above 0");
                    limits.add(new Limit(Parameters.PHASE_IMBALANCE, "%", Double.NaN, Double.NaN, max));
                }
            }
            JsonNode l = section("inductance", false);
            if (l != null) {
                double mh = number(l, "inductance", "phase_nominal_mh", true, 1e-6, 1e6, "millihenries, positive");
                double tol = number(l, "inductance", "tolerance_pct", true, 1e-9, 99.999, "percent, above 0 and below 100");
                limits.add(Limit.percent(Parameters.PHASE_INDUCTANCE, "H", mh / 1000.0, tol));
            }
            JsonNode k = section("back_emf", false);
            if (k != null) {
                double ke = number(k, "back_emf", "ke_nominal_v_s_per_rad", true, 1e-9, 1e3, "V·s/rad, positive");
                double tol = number(k, "back_emf", "tolerance_pct", true, 1e-9, 99.999, "percent, above 0 and below 100");
                limits.add(Limit.percent(Parameters.BACK_EMF_CONSTANT, "V*s/rad", ke, tol));
            }
            JsonNode s = section("step_angle", false);
            if (s != null) {
                double deg = number(s, "step_angle", "nominal_deg", true, 1e-6, 90, "degrees, above 0 and at most 90");
                // Step-angle accuracy of +-5 % is the usual datasheet figure: common practice (no published source).
                double tol = s.has("tolerance_pct")
                        ? number(s, "step_angle", "tolerance_pct", true, 1e-9, 99.999, "percent, above 0 and below 100")
                        : 5.0;
                limits.add(Limit.percent(Parameters.STEP_ANGLE, "deg", deg, tol));
            }
            double testVoltageV = Double.NaN;
            JsonNode ins = section("insulation", false);
            if (ins != null) {
                double minOhm = ins.has("minimum_mohm")
                        ? number(ins, "insulation", "minimum_mohm", true, 1e-6, 1e9, "megohms, positive") * 1e6
                        : InsulationResistance.DEFAULT_MINIMUM_OHM;
                limits.add(new Limit(Parameters.INSULATION_RESISTANCE, "ohm", Double.NaN, minOhm, Double.NaN));
                if (ins.has("test_voltage_v") && ins.has("rated_voltage_v")) {
                    throw error("insulation", "rated_voltage_v", null,
                            "either test_voltage_v or rated_voltage_v, not both");
                }
                if (ins.has("test_voltage_v")) {
                    testVoltageV = number(ins, "insulation", "test_voltage_v", true, 1, 20000, "volts DC, 1 to 20000");
                } else if (ins.has("rated_voltage_v")) {
                    testVoltageV = InsulationResistance.testVoltageV(
                            number(ins, "insulation", "rated_voltage_v", true, 1e-3, 1e5, "volts, positive"));
                } else {
                    testVoltageV = InsulationResistance.testVoltageV(1);
                }
            }
            if (limits.isEmpty()) {
                throw new InputFormatException(source, InputFormatException.NO_LINE, null, null,
                        "has no checks: expected at least one of the sections [resistance], [inductance], "
                                + "[insulation], [back_emf], [step_angle]");
            }
            return new PartSpec(number, revision, version, description, referenceC, limits, testVoltageV, sha256,
                    source, lineOf("part", "spec_version"));
        }

        private void checkKnownKeys() throws InputFormatException {
            if (root == null || !root.isObject()) {
                throw new InputFormatException(source, InputFormatException.NO_LINE, null, null,
                        "is empty: expected a [part] section");
            }
            for (Iterator<Map.Entry<String, JsonNode>> it = root.fields(); it.hasNext(); ) {
                Map.Entry<String, JsonNode> e = it.next();
                Set<String> keys = KEYS.get(e.getKey());
                if (keys == null || !e.getValue().isObject()) {
                    String near = nearest(e.getKey(), KEYS.keySet());
                    throw new InputFormatException(source, lineOf(null, e.getKey()), e.getKey(), e.getKey(),
                            "is not a known section" + (near == null ? "" : ": did you mean [" + near + "]?")
                                    + " Expected one of [" + String.join("], [", KEYS.keySet()) + "]");
                }
                for (Iterator<String> names = e.getValue().fieldNames(); names.hasNext(); ) {
                    String name = names.next();
                    if (!keys.contains(name)) {
                        List<String> sorted = keys.stream().sorted().toList();
                        String near = nearest(name, sorted);
                        throw new InputFormatException(source, lineOf(e.getKey(), name), e.getKey() + "." + name, name,
                                "is not a key of [" + e.getKey() + "]" + (near == null ? "" : ": did you mean "
                                        + near + "?") + " Known keys: " + String.join(", ", sorted));
                    }
                }
            }
        }

        private JsonNode section(String name, boolean required) throws InputFormatException {
            JsonNode n = root.get(name);
            if (n == null && required) {
                throw new InputFormatException(source, InputFormatException.NO_LINE, null, null,
                        "has no [" + name + "] section");
            }
            return n;
        }

        private String string(JsonNode table, String section, String key, boolean nonBlank) throws InputFormatException {
            JsonNode v = table.get(key);
            if (v == null) {
                throw missing(section, key, "a quoted text");
            }
            if (!v.isTextual() || (nonBlank && v.asText().isBlank())) {
                throw error(section, key, v.asText(), "a quoted, non-empty text");
            }
            if (v.asText().length() > InputLimits.MAX_NAME_CHARS) {
                throw error(section, key, v.asText(), "a text of at most " + InputLimits.MAX_NAME_CHARS
                        + " characters, not " + v.asText().length());
            }
            return v.asText();
        }

        private double number(JsonNode table, String section, String key, boolean required, double min, double max,
                              String expected) throws InputFormatException {
            JsonNode v = table.get(key);
            if (v == null) {
                if (required) {
                    throw missing(section, key, expected);
                }
                return Double.NaN;
            }
            if (!v.isNumber() || !Double.isFinite(v.asDouble()) || v.asDouble() < min || v.asDouble() > max) {
                throw error(section, key, v.asText(), expected);
            }
            return v.asDouble();
        }

        private InputFormatException missing(String section, String key, String expected) {
            return new InputFormatException(source, lineOf(null, section), section + "." + key, null,
                    "[" + section + "] lacks the key " + key + " (" + expected + ")");
        }

        private InputFormatException error(String section, String key, String text, String expected) {
            return new InputFormatException(source, lineOf(section, key), section + "." + key, text,
                    "expected " + expected);
        }

        /** The 1-based line of {@code key =} inside {@code [section]}, or of the header {@code [key]} when section is null. */
        private int lineOf(String section, String key) {
            Pattern header = Pattern.compile("^\\s*\\[\\s*" + Pattern.quote(key) + "\\s*]");
            Pattern assignment = Pattern.compile("^\\s*\"?" + Pattern.quote(key) + "\"?\\s*=");
            String current = null;
            for (int i = 0; i < lines.length; i++) {
                String line = lines[i];
                java.util.regex.Matcher m = Pattern.compile("^\\s*\\[\\s*([^\\]]+?)\\s*]").matcher(line);
                if (m.find()) {
                    current = m.group(1);
                    if (section == null && header.matcher(line).find()) {
                        return i + 1;
                    }
                    continue;
                }
                if (section != null && section.equals(current) && assignment.matcher(line).find()) {
                    return i + 1;
                }
            }
            return InputFormatException.NO_LINE;
        }
    }
}
