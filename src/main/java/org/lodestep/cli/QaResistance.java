package org.lodestep.cli;

import java.io.IOException;
import java.nio.file.Path;
import java.util.List;

import org.lodestep.capture.InputFormatException;

/** Phase resistances of one motor from a lead-pair resistance CSV: read, identify windings, take their resistances. */
final class QaResistance {

    /** End-to-end winding resistances as measured, phase A first, and the CSV's winding temperature (NaN if none). */
    record Phases(List<Double> resistancesOhm, double temperatureC) {
    }

    private QaResistance() {
    }

    static Phases read(Path file) throws IOException, InputFormatException {
        throw new UsageException("--resistance: reading resistance CSVs needs the leads reader, not in this build yet;"
                + " give --phase-ohm");
    }
}
