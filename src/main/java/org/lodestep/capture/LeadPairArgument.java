package org.lodestep.capture;

import org.lodestep.sample.InputFormatException;
import java.util.Locale;
import java.util.OptionalDouble;

/**
 * Parses a reading given on the command line: {@code red-blue=2.4}, {@code 1-3=OL}, {@code red:blue=2,4k}... in ohms
 * unless the value ends in {@code m}, {@code k} or {@code M} (milli, kilo, mega).
 */
public final class LeadPairArgument {
    /** What a valid argument looks like, for messages and help. */
    public static final String FORM = "LEAD-LEAD=OHMS, e.g. red-blue=2.4 (OL for open; m, k, M suffixes; ':' instead"
            + " of '-' when labels contain '-')";

    private LeadPairArgument() {
    }

    /** Parses {@code text}; {@code source} names the option in messages (e.g. {@code --pair}). */
    public static LeadPairReading parse(String text, String source) throws InputFormatException {
        int eq = text.lastIndexOf('=');
        if (eq <= 0) {
            throw new InputFormatException(source, InputFormatException.NO_LINE, null, text, "expected " + FORM);
        }
        String pair = text.substring(0, eq).strip();
        String value = text.substring(eq + 1).strip();
        String sep = pair.indexOf(':') >= 0 ? ":" : "-";
        String[] leads = pair.split(java.util.regex.Pattern.quote(sep), -1);
        if (leads.length != 2 || leads[0].isBlank() || leads[1].isBlank()) {
            throw new InputFormatException(source, InputFormatException.NO_LINE, null, text,
                    "expected two lead labels: " + FORM);
        }
        String a = leads[0].strip();
        String b = leads[1].strip();
        ResistanceCsvReader.refuseLongLabel(source, InputFormatException.NO_LINE, "lead", a);
        ResistanceCsvReader.refuseLongLabel(source, InputFormatException.NO_LINE, "lead", b);
        if (a.equals(b)) {
            throw new InputFormatException(source, InputFormatException.NO_LINE, null, text,
                    "pairs a lead with itself: expected two different leads");
        }
        if (ResistanceValues.isOpen(value)) {
            if (value.isEmpty()) {
                throw new InputFormatException(source, InputFormatException.NO_LINE, null, text,
                        "has no value: expected " + FORM);
            }
            return new LeadPairReading(a, b, Double.POSITIVE_INFINITY, 0);
        }
        double factor = 1;
        char last = value.isEmpty() ? ' ' : value.charAt(value.length() - 1);
        String number = value;
        if (last == 'm' || last == 'k' || last == 'K' || last == 'M') {
            factor = last == 'm' ? 1e-3 : last == 'M' ? 1e6 : 1e3;
            number = value.substring(0, value.length() - 1);
        }
        OptionalDouble v = ResistanceValues.number(number, true);
        if (v.isEmpty()) {
            throw new InputFormatException(source, InputFormatException.NO_LINE, null, text,
                    "has no valid resistance: expected " + FORM);
        }
        double ohms = v.getAsDouble() * factor;
        String impossible = Double.isFinite(ohms) ? ResistanceValues.impossible(ohms)
                : "is out of range: expected a finite resistance";
        if (impossible != null) {
            throw new InputFormatException(source, InputFormatException.NO_LINE, null, text, impossible);
        }
        return new LeadPairReading(a, b, ohms, 0);
    }

    /** A reading as typed at the probe prompt: a number (ohms, optional m/k/M suffix) or OL; empty when invalid. */
    public static OptionalDouble parseValue(String text) {
        String t = text.strip();
        if (ResistanceValues.isOpen(t) && !t.isEmpty()) {
            return OptionalDouble.of(Double.POSITIVE_INFINITY);
        }
        double factor = 1;
        if (t.toLowerCase(Locale.ROOT).endsWith("ohm") || t.endsWith("Ω")) {
            t = t.replaceAll("(?i)\\s*(ohm|Ω)$", "");
        }
        if (!t.isEmpty()) {
            char last = t.charAt(t.length() - 1);
            if (last == 'm' || last == 'k' || last == 'K' || last == 'M') {
                factor = last == 'm' ? 1e-3 : last == 'M' ? 1e6 : 1e3;
                t = t.substring(0, t.length() - 1).strip();
            }
        }
        OptionalDouble v = ResistanceValues.number(t, true);
        if (v.isEmpty()) {
            return OptionalDouble.empty();
        }
        double ohms = v.getAsDouble() * factor;
        return Double.isFinite(ohms) && ResistanceValues.impossible(ohms) == null ? OptionalDouble.of(ohms)
                : OptionalDouble.empty();
    }
}
