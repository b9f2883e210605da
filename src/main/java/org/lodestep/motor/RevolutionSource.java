package org.lodestep.motor;

/** Where the number of mechanical revolutions in a back-EMF capture came from. */
public enum RevolutionSource {
    /** Not known: the tooth count and the mechanical Ke stay unknown. */
    NONE,
    /** Stated by the user ({@code # revolutions=} metadata or a flag). */
    STATED,
    /** Counted from an index or tachometer channel. */
    INDEX_CHANNEL
}
