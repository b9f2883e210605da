package org.lodestep.cli;

/**
 * Calls a workflow for a command. A workflow reports an impossible setting as an IllegalArgumentException (what the
 * input cannot support it reports as an InputFormatException itself); for a command a setting is an option, so it
 * becomes a {@link UsageException}: exit code 2 with the message as its one line.
 */
final class WorkflowCall {
    private WorkflowCall() {
    }

    /** A workflow call, with the checked exceptions of reading and of the rig. */
    @FunctionalInterface
    interface Step<T> {
        T get() throws Exception;
    }

    static <T> T run(Step<T> s) throws Exception {
        try {
            return s.get();
        } catch (IllegalArgumentException e) {
            throw new UsageException(e.getMessage());
        }
    }
}
