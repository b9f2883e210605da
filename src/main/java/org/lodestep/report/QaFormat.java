package org.lodestep.report;

import java.util.Locale;

import org.lodestep.qa.Parameters;

/** Display units and number formatting for QA output: SI inside, the units an inspector reads on a meter outside. */
final class QaFormat {
    private QaFormat() {
    }

    /** Scale from the stored SI value to the display unit. */
    static double scale(String parameter) {
        return switch (parameter) {
            case Parameters.PHASE_INDUCTANCE -> 1e3;
            case Parameters.INSULATION_RESISTANCE -> 1e-6;
            default -> 1.0;
        };
    }

    static String unit(String parameter, String storedUnit) {
        return switch (parameter) {
            case Parameters.PHASE_INDUCTANCE -> "mH";
            case Parameters.INSULATION_RESISTANCE -> "M\u03A9";
            // one way of writing each unit in every report (the spec stores ASCII "ohm")
            default -> "ohm".equals(storedUnit) ? "\u03A9" : storedUnit;
        };
    }

    /** Five significant digits, or "-" for NaN. */
    static String num(double v) {
        if (Double.isNaN(v)) {
            return "-";
        }
        if (Double.isInfinite(v)) {
            return v > 0 ? "inf" : "-inf";
        }
        String s = String.format(Locale.ROOT, "%.5g", v);
        if (s.contains(".") && !s.contains("e")) {
            s = s.replaceAll("0+$", "").replaceAll("\\.$", "");
        }
        return s;
    }

    /** A value of a parameter in its display unit. */
    static String value(String parameter, double si) {
        return num(si * scale(parameter));
    }

    /** A percentage with one decimal. */
    static String pct(double v) {
        return Double.isNaN(v) ? "-" : String.format(Locale.ROOT, "%.1f %%", v);
    }

    /** Two decimals, for capability indices. */
    static String index(double v) {
        return Double.isNaN(v) ? "-" : String.format(Locale.ROOT, "%.2f", v);
    }

    /**
     * Text from outside (serial numbers, operator names) made safe for a terminal: control characters become visible
     * escapes ({@code \n}, {@code \x1B}) so they cannot move the cursor or recolour the screen. JSON output carries
     * the exact text.
     */
    static String visible(String s) {
        StringBuilder b = new StringBuilder(s.length());
        s.codePoints().forEach(cp -> {
            if (cp == '\n') {
                b.append("\\n");
            } else if (cp == '\r') {
                b.append("\\r");
            } else if (cp == '\t') {
                b.append("\\t");
            } else if (Character.isISOControl(cp) || cp == 0x2028 || cp == 0x2029 || cp == 0x202E) {
                b.append(String.format(Locale.ROOT, "\\x%02X", cp));
            } else {
                b.appendCodePoint(cp);
            }
        });
        return b.toString();
    }
}
