package org.lodestep.workflow;

/**
 * How a workflow tells its front end what it is doing, without printing: the command line draws a progress bar or
 * a line of text, the bench station pushes an event to the browser. Calls come from the workflow's own thread.
 */
public interface Progress {

    /** A listener that ignores everything, for scripts and tests. */
    Progress NONE = new Progress() {
    };

    /**
     * A step of the workflow began, for example "reading sweep.csv" or "measuring 2–5".
     *
     * @param step a short phrase in the trade's terms, no trailing full stop
     */
    default void step(String step) {
    }

    /**
     * Part of a long step is done.
     *
     * @param done  units done so far (frames, readings, blocks), at least 0
     * @param total units in all, or -1 when not known in advance
     */
    default void advanced(long done, long total) {
    }

    /** Something the user should know that does not stop the workflow (a fit warning, a skipped file). */
    default void note(String message) {
    }
}
