package org.lodestep.workflow;

/**
 * Settings a front end passed that parse but cannot work together (a value given twice, a rig insulation test not
 * confirmed, a pattern without {@code {serial}}). The message is one line for the user; the command line maps it to
 * exit code 2, a bench station shows it next to the form. An {@link IllegalArgumentException}, the convention of every
 * workflow for a setting at fault, with a type of its own so a front end can tell it from a bug.
 */
public final class SettingsException extends IllegalArgumentException {
    private static final long serialVersionUID = 1L;

    public SettingsException(String message) {
        super(message);
    }
}
