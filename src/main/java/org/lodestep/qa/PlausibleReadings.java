package org.lodestep.qa;

import java.util.Locale;

/**
 * The range a hand-held meter reading can lie in, per meter-log column (the same names as typed options use):
 * wider than any stepper motor's value, so only a slip of the keyboard or a damaged file is refused, before it is
 * judged or recorded. Sanity bounds of our own choosing (common practice), not physical limits; the resistance
 * bounds are the ones the resistance CSV reader applies (1 TΩ, more than any meter reads).
 */
public final class PlausibleReadings {

    private PlausibleReadings() {
    }

    /**
     * Why {@code value} cannot be a reading of that column, in words for a one-line message ("expected ..."), or
     * null when it can.
     *
     * @param column a meter-log column name: {@code phase_a_ohm}, {@code inductance_b_mh},
     *               {@code insulation_a_frame_mohm}, {@code insulation_test_v}, {@code ke_v_s_per_rad},
     *               {@code step_angle_deg}, {@code winding_c}
     */
    public static String refusal(String column, double value) {
        String c = column.toLowerCase(Locale.ROOT);
        if (c.startsWith("insulation_") && c.endsWith("_mohm")) {
            return value == Double.POSITIVE_INFINITY ? null
                    : range(value, 0, 1e7, true, "megohms from 0 to 1e7 (10 TΩ), or 'over' above the tester's range");
        }
        if (c.endsWith("_ohm")) {
            return range(value, 0, 1e12, true, "ohms from 0 to 1e12 (1 TΩ)");
        }
        if (c.endsWith("_mh")) {
            return range(value, 0, 1e6, false, "millihenries above 0 and at most 1e6");
        }
        return switch (c) {
            case "insulation_test_v" -> range(value, 1, 20000, true, "volts DC from 1 to 20000");
            case "ke_v_s_per_rad" -> range(value, 0, 1e3, false, "V·s/rad above 0 and at most 1000");
            case "step_angle_deg" -> range(value, 0, 90, false, "degrees above 0 and at most 90");
            case "winding_c" -> range(value, -60, 250, true, "°C from -60 to 250");
            default -> Double.isFinite(value) ? null : "expected a finite number";
        };
    }

    private static String range(double v, double min, double max, boolean minIncluded, String expected) {
        boolean ok = (minIncluded ? v >= min : v > min) && v <= max;
        return ok ? null : "expected " + expected;
    }
}
