package org.lodestep.motor;

/** Lead arrangement of a two-phase motor, as found from resistances or from back-EMF channels. */
public enum Topology {
    FOUR_LEAD("4-lead"),
    FIVE_LEAD("5-lead"),
    SIX_LEAD("6-lead"),
    EIGHT_LEAD("8-lead"),
    UNKNOWN("unknown");

    private final String label;

    Topology(String label) {
        this.label = label;
    }

    /** The trade's name: {@code 4-lead}, {@code 6-lead}, ... */
    public String label() {
        return label;
    }
}
