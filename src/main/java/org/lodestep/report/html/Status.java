package org.lodestep.report.html;

/**
 * How a value, row or whole report reads at a glance. Each status carries a symbol and a word besides its colour,
 * so the meaning survives a grey-scale print and colour-blind readers.
 */
public enum Status {
    /** Within limits, or a clean result. */
    PASS("\u2714", "pass"),
    /** Worth a look: near a limit, ambiguous, or a band to cross quickly. */
    WARN("\u25B2", "warning"),
    /** Out of limits, a fault, or a band to avoid. */
    FAIL("\u2716", "fail"),
    /** Neutral information: nothing is judged (no criterion applies). */
    INFO("\u25CF", "info"),
    /**
     * A usable answer that rests on a guess the measurement could not settle (which half-windings form a phase,
     * a coil's start): try it as given, and confirm it (back-EMF phasing) before relying on it.
     */
    PROVISIONAL("\u25D0", "provisional");

    private final String symbol;
    private final String word;

    Status(String symbol, String word) {
        this.symbol = symbol;
        this.word = word;
    }

    /** A one-character symbol that differs in shape between statuses. */
    public String symbol() {
        return symbol;
    }

    /** The word printed beside the symbol. */
    public String word() {
        return word;
    }

    String cssClass() {
        return "st-" + name().toLowerCase(java.util.Locale.ROOT);
    }
}
