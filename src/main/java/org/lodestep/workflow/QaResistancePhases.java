package org.lodestep.workflow;

import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import java.util.OptionalDouble;
import java.util.stream.Collectors;

import org.lodestep.sample.InputFormatException;
import org.lodestep.capture.LeadPairReading;
import org.lodestep.capture.ResistanceCsvReader;
import org.lodestep.capture.ResistanceReadings;
import org.lodestep.wiring.FindingCode;
import org.lodestep.wiring.Identification;
import org.lodestep.wiring.IdentifySettings;
import org.lodestep.wiring.LeadIdentifier;
import org.lodestep.wiring.ResistanceMatrix;
import org.lodestep.wiring.Winding;

/**
 * Phase resistances of one motor from a lead-pair resistance CSV: read it, identify the windings as
 * {@code leads identify} does, and take each winding's end-to-end resistance (for 5- and 8-lead motors, each coil's).
 */
final class QaResistancePhases {

    /** Winding resistances as measured, in the identifier's winding order, and the CSV's temperature (NaN if none). */
    record Phases(List<Double> resistancesOhm, double temperatureC) {
    }

    private QaResistancePhases() {
    }

    static Phases read(Path file) throws IOException, InputFormatException {
        ResistanceReadings r = ResistanceCsvReader.read(file);
        Identification id = LeadIdentifier.identify(matrix(r), IdentifySettings.DEFAULT);
        boolean open = id.findings().stream().anyMatch(f -> f.code() == FindingCode.OPEN_WINDING);
        if (!id.determined() && !open) {
            // Judging a motor on a guess would record a wrong verdict: ask for the pairs that settle it.
            throw new InputFormatException(file.toString(), InputFormatException.NO_LINE, null, null,
                    "does not determine the windings; measure also " + id.missingPairs().stream()
                            .map(Object::toString).collect(Collectors.joining(", ")));
        }
        List<Double> ohms = id.windings().stream().map(Winding::resistanceOhm).toList();
        return new Phases(ohms, r.temperatureC().orElse(Double.NaN));
    }

    private static ResistanceMatrix matrix(ResistanceReadings r) {
        ResistanceMatrix.Builder b = ResistanceMatrix.builder();
        r.leads().forEach(b::lead);
        for (LeadPairReading p : r.readings()) {
            b.reading(p.leadA(), p.leadB(), p.open() ? OptionalDouble.empty() : OptionalDouble.of(p.resistanceOhm()));
        }
        return b.build();
    }
}
