package org.lodestep.report.html;

/** A terminal of a two-phase stepper driver, as printed on the wiring diagram. */
public enum DriverTerminal {
    A_PLUS("A+", "A"),
    A_MINUS("A\u2212", "A"),
    B_PLUS("B+", "B"),
    B_MINUS("B\u2212", "B"),
    /** The common (supply) terminal of a unipolar driver. */
    COMMON("COM", "");

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
