package org.lodestep.workflow;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import org.lodestep.sample.InputFormatException;
import org.lodestep.capture.ResistanceCsvReader;
import org.lodestep.capture.ResistanceReadings;
import org.lodestep.motor.CoilResistance;
import org.lodestep.motor.OrientedLeads;
import org.lodestep.motor.MotorFindingCode;
import org.lodestep.motor.WindingInput;
import org.lodestep.wiring.Finding;
import org.lodestep.wiring.Identification;
import org.lodestep.wiring.IdentifySettings;
import org.lodestep.wiring.LeadIdentifier;
import org.lodestep.wiring.Winding;

/**
 * Reads a resistance file and hands the lead identification to the motor package as coils: a tapped winding becomes
 * its two end-to-tap halves, any other winding (or 8-lead half-winding) one coil.
 */
final class MotorWindings {
    private MotorWindings() {
    }

    static WindingInput read(Path file) throws IOException, InputFormatException {
        ResistanceReadings r = ResistanceCsvReader.read(file);
        Identification id = LeadIdentifier.identify(LeadsFromReadings.matrix(r, List.of()),
                IdentifySettings.DEFAULT);
        return of(id);
    }

    /** The coils, topology and findings of one identification. */
    static WindingInput of(Identification id) {
        List<CoilResistance> coils = new ArrayList<>();
        List<Finding> findings = new ArrayList<>();
        for (org.lodestep.wiring.Finding f : id.findings()) {
            findings.add(f.at("resistance"));
        }
        for (Winding w : id.windings()) {
            if (w.tap() != null) {
                add(coils, findings, w.ends().get(0), w.tap(), w.halfResistancesOhm().get(0));
                add(coils, findings, w.tap(), w.ends().get(1), w.halfResistancesOhm().get(1));
            } else {
                add(coils, findings, w.ends().get(0), w.ends().get(1), w.resistanceOhm());
            }
        }
        return new WindingInput(id.topology(), id.leads(), coils, findings);
    }

    private static void add(List<CoilResistance> coils, List<Finding> findings, String a, String b, double ohm) {
        if (ohm > 0 && Double.isFinite(ohm)) {
            coils.add(new CoilResistance(new OrientedLeads(a, b), ohm));
        } else {
            findings.add(Finding.warning(MotorFindingCode.COIL_RESISTANCE, "resistance: coil " + a + "-" + b
                    + " reads " + ohm + " ohm; it is left out of the electrical figures"));
        }
    }
}
