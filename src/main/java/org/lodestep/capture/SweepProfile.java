package org.lodestep.capture;

import org.lodestep.sample.InputFormatException;
import org.lodestep.sample.SweepShape;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Objects;
import java.util.OptionalDouble;
import java.util.OptionalInt;

/**
 * The step-rate law of a sweep as recorded with a capture: linear or logarithmic from a start to an end rate in full
 * steps per second, over a duration when known, at a microstep setting when known.
 *
 * <p>In a CSV it is written as the comments {@code # sweep=linear|log}, {@code # sweep_start_full_steps_per_s=},
 * {@code # sweep_end_full_steps_per_s=}, and optionally {@code # sweep_duration_s=} and {@code # microsteps=} (step
 * pulses per full step).
 *
 * @param shape linear or logarithmic ({@link SweepShape}, shared with the analysis)
 */
public record SweepProfile(SweepShape shape, double startFullStepsPerS, double endFullStepsPerS, OptionalDouble durationS,
                           OptionalInt microsteps) {

    public SweepProfile {
        Objects.requireNonNull(shape, "shape");
        Objects.requireNonNull(durationS, "durationS");
        Objects.requireNonNull(microsteps, "microsteps");
        if (!(startFullStepsPerS >= 0) || !Double.isFinite(startFullStepsPerS)) {
            throw new IllegalArgumentException("sweep start must be finite and not negative, got "
                    + startFullStepsPerS + " full steps/s");
        }
        if (!(endFullStepsPerS > 0) || !Double.isFinite(endFullStepsPerS)) {
            throw new IllegalArgumentException("sweep end must be positive and finite, got " + endFullStepsPerS
                    + " full steps/s");
        }
        if (startFullStepsPerS == endFullStepsPerS) {
            throw new IllegalArgumentException("sweep start and end are both " + startFullStepsPerS
                    + " full steps/s: expected a range");
        }
        if (shape == SweepShape.LOG && !(startFullStepsPerS > 0)) {
            throw new IllegalArgumentException("a log sweep needs a positive start rate, got " + startFullStepsPerS
                    + " full steps/s");
        }
        if (durationS.isPresent() && (!(durationS.getAsDouble() > 0) || !Double.isFinite(durationS.getAsDouble()))) {
            throw new IllegalArgumentException("sweep duration must be positive and finite, got "
                    + durationS.getAsDouble() + " s");
        }
        if (microsteps.isPresent() && microsteps.getAsInt() < 1) {
            throw new IllegalArgumentException("microsteps must be at least 1 step pulse per full step, got "
                    + microsteps.getAsInt());
        }
    }

    /** A sweep with every field known. */
    public static SweepProfile of(SweepShape shape, double startFullStepsPerS, double endFullStepsPerS, double durationS,
                                  int microsteps) {
        return new SweepProfile(shape, startFullStepsPerS, endFullStepsPerS, OptionalDouble.of(durationS),
                OptionalInt.of(microsteps));
    }

    /** The {@code key=value} pairs this profile is written as. */
    public Map<String, String> toMetadata() {
        Map<String, String> m = new LinkedHashMap<>();
        m.put("sweep", shape.word());
        m.put("sweep_start_full_steps_per_s", Double.toString(startFullStepsPerS));
        m.put("sweep_end_full_steps_per_s", Double.toString(endFullStepsPerS));
        durationS.ifPresent(d -> m.put("sweep_duration_s", Double.toString(d)));
        microsteps.ifPresent(k -> m.put("microsteps", Integer.toString(k)));
        return m;
    }

    /**
     * Reads a sweep law from metadata keys, if {@code sweep} is present.
     *
     * @return the profile, or null when the metadata holds no {@code sweep} key
     * @throws InputFormatException when {@code sweep} is present but a value is missing or malformed; names the key
     */
    public static SweepProfile fromMetadata(Map<String, String> metadata, String source) throws InputFormatException {
        String word = metadata.get("sweep");
        if (word == null) {
            return null;
        }
        SweepShape shape = SweepShape.ofWord(word);
        if (shape == null) {
            throw new InputFormatException(source, InputFormatException.NO_LINE, "sweep", word,
                    "expected linear or log");
        }
        double start = number(metadata, "sweep_start_full_steps_per_s", source, true);
        double end = number(metadata, "sweep_end_full_steps_per_s", source, true);
        double duration = number(metadata, "sweep_duration_s", source, false);
        OptionalInt micro = OptionalInt.empty();
        String m = metadata.get("microsteps");
        if (m != null) {
            try {
                micro = OptionalInt.of(Integer.parseInt(m.strip()));
            } catch (NumberFormatException e) {
                throw new InputFormatException(source, InputFormatException.NO_LINE, "microsteps", m,
                        "expected a whole number of step pulses per full step");
            }
        }
        try {
            return new SweepProfile(shape, start, end,
                    Double.isNaN(duration) ? OptionalDouble.empty() : OptionalDouble.of(duration), micro);
        } catch (IllegalArgumentException e) {
            throw new InputFormatException(source, InputFormatException.NO_LINE, "sweep", null,
                    "has an impossible sweep: " + e.getMessage());
        }
    }

    private static double number(Map<String, String> metadata, String key, String source, boolean required)
            throws InputFormatException {
        String v = metadata.get(key);
        if (v == null) {
            if (required) {
                throw new InputFormatException(source, InputFormatException.NO_LINE, key, null,
                        "is missing: a sweep needs sweep_start_full_steps_per_s and sweep_end_full_steps_per_s");
            }
            return Double.NaN;
        }
        try {
            double d = Double.parseDouble(v.strip().replace(',', '.'));
            if (Double.isFinite(d)) {
                return d;
            }
        } catch (NumberFormatException e) {
            // reported below
        }
        throw new InputFormatException(source, InputFormatException.NO_LINE, key, v,
                "expected a number" + (key.endsWith("_s") && !key.endsWith("per_s") ? " in seconds"
                        : " in full steps per second"));
    }
}
