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
}
