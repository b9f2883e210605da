package org.lodestep.wiring;

/** The stable codes of lead-identification findings; scripts may match on {@link #code()}. */
public enum FindingCode implements Finding.Code {
    /** A lead or half-winding has no continuity where the topology needs it. */
    OPEN_WINDING("open-winding"),
    /** Phase (or coil) resistances differ by more than the tolerance. */
    PHASE_IMBALANCE("phase-imbalance"),
    /** The two halves of a centre-tapped winding differ by more than the tolerance: suspect shorted turns. */
    TAP_ASYMMETRY("tap-asymmetry"),
    /** A finite but high reading between leads that should be isolated. */
    PHASE_LEAKAGE("phase-leakage"),
    /** Readings that contradict the series relations of the windings. */
    INCONSISTENT_MATRIX("inconsistent-matrix"),
    /** A winding that reads a dead short (below 20 mΩ) between its ends. */
    SHORTED_WINDING("shorted-winding"),
    /** One reading well above what its sibling readings imply: a poor probe contact. */
    CONTACT_RESISTANCE("contact-resistance");

    private final String code;

    FindingCode(String code) {
        this.code = code;
    }

    /** The code as written in output. */
    public String code() {
        return code;
    }
}
