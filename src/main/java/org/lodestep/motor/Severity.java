package org.lodestep.motor;

/** How much a finding matters: an {@code ERROR} makes {@code motor identify} exit with code 3. */
public enum Severity {
    INFO, WARNING, ERROR
}
