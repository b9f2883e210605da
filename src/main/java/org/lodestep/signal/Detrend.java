package org.lodestep.signal;

/** What is removed from each segment before windowing. */
public enum Detrend {
    /** Nothing: the DC bin holds the segment mean. */
    NONE,
    /** The segment mean, so a sensor offset does not leak into low-frequency bins (the usual Welch default). */
    MEAN
}
