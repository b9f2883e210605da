package org.lodestep.rig;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * The words of an ASCII payload: leading bare words ({@code OK}, {@code RES}, {@code 1}) and {@code key=value} pairs,
 * separated by single spaces. Values never contain spaces.
 */
final class Fields {
    private final String source;
    private final List<String> words = new ArrayList<>();
    private final Map<String, String> values = new LinkedHashMap<>();

    private Fields(String source) {
        this.source = source;
    }

    static Fields parse(String text) {
        Fields f = new Fields(text);
        for (String w : text.trim().split(" +")) {
            if (w.isEmpty()) {
                continue;
            }
            int eq = w.indexOf('=');
            if (eq > 0) {
                f.values.put(w.substring(0, eq), w.substring(eq + 1));
            } else {
                f.words.add(w);
            }
        }
        return f;
    }

    List<String> words() {
        return words;
    }

    String word(int i) {
        return i < words.size() ? words.get(i) : "";
    }

    boolean has(String key) {
        return values.containsKey(key);
    }

    String get(String key) throws RigException {
        String v = values.get(key);
        if (v == null) {
            throw new RigException("reply '" + source + "' lacks " + key + "=");
        }
        return v;
    }

    String get(String key, String fallback) {
        return values.getOrDefault(key, fallback);
    }

    double number(String key) throws RigException {
        String v = get(key);
        try {
            return Double.parseDouble(v);
        } catch (NumberFormatException e) {
            throw new RigException("reply '" + source + "': " + key + "=" + v + " is not a number");
        }
    }

    int integer(String key) throws RigException {
        String v = get(key);
        try {
            return Integer.parseInt(v);
        } catch (NumberFormatException e) {
            throw new RigException("reply '" + source + "': " + key + "=" + v + " is not an integer");
        }
    }

    Map<String, String> values() {
        return values;
    }
}
