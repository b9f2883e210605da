package org.lodestep.qa;

import java.util.Objects;
import java.util.regex.Pattern;

/**
 * A raw capture a record's values came from: its file name, what kind of capture it is and the SHA-256 of its bytes,
 * so the very file can be matched to the record later.
 *
 * @param name   file name as given (or a rig label)
 * @param kind   what the capture holds: {@code resistance}, {@code inductance}, {@code back_emf}, {@code rig}, ...
 * @param sha256 SHA-256 of the capture's bytes, 64 lower-case hex digits
 */
public record CaptureRef(String name, String kind, String sha256) {
    private static final Pattern HEX64 = Pattern.compile("[0-9a-f]{64}");

    public CaptureRef {
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(kind, "kind");
        Objects.requireNonNull(sha256, "sha256");
        if (!HEX64.matcher(sha256).matches()) {
            throw new IllegalArgumentException("capture " + name + ": SHA-256 must be 64 lower-case hex digits, got "
                    + sha256);
        }
    }
}
