package org.lodestep.motor;

import java.util.Objects;

/**
 * One observation about the motor or the data, with a stable {@code code} for scripts
 * ({@code saturation}, {@code open_winding}, ...) and a sentence for people.
 */
public record Finding(Severity severity, String code, String message) {
    public Finding {
        Objects.requireNonNull(severity, "severity");
        Objects.requireNonNull(code, "code");
        Objects.requireNonNull(message, "message");
    }

    static Finding info(String code, String message) {
        return new Finding(Severity.INFO, code, message);
    }

    static Finding warning(String code, String message) {
        return new Finding(Severity.WARNING, code, message);
    }

    static Finding error(String code, String message) {
        return new Finding(Severity.ERROR, code, message);
    }
}
