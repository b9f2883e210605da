package org.lodestep.workflow;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.OptionalDouble;

import org.lodestep.capture.LeadPairReading;
import org.lodestep.capture.ResistanceCsvReader;
import org.lodestep.capture.ResistanceReadings;
import org.lodestep.sample.InputFormatException;
import org.lodestep.wiring.Identification;
import org.lodestep.wiring.LeadIdentifier;
import org.lodestep.wiring.ResistanceMatrix;

/**
 * Use case: identify the windings, taps, faults and driver connections of one motor per resistance file, or of one
 * motor from loose readings alone. Loose readings add to (or replace) a single file's readings of the same pair.
 */
public final class LeadsFromReadings {
    private LeadsFromReadings() {
    }

    /**
     * What to identify.
     *
     * @param files    resistance files, one motor each (pair list or matrix); may be empty when {@code extra} is not
     * @param extra    readings given outside any file (the command line), added to the single file or alone
     * @param leads    how to judge the readings
     */
    public record Settings(List<Path> files, List<LeadPairReading> extra, LeadsSettings leads) {
        public Settings {
            files = List.copyOf(files);
            extra = List.copyOf(extra);
            Objects.requireNonNull(leads, "leads");
            if (files.isEmpty() && extra.isEmpty()) {
                throw new SettingsException("nothing to identify: no file and no reading");
            }
            if (files.size() > 1 && !extra.isEmpty()) {
                throw new SettingsException("loose readings add to one file, not to " + files.size());
            }
        }
    }

    /**
     * One motor's identification.
     *
     * @param source         the file it came from, or null for loose readings alone
     * @param motor          the file's {@code # motor=} name, or null
     * @param identification windings, taps, findings and connections
     */
    public record Motor(String source, String motor, Identification identification) {
        public Motor {
            Objects.requireNonNull(identification, "identification");
        }
    }

    /** Every motor, in the order given; {@link #hasError()} when any has an error-severity finding. */
    public record Result(List<Motor> motors) {
        public Result {
            motors = List.copyOf(motors);
        }

        public boolean hasError() {
            return motors.stream().anyMatch(m -> m.identification().hasError());
        }
    }

    /** Reads every file and identifies each motor. */
    public static Result run(Settings settings, Progress progress) throws IOException, InputFormatException {
        List<ResistanceReadings> inputs = new ArrayList<>();
        for (Path f : settings.files()) {
            progress.step("reading " + f.getFileName());
            inputs.add(ResistanceCsvReader.read(f));
        }
        boolean loose = inputs.isEmpty();
        if (loose) {
            inputs.add(new ResistanceReadings("readings", List.of(), List.of(), Map.of(), List.of()));
        }
        List<Motor> motors = new ArrayList<>();
        for (ResistanceReadings r : inputs) {
            progress.step("identifying " + r.source());
            Identification id = LeadIdentifier.identify(matrix(r, settings.extra()),
                    settings.leads().identifySettings(fileTemperature(r, settings.leads())));
            motors.add(new Motor(loose ? null : r.source(), r.motor(), id));
        }
        return new Result(motors);
    }

    /** A file's {@code # temperature_c=}, refused naming the file when it is below absolute zero for copper. */
    private static OptionalDouble fileTemperature(ResistanceReadings r, LeadsSettings s) throws InputFormatException {
        OptionalDouble t;
        try {
            t = r.temperatureC();
        } catch (NumberFormatException e) {
            throw new InputFormatException(r.source(), InputFormatException.NO_LINE, "temperature_c",
                    r.metadata().get("temperature_c"), "is not a temperature: expected degrees Celsius");
        }
        if (Double.isNaN(s.ambientC()) && t.isPresent() && !s.physical(t.getAsDouble())) {
            throw new InputFormatException(r.source(), InputFormatException.NO_LINE, "temperature_c",
                    r.metadata().get("temperature_c"), "expected a temperature above " + (-s.copper().kC()) + " °C");
        }
        return t;
    }

    /** The readings of a file plus loose readings (which replace the file's value for the same pair). */
    static ResistanceMatrix matrix(ResistanceReadings r, List<LeadPairReading> extra) {
        ResistanceMatrix.Builder b = ResistanceMatrix.builder();
        r.leads().forEach(b::lead);
        List<LeadPairReading> all = new ArrayList<>(r.readings());
        all.addAll(extra);
        for (LeadPairReading p : all) {
            b.reading(p.leadA(), p.leadB(), p.open() ? OptionalDouble.empty() : OptionalDouble.of(p.resistanceOhm()));
        }
        return b.build();
    }
}
