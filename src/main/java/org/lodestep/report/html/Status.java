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
    /** Neutral information. */
    INFO("\u25CF", "info");

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
