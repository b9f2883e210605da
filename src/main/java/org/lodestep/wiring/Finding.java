package org.lodestep.wiring;

import java.util.List;
import java.util.Objects;

/**
 * One observation about the motor or the measurement, with what to do next: the one finding type of every analysis
 * (lead identification here, motor identification in {@code motor}).
 *
 * @param code     stable code, from the enum of the domain that found it ({@link FindingCode} for lead
 *                 identification); scripts match on {@link Code#code()}
 * @param severity how serious it is
 * @param message  one or two sentences: what was seen and what to do next
 * @param leads    the leads concerned (may be empty)
 */
public record Finding(Code code, Severity severity, String message, List<String> leads) {

    /** A stable finding code; each domain lists its codes in one enum implementing this. */
    public interface Code {
        /** The code as written in output, e.g. {@code open-winding}. */
        String code();
    }

    public Finding {
        Objects.requireNonNull(code, "code");
        Objects.requireNonNull(severity, "severity");
        Objects.requireNonNull(message, "message");
        leads = List.copyOf(leads);
    }

    /** An informational finding about no particular lead. */
    public static Finding info(Code code, String message) {
        return new Finding(code, Severity.INFO, message, List.of());
    }

    /** A warning about no particular lead. */
    public static Finding warning(Code code, String message) {
        return new Finding(code, Severity.WARNING, message, List.of());
    }

    /** An error about no particular lead. */
    public static Finding error(Code code, String message) {
        return new Finding(code, Severity.ERROR, message, List.of());
    }

    /** The same finding with {@code where: } in front of its message. */
    public Finding at(String where) {
        return new Finding(code, severity, where + ": " + message, leads);
    }
}
