package org.lodestep.qa;

import java.util.List;
import java.util.Objects;
import java.util.Optional;

/**
 * A part's acceptance spec, as written by the inspector in a TOML file and read by {@link PartSpecReader}.
 *
 * <p>A spec is identified by part number, revision and an integer {@code specVersion} that the author increments
 * whenever any limit changes; every QA record names all three plus the SHA-256 of the spec file, so the spec a motor
 * was judged by can always be found again.
 *
 * @param partNumber          part number as printed on the motor label
 * @param revision            drawing or part revision
 * @param specVersion         version of this spec, 1 or more
 * @param description         free text, may be empty
 * @param referenceTemperatureC temperature the resistance limits are stated at, °C
 * @param limits              the checks this spec asks for, one limit per parameter
 * @param insulationTestVoltageV DC test voltage the insulation minimum applies at, V (NaN when no insulation check)
 * @param specSha256          SHA-256 of the spec file's bytes (hex)
 * @param source              the file (or upload) the spec was read from, for messages about it
 * @param specVersionLine     1-based line of {@code spec_version} in that file, 0 when unknown
 */
public record PartSpec(String partNumber, String revision, int specVersion, String description,
                       double referenceTemperatureC, List<Limit> limits, double insulationTestVoltageV,
                       String specSha256, String source, int specVersionLine) {
    public PartSpec {
        Objects.requireNonNull(partNumber, "partNumber");
        Objects.requireNonNull(revision, "revision");
        Objects.requireNonNull(description, "description");
        Objects.requireNonNull(specSha256, "specSha256");
        Objects.requireNonNull(source, "source");
        limits = List.copyOf(limits);
        if (partNumber.isBlank()) {
            throw new IllegalArgumentException("part number is blank");
        }
        if (specVersion < 1) {
            throw new IllegalArgumentException("spec version must be 1 or more, got " + specVersion);
        }
        if (!(referenceTemperatureC > -60 && referenceTemperatureC < 250)) {
            throw new IllegalArgumentException("reference temperature " + referenceTemperatureC
                    + " °C is outside -60..250 °C");
        }
    }

    /** The limit for one parameter, if the spec checks it. */
    public Optional<Limit> limit(String parameter) {
        return limits.stream().filter(l -> l.parameter().equals(parameter)).findFirst();
    }

    /** {@code PART rev R, spec v N}: how reports name the spec. */
    public String label() {
        return partNumber + " rev " + revision + ", spec v" + specVersion;
    }
}
