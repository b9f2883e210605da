package org.lodestep.wiring;

/** How serious a finding is; an error means the motor should not be used as it is. */
public enum Severity {
    INFO, WARNING, ERROR;

    /** Lower-case name used in output. */
    public String label() {
        return name().toLowerCase(java.util.Locale.ROOT);
    }
}
