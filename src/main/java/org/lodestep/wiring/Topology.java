package org.lodestep.wiring;

/** How the leads of a two-phase motor are brought out, as far as resistances tell. */
public enum Topology {
    /** Two separate windings, one per phase: bipolar only. */
    FOUR_LEAD("4-lead"),
    /** Four half-windings joined at one common lead: unipolar only. */
    FIVE_LEAD("5-lead"),
    /** Two centre-tapped windings: bipolar series, bipolar half winding, or unipolar. */
    SIX_LEAD("6-lead"),
    /** Four separate half-windings: bipolar series, bipolar parallel, or unipolar. */
    EIGHT_LEAD("8-lead"),
    /** The readings fit none of the above (a fault, a missing lead, or a motor of another kind). */
    UNKNOWN("unknown");

    private final String label;

    Topology(String label) {
        this.label = label;
    }

    /** The name used in text and JSON output ({@code 4-lead} ... {@code unknown}). */
    public String label() {
        return label;
    }
}
