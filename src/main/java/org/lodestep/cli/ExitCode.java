package org.lodestep.cli;

/**
 * Every exit code Lodestep returns; the README's table is copied from here.
 *
 * <p>Codes are decided at one edge: commands return {@link #OK} or {@link #FINDING}, and {@link Main} maps
 * exceptions to the others.
 */
public final class ExitCode {
    /** The command did what was asked. */
    public static final int OK = 0;
    /** A bug in Lodestep: an unexpected exception (rerun with --verbose for the stack trace). */
    public static final int INTERNAL = 1;
    /** The command line was wrong, or an input file could not be read as what it claims to be. */
    public static final int USAGE = 2;
    /** The analysis found an error-severity fault, or a QA check failed. */
    public static final int FINDING = 3;
    /** The rig did not answer or failed, or an output could not be written. */
    public static final int RIG_OR_IO = 4;
    /** The QA database could not be opened, migrated, read or written. */
    public static final int DATABASE = 5;
    /**
     * Not yet determined: the answer is not certain (a probe session ended before it was, the readings leave the
     * winding layout open) and no fault was found; a script must not take it for done. A fault found wins (3).
     */
    public static final int UNDETERMINED = 6;

    /** The code of a leads identification: a fault first, then an answer not yet certain, else done. */
    static int ofIdentification(boolean hasError, boolean determined) {
        return hasError ? FINDING : determined ? OK : UNDETERMINED;
    }

    private ExitCode() {
    }
}
