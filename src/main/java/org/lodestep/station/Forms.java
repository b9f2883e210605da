package org.lodestep.station;

import java.net.URLEncoder;
import java.nio.charset.StandardCharsets;
import java.time.format.DateTimeParseException;

import org.lodestep.qa.Timestamps;
import org.lodestep.workflow.SettingsException;

/** Form fields to settings values, with the one-line messages the command line gives for the same mistakes. */
final class Forms {
    private Forms() {
    }

    /** A number typed in a field, or NaN when the field is empty. */
    static double optionalNumber(String text, String what, String unit) {
        if (text == null || text.isBlank()) {
            return Double.NaN;
        }
        try {
            double v = Double.parseDouble(text.strip());
            if (Double.isFinite(v)) {
                return v;
            }
        } catch (NumberFormatException e) {
            // reported below
        }
        throw new SettingsException(what + " '" + text.strip() + "' is not a number" + (unit.isEmpty() ? "" : " of " + unit));
    }

    /** A number typed in a field, or {@code fallback} when the field is empty. */
    static double number(String text, String what, String unit, double fallback) {
        double v = optionalNumber(text, what, unit);
        return Double.isNaN(v) ? fallback : v;
    }

    /** A text field, null when empty. */
    static String optional(String text) {
        return text == null || text.isBlank() ? null : text.strip();
    }

    /** A date field (YYYY-MM-DD, UTC) as the instant a record query compares with; the end of the day for "to". */
    static String day(String text, String what, boolean endOfDay) {
        String t = optional(text);
        if (t == null) {
            return null;
        }
        try {
            return Timestamps.dayBound(t, endOfDay);
        } catch (DateTimeParseException e) {
            throw new SettingsException(what + " '" + t + "': expected a date YYYY-MM-DD");
        }
    }

    static String url(String s) {
        return URLEncoder.encode(s, StandardCharsets.UTF_8);
    }
}
