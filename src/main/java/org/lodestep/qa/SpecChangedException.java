package org.lodestep.qa;

/**
 * A part spec whose content changed while its number, revision and spec version stayed those of specs already
 * recorded against: the store refuses it, since records would no longer say which limits judged them. An input
 * error (the spec file), not a failure of the store.
 */
public final class SpecChangedException extends StoreException {
    private static final long serialVersionUID = 1L;

    public SpecChangedException(String message) {
        super(message);
    }

    /** This refusal located in the spec file: {@code FILE line N: } before the message (no line when 0). */
    public SpecChangedException in(String source, int line) {
        SpecChangedException located = new SpecChangedException(
                (source + (line > 0 ? " line " + line : "") + ": ").replaceAll("\\p{Cntrl}", "?") + getMessage());
        located.initCause(this);
        return located;
    }
}
