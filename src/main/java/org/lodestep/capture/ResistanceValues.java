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
    /** Smallest non-zero reading an ohmmeter resolves, ohms (1 mΩ: a four-wire bench meter's last digit). */
    static final double RESOLUTION_OHM = 1e-3;
    /** Largest reading any ohmmeter or insulation tester gives, ohms (1 TΩ); anything beyond is written OL. */
    static final double MAX_OHM = 1e12;

    /**
     * Why a reading in ohms cannot be a meter reading, or null when it can: 0 (a short) and 1 mΩ to 1 TΩ can.
     */
    static String impossible(double ohms) {
        if (ohms > MAX_OHM) {
            return "is above 1 TΩ, more than any meter reads: expected a reading up to 1 TΩ, or OL for open";
        }
        if (ohms > 0 && ohms < RESOLUTION_OHM) {
            return "is below a meter's resolution (1 mΩ): expected 0 for a dead short or a reading of at least 1 mΩ";
        }
        return null;
    }

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
