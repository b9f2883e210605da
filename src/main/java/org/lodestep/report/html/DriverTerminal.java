package org.lodestep.report.html;

/**
 * A terminal of a two-phase stepper driver, as printed on the wiring diagram: A+, A−, B+, B− on a bipolar driver;
 * A, A′, B, B′ and COM on a unipolar one.
 */
public enum DriverTerminal {
    A_PLUS("A+", "A"),
    A_MINUS("A\u2212", "A"),
    B_PLUS("B+", "B"),
    B_MINUS("B\u2212", "B"),
    /** Unipolar: the first end of phase A. */
    A("A", "A"),
    /** Unipolar: the second end of phase A. */
    A_PRIME("A\u2032", "A"),
    /** Unipolar: the first end of phase B. */
    B("B", "B"),
    /** Unipolar: the second end of phase B. */
    B_PRIME("B\u2032", "B"),
    /** The common (supply) terminal of a unipolar driver. */
    COMMON("COM", "");

    /**
     * The terminal a plain-text name stands for: {@code A+}, {@code A-} (or with a true minus), {@code B+}, {@code B-},
     * {@code A}, {@code A'} (or {@code A/}), {@code B}, {@code B'}, {@code COM} (or a phase's {@code A COM}, drawn on
     * the one common terminal).
     */
    public static DriverTerminal parse(String name) {
        return switch (name.trim().replace('\u2212', '-').replace('\u2032', '\'')) {
            case "A+" -> A_PLUS;
            case "A-" -> A_MINUS;
            case "B+" -> B_PLUS;
            case "B-" -> B_MINUS;
            case "A" -> A;
            case "A'", "A/" -> A_PRIME;
            case "B" -> B;
            case "B'", "B/" -> B_PRIME;
            case "COM", "A COM", "B COM" -> COMMON;
            default -> throw new IllegalArgumentException("unknown driver terminal '" + name
                    + "' (expected A+, A-, B+, B-, A, A', B, B', COM)");
        };
    }

    private final String label;
    private final String phase;

    DriverTerminal(String label, String phase) {
        this.label = label;
        this.phase = phase;
    }

    /** The label printed on the diagram (with a true minus sign). */
    public String label() {
        return label;
    }

    /** "A", "B", or empty for the common terminal. */
    public String phase() {
        return phase;
    }
}
