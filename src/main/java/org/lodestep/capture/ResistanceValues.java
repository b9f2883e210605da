package org.lodestep.capture;

import java.util.Locale;
import java.util.OptionalDouble;
import java.util.regex.Pattern;

import ch.randelshofer.fastdoubleparser.JavaDoubleParser;

/** Parses resistance cells and unit tags: open-circuit words, decimal comma, unit prefixes. */
final class ResistanceValues {
    private static final Pattern NUMBER = Pattern.compile("[+]?(\\d+([.]\\d*)?|[.]\\d+)([eE][+-]?\\d+)?");

    private ResistanceValues() {
    }

    /** Whether the cell is one of the ways to write open circuit: empty, OL, open, inf, ∞. */
    static boolean isOpen(String cell) {
        String c = cell.strip().toLowerCase(Locale.ROOT);
        return c.isEmpty() || c.equals("ol") || c.equals("o.l") || c.equals("o.l.") || c.equals("open")
                || c.equals("inf") || c.equals("+inf") || c.equals("infinity") || c.equals("∞");
    }

    /**
     * The value of a non-open cell in the file's unit, or empty when it is not a number.
     *
     * @param decimalComma accept {@code 2,4} for 2.4
     */
    static OptionalDouble number(String cell, boolean decimalComma) {
        String c = cell.strip();
        if (decimalComma && c.indexOf(',') >= 0 && c.indexOf('.') < 0) {
            c = c.replace(',', '.');
        }
        if (!NUMBER.matcher(c).matches()) {
            return OptionalDouble.empty();
        }
        return OptionalDouble.of(JavaDoubleParser.parseDouble(c));
    }

    /**
     * The factor to ohms of a unit tag at the end of a header cell: {@code _ohm _mohm _kohm _Mohm}, or {@code [Ω] [mΩ]
     * [kΩ] [MΩ]}; the case of the m matters (milli against mega). NaN when there is no recognised unit.
     */
    static double unitFactor(String header) {
        String h = header.strip();
        int bracket = h.lastIndexOf('[');
        if (bracket >= 0 && h.endsWith("]")) {
            return factor(h.substring(bracket + 1, h.length() - 1).strip());
        }
        int underscore = h.lastIndexOf('_');
        if (underscore >= 0) {
            return factor(h.substring(underscore + 1));
        }
        return factor(h);
    }

    private static double factor(String u) {
        String unit = u.replace("Ω", "ohm").replace("Ohm", "ohm").replace("OHM", "ohm");
        if (unit.endsWith("ohms")) {
            unit = unit.substring(0, unit.length() - 1);
        }
        return switch (unit) {
            case "ohm" -> 1.0;
            case "mohm" -> 1e-3;
            case "kohm", "Kohm" -> 1e3;
            case "Mohm" -> 1e6;
            default -> Double.NaN;
        };
    }
}
