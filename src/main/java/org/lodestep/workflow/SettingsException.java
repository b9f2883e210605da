package org.lodestep.workflow;

/**
 * Settings a front end passed that parse but cannot work together (a value given twice, a rig insulation test not
 * confirmed, a pattern without {@code {serial}}). The message is one line for the user; the command line maps it to
 * exit code 2, a bench station shows it next to the form.
 */
public final class SettingsException extends RuntimeException {
    private static final long serialVersionUID = 1L;

    public SettingsException(String message) {
        super(message);
    }
}
