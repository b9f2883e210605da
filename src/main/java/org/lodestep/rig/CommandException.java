package org.lodestep.rig;

/** A command the rig refuses: the error code and the text of the 'E' frame it answers with. */
final class CommandException extends Exception {
    private static final long serialVersionUID = 1L;
    private final RigError error;

    CommandException(RigError error, String text) {
        super(text);
        this.error = error;
    }

    static CommandException badArgument(String text) {
        return new CommandException(RigError.BAD_ARGUMENT, text);
    }

    RigError error() {
        return error;
    }
}
