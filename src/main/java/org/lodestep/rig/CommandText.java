package org.lodestep.rig;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.regex.Pattern;

/**
 * A command payload read by the rig's strict grammar (firmware-protocol.md, section 4.1): printable ASCII words
 * separated by single spaces, bare words first ({@code RES 1 2}, {@code INS ARM}), then {@code key=value} pairs, each
 * key at most once; command words are upper case and keys lower case, and case matters. Numbers follow one grammar
 * ({@link #NUMBER}), integers a stricter one. Anything else is refused with a reason short enough for an error frame.
 */
final class CommandText {
    /** Decimal number: optional minus, digits, optional fraction, optional exponent ({@code 5.0E-4}, {@code 1e+09}). */
    static final Pattern NUMBER = Pattern.compile("-?[0-9]+(\\.[0-9]+)?([eE][+-]?[0-9]+)?");
    /** Unsigned decimal integer. */
    static final Pattern INTEGER = Pattern.compile("[0-9]+");
    private static final Pattern KEY = Pattern.compile("[a-z][a-z0-9_]*");
    /** Longest piece of host text an error message repeats. */
    static final int ECHO_CHARS = 32;
    /** Longest number or integer accepted, characters. */
    private static final int NUMBER_CHARS = 32;

    private final List<String> words;
    private final Map<String, String> values;

    private CommandText(List<String> words, Map<String, String> values) {
        this.words = words;
        this.values = values;
    }

    /** Parses a command payload; a payload that breaks the grammar is a {@link RigError#BAD_ARGUMENT}. */
    static CommandText parse(byte[] payload) throws CommandException {
        if (payload.length == 0) {
            throw CommandException.badArgument("empty command");
        }
        for (int i = 0; i < payload.length; i++) {
            int b = payload[i] & 0xFF;
            if (b < 0x20 || b > 0x7E) {
                throw CommandException.badArgument(String.format("byte 0x%02X at offset %d is not printable ASCII",
                        b, i));
            }
            if (b == ' ' && (i == 0 || i == payload.length - 1 || payload[i - 1] == ' ')) {
                throw CommandException.badArgument("words must be separated by single spaces, with none at either "
                        + "end");
            }
        }
        String text = new String(payload, java.nio.charset.StandardCharsets.US_ASCII);
        List<String> words = new ArrayList<>();
        Map<String, String> values = new LinkedHashMap<>();
        for (String w : text.split(" ")) {
            int eq = w.indexOf('=');
            if (eq < 0) {
                if (!values.isEmpty()) {
                    throw CommandException.badArgument("'" + echo(w) + "' follows key=value arguments");
                }
                words.add(w);
                continue;
            }
            String key = w.substring(0, eq);
            String value = w.substring(eq + 1);
            if (!KEY.matcher(key).matches() || value.isEmpty() || value.indexOf('=') >= 0) {
                throw CommandException.badArgument("'" + echo(w) + "' is not key=value");
            }
            if (values.put(key, value) != null) {
                throw CommandException.badArgument(key + "= is given twice");
            }
        }
        if (words.isEmpty()) {
            throw CommandException.badArgument("no command word");
        }
        return new CommandText(List.copyOf(words), values);
    }

    /** The command word, e.g. {@code RES}. */
    String verb() {
        return words.get(0);
    }

    String word(int i) {
        return i < words.size() ? words.get(i) : "";
    }

    /**
     * Refuses extra or missing words and unknown or missing keys.
     *
     * @param name  how the command is named in the message ({@code RES}, {@code INS ARM})
     * @param count bare words including the command word(s)
     * @param keys  accepted keys; a leading {@code ?} marks one as optional
     */
    void expect(String name, int count, String... keys) throws CommandException {
        if (words.size() != count) {
            throw CommandException.badArgument(name + " takes " + (count - name.split(" ").length)
                    + " positional argument(s), got " + (words.size() - name.split(" ").length));
        }
        Set<String> known = new HashSet<>();
        for (String k : keys) {
            String key = k.startsWith("?") ? k.substring(1) : k;
            known.add(key);
            if (!k.startsWith("?") && !values.containsKey(key)) {
                throw CommandException.badArgument(key + "= is missing");
            }
        }
        for (String k : values.keySet()) {
            if (!known.contains(k)) {
                throw CommandException.badArgument("unknown argument " + echo(k) + "= for " + name);
            }
        }
    }

    boolean has(String key) {
        return values.containsKey(key);
    }

    String get(String key) {
        return values.get(key);
    }

    /** A number argument in [min, max]. */
    double number(String key, double min, double max) throws CommandException {
        String v = values.get(key);
        if (v == null) {
            throw CommandException.badArgument(key + "= is missing");
        }
        if (v.length() > NUMBER_CHARS || !NUMBER.matcher(v).matches()) {
            throw CommandException.badArgument(key + "=" + echo(v) + " is not a number");
        }
        double d = Double.parseDouble(v);
        if (!(d >= min && d <= max)) {
            throw CommandException.badArgument(key + "=" + echo(v) + " is outside " + StreamSpec.fmt(min) + ".."
                    + StreamSpec.fmt(max));
        }
        return d;
    }

    /** An integer argument in [min, max]. */
    long integer(String key, long min, long max) throws CommandException {
        String v = values.get(key);
        if (v == null) {
            throw CommandException.badArgument(key + "= is missing");
        }
        return integerWord(key + "=" + v, v, min, max);
    }

    /** A positional integer (a lead position) in [min, max]. */
    static long integerWord(String what, String v, long min, long max) throws CommandException {
        if (v.length() > NUMBER_CHARS || !INTEGER.matcher(v).matches()) {
            throw CommandException.badArgument(echo(what) + " is not an integer");
        }
        long n = v.length() > 18 ? Long.MAX_VALUE : Long.parseLong(v);
        if (n < min || n > max) {
            throw CommandException.badArgument(echo(what) + " is outside " + min + ".." + max);
        }
        return n;
    }

    /** Host text as an error message repeats it: at most {@link #ECHO_CHARS} characters. */
    static String echo(String s) {
        return s.length() <= ECHO_CHARS ? s : s.substring(0, ECHO_CHARS) + "...";
    }
}
